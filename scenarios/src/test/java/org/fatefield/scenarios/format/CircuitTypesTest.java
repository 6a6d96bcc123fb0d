package org.fatefield.scenarios.format;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.model.HillNetwork;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;


/** Hill-network and custom circuits written in a scenario. */
class CircuitTypesTest {

    private static final String CUSTOM_CIRCUIT = """
            [circuit]
            type = "custom"
            species = ["Lum", "Ark"]
            noise = "langevin"
            system_size = 100.0
            initial = [0.3, 0.3]

            [circuit.parameters]
            b = 0.05
            s = 0.2
            K = 0.5
            n = 4
            repression = 1.0
            d = 1.0

            [[circuit.reaction]]
            name = "make Lum"
            change = { Lum = 1 }
            rate = "b + s * hill_act(Lum, K, n) + repression * hill_rep(Ark, K, n)"

            [[circuit.reaction]]
            name = "lose Lum"
            change = { Lum = -1 }
            rate = "d * Lum"

            [[circuit.reaction]]
            name = "make Ark"
            change = { Ark = 1 }
            rate = "b + s * hill_act(Ark, K, n) + repression * hill_rep(Lum, K, n)"

            [[circuit.reaction]]
            name = "lose Ark"
            change = { Ark = -1 }
            rate = "d * Ark"
            """;

