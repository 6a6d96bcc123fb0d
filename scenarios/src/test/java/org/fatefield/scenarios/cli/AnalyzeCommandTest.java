package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.circuits.kinetics.HillFunctions;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


class AnalyzeCommandTest {

    @TempDir
    Path tmp;

    private static List<CSVRecord> csv(Path file) throws IOException {
        try (Reader in = Files.newBufferedReader(file)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    /**
     * The demo switch (basal b = 0.05, self-activation s = 0.2, thresholds 0.5, Hill 4,
     * degradation 1) loses its symmetric state where the antisymmetric eigenvalue
     * s act'(S) + r act'(S) - 1 vanishes on the symmetric state S (derived by hand, as in the
     * circuits module's pitchfork test), solved here with Hipparchus' Brent solver.
     */
    private static double pitchforkRepression() {
        double b = 0.05;
        double s = 0.2;
        double theta = 0.5;
        double n = 4;
        DoubleUnaryOperator r = x -> (1 - s * HillFunctions.activationSlope(x, theta, n))
                / HillFunctions.activationSlope(x, theta, n);
        double state = new BrentSolver(1e-15, 1e-15, 1e-15).solve(1000,
                x -> b + s * HillFunctions.activation(x, theta, n) + r.applyAsDouble(x) * HillFunctions.repression(x,
                        theta, n) - x,
                0.3, 0.45);
        return r.applyAsDouble(state);
    }

    @Test
    void demoAnalysisFindsThePitchforkAndWritesEveryFile() throws Exception {
        Path out = tmp.resolve("analysis");
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "analyze",
                "demo",
                "--out", out.toString(), "--trajectories", "4", "--grid", "40", "--second", "Lum.basal",
                "--second-range", "0:0.2");
        assertEquals(0, code, err.toString());
        for (String name : List.of("steady-states.csv", "branches.csv", "special-points.csv", "fold-curve.csv",
                "basins.csv", "landscape.csv", "switching.csv", "commitment.csv")) {
            assertTrue(Files.size(out.resolve(name)) > 0, name);
        }
        CSVRecord pitchfork = csv(out.resolve("special-points.csv")).stream()
                .filter(r -> r.get("type").equals("pitchfork (branch point)")).findFirst().orElseThrow();
        assertEquals(pitchforkRepression(), Double.parseDouble(pitchfork.get("repression")), 1e-8);
        // Past the pitchfork the symmetric state is a saddle between two stable nodes (asserted
        // below): the asymmetric states are born stable, so the pitchfork is supercritical.
        assertEquals("supercritical", pitchfork.get("criticality"));
        assertTrue(Double.parseDouble(pitchfork.get("normal_form_coefficient")) < 0);
        List<CSVRecord> states = csv(out.resolve("steady-states.csv"));
        assertEquals(List.of("stable node", "saddle", "stable node"), states.stream().map(r -> r.get("type")).toList());
        assertTrue(csv(out.resolve("fold-curve.csv")).stream().anyMatch(r -> r.get("kind").equals("cusp")));
        for (String figure : List.of("bifurcation", "bistable-region", "phase-portrait", "basins", "landscape",
                "landscape-along-parameter")) {
            assertTrue(Files.size(out.resolve(figure + ".png")) > 1000, figure);
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
            Document svg = factory.newDocumentBuilder().parse(out.resolve(figure + ".svg").toFile());
            assertEquals("svg", svg.getDocumentElement().getNodeName(), figure);
        }
        String bifurcation = Files.readString(out.resolve("bifurcation.svg"));
        assertTrue(bifurcation.contains("supercritical pitchfork (branch point)"),
                "the special point and its criticality are labelled in the SVG");
    }

    @Test
    void unknownParameterIsExplained() {
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "analyze",
                "demo",
                "--parameter", "speed", "--out", tmp.resolve("x").toString());
        assertNotEquals(0, code);
        assertTrue(err.toString().contains("Lum.repression"), err.toString());
        assertTrue(Files.notExists(tmp.resolve("x")));
    }

