package org.fatefield.scenarios.sweep;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.cli.FatefieldCommand;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;


class SweepTest {

    @TempDir
    Path tmp;

    private Path sweepFile(String design, int points, int replicates) throws IOException {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 6.0").replace("founders = 120", "founders = 40");
        Files.writeString(tmp.resolve("base.toml"), demo);
        Path file = tmp.resolve(design + ".toml");
        Files.writeString(file, "[sweep]\nscenario = \"base.toml\"\ndesign = \"" + design + "\"\npoints = " + points
                + "\nreplicates = " + replicates + "\nseed = 11\n\n[[parameter]]\nkey = \"morphogen.source[1].rate\"\n"
                + (design.equals("grid") ? "values = [1.5, 3.0, 6.0]\n" : "low = 1.0\nhigh = 8.0\nscale = \"log\"\n")
                + "\n[[parameter]]\nkey = \"coupling[1].gain\"\n"
                + (design.equals("grid") ? "values = [1.2, 1.8]\n" : "low = 1.0\nhigh = 2.0\n"));
        return file;
    }

    @Test
    void shardsCoverEveryRunExactlyOnce() throws Exception {
        Manifest manifest = Manifest.plan(SweepDefinition.read(sweepFile("grid", 1, 4)));
        assertEquals(24, manifest.runs().size());
        Set<String> seen = new HashSet<>();
        for (int shard = 1; shard <= 3; shard++) {
            for (Manifest.Run run : manifest.shard(shard, 3)) {
                assertTrue(seen.add(run.id()), "run " + run.id() + " in two shards");
            }
        }
        assertEquals(24, seen.size());
        // SLURM array task 5 of 7 (ids 3..9) is shard 3/7.
        assertArrayEquals(new int[] {3, 7}, FatefieldCommandAccess.shard(null,
                Map.of("SLURM_ARRAY_TASK_ID", "5", "SLURM_ARRAY_TASK_COUNT", "7", "SLURM_ARRAY_TASK_MIN", "3")));
    }

    @Test
    void planningIsDeterministicAndSeedsDependOnlyOnPointAndReplicate() throws Exception {
        Manifest a = Manifest.plan(SweepDefinition.read(sweepFile("latin-hypercube", 6, 2)));
        Manifest b = Manifest.plan(SweepDefinition.read(sweepFile("latin-hypercube", 6, 2)));
        for (int i = 0; i < a.runs().size(); i++) {
            assertEquals(a.runs().get(i).seed(), b.runs().get(i).seed());
            assertArrayEquals(a.runs().get(i).values(), b.runs().get(i).values(), 0.0);
        }
        assertEquals(12, new HashSet<>(a.runs().stream().map(Manifest.Run::seed).toList()).size());
    }

    @Test
    void latinHypercubeHitsEachStratumOncePerDimension() {
        // The defining property (McKay, Beckman & Conover 1979).
        int k = 25;
        List<double[]> points = Designs.latinHypercube(k, 4, RandomStreams.of(3).stream(0));
        for (int d = 0; d < 4; d++) {
            boolean[] hit = new boolean[k];
            for (double[] p : points) {
                int stratum = (int) Math.floor(p[d] * k);
                assertFalse(hit[stratum], "stratum " + stratum + " hit twice in dimension " + d);
                hit[stratum] = true;
            }
        }
    }

    @Test
    void sobolPointsFollowTheDirectionNumberConstruction() {
        // First points after the origin of the two-dimensional Sobol sequence in Gray-code order
        // with the Joe & Kuo (2008) direction numbers (dimension 2: s = 1, a = 0, m = 1); from memory.
        double[][] expected = {{0.5, 0.5}, {0.75, 0.25}, {0.25, 0.75}, {0.375, 0.375}, {0.875, 0.875},
            {0.625, 0.125}, {0.125, 0.625}};
        List<double[]> points = Designs.sobol(7, 2);
        for (int i = 0; i < expected.length; i++) {
            assertArrayEquals(expected[i], points.get(i), 0.0, "point " + (i + 1));
        }
    }

