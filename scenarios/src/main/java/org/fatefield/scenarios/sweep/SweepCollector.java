package org.fatefield.scenarios.sweep;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.metrics.SampleSummary;
import org.fatefield.scenarios.output.AxisWords;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.MetricRows;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.SweepCharts;

/**
 * Gathers a sweep's results into {@code runs.csv} (long: a row per run and metric, with the
 * run's id, point, replicate, seed, varied values and status before {@link MetricRows}' metric,
 * fate and value; a failed or missing run has one row with those empty), {@code summary.csv}
 * (per point, metric and fate: runs, mean, standard deviation and Student-t 95% interval over
 * replicates) and plots of each metric against the
 * varied values (one value: line with band; two on a grid: map).
 */
public final class SweepCollector {

    private SweepCollector() {
    }

    /** What was found. */
    public record Report(int complete, List<String> failed, List<String> missing) {
    }

    /** Collects the sweep in {@code folder}. */
    public static Report collect(Path folder) throws IOException {
        SweepRunner runner = new SweepRunner(folder);
        Manifest manifest = runner.manifest();
        Map<String, Map<String, Double>> metrics = new LinkedHashMap<>();
        Map<String, String> status = new LinkedHashMap<>();
        TreeSet<String> names = new TreeSet<>();
        List<String> failed = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        for (Manifest.Run run : manifest.runs()) {
            if (runner.valid(run)) {
                JsonObject json = JsonFiles.read(runner.resultFile(run)).getAsJsonObject("metrics");
                Map<String, Double> values = new LinkedHashMap<>();
                json.keySet().forEach(k -> values.put(k, json.get(k).getAsDouble()));
                names.addAll(values.keySet());
                metrics.put(run.id(), values);
                status.put(run.id(), "complete");
            } else if (Files.exists(folder.resolve(SweepRunner.RESULTS).resolve(run.id() + ".failed.json"))) {
                status.put(run.id(), "failed");
                failed.add(run.id());
            } else {
                status.put(run.id(), "missing");
                missing.add(run.id());
            }
        }
        List<String> metricNames = new ArrayList<>(names);
        RunFolder out = RunFolder.open(folder);
        out.writeText("runs.csv", w -> {
            CSVPrinter printer = RunTables.printer(w);
            List<String> header = new ArrayList<>(List.of("run_id", "point", "replicate", "seed"));
            header.addAll(manifest.keys());
            header.add("status");
            header.addAll(MetricRows.COLUMNS);
            printer.printRecord(header);
            for (Manifest.Run run : manifest.runs()) {
                List<String> head = new ArrayList<>(List.of(run.id(), Integer.toString(run.point()),
                        Integer.toString(run.replicate()), Long.toString(run.seed())));
                for (double v : run.values()) {
                    head.add(RunTables.number(v));
                }
                head.add(status.get(run.id()));
                Map<String, Double> m = metrics.get(run.id());
                if (m == null) {
                    // A failed or missing run: one row, its metric columns empty.
                    List<String> row = new ArrayList<>(head);
                    row.addAll(List.of("", "", ""));
                    printer.printRecord(row);
                    continue;
                }
                for (String name : metricNames) {
                    if (m.containsKey(name)) {
                        List<String> row = new ArrayList<>(head);
                        row.addAll(MetricRows.tail(name, m.get(name)));
                        printer.printRecord(row);
                    }
                }
            }
            printer.flush();
        });
        int points = manifest.runs().stream().mapToInt(Manifest.Run::point).max().orElse(-1) + 1;
        double[][] pointValues = new double[points][];
        double[][][] stats = new double[points][metricNames.size()][];
        for (int p = 0; p < points; p++) {
            final int point = p;
            List<Manifest.Run> runs = manifest.runs().stream().filter(r -> r.point() == point).toList();
            pointValues[p] = runs.get(0).values();
            for (int m = 0; m < metricNames.size(); m++) {
                String name = metricNames.get(m);
                double[] v = runs.stream().map(r -> metrics.getOrDefault(r.id(), Map.of()).get(name))
                        .filter(x -> x != null).mapToDouble(Double::doubleValue).toArray();
                stats[p][m] = summary(v);
            }
        }
        out.writeText("summary.csv", w -> {
            CSVPrinter printer = RunTables.printer(w);
            List<String> header = new ArrayList<>(List.of("point"));
            header.addAll(manifest.keys());
            header.addAll(List.of("metric", "fate", "runs", "mean", "sd", "ci95_low", "ci95_high"));
            printer.printRecord(header);
            for (int p = 0; p < points; p++) {
                for (int m = 0; m < metricNames.size(); m++) {
                    List<String> row = new ArrayList<>(List.of(Integer.toString(p)));
                    for (double v : pointValues[p]) {
                        row.add(RunTables.number(v));
                    }
                    double[] s = stats[p][m];
                    MetricRows.Metric name = MetricRows.split(metricNames.get(m));
                    row.addAll(List.of(name.metric(), name.fate(), Integer.toString((int) s[0]), RunTables.number(s[1]),
                            RunTables.number(s[2]), RunTables.number(s[3]), RunTables.number(s[4])));
                    printer.printRecord(row);
                }
            }
            printer.flush();
        });
        plots(out, manifest, metricNames, pointValues, stats);
        return new Report(metrics.size(), failed, missing);
    }

    private static void plots(RunFolder out, Manifest manifest, List<String> metricNames, double[][] pointValues,
            double[][][] stats) throws IOException {
        int keys = manifest.keys().size();
        if (keys > 2 || pointValues.length < 2) {
            return;
        }
        Integer[] order = new Integer[pointValues.length];
        for (int p = 0; p < order.length; p++) {
            order[p] = p;
        }
        Arrays.sort(order, (a, b) -> Double.compare(pointValues[a][0], pointValues[b][0]));
        for (int m = 0; m < metricNames.size(); m++) {
            String metric = metricNames.get(m);
            double[] x = new double[order.length];
            double[] y = new double[order.length];
            double[] mean = new double[order.length];
            double[] low = new double[order.length];
            double[] high = new double[order.length];
            for (int i = 0; i < order.length; i++) {
                int p = order[i];
                x[i] = pointValues[p][0];
                y[i] = keys == 2 ? pointValues[p][1] : 0;
                mean[i] = stats[p][m][1];
                low[i] = stats[p][m][3];
                high[i] = stats[p][m][4];
            }
            String first = AxisWords.key(manifest.keys().get(0));
            String words = AxisWords.metric(metric);
            var chart = keys == 1 ? SweepCharts.line(first, words, x, mean, low, high)
                    : SweepCharts.map(first, AxisWords.key(manifest.keys().get(1)), words, x, y, mean);
            out.write("plot-" + metric + ".png", o -> ChartFiles.png(chart, 900, 560, o));
        }
    }

    /** Count, mean, standard deviation and the Student-t 95% interval of the mean. */
    static double[] summary(double[] v) {
        SampleSummary s = SampleSummary.of(v);
        return new double[] {s.count(), s.mean(), s.sd(), s.low(), s.high()};
    }
}
