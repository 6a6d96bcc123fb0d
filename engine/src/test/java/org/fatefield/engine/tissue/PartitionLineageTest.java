package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.metrics.LineageStatistics;
import org.junit.jupiter.api.Test;

/**
 * How partitioning noise shapes lineages: with deterministic circuits (no expression noise) and
 * exact halving, sisters are identical and always share their fate; with binomial partitioning at
 * the unstable symmetric state, the two shares are complementary (what one daughter gains of a
 * gene the other lacks), so sisters tend to take opposite fates and agree less often than the
 * one half of independent coin tosses (derived from the model). The binomial case is checked
 * against the upper end of the 99% interval for agreement one half.
 */
class PartitionLineageTest {

    private static LineageStatistics run(Partitioning partitioning) {
        SelfActivatingSwitch sw = SelfActivatingSwitch.symmetric("A", "B",
                new GeneKinetics(0.1, 0.35, 0.5, 4, 1.0, 0.5, 4, 1.0));
        double s = 0.6325258702713282;
        TissueSpec spec = TissueSpec.of(new CircuitSetup(sw, NoiseMode.NONE, 200, new double[] {s, s}),
                new ParameterMapping(sw.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 50, 0, List.of()),
                new Domain.Rectangle(1000, 1000), GrowthSpec.of(1000, 2, 0,
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 100.0, 0), partitioning),
                new FateClassifier(List.of(
                        new FateRule("a", new double[] {1.0, Double.NaN}, new double[] {Double.NaN, 0.6}),
                        new FateRule("b", new double[] {Double.NaN, 1.0}, new double[] {0.6, Double.NaN})), "u"),
                                new Timing(15.5, 0.01, 0.5));
        // Founders sit exactly on the saddle with ages in [0, 100) h: those that divide in the run
        // do so once, and their daughters then decide.
        Tissue tissue = new Tissue(spec, 5, 2);
        tissue.start();
        tissue.runToEnd();
        tissue.finish();
        return LineageStatistics.of(tissue.cells(), tissue.ancestry(), 3);
    }

    @Test
    void equalHalvingKeepsSistersTogetherAndBinomialSplitsThem() {
        LineageStatistics equal = run(Partitioning.equal());
        assertEquals(1.0, equal.sameFate().get(2), 0.0);
        LineageStatistics binomial = run(Partitioning.binomial());
        long pairs = binomial.pairs().get(2);
        double agreement = binomial.sameFate().get(2);
        assertTrue(pairs > 100, "pairs " + pairs);
        assertTrue(agreement < 0.5 - 2.576 * Math.sqrt(0.25 / pairs), "sister agreement " + agreement);
    }
}
