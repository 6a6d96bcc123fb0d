package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.util.List;
import org.fatefield.circuits.inference.Generation;
import org.fatefield.circuits.inference.Population;
import org.fatefield.circuits.inference.Prior;
import org.fatefield.scenarios.output.AxisWords;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.viz.calibration.PairsPlot;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.FigureFormat;

/**
 * The posterior's pairs plot, {@code pairs.png}/{@code .svg} (one model) or {@code
 * pairs-<n>.png}/{@code .svg} per model, with each parameter's axis over its prior range (the
 * sample's range for a normal prior) and log axes for log-uniform priors.
 */
final class CalibrationFigures {

    private CalibrationFigures() {
    }

    static void write(CalibrationDefinition definition, Generation last, RunFolder folder, FigureFormat figures)
            throws IOException {
        int models = definition.models().size();
        for (Population p : last.populations()) {
            if (p.size() == 0) {
                continue;
            }
            CalibrationModel model = definition.models().get(p.model());
            int k = model.parameters().size();
            double[][] ranges = new double[k][];
            boolean[] log = new boolean[k];
            for (int a = 0; a < k; a++) {
                Prior prior = model.parameters().get(a).prior();
                if (prior instanceof Prior.Uniform u) {
                    ranges[a] = new double[] {u.low(), u.high()};
                } else if (prior instanceof Prior.LogUniform l) {
                    ranges[a] = new double[] {l.low(), l.high()};
                    log[a] = true;
                } else {
                    double lo = Double.POSITIVE_INFINITY;
                    double hi = Double.NEGATIVE_INFINITY;
                    for (double[] row : p.theta()) {
                        lo = Math.min(lo, row[a]);
                        hi = Math.max(hi, row[a]);
                    }
                    double pad = hi > lo ? 0.05 * (hi - lo) : 1;
                    ranges[a] = new double[] {lo - pad, hi + pad};
                }
            }
            List<String> names = model.parameters().stream().map(c -> AxisWords.key(c.key())).toList();
            String title = "Posterior of " + model.name() + " (" + p.size() + " particles, "
                    + (Double.isInfinite(last.tolerance()) ? "prior sample only"
                            : "tolerance " + String.format(java.util.Locale.ROOT, "%.3g", last.tolerance())) + ")";
            PairsPlot plot = new PairsPlot(title, names, p.theta(), p.weights(), ranges, log);
            int size = Math.max(420, 300 * k);
            String name = models == 1 ? "pairs" : "pairs-" + (p.model() + 1);
            folder.write(name + ".png", out -> ChartFiles.png(plot, size, size, figures, out));
            folder.write(name + ".svg", out -> ChartFiles.svg(plot, size, size, figures, out));
        }
    }
}
