package org.fatefield.scenarios.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.analysis.SteadyStateFinder;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.model.HillNetwork;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.study.AnalysisPlan;
import org.fatefield.circuits.study.CircuitAnalysis;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.fatefield.scenarios.output.SbmlExport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * SBML import. The symmetric genetic toggle of Gardner, Cantor &amp; Collins (2000, Nature
 * 403:339), dU/dt = alpha / (1 + V^n) - U and the same for V, written by hand in SBML Level 3
 * (with a local parameter and the compartment in a kinetic law) and as a custom circuit in TOML,
 * must give the same steady states and branch point, and both must match the analytic ones for
 * n = 2: the symmetric state u^3 + u = alpha, the asymmetric pair (alpha +- sqrt(alpha^2 - 4)) / 2
 * (from u + v = alpha and uv = 1), and the pitchfork where n u^n = 1 + u^n, at u = 1 and alpha =
 * 2 (derived here from the fixed-point equations; Strogatz 2015, Nonlinear Dynamics and Chaos,
 * 2nd ed., ch. 8, for the method). The SBML scenario also runs as a tissue, and constructs
 * outside the supported core are refused with a message naming them. The demo's circuit written
 * as SBML reads back with the same reactions and rates (200 random states, to 1e-12).
 */
class SbmlCircuitsTest {

    @TempDir
    Path tmp;

    private static final Path FOLDER = Path.of("src", "test", "resources", "sbml");

    @Test
    void theToggleFromSbmlHasTheSteadyStatesAndPitchforkOfTheTomlOneAndOfTheAnalysis() throws Exception {
        ReactionNetwork sbml = ScenarioReader.read(FOLDER.resolve("toggle-sbml.toml")).tissue().circuit().network();
        ReactionNetwork toml = ScenarioReader.read(FOLDER.resolve("toggle-custom.toml")).tissue().circuit().network();
        assertEquals(toml.speciesNames(), sbml.speciesNames());
        double[] p = sbml.defaultParameters();
        List<double[]> a = states(sbml, p);
        List<double[]> b = states(toml, toml.defaultParameters());
        assertEquals(3, a.size());
        assertEquals(a.size(), b.size());
        double root5 = Math.sqrt(5);
        double symmetric = cubicRoot(3);
        double[][] exact = {{(3 - root5) / 2, (3 + root5) / 2}, {symmetric, symmetric}, {(3 + root5) / 2, (3 - root5) / 2}};
        for (int i = 0; i < 3; i++) {
            for (int s = 0; s < 2; s++) {
                assertEquals(b.get(i)[s], a.get(i)[s], 1e-9, "SBML against TOML");
                assertEquals(exact[i][s], a.get(i)[s], 1e-8, "against the analytic steady state");
            }
        }
        for (ReactionNetwork network : List.of(sbml, toml)) {
            int alpha = network.parameterIndex("alpha");
            AnalysisPlan plan = new AnalysisPlan("alpha", new int[] {alpha}, 1, 3, 3, null, new int[0], 0, 0, 0, 1, 100,
                    10, 20, 1);
            List<SpecialPoint> specials = new ArrayList<>();
            for (Branch branch : new CircuitAnalysis(network, network.defaultParameters(), plan).diagram()) {
                specials.addAll(branch.specials());
            }
            assertEquals(1, specials.size(), specials.toString());
            assertEquals(2.0, specials.get(0).parameter(), 1e-6, "pitchfork at alpha = 2");
            assertEquals(1.0, specials.get(0).state()[0], 1e-5);
        }
    }

    @Test
    void theSbmlScenarioRunsInATissue() {
        Path out = tmp.resolve("run");
        assertEquals(0, FatefieldCommandAccess.run("run", FOLDER.resolve("toggle-sbml.toml").toString(), "--out",
                out.toString(), "--quiet"));
        assertTrue(Files.exists(out.resolve("run.json")) && Files.exists(out.resolve("toggle.xml")),
                "the SBML file is copied beside the run's scenario");
    }

    @Test
    void unsupportedConstructsAreRefusedByName() throws Exception {
        String toggle = Files.readString(FOLDER.resolve("toggle.xml"), StandardCharsets.UTF_8);
        String[][] cases = {
            {toggle.replace("<?xml version=\"1.0\" encoding=\"UTF-8\"?>", "<?xml version=\"1.0\"?>\n<!DOCTYPE sbml ["
                    + "<!ENTITY x SYSTEM \"file:///etc/passwd\">]>"), "document type declaration"},
            {toggle.replace("</listOfReactions>", "</listOfReactions><listOfEvents><event id=\"e\" useValuesFromTriggerTime="
                    + "\"true\"><trigger initialValue=\"true\" persistent=\"true\"><math xmlns=\"http://www.w3.org/1998/"
                    + "Math/MathML\"><true/></math></trigger></event></listOfEvents>"), "events are not supported"},
            {toggle.replace("<reaction id=\"make_U\" reversible=\"false\">", "<reaction id=\"make_U\" reversible=\"true\">"),
                "make_U is reversible"},
            {toggle.replace("<apply><times/><ci> V </ci><ci> cell </ci></apply>", "<apply><times/><ci> V </ci><csymbol"
                    + " encoding=\"text\" definitionURL=\"http://www.sbml.org/sbml/symbols/time\"> t </csymbol></apply>"),
                "not supported in a kinetic law"},
            {"<sbml", "not a readable SBML file"},
        };
        for (String[] c : cases) {
            List<Problem> problems = new ArrayList<>();
            assertNull(SbmlCircuits.toToml(c[0].getBytes(StandardCharsets.UTF_8), "case.xml", problems), c[1]);
            assertTrue(problems.stream().anyMatch(p -> p.message().contains(c[1])), c[1] + ": " + problems);
        }
    }

