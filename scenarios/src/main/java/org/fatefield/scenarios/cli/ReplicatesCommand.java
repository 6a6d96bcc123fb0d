package org.fatefield.scenarios.cli;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.Progress;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunMetrics;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.scenarios.output.ScenarioRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield replicates}: the same scenario on several seeds, and the precision of its boundaries. */
@Command(name = "replicates", mixinStandardHelpOptions = true,
        description = {"Run a scenario on consecutive seeds and measure how precise its pattern is.",
            "Each replicate tissue gets its own run folder (seed-<N>); replicates.csv lists every run's boundary"
                    + " positions and widths, replicates.json their means and standard deviations (the positional"
                    + " error). Runs already finished (with run.json) are kept, so an interrupted set resumes."})
final class ReplicatesCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "a scenario file, or a built-in name (demo)")
    private String scenario;

    @Option(names = "--runs", paramLabel = "N", required = true, description = "number of replicate tissues")
    private int runs;

    @Option(names = "--seed", paramLabel = "N", description = "first seed (default: the scenario's)")
    private Long seed;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "folder for the replicate set")
    private Path out;

    @Option(names = "--threads", paramLabel = "N", description = "threads per run (default: all processors)")
    private Integer threads;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, spec.commandLine().getErr());
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        if (runs < 2) {
            err.println("--runs must be at least 2 to measure a spread, got " + runs);
            return FatefieldCommand.INVALID_INPUT;
        }
        long first = seed != null ? seed : loaded.seed();
        int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        List<String> fates = loaded.tissue().fates().fateNames();
        double[][] boundaries = new double[fates.size()][runs];
        double[][] widths = new double[fates.size()][runs];
        try {
            Files.createDirectories(out);
            for (int r = 0; r < runs; r++) {
                long s = first + r;
                Path folder = out.resolve("seed-" + s);
                if (!Files.exists(folder.resolve(ScenarioRunner.PROVENANCE))) {
                    Tissue tissue = ScenarioRunner.run(loaded, s, workers, folder, true, Progress.silent());
                    measure(RunMetrics.of(tissue).profile(), r, boundaries, widths);
                } else {
                    measure(ProfileFile.read(folder.resolve("profile.csv"), fates.size(), loaded.tissue().width()), r,
                            boundaries, widths);
                }
                err.printf("replicate %d/%d (seed %d) done%n", r + 1, runs, s);
                err.flush();
            }
            RunFolder set = RunFolder.open(out);
            set.writeText("replicates.csv", w -> {
                CSVPrinter printer = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
                List<String> header = new ArrayList<>(List.of("seed"));
                for (String f : fates) {
                    header.add("boundary_" + f + "_um");
                    header.add("width_" + f + "_um");
                }
                printer.printRecord(header);
                for (int r = 0; r < runs; r++) {
                    List<String> row = new ArrayList<>(List.of(Long.toString(first + r)));
                    for (int f = 0; f < fates.size(); f++) {
                        row.add(RunTables.number(boundaries[f][r]));
                        row.add(RunTables.number(widths[f][r]));
                    }
                    printer.printRecord(row);
                }
                printer.flush();
            });
            JsonObject summary = new JsonObject();
            summary.addProperty("runs", runs);
            summary.addProperty("first_seed", first);
            for (int f = 0; f < fates.size(); f++) {
                double[] stats = meanAndSd(boundaries[f]);
                JsonObject fate = new JsonObject();
                fate.addProperty("runs_with_boundary", (int) stats[2]);
                fate.addProperty("mean_boundary_um", Double.isFinite(stats[0]) ? stats[0] : null);
                fate.addProperty("positional_error_sd_um", Double.isFinite(stats[1]) ? stats[1] : null);
                summary.add(fates.get(f), fate);
            }
            set.writeText("replicates.json", w -> w.write(
                    new GsonBuilder().setPrettyPrinting().serializeNulls().create().toJson(summary) + "\n"));
            PrintWriter o = spec.commandLine().getOut();
            o.printf("%d replicates of %s; results are in %s%n", runs, loaded.name(), out.toAbsolutePath().normalize());
            o.flush();
            return 0;
        } catch (IOException e) {
            err.println("Cannot write results: " + e.getMessage());
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }

    private static void measure(FateProfile profile, int r, double[][] boundaries, double[][] widths) {
        for (int f = 0; f < boundaries.length; f++) {
            boundaries[f][r] = profile.boundary(f);
            widths[f][r] = profile.width(f);
        }
    }

    /** Mean, sample standard deviation and count of the finite values. */
    static double[] meanAndSd(double[] values) {
        double sum = 0;
        int n = 0;
        for (double v : values) {
            if (Double.isFinite(v)) {
                sum += v;
                n++;
            }
        }
        double mean = n > 0 ? sum / n : Double.NaN;
        double ss = 0;
        for (double v : values) {
            if (Double.isFinite(v)) {
                ss += (v - mean) * (v - mean);
            }
        }
        return new double[] {mean, n > 1 ? Math.sqrt(ss / (n - 1)) : Double.NaN, n};
    }
}
