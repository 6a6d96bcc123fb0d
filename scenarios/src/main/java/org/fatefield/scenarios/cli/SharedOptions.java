package org.fatefield.scenarios.cli;

import java.nio.file.Path;
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

        @Option(names = "--seed", paramLabel = "N", description = "master random seed, 0 or greater"
                + " (default: run.seed of the scenario)")
        void set(long seed) {
            if (seed < 0) {
                throw new ParameterException(spec.commandLine(), "--seed must be 0 or greater, got " + seed);
            }
            this.value = seed;
        }

        /** The seed given, or {@code scenarioSeed}. */
        long orElse(long scenarioSeed) {
            return value != null ? value : scenarioSeed;
        }
    }

    /** {@code --threads N}: threads to step cells on, at least 1; default all processors. */
    static final class Threads {

        @Spec(Spec.Target.MIXEE)
        private CommandSpec spec;

        private Integer value;

        @Option(names = "--threads", paramLabel = "N", description = "threads to step cells on, at least 1"
                + " (default: all processors); results do not depend on it")
        void set(int threads) {
            if (threads < 1) {
                throw new ParameterException(spec.commandLine(), "--threads must be at least 1, got " + threads);
            }
            this.value = threads;
        }

        /** The thread count given, or the number of processors. */
        int resolve() {
            return value != null ? value : Runtime.getRuntime().availableProcessors();
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
