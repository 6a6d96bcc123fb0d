package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.scenarios.builtin.BuiltinScenarios;

/**
 * The small, fast calibration problem several tests share: the demo cut to 6 h and 30 founders
 * ({@code tiny.toml}) and one datum, 45 +- 4 cells at the end ({@code data.toml}), against which
 * the cell-cycle mean is fitted.
 */
final class TinyCalibration {

    /** The prior and key of the fitted value, as a [[parameter]] (or [[model.parameter]]) body. */
    static final String CYCLE_PARAMETER = """
            key = "division.cycle_mean"
            prior = "uniform"
            low = 4.0
            high = 12.0
            """;

    private TinyCalibration() {
    }

    /** Writes tiny.toml and data.toml into {@code folder}. */
    static void write(Path folder) throws IOException {
        String tiny = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 6.0").replace("founders = 120", "founders = 30");
        Files.writeString(folder.resolve("tiny.toml"), tiny);
        Files.writeString(folder.resolve("data.toml"), "[data]\n[[statistic]]\nname = \"population\"\nvalue = 45\n"
                + "sd = 4\nunit = \"cells\"\n");
    }
}
