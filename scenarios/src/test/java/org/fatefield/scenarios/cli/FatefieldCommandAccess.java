package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;

/** Test access to package-private parts of the command line from other test packages. */
public final class FatefieldCommandAccess {

    private FatefieldCommandAccess() {
    }

    /** Runs the command line quietly; returns the exit code. */
    public static int run(String... args) {
        return FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()), args);
    }

    /** The shard {@code sweep run} would take. */
    public static int[] shard(String option, Map<String, String> env) {
        return SweepCommand.Run.shard(option, env);
    }
}
