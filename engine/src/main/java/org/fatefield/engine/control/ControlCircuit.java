package org.fatefield.engine.control;

import java.util.List;
import java.util.function.DoubleFunction;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.StationaryFokkerPlanck;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.EquilibriumContinuation;
import org.fatefield.circuits.analysis.continuation.NetworkSystem;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * A tissue's circuit along the control parameter its morphogen sets (its first coupling), as
 * the live view and the report show it: the steady-state branches over the range the coupling
 * can reach, the value where most stable states coexist, and the stationary landscape at any
 * value. Tissues without a coupling have none of these.
 */
public final class ControlCircuit {

    private static final int LANDSCAPE_BINS = 60;

    private final TissueSpec spec;
    private final SignalCoupling coupling;
    private final double lo;
    private final double hi;
    private final List<Branch> branches;

    private ControlCircuit(TissueSpec spec, SignalCoupling coupling, double lo, double hi, List<Branch> branches) {
        this.spec = spec;
        this.coupling = coupling;
        this.lo = lo;
        this.hi = hi;
        this.branches = branches;
    }

    /**
     * The circuit of {@code spec} along its control parameter, continued with at most
     * {@code (max - min) / stepsAcross} per step; null when the tissue has no coupling, the
     * coupling's range is a single value, or the circuit has no steady state to continue over it.
     */
    public static ControlCircuit of(TissueSpec spec, int stepsAcross) {
        if (spec.mapping().couplings().isEmpty()) {
            return null;
        }
        SignalCoupling c = spec.mapping().couplings().get(0);
        double lo = c.law().range()[0];
        double hi = c.law().range()[1];
        if (!(hi > lo)) {
            return null;
        }
        NetworkSystem system = new NetworkSystem(spec.circuit().network(),
                spec.mapping().base(), c.parameterIndices());
        List<Branch> branches;
        try {
            branches = EquilibriumContinuation.of(system,
                    ContinuationSettings.defaults().withMaxStep((hi - lo) / stepsAcross))
                    .diagram(spec.circuit().initialState(), lo, lo, hi, true, 2);
        } catch (IllegalArgumentException | IllegalStateException e) {
            // No steady state to continue over the range (a pure integrator has none): nothing to show.
            return null;
        }
        return new ControlCircuit(spec, c, lo, hi, branches);
    }

    /** The steady-state branches. */
    public List<Branch> branches() {
        return branches;
    }

    /** The control parameter's name. */
    public String parameter() {
        return coupling.label();
    }

    /**
     * The middle of the coupling's range: where every Fatefield screen (analysis default, live
     * window, report) shows the landscape unless told otherwise.
     */
    public double middle() {
        return 0.5 * (lo + hi);
    }

    /**
     * The stationary landscape at control value {@code value}, solved on a grid (exact relative
     * well depths) over a square box holding every branch; null unless the circuit has two species.
     */
    public DoubleFunction<QuasiPotential> landscape() {
        CircuitSetup circuit = spec.circuit();
        if (circuit.network().speciesCount() != 2) {
            return null;
        }
        double[] upper = {0, 0};
        for (Branch b : branches) {
            for (BranchPoint p : b.points()) {
                upper[0] = Math.max(upper[0], 1.3 * p.state()[0]);
                upper[1] = Math.max(upper[1], 1.3 * p.state()[1]);
            }
        }
        for (int i = 0; i < 2; i++) {
            upper[i] = Math.max(upper[i], 2 * circuit.initialState()[i] + 1e-3);
        }
        // A square box: both species on the same scale, and a mirror-symmetric circuit gets a
        // mirror-symmetric grid.
        upper[0] = Math.max(upper[0], upper[1]);
        upper[1] = upper[0];
        int[] indices = coupling.parameterIndices();
        double[] base = spec.mapping().base();
        return value -> {
            double[] params = base.clone();
            for (int index : indices) {
                params[index] = value;
            }
            return StationaryFokkerPlanck.solve(circuit.network(), params, circuit.systemSize(), 0, 1,
                    new double[2], upper, LANDSCAPE_BINS);
        };
    }
}
