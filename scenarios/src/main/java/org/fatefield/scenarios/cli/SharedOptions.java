package org.fatefield.scenarios.cli;

import java.io.OutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Scenario;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The options several commands share, each a picocli mixin with its range check in one place:
 * a bad value is a usage error (exit code 2) naming the option, the value and what is allowed,
 * before anything runs.
 */
final class SharedOptions {

    private SharedOptions() {
    }

    /** {@code --seed N}: a master random seed, 0 or greater; default the scenario's. */
    static final class Seed {

        @Spec(Spec.Target.MIXEE)
        private CommandSpec spec;

        private Long value;

        @Option(names = "--seed", paramLabel = "N", description = "master random seed, from 0 to 2^53 - 1"
                + " (default: run.seed of the scenario)")
        void set(long seed) {
            if (seed < 0 || seed > RandomStreams.MAX_SEED) {
                throw new ParameterException(spec.commandLine(), "--seed must be from 0 to " + RandomStreams.MAX_SEED
                        + " (2^53 - 1), got " + seed);
            }
            this.value = seed;
        }

        /** The seed given, or {@code scenarioSeed}. */
        long orElse(long scenarioSeed) {
            return value != null ? value : scenarioSeed;
        }
    }

    /**
     * {@code --set KEY=VALUE} (repeatable): scenario values replaced from the command line, laid
     * over the file and checked exactly like its own values, and recorded in the run's provenance.
     */
    static final class Settings {

        @Spec(Spec.Target.MIXEE)
        private CommandSpec spec;

        @Option(names = "--set", paramLabel = "KEY=VALUE", description = "replace a scenario value, such as --set"
                + " morphogen.decay=0.3 or --set 'circuit.noise=\"none\"' (repeatable; key paths as in validation"
                + " messages and fatefield scenario-help)")
        private List<String> given = new ArrayList<>();

        /** The overrides given (none by default); a malformed one is a usage error naming it. */
        Overrides overrides() {
            Overrides value = Overrides.none();
            for (String setting : given) {
                int equals = setting.indexOf('=');
                if (equals <= 0) {
                    throw new ParameterException(spec.commandLine(), "--set takes KEY=VALUE, such as --set"
                            + " morphogen.decay=0.3; got '" + setting + "'");
                }
                try {
                    value = value.with(setting.substring(0, equals).trim(),
                            Overrides.parseValue(setting.substring(equals + 1)));
                } catch (IllegalArgumentException e) {
                    throw new ParameterException(spec.commandLine(), "--set " + setting + ": " + e.getMessage());
                }
            }
            return value;
        }
    }

    /**
     * {@code --quiet}: no progress lines on standard error, only errors (for scripts and cluster
     * logs); the results and the final summary line are the same.
     */
    static final class Quiet {

        @Option(names = "--quiet", description = "print no progress, only errors")
        private boolean quiet;

        /** True with {@code --quiet}. */
        boolean given() {
            return quiet;
        }

        /** Where progress goes: {@code err}, or nowhere when quiet. */
        PrintStream progress(PrintStream err) {
            return quiet ? new PrintStream(OutputStream.nullOutputStream()) : err;
        }

        /** As {@link #progress(PrintStream)} for a writer. */
        PrintWriter progress(PrintWriter err) {
            return quiet ? new PrintWriter(Writer.nullWriter()) : err;
        }
    }

    /**
     * {@code --verbose}: before running, the settings as resolved (what the engine will use,
     * including what it sets itself), and after, the files written.
     */
    static final class Verbose {

        @Option(names = "--verbose", description = "also print, before anything runs, the settings as they will"
                + " be used (for a tissue: steps, mechanics step, grids, threads, expected size; for an analysis:"
                + " ranges, grid, switching settings) and, after a run, the files written")
        private boolean verbose;

