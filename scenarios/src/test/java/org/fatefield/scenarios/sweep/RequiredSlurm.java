package org.fatefield.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.util.concurrent.TimeUnit;

/**
 * Skips a cluster test, saying why, where no SLURM scheduler answers {@code sinfo}; fails it
 * instead when FATEFIELD_REQUIRE_SLURM=1 (as in CI, whose .ci/run starts a single-node cluster).
 */
public final class RequiredSlurm {

    private RequiredSlurm() {
    }

    /** Returns if a scheduler answers; otherwise skips or fails {@code test}. */
    public static void check(String test) {
        boolean required = "1".equals(System.getenv("FATEFIELD_REQUIRE_SLURM"));
        boolean available = schedulerAnswers();
        if (!available && !required) {
            System.err.println(test + " skipped: no SLURM scheduler answers sinfo here"
                    + " (.ci/run starts one; set FATEFIELD_REQUIRE_SLURM=1 to make this a failure)");
        }
        assumeTrue(available || required, "no SLURM scheduler here");
        assertTrue(available, "FATEFIELD_REQUIRE_SLURM=1 but no SLURM scheduler answers sinfo");
    }

    private static boolean schedulerAnswers() {
        try {
            Process p = new ProcessBuilder("sinfo", "-h").redirectErrorStream(true).start();
            return p.waitFor(20, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