    @Test
    void overridesProduceValidScenariosWithTheNewValues() throws Exception {
        // A multi-line description once made a variant written back out as TOML text invalid.
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replaceFirst("description = \"[^\"]*\"", "description = \"\"\"two\nlines \"quoted\"\"\"\"");
        Overrides overrides = Overrides.none().with("morphogen.source[1].rate", 4.5).with("tissue.founders", 77.0)
                .with("circuit.kinetics.Ark.degradation", 1.25);
        var scenario = ScenarioReader.parse("v", "v", demo.getBytes(StandardCharsets.UTF_8), null, overrides);
        assertEquals("two\nlines \"quoted\"", scenario.description());
        assertEquals(List.of("morphogen.source[1].rate = 4.5", "tissue.founders = 77.0",
                "circuit.kinetics.Ark.degradation = 1.25"), scenario.overrides());
        assertEquals(4.5, scenario.tissue().morphogen().sources().get(0).rate(), 0.0);
        assertEquals(77, scenario.tissue().growth().initialCells());
        var names = scenario.tissue().circuit().network().parameterNames();
        assertEquals(1.25, scenario.tissue().mapping().base()[names.indexOf("Ark.degradation")], 0.0);
        assertEquals(1.0, scenario.tissue().mapping().base()[names.indexOf("Lum.degradation")], 0.0);
    }

    @Test
    void badOverridesAreReportedLikeBadLinesOfTheFile() {
        byte[] demo = BuiltinScenarios.bytes("demo").orElseThrow();
        ScenarioException negative = assertThrows(ScenarioException.class, () -> ScenarioReader.parse("demo", "demo",
                demo, null, Overrides.none().with("tissue.repulsion", -2.0)));
        assertEquals("tissue.repulsion", negative.problems().get(0).keyPath(), negative.getMessage());
        assertTrue(negative.problems().get(0).line() > 0, "points at the line the override replaces");
        ScenarioException missing = assertThrows(ScenarioException.class, () -> ScenarioReader.parse("demo", "demo",
                demo, null, Overrides.none().with("morphogen.source[3].rate", 1.0)));
        assertTrue(missing.getMessage().contains("has no source[3]"), missing.getMessage());
        ScenarioException unknown = assertThrows(ScenarioException.class, () -> ScenarioReader.parse("demo", "demo",
                demo, null, Overrides.none().with("tissue.colour", "blue")));
        assertTrue(unknown.getMessage().contains("tissue.colour"), unknown.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Overrides.none().with("tissue..width", 1.0));
    }

