package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.scenarios.format.Problem;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;

/** Resolves a command-line scenario argument: a file path, or the name of a built-in scenario. */
final class ScenarioArgument {

    private ScenarioArgument() {
    }

    /**
     * Reads the scenario, or prints its problems to {@code err} and returns null (so a command
     * can return {@link FatefieldCommand#INVALID_INPUT}).
     */
    static Scenario loadOrReport(String argument, PrintWriter err) {
        return loadOrReport(argument, Overrides.none(), err);
    }

    /** As {@link #loadOrReport(String, PrintWriter)}, with {@code --set} values laid over the scenario. */
    static Scenario loadOrReport(String argument, Overrides settings, PrintWriter err) {
        try {
            return load(argument, settings);
        } catch (ScenarioException e) {
            err.println(e.getMessage());
            err.flush();
            return null;
        }
    }

    /** Reads and validates the scenario named by {@code argument}. */
    static Scenario load(String argument) throws ScenarioException {
        return load(argument, Overrides.none());
    }

    /** Reads and validates the scenario named by {@code argument} with {@code settings} laid over it. */
    static Scenario load(String argument, Overrides settings) throws ScenarioException {
        Path path = Path.of(argument);
        if (Files.exists(path)) {
            return ScenarioReader.read(path, settings);
        }
        Optional<byte[]> builtin = BuiltinScenarios.bytes(argument);
        if (builtin.isPresent()) {
            return ScenarioReader.parse("builtin:" + argument, argument, builtin.get(), null, settings);
        }
        throw new ScenarioException(List.of(new Problem(argument, 0, 0, "", null,
                "no such scenario file, and no built-in scenario of that name (built-in: "
                        + String.join(", ", BuiltinScenarios.names()) + ")")));
    }
}
