package org.fatefield.engine.metrics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.study.AnalysisPlan;
import org.fatefield.circuits.study.CircuitAnalysis;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * Fates that no stable steady state of the circuit meets anywhere over the coupling's range: a
 * rule a cell can satisfy only by a noise excursion, if at all, and usually a typo in a level.
 * The steady states are those on the branches continued from every steady state found at both
 * ends and the middle of the first coupling's range (as {@code fatefield analyze} traces them);
 * a circuit without a coupling is continued over 0.9 to 1.1 times its first parameter. Advice,
 * not proof: a stable state on no traced branch (an isola) is not seen.
 */
public final class FateReach {

    private FateReach() {
    }

    /** One message per fate other than the default that no stable steady state meets; empty if all are met. */
    public static List<String> unmet(TissueSpec spec) {
        List<SignalCoupling> couplings = spec.mapping().couplings();
        double[] base = spec.mapping().base();
        if (base.length == 0) {
            return List.of();
        }
        int[] indices = couplings.isEmpty() ? new int[] {0} : couplings.get(0).parameterIndices();
        String name = couplings.isEmpty() ? "its first parameter" : couplings.get(0).label();
        double[] range = couplings.isEmpty() ? new double[] {0.9 * base[0], 1.1 * base[0]}
                : couplings.get(0).law().range();
        double lo = range[0];
        double hi = range[1] > range[0] ? range[1] : range[0] + Math.max(1e-6, 0.1 * Math.abs(range[0]));
        List<Branch> branches;
        try {
            int n = spec.circuit().network().speciesCount();
            AnalysisPlan plan = new AnalysisPlan(name, indices, lo, hi, 0.5 * (lo + hi), null, new int[0], 0, 0, 0,
                    n > 1 ? 1 : -1, spec.circuit().systemSize(), 2, 10, 1);
            branches = new CircuitAnalysis(spec.circuit().network(), base, plan).diagram();
        } catch (IllegalArgumentException | IllegalStateException e) {
            return List.of();
        }
        FateClassifier fates = spec.fates();
        boolean[] met = new boolean[fates.fateCount()];
        for (Branch b : branches) {
            for (BranchPoint p : b.points()) {
                if (p.stable()) {
                    met[fates.classify(p.state())] = true;
                }
            }
        }
        List<String> out = new ArrayList<>();
        for (int f = 0; f + 1 < fates.fateCount(); f++) {
            if (!met[f]) {
                out.add(String.format(Locale.ROOT, "no stable steady state meets fate '%s' for %s in [%.4g, %.4g]:"
                        + " cells reach it only by noise, if at all (check its levels against the steady states"
                        + " that fatefield analyze lists)", fates.fateNames().get(f), name, lo, hi));
            }
        }
        return out;
    }
}
