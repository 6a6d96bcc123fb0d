package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.output.SbmlExport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code fatefield export-sbml}: write a scenario's circuit as an SBML model. */
@Command(name = "export-sbml", mixinStandardHelpOptions = true,
        description = {"Write a scenario's circuit as an SBML Level 3 core model (species, parameters, reactions"
                + " with kinetic laws), for other SBML tools. Custom circuits, Hill networks, the switch and the"
                + " toggle can be written; a scenario can read such a file back with circuit.file."})
final class ExportSbmlCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "a scenario file, or a built-in name (demo)")
    private String scenario;

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "the SBML file to write (.xml)")
    private Path out;

    @Option(names = "--force", description = "replace the file if it exists")
    private boolean force;

    @Mixin
    private SharedOptions.Settings settings;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, settings.overrides(), err);
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        if (Files.exists(out) && !force) {
            err.println("Cannot write " + out + ": it exists; choose another --out, or add --force to replace it");
            return FatefieldCommand.OUTPUT_ERROR;
        }
        String text;
        try {
            text = SbmlExport.of(loaded.name(), loaded.tissue().circuit().network(),
                    loaded.tissue().circuit().initialState());
        } catch (IllegalArgumentException e) {
            err.println("Cannot export " + loaded.name() + ": " + e.getMessage());
            return FatefieldCommand.INVALID_INPUT;
        }
        try {
            Path parent = out.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            Files.writeString(out, text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            err.println("Cannot write " + out + ": " + IoMessages.describe(e));
            return FatefieldCommand.OUTPUT_ERROR;
        }
        spec.commandLine().getOut().printf("Wrote the circuit of %s to %s%n", loaded.name(), out.toAbsolutePath()
                .normalize());
        return 0;
    }
}