    @Test
    void aOneSpeciesCircuitGetsItsSteadyStatesFoldAndSwitchingWithoutPlaneFigures() throws IOException {
        // dX/dt = b + v h(X) - X with h(X) = X^4 / (K^4 + X^4), b = 0.02, K = 0.5. A fold has f = 0 and
        // f' = 0: v = 1 / h'(X) and b + h(X) / h'(X) = X, one equation in X, solved here by Brent's method.
        Path scenario = oneGeneScenario();
        Path out = tmp.resolve("one-gene");
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "analyze",
                scenario.toString(), "--out", out.toString(), "--parameter", "vmax", "--range", "0.5:1.5", "--at",
                "1.0", "--trajectories", "6");
        assertEquals(0, code, err.toString());
        double b = 0.02;
        double k = 0.5;
        DoubleUnaryOperator h = x -> HillFunctions.activation(x, k, 4);
        DoubleUnaryOperator slope = x -> HillFunctions.activationSlope(x, k, 4);
        double xFold = new BrentSolver(1e-14).solve(200, x -> b + h.applyAsDouble(x) / slope.applyAsDouble(x) - x,
                0.5, 0.9);
        double vFold = 1 / slope.applyAsDouble(xFold);
        List<CSVRecord> special = csv(out.resolve("special-points.csv"));
        assertEquals(1, special.size(), "one fold in [0.5, 1.5]; the other is near v = 822");
        assertEquals(vFold, Double.parseDouble(special.get(0).get("vmax")), 1e-7);
        assertEquals(xFold, Double.parseDouble(special.get(0).get("X")), 1e-6);
        List<CSVRecord> states = csv(out.resolve("steady-states.csv"));
        assertEquals(3, states.size(), "bistable at v = 1");
        for (CSVRecord state : states) {
            double x = Double.parseDouble(state.get("X"));
            assertEquals(0, b + h.applyAsDouble(x) - x, 1e-8, "a steady state of the law at X = " + x);
        }
        assertTrue(Files.exists(out.resolve("switching.csv")) && Files.exists(out.resolve("bifurcation.png")));
        assertTrue(!Files.exists(out.resolve("phase-portrait.png")) && !Files.exists(out.resolve("basins.csv")),
                "no state-plane figures for one species");
    }

    @Test
    void exactSwitchingRunsAndAnUnaffordableOneIsRefusedBeforeAnythingIsWritten() throws IOException {
        Path scenario = oneGeneScenario();
        Path out = tmp.resolve("exact");
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "analyze",
                scenario.toString(), "--out", out.toString(), "--parameter", "vmax", "--range", "0.5:1.5", "--at",
                "1.0", "--trajectories", "6", "--switching-method", "exact", "--switching-limit", "200");
        assertEquals(0, code, err.toString());
        List<CSVRecord> rows = csv(out.resolve("switching.csv"));
        assertEquals(4, rows.size());
        for (CSVRecord r : rows) {
            assertEquals("exact", r.get("method"));
            assertEquals(6, Integer.parseInt(r.get("arrived")) + Integer.parseInt(r.get("censored")));
        }
        Path refused = tmp.resolve("refused");
        err = new StringWriter();
        code = FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "analyze",
                scenario.toString(), "--out", refused.toString(), "--parameter", "vmax", "--range", "0.5:1.5",
                "--at", "1.0", "--switching-method", "exact", "--system-size", "1e9");
        assertEquals(FatefieldCommand.INVALID_INPUT, code);
        assertTrue(err.toString().contains("--switching-method langevin"), err.toString());
        assertTrue(Files.notExists(refused));
    }

    private Path oneGeneScenario() throws IOException {
        Path scenario = tmp.resolve("one-gene-switch.toml");
        try (var in = AnalyzeCommandTest.class.getResourceAsStream("/one-gene-switch.toml")) {
            Files.write(scenario, in.readAllBytes());
        }
        return scenario;
    }
}
