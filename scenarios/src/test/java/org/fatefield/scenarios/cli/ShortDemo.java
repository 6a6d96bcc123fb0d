package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.scenarios.builtin.BuiltinScenarios;

/** The built-in demo shortened to a few hours, written as a scenario file for command tests. */
final class ShortDemo {

    private ShortDemo() {
    }

    /** Writes the demo with {@code hours} of simulated time to {@code dir/short.toml}. */
    static Path write(Path dir, String hours) throws IOException {
        Path scenario = dir.resolve("short.toml");
        Files.writeString(scenario, new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = " + hours));
        return scenario;
    }
}
