package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.RunTables;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A synthetic tissue whose true parameter is known: the data are the mean progenitor boundary of
 * four tissues simulated at morphogen decay 0.3 /h (a small, short version of the demo), and a
 * calibration of the decay rate from a log-uniform prior on [0.05, 1] must hold 0.3 inside its
 * 95% credible interval and narrow the prior. One check at a fixed seed (7), not a coverage
 * study. Then the calibration is resumed after losing the last generation's tissues, as a kill
 * would, and must give the byte-identical posterior, rerunning only what was lost.
 */
class CalibrationRecoveryTest {

    @TempDir
    Path tmp;

    @Test
    void theTrueDecayRateIsInsideThe95PercentIntervalAndAResumeGivesTheSamePosterior() throws Exception {
        String small = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 24.0").replace("founders = 120", "founders = 60")
                .replace("width = 600.0", "width = 400.0");
        Files.writeString(tmp.resolve("small.toml"), small);
        Files.writeString(tmp.resolve("truth.toml"), "[sweep]\nscenario = \"small.toml\"\nreplicates = 4\nseed = 11\n"
                + "[[parameter]]\nkey = \"morphogen.decay\"\nvalues = [0.3]\n");
        Path truth = tmp.resolve("truth");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", tmp.resolve("truth.toml").toString(), "--out",
                truth.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", truth.toString(), "--workers", "2"));
        double sum = 0;
        int n = 0;
        try (Stream<Path> files = Files.list(truth.resolve("results"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".json")).toList()) {
                JsonObject metrics = JsonFiles.read(f).getAsJsonObject("metrics");
                sum += metrics.get("boundary_progenitor_um").getAsDouble();
                n++;
            }
        }
        assertEquals(4, n);
        Files.writeString(tmp.resolve("data.toml"), "[data]\ndescription = \"synthetic\"\n[[statistic]]\n"
                + "name = \"boundary_progenitor_um\"\nvalue = " + sum / n + "\nsd = 8.0\nunit = \"um\"\n");
        Files.writeString(tmp.resolve("calibration.toml"), """
                [calibration]
                scenario = "small.toml"
                data = "data.toml"
                particles = 40
                generations = 4
                min_acceptance = 0.05
                predictive = 10
                seed = 7
                [[parameter]]
                key = "morphogen.decay"
                prior = "log-uniform"
                low = 0.05
                high = 1.0
                """);
        Path out = tmp.resolve("calibration");
        String file = tmp.resolve("calibration.toml").toString();
        assertEquals(0, FatefieldCommandAccess.run("calibrate", file, "--out", out.toString(), "--workers", "2"));
        JsonObject p = JsonFiles.read(out.resolve("summary.json")).getAsJsonArray("models").get(0).getAsJsonObject()
                .getAsJsonArray("parameters").get(0).getAsJsonObject();
        double low = p.get("ci95_low").getAsDouble();
        double high = p.get("ci95_high").getAsDouble();
        assertTrue(low <= 0.3 && 0.3 <= high, "95% interval " + low + " to " + high + " holds the true 0.3");
        assertTrue(Math.log(high / low) < 0.5 * Math.log(1.0 / 0.05), "the data narrow the prior: " + low + " to "
                + high);
        for (String name : List.of("posterior.csv", "generations.csv", "pairs.png", "pairs.svg", "predictive.png",
                "predictive-summary.csv", "populations/g00.csv")) {
            assertTrue(Files.size(out.resolve(name)) > 0, name);
        }

        byte[] before = Files.readAllBytes(out.resolve("posterior.csv"));
        List<CSVRecord> generations = RunTables.records(out.resolve("generations.csv"));
        String last = String.format("g%02d-", Integer.parseInt(generations.get(generations.size() - 1).get(0)));
        int lost = 0;
        try (Stream<Path> rounds = Files.list(out.resolve("rounds"))) {
            for (Path round : rounds.filter(r -> r.getFileName().toString().startsWith(last)).toList()) {
                try (Stream<Path> results = Files.list(round.resolve("results"))) {
                    for (Path r : results.toList()) {
                        Files.delete(r);
                        lost++;
                    }
                }
            }
        }
        assertTrue(lost > 0, "the last generation's tissues were removed");
        Files.delete(out.resolve("posterior.csv"));
        assertEquals(0, FatefieldCommandAccess.run("calibrate", file, "--out", out.toString(), "--workers", "1"));
        assertEquals(new String(before, StandardCharsets.UTF_8),
                Files.readString(out.resolve("posterior.csv"), StandardCharsets.UTF_8));

        Files.writeString(tmp.resolve("calibration.toml"), Files.readString(tmp.resolve("calibration.toml"))
                .replace("seed = 7", "seed = 8"));
        assertEquals(3, FatefieldCommandAccess.run("calibrate", file, "--out", out.toString()),
                "a folder made from other inputs is refused, not overwritten");
    }
}
