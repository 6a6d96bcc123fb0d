package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import org.fatefield.scenarios.output.RunProvenance;
import picocli.CommandLine.Command;
import picocli.CommandLine;

/** The {@code fatefield} command line. */
@Command(name = "fatefield", mixinStandardHelpOptions = true, versionProvider = FatefieldCommand.Version.class,
        description = {"Fatefield simulates growing tissues in which every cell carries a noisy gene switch"
            + " whose parameters a diffusing morphogen sets, and measures the fates that come out.",
            "Research software: not for clinical decisions.", ""},
        subcommands = {RunCommand.class, ViewCommand.class, ReplicatesCommand.class, SweepCommand.class, RobustnessCommand.class, AnalyzeCommand.class, ReportCommand.class,
            ValidateCommand.class, KeysCommand.class, BenchCommand.class,
            CommandLine.HelpCommand.class},
        footer = {"", "Start with:  fatefield run demo --out demo-output",
            "Scenario keys:  fatefield keys"})
public final class FatefieldCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /** Exit code of a scenario with problems. */
    static final int INVALID_INPUT = 1;
    /** Exit code when output cannot be written. */
    static final int OUTPUT_ERROR = 3;

    @Override
    public void run() {
        spec.commandLine().usage(System.out);
    }

    /** Runs the command line on the standard streams and returns its exit code. */
    public static int execute(String... args) {
        return new CommandLine(new FatefieldCommand()).execute(args);
    }

    /** Runs the command line with its output and errors sent to the given writers. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        return new CommandLine(new FatefieldCommand()).setOut(out).setErr(err).execute(args);
    }

    /** Entry point. */
    public static void main(String[] args) {
        System.exit(execute(args));
    }

    /** Reports the version from the jar manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"fatefield " + RunProvenance.toolVersion(),
                "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")"};
        }
    }
}
