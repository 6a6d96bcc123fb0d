package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.output.Progress;
import org.fatefield.scenarios.output.RunLayout;
import org.fatefield.scenarios.output.RunRequest;
import org.fatefield.scenarios.output.ScenarioRunner;
import org.fatefield.scenarios.output.SnapshotFormat;
import org.fatefield.scenarios.output.Snapshots;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield run}: simulate a scenario and write its run folder. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Simulate a scenario and write its results to a folder.",
            "Writes timeseries.csv, population.csv, cells.csv, fate-proportions.png, tissue.png and, last, run.json."})
final class RunCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO",
            description = "a scenario file (TOML), or the name of a built-in scenario (demo)")
    private String scenario;

    @Mixin
    private SharedOptions.Out out;

    @Mixin
    private SharedOptions.Seed seed;

    @Mixin
    private SharedOptions.Force force;

    @Mixin
    private SharedOptions.Threads threads;

    @Mixin
    private SharedOptions.Confirm confirm;

    @Mixin
    private FigureOptions figures;

    @Option(names = "--checkpoint-every", paramLabel = "HOURS", description = "save a checkpoint every HOURS of"
            + " simulated time, so a killed run can be resumed (default: never)")
    private Double checkpointEvery;

    @Option(names = "--frames", paramLabel = "HOURS", description = "write a PNG frame of the tissue every HOURS of"
            + " simulated time into frames/, and tissue.gif at the end")
    private Double framesEvery;

    @Option(names = "--snapshots", description = "also write, at every record time, a table of every cell (position,"
            + " volume, molecules, control value, fate) and of every field's grid into snapshots/ (long format; the"
            + " size is estimated first, and over 2 GB needs --yes)")
    private boolean snapshots;

    @Option(names = "--vtk", description = "with --snapshots, also write each field at every record time as VTK"
            + " image data (snapshots/<field>-<step>.vti, XML, readable by 3-D viewers)")
    private boolean vtk;

    @Option(names = "--parquet", description = "also write the large tables as Parquet beside their CSV:"
            + " lineage.parquet, cells.parquet and, with --snapshots, snapshots/cells-<step>.parquet (same columns;"
            + " empty cells are nulls)")
    private boolean parquet;

    @Option(names = "--resume", description = "continue the run from the checkpoint in --out (same scenario and seed)")
    private boolean resume;

    @Option(names = "--quiet", description = "print nothing but errors")
    private boolean quiet;

    @Mixin
    private SharedOptions.Verbose verbose;

    /** Estimated snapshot size above which --yes is needed. */
    private static final double SNAPSHOT_CONFIRM_BYTES = 2e9;

    @Mixin
    private SharedOptions.Settings settings;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter outWriter = spec.commandLine().getOut();
        Scenario loaded;
        try {
            loaded = ScenarioArgument.load(scenario, settings.overrides());
        } catch (ScenarioException e) {
            err.println(e.getMessage());
            err.println("Nothing was run. Fix the lines above (see: fatefield scenario-help), then run again.");
            return FatefieldCommand.INVALID_INPUT;
        }
        if (!confirm.allows(spec, loaded)) {
            return FatefieldCommand.INVALID_INPUT;
        }
        long runSeed = seed.orElse(loaded.seed());
        Path folder = out.orElse(RunLayout.defaultFolder(loaded.name(), "-seed" + runSeed));
        boolean detail = verbose.on(spec, quiet);
        if (detail) {
            RunPlan.print(loaded, runSeed, threads.resolveFor(loaded), threads.reasonFor(loaded), outWriter);
        }
        Progress progress = quiet ? Progress.silent()
                : Progress.forConsole(loaded.name(), loaded.tissue().timing().totalSteps(), System.err);
        try {
            long every = 0;
            if (checkpointEvery != null) {
                if (!(checkpointEvery > 0)) {
                    err.println("--checkpoint-every must be greater than 0 hours, got " + checkpointEvery);
                    return FatefieldCommand.INVALID_INPUT;
                }
                every = Math.max(1, Math.round(checkpointEvery / loaded.tissue().timing().step()));
            }
            long frameSteps = 0;
            if (framesEvery != null) {
                if (!(framesEvery > 0)) {
                    err.println("--frames must be greater than 0 hours, got " + framesEvery);
                    return FatefieldCommand.INVALID_INPUT;
                }
                frameSteps = Math.max(1, Math.round(framesEvery / loaded.tissue().timing().step()));
            }
            if (vtk && !snapshots) {
                err.println("--vtk adds VTK files to the snapshots; give --snapshots as well");
                return FatefieldCommand.INVALID_INPUT;
            }
            if (snapshots) {
                double bytes = Snapshots.estimatedBytes(loaded.tissue(), WorkEstimate.of(loaded.tissue()).finalCells());
                if (bytes > SNAPSHOT_CONFIRM_BYTES && !confirm.given()) {
                    err.printf(Locale.ROOT, "--snapshots would write about %.1f GB; nothing was run. Add --yes to write"
                            + " them anyway, or record less often (run.record_every).%n", bytes / 1e9);
                    return FatefieldCommand.INVALID_INPUT;
                }
                if (!quiet) {
                    outWriter.printf(Locale.ROOT, "Snapshots: about %.0f MB into %s/%n", bytes / 1e6,
                            RunLayout.SNAPSHOTS);
                    outWriter.flush();
                }
            }
            Tissue tissue = ScenarioRunner.run(RunRequest.of(loaded, folder).withSeed(runSeed)
                    .withThreads(threads.resolveFor(loaded)).withForce(force.given()).withProgress(progress)
                    .withCheckpointSteps(every).withResume(resume).withFrameSteps(frameSteps)
                    .withSnapshots(!snapshots ? SnapshotFormat.NONE : vtk ? SnapshotFormat.TABLES_AND_VTK
                            : SnapshotFormat.TABLES).withFigures(figures.format()).withParquet(parquet));
            if (!quiet) {
                TimeSeries.Row last = tissue.series().last();
                List<String> fates = tissue.series().fateNames();
                StringBuilder summary = new StringBuilder();
                for (int f = 0; f < fates.size(); f++) {
                    summary.append(f == 0 ? "" : ", ").append(fates.get(f)).append(' ').append(last.fateCounts()[f]);
                }
                outWriter.printf("Finished %s (seed %d): %d cells at t = %.1f h (%s).%n", loaded.name(), runSeed,
                        last.population(), last.time(), summary);
                outWriter.printf("Results are in %s%n", folder.toAbsolutePath().normalize());
                if (detail) {
                    RunPlan.files(folder, outWriter);
                }
                outWriter.flush();
            }
            return 0;
        } catch (IOException e) {
            err.println("Cannot write results: " + IoMessages.describe(e));
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }
}
