package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.fatefield.scenarios.output.JsonFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Model choice between tissue scenarios, on a case with a known answer: two hypotheses that are
 * the same scenario with the same prior have equal evidence, so each posterior model probability
 * must be within 4 of its reported Monte Carlo standard errors of 1/2 (30 particles per model,
 * seed 17), and the two must sum to 1.
 */
class CalibrationModelChoiceTest {

    @TempDir
    Path tmp;

    @Test
    void twoIdenticalHypothesesGetEqualProbabilityWithinTheirMonteCarloError() throws Exception {
        TinyCalibration.write(tmp);
        Files.copy(tmp.resolve("tiny.toml"), tmp.resolve("twin.toml"));
        String parameter = "[[model.parameter]]\n" + TinyCalibration.CYCLE_PARAMETER;
        Path file = tmp.resolve("choice.toml");
        Files.writeString(file, "[calibration]\ndata = \"data.toml\"\nparticles = 30\ngenerations = 3\npredictive = 0\n"
                + "seed = 17\n[[model]]\nname = \"first\"\nscenario = \"tiny.toml\"\n" + parameter
                + "[[model]]\nname = \"second\"\nscenario = \"twin.toml\"\n" + parameter);
        Path out = tmp.resolve("out");
        assertEquals(0, FatefieldCommandAccess.run("calibrate", file.toString(), "--out", out.toString(), "--workers",
                "2"));
        JsonArray models = JsonFiles.read(out.resolve("summary.json")).getAsJsonArray("models");
        double p1 = models.get(0).getAsJsonObject().get("probability").getAsDouble();
        double se1 = models.get(0).getAsJsonObject().get("probability_se").getAsDouble();
        double p2 = models.get(1).getAsJsonObject().get("probability").getAsDouble();
        assertTrue(se1 > 0 && se1 < 0.2, "a usable Monte Carlo error: " + se1);
        assertEquals(0.5, p1, 4 * se1, "identical hypotheses");
        assertEquals(1.0, p1 + p2, 1e-12);
        assertTrue(Files.exists(out.resolve("pairs-1.png")) && Files.exists(out.resolve("pairs-2.png")));
    }
}
