package org.fatefield.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The container recipe built and used as the README says: {@code scenarios/container/Dockerfile}
 * is built with podman on the base image .ci/run makes ({@code FATEFIELD_CONTAINER_BASE}, since
 * CI reaches no registry), the image reports the jar's version, and a sweep whose SLURM array
 * tasks run from the image ({@code sweep slurm --container}) gives byte for byte the table of
 * the same sweep run locally. Runs after the jar is built (failsafe). Skipped, saying why,
 * without podman, the base image or a scheduler; never when FATEFIELD_REQUIRE_CONTAINER=1 (as
 * in CI).
 */
class ContainerClusterIT {

    private static final String IMAGE = "localhost/fatefield:it";

    @TempDir
    Path tmp;

    @Test
    void aSweepRunFromTheContainerOnSlurmGivesTheLocalTable() throws Exception {
        String base = System.getenv().getOrDefault("FATEFIELD_CONTAINER_BASE", "");
        boolean required = "1".equals(System.getenv("FATEFIELD_REQUIRE_CONTAINER"));
        boolean available = !base.isEmpty() && run(List.of("podman", "image", "exists", base), 60).code() == 0;
        if (!available && !required) {
            System.err.println("ContainerClusterIT skipped: no podman with FATEFIELD_CONTAINER_BASE here"
                    + " (.ci/run makes one; set FATEFIELD_REQUIRE_CONTAINER=1 to make this a failure)");
        }
        assumeTrue(available || required, "no container base image here");
        assertTrue(available, "FATEFIELD_REQUIRE_CONTAINER=1 but podman has no image FATEFIELD_CONTAINER_BASE='"
                + base + "'");
        RequiredSlurm.check("ContainerClusterIT");

        Path jar = Path.of("target", "fatefield.jar").toAbsolutePath();
        assertTrue(Files.exists(jar), "the jar is built before this test: " + jar);
        Result build = run(List.of("podman", "build", "--build-arg", "BASE=" + base, "-f",
                Path.of("container", "Dockerfile").toString(), "-t", IMAGE, ".."), 600);
        assertEquals(0, build.code(), "podman build: " + build.output());

        Result inside = run(List.of("podman", "run", "--rm", "--network=none", IMAGE, "--version"), 120);
        Result outside = run(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar",
                jar.toString(), "--version"), 120);
        assertEquals(0, inside.code(), inside.output());
        assertEquals(outside.output().lines().findFirst().orElseThrow(),
                inside.output().lines().findFirst().orElseThrow(), "the image carries the jar just built");

        SweepPair pair = SweepPair.plan(tmp, 8);
        Path local = pair.local();
        Path cluster = pair.cluster();
        assertEquals(0, FatefieldCommandAccess.run("sweep", "slurm", cluster.toString(), "--tasks", "2",
                "--time", "00:10:00", "--mem", "1G", "--container", IMAGE));
        String script = Files.readString(cluster.resolve("sweep.sbatch"));
        assertTrue(script.contains("podman run --rm --network=none") && script.contains(IMAGE)
                && script.contains("FATEFIELD_JAVA_OPTIONS=-Xmx870m"), script);

        Result submit = run(List.of("sbatch", "--parsable", cluster.resolve("sweep.sbatch").toString()), 60);
        assertEquals(0, submit.code(), "sbatch: " + submit.output());
        String job = submit.output().trim().split(";")[0];
        SweepPair.awaitJob(job, 300);
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", cluster.toString()),
                "logs: " + logs(cluster.resolve("logs")));
        assertArrayEquals(Files.readAllBytes(local.resolve("runs.csv")), Files.readAllBytes(cluster.resolve("runs.csv")),
                "logs: " + logs(cluster.resolve("logs")));
    }

    private record Result(int code, String output) {
    }

    private static Result run(List<String> command, int seconds) throws IOException, InterruptedException {
        Path log = Files.createTempFile("fatefield-it", ".log");
        try {
            Process p = new ProcessBuilder(new ArrayList<>(command)).redirectErrorStream(true)
                    .redirectOutput(log.toFile()).start();
            if (!p.waitFor(seconds, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                return new Result(-1, command + " did not finish within " + seconds + " s: " + Files.readString(log));
            }
            return new Result(p.exitValue(), Files.readString(log, StandardCharsets.UTF_8));
        } finally {
            Files.deleteIfExists(log);
        }
    }

    private static String logs(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return "(no logs)";
        }
        StringBuilder sb = new StringBuilder();
        try (var files = Files.list(folder)) {
            for (Path f : files.sorted().toList()) {
                sb.append("\n--- ").append(f.getFileName()).append('\n').append(Files.readString(f));
            }
        }
        return sb.toString();
    }
}
