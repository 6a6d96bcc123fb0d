package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Real kills ({@code SIGKILL}, no shutdown hooks) of a {@code run} process at 22 points: while
 * it simulates (the streamed lineage table at 10% to 80% of its final length), just after
 * checkpoints, and at every stage of the final writing (each result file as it appears). Each
 * killed folder is then resumed with {@code --resume}, and every result file must equal, byte for
 * byte, that of a run that was never killed. Two runs started together into one folder: one
 * writes it, the other is refused with a message and writes nothing.
 */
class KillAndResumeTest {

    private static final List<String> RESULTS = List.of("timeseries.csv", "cells.csv", "lineage.csv",
            "lineage.nwk", "profile.csv", "relatedness.csv", "clones.csv", "metrics.json", "scenario.toml");

    @TempDir
    Path tmp;

    private record Outcome(int code, String err) {
    }

    private static Outcome fatefield(String... args) {
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter(), true), new PrintWriter(err, true),
                args);
        return new Outcome(code, err.toString());
    }

    private Path scenario(String hours) throws IOException {
        Path scenario = tmp.resolve("kill-" + hours + ".toml");
        Files.writeString(scenario, new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = " + hours)
                .replace("default = \"progenitor\"", "default = \"progenitor\"\npredicted_cells = 40"));
        return scenario;
    }

    private static Process start(Path scenario, Path out, String... extra) throws IOException {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-cp", System.getProperty("java.class.path"), "-Djava.awt.headless=true",
                FatefieldCommand.class.getName(), "run", scenario.toString(), "--out", out.toString(), "--seed", "5",
                "--quiet", "--threads", "1"));
        command.addAll(List.of(extra));
        return new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .start();
    }

    /** One place to kill: a name and the condition on the run folder that triggers the kill. */
    private record KillPoint(String name, Predicate<Path> when) {
    }

    @Test
    void aKillAtAnyPointFollowedByResumeGivesByteIdenticalResults() throws Exception {
        Path scenario = scenario("16.0");
        Path straight = tmp.resolve("straight");
        Outcome done = fatefield("run", scenario.toString(), "--out", straight.toString(), "--seed", "5", "--quiet",
                "--threads", "1");
        assertEquals(0, done.code(), done.err());
        long lineageBytes = Files.size(straight.resolve("lineage.csv"));

        List<KillPoint> points = new ArrayList<>();
        for (int tenth = 1; tenth <= 8; tenth++) {
            long threshold = lineageBytes * tenth / 10;
            points.add(new KillPoint("simulating, lineage at " + tenth + "0%", run -> size(run.resolve(
                    ".lineage.csv.partial")) >= threshold));
        }
        for (int k : new int[] {2, 4, 7, 10, 14}) {
            points.add(new KillPoint("after checkpoint change " + k, new CheckpointCounter(k)));
        }
        for (String file : List.of("lineage.csv", "scenario.toml", "lineage.nwk", "timeseries.csv", "cells.csv",
                "profile.csv", "relatedness.csv", "clones.csv", "metrics.json")) {
            points.add(new KillPoint("writing, " + file + " in place", run -> Files.exists(run.resolve(file))));
        }
        assertTrue(points.size() >= 20);

        int resumed = 0;
        List<String> summary = new ArrayList<>();
        for (int p = 0; p < points.size(); p++) {
            KillPoint point = points.get(p);
            Path killed = tmp.resolve("killed-" + p);
            Process process = start(scenario, killed, "--checkpoint-every", "0.5");
            long deadline = System.nanoTime() + 120_000_000_000L;
            while (process.isAlive() && !point.when().test(killed) && System.nanoTime() < deadline) {
                Thread.sleep(1);
            }
            process.destroyForcibly().waitFor();
            if (Files.exists(killed.resolve("run.json"))) {
                // The run finished between the condition and the kill: nothing to resume.
                assertSame(straight, killed, point.name() + " (finished before the kill)");
                summary.add(point.name() + ": finished before the kill landed");
                continue;
            }
            List<String> left;
            try (var files = Files.list(killed)) {
                left = files.map(f -> f.getFileName().toString()).sorted().toList();
            }
            Outcome again = fatefield("run", scenario.toString(), "--out", killed.toString(), "--seed", "5",
                    "--quiet", "--threads", "1", "--checkpoint-every", "0.5", "--resume");
            assertEquals(0, again.code(), point.name() + ": " + again.err());
            assertSame(straight, killed, point.name());
            resumed++;
            summary.add(point.name() + ": killed with " + left + ", resumed to identical files");
        }
        Files.createDirectories(Path.of("target"));
        Files.write(Path.of("target", "kill-summary.txt"), summary);
        assertTrue(resumed >= 18, "most kills landed before the run finished: " + resumed + " of " + points.size());
    }

    @Test
    void twoRunsStartedTogetherIntoOneFolderLeaveOneRunsResults() throws Exception {
        Path scenario = scenario("36.0");
        Path out = tmp.resolve("shared");
        Process first = start(scenario, out, "--force");
        Process second = start(scenario, out, "--force");
        String firstText = new String(first.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String secondText = new String(second.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        int a = first.waitFor();
        int b = second.waitFor();
        assertTrue((a == 0) != (b == 0), "exactly one run succeeds: exit codes " + a + " and " + b);
        assertEquals(FatefieldCommand.OUTPUT_ERROR, a == 0 ? b : a, firstText + secondText);
        Path straight = tmp.resolve("alone");
        assertEquals(0, fatefield("run", scenario.toString(), "--out", straight.toString(), "--seed", "5", "--quiet",
                "--threads", "1").code());
        assertSame(straight, out, "the folder two runs raced for");
    }

    private static void assertSame(Path expected, Path actual, String what) throws IOException {
        for (String file : RESULTS) {
            assertArrayEquals(Files.readAllBytes(expected.resolve(file)), Files.readAllBytes(actual.resolve(file)),
                    what + ": " + file);
        }
    }

    private static long size(Path file) {
        try {
            return Files.size(file);
        } catch (IOException e) {
            return -1;
        }
    }

    /** True once the checkpoint file has been seen to change {@code times} times. */
    private static final class CheckpointCounter implements Predicate<Path> {
        private final int times;
        private FileTime last;
        private int seen;

        CheckpointCounter(int times) {
            this.times = times;
        }

        @Override
        public boolean test(Path run) {
            try {
                FileTime now = Files.getLastModifiedTime(run.resolve("checkpoint.bin"));
                if (!now.equals(last)) {
                    last = now;
                    seen++;
                }
            } catch (IOException e) {
                return false;
            }
            return seen >= times;
        }
    }
}
