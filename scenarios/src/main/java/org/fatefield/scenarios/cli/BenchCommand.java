package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.bench.CircuitBenchmark;
import org.fatefield.engine.bench.TissueBenchmark;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.tissue.TissueSpec;
import org.fatefield.scenarios.format.Scenario;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine;

/** {@code fatefield bench}: cell-steps per second against a bare loop, in one run. */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = {"Measure cell-steps per second against a bare loop.",
            "Times the tissue at several sizes beside a bare array loop doing the same circuit arithmetic"
                    + " in the same process, and prints the ratio."})
final class BenchCommand implements Callable<Integer> {

    @Option(names = "--scenario", paramLabel = "SCENARIO", defaultValue = "demo",
            description = "scenario whose circuit, field and coupling are measured (default: ${DEFAULT-VALUE})")
    private String scenario;

    @Option(names = "--cells", split = ",", paramLabel = "N", defaultValue = "10000,100000",
            description = "tissue sizes (default: ${DEFAULT-VALUE})")
    private List<Integer> sizes;

    @Option(names = "--steps", paramLabel = "N", defaultValue = "50",
            description = "steps per timing (default: ${DEFAULT-VALUE})")
    private int steps;

    @Option(names = "--repeats", paramLabel = "N", defaultValue = "5",
            description = "timings per size; the median is reported (default: ${DEFAULT-VALUE})")
    private int repeats;

    @Option(names = "--threads", split = ",", paramLabel = "N", defaultValue = "1,2",
            description = "thread counts for the tissue (default: ${DEFAULT-VALUE}); the bare loop runs on one")
    private List<Integer> threadCounts;

    @Option(names = "--memory", paramLabel = "N", description = "also measure heap bytes per live cell at N cells"
            + " (0 to skip; default: ${DEFAULT-VALUE})", defaultValue = "0")
    private int memoryCells;

    /** How densely the benchmark tissue is packed. */
    enum Density {
        confluent, founders
    }

    @Option(names = "--density", paramLabel = "KIND", defaultValue = "confluent",
            description = "cell packing of the measured tissue: confluent (discs packed as in a grown tissue) or"
                    + " founders (the scenario's founder density); default: ${DEFAULT-VALUE}")
    private Density density;

