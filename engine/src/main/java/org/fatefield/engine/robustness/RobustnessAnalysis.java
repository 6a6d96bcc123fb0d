package org.fatefield.engine.robustness;

import java.util.ArrayList;
import java.util.List;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.metrics.SampleSummary;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * How the pattern shifts when one quantity changes by a stated fraction f. Each perturbation is
 * run at factors 1 - f and 1 + f on the same replicate seeds; the sensitivity of a metric is the
 * central difference {@code (m(1+f) - m(1-f)) / (2 f)} (change per relative change of the
 * quantity), averaged over replicates, with a Student-t 95% interval from the paired differences
 * (common practice: common random numbers make the pairs correlate and the interval narrow).
 */
public final class RobustnessAnalysis {

    private RobustnessAnalysis() {
    }

    /**
     * One sensitivity.
     *
     * @param perturbation what was scaled
     * @param metric       the metric (boundary_<fate>_um, width_<fate>_um, fraction_<fate>)
     * @param sensitivity  mean central-difference sensitivity
     * @param low95        lower end of its 95% interval
     * @param high95       upper end
     * @param replicates   pairs used
     */
    public record Sensitivity(String perturbation, String metric, double sensitivity, double low95, double high95,
            int replicates) {
    }

    /** Runs the analysis. */
    public static List<Sensitivity> run(TissueSpec spec, List<Perturbation> perturbations, double fraction,
            int replicates, long seed, int threads) {
        return run(spec, perturbations, fraction, replicates, seed, threads, (done, total) -> { });
    }

    /** Told after each tissue of the analysis: how many are done of how many. */
    public interface Progress {
        /** {@code done} of {@code total} tissues have been run. */
        void tissuesDone(int done, int total);
    }

    /** Runs the analysis, telling {@code progress} after each tissue. */
    public static List<Sensitivity> run(TissueSpec spec, List<Perturbation> perturbations, double fraction,
            int replicates, long seed, int threads, Progress progress) {
        int total = 2 * replicates * perturbations.size();
        int done = 0;
        List<String> fates = spec.fates().fateNames();
        List<Sensitivity> out = new ArrayList<>();
        for (Perturbation p : perturbations) {
            double[][] up = new double[replicates][];
            double[][] down = new double[replicates][];
            for (int r = 0; r < replicates; r++) {
                up[r] = metrics(p.apply(spec, 1 + fraction), seed + r, threads);
                progress.tissuesDone(++done, total);
                down[r] = metrics(p.apply(spec, 1 - fraction), seed + r, threads);
                progress.tissuesDone(++done, total);
            }
            for (int m = 0; m < 3 * fates.size(); m++) {
                String name = (m < fates.size() ? "boundary_" + fates.get(m) + "_um"
                        : m < 2 * fates.size() ? "width_" + fates.get(m - fates.size()) + "_um"
                                : "fraction_" + fates.get(m - 2 * fates.size()));
                List<Double> differences = new ArrayList<>();
                for (int r = 0; r < replicates; r++) {
                    double d = (up[r][m] - down[r][m]) / (2 * fraction);
                    if (Double.isFinite(d)) {
                        differences.add(d);
                    }
                }
                out.add(summarise(p.name(), name, differences));
            }
        }
        return out;
    }

    private static double[] metrics(TissueSpec spec, long seed, int threads) {
        Tissue tissue = new Tissue(spec, seed, threads);
        tissue.start();
        tissue.runToEnd();
        tissue.finish();
        int fates = spec.fates().fateCount();
        FateProfile profile = FateProfile.of(tissue);
        double[] out = new double[3 * fates];
        for (int f = 0; f < fates; f++) {
            out[f] = profile.boundary(f);
            out[fates + f] = profile.width(f);
            out[2 * fates + f] = tissue.series().last().fraction(f);
        }
        return out;
    }

    private static Sensitivity summarise(String perturbation, String metric, List<Double> values) {
        SampleSummary s = SampleSummary.of(values);
        return new Sensitivity(perturbation, metric, s.mean(), s.low(), s.high(), s.count());
    }
}
