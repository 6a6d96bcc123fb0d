package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.sweep.ContainerImage;
import org.fatefield.scenarios.sweep.Manifest;
import org.fatefield.scenarios.sweep.SlurmScript;
import org.fatefield.scenarios.sweep.SweepCollector;
import org.fatefield.scenarios.sweep.SweepDefinition;
import org.fatefield.scenarios.sweep.SweepRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield sweep}: plan, run (locally or as a SLURM array), and collect parameter sweeps. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = {"Vary scenario values over many runs, on one machine or as cluster array jobs.",
            "A sweep file (TOML) has [sweep] with scenario (a file next to it or a built-in), design (grid,"
                    + " latin-hypercube, sobol, table), points, replicates and seed, and one [[parameter]] per varied"
                    + " value: key (a scenario key path such as morphogen.source[1].rate or coupling[1].gain)"
                    + " with values = [...] or low, high, steps and scale (linear or log).",
            "design = \"table\" takes the points from table = \"<file>.csv\" next to the sweep file instead: its"
                    + " header names the keys, each row is one point."},
        subcommands = {SweepCommand.Plan.class, SweepCommand.Run.class, SweepCommand.Slurm.class,
            SweepCommand.Collect.class})
final class SweepCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** {@code sweep plan}. */
    @Command(name = "plan", mixinStandardHelpOptions = true,
            description = "Write the sweep folder: manifest.csv (run ids, seeds, values) and the base scenario.")
    static final class Plan implements Callable<Integer> {

        @Parameters(index = "0", paramLabel = "FILE", description = "the sweep file")
        private Path file;

        @Option(names = "--out", paramLabel = "DIR", required = true, description = "the sweep folder to create")
        private Path out;

        @CommandLine.Spec
        private CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            PrintWriter err = spec.commandLine().getErr();
            try {
                SweepDefinition sweep = SweepDefinition.read(file);
                Manifest manifest = Manifest.plan(sweep);
                // The base scenario's own folder: its includes are found there.
                Path baseFile = file.toAbsolutePath().getParent().resolve(sweep.scenarioLabel()).normalize();
                Path baseFolder = Files.isRegularFile(baseFile) ? baseFile.getParent() : null;
                byte[] baseBytes = sweep.scenarioText().getBytes(StandardCharsets.UTF_8);
                Scenario base = ScenarioReader.parse(sweep.scenarioLabel(), "base", baseBytes, baseFolder);
                // Every variant must be a valid scenario before anything is written.
                for (double[] values : sweep.pointValues()) {
                    Overrides variant = Overrides.none();
                    for (int k = 0; k < values.length; k++) {
                        variant = variant.with(sweep.parameters().get(k).key(), values[k]);
                    }
                    Scenario planned = ScenarioReader.parse("variant of " + sweep.scenarioLabel(), "variant", baseBytes,
                            baseFolder, variant);
                    WorkEstimate work = WorkEstimate.of(planned.tissue());
                    if (!work.impossible().isEmpty()) {
                        err.println("Cannot plan the sweep: the point " + String.join(", ", variant.describe()) + " asks for "
                                + work.summary() + ": " + String.join("; ", work.impossible()));
                        return FatefieldCommand.INVALID_INPUT;
                    }
                    if (!work.lengthy().isEmpty()) {
                        err.println("Note: the point " + String.join(", ", variant.describe()) + " is very long: "
                                + String.join("; ", work.lengthy()));
                    }
                }
                RunFolder.checkUsable(out, false, false);
                RunFolder folder = RunFolder.open(out);
                // The base and its includes, together: every run reads them from the sweep folder.
                base.copyInto(SweepRunner.BASE, (name, text) -> folder.writeText(name, w -> w.write(text)));
                folder.writeText(Manifest.NAME, manifest::write);
                Provenance.write(folder, "sweep plan", 1, Map.of(file.toString(), Provenance.sha256(Files.readString(file)),
                        sweep.scenarioLabel(), base.sha256()));
                spec.commandLine().getOut().printf("Planned %d runs (%d points x %d replicates) in %s%n",
                        manifest.runs().size(), manifest.runs().size() / sweep.replicates(), sweep.replicates(),
                        out.toAbsolutePath().normalize());
                return 0;
            } catch (ScenarioException e) {
                err.println(e.getMessage());
                return FatefieldCommand.INVALID_INPUT;
            } catch (IllegalArgumentException e) {
                err.println("Cannot plan the sweep: " + e.getMessage());
                return FatefieldCommand.INVALID_INPUT;
            } catch (IOException e) {
                err.println("Cannot write the sweep folder: " + e.getMessage());
                return FatefieldCommand.OUTPUT_ERROR;
            }
        }
    }

    /** {@code sweep run}. */
    @Command(name = "run", mixinStandardHelpOptions = true,
            description = {"Run the planned runs that have no valid result yet (rerun the same command after a kill).",
                "Inside a SLURM array job the shard comes from SLURM_ARRAY_TASK_ID and SLURM_ARRAY_TASK_COUNT."})
    static final class Run implements Callable<Integer> {

        @Parameters(index = "0", paramLabel = "DIR", description = "the sweep folder")
        private Path folder;

        @Option(names = "--workers", paramLabel = "K", description = "runs at once (default: all processors)")
        private Integer workers;

        @Option(names = "--shard", paramLabel = "I/N", description = "run only every N-th run starting at the I-th")
        private String shard;

        @Mixin
        private SharedOptions.Quiet quiet;

        @Mixin
        private SharedOptions.Verbose verbose;

        @CommandLine.Spec
        private CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            if (workers != null) {
                SharedOptions.checkWorkers(spec, "--workers", workers);
            }
            boolean detail = verbose.on(spec, quiet.given());
            PrintWriter err = spec.commandLine().getErr();
            try {
                SweepRunner runner = new SweepRunner(folder);
                int[] share = shard(shard, System.getenv());
                List<Manifest.Run> runs = runner.manifest().shard(share[0], share[1]);
                int k = workers != null ? workers : Runtime.getRuntime().availableProcessors();
                if (detail) {
                    BatchPlan.printSweep(runner, runs, share, k, spec.commandLine().getOut());
                }
                SweepRunner.Outcome outcome = runner.run(runs, k, quiet.progress(System.err));
                spec.commandLine().getOut().printf("Shard %d/%d: %d already done, %d finished now, %d failed%n",
                        share[0], share[1], outcome.skipped(), outcome.finished(), outcome.failed());
                return outcome.failed() > 0 ? FatefieldCommand.INVALID_INPUT : 0;
            } catch (IllegalArgumentException e) {
                err.println(e.getMessage());
                return FatefieldCommand.INVALID_INPUT;
            } catch (IOException e) {
                err.println("Cannot run the sweep: " + e.getMessage());
                return FatefieldCommand.OUTPUT_ERROR;
            }
        }

        /** The shard from --shard, else from a SLURM array task, else 1/1. */
        static int[] shard(String option, Map<String, String> env) {
            if (option != null) {
                String[] parts = option.split("/");
                if (parts.length != 2) {
                    throw new IllegalArgumentException("--shard must be I/N, like 2/5; got " + option);
                }
                return new int[] {Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim())};
            }
            String id = env.get("SLURM_ARRAY_TASK_ID");
            String count = env.get("SLURM_ARRAY_TASK_COUNT");
            if (id != null && count != null) {
                int min = Integer.parseInt(env.getOrDefault("SLURM_ARRAY_TASK_MIN", "1"));
                return new int[] {Integer.parseInt(id) - min + 1, Integer.parseInt(count)};
            }
            return new int[] {1, 1};
        }
    }

    /** {@code sweep slurm}. */
    @Command(name = "slurm", mixinStandardHelpOptions = true,
            description = "Write sweep.sbatch, a SLURM array job over the planned runs; submit it with sbatch.")
    static final class Slurm implements Callable<Integer> {

        @Parameters(index = "0", paramLabel = "DIR", description = "the sweep folder")
        private Path folder;

        @Option(names = "--tasks", paramLabel = "N", description = "array tasks (default: one per run, at most 1000)")
        private Integer tasks;

        @Option(names = "--time", paramLabel = "HH:MM:SS", defaultValue = "01:00:00",
                description = "wall time per task (default: ${DEFAULT-VALUE})")
        private String time;

        @Option(names = "--mem", paramLabel = "SIZE", defaultValue = "4G", description = "memory per task (default: ${DEFAULT-VALUE})")
        private String memory;

        @Option(names = "--cpus", paramLabel = "N", defaultValue = "1", description = "CPUs per task (default: ${DEFAULT-VALUE})")
        private int cpus;

        @Option(names = "--max-running", paramLabel = "N", defaultValue = "0",
                description = "most tasks at once, 0 for no limit (default: ${DEFAULT-VALUE})")
        private int concurrent;

        @Option(names = "--partition", paramLabel = "NAME", defaultValue = "",
                description = "SLURM partition (default: the cluster's default)")
        private String partition;

        @Option(names = "--account", paramLabel = "NAME", defaultValue = "",
                description = "SLURM account to charge (default: yours)")
        private String account;

        @Option(names = "--container", paramLabel = "IMAGE", description = "run each task in this container image"
                + " (built from scenarios/container/; an image reference, or a .sif file for apptainer) instead of"
                + " a Java on the node")
        private String container;

        @Option(names = "--container-runtime", paramLabel = "NAME", description = "podman, docker or apptainer"
                + " (default: apptainer for a .sif file, else podman)")
        private String runtime;

        @CommandLine.Spec
        private CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            SlurmScript.Launcher launcher;
            try {
                launcher = SlurmScript.launcher(FatefieldCommand.class).in(ContainerImage.of(container, runtime));
                // The limits alone, checked before the folder is read (the task count comes from it).
                new SlurmScript(1, time, memory, cpus, concurrent, partition, account);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
            }
            try {
                Manifest manifest = Manifest.read(folder);
                int n = tasks != null ? tasks : Math.min(1000, manifest.runs().size());
                SlurmScript script = new SlurmScript(n, time, memory, cpus, concurrent, partition, account);
                Files.createDirectories(folder.resolve("logs"));
                Files.writeString(folder.resolve("sweep.sbatch"), script.text(folder, launcher));
                spec.commandLine().getOut().printf("Wrote %s (%d array tasks). Submit with: sbatch %s%n",
                        folder.resolve("sweep.sbatch"), n, folder.resolve("sweep.sbatch"));
                return 0;
            } catch (IllegalArgumentException e) {
                spec.commandLine().getErr().println(e.getMessage());
                return FatefieldCommand.INVALID_INPUT;
            } catch (IOException | IllegalStateException e) {
                spec.commandLine().getErr().println("Cannot write the script: " + e.getMessage());
                return FatefieldCommand.OUTPUT_ERROR;
            }
        }
    }

    /** {@code sweep collect}. */
    @Command(name = "collect", mixinStandardHelpOptions = true,
            description = "Gather results into runs.csv, summary.csv and plots; report failed and missing runs.")
    static final class Collect implements Callable<Integer> {

        @Parameters(index = "0", paramLabel = "DIR", description = "the sweep folder")
        private Path folder;

        @CommandLine.Spec
        private CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            try {
                SweepCollector.Report report = SweepCollector.collect(folder);
                PrintWriter out = spec.commandLine().getOut();
                out.printf("%d runs complete, %d failed, %d missing; tables are in %s%n", report.complete(),
                        report.failed().size(), report.missing().size(), folder.toAbsolutePath().normalize());
                if (!report.failed().isEmpty()) {
                    out.println("failed: " + String.join(", ", report.failed()) + " (see results/<id>.failed.json)");
                }
                if (!report.missing().isEmpty()) {
                    out.println("missing: " + String.join(", ", report.missing()) + " (run: fatefield sweep run "
                            + folder + ")");
                }
                out.flush();
                // Tables of an incomplete sweep are written from the runs that finished, and say so in the exit code.
                return report.failed().isEmpty() && report.missing().isEmpty() ? 0 : FatefieldCommand.INCOMPLETE;
            } catch (IOException e) {
                spec.commandLine().getErr().println("Cannot collect: " + e.getMessage());
                return FatefieldCommand.OUTPUT_ERROR;
            }
        }
    }
}
