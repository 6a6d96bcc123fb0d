package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CellSize;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.division.SizeControl;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.lineage.LineageRecord;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


/**
 * Cell-size control in a growing tissue against the analytic regressions of a daughter's birth
 * volume on her mother's (Amir 2014, Cell size regulation in bacteria, Phys. Rev. Lett.
 * 112:208102): with volume shares f of mean 1/2, a timer gives {@code Vb' = 2 f Vb} (slope 1, no
 * correction), an adder {@code Vb' = f (Vb + 1)} (slope 1/2), a sizer {@code Vb' = 2 f} (slope 0).
 * About 3 000 mother-daughter pairs per rule (one daughter per mother, mothers born after the
 * founders), each slope within four of its standard errors (p below 1e-4), fixed seed.
 */
class SizeControlTest {

    private static final CustomNetwork INERT = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {0},
            List.of(new CustomNetwork.ReactionDefinition("none", new int[] {1}, "k * X")));
    private static final double SPLIT_CV = 0.2;

    private static List<LineageRecord> grow(SizeControl control) {
        GrowthSpec growth = GrowthSpec.of(150, 2, 0, new CycleTimeDistribution(CycleTimeDistribution.Kind.GAMMA, 10,
                0.1), Partitioning.equal()).withAxis(GrowthSpec.DivisionAxis.RANDOM).withDeathRate(0).withDilution(true)
                .withAdhesion(0).withSize(new CellSize(control, SPLIT_CV));
        TissueSpec spec = TissueSpec.of(new CircuitSetup(INERT, NoiseMode.NONE, 100, new double[] {1.0}),
                new ParameterMapping(INERT.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 100, 0, List.of()),
                new Domain.Rectangle(2000, 2000), growth, new FateClassifier(List.of(new FateRule("any",
                new double[] {Double.NaN}, new double[] {Double.NaN})),
                        "none"), new Timing(52, 0.05, 4.0));
        Tissue tissue = new Tissue(spec, 21);
        List<LineageRecord> records = new ArrayList<>();
        tissue.setLineageSink(records::add);
        tissue.start();
        tissue.runToEnd();
        tissue.finish();
        return records;
    }

    /** Slope of the first daughter's birth volume on her mother's, and its standard error. */
    private static double[] slope(List<LineageRecord> records) {
        Map<Long, LineageRecord> byId = new HashMap<>();
        Map<Long, LineageRecord> firstDaughter = new HashMap<>();
        for (LineageRecord r : records) {
            byId.put(r.id(), r);
            if (r.parentId() >= 0) {
                firstDaughter.merge(r.parentId(), r, (a, b) -> a.id() < b.id() ? a : b);
            }
        }
        List<double[]> pairs = new ArrayList<>();
        for (LineageRecord d : firstDaughter.values()) {
            LineageRecord mother = byId.get(d.parentId());
            if (mother.parentId() >= 0) {
                pairs.add(new double[] {mother.birthVolume(), d.birthVolume()});
            }
        }
        int n = pairs.size();
        double mx = pairs.stream().mapToDouble(p -> p[0]).average().orElseThrow();
        double my = pairs.stream().mapToDouble(p -> p[1]).average().orElseThrow();
        double sxx = 0;
        double sxy = 0;
        for (double[] p : pairs) {
            sxx += (p[0] - mx) * (p[0] - mx);
            sxy += (p[0] - mx) * (p[1] - my);
        }
        double b = sxy / sxx;
        double rss = 0;
        for (double[] p : pairs) {
            double e = p[1] - my - b * (p[0] - mx);
            rss += e * e;
        }
        return new double[] {b, Math.sqrt(rss / (n - 2) / sxx), n};
    }

    @Test
    void adderHalvesBirthSizeErrorsEachGeneration() {
        List<LineageRecord> records = grow(SizeControl.ADDER);
        double[] fit = slope(records);
        assertTrue(fit[2] > 2000, "pairs " + fit[2]);
        assertEquals(0.5, fit[0], 4 * fit[1], "slope " + fit[0] + " +- " + fit[1]);
        for (LineageRecord r : records) {
            if (!Double.isNaN(r.divisionTime()) && r.parentId() >= 0) {
                // Added volume is one newborn volume, overshooting by at most one step's growth (ln 2 / 9 h * 0.05 h * 3).
                double added = r.finalVolume() - r.birthVolume();
                assertTrue(added >= 1.0 && added < 1.015, "added volume " + added);
            }
        }
    }

    @Test
    void sizerForgetsTheBirthSize() {
        double[] fit = slope(grow(SizeControl.SIZER));
        assertEquals(0.0, fit[0], 4 * fit[1], "slope " + fit[0] + " +- " + fit[1]);
    }

    @Test
    void timerCarriesBirthSizeErrorsOn() {
        double[] fit = slope(grow(SizeControl.TIMER));
        assertEquals(1.0, fit[0], 4 * fit[1], "slope " + fit[0] + " +- " + fit[1]);
    }
}
