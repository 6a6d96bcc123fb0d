package org.fatefield.circuits.expr;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ExpressionParserTest {

    private static final List<String> SPECIES = List.of("A", "B");
    private static final List<String> PARAMS = List.of("k", "K", "n");
    private static final double[] X = {0.7, 1.3};
    private static final double[] P = {2.5, 0.5, 3.0};

    private static double eval(String text) {
        return CompiledExpression.compile(ExpressionParser.parse(text, SPECIES, PARAMS)).evaluate(X, P);
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "2 + 3 * 4 ^ 2; 50",
        "-2 ^ 2; -4",
        "2 ^ 3 ^ 2; 512",
        "(1 + 2) * 3; 9",
        "10 / 4 / 5; 0.5",
        "1.5e2 - 5E-1; 149.5",
        "2 ^ -1; 0.5",
        "--3; 3",
        "min(3, 1) + max(3, 1) + abs(-2); 6",
        "exp(log(7)); 7",
        "sqrt(16); 4"})
    void arithmeticFollowsOrdinaryPrecedence(String text, double expected) {
        assertEquals(expected, eval(text), 1e-12);
    }

    @Test
    void namesReadSpeciesAndParameters() {
        assertEquals(2.5 * 0.7 - 1.3, eval("k*A - B"), 1e-15);
        double r = Math.pow(0.7 / 0.5, 3);
        assertEquals(r / (1 + r), eval("hill_act(A, K, n)"), 1e-15);
        assertEquals(1 / (1 + r), eval("hill_rep(A, K, n)"), 1e-15);
        assertEquals(Math.pow(0.7, 1.3), eval("A ^ B"), 1e-15);
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "A + * B; 5",
        "foo(A); 1",
        "A + ; 4",
        "(A + B; 7",
        "java.lang.Runtime; 1",
        "k*A.getClass(); 4",
        "A $ B; 3",
        "hill_act(A, K); 1",
        "C * 2; 1",
        "''; 1"})
    void errorsNameTheColumn(String text, int column) {
        ExpressionException e = assertThrows(ExpressionException.class, () -> ExpressionParser.parse(text, SPECIES, PARAMS));
        assertEquals(column, e.column(), e.getMessage());
        assertTrue(e.getMessage().contains("column " + column), e.getMessage());
    }

    @Test
    void internalFunctionsCannotBeWritten() {
        assertThrows(ExpressionException.class, () -> ExpressionParser.parse("#step(A)", SPECIES, PARAMS));
        assertThrows(ExpressionException.class, () -> ExpressionParser.parse("hill_slope(A, K, n)", SPECIES, PARAMS));
    }

    /** Symbolic derivatives against central differences (error O(h^2), common practice). */
    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "k * A * B - A / (1 + B)",
        "A ^ 3 + B ^ n",
        "A ^ B",
        "exp(-k * A) * log(1 + B) + sqrt(A * B)",
        "hill_act(A, K, n) * hill_rep(B, A, 2)",
        "hill_act(A, B, n)",
        "min(A, 2 * B) + max(A * A, B) + abs(A - B)",
        "k / (A ^ 2 + B ^ 2)"})
    void symbolicDerivativesMatchFiniteDifferences(String text) {
        Node tree = ExpressionParser.parse(text, SPECIES, PARAMS);
        CompiledExpression f = CompiledExpression.compile(tree);
        double h = 1e-6;
        for (int k = 0; k < 2; k++) {
            CompiledExpression d = CompiledExpression.compile(Differentiator.bySpecies(tree, k));
            double[] up = X.clone();
            double[] down = X.clone();
            up[k] += h;
            down[k] -= h;
            double numeric = (f.evaluate(up, P) - f.evaluate(down, P)) / (2 * h);
            assertEquals(numeric, d.evaluate(X, P), 1e-7 * (1 + Math.abs(numeric)), text + " by species " + k);
        }
        for (int k = 0; k < 3; k++) {
            CompiledExpression d = CompiledExpression.compile(Differentiator.byParameter(tree, k));
            double[] up = P.clone();
            double[] down = P.clone();
            up[k] += h;
            down[k] -= h;
            double numeric = (f.evaluate(X, up) - f.evaluate(X, down)) / (2 * h);
            assertEquals(numeric, d.evaluate(X, P), 1e-7 * (1 + Math.abs(numeric)), text + " by parameter " + k);
        }
    }

    @Test
    void sizeAndNestingAreBoundedSoNoRateLawCanExhaustTheStack() {
        // At the limits: 100 levels of parentheses, and 2000 terms (a left-deep sum 1999 deep).
        String deepest = "(".repeat(99) + "k" + ")".repeat(99);
        assertEquals(2.5, eval(deepest), 0.0);
        String widest = String.join("+", Collections.nCopies(2000, "k"));
        assertEquals(5000.0, eval(widest), 1e-9);
        CompiledExpression.compile(Differentiator.byParameter(ExpressionParser.parse(widest, SPECIES, PARAMS), 0));
        // Past them: clear errors, never a StackOverflowError.
        String[][] cases = {
            {"(".repeat(10_000) + "k" + ")".repeat(10_000), "characters long"},
            {"(".repeat(150) + "k" + ")".repeat(150), "nests deeper than 100"},
            {String.join("^", Collections.nCopies(150, "1")), "nests deeper than 100"},
            {String.join("+", Collections.nCopies(2001, "k")), "more than 2000 terms"},
            {"-".repeat(200) + "k", "nests deeper than 100"},
        };
        for (String[] c : cases) {
            ExpressionException e = assertThrows(ExpressionException.class,
                    () -> ExpressionParser.parse(c[0], SPECIES, PARAMS));
            assertTrue(e.getMessage().contains(c[1]), e.getMessage());
        }
    }
}
