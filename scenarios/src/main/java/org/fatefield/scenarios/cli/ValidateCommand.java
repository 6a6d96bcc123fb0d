package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.fatefield.engine.metrics.FateReach;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code fatefield validate}: check scenario files and report every problem at once. */
@Command(name = "validate", mixinStandardHelpOptions = true,
        description = {"Check scenario files without running them.",
            "Every problem is reported at once with file, line, key, the value found and what is allowed."
                    + " Exit code 1 if any file has problems."})
final class ValidateCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "scenario files, or built-in names")
    private List<String> files;

    @Mixin
    private SharedOptions.Settings settings;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        int status = 0;
        for (String file : files) {
            try {
                Scenario scenario = ScenarioArgument.load(file, settings.overrides());
                out.printf("%s: valid (%s: %d founders, %.4g h in steps of %.4g h, %d fates)%n", file, scenario.name(),
                        scenario.tissue().growth().initialCells(), scenario.tissue().timing().duration(),
                        scenario.tissue().timing().step(), scenario.tissue().fates().fateCount());
                WorkEstimate estimate = WorkEstimate.of(scenario.tissue());
                out.printf("  expected work: %s%n", estimate.summary());
                for (String m : estimate.impossible()) {
                    out.println("  cannot run: " + m);
                    status = FatefieldCommand.INVALID_INPUT;
                }
                for (String m : estimate.lengthy()) {
                    out.println("  very long (run needs --yes): " + m);
                }
                for (String m : FateReach.unmet(scenario.tissue())) {
                    out.println("  note: " + m);
                }
            } catch (ScenarioException e) {
                err.println(e.getMessage());
                status = FatefieldCommand.INVALID_INPUT;
            }
        }
        out.flush();
        return status;
    }
}
