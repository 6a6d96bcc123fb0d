package org.fatefield.scenarios.sweep;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
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

        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 4.0").replace("founders = 120", "founders = 30");
        Files.writeString(tmp.resolve("base.toml"), demo);
        Path file = tmp.resolve("sweep.toml");
        Files.writeString(file, "[sweep]\nscenario = \"base.toml\"\nreplicates = 2\nseed = 5\n\n[[parameter]]\n"
                + "key = \"coupling[1].gain\"\nvalues = [1.2, 1.8]\n");
        Path local = tmp.resolve("local");
        Path cluster = tmp.resolve("cluster");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", local.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", cluster.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", local.toString(), "--workers", "1"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", local.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "slurm", cluster.toString(), "--tasks", "2",
                "--time", "00:10:00", "--mem", "1G"));
        Process submit = new ProcessBuilder("sbatch", "--parsable", cluster.resolve("sweep.sbatch").toString())
                .redirectErrorStream(true).start();
        String job = new String(submit.getInputStream().readAllBytes(), StandardCharsets.UTF_8).trim();
        assertEquals(0, submit.waitFor(), "sbatch: " + job);
        long deadline = System.nanoTime() + 240_000_000_000L;
        while (System.nanoTime() < deadline) {
            Process queue = new ProcessBuilder("squeue", "-h", "-j", job.split(";")[0]).redirectErrorStream(true).start();
            String left = new String(queue.getInputStream().readAllBytes(), StandardCharsets.UTF_8).trim();
            queue.waitFor();
            if (left.isEmpty()) {
                break;
            }
            Thread.sleep(500);
        }
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", cluster.toString()));
        assertArrayEquals(Files.readAllBytes(local.resolve("runs.csv")), Files.readAllBytes(cluster.resolve("runs.csv")),
                "logs: " + cluster.resolve("logs"));
    }
}
