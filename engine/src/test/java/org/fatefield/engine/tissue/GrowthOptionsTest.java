package org.fatefield.engine.tissue;

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
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.variability.ExtrinsicNoise;
import org.hipparchus.distribution.discrete.BinomialDistribution;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


/** Division axis, death and dilution, each against a result computed by hand. */
class GrowthOptionsTest {

    /** A species that nothing makes or removes, so only division and dilution change it. */
    private static final CustomNetwork INERT = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {0},
            List.of(new CustomNetwork.ReactionDefinition("none", new int[] {1}, "k * X")));

    private static TissueSpec spec(int founders, GrowthSpec growth, double duration) {
        return TissueSpec.of(new CircuitSetup(INERT, NoiseMode.NONE, 100, new double[] {1.0}),
                new ParameterMapping(INERT.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 50, 0, List.of()),
                new Domain.Rectangle(1000, 1000), growth, new FateClassifier(List.of(new FateRule("any",
                new double[] {Double.NaN}, new double[] {Double.NaN})),
                        "none"), new Timing(duration, 0.01, 1.0));
    }

    @Test
    void daughtersAreBornAlongTheChosenAxis() {
        GrowthSpec growth = GrowthSpec.of(200, 2, 0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 2, 0),
                Partitioning.equal()).withAxis(GrowthSpec.DivisionAxis.X).withDeathRate(0).withDilution(false);
        Tissue tissue = new Tissue(spec(200, growth, 1.9), 4);
        List<LineageRecord> records = new ArrayList<>();
        tissue.setLineageSink(records::add);
        tissue.start();
        tissue.runToEnd();
        Map<Long, List<LineageRecord>> sisters = new HashMap<>();
        for (LineageRecord r : records) {
            if (r.parentId() >= 0) {
                sisters.computeIfAbsent(r.parentId(), k -> new ArrayList<>()).add(r);
            }
        }
        assertTrue(sisters.size() > 150, "pairs " + sisters.size());
        for (List<LineageRecord> pair : sisters.values()) {
            assertEquals(2, pair.size());
            assertEquals(pair.get(0).birthY(), pair.get(1).birthY(), 1e-12);
            assertTrue(Math.abs(pair.get(0).birthX() - pair.get(1).birthX()) > 1.0);
        }
    }

    @Test
    void deathThinsThePopulationBinomially() {
        // Without division, each of N cells survives n steps with probability (1 - rate dt)^n;
        // the survivors are Binomial(N, that), checked against its 99% interval.
        int founders = 4000;
        double rate = 0.1;
        GrowthSpec growth = GrowthSpec.of(founders, 2, 0, CycleTimeDistribution.none(), Partitioning.equal())
                .withAxis(GrowthSpec.DivisionAxis.RANDOM).withDeathRate(rate).withDilution(false);
        Tissue tissue = new Tissue(spec(founders, growth, 5.0), 8);
        tissue.start();
        tissue.runToEnd();
        double survive = Math.pow(1 - rate * 0.01, 500);
        BinomialDistribution law = new BinomialDistribution(founders, survive);
        int alive = tissue.cells().size();
        for (Cell c : tissue.cells()) {
            // No division: every survivor is a founder of age 0 at the start, its volume unchanged.
            assertEquals(0, c.generation());
            assertEquals(0.0, c.birthTime(), 0.0);
            assertEquals(1.0, c.volume(), 0.0);
        }
        assertTrue(alive >= law.inverseCumulativeProbability(0.005) && alive <= law.inverseCumulativeProbability(0.995),
                "survivors " + alive + " against mean " + founders * survive);
    }

    @Test
    void dilutionFollowsTheVolume() {
        // Volume grows linearly from 1 to 2 over the cycle T, so a cell of initial age a0 holds
        // (T + a0) / (T + a0 + t) of its starting concentration after t (derived by hand).
        double cycle = 10;
        GrowthSpec growth = GrowthSpec.of(100, 2, 0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, cycle,
                0), Partitioning.equal()).withAxis(GrowthSpec.DivisionAxis.RANDOM).withDeathRate(0).withDilution(true);
        double duration = 3.0;
        Tissue tissue = new Tissue(spec(100, growth, duration), 12);
        tissue.start();
        tissue.runToEnd();
        int checked = 0;
        for (Cell cell : tissue.cells()) {
            if (cell.generation() == 0) {
                double a0 = cell.age(duration) - duration;
                assertEquals((cycle + a0) / (cycle + a0 + duration), cell.concentration(0), 1e-9);
                checked++;
            }
        }
        assertTrue(checked > 50);
    }

    /**
     * Extrinsic noise: the factor is lognormal with mean 1 and the chosen CV, and sisters' scores
     * correlate as rho^2 (both are rho times the mother's score plus independent parts). Checked
     * with 99% intervals: normal for the mean and CV, Fisher's z for the correlation (common
     * practice).
     */
    @Test
    void extrinsicFactorsHaveTheirMeanSpreadAndInheritance() {
        double cv = 0.3;
        double rho = 0.8;
        ExtrinsicNoise noise =
                new ExtrinsicNoise("k", new int[] {0}, cv, rho);
        GrowthSpec growth = GrowthSpec.of(3000, 2, 0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 2, 0),
                Partitioning.equal()).withAxis(GrowthSpec.DivisionAxis.RANDOM).withDeathRate(0).withDilution(false);
        TissueSpec base = spec(3000, growth, 1.99);
        TissueSpec spec = TissueSpec.of(base.circuit(), base.mapping(), base.morphogen(),
                new Domain.Rectangle(base.width(), base.height()), base.growth(), base.fates(), base.timing())
                .withExtrinsic(List.of(noise));
        Tissue tissue = new Tissue(spec, 21);
        tissue.start();
        tissue.runToEnd();
        double sum = 0;
        double sumSq = 0;
        Map<Long, List<Double>> sisters = new HashMap<>();
        for (Cell cell : tissue.cells()) {
            double f = noise.factor(cell.scores()[0]);
            sum += f;
            sumSq += f * f;
            if (cell.parentId() >= 0) {
                sisters.computeIfAbsent(cell.parentId(), k -> new ArrayList<>()).add(cell.scores()[0]);
            }
        }
        int n = tissue.cells().size();
        double mean = sum / n;
        double sd = Math.sqrt((sumSq - n * mean * mean) / (n - 1));
        assertEquals(1.0, mean, 2.576 * cv / Math.sqrt(n));
        assertEquals(cv, sd, 2.576 * cv * Math.sqrt(2.0 / n) * 1.5);
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double syy = 0;
        double sxy = 0;
        int pairs = 0;
        for (List<Double> pair : sisters.values()) {
            if (pair.size() == 2) {
                double x = pair.get(0);
                double y = pair.get(1);
                sx += x;
                sy += y;
                sxx += x * x;
                syy += y * y;
                sxy += x * y;
                pairs++;
            }
        }
        double r = (sxy - sx * sy / pairs) / Math.sqrt((sxx - sx * sx / pairs) * (syy - sy * sy / pairs));
        assertTrue(pairs > 2000, "pairs " + pairs);
        double z = 0.5 * Math.log((1 + r) / (1 - r));
        double expected = 0.5 * Math.log((1 + rho * rho) / (1 - rho * rho));
        assertEquals(expected, z, 2.576 / Math.sqrt(pairs - 3), "sister correlation " + r);
    }

    /**
     * X' = 1 without noise and X = 0 in every founder at t = 0; equal halves of molecules and
     * volume at division leave the concentration unchanged, so X = t in every cell. With the
     * timed fate X >= 3, a cell alive before t = 3 first enters at t = 3 (noted at the end of the
     * step that crosses, so within one 0.01 h step after it), and a daughter born later is born
     * in the fate: its own first entry is its birth.
     */
    @Test
    void firstEntryIntoTheTimedFateFollowsTheClosedForm() {
        CustomNetwork clock = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {1.0},
                List.of(new CustomNetwork.ReactionDefinition("make", new int[] {1}, "k")));
        FateClassifier fates = new FateClassifier(List.of(new FateRule("high", new double[] {3.0},
                new double[] {Double.NaN})), "low").withFirstPassage("high");
        GrowthSpec growth = GrowthSpec.of(100, 2, 0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 4, 0),
                Partitioning.equal()).withDeathRate(0).withDilution(false);
        TissueSpec spec = TissueSpec.of(new CircuitSetup(clock, NoiseMode.NONE, 100, new double[] {0.0}),
                new ParameterMapping(clock.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 50, 0, List.of()),
                new Domain.Rectangle(1000, 1000), growth, fates, new Timing(9.0, 0.01, 1.0));
        Tissue tissue = new Tissue(spec, 4);
        List<LineageRecord> records = new ArrayList<>();
        tissue.setLineageSink(records::add);
        tissue.start();
        tissue.runToEnd();
        int before = 0;
        int after = 0;
        for (LineageRecord r : records) {
            double lifeEnd = Double.isFinite(r.divisionTime()) ? r.divisionTime() : 9.0;
            if (r.birthTime() < 2.99 && lifeEnd > 3.02) {
                assertEquals(3.005, r.firstEntryTime(), 0.005 + 1e-4, "cell " + r.id());
                before++;
            } else if (r.birthTime() > 3.01) {
                assertEquals(r.birthTime(), r.firstEntryTime(), 1e-3, "cell " + r.id());
                after++;
            } else if (lifeEnd < 2.99) {
                assertTrue(Double.isNaN(r.firstEntryTime()), "cell " + r.id() + " divided before t = 3");
            }
        }
        assertTrue(before > 100 && after > 100, "cells checked: " + before + " before t = 3, " + after + " after");
    }
}