        /**
         * True with {@code --verbose}.
         *
         * @throws picocli.CommandLine.ParameterException if {@code --quiet} is given too
         */
        boolean on(CommandSpec spec, boolean quiet) {
            if (quiet && verbose) {
                throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                        "--quiet and --verbose contradict each other: give one");
            }
            return verbose;
        }
    }

    /** {@code --threads N}: threads to step cells on, at least 1; default all processors. */
    static final class Threads {

        @Spec(Spec.Target.MIXEE)
        private CommandSpec spec;

        private Integer value;

        @Option(names = "--threads", paramLabel = "N", description = "threads to step cells on, from 1 to four"
                + " per processor (default: one for a tissue expected to stay under 5000 cells, else all"
                + " processors); results do not depend on it")
        void set(int threads) {
            checkWorkers(spec, "--threads", threads);
            this.value = threads;
        }

        /** The thread count given, or the number of processors. */
        int resolve() {
            return value != null ? value : Runtime.getRuntime().availableProcessors();
        }

        /**
         * The thread count given, or by default one thread for a tissue expected to stay below
         * {@value #SMALL_TISSUE} cells (a step of a small tissue is too short for handing work
         * between threads to pay: measured with the spinning worker pool, two threads stepped
         * 1000 cells at 0.9 times the speed of one, 3000 at 1.3 times, 10^4 at 1.6 to 1.8 times)
         * and every processor otherwise.
         */
        int resolveFor(Scenario scenario) {
            if (value != null) {
                return value;
            }
            return WorkEstimate.of(scenario.tissue()).finalCells() < SMALL_TISSUE ? 1
                    : Runtime.getRuntime().availableProcessors();
        }

        /** Why {@link #resolveFor} chose its count, for the run plan; empty if {@code --threads} set it. */
        String reasonFor(Scenario scenario) {
            if (value != null) {
                return "";
            }
            return WorkEstimate.of(scenario.tissue()).finalCells() < SMALL_TISSUE
                    ? "automatic: fewer than " + SMALL_TISSUE + " cells expected, too few for a second thread to pay;"
                            + " --threads N to change"
                    : "automatic: every processor";
        }

        /** Cells below which a run takes one thread unless told otherwise. */
        static final int SMALL_TISSUE = 5_000;
    }

    /**
     * Refuses a thread or worker count below 1 or above four per processor of this machine (more
     * only adds switching between threads).
     */
    static void checkWorkers(CommandSpec spec, String option, int count) {
        int most = 4 * Runtime.getRuntime().availableProcessors();
        if (count < 1 || count > most) {
            throw new ParameterException(spec.commandLine(), option + " must be from 1 to " + most + " (four per"
                    + " processor of this machine), got " + count);
        }
    }

    /** Refuses a value of {@code option} that breaks {@code rule} ({@code ok} false), as a usage error. */
    static void require(CommandSpec spec, boolean ok, String option, Object value, String rule) {
        if (!ok) {
            throw new ParameterException(spec.commandLine(), option + " " + rule + ", got " + value);
        }
    }

    /** {@code --force}: overwrite the files of an output folder that already holds files. */
    static final class Force {

        @Option(names = "--force", description = "overwrite the files in an output folder that already holds files")
        private boolean value;

        /** True if given. */
        boolean given() {
            return value;
        }
    }

    /** {@code --out DIR}, optional: where results go (the command says its default). */
    static final class Out {

        @Option(names = "--out", paramLabel = "DIR", description = "output folder (default: a folder named after"
                + " the scenario in the current folder)")
        private Path value;

        /** The folder given, or {@code fallback}. */
        Path orElse(Path fallback) {
            return value != null ? value : fallback;
        }
    }

    /**
     * {@code --yes}: run even when the estimate of work ({@link WorkEstimate}) says the run is very
     * long. Runs the estimate calls impossible (more steps, cells or packing than any machine
     * takes) are refused whatever.
     */
    static final class Confirm {

        @Option(names = "--yes", description = "start even if the run is estimated to take very long")
        private boolean yes;

        /**
         * Checks the work {@code scenario} asks for; prints why and returns false if the run must not
         * start.
         */
        /** True when --yes was given. */
        boolean given() {
            return yes;
        }

        boolean allows(CommandSpec spec, Scenario scenario) {
            WorkEstimate estimate = WorkEstimate.of(scenario.tissue());
            PrintWriter err = spec.commandLine().getErr();
            List<String> impossible = estimate.impossible();
            List<String> lengthy = estimate.lengthy();
            if (impossible.isEmpty() && (lengthy.isEmpty() || yes)) {
                return true;
            }
            err.println(scenario.name() + " asks for " + estimate.summary() + ":");
            impossible.forEach(m -> err.println("  " + m));
            lengthy.forEach(m -> err.println("  " + m));
            err.println(impossible.isEmpty() ? "Nothing was run; add --yes to start it anyway."
                    : "Nothing was run: change the scenario as said above.");
            err.flush();
            return false;
        }
    }

    /** {@code --out DIR}, required. */
    static final class RequiredOut {

        @Option(names = "--out", paramLabel = "DIR", required = true, description = "output folder")
        private Path value;

        /** The folder given. */
        Path path() {
            return value;
        }
    }
}
