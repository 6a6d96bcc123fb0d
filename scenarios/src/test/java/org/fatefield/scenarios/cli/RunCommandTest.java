package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunLayout;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


class RunCommandTest {

    @TempDir
    Path tmp;

    private record Outcome(int code, String out, String err) {
    }

    private static Outcome fatefield(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    /** The demo, shortened to 12 h so the test stays quick. */
    private Path shortDemo() throws IOException {
        String text = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 12.0");
        Path file = tmp.resolve("short.toml");
        Files.writeString(file, text);
        return file;
    }

    @Test
    void sameScenarioAndSeedGiveByteIdenticalTables() throws IOException {
        Path scenario = shortDemo();
        Path first = tmp.resolve("first");
        Path second = tmp.resolve("second");
        assertEquals(0, fatefield("run", scenario.toString(), "--out", first.toString(), "--seed", "5", "--quiet").code());
        assertEquals(0, fatefield("run", scenario.toString(), "--out", second.toString(), "--seed", "5", "--quiet").code());
        for (String file : List.of("timeseries.csv", "cells.csv")) {
            assertArrayEquals(Files.readAllBytes(first.resolve(file)), Files.readAllBytes(second.resolve(file)), file);
        }
        for (String file : List.of("fate-proportions.png", "tissue.png", "run.json")) {
            assertTrue(Files.size(first.resolve(file)) > 0, file);
        }
        Path third = tmp.resolve("third");
        assertEquals(0, fatefield("run", scenario.toString(), "--out", third.toString(), "--seed", "6", "--quiet").code());
        assertFalse(Arrays.equals(Files.readAllBytes(first.resolve("cells.csv")),
                Files.readAllBytes(third.resolve("cells.csv"))), "another seed should give another tissue");
    }

    @Test
    void badScenariosExitNonZeroNameLineAndKeyAndCreateNoFolder() throws IOException {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8);
        List<String[]> cases = List.of(
                new String[] {demo.replace("founders = 120", "founders = 120\nspeed = 3"), "tissue.speed", "speed = 3"},
                new String[] {demo.replace("rate = 3.0", "rate = -3.0"), "morphogen.source[1].rate", "rate = -3.0"},
                new String[] {demo.replace("[circuit]", "[circus]"), "circuit", null},
                new String[] {demo.replace("step = 0.01", "step = = 0.01"), "run.step", "step = = 0.01"});
        for (String[] c : cases) {
            Path file = tmp.resolve("bad.toml");
            Files.writeString(file, c[0]);
            Path out = tmp.resolve("never");
            for (String command : List.of("run", "validate")) {
                Outcome o = command.equals("run")
                        ? fatefield("run", file.toString(), "--out", out.toString())
                        : fatefield("validate", file.toString());
                assertNotEquals(0, o.code(), command + " should fail for " + c[1]);
                assertTrue(o.err().contains(c[1]), o.err());
                assertTrue(o.err().contains(file.toString()), o.err());
                if (c[2] != null) {
                    int line = lineStartingWith(c[0], c[2]);
                    assertTrue(o.err().contains(file + ":" + line + ":"), "line " + line + " in " + o.err());
                }
                assertFalse(Files.exists(out), "no output folder may be created");
            }
        }
    }