    @Test
    void aKilledSweepResumesToTheSameTableAndCorruptResultsAreRerun() throws Exception {
        Path file = sweepFile("grid", 1, 2);
        Path straight = tmp.resolve("straight");
        Path killed = tmp.resolve("killed");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", straight.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", killed.toString()));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", straight.toString(), "--workers", "2"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", straight.toString()));

        Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "-Djava.awt.headless=true",
                "org.fatefield.scenarios.cli.FatefieldCommand", "sweep", "run", killed.toString(), "--workers", "1")
                .redirectErrorStream(true).redirectOutput(tmp.resolve("killed.log").toFile()).start();
        Path results = killed.resolve(SweepRunner.RESULTS);
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (process.isAlive() && System.nanoTime() < deadline && countResults(results) < 2) {
            Thread.sleep(10);
        }
        process.destroyForcibly().waitFor();
        int before = countResults(results);
        assertTrue(before >= 2 && before < 12, "killed after " + before + " of 12 results");
        // Truncate one finished result: it must be detected and rerun, never merged.
        Path victim;
        try (var files = Files.list(results)) {
            victim = files.filter(f -> f.getFileName().toString().endsWith(".json")).findFirst().orElseThrow();
        }
        Files.writeString(victim, "{\"run_id\": \"p00");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", killed.toString(), "--workers", "2"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", killed.toString()));
        assertArrayEquals(Files.readAllBytes(straight.resolve("runs.csv")), Files.readAllBytes(killed.resolve("runs.csv")));
        assertArrayEquals(Files.readAllBytes(straight.resolve("summary.csv")),
                Files.readAllBytes(killed.resolve("summary.csv")));
    }

    private static int countResults(Path results) throws IOException {
        if (!Files.isDirectory(results)) {
            return 0;
        }
        try (var files = Files.list(results)) {
            return (int) files.filter(f -> f.getFileName().toString().matches("p\\d+-r\\d+\\.json")).count();
        }
    }

    @Test
    void hostileSweepFilesGetClearErrorsNamingKeyAndLine() throws IOException {
        sweepFile("grid", 1, 1);
        String parameter = "\n[[parameter]]\nkey = \"coupling[1].gain\"\nvalues = [1.2, 1.8]\n";
        Files.createDirectories(tmp.resolve("inner"));
        String[][] cases = {
            {"points = \"eight\"", "sweep.points", "whole number from 1 to 100000"},
            {"replicates = 2.5", "sweep.replicates", "whole number from 1 to 10000"},
            {"seed = -4", "sweep.seed", "whole number from 0 to 9007199254740991"},
            {"scenario = 7", "sweep.scenario", "must be text"},
            {"scenario = \"../base.toml\"", "sweep.scenario", "in the sweep's folder"},
            {"scenario = \"/dev/zero\"", "sweep.scenario", "in the sweep's folder"},
        };
        for (String[] c : cases) {
            String key = c[0].substring(0, c[0].indexOf(' '));
            String sweep = "[sweep]\n" + (key.equals("scenario") ? "" : "scenario = \"base.toml\"\n")
                    + c[0] + "\n" + parameter;
            Path file = tmp.resolve("inner").resolve("hostile.toml");
            Files.writeString(file, sweep);
            if (!key.equals("scenario")) {
                Files.copy(tmp.resolve("base.toml"), tmp.resolve("inner").resolve("base.toml"),
                        StandardCopyOption.REPLACE_EXISTING);
            }
            ScenarioException e = assertThrows(ScenarioException.class, () -> SweepDefinition.read(file), c[0]);
            assertEquals(c[1], e.problems().get(0).keyPath(), c[0] + ": " + e.getMessage());
            assertTrue(e.problems().get(0).line() > 0, c[0] + ": the line is named");
            assertTrue(e.getMessage().contains(c[2]), c[0] + ": " + e.getMessage());
        }
    }

    @Test
    void collectSaysInItsExitCodeWhenRunsAreMissing() throws Exception {
        Path file = sweepFile("grid", 1, 1);
        Path folder = tmp.resolve("partial-sweep");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", folder.toString()));
        assertEquals(5, FatefieldCommandAccess.run("sweep", "collect", folder.toString()), "nothing has run yet");
    }

    @Test
    void aScenarioWithAnIncludedCircuitIsCopiedWholeIntoRunAndSweepFolders() throws Exception {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8)
                .replace("duration = 48.0", "duration = 4.0");
        int from = demo.indexOf("[circuit]");
        int to = demo.indexOf("[morphogen]");
        Path home = tmp.resolve("bundle");
        Files.createDirectories(home.resolve("circuits"));
        Files.writeString(home.resolve("circuits").resolve("switch.toml"), demo.substring(from, to));
        Files.writeString(home.resolve("base.toml"), demo.substring(0, from) + "[circuit]\nfile = \"circuits/switch.toml\"\n\n"
                + demo.substring(to));
        Path run = home.resolve("run");
        assertEquals(0, FatefieldCommandAccess.run("run", home.resolve("base.toml").toString(), "--out", run.toString(),
                "--quiet"));
        assertEquals(Files.readString(home.resolve("circuits").resolve("switch.toml")),
                Files.readString(run.resolve("circuits").resolve("switch.toml")), "the include is copied beside scenario.toml");
        assertEquals(0, FatefieldCommandAccess.run("report", run.toString()));
        assertTrue(Files.readString(run.resolve("report.html")).contains("bifurcation diagram"),
                "the report finds the included circuit and draws it");
        Path sweep = home.resolve("sweep.toml");
        Files.writeString(sweep, "[sweep]\nscenario = \"base.toml\"\ndesign = \"grid\"\nreplicates = 1\n\n"
                + "[[parameter]]\nkey = \"circuit.kinetics.repression_hill\"\nvalues = [3.0, 4.0]\n");
        Path folder = home.resolve("sweep-out");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", sweep.toString(), "--out", folder.toString()));
        assertTrue(Files.exists(folder.resolve("circuits").resolve("switch.toml")), "the include is in the sweep folder");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "run", folder.toString(), "--workers", "1"));
        assertEquals(0, FatefieldCommandAccess.run("sweep", "collect", folder.toString()), "every run finished");
    }

    /** A point asking for 1e11 time steps (run.duration 1e9 h in 0.01 h steps) stops the whole plan, naming it. */
    @Test
    void aSweepWithAnImpossiblePointIsNotPlanned() throws Exception {
        sweepFile("grid", 1, 1);
        Path file = tmp.resolve("long.toml");
        Files.writeString(file, "[sweep]\nscenario = \"base.toml\"\ndesign = \"grid\"\nreplicates = 1\n\n"
                + "[[parameter]]\nkey = \"run.duration\"\nvalues = [6.0, 1e9]\n");
        Path folder = tmp.resolve("long-sweep");
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "sweep", "plan",
                file.toString(), "--out", folder.toString());
        assertEquals(1, code, "exit code 1, bad input: " + err);
        assertTrue(err.toString().contains("run.duration = 1") && err.toString().contains("time steps"),
                err.toString());
        assertTrue(Files.notExists(folder), "nothing is written");
    }
}
