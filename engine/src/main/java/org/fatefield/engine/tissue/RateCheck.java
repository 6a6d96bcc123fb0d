package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.engine.coupling.SignalCoupling;

/**
 * Checks before a run that every reaction rate is a finite number of at least 0 where the run
 * will certainly evaluate it: at the initial state and at zero concentrations, with the
 * coupled parameters at each end of their coupling's range (all combinations, for up to four
 * couplings). A negative rate would otherwise be clamped to zero by the exact methods and
 * followed backwards by the others, silently; a non-finite one would stop the run only after
 * it had started.
 */
public final class RateCheck {

    private static final int MAX_CORNER_COUPLINGS = 4;

    private RateCheck() {
    }

    /** What is wrong with the rates of {@code spec}'s circuit, one message per problem (empty if nothing). */
    public static List<String> problems(TissueSpec spec) {
        ReactionNetwork network = spec.circuit().network();
        List<SignalCoupling> couplings = spec.mapping().couplings();
        int k = Math.min(couplings.size(), MAX_CORNER_COUPLINGS);
        double[] initial = spec.circuit().initialState();
        double[][] states = {initial, new double[initial.length]};
        String[] stateNames = {"the initial state", "zero concentrations"};
        double[] propensity = new double[network.reactionCount()];
        List<String> problems = new ArrayList<>();
        for (int corner = 0; corner < (1 << k); corner++) {
            double[] p = spec.mapping().base().clone();
            StringBuilder where = new StringBuilder();
            for (int c = 0; c < k; c++) {
                SignalCoupling coupling = couplings.get(c);
                double value = coupling.law().range()[(corner >> c) & 1];
                for (int index : coupling.parameterIndices()) {
                    p[index] = value;
                }
                where.append(String.format(Locale.ROOT, "%s%s = %.6g", where.length() == 0 ? "" : ", ",
                        coupling.label(), value));
            }
            for (int s = 0; s < states.length; s++) {
                network.propensities(states[s], p, propensity);
                for (int r = 0; r < propensity.length; r++) {
                    String problem = !Double.isFinite(propensity[r]) ? "is not a finite number (" + propensity[r] + ")"
                            : propensity[r] < 0 ? String.format(Locale.ROOT, "is negative (%.6g); a rate must be at"
                                    + " least 0", propensity[r]) : null;
                    if (problem != null) {
                        problems.add(String.format(Locale.ROOT, "the rate of %s %s at %s %s%s", network.reactionName(r),
                                problem, stateNames[s], Arrays.toString(states[s]),
                                where.length() == 0 ? "" : " with " + where + " (an end of the coupling's range)"));
                    }
                }
            }
            if (!problems.isEmpty()) {
                return problems;
            }
        }
        return problems;
    }
}
