package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A calibration process killed (SIGKILL) in the middle of its second generation, then started
 * again with the same command, ends with the byte-identical posterior and predictive tables of
 * an uninterrupted calibration, and keeps the tissues it had finished.
 */
class CalibrationKillTest {

    @TempDir
    Path tmp;

    @Test
    void aKilledCalibrationResumesToTheSamePosterior() throws Exception {
        TinyCalibration.write(tmp);
        Path file = tmp.resolve("calibration.toml");
        Files.writeString(file, """
                [calibration]
                scenario = "tiny.toml"
                data = "data.toml"
                particles = 12
                batch = 6
                generations = 3
                predictive = 4
                seed = 21
                [[parameter]]
                """ + TinyCalibration.CYCLE_PARAMETER);
        Path straight = tmp.resolve("straight");
        assertEquals(0, FatefieldCommandAccess.run("calibrate", file.toString(), "--out", straight.toString(),
                "--workers", "1"));

        Path killed = tmp.resolve("killed");
        Process p = new ProcessBuilder(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "-Djava.awt.headless=true",
                "org.fatefield.scenarios.cli.FatefieldCommand", "calibrate", file.toString(), "--out",
                killed.toString(), "--workers", "1")).redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        // Kill once the second generation's second round has started writing tissues.
        Path target = killed.resolve("rounds").resolve("g01-r001-m0").resolve("results");
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (System.nanoTime() < deadline && p.isAlive() && !(Files.isDirectory(target) && count(target) > 0)) {
            Thread.sleep(20);
        }
        assertTrue(p.isAlive(), "the calibration was still running when killed");
        p.destroyForcibly().waitFor();
        assertTrue(!Files.exists(killed.resolve("posterior.csv")), "killed before the end");
        long kept = count(killed.resolve("rounds").resolve("g00-r000-m0").resolve("results"));
        assertTrue(kept > 0, "finished tissues are on disk");

        assertEquals(0, FatefieldCommandAccess.run("calibrate", file.toString(), "--out", killed.toString(),
                "--workers", "2"));
        assertEquals(Files.readString(straight.resolve("posterior.csv")), Files.readString(killed.resolve("posterior.csv")));
        assertEquals(Files.readString(straight.resolve("predictive.csv")),
                Files.readString(killed.resolve("predictive.csv")));
        assertEquals(Files.readString(straight.resolve("generations.csv")),
                Files.readString(killed.resolve("generations.csv")));
    }

    private static long count(Path folder) throws Exception {
        if (!Files.isDirectory(folder)) {
            return 0;
        }
        try (var files = Files.list(folder)) {
            return files.filter(f -> f.toString().endsWith(".json")).count();
        }
    }
}