    private static int lineStartingWith(String text, String start) {
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].startsWith(start)) {
                return i + 1;
            }
        }
        throw new AssertionError("no line starts with " + start);
    }

    @Test
    void aFolderWithFilesIsNotOverwrittenWithoutForce() throws IOException {
        Path scenario = shortDemo();
        Path out = tmp.resolve("busy");
        Files.createDirectories(out);
        Files.writeString(out.resolve("notes.txt"), "mine");
        Outcome refused = fatefield("run", scenario.toString(), "--out", out.toString(), "--quiet");
        assertEquals(FatefieldCommand.OUTPUT_ERROR, refused.code());
        assertTrue(refused.err().contains("--force"), refused.err());
        try (var files = Files.list(out)) {
            assertEquals(1, files.count());
        }
        assertEquals(0, fatefield("run", scenario.toString(), "--out", out.toString(), "--quiet", "--force").code());
        assertEquals("mine", Files.readString(out.resolve("notes.txt")));
        assertTrue(Files.exists(out.resolve("run.json")));
    }

    @Test
    void aKilledRunResumesFromItsCheckpointToTheSameResult() throws Exception {
        Path scenario = tmp.resolve("long.toml");
        Files.writeString(scenario, new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("founders = 120", "founders = 400").replace("duration = 48.0", "duration = 30.0"));
        Path straight = tmp.resolve("straight");
        assertEquals(0, fatefield("run", scenario.toString(), "--out", straight.toString(), "--seed", "3", "--quiet",
                "--snapshots").code());

        Path killed = tmp.resolve("killed");
        Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "-Djava.awt.headless=true",
                FatefieldCommand.class.getName(), "run", scenario.toString(), "--out", killed.toString(), "--seed", "3",
                "--quiet", "--threads", "1", "--checkpoint-every", "1", "--snapshots").redirectErrorStream(true).start();
        Path checkpoint = killed.resolve("checkpoint.bin");
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (!Files.exists(checkpoint) && process.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        Thread.sleep(150);
        process.destroyForcibly().waitFor();
        assertTrue(Files.exists(checkpoint), "the run was killed after its first checkpoint");
        assertFalse(Files.exists(killed.resolve("run.json")), "the killed run did not finish");
        refusesDamagedFolders(scenario, killed);
        // A kill while the results were being written leaves the table renamed into place: still resumable.
        Files.move(killed.resolve(".lineage.csv.partial"), killed.resolve("lineage.csv"));

        Outcome resumed = fatefield("run", scenario.toString(), "--out", killed.toString(), "--seed", "3", "--quiet",
                "--resume", "--snapshots");
        assertEquals(0, resumed.code(), resumed.err());
        for (String file : List.of("timeseries.csv", "cells.csv", "lineage.csv", "lineage.nwk", "profile.csv")) {
            assertArrayEquals(Files.readAllBytes(straight.resolve(file)), Files.readAllBytes(killed.resolve(file)), file);
        }
        // Snapshots: one cell and one field table per record time (30 h every 0.5 h: 61), the same after the kill.
        List<String> names;
        try (var list = Files.list(straight.resolve("snapshots"))) {
            names = list.map(p -> p.getFileName().toString()).sorted().toList();
        }
        assertEquals(122, names.size(), names.toString());
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(straight.resolve("snapshots").resolve(name)),
                    Files.readAllBytes(killed.resolve("snapshots").resolve(name)), name);
        }
        List<String> lastCells = Files.readAllLines(straight.resolve("snapshots").resolve(names.get(60)));
        assertEquals(Files.readAllLines(straight.resolve("cells.csv")).size(), lastCells.size(),
                "the last cell table has every live cell, like cells.csv");
        assertFalse(Files.exists(checkpoint), "a finished run keeps no checkpoint");
        Outcome nothing = fatefield("run", scenario.toString(), "--out", tmp.resolve("empty").toString(), "--resume");
        assertEquals(FatefieldCommand.OUTPUT_ERROR, nothing.code());
        assertTrue(nothing.err().contains("nothing to resume"), nothing.err());
    }

    /**
     * Copies of a killed run's folder with the checkpoint cut short, a byte of it flipped, or the
     * lineage table cut short: each resume is refused with a message, and nothing is written.
     */
    private void refusesDamagedFolders(Path scenario, Path killed) throws IOException {
        byte[] checkpoint = Files.readAllBytes(killed.resolve("checkpoint.bin"));
        byte[] flipped = checkpoint.clone();
        flipped[flipped.length / 2] ^= 0x10;
        Path lineage = killed.resolve(".lineage.csv.partial");
        byte[] rows = Files.readAllBytes(lineage);
        String[][] damages = {{"checkpoint.bin", "cut"}, {"checkpoint.bin", "flip"}, {".lineage.csv.partial", "cut"}};
        for (String[] damage : damages) {
            Path copy = tmp.resolve("damaged-" + damage[0] + "-" + damage[1]);
            Files.createDirectories(copy);
            try (var files = Files.list(killed)) {
                for (Path f : files.toList()) {
                    Files.copy(f, copy.resolve(f.getFileName()));
                }
            }
            byte[] original = damage[0].equals("checkpoint.bin") ? checkpoint : rows;
            byte[] bad = damage[1].equals("flip") ? flipped : Arrays.copyOf(original, original.length / 3);
            Files.write(copy.resolve(damage[0]), bad);
            Outcome resumed = fatefield("run", scenario.toString(), "--out", copy.toString(), "--seed", "3", "--quiet",
                    "--resume");
            assertEquals(FatefieldCommand.OUTPUT_ERROR, resumed.code(), damage[0] + " " + damage[1] + ": "
                    + resumed.err());
            assertTrue(resumed.err().contains("start the run again"), resumed.err());
            assertFalse(resumed.err().contains("Exception"), "a message, not a stack trace: " + resumed.err());
            assertFalse(Files.exists(copy.resolve("run.json")), "nothing finished from a damaged folder");
        }
    }

    @Test
    void aSecondRunCannotWriteIntoAFolderARunHolds() throws IOException {
        Path scenario = shortDemo();
        Path out = tmp.resolve("held");
        Files.createDirectories(out);
        try (var held = RunFolder.open(out).lock()) {
            Outcome second = fatefield("run", scenario.toString(), "--out", out.toString(), "--force", "--quiet");
            assertEquals(FatefieldCommand.OUTPUT_ERROR, second.code(), second.err());
            assertTrue(second.err().contains("another Fatefield run is writing into"), second.err());
            assertFalse(Files.exists(out.resolve("lineage.csv")) || Files.exists(out.resolve(".lineage.csv.partial")),
                    "the second run wrote nothing");
        }
        assertEquals(0, fatefield("run", scenario.toString(), "--out", out.toString(), "--force", "--quiet").code());
        assertFalse(Files.exists(out.resolve(".fatefield.lock")), "the lock is gone with the run");
    }

    @Test
    void aScenarioNameCannotChooseAFolderOutsideTheCurrentOne() {
        assertEquals(Path.of("_.._x-seed1"), RunLayout.defaultFolder("../../x", "-seed1"));
        assertEquals(Path.of("_etc_passwd-analysis"), RunLayout.defaultFolder("/etc/passwd", "-analysis"));
        assertEquals(Path.of("glassfin-fold-seed1"), RunLayout.defaultFolder("glassfin-fold", "-seed1"));
        assertEquals(Path.of("scenario-seed2"), RunLayout.defaultFolder("..", "-seed2"));
    }

    @Test
    void validateAcceptsTheDemoAndUnknownNamesAreExplained() {
        Outcome ok = fatefield("validate", "demo");
        assertEquals(0, ok.code());
        assertTrue(ok.out().contains("valid"), ok.out());
        Outcome missing = fatefield("run", "no-such-scenario");
        assertEquals(FatefieldCommand.INVALID_INPUT, missing.code());
        assertTrue(missing.err().contains("built-in: demo"), missing.err());
    }

    @Test
    void outOfRangeOptionsAreRefusedBeforeAnythingRuns() {
        Path out = tmp.resolve("never");
        String o = out.toString();
        // Each case: the option that must be named, then the command line.
        String[][] cases = {
            {"--threads", "run", "demo", "--threads", "0", "--out", o},
            {"--threads", "run", "demo", "--threads", "100000", "--out", o},
            {"--seed", "run", "demo", "--seed", "-3", "--out", o},
            {"--seed", "run", "demo", "--seed", "9007199254740992", "--out", o},
            {"--threads", "replicates", "demo", "--runs", "2", "--threads", "-1", "--out", o},
            {"--seed", "analyze", "demo", "--seed", "-1", "--out", o},
            {"--system-size", "analyze", "demo", "--system-size", "0", "--out", o},
            {"--at", "analyze", "demo", "--at", "NaN", "--out", o},
            {"--cells", "bench", "--cells", "0"},
            {"--cells", "bench", "--cells", "-5"},
            {"--steps", "bench", "--steps", "0"},
            {"--workers", "sweep", "run", o, "--workers", "0"},
        };
        for (String[] c : cases) {
            String[] args = Arrays.copyOfRange(c, 1, c.length);
            Outcome bad = fatefield(args);
            assertEquals(2, bad.code(), String.join(" ", args) + ": " + bad.err());
            assertTrue(bad.err().contains(c[0] + " must be"), bad.err());
            assertTrue(!Files.exists(out), "nothing created for " + String.join(" ", args));
        }
    }

    @Test
    void aCircuitWithoutSteadyStatesRunsToItsTablesWithTheMetricsItCannotComputeMarkedUndefined()
            throws IOException {
        // dX/dt = k > 0 has no steady state (a pure integrator), so no boundary can be predicted.
        Path scenario = tmp.resolve("integrator.toml");
        try (var in = RunCommandTest.class.getResourceAsStream("/integrator.toml")) {
            Files.write(scenario, in.readAllBytes());
        }
        Path out = tmp.resolve("integrator-run");
        Outcome run = fatefield("run", scenario.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, run.code(), run.err());
        for (String file : List.of("cells.csv", "timeseries.csv", "lineage.csv", "metrics.json", "run.json")) {
            assertTrue(Files.exists(out.resolve(file)), file + " written");
        }
        String metrics = Files.readString(out.resolve("metrics.json"));
        assertTrue(metrics.contains("\"predicted_boundaries\": []"), metrics);
        assertTrue(metrics.contains("no steady state"), metrics);
        Outcome report = fatefield("report", out.toString());
        assertEquals(0, report.code(), report.err());
        assertTrue(Files.readString(out.resolve("report.html")).contains("No boundary is predicted"));
    }

    @Test
    void scenariosAskingForImpossibleOrVeryLongWorkAreRefusedBeforeTheyStart() throws IOException {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8);
        String[][] cases = {
            {"duration = 48.0", "duration = 1e308", "time steps"},
            {"step = 0.01 ", "step = 1e-300 ", "time steps"},
            {"cycle_mean = 12.0", "cycle_mean = 0.001", "cells at the end"},
            {"founders = 120", "founders = 200000", "founders cover"},
            {"diffusion = 3600.0", "diffusion = 1e12", "add --yes"},
        };
        for (String[] c : cases) {
            Path scenario = tmp.resolve("hostile.toml");
            Files.writeString(scenario, demo.replace(c[0], c[1]));
            Path out = tmp.resolve("hostile-run");
            Outcome run = fatefield("run", scenario.toString(), "--out", out.toString(), "--quiet");
            assertEquals(FatefieldCommand.INVALID_INPUT, run.code(), c[1] + ": " + run.err());
            assertTrue(run.err().contains(c[2]), c[1] + ": " + run.err());
            assertFalse(Files.exists(out), c[1] + ": nothing was created");
        }
    }

    @Test
    void setReplacesScenarioValuesAndTheRunRecordsIt() throws IOException {
        Path out = tmp.resolve("set");
        Outcome o = fatefield("run", "demo", "--set", "run.duration=3.0", "--set", "tissue.founders=20", "--out",
                out.toString(), "--quiet");
        assertEquals(0, o.code(), o.err());
        String json = Files.readString(out.resolve("run.json"));
        assertTrue(json.contains("run.duration = 3.0") && json.contains("tissue.founders = 20"), json);
        assertTrue(json.contains("\"build_commit\""), json);
        List<String> lines = Files.readAllLines(out.resolve("population.csv"));
        assertEquals("time_h,cells,mean_morphogen", lines.get(0));
        String last = lines.get(lines.size() - 1);
        assertEquals(3.0, Double.parseDouble(last.substring(0, last.indexOf(','))), 1e-9, "the run ends at 3 h");
        assertEquals("20", lines.get(1).split(",")[1], "20 founders: " + lines.get(1));
    }

    @Test
    void versionNamesTheBuildCommit() {
        Outcome o = fatefield("--version");
        assertEquals(0, o.code());
        // The build writes build.properties from git; outside a checkout the commit is "unknown".
        String commit = Files.exists(Path.of("..", ".git")) ? "[0-9a-f]{7,}(-dirty)?" : "unknown";
        assertTrue(o.out().matches("(?s)fatefield \\S+ \\(build " + commit + "\\).*"), o.out());
    }
}
