package org.fatefield.scenarios.format;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.division.CellSize;
import org.fatefield.engine.division.PartitionMode;
import org.fatefield.engine.division.SizeControl;
import org.fatefield.engine.metrics.FateReach;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;


class ScenarioReaderTest {

    private static String demo() {
        return new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8);
    }

    private static List<Problem> problems(String text) {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse("test.toml", "test", text.getBytes(StandardCharsets.UTF_8)));
        return e.problems();
    }

    private static int lineOf(String text, String fragment) {
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(fragment)) {
                return i + 1;
            }
        }
        throw new AssertionError("fragment not found: " + fragment);
    }

    @Test
    void theDemoIsValid() throws ScenarioException {
        Scenario scenario = ScenarioReader.parse("demo", "demo", demo().getBytes(StandardCharsets.UTF_8));
        assertEquals("glassfin-fold", scenario.name());
        assertEquals(List.of("photocyte", "shieldcyte", "progenitor"), scenario.tissue().fates().fateNames());
        assertEquals(4800, scenario.tissue().timing().totalSteps());
        assertEquals(64, scenario.sha256().length());
    }

    @Test
    void everyExampleScenarioIsValid() throws Exception {
        Path folder = Path.of("examples");
        List<Path> files;
        try (var listing = Files.list(folder)) {
            files = listing.filter(p -> p.toString().endsWith(".toml")).toList();
        }
        assertTrue(!files.isEmpty(), "no examples in " + folder.toAbsolutePath());
        for (Path file : files) {
            Scenario scenario = ScenarioReader.parse(file.getFileName().toString(), file.toString(),
                    Files.readAllBytes(file));
            assertTrue(scenario.tissue().growth().initialCells() > 0, file.toString());
        }
    }

    @Test
    void sizeControlKeysReachTheEngine() throws ScenarioException {
        String text = demo().replace("partition = \"binomial\"",
                "partition = \"volume\"\nsize_control = \"adder\"\nvolume_split_cv = 0.12");
        Scenario scenario = ScenarioReader.parse("test", "test.toml", text.getBytes(StandardCharsets.UTF_8));
        assertEquals(new CellSize(SizeControl.ADDER, 0.12), scenario.tissue().growth().size());
        assertEquals(PartitionMode.VOLUME, scenario.tissue().growth().partition().mode());
    }

    @Test
    void aStripRunsAndItsHeightMustFitTheGrid() throws ScenarioException {
        String text = demo().replace("repulsion = 20.0", "repulsion = 20.0\nshape = \"strip\"")
                .replace("duration = 48.0", "duration = 2.0");
        Scenario scenario = ScenarioReader.parse("test", "test.toml", text.getBytes(StandardCharsets.UTF_8));
        Tissue tissue = new Tissue(scenario.tissue(), 3);
        tissue.start();
        tissue.runToEnd();
        for (Cell c : tissue.cells()) {
            assertTrue(c.y() >= 0 && c.y() < 300, "y = " + c.y());
        }
        tissue.finish();
        Problem p = problems(text.replace("height = 300.0", "height = 305.0")).get(0);
        assertTrue(p.message().contains("whole number of morphogen grid squares"), p.message());
    }

    @Test
    void unequalVolumesWithMoleculeCountsAreRefused() {
        String text = demo().replace("partition = \"binomial\"", "volume_split_cv = 0.1")
                .replace("noise = \"langevin\"", "noise = \"exact\"");
        Problem p = problems(text).get(0);
        assertEquals("division.volume_split_cv", p.keyPath());
        assertTrue(p.message().contains("langevin"), p.message());
    }

    @Test
    void unknownKeyIsReportedWithLineKeyAndSuggestion() {
        String text = demo().replace("cell_radius = 4.0", "cell_radus = 4.0");
        List<Problem> problems = problems(text);
        assertEquals(1, problems.size(), problems.toString());
        Problem p = problems.get(0);
        assertEquals(lineOf(text, "cell_radus"), p.line());
        assertEquals("tissue.cell_radus", p.keyPath());
        assertTrue(p.message().contains("did you mean 'cell_radius'"), p.message());
    }

    @Test
    void negativeRateIsReportedWithValueAndAllowedRange() {
        String text = demo().replace("rate = 3.0", "rate = -3.0");
        Problem p = problems(text).get(0);
        assertEquals(lineOf(text, "rate = -3.0"), p.line());
        assertEquals("morphogen.source[1].rate", p.keyPath());
        assertEquals("-3.0", p.value());
        assertTrue(p.message().contains("at least 0"), p.message());
        assertTrue(p.format().startsWith("test.toml:" + p.line() + ":"), p.format());
    }

    @Test
    void missingSectionIsNamed() {
        String text = demo().replace("[tissue]", "[tissue_gone]");
        List<Problem> problems = problems(text);
        assertTrue(problems.stream().anyMatch(p -> p.keyPath().equals("tissue") && p.message().contains("missing section")),
                problems.toString());
        assertTrue(problems.stream().anyMatch(p -> p.keyPath().equals("tissue_gone")
                && p.line() == lineOf(text, "[tissue_gone]")), problems.toString());
    }

    @Test
    void malformedTomlGivesLineAndColumn() {
        String text = demo().replace("duration = 48.0", "duration = 48.0.0");
        Problem p = problems(text).get(0);
        assertEquals(lineOf(text, "48.0.0"), p.line());
        assertTrue(p.column() > 0);
        assertTrue(p.message().startsWith("not valid TOML"), p.message());
    }

    @Test
    void everyProblemIsReportedAtOnce() {
        String text = demo().replace("width = 600.0", "width = -1")
                .replace("noise = \"langevin\"", "noise = \"loud\"")
                .replace("half_max = 1.0", "half_max = \"one\"")
                .replace("above = { Lum = 0.6 }", "above = { Lum = 0.6 }\ncolour = \"red\"");
        List<Problem> problems = problems(text);
        assertEquals(4, problems.size(), problems.toString());
        assertEquals(List.of("tissue.width", "circuit.noise", "coupling[1].half_max", "fates.rule[1].colour"),
                problems.stream().map(Problem::keyPath).toList());
    }

    @Test
    void semanticProblemsNameTheKey() {
        String text = demo().replace("above = { Lum = 0.6 }", "above = { Lux = 0.6 }")
                .replace("parameter = \"repression\"", "parameter = \"represion\"");
        List<Problem> problems = problems(text);
        assertEquals(2, problems.size(), problems.toString());
        assertTrue(problems.get(0).message().contains("did you mean 'repression'"), problems.get(0).message());
        assertEquals("fates.rule[1].above.Lux", problems.get(1).keyPath());
    }

    @Test
    void perGeneKineticsOverrideTheSharedOnes() throws ScenarioException {
        String text = demo().replace("degradation = 1.0", "degradation = 1.0\n\n[circuit.kinetics.Ark]\ndegradation = 2.5");
        Scenario scenario = ScenarioReader.parse("t", "t", text.getBytes(StandardCharsets.UTF_8));
        double[] p = scenario.tissue().mapping().base();
        List<String> names = scenario.tissue().circuit().network().parameterNames();
        assertEquals(1.0, p[names.indexOf("Lum.degradation")], 0.0);
        assertEquals(2.5, p[names.indexOf("Ark.degradation")], 0.0);
    }

    /**
     * A coupling that drives the repressible production below zero (-50 + 0.2 at saturation,
     * minus the rest) and the same with no coupling problem: the first is refused naming the
     * reaction, the parameter value and why; nothing is clamped silently.
     */
    @Test
    void negativeRatesAreRefusedBeforeARun() {
        String negative = demo().replace("base = 0.2\ngain = 1.8", "base = 0.2\ngain = -50.0");
        assertTrue(!negative.equals(demo()), "the demo's coupling block changed; update this test");
        List<Problem> found = problems(negative);
        assertEquals(1, found.size(), found.toString());
        String message = found.get(0).message();
        assertTrue(message.contains("production of Lum is negative") && message.contains("repression = -49.8"),
                message);
        List<Problem> finite = problems(demo().replace("repression_hill = 4", "repression_hill = 4\nbasal = -1.0"));
        assertTrue(!finite.isEmpty(), "a negative basal rate is refused too");
    }

    /**
     * A degradation of 200 per hour with steps of 0.01 h: rate x step = 2, where Euler-Maruyama
     * on a linear decay is at its stability limit (common practice: keep it well below 1); and a
     * death rate whose chance per step exceeds 1.
     */
    @Test
    void stepsTooLongForTheCircuitAndImpossibleDeathRatesAreRefused() {
        List<Problem> fast = problems(demo().replace("degradation = 1.0", "degradation = 200.0"));
        assertEquals(1, fast.size(), fast.toString());
        assertTrue(fast.get(0).message().contains("rate x step = 2.00") && fast.get(0).message().contains("0.00500 h"),
                fast.get(0).message());
        List<Problem> death = problems(demo().replace("[division]\n", "[division]\ndeath_rate = 1000.0\n"));
        assertEquals(1, death.size(), death.toString());
        assertTrue(death.get(0).message().contains("below 1 / run.step = 100"), death.get(0).message());
    }

    /**
     * A photocyte rule asking for Lum at 6 can never be met by a steady state: production is at
     * most basal + self-activation + the largest repressible rate (0.05 + 0.2 + 2.0 with the
     * coupling's top repression of 2.0) over a degradation of 1, so Lum stays below 2.25. The
     * demo's own rule (Lum at 0.6) is met.
     */
    @Test
    void aFateNoSteadyStateCanMeetIsNoted() throws ScenarioException {
        String text = demo().replace("above = { Lum = 0.6 }", "above = { Lum = 6.0 }");
        assertTrue(!text.equals(demo()), "the demo's photocyte rule changed; update this test");
        Scenario unmet = ScenarioReader.parse("test", "test.toml", text.getBytes(StandardCharsets.UTF_8));
        List<String> notes = FateReach.unmet(unmet.tissue());
        assertEquals(1, notes.size(), notes.toString());
        assertTrue(notes.get(0).contains("'photocyte'"), notes.get(0));
        Scenario demo = ScenarioReader.parse("demo", "demo", demo().getBytes(StandardCharsets.UTF_8));
        assertEquals(List.of(), FateReach.unmet(demo.tissue()));
    }

    /** An extrinsic CV of 1e308 (a factor of 0 in almost every cell) is refused, naming the key. */
    @Test
    void anAbsurdExtrinsicSpreadIsRefused() {
        String text = demo() + "\n[[extrinsic]]\nparameter = \"degradation\"\ncv = 1e308\n";
        List<Problem> found = problems(text);
        assertEquals(1, found.size(), found.toString());
        assertTrue(found.get(0).keyPath().endsWith("cv"), found.toString());
    }

    /** System sizes where counts round to nothing or noise is below rounding are refused, naming the key. */
    @Test
    void systemSizesOutsideOneToABillionAreRefused() {
        for (String size : new String[] {"1e-300", "0.5", "1e12", "1e308"}) {
            List<Problem> found = problems(demo().replace("system_size = 100.0", "system_size = " + size));
            assertEquals(1, found.size(), size + ": " + found);
            assertEquals("circuit.system_size", found.get(0).keyPath(), size);
        }
    }
}
