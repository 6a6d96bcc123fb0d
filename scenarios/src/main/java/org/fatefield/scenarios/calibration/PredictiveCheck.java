package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.inference.Candidate;
import org.fatefield.circuits.inference.Generation;
import org.fatefield.circuits.inference.Population;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.output.AxisWords;
import org.fatefield.scenarios.output.MetricRows;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.viz.calibration.PredictiveCheckChart;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.FigureFormat;

/**
 * The posterior predictive check (Gelman, Meng &amp; Stern 1996, Statistica Sinica 6:733): new
 * tissues from particles drawn by weight from the final population, their statistics beside the
 * data. Writes {@code predictive.csv} (long, as {@link MetricRows}: a row per predictive tissue
 * and statistic), {@code predictive-summary.csv} (per model, metric and fate: observed value and uncertainty,
 * predictive median and central 95%, and the fraction of predictive tissues below the
 * observation) and {@code predictive.png}/{@code .svg}.
 */
final class PredictiveCheck {

    private PredictiveCheck() {
    }

    static void run(CalibrationDefinition definition, Generation last, TissueBatchSimulator simulator,
            RunFolder folder, FigureFormat figures) throws IOException {
        int draws = definition.predictive();
        if (draws == 0) {
            return;
        }
        List<Candidate> batch = new ArrayList<>();
        for (Population p : last.populations()) {
            if (p.size() == 0) {
                continue;
            }
            UniformRandomProvider random = RandomStreams.of(definition.settings().seed()).stream(-1_000 - p.model());
            for (int i = 0; i < draws; i++) {
                int j = p.pick(random.nextDouble());
                batch.add(new Candidate(p.model(), 0, 0, i, p.theta()[j].clone(), random.nextLong() >>> 11));
            }
        }
        double[][] stats = simulator.simulate("predictive", batch);
        List<Observation> observations = definition.data().observations();
        folder.writeText("predictive.csv", w -> {
            CSVPrinter csv = RunTables.printer(w);
            List<String> header = new ArrayList<>(List.of("model", "draw"));
            header.addAll(MetricRows.COLUMNS);
            csv.printRecord(header);
            for (int i = 0; i < batch.size(); i++) {
                String model = definition.models().get(batch.get(i).model()).name();
                String draw = Integer.toString(batch.get(i).index() + 1);
                for (int s = 0; s < observations.size(); s++) {
                    List<String> row = new ArrayList<>(List.of(model, draw));
                    row.addAll(MetricRows.tail(observations.get(s).name(), stats[i] == null ? Double.NaN : stats[i][s]));
                    csv.printRecord(row);
                }
            }
            csv.flush();
        });
        List<String> labels = new ArrayList<>();
        List<double[]> bars = new ArrayList<>();
        folder.writeText("predictive-summary.csv", w -> {
            CSVPrinter csv = RunTables.printer(w);
            csv.printRecord("model", "metric", "fate", "observed", "sd", "predictive_median", "predictive_q025",
                    "predictive_q975", "fraction_below_observed", "tissues");
            for (int m = 0; m < definition.models().size(); m++) {
                for (int s = 0; s < observations.size(); s++) {
                    Observation o = observations.get(s);
                    double[] values = column(batch, stats, m, s);
                    double[] q = values.length == 0 ? new double[] {Double.NaN, Double.NaN, Double.NaN}
                            : new double[] {quantile(values, 0.5), quantile(values, 0.025), quantile(values, 0.975)};
                    long below = Arrays.stream(values).filter(v -> v < o.value()).count();
                    MetricRows.Metric name = MetricRows.split(o.name());
                    csv.printRecord(definition.models().get(m).name(), name.metric(), name.fate(),
                            RunTables.number(o.value()), RunTables.number(o.sd()), cell(q[0]), cell(q[1]), cell(q[2]),
                            values.length == 0 ? "" : RunTables.number((double) below / values.length), values.length);
                    labels.add((definition.models().size() > 1 ? definition.models().get(m).name() + ": " : "")
                            + AxisWords.metric(o.name()));
                    bars.add(new double[] {(q[0] - o.value()) / o.sd(), (q[1] - o.value()) / o.sd(),
                        (q[2] - o.value()) / o.sd()});
                }
            }
            csv.flush();
        });
        double[] median = bars.stream().mapToDouble(b -> b[0]).toArray();
        double[] low = bars.stream().mapToDouble(b -> b[1]).toArray();
        double[] high = bars.stream().mapToDouble(b -> b[2]).toArray();
        var chart = PredictiveCheckChart.create("Posterior predictive check (" + draws + " tissues per model)", labels,
                median, low, high);
        int height = 520 + 14 * labels.stream().mapToInt(String::length).max().orElse(0) / 2;
        folder.write("predictive.png", out -> ChartFiles.png(chart, 900, height, figures, out));
        folder.write("predictive.svg", out -> ChartFiles.svg(chart, 900, height, figures, out));
    }

    private static String cell(double v) {
        return Double.isFinite(v) ? RunTables.number(v) : "";
    }

    private static double[] column(List<Candidate> batch, double[][] stats, int model, int s) {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < batch.size(); i++) {
            if (batch.get(i).model() == model && stats[i] != null && Double.isFinite(stats[i][s])) {
                out.add(stats[i][s]);
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    }

    /** The p-quantile of sorted values, by linear interpolation between order statistics (common practice). */
    static double quantile(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(sorted.length - 1, lo + 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }
}
