package org.fatefield.circuits.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.analysis.SteadyStateFinder;
import org.junit.jupiter.api.Test;

class CustomAndHillNetworkTest {

    private static final GeneKinetics GENE = new GeneKinetics(0.05, 0.2, 0.5, 4, 0.8, 0.5, 4, 1.0);

    /** The built-in switch written as a custom circuit. */
    static CustomNetwork customSwitch() {
        List<String> names = List.of("b", "s", "Ks", "ns", "r", "Kr", "nr", "d");
        return CustomNetwork.of(List.of("A", "B"), names, GENE.toArray(), List.of(
                new CustomNetwork.ReactionDefinition("make A", new int[] {1, 0},
                        "b + s * hill_act(A, Ks, ns) + r * hill_rep(B, Kr, nr)"),
                new CustomNetwork.ReactionDefinition("lose A", new int[] {-1, 0}, "d * A"),
                new CustomNetwork.ReactionDefinition("make B", new int[] {0, 1},
                        "b + s * hill_act(B, Ks, ns) + r * hill_rep(A, Kr, nr)"),
                new CustomNetwork.ReactionDefinition("lose B", new int[] {0, -1}, "d * B")));
    }

    @Test
    void customSwitchEqualsTheBuiltInOne() {
        CustomNetwork custom = customSwitch();
        SelfActivatingSwitch builtIn = SelfActivatingSwitch.symmetric("A", "B", GENE);
        double[] pc = custom.defaultParameters();
        double[] pb = builtIn.defaultParameters();
        double[][] jc = new double[2][2];
        double[][] jb = new double[2][2];
        for (double[] x : new double[][] {{0.1, 0.9}, {0.5, 0.5}, {1.7, 0.02}, {0.33, 1.2}}) {
            double[] fc = custom.drift(x, pc);
            double[] fb = builtIn.drift(x, pb);
            custom.jacobian(x, pc, jc);
            builtIn.jacobian(x, pb, jb);
            for (int i = 0; i < 2; i++) {
                assertEquals(fb[i], fc[i], 1e-14);
                for (int k = 0; k < 2; k++) {
                    assertEquals(jb[i][k], jc[i][k], 1e-12);
                }
            }
        }
        List<SteadyState> a = SteadyStateFinder.of(custom).find(pc, new double[] {0, 0}, new double[] {3, 3});
        List<SteadyState> b = SteadyStateFinder.of(builtIn).find(pb, new double[] {0, 0}, new double[] {3, 3});
        assertEquals(b.size(), a.size());
        for (int s = 0; s < a.size(); s++) {
            assertEquals(b.get(s).type(), a.get(s).type());
            assertEquals(b.get(s).state()[0], a.get(s).state()[0], 1e-12);
        }
    }

    @Test
    void rateLawErrorsNameTheReactionAndColumn() {
        CustomNetwork.RateLawException e = assertThrows(CustomNetwork.RateLawException.class,
                () -> CustomNetwork.of(List.of("A"), List.of("k"), new double[] {1}, List.of(
                        new CustomNetwork.ReactionDefinition("decay", new int[] {-1}, "k * A +"))));
        assertEquals("decay", e.reaction());
        assertEquals(8, e.column());
        assertTrue(e.getMessage().contains("reaction 'decay'"), e.getMessage());
    }

    @Test
    void namesThatClashAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> CustomNetwork.of(List.of("A"), List.of("A"),
                new double[] {1}, List.of(new CustomNetwork.ReactionDefinition("r", new int[] {1}, "A"))));
        assertThrows(IllegalArgumentException.class, () -> CustomNetwork.of(List.of("exp"), List.of(),
                new double[0], List.of(new CustomNetwork.ReactionDefinition("r", new int[] {1}, "1"))));
    }

    @Test
    void twoGeneRepressionNetworkIsTheToggle() {
        HillNetwork network = new HillNetwork(List.of("U", "V"), new int[][] {{0, -1}, {-1, 0}},
                HillNetwork.Combination.ADDITIVE, new double[] {0.05, 0.05}, new double[] {0.8, 0.8},
                new double[] {1, 1}, new double[][] {{1, 0.5}, {0.5, 1}}, new double[][] {{1, 4}, {4, 1}});
        SelfActivatingSwitch toggle = SelfActivatingSwitch.symmetric("U", "V",
                new GeneKinetics(0.05, 0, 0.5, 4, 0.8, 0.5, 4, 1.0));
        for (double[] x : new double[][] {{0.1, 0.9}, {0.6, 0.4}}) {
            double[] a = network.drift(x, network.defaultParameters());
            double[] b = toggle.drift(x, toggle.defaultParameters());
            assertEquals(b[0], a[0], 1e-15);
            assertEquals(b[1], a[1], 1e-15);
        }
        assertEquals("U.V.threshold", network.parameterNames().get(6));
    }

    @Test
    void threeGeneNetworkJacobianMatchesFiniteDifferences() {
        for (HillNetwork.Combination combination : HillNetwork.Combination.values()) {
            HillNetwork network = new HillNetwork(List.of("X", "Y", "Z"),
                    new int[][] {{1, -1, 0}, {1, 0, -1}, {-1, 1, 1}}, combination,
                    new double[] {0.1, 0.05, 0.2}, new double[] {1, 2, 1.5}, new double[] {1, 0.7, 1.3},
                    new double[][] {{0.5, 0.6, 1}, {0.4, 1, 0.8}, {0.9, 0.3, 0.7}},
                    new double[][] {{2, 3, 1}, {4, 1, 2}, {2, 2.5, 1.5}});
            double[] p = network.defaultParameters();
            double[] x = {0.6, 0.9, 0.4};
            double[][] jac = new double[3][3];
            network.jacobian(x, p, jac);
            double h = 1e-6;
            for (int k = 0; k < 3; k++) {
                double[] up = x.clone();
                double[] down = x.clone();
                up[k] += h;
                down[k] -= h;
                double[] fu = network.drift(up, p);
                double[] fd = network.drift(down, p);
                for (int i = 0; i < 3; i++) {
                    assertEquals((fu[i] - fd[i]) / (2 * h), jac[i][k], 1e-7, combination + " d" + i + "/d" + k);
                }
            }
        }
    }
}
