package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.fatefield.circuits.inference.Generation;
import org.fatefield.circuits.inference.Population;
import org.fatefield.scenarios.calibration.Calibration;
import org.fatefield.scenarios.calibration.CalibrationDefinition;
import org.fatefield.scenarios.calibration.CalibrationModel;
import org.fatefield.scenarios.calibration.LocalBackend;
import org.fatefield.scenarios.calibration.RoundBackend;
import org.fatefield.scenarios.calibration.SlurmBackend;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.sweep.ContainerImage;
import org.fatefield.scenarios.sweep.SlurmScript;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield calibrate}: fit scenario values to measured patterns, and weigh competing scenarios. */
@Command(name = "calibrate", mixinStandardHelpOptions = true,
        description = {"Fit scenario values to measured data by approximate Bayesian computation (sequential Monte"
                + " Carlo), and compare competing scenarios by their posterior probabilities.",
            "The calibration file (TOML) has [calibration] with scenario (or one [[model]] per hypothesis, each with"
                    + " name, scenario and [[model.parameter]]), data, particles, batch, generations, quantile,"
                    + " min_acceptance, tolerance, replicates, predictive and seed, and one [[parameter]] per value to"
                    + " fit: key (a scenario key path) and prior = \"uniform\" or \"log-uniform\" (with low and high)"
                    + " or \"normal\" (with mean and sd).",
            "The data file (TOML) has [data] description, one [[statistic]] per measurement (name, value, sd, unit)"
                    + " and optionally [profile] file = a CSV with x_um, fraction_<fate> and sd_<fate>. Statistics:"
                    + " population, fraction_<fate>, boundary_<fate>_um, width_<fate>_um, committed_boundary_um,"
                    + " mixed_zone_width_um, predicted_boundary_um, sister_agreement, and with replicates >= 2"
                    + " positional_error_<fate>_um and positional_error_committed_um.",
            "Results: posterior.csv (weighted particles), populations/, generations.csv (tolerance, acceptance,"
                    + " effective sample size, evidence and model probability per generation), summary.json, pairs.png,"
                    + " predictive.png and predictive-summary.csv. Run the same command again to resume after a kill."})
final class CalibrateCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "the calibration file")
    private Path file;

    @Mixin
    private SharedOptions.RequiredOut out;

    @Option(names = "--workers", paramLabel = "K", description = "tissues at once on this machine (default: all"
            + " processors)")
    private Integer workers;

    @Option(names = "--slurm", description = "run each round as SLURM array jobs (sbatch) and wait for them, instead"
            + " of on this machine")
    private boolean slurm;

    @Option(names = "--slurm-tasks", paramLabel = "N", defaultValue = "100",
            description = "most array tasks per round (default: ${DEFAULT-VALUE})")
    private int tasks;

    @Option(names = "--slurm-time", paramLabel = "HH:MM:SS", defaultValue = "01:00:00",
            description = "wall time per task (default: ${DEFAULT-VALUE})")
    private String time;

    @Option(names = "--slurm-mem", paramLabel = "SIZE", defaultValue = "2G",
            description = "memory per task (default: ${DEFAULT-VALUE})")
    private String memory;

    @Option(names = "--slurm-partition", paramLabel = "NAME", defaultValue = "",
            description = "SLURM partition (default: the cluster's default)")
    private String partition;

    @Option(names = "--slurm-account", paramLabel = "NAME", defaultValue = "",
            description = "SLURM account to charge (default: yours)")
    private String account;

    @Option(names = "--slurm-container", paramLabel = "IMAGE", description = "run each task in this container image"
            + " (built from scenarios/container/; an image reference, or a .sif file for apptainer)")
    private String container;

    @Option(names = "--slurm-container-runtime", paramLabel = "NAME", description = "podman, docker or apptainer"
            + " (default: apptainer for a .sif file, else podman)")
    private String runtime;

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
        PrintWriter err = spec.commandLine().getErr();
        if (workers != null) {
            SharedOptions.checkWorkers(spec, "--workers", workers);
        }
        RoundBackend backend;
        try {
            if (!slurm && (container != null || runtime != null)) {
                throw new IllegalArgumentException("--container and --container-runtime need --slurm");
            }
            backend = slurm
                    ? new SlurmBackend(new SlurmScript(tasks, time, memory, 1, 0, partition, account), SlurmScript.launcher(
                            FatefieldCommand.class).in(ContainerImage.of(container, runtime)),
                            quiet.progress(System.err))
                    : new LocalBackend(workers != null ? workers : Runtime.getRuntime().availableProcessors(),
                            quiet.progress(System.err));
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage().replace("--time", "--slurm-time")
                    .replace("--mem", "--slurm-mem").replace("--partition", "--slurm-partition")
                    .replace("--account", "--slurm-account").replace("--container", "--slurm-container"));
        }
        CalibrationDefinition definition;
        try {
            definition = CalibrationDefinition.read(file);
        } catch (ScenarioException e) {
            err.println(e.getMessage());
            return FatefieldCommand.INVALID_INPUT;
        }
        if (verbose.on(spec, quiet.given())) {
            BatchPlan.printCalibration(definition, spec.commandLine().getOut());
        }
        try {
            Calibration.Outcome outcome = Calibration.run(definition, out.path(), backend, quiet.progress(System.err),
                    figures.format());
            Map<String, String> inputs = new LinkedHashMap<>();
            inputs.put(definition.label(), Provenance.sha256(definition.text()));
            inputs.put(definition.data().label(), Provenance.sha256(definition.data().text()));
            if (definition.data().profileText() != null) {
                inputs.put(definition.data().profileName(), Provenance.sha256(definition.data().profileText()));
            }
            definition.models().forEach(m -> inputs.put(m.scenarioLabel(), m.base().sha256()));
            Provenance.write(RunFolder.open(out.path()), "calibrate", slurm ? 0 : workers != null ? workers
                    : Runtime.getRuntime().availableProcessors(), inputs);
            print(definition, outcome);
            return 0;
        } catch (IOException e) {
            err.println("Cannot calibrate: " + IoMessages.describe(e));
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }

    private void print(CalibrationDefinition definition, Calibration.Outcome outcome) {
        PrintWriter o = spec.commandLine().getOut();
        Generation last = outcome.result().last();
        o.printf(Locale.ROOT, "Calibration finished after %d generation%s: %s.%n", outcome.result().generations().size(),
                outcome.result().generations().size() == 1 ? "" : "s", outcome.result().stopReason());
        for (Population p : last.populations()) {
            CalibrationModel model = definition.models().get(p.model());
            if (definition.models().size() > 1) {
                o.printf(Locale.ROOT, "%s: posterior probability %.3f +- %.3f (Monte Carlo error)%n", model.name(),
                        last.models().probabilities()[p.model()], last.models().errors()[p.model()]);
            }
            for (int a = 0; a < model.parameters().size() && p.size() > 0; a++) {
                o.printf(Locale.ROOT, "  %s: median %.4g, 95%% credible interval %.4g to %.4g%n",
                        model.parameters().get(a).key(), p.quantile(a, 0.5), p.quantile(a, 0.025),
                        p.quantile(a, 0.975));
            }
        }
        if (outcome.failedTissues() > 0) {
            o.printf("%d tissue%s failed (counted as rejected); see rounds/*/results/*.failed.json%n",
                    outcome.failedTissues(), outcome.failedTissues() == 1 ? "" : "s");
        }
        o.println("Results are in " + out.path().toAbsolutePath().normalize());
        o.flush();
    }
}
