package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.fatefield.circuits.study.AnalysisPlan;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.TissueSpec;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.RunTables;

/**
 * What {@code --verbose} prints before a scenario runs: the settings as resolved from the file,
 * its overrides and the command line (the values the engine will use, including those it sets
 * itself, such as the mechanics step), so a modeler can check them before a long run.
 */
final class RunPlan {

    private RunPlan() {
    }

    /** Writes the plan of {@code scenario} run on {@code seed} with {@code threads} to {@code out}. */
    static void print(Scenario scenario, long seed, int threads, PrintWriter out) {
        print(scenario, seed, threads, "", out);
    }

    /** As {@link #print(Scenario, long, int, PrintWriter)}, saying after the thread count why ({@code why}, or nothing). */
    static void print(Scenario scenario, long seed, int threads, String why, PrintWriter out) {
        TissueSpec spec = scenario.tissue();
        Timing timing = spec.timing();
        GrowthSpec growth = spec.growth();
        int mechanics = timing.mechanicsEvery(Math.max(growth.repulsionRate(), growth.adhesion()));
        WorkEstimate work = WorkEstimate.of(spec);
        scenarioLine(scenario, out);
        for (String override : scenario.overrides()) {
            out.printf(Locale.ROOT, "  override: %s%n", override);
        }
        out.printf(Locale.ROOT, "seed: %d; threads: %d%s%n", seed, threads, why.isEmpty() ? "" : " (" + why + ")");
        out.printf(Locale.ROOT, "time: %s h in %d steps of %s h; records every %d steps; mechanics every %d"
                + " step%s (%s h, %s)%n", n(timing.duration()), timing.totalSteps(), n(timing.step()),
                timing.stepsPerRecord(), mechanics, mechanics == 1 ? "" : "s", n(mechanics * timing.step()),
                timing.mechanicsStep() > 0 ? "as set" : "set from the repulsion time scale");
        boolean solid = spec.domain().threeD();
        String size = n(spec.width()) + " x " + n(spec.height()) + (solid ? " x " + n(spec.domain().depth()) : "");
        out.printf(Locale.ROOT, "tissue: %s %s µm%s; %d founders of radius %s µm (%s); repulsion %s/h,"
                + " adhesion %s/h%n", spec.domain().shape(), size, spec.domain().periodicY() ? ", periodic in y" : "",
                growth.initialCells(), n(growth.cellRadius()), solid ? "spheres" : "discs", n(growth.repulsionRate()),
                n(growth.adhesion()));
        for (MorphogenSpec field : spec.fields()) {
            String grid = (int) Math.ceil(spec.width() / field.gridSpacing()) + " x "
                    + (int) Math.ceil(spec.height() / field.gridSpacing())
                    + (solid ? " x " + (int) Math.ceil(spec.domain().depth() / field.gridSpacing()) + " cubes"
                            : " squares");
            String solver = field.solver() == MorphogenSpec.Solver.ADI ? (solid ? "Douglas ADI" : "Peaceman-Rachford ADI")
                    : "explicit";
            out.printf(Locale.ROOT, "field %s: %s of %s µm, diffusion %s µm²/h, decay %s/h, %s solver%n",
                    field.name(), grid, n(field.gridSpacing()), n(field.diffusion()), n(field.decay()), solver);
        }
        out.printf(Locale.ROOT, "circuit: %d species, noise %s, system size %s; fates: %s%n",
                spec.circuit().network().speciesCount(), spec.circuit().noise().toString().toLowerCase(Locale.ROOT),
                n(spec.circuit().systemSize()),
                String.join(", ", spec.fates().fateNames()));
        out.printf(Locale.ROOT, "expected: about %.3g cells at the end, %.3g cell-steps%n", work.finalCells(),
                work.cellSteps());
        out.flush();
    }

    /** Writes what {@code analyze} will compute, as resolved, to {@code out}. */
    static void printAnalysis(Scenario scenario, AnalysisPlan plan, List<String> species, PrintWriter out) {
        scenarioLine(scenario, out);
        out.printf(Locale.ROOT, "parameter: %s from %s to %s; steady states at %s%n", plan.parameter(), n(plan.min()),
                n(plan.max()), n(plan.at()));
        if (plan.second() != null && !plan.second().isEmpty()) {
            out.printf(Locale.ROOT, "second parameter: %s from %s to %s (fold curves)%n", plan.second(),
                    n(plan.secondMin()), n(plan.secondMax()));
        }
        if (species.size() >= 2) {
            out.printf(Locale.ROOT, "state plane: %s x %s on a %d x %d grid%n", species.get(plan.xSpecies()),
                    species.get(plan.ySpecies()), plan.grid(), plan.grid());
        }
        out.printf(Locale.ROOT, "switching: %s method, step %s h, limit %s h, arrival within %s of the distance;"
                + " %d trajectories at system sizes %s/8 to %s; seed %d%n", plan.switching().method().word(),
                n(plan.switching().step()), n(plan.switching().passageLimit()),
                n(plan.switching().arrivalFraction()), plan.trajectories(), n(plan.systemSize()),
                n(plan.systemSize()), plan.seed());
        out.flush();
    }

    /** Writes every file of the run folder {@code folder} with its size, snapshot folders summed. */
    static void files(Path folder, PrintWriter out) throws IOException {
        List<Path> entries;
        try (Stream<Path> list = Files.list(folder)) {
            entries = list.filter(p -> !p.getFileName().toString().startsWith(".")).sorted().toList();
        }
        for (Path p : entries) {
            if (Files.isDirectory(p)) {
                long[] countAndBytes = new long[2];
                try (Stream<Path> walk = Files.walk(p)) {
                    for (Path f : walk.filter(Files::isRegularFile).toList()) {
                        countAndBytes[0]++;
                        countAndBytes[1] += Files.size(f);
                    }
                }
                out.printf(Locale.ROOT, "  %s/ (%d files, %s)%n", p.getFileName(), countAndBytes[0],
                        size(countAndBytes[1]));
            } else {
                out.printf(Locale.ROOT, "  %s (%s)%n", p.getFileName(), size(Files.size(p)));
            }
        }
    }

    private static void scenarioLine(Scenario scenario, PrintWriter out) {
        out.printf(Locale.ROOT, "scenario: %s (%s, SHA-256 %s)%n", scenario.name(), scenario.source(),
                scenario.sha256());
    }

    private static String n(double value) {
        return RunTables.number(value);
    }

    private static String size(long bytes) {
        return bytes < 10_000 ? bytes + " bytes" : bytes < 10_000_000 ? String.format(Locale.ROOT, "%.0f kB", bytes / 1e3)
                : String.format(Locale.ROOT, "%.1f MB", bytes / 1e6);
    }
}
