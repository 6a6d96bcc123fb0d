package org.fatefield.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;

/**
 * The small sweep the cluster tests share: the demo cut to 4 h and 30 founders, two gains times
 * two replicates, planned into a local and a cluster folder; the local copy is run and collected
 * at once, so a test only has to run the cluster copy its own way and compare {@code runs.csv}.
 *
 * @param local   the folder run locally
 * @param cluster the folder left for the cluster
 */
record SweepPair(Path local, Path cluster) {

    /** Plans both folders in {@code tmp} with master seed {@code seed} and runs the local one. */
    static SweepPair plan(Path tmp, long seed) throws IOException {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 4.0").replace("founders = 120", "founders = 30");
        Files.writeString(tmp.resolve("base.toml"), demo);
        Path file = tmp.resolve("sweep.toml");
        Files.writeString(file, "[sweep]\nscenario = \"base.toml\"\nreplicates = 2\nseed = " + seed + "\n\n"
                + "[[parameter]]\nkey = \"coupling[1].gain\"\nvalues = [1.2, 1.8]\n");
        SweepPair pair = new SweepPair(tmp.resolve("local"), tmp.resolve("cluster"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", pair.local().toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out",
                pair.cluster().toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", pair.local().toString(), "--workers", "1"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", pair.local().toString()));
        return pair;
    }

    /** Waits until SLURM no longer lists job {@code job}, at most {@code seconds}. */
    static void awaitJob(String job, int seconds) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
        while (System.nanoTime() < deadline) {
            Process queue = new ProcessBuilder("squeue", "-h", "-j", job).redirectErrorStream(true).start();
            String left = new String(queue.getInputStream().readAllBytes(), StandardCharsets.UTF_8).trim();
            queue.waitFor();
            if (left.isEmpty()) {
                return;
            }
            Thread.sleep(500);
        }
    }
}