    @Option(names = "--dimensions", split = ",", paramLabel = "D", defaultValue = "2",
            description = "2 for the scenario's flat tissue, 3 for the same tissue as a box a quarter of its height"
                    + " deep (a 3-D scenario is measured as it is); 2,3 measures both (default: ${DEFAULT-VALUE})")
    private List<Integer> dimensions;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        for (int cells : sizes) {
            SharedOptions.require(spec, cells >= 1 && cells <= 10_000_000, "--cells", cells,
                    "must be sizes from 1 to 10000000 cells");
        }
        SharedOptions.require(spec, steps >= 1, "--steps", steps, "must be at least 1");
        SharedOptions.require(spec, repeats >= 1, "--repeats", repeats, "must be at least 1");
        SharedOptions.require(spec, memoryCells >= 0 && memoryCells <= 10_000_000, "--memory", memoryCells,
                "must be from 0 (skip) to 10000000 cells");
        for (int threads : threadCounts) {
            SharedOptions.checkWorkers(spec, "--threads", threads);
        }
        for (int d : dimensions) {
            SharedOptions.require(spec, d == 2 || d == 3, "--dimensions", d, "must be 2 or 3 (or 2,3 for both)");
        }
        PrintWriter out = spec.commandLine().getOut();
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, spec.commandLine().getErr());
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        if (loaded.tissue().mapping().couplings().isEmpty()
                || !(loaded.tissue().mapping().couplings().get(0).law() instanceof CouplingLaw.Hill)) {
            spec.commandLine().getErr().println("bench needs a scenario whose first [[coupling]] has form = \"hill\""
                    + " (the bare baseline loop is written for it), as the demo has");
            return FatefieldCommand.INVALID_INPUT;
        }
        out.printf("Fatefield benchmark, scenario %s, Java %s, %d processors; median of %d timings of %d steps%n",
                loaded.name(), System.getProperty("java.version"), Runtime.getRuntime().availableProcessors(), repeats,
                steps);
        for (int d : dimensions) {
            TissueSpec template = d == 3 ? TissueBenchmark.inThreeDimensions(loaded.tissue()) : loaded.tissue();
            boolean solid = template.domain().threeD();
            double space = density == Density.confluent ? TissueBenchmark.confluentSpace(template)
                    : TissueBenchmark.founderSpace(template);
            out.println();
            out.printf("%s tissue (%s), %s packing, %.0f %s per cell%n", solid ? "Three-dimensional" : "Flat",
                    template.domain().shape(), density, space, solid ? "µm³" : "µm²");
            measure(out, template, space);
        }
        circuitLine(out, loaded);
        out.flush();
        return 0;
    }

    /** The two tables (full tick and cell loop; field and mechanics) and the heap line for one template. */
    private void measure(PrintWriter out, TissueSpec template, double space) {
        out.printf("%10s %8s %16s %16s %16s %10s %10s%n", "cells", "threads", "full tick /s", "cell loop /s",
                "bare loop /s", "loop/bare", "speed-up");
        List<TissueBenchmark.Result> results = new ArrayList<>();
        List<Integer> threadsOf = new ArrayList<>();
        for (int cells : sizes) {
            double single = Double.NaN;
            for (int threads : threadCounts) {
                TissueBenchmark.Result r = TissueBenchmark.measure(template, cells, steps, repeats, 1L, threads, space);
                if (Double.isNaN(single)) {
                    single = r.tickRate();
                }
                out.printf("%10d %8d %16.4g %16.4g %16.4g %10.2f %10.2f%n", r.cells(), threads, r.tickRate(),
                        r.cellStepRate(), r.bareRate(), r.ratio(), r.tickRate() / single);
                out.flush();
                results.add(r);
                threadsOf.add(threads);
            }
        }
        out.println("Rates are cell-steps per second. loop/bare = 1 means no overhead over the one-thread bare loop;"
                + " speed-up is the full tick against the first thread count.");
        out.println();
        out.printf("%10s %8s %14s %14s %10s %14s %14s %10s%n", "cells", "threads", "field /s", "bare field /s",
                "field/bare", "mechanics /s", "bare mech. /s", "mech/bare");
        for (int i = 0; i < results.size(); i++) {
            TissueBenchmark.Result r = results.get(i);
            out.printf("%10d %8d %14.4g %14.4g %10.2f %14.4g %14.4g %10.2f%n", r.cells(), threadsOf.get(i), r.fieldRate(),
                    r.bareFieldRate(), r.fieldRate() / r.bareFieldRate(), r.mechanicsRate(), r.bareMechanicsRate(),
                    r.mechanicsRate() / r.bareMechanicsRate());
        }
        out.println("Each stage timed alone on the same tissue, per cell-step. Bare field: the same grid and sub-steps"
                + " as plain arrays (one thread); bare mechanics: the same pair arithmetic over a neighbour list built"
                + " once (one thread, no bucket rebuild, no cell objects).");
        if (memoryCells > 0) {
            out.printf("Heap per live cell at %d cells (cells, states, streams, field and buffers): %.0f bytes%n",
                    memoryCells, TissueBenchmark.bytesPerCell(template, memoryCells, space));
        }
    }

    /** The single-cell line: Langevin steps, Gillespie events, continuation, for the built-in switch. */
    private void circuitLine(PrintWriter out, Scenario loaded) {
        if (loaded.tissue().circuit().network() instanceof SelfActivatingSwitch sw) {
            SignalCoupling c = loaded.tissue().mapping().couplings().get(0);
            CircuitBenchmark.Result r = CircuitBenchmark.measure(sw, loaded.tissue().circuit().systemSize(),
                    c.parameterIndices(), c.law().range()[0], c.law().range()[1], 10_000, steps);
            out.println();
            out.printf("Single cell: Langevin step, built-in switch %.4g /s, equivalent custom circuit %.4g /s,"
                    + " custom/built-in %.2f%n", r.builtInRate(), r.customRate(), r.customRatio());
            out.printf("Gillespie direct method: %.4g events/s on one core%n", r.ssaEventsPerSecond());
            out.printf("Continuation of the switch over %s with branch switching: %.1f ms, %d special point%s%n",
                    c.label(), r.continuationMillis(), r.specialPoints(), r.specialPoints() == 1 ? "" : "s");
        }
    }
}
