package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import org.fatefield.engine.tissue.SimulationFailure;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.RunProvenance;
import picocli.CommandLine.Command;
import picocli.CommandLine;

/** The {@code fatefield} command line. */
@Command(name = "fatefield", mixinStandardHelpOptions = true, versionProvider = FatefieldCommand.Version.class,
        description = {"Fatefield simulates growing tissues in which every cell carries a noisy gene switch"
            + " whose parameters a diffusing morphogen sets, and measures the fates that come out.",
            "Research software: not for clinical decisions.", ""},
        subcommands = {RunCommand.class, ViewCommand.class, ReplicatesCommand.class, SweepCommand.class, RobustnessCommand.class, AnalyzeCommand.class, ReportCommand.class,
            CalibrateCommand.class, ExportSbmlCommand.class, ValidateCommand.class, ScenarioHelpCommand.class, BenchCommand.class,
            CommandLine.HelpCommand.class, picocli.AutoComplete.GenerateCompletion.class},
        footer = {"", "Start with:  fatefield run demo --out demo-output",
            "How to write a scenario:  fatefield scenario-help"})
public final class FatefieldCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @CommandLine.Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "on a fault in Fatefield, print the stack trace as well")
    private boolean debug;

    /** Exit code of a scenario with problems. */
    static final int INVALID_INPUT = 1;
    /** Exit code when output cannot be written. */
    static final int OUTPUT_ERROR = 3;
    /** Exit code of {@code sweep collect} when some runs failed or are missing (the tables hold the rest). */
    static final int INCOMPLETE = 5;
    /** Exit code of a fault in Fatefield itself (an exception no command expected). */
    static final int INTERNAL_ERROR = 4;

    @Override
    public void run() {
        spec.commandLine().usage(System.out);
    }

    /** Runs the command line on the standard streams and returns its exit code. */
    public static int execute(String... args) {
        Provenance.recordCommandLine(args);
        return commandLine().execute(args);
    }

    /** Runs the command line with its output and errors sent to the given writers. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        Provenance.recordCommandLine(args);
        return commandLine().setOut(out).setErr(err).execute(args);
    }

    /**
     * The command line, with a handler that turns an unexpected exception into one line saying
     * what failed (no stack trace reaches a user unless --debug or FATEFIELD_DEBUG=1).
     */
    private static CommandLine commandLine() {
        CommandLine line = new CommandLine(new FatefieldCommand());
        line.setExecutionExceptionHandler((e, command, parsed) -> {
            PrintWriter err = command.getErr();
            if (e instanceof SimulationFailure failure) {
                err.println("The simulation stopped: " + failure.getMessage() + ".");
                err.println("Nothing was written that looks finished (no run.json); the folder keeps what the run had"
                        + " streamed so far.");
                err.flush();
                return INVALID_INPUT;
            }
            err.println("fatefield " + command.getCommandName() + " failed: " + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage()));
            err.println("This is a fault in Fatefield, not in your input; please report it with the scenario and the"
                    + " command line. Files already finished in the output folder are kept.");
            if (parsed.hasMatchedOption("--debug") || "1".equals(System.getenv("FATEFIELD_DEBUG"))) {
                e.printStackTrace(err);
            }
            err.flush();
            return INTERNAL_ERROR;
        });
        return line;
    }

    /** Entry point. */
    public static void main(String[] args) {
        int code;
        try {
            code = execute(args);
        } catch (OutOfMemoryError e) {
            System.err.println("fatefield ran out of memory (Java heap " + Runtime.getRuntime().maxMemory() / (1 << 20)
                    + " MB). Give Java more, such as java -Xmx8g -jar fatefield.jar ..., or make the run smaller;"
                    + " `fatefield validate` estimates the memory a scenario needs. Finished files are kept.");
            code = INTERNAL_ERROR;
        } catch (LinkageError e) {
            System.err.println("fatefield could not load a part of itself (" + e.getMessage() + "): the jar is"
                    + " incomplete; rebuild it with mvn -q -B package -DskipTests");
            code = INTERNAL_ERROR;
        }
        System.exit(code);
    }

    /** Reports the version from the jar manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"fatefield " + RunProvenance.toolVersion() + " (build " + RunProvenance.buildCommit()
                    + ")",
                "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")"};
        }
    }
}
