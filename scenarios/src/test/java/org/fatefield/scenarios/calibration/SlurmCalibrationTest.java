package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.fatefield.scenarios.sweep.RequiredSlurm;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * A calibration whose rounds run as array jobs on a real SLURM scheduler (the single-node cluster
 * .ci/run starts) gives byte for byte the posterior of the same calibration on local workers.
 * Skipped, saying why, where no scheduler answers; never skipped when FATEFIELD_REQUIRE_SLURM=1
 * (as in CI).
 */
class SlurmCalibrationTest {

    @TempDir
    Path tmp;

    @Test
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void slurmRoundsGiveTheSamePosteriorAsLocalWorkers() throws Exception {
        RequiredSlurm.check("SlurmCalibrationTest");

        TinyCalibration.write(tmp);
        Path file = tmp.resolve("calibration.toml");
        Files.writeString(file, """
                [calibration]
                scenario = "tiny.toml"
                data = "data.toml"
                particles = 6
                generations = 2
                predictive = 2
                seed = 4
                [[parameter]]
                """ + TinyCalibration.CYCLE_PARAMETER);
        Path local = tmp.resolve("local");
        Path cluster = tmp.resolve("cluster");
        assertEquals(0, FatefieldCommandAccess.run("calibrate", file.toString(), "--out", local.toString(),
                "--workers", "2"));
        assertEquals(0, FatefieldCommandAccess.run("calibrate", file.toString(), "--out", cluster.toString(),
                "--slurm", "--slurm-tasks", "3", "--slurm-time", "00:10:00", "--slurm-mem", "1G"));
        assertTrue(Files.exists(cluster.resolve("rounds/g00-r000-m0/sweep.sbatch")), "rounds went through sbatch");
        assertEquals(Files.readString(local.resolve("posterior.csv")), Files.readString(cluster.resolve("posterior.csv")));
        assertEquals(Files.readString(local.resolve("predictive.csv")),
                Files.readString(cluster.resolve("predictive.csv")));
    }
}
