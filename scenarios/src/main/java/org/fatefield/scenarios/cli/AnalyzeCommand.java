package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.fatefield.circuits.analysis.SwitchingSettings;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.study.AnalysisPlan;
import org.fatefield.circuits.study.AnalysisResult;
import org.fatefield.circuits.study.CircuitAnalysis;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.scenarios.analysis.AnalysisWriter;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunLayout;
import org.hipparchus.exception.MathIllegalStateException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield analyze}: the single-cell analyses of a scenario's circuit. */
@Command(name = "analyze", mixinStandardHelpOptions = true,
        description = {"Analyse a scenario's circuit on its own, before it goes into a tissue.",
            "Steady states and their stability, the bifurcation diagram along one parameter (folds, branch"
                    + " points, Hopf points), the bistable region in a plane of two parameters, phase portrait,"
                    + " basins of attraction, the quasi-potential landscape (also along the parameter), and"
                    + " switching statistics (mean first-passage times against system size, commitment"
                    + " probabilities). Writes CSV tables and PNG + SVG figures."})
final class AnalyzeCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "a scenario file, or a built-in name (demo)")
    private String scenario;

    @Option(names = "--parameter", paramLabel = "NAME",
            description = "parameter to vary (default: the scenario's first coupled parameter)")
    private String parameter;

    @Option(names = "--range", paramLabel = "MIN:MAX",
            description = "range of the parameter (default: the coupling's range, else half to twice its value)")
    private String range;

    @Option(names = "--at", paramLabel = "VALUE",
            description = "parameter value for steady states, portrait, basins, landscape, switching (default: mid-range)")
    private Double at;

    @Option(names = "--second", paramLabel = "NAME", description = "second parameter: draws the bistable region")
    private String second;

    @Option(names = "--second-range", paramLabel = "MIN:MAX", description = "range of the second parameter"
            + " (default: half to twice its value)")
    private String secondRange;

    @Option(names = "--x", paramLabel = "SPECIES", description = "species on the horizontal axis (default: the first)")
    private String xSpecies;

    @Option(names = "--y", paramLabel = "SPECIES", description = "species on the vertical axis (default: the second)")
    private String ySpecies;

    @Option(names = "--system-size", paramLabel = "OMEGA", description = "molecules per unit concentration"
            + " for the stochastic analyses (default: the scenario's)")
    private Double systemSize;

    @Option(names = "--trajectories", paramLabel = "N", defaultValue = "40",
            description = "trajectories per stochastic estimate (default: ${DEFAULT-VALUE}); more is slower and tighter")
    private int trajectories;

    @Option(names = "--grid", paramLabel = "N", defaultValue = "160",
            description = "cells per axis of the landscape grid (default: ${DEFAULT-VALUE})")
    private int grid;

    @Option(names = "--switching-method", paramLabel = "METHOD", defaultValue = "langevin",
            description = "simulation for switching times and commitment: langevin (chemical Langevin equation,"
                    + " Euler-Maruyama) or exact (Gillespie's direct method in molecule counts; slower at large"
                    + " system sizes) (default: ${DEFAULT-VALUE})")
    private String switchingMethod;

    @Option(names = "--switching-step", paramLabel = "HOURS", defaultValue = "0.01",
            description = "Langevin time step, and for both methods how often a trajectory is checked for"
                    + " arrival (default: ${DEFAULT-VALUE} h)")
    private double switchingStep;

    @Option(names = "--arrival", paramLabel = "FRACTION", defaultValue = "0.25",
            description = "a trajectory has arrived at an attractor within this fraction of the distance between"
                    + " the two attractors (default: ${DEFAULT-VALUE})")
    private double arrival;

    @Option(names = "--switching-limit", paramLabel = "HOURS", defaultValue = "2000",
            description = "time limit of a first-passage trajectory; later ones are counted as censored"
                    + " (default: ${DEFAULT-VALUE} h; commitment trajectories get a quarter of it)")
    private double switchingLimit;

    @Option(names = "--switch-from", paramLabel = "K",
            description = "stable state switched from, numbered from 0 among the stable rows of steady-states.csv"
                    + " (default: the first)")
    private Integer switchFrom;

    @Option(names = "--switch-to", paramLabel = "K",
            description = "stable state switched to (default: the last)")
    private Integer switchTo;

    @Mixin
    private SharedOptions.Seed seed;

    @Mixin
    private SharedOptions.Out out;

    @Mixin
    private SharedOptions.Force force;

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
        SharedOptions.require(spec, systemSize == null || (systemSize > 0 && Double.isFinite(systemSize)),
                "--system-size", systemSize, "must be a finite number greater than 0");
        SharedOptions.require(spec, at == null || Double.isFinite(at), "--at", at, "must be a finite number");
        PrintWriter err = spec.commandLine().getErr();
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, settings.overrides(), spec.commandLine().getErr());
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        AnalysisPlan plan;
        try {
            plan = plan(loaded);
        } catch (IllegalArgumentException e) {
            err.println(e.getMessage());
            return FatefieldCommand.INVALID_INPUT;
        }
        ReactionNetwork network = loaded.tissue().circuit().network();
        if (verbose.on(spec, quiet.given())) {
            RunPlan.printAnalysis(loaded, plan, network.speciesNames(), spec.commandLine().getOut());
        }
        Path folder = out.orElse(RunLayout.defaultFolder(loaded.name(), "-analysis"));
        try {
            RunFolder.checkUsable(folder, force.given());
            CircuitAnalysis analysis = new CircuitAnalysis(network, loaded.tissue().mapping().base(), plan);
            AnalysisResult result;
            try {
                long start = System.nanoTime();
                result = analysis.run(stage -> {
                    PrintWriter log = quiet.progress(err);
                    log.printf(Locale.ROOT, "analyze: %s (%.1f s)%n", stage, (System.nanoTime() - start) / 1e9);
                    log.flush();
                });
            } catch (IllegalArgumentException e) {
                err.println("Cannot analyse " + loaded.name() + ": " + e.getMessage());
                return FatefieldCommand.INVALID_INPUT;
            } catch (MathIllegalStateException e) {
                // An integration or solver that met NaN or infinity: the circuit overflows at these values.
                err.println("Cannot analyse " + loaded.name() + " at " + plan.parameter() + " = " + plan.at() + ": "
                        + e.getMessage() + "; the circuit's rates overflow there. Choose --at (and --range)"
                        + " where its rates stay finite, such as the coupling's range");
                return FatefieldCommand.INVALID_INPUT;
            }
            AnalysisWriter writer = new AnalysisWriter(RunFolder.open(folder), network, plan,
                    loaded.tissue().fates(), figures.format());
            writer.write(result, analysis);
            Provenance.write(RunFolder.open(folder), "analyze", 1, Map.of(loaded.source(), loaded.sha256()));
            PrintWriter o = spec.commandLine().getOut();
            int specials = result.branches().stream().mapToInt(b -> b.specials().size()).sum();
            o.printf("Analysed %s along %s in [%s, %s]: %s at %s = %s, %s, %s.%n", loaded.name(), plan.parameter(),
                    plan.min(), plan.max(), count(result.steadyStates().size(), "steady state"), plan.parameter(),
                    plan.at(), count(result.branches().size(), "branch"), count(specials, "special point"));
            o.printf("Results are in %s%n", folder.toAbsolutePath().normalize());
            o.flush();
            return 0;
        } catch (IOException e) {
            err.println("Cannot write results: " + IoMessages.describe(e));
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }

    private static String count(int n, String noun) {
        return n + " " + (n == 1 ? noun : noun.endsWith("h") ? noun + "es" : noun + "s");
    }

    private AnalysisPlan plan(Scenario loaded) {
        ReactionNetwork network = loaded.tissue().circuit().network();
        double[] base = loaded.tissue().mapping().base();
        List<SignalCoupling> couplings = loaded.tissue().mapping().couplings();
        String name = parameter != null ? parameter : couplings.isEmpty() ? null : couplings.get(0).label();
        if (name == null) {
            throw new IllegalArgumentException("the scenario couples no parameter; name one with --parameter"
                    + " (parameters: " + String.join(", ", network.parameterNames()) + ")");
        }
        int[] indices = indices(network, name, "--parameter");
        double[] r;
        if (range != null) {
            r = parseRange(range, "--range");
        } else if (parameter == null && !couplings.isEmpty()) {
            r = couplings.get(0).law().range();
        } else {
            r = around(base[indices[0]]);
        }
        int[] secondIndices = new int[0];
        double[] r2 = {0, 1};
        if (second != null) {
            secondIndices = indices(network, second, "--second");
            r2 = secondRange != null ? parseRange(secondRange, "--second-range") : around(base[secondIndices[0]]);
        }
        int x = species(network, xSpecies, 0, "--x");
        // A one-species circuit has no state plane: steady states, continuation and switching only.
        int y = network.speciesCount() == 1 && ySpecies == null ? -1 : species(network, ySpecies, 1, "--y");
        return new AnalysisPlan(name, indices, r[0], r[1], at != null ? at : 0.5 * (r[0] + r[1]), second,
                secondIndices, r2[0], r2[1], x, y,
                systemSize != null ? systemSize : loaded.tissue().circuit().systemSize(), trajectories, grid,
                seed.orElse(loaded.seed()), switching());
    }

    private SwitchingSettings switching() {
        SwitchingSettings.Method method = switch (switchingMethod.toLowerCase(Locale.ROOT)) {
            case "langevin" -> SwitchingSettings.Method.LANGEVIN;
            case "exact" -> SwitchingSettings.Method.EXACT;
            default -> throw new IllegalArgumentException("--switching-method must be langevin or exact, got '"
                    + switchingMethod + "'");
        };
        if (switchFrom != null && switchFrom < 0 || switchTo != null && switchTo < 0) {
            throw new IllegalArgumentException("--switch-from and --switch-to number stable states from 0");
        }
        return new SwitchingSettings(method, switchingStep, arrival, switchingLimit, switchingLimit / 4,
                switchFrom == null ? -1 : switchFrom, switchTo == null ? -1 : switchTo);
    }

    private static int[] indices(ReactionNetwork network, String name, String option) {
        int[] indices = network.parameterGroup(name);
        if (indices.length == 0) {
            throw new IllegalArgumentException(option + " " + name + " is not a parameter of this circuit; use one of "
                    + String.join(", ", network.parameterNames()) + ", or a kinetic key shared by all genes");
        }
        return indices;
    }

    private static int species(ReactionNetwork network, String name, int fallback, String option) {
        if (name == null) {
            if (fallback >= network.speciesCount()) {
                throw new IllegalArgumentException("the circuit has one species; state-plane analyses need two");
            }
            return fallback;
        }
        int index = network.speciesNames().indexOf(name);
        if (index < 0) {
            throw new IllegalArgumentException(option + " " + name + " is not a species; species are "
                    + String.join(", ", network.speciesNames()));
        }
        return index;
    }

    private static double[] parseRange(String text, String option) {
        String[] parts = text.split(":");
        IllegalArgumentException problem = new IllegalArgumentException(option
                + " must be MIN:MAX with two numbers, got '" + text + "'");
        if (parts.length != 2) {
            throw problem;
        }
        try {
            return new double[] {Double.parseDouble(parts[0]), Double.parseDouble(parts[1])};
        } catch (NumberFormatException e) {
            problem.initCause(e);
            throw problem;
        }
    }

    private static double[] around(double value) {
        return value > 0 ? new double[] {0.5 * value, 2 * value} : new double[] {0, 1};
    }
}
