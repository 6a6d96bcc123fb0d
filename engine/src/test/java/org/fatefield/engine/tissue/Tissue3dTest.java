package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.domain.Domain3d;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.lineage.LineageRecord;
import org.junit.jupiter.api.Test;

/**
 * Division in a three-dimensional tissue. Partitioning draws come from the mother's own stream
 * before the division axis, so a box and a rectangle with the same seed share out exactly the
 * same molecules; binomial partitioning of N molecules gives {@code Var(n1 - n2) = N} (the
 * binomial variance, N p (1 - p) x 4 at p = 1/2); and a random axis is uniform on the sphere,
 * so each squared direction cosine of the sisters' separation has mean 1/3 and variance 4/45
 * (moments of the uniform distribution on the sphere, Archimedes' hat-box theorem).
 */
class Tissue3dTest {

    /** A species that nothing makes or removes, so only division changes it. */
    private static final CustomNetwork INERT = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {0},
            List.of(new CustomNetwork.ReactionDefinition("none", new int[] {1}, "k * X")));

    private static final int FOUNDERS = 1500;
    private static final double SYSTEM_SIZE = 200;

    private static Tissue grown(Domain domain, List<LineageRecord> records) {
        GrowthSpec growth = GrowthSpec.of(FOUNDERS, 2, 0,
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 2, 0), Partitioning.binomial())
                .withAxis(GrowthSpec.DivisionAxis.RANDOM).withDeathRate(0).withDilution(false);
        TissueSpec spec = TissueSpec.of(new CircuitSetup(INERT, NoiseMode.NONE, SYSTEM_SIZE, new double[] {1.0}),
                new ParameterMapping(INERT.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 50, 0, List.of()),
                domain, growth, new FateClassifier(List.of(new FateRule("any", new double[] {Double.NaN},
                        new double[] {Double.NaN})), "none"), new Timing(1.9, 0.01, 1.0));
        Tissue tissue = new Tissue(spec, 21);
        tissue.setLineageSink(records::add);
        tissue.start();
        tissue.runToEnd();
        tissue.finish();
        return tissue;
    }

    @Test
    void aBoxSharesOutTheSameMoleculesAsARectangleAndBinomially() {
        List<LineageRecord> flatRecords = new ArrayList<>();
        List<LineageRecord> solidRecords = new ArrayList<>();
        Tissue flat = grown(new Domain.Rectangle(1000, 1000), flatRecords);
        Tissue solid = grown(new Domain3d.Box(1000, 1000, 1000), solidRecords);
        Map<Long, double[]> flatStates = new HashMap<>();
        for (Cell c : flat.cells()) {
            flatStates.put(c.id(), new double[] {c.concentration(0), c.volume()});
        }
        assertEquals(flat.cells().size(), solid.cells().size());
        Map<Long, List<Cell>> sisters = new HashMap<>();
        for (Cell c : solid.cells()) {
            assertArrayEquals(flatStates.get(c.id()), new double[] {c.concentration(0), c.volume()}, 0.0);
            if (c.parentId() >= 0) {
                sisters.computeIfAbsent(c.parentId(), k -> new ArrayList<>()).add(c);
            }
        }
        // Founders start part-way through a 2 h cycle, so nearly all divide once in 1.9 h.
        assertTrue(sisters.size() > 0.9 * FOUNDERS, "pairs " + sisters.size());
        // Molecules at birth n = concentration x birth volume x system size (without dilution the
        // concentration stays as it was at birth), whole numbers.
        double sum = 0;
        for (List<Cell> pair : sisters.values()) {
            double n1 = pair.get(0).concentration(0) * pair.get(0).birthVolume() * SYSTEM_SIZE;
            double n2 = pair.get(1).concentration(0) * pair.get(1).birthVolume() * SYSTEM_SIZE;
            assertEquals(Math.rint(n1), n1, 1e-6);
            assertEquals(Math.rint(n2), n2, 1e-6);
            sum += (n1 - n2) * (n1 - n2) / (n1 + n2);
        }
        // The mean of (n1 - n2)^2 / N is 1 with a standard error of sqrt(2 / pairs) (a squared
        // standard normal, nearly, at N = 200); 99% interval.
        double mean = sum / sisters.size();
        assertEquals(1.0, mean, 2.576 * Math.sqrt(2.0 / sisters.size()), "binomial variance ratio");
    }

    @Test
    void aRandomAxisIsUniformOnTheSphere() {
        List<LineageRecord> records = new ArrayList<>();
        grown(new Domain3d.Box(1000, 1000, 1000), records);
        Map<Long, List<LineageRecord>> sisters = new HashMap<>();
        for (LineageRecord r : records) {
            if (r.parentId() >= 0) {
                sisters.computeIfAbsent(r.parentId(), k -> new ArrayList<>()).add(r);
            }
        }
        double[] sumSquares = new double[3];
        int pairs = 0;
        for (List<LineageRecord> pair : sisters.values()) {
            LineageRecord a = pair.get(0);
            LineageRecord b = pair.get(1);
            double[] e = {a.birthX() - b.birthX(), a.birthY() - b.birthY(), a.birthZ() - b.birthZ()};
            double d2 = e[0] * e[0] + e[1] * e[1] + e[2] * e[2];
            for (int c = 0; c < 3; c++) {
                sumSquares[c] += e[c] * e[c] / d2;
            }
            pairs++;
        }
        assertTrue(pairs > 0.9 * FOUNDERS, "pairs " + pairs);
        double tolerance = 2.576 * Math.sqrt(4.0 / 45 / pairs);
        for (int c = 0; c < 3; c++) {
            assertEquals(1.0 / 3, sumSquares[c] / pairs, tolerance, "axis " + c);
        }
    }
}
