package org.fatefield.scenarios.cli;

import java.util.concurrent.Callable;
import org.fatefield.scenarios.format.ScenarioReference;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code fatefield keys}: print the scenario format reference. */
@Command(name = "keys", mixinStandardHelpOptions = true,
        description = "Print every scenario section and key with its unit, default and allowed values (Markdown).")
final class KeysCommand implements Callable<Integer> {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().getOut().print(ScenarioReference.markdown());
        spec.commandLine().getOut().flush();
        return 0;
    }
}
