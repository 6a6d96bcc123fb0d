package org.fatefield.scenarios.cli;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.metrics.SampleSummary;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunFolderReader;
import org.fatefield.scenarios.output.RunLayout;
import org.fatefield.scenarios.output.RunMetrics;
import org.fatefield.scenarios.output.RunRequest;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.scenarios.output.ScenarioRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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

    @Mixin
    private SharedOptions.Seed seed;

    @Mixin
    private SharedOptions.RequiredOut out;

    @Mixin
    private SharedOptions.Threads threads;

    @Mixin
    private SharedOptions.Confirm confirm;

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
        if (!confirm.allows(spec, loaded)) {
            return FatefieldCommand.INVALID_INPUT;
        }
        long first = seed.orElse(loaded.seed());
        int workers = threads.resolveFor(loaded);
        Path out = this.out.path();
        List<String> fates = loaded.tissue().fates().fateNames();
        double[][] boundaries = new double[fates.size()][runs];
        double[][] widths = new double[fates.size()][runs];
        try {
            Files.createDirectories(out);
            for (int r = 0; r < runs; r++) {
                long s = first + r;
                Path folder = out.resolve(RunLayout.replicateFolder(s));
                RunFolderReader done = RunFolderReader.of(folder);
                if (!done.finished()) {
                    Tissue tissue = ScenarioRunner.run(RunRequest.of(loaded, folder).withSeed(s).withThreads(workers)
                            .withForce(true));
                    measure(RunMetrics.of(tissue).profile(), r, boundaries, widths);
                } else {
                    measure(done.fateProfile(fates, loaded.tissue().width()), r, boundaries, widths);
                }
                err.printf("replicate %d/%d (seed %d) done%n", r + 1, runs, s);
                err.flush();
            }
            RunFolder set = RunFolder.open(out);
            set.writeText(RunLayout.REPLICATES_TABLE, w -> {
                CSVPrinter printer = RunTables.printer(w);
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
                SampleSummary stats = SampleSummary.of(boundaries[f]);
                JsonObject fate = new JsonObject();
                fate.addProperty("runs_with_boundary", stats.count());
                fate.addProperty("mean_boundary_um", JsonFiles.finite(stats.mean()));
                fate.addProperty("positional_error_sd_um", JsonFiles.finite(stats.sd()));
                summary.add(fates.get(f), fate);
            }
            set.writeText(RunLayout.REPLICATES_SUMMARY, w -> w.write(JsonFiles.text(summary)));
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

}
