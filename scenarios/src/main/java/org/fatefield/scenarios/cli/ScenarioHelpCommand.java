package org.fatefield.scenarios.cli;

import java.util.concurrent.Callable;
import org.fatefield.scenarios.format.ScenarioJsonSchema;
import org.fatefield.scenarios.format.ScenarioReference;
import picocli.CommandLine.Command;
import picocli.CommandLine;

/** {@code fatefield scenario-help}: print the scenario format reference (every section and key). */
@Command(name = "scenario-help", mixinStandardHelpOptions = true,
        description = {"Explain how to write a scenario file: every section and key with its unit, default, allowed"
                + " values and meaning (Markdown; save it with > scenario-help.md).",
            "With --json-schema, print the same as a JSON Schema for editors that complete TOML (the repository"
                    + " keeps it as scenarios/scenario.schema.json)."})
final class ScenarioHelpCommand implements Callable<Integer> {

    @CommandLine.Option(names = "--json-schema", description = "print the scenario format as a JSON Schema (draft"
            + " 2020-12) instead")
    private boolean jsonSchema;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().getOut().print(jsonSchema ? ScenarioJsonSchema.text() : ScenarioReference.markdown());
        spec.commandLine().getOut().flush();
        return 0;
    }
}
