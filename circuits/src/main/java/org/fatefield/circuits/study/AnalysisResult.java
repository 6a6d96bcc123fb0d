package org.fatefield.circuits.study;

import java.util.List;
import org.fatefield.circuits.analysis.BasinMap;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.analysis.Switching;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldCurve;

/**
 * Everything {@code fatefield analyze} computed.
 *
 * @param steadyStates   steady states at the plan's parameter value
 * @param branches       continuation branches
 * @param foldCurves     fold curves in the two-parameter plane (empty without a second parameter)
 * @param basins         basin map at the plan's value; null without a state plane (one species)
 * @param landscape      landscape over the state plane at the plan's value; null without a state plane
 * @param alongParameter one-dimensional landscapes (along the x species) at {@code parameterValues}
 * @param parameterValues parameter values of {@code alongParameter}
 * @param passages       first-passage estimates, one per system size in {@code systemSizes}
 * @param systemSizes    system sizes of {@code passages}
 * @param commitment     probability of reaching the second stable state first, on the basin grid
 */
public record AnalysisResult(List<SteadyState> steadyStates, List<Branch> branches, List<FoldCurve> foldCurves,
        BasinMap basins, QuasiPotential landscape, List<QuasiPotential> alongParameter, double[] parameterValues,
        List<Switching.FirstPassage> passages, double[] systemSizes, double[][] commitment) {
}