    @Test
    void theDemoCircuitWrittenAsSbmlReadsBackAsTheSameCircuit() throws Exception {
        Scenario demo = ScenarioReader.parse("builtin:demo", "demo",
                BuiltinScenarios.bytes("demo").orElseThrow());
        ReactionNetwork original = demo.tissue().circuit().network();
        Files.writeString(tmp.resolve("demo.xml"), SbmlExport.of("demo", original,
                demo.tissue().circuit().initialState()));
        String scenario = Files.readString(FOLDER.resolve("toggle-sbml.toml"))
                .replace("file = \"toggle.xml\"", "file = \"demo.xml\"").replace("parameter = \"alpha\"",
                        "parameter = \"Lum_repression\"").replace("above = { U = 1.5 }", "above = { Lum = 0.6 }")
                .replace("below = { V = 0.8 }", "below = { Ark = 0.35 }");
        Files.writeString(tmp.resolve("demo-sbml.toml"), scenario);
        ReactionNetwork back = ScenarioReader.read(tmp.resolve("demo-sbml.toml")).tissue().circuit().network();
        assertSameCircuit(original, back, 5, "demo");
    }

    /**
     * A three-gene Hill network (self-activation, mutual repression and an activating input, in
     * both combinations) written as SBML reads back as a circuit with the same reactions and the
     * same rates at 200 random states, to 1e-12: against the network's own propensities.
     */
    @Test
    void aHillNetworkWrittenAsSbmlReadsBackWithTheSameRates() throws Exception {
        for (HillNetwork.Combination combination : HillNetwork.Combination.values()) {
            int[][] sign = {{1, -1, 0}, {-1, 1, 1}, {0, 0, 0}};
            double[][] threshold = {{0.5, 0.7, 1}, {0.6, 0.4, 0.9}, {1, 1, 1}};
            double[][] hill = {{2, 3, 1}, {4, 2.5, 1}, {1, 1, 1}};
            HillNetwork original = new HillNetwork(List.of("U", "V", "W"), sign, combination,
                    new double[] {0.05, 0.1, 0.2}, new double[] {1.0, 1.5, 0.0}, new double[] {1.0, 0.8, 0.5},
                    threshold, hill);
            Files.writeString(tmp.resolve("toggle.xml"), SbmlExport.of("hill", original, new double[] {0.1, 0.2, 0.3}));
            Files.writeString(tmp.resolve("hill.toml"), Files.readString(FOLDER.resolve("toggle-sbml.toml"))
                    .replace("parameter = \"alpha\"", "parameter = \"U_max_rate\""));
            ReactionNetwork back = ScenarioReader.read(tmp.resolve("hill.toml")).tissue().circuit().network();
            assertSameCircuit(original, back, 9, combination.toString());
        }
    }

    /**
     * Same species, stoichiometry and rates (to 1e-12 relative) at 200 random states in [0, 3) per
     * species, drawn from {@code seed}.
     */
    private static void assertSameCircuit(ReactionNetwork original, ReactionNetwork back, long seed, String label) {
        assertEquals(original.speciesNames(), back.speciesNames());
        assertEquals(original.reactionCount(), back.reactionCount());
        int species = original.speciesNames().size();
        double[] a = new double[original.reactionCount()];
        double[] b = new double[back.reactionCount()];
        Random random = new Random(seed);
        for (int trial = 0; trial < 200; trial++) {
            double[] x = new double[species];
            for (int s = 0; s < species; s++) {
                x[s] = 3 * random.nextDouble();
            }
            original.propensities(x, original.defaultParameters(), a);
            back.propensities(x, back.defaultParameters(), b);
            for (int j = 0; j < a.length; j++) {
                assertEquals(a[j], b[j], 1e-12 * Math.max(1, Math.abs(a[j])), label + " reaction " + j + " at "
                        + java.util.Arrays.toString(x));
                for (int s = 0; s < species; s++) {
                    assertEquals(original.stoichiometry(j, s), back.stoichiometry(j, s));
                }
            }
        }
    }

    private static List<double[]> states(ReactionNetwork network, double[] p) {
        List<double[]> out = new ArrayList<>();
        for (SteadyState s : SteadyStateFinder.of(network).find(p, new double[] {0, 0}, new double[] {4, 4})) {
            out.add(s.state());
        }
        out.sort(Comparator.comparingDouble(x -> x[0]));
        return out;
    }

    /** The real root of u^3 + u = a, by Newton's method from u = 1 (the cubic is increasing). */
    private static double cubicRoot(double a) {
        double u = 1;
        for (int i = 0; i < 60; i++) {
            u -= (u * u * u + u - a) / (3 * u * u + 1);
        }
        return u;
    }
}
