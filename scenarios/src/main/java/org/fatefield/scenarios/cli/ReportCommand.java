package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.report.ReplicateReport;
import org.fatefield.scenarios.report.RunReport;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code fatefield report}: a self-contained HTML page about a finished run. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = {"Write report.html into a finished run folder: figures, pattern and lineage tables, the"
                + " scenario and provenance, all in one offline file. Given a replicate set (from `replicates`),"
                + " report the positional error across its tissues and write each tissue's own report too."})
final class ReportCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "RUN-DIR", description = "a run folder (with run.json) or a replicate set (with replicates.json)")
    private Path run;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        try {
            String html = ReplicateReport.isReplicateSet(run) ? ReplicateReport.html(run) : RunReport.html(run);
            RunFolder.open(run).writeText("report.html", w -> w.write(html));
            spec.commandLine().getOut().printf("Wrote %s%n", run.resolve("report.html").toAbsolutePath().normalize());
            return 0;
        } catch (IOException | RuntimeException e) {
            spec.commandLine().getErr().println("Cannot write the report: " + e.getMessage());
            return FatefieldCommand.OUTPUT_ERROR;
        }
    }
}
