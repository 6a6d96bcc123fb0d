package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.ReplicateSet;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunFolderReader;
import org.fatefield.scenarios.output.RunLayout;
import org.fatefield.scenarios.output.RunRequest;
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
                    + " positions and widths (a row per seed, metric and fate), replicates.json their means and"
                    + " standard deviations (the positional error) beside the predicted fate-call boundary and,"
                    + " with morphogen amplitude_cv, the positional error the gradient predicts. Runs already finished (with run.json) are kept,"
                    + " so an interrupted set resumes."})
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

    @Mixin
    private FigureOptions figures;

    @Mixin
    private SharedOptions.Settings settings;

    @Mixin
    private SharedOptions.Quiet quiet;

    @Mixin
    private SharedOptions.Verbose verbose;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, settings.overrides(), spec.commandLine().getErr());
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
        if (verbose.on(spec, quiet.given())) {
            RunPlan.print(loaded, first, workers, spec.commandLine().getOut());
            spec.commandLine().getOut().printf("replicates: %d tissues on seeds %d to %d%n", runs, first,
                    first + runs - 1);
        }
        Path out = this.out.path();
        ReplicateSet set = new ReplicateSet(loaded.tissue().fates().fateNames());
        try {
            Files.createDirectories(out);
            for (int r = 0; r < runs; r++) {
                long s = first + r;
                Path folder = out.resolve(RunLayout.replicateFolder(s));
                RunFolderReader done = RunFolderReader.of(folder);
                if (!done.finished()) {
                    ScenarioRunner.run(RunRequest.of(loaded, folder).withSeed(s).withThreads(workers).withForce(true)
                            .withFigures(figures.format()));
                }
                set.add(s, done.metrics());
                quiet.progress(err).printf("replicate %d/%d (seed %d) done%n", r + 1, runs, s);
                err.flush();
            }
            set.write(RunFolder.open(out));
            Provenance.write(RunFolder.open(out), "replicates", workers, Map.of(loaded.source(), loaded.sha256()));
            PrintWriter o = spec.commandLine().getOut();
            o.printf("%d replicates of %s; results are in %s%n", runs, loaded.name(), out.toAbsolutePath().normalize());
            o.flush();
            return 0;
        } catch (IOException e) {
            err.println("Cannot write results: " + IoMessages.describe(e));
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }

}
