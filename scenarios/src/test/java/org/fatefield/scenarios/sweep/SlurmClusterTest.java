package org.fatefield.scenarios.sweep;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;


/**
 * A sweep submitted to a real SLURM scheduler (the single-node cluster .ci/run starts) gives the
 * same table as the same sweep run locally. Skipped, saying why, where no scheduler answers;
 * never skipped when FATEFIELD_REQUIRE_SLURM=1 (as in CI).
 */
class SlurmClusterTest {

    @TempDir
    Path tmp;

    @Test
    void arrayJobGivesTheSameTableAsALocalRun() throws Exception {
        RequiredSlurm.check("SlurmClusterTest");

        SweepPair pair = SweepPair.plan(tmp, 5);
        Path local = pair.local();
        Path cluster = pair.cluster();
        assertEquals(0, FatefieldCommandAccess.run("sweep", "slurm", cluster.toString(), "--tasks", "2",
                "--time", "00:10:00", "--mem", "1G"));
        Process submit = new ProcessBuilder("sbatch", "--parsable", cluster.resolve("sweep.sbatch").toString())
                .redirectErrorStream(true).start();
        String job = new String(submit.getInputStream().readAllBytes(), StandardCharsets.UTF_8).trim();
        assertEquals(0, submit.waitFor(), "sbatch: " + job);
        SweepPair.awaitJob(job.split(";")[0], 240);
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", cluster.toString()));
        assertArrayEquals(Files.readAllBytes(local.resolve("runs.csv")), Files.readAllBytes(cluster.resolve("runs.csv")),
                "logs: " + cluster.resolve("logs"));
    }
}