    private static String demoWithCircuit(String circuit) {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8);
        int start = demo.indexOf("[circuit]");
        int end = demo.indexOf("[morphogen]");
        return demo.substring(0, start) + circuit + "\n" + demo.substring(end);
    }

    private static Scenario read(String text) throws ScenarioException {
        return ScenarioReader.parse("t.toml", "t", text.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void customCircuitEquivalentToTheDemoSwitchGivesTheSameDrift() throws ScenarioException {
        Scenario custom = read(demoWithCircuit(CUSTOM_CIRCUIT));
        Scenario builtIn = read(new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8));
        ReactionNetwork a = custom.tissue().circuit().network();
        ReactionNetwork b = builtIn.tissue().circuit().network();
        assertTrue(a instanceof CustomNetwork);
        double[] pa = custom.tissue().mapping().base();
        double[] pb = builtIn.tissue().mapping().base();
        // The coupling "repression" resolves to the custom parameter of that name.
        custom.tissue().mapping().parametersAt(0.8, pa);
        builtIn.tissue().mapping().parametersAt(0.8, pb);
        double[] x = {0.4, 0.9};
        double[] fa = a.drift(x, pa);
        double[] fb = b.drift(x, pb);
        assertEquals(fb[0], fa[0], 1e-14);
        assertEquals(fb[1], fa[1], 1e-14);
    }

    @Test
    void rateLawErrorsNameTheReactionLineAndColumn() {
        String text = demoWithCircuit(CUSTOM_CIRCUIT.replace("rate = \"d * Ark\"", "rate = \"d * Ark )\""));
        ScenarioException e = assertThrows(ScenarioException.class, () -> read(text));
        Problem p = e.problems().get(0);
        assertEquals("circuit.reaction[4].rate", p.keyPath());
        assertTrue(p.message().contains("reaction 'lose Ark'") || p.message().contains("column 9"), p.message());
        assertTrue(p.message().contains("column 9"), p.message());
        List<String> lines = List.of(text.split("\n", -1));
        assertEquals(lines.indexOf("rate = \"d * Ark )\"") + 1, p.line());
    }

    @Test
    void ratesCannotReachCode() {
        String text = demoWithCircuit(CUSTOM_CIRCUIT.replace("rate = \"d * Ark\"",
                "rate = \"java.lang.Runtime.getRuntime().exit(3)\""));
        ScenarioException e = assertThrows(ScenarioException.class, () -> read(text));
        assertTrue(e.getMessage().contains("unknown name 'java'"), e.getMessage());
    }

    @Test
    void hillNetworkOfThreeGenes() throws ScenarioException {
        String circuit = """
                [circuit]
                type = "hill-network"
                genes = ["Lum", "Ark", "Tov"]
                initial = [0.3, 0.3, 0.1]

                [circuit.network]
                combine = "multiplicative"
                interaction = [[0, -1, 1], [-1, 0, 0], [1, 0, 0]]
                basal = [0.05, 0.05, 0.02]
                """;
        Scenario s = read(demoWithCircuit(circuit).replace("parameter = \"repression\"",
                "parameter = \"Ark.max_rate\""));
        ReactionNetwork network = s.tissue().circuit().network();
        assertTrue(network instanceof HillNetwork);
        assertEquals(List.of("Lum", "Ark", "Tov"), network.speciesNames());
        assertTrue(network.parameterNames().contains("Lum.Tov.threshold"));
    }

    @Test
    void aCircuitFileCanBeIncluded(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("lum-ark.toml"), CUSTOM_CIRCUIT);
        Path scenario = dir.resolve("fold.toml");
        Files.writeString(scenario, demoWithCircuit("[circuit]\nfile = \"lum-ark.toml\"\n"));
        Scenario s = ScenarioReader.read(scenario);
        assertTrue(s.tissue().circuit().network() instanceof CustomNetwork);
        assertEquals(List.of("Lum", "Ark"), s.tissue().circuit().network().speciesNames());

        Files.writeString(dir.resolve("lum-ark.toml"), CUSTOM_CIRCUIT.replace("d = 1.0", "d = \"one\""));
        ScenarioException bad = assertThrows(ScenarioException.class, () -> ScenarioReader.read(scenario));
        Problem p = bad.problems().get(0);
        assertTrue(p.file().endsWith("lum-ark.toml"), p.format());
        assertEquals("circuit.parameters.d", p.keyPath());
        assertEquals(List.of(CUSTOM_CIRCUIT.split("\n")).indexOf("d = 1.0") + 1, p.line());

        Files.writeString(scenario, demoWithCircuit("[circuit]\nfile = \"../elsewhere.toml\"\n"));
        ScenarioException outside = assertThrows(ScenarioException.class, () -> ScenarioReader.read(scenario));
        assertTrue(outside.getMessage().contains("in this scenario's folder"), outside.getMessage());

        Files.writeString(scenario,
                demoWithCircuit("[circuit]\nfile = \"lum-ark.toml\"\nnoise = \"none\"\n"));
        ScenarioException mixed = assertThrows(ScenarioException.class, () -> ScenarioReader.read(scenario));
        assertTrue(mixed.problems().stream().anyMatch(q -> q.keyPath().equals("circuit.noise")), mixed.getMessage());
    }

    @Test
    void toggleIsTheSwitchWithoutSelfActivation() throws ScenarioException {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8);
        String toggle = demo.replace("type = \"self-activating-switch\"", "type = \"toggle\"")
                .replace("self_activation = 0.2\n", "").replace("self_threshold = 0.5\n", "").replace("self_hill = 4\n",
                        "");
        ReactionNetwork network = read(toggle).tissue().circuit().network();
        assertEquals(0.0, network.defaultParameters()[network.parameterIndex("Lum.self_activation")], 0.0);
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> read(demo.replace("type = \"self-activating-switch\"", "type = \"toggle\"")));
        assertTrue(e.getMessage().contains("a toggle has no self-activation"), e.getMessage());
    }

    @Test
    void furtherFieldsSecretionAndMeasuredProfiles(@TempDir Path dir)
            throws Exception {
        String demo = new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("glim.csv"), "x_um,value\n0,3.0\n300,0.5\n600,0.0\n");
        String text = demo.replace("initial = 0.0\n", "initial = 0.0\nprofile = \"glim.csv\"\n")
                .replace("[[coupling]]", "[[field]]\nname = \"quench\"\ndiffusion = 400.0\ndecay = 1.0\n"
                        + "secreted_by = \"photocyte\"\nsecretion_rate = 50.0\nuptake = 0.1\n\n[[coupling]]")
                .replace("hill = 2\n", "hill = 2\n\n[[coupling]]\nparameter = \"Lum.basal\"\nfield = \"quench\"\n"
                        + "form = \"linear\"\nbase = 0.05\ngain = -0.01\n");
        Path file = dir.resolve("two-fields.toml");
        Files.writeString(file, text);
        Scenario s = ScenarioReader.read(file);
        assertEquals(1, s.tissue().others().size());
        assertEquals("quench", s.tissue().others().get(0).name());
        assertEquals(1, s.tissue().mapping().couplings().get(1).field());
        assertEquals(0, s.tissue().others().get(0).exchange().secretingFate());
        MorphogenField measured = new MorphogenField(s.tissue().morphogen(), 600, 300, false);
        // Square 14 is centred at x = 145 µm: 3.0 + (0.5 - 3.0) * 145 / 300 by the table.
        assertEquals(3.0 - 2.5 * 145 / 300, measured.value(14, 3), 1e-12);

        Files.writeString(file, text.replace("field = \"quench\"", "field = \"quenc\"")
                .replace("secreted_by = \"photocyte\"", "secreted_by = \"photocytes\""));
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(file));
        assertTrue(e.getMessage().contains("secreted_by = \"photocytes\": is not a fate"), e.getMessage());
    }

    @Test
    void sectionsOfAnotherTypeAreRejected() {
        String text = demoWithCircuit(CUSTOM_CIRCUIT.replace("type = \"custom\"", "type = \"self-activating-switch\""));
        ScenarioException e = assertThrows(ScenarioException.class, () -> read(text));
        assertTrue(e.problems().stream().anyMatch(p -> p.keyPath().equals("circuit.reaction")
                && p.message().contains("custom")), e.getMessage());
    }
}
