package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.robustness.Perturbation;
import org.fatefield.engine.robustness.RobustnessAnalysis;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.AxisWords;
import org.fatefield.scenarios.output.MetricRows;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.SensitivityChart;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield robustness}: how the pattern shifts when each quantity changes a little. */
@Command(name = "robustness", mixinStandardHelpOptions = true,
        description = {"Perturb the morphogen amplitude, tissue size, noise level and each circuit parameter by"
                + " +-FRACTION and report how boundary positions, widths and fate proportions shift.",
            "Writes robustness.csv (sensitivity = change per relative change, with 95%% intervals over replicate"
                    + " pairs run on the same seeds) and robustness.png for the chosen metric."})
final class RobustnessCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "a scenario file, or a built-in name (demo)")
    private String scenario;

    @Option(names = "--fraction", paramLabel = "F", defaultValue = "0.1",
            description = "relative perturbation (default: ${DEFAULT-VALUE})")
    private double fraction;

    @Option(names = "--replicates", paramLabel = "N", defaultValue = "3",
            description = "seed pairs per perturbation (default: ${DEFAULT-VALUE})")
    private int replicates;

    @Option(names = "--only", paramLabel = "WHICH", defaultValue = "all",
            description = "all, or tissue (amplitude, size and noise only) (default: ${DEFAULT-VALUE})")
    private String only;

    @Option(names = "--metric", paramLabel = "NAME",
            description = "metric of the figure (default: boundary of the default fate)")
    private String metric;

    @Mixin
    private SharedOptions.RequiredOut out;

    @Mixin
    private SharedOptions.Threads threads;

    @Mixin
    private FigureOptions figures;

    @Mixin
    private SharedOptions.Quiet quiet;

    @Mixin
    private SharedOptions.Verbose verbose;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        SharedOptions.require(spec, fraction > 0 && fraction < 1, "--fraction", fraction,
                "must be greater than 0 and less than 1 (0.1 perturbs each value by 10%)");
        SharedOptions.require(spec, replicates >= 2, "--replicates", replicates,
                "must be at least 2 (a spread needs two seed pairs)");
        SharedOptions.require(spec, List.of("all", "tissue").contains(only), "--only", only, "must be all or tissue");
        PrintWriter err = spec.commandLine().getErr();
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, spec.commandLine().getErr());
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        List<Perturbation> perturbations = Perturbation.all(loaded.tissue());
        if (only.equals("tissue")) {
            perturbations = perturbations.subList(0, 3);
        }
        List<String> fates = loaded.tissue().fates().fateNames();
        String chosen = metric != null ? metric : "boundary_" + fates.get(fates.size() - 1) + "_um";
        try {
            Path out = this.out.path();
            RunFolder.checkUsable(out, false, false);
            int workers = threads.resolveFor(loaded);
            if (verbose.on(spec, quiet.given())) {
                PrintWriter o = spec.commandLine().getOut();
                RunPlan.print(loaded, loaded.seed(), workers, o);
                o.printf(Locale.ROOT, "perturbations (each by ±%s%%, %d seed pairs): %s%n",
                        RunTables.number(100 * fraction), replicates,
                        String.join(", ", perturbations.stream().map(Perturbation::name).toList()));
                o.flush();
            }
            long start = System.nanoTime();
            List<RobustnessAnalysis.Sensitivity> result = RobustnessAnalysis.run(loaded.tissue(), perturbations,
                    fraction, replicates, loaded.seed(), workers, (done, total) -> {
                        quiet.progress(err).printf(Locale.ROOT, "robustness: %d/%d tissues done (%.1f s)%n", done, total,
                                (System.nanoTime() - start) / 1e9);
                        err.flush();
                    });
            RunFolder folder = RunFolder.open(out);
            Provenance.write(folder, "robustness", workers, Map.of(loaded.source(), loaded.sha256()));
            folder.writeText("robustness.csv", w -> {
                CSVPrinter printer = RunTables.printer(w);
                printer.printRecord("perturbation", "metric", "fate", "sensitivity", "ci95_low", "ci95_high", "pairs");
                for (RobustnessAnalysis.Sensitivity s : result) {
                    MetricRows.Metric metric = MetricRows.split(s.metric());
                    printer.printRecord(s.perturbation(), metric.metric(), metric.fate(), RunTables.number(s.sensitivity()),
                            RunTables.number(s.low95()), RunTables.number(s.high95()), s.replicates());
                }
                printer.flush();
            });
            List<RobustnessAnalysis.Sensitivity> shown = result.stream().filter(s -> s.metric().equals(chosen)).toList();
            List<String> names = new ArrayList<>();
            double[] values = new double[shown.size()];
            double[] halves = new double[shown.size()];
            for (int i = 0; i < shown.size(); i++) {
                String name = shown.get(i).perturbation();
                names.add(name.contains(".") ? AxisWords.key(name) : name);
                values[i] = Double.isFinite(shown.get(i).sensitivity()) ? shown.get(i).sensitivity() : 0;
                halves[i] = 0.5 * (shown.get(i).high95() - shown.get(i).low95());
            }
            var chart = SensitivityChart.create(AxisWords.metric(chosen), fraction, names, values, halves);
            int height = Math.max(400, 60 + 28 * names.size());
            folder.write("robustness.png", o -> ChartFiles.png(chart, 960, height, figures.format(), o));
            folder.write("robustness.svg", o -> ChartFiles.svg(chart, 960, height, figures.format(), o));
            spec.commandLine().getOut().printf("%d perturbations x 2 x %d replicates; results are in %s%n",
                    perturbations.size(), replicates, out.toAbsolutePath().normalize());
            return 0;
        } catch (IOException e) {
            err.println("Cannot write results: " + IoMessages.describe(e));
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }
}
