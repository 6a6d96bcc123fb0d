package org.fatefield.engine.metrics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.field.PiecewiseLinear;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.NoiseMode;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.TissueSpec;
import org.hipparchus.distribution.discrete.PoissonDistribution;
import org.junit.jupiter.api.Test;

/**
 * The noise-based predicted profile against an exact result: a gene made at rate s (set by the
 * morphogen) and lost at rate 1, simulated exactly from zero molecules, has after time T a
 * Poisson number of molecules with mean {@code s Omega (1 - exp(-T))} (the immigration-death
 * process; Gardiner, Handbook of Stochastic Methods, 2009, section 7.1). A cell is "high" with
 * at least 20 molecules (concentration 1 at Omega = 20), so the predicted high fraction at each
 * position must be {@code P(N >= 20)}.
 */
class SingleCellProfileTest {

    private static final double OMEGA = 20;
    private static final double T = 10;

    @Test
    void predictedFractionsFollowThePoissonLawOfTheImmigrationDeathProcess() {
        TissueSpec spec = spec(300);
        List<MorphogenField> fields = List.of(field(spec));
        double[] centres = new double[20];
        for (int b = 0; b < centres.length; b++) {
            centres[b] = (b + 0.5) * 5;
        }
        SingleCellProfile p = SingleCellProfile.of(spec, fields, centres, 7, 2);
        assertTrue(p.defined(), p.undefined());
        int n = p.cellsPerPosition();
        for (int b = 0; b < centres.length; b++) {
            double c = centres[b] / 100;
            double mean = 2 * c * OMEGA * (1 - Math.exp(-T));
            double exact = mean == 0 ? 0 : 1 - new PoissonDistribution(mean).cumulativeProbability(19);
            // Four binomial standard errors at n = 300, plus one cell for the discreteness.
            double tolerance = 4 * Math.sqrt(exact * (1 - exact) / n) + 1.0 / n;
            assertEquals(exact, p.fractions()[0][b], tolerance, "x = " + centres[b]);
            assertEquals(1.0, p.fractions()[0][b] + p.fractions()[1][b], 1e-12);
        }
        // The predicted boundary: where P(N >= 20) = 1/2, i.e. the Poisson median 20 - 1/3 (about)
        // at mean 2 c Omega (1 - e^-T); c = 19.67 / 40 / (1 - e^-10) = 0.4917, at x = 49.2 µm.
        assertEquals(49.2, p.boundary(0), 3.0);
        assertEquals(p.boundary(0), p.committedBoundary(), 1e-12);
    }

    @Test
    void sameResultForAnyThreadCountAndNoneWhenSwitchedOff() {
        TissueSpec spec = spec(40);
        List<MorphogenField> fields = List.of(field(spec));
        double[] centres = {12.5, 37.5, 62.5, 87.5};
        SingleCellProfile one = SingleCellProfile.of(spec, fields, centres, 3, 1);
        SingleCellProfile two = SingleCellProfile.of(spec, fields, centres, 3, 2);
        assertArrayEquals(one.fractions()[0], two.fractions()[0], 0.0);
        TissueSpec off = new TissueSpec(spec.circuit(), spec.mapping(), spec.morphogen(), spec.domain(),
                spec.growth(), spec.fates().withPredictionCells(0), spec.timing(), spec.extrinsic(), spec.others());
        assertTrue(!SingleCellProfile.of(off, fields, centres, 3, 1).defined());
    }

    private static TissueSpec spec(int cells) {
        CustomNetwork gene = CustomNetwork.of(List.of("X"), List.of("s", "k"), new double[] {0.0, 1.0}, List.of(
                new CustomNetwork.ReactionDefinition("make", new int[] {1}, "s"),
                new CustomNetwork.ReactionDefinition("lose", new int[] {-1}, "k * X")));
        MorphogenSpec profile = new MorphogenSpec("m", 0, 0, 5, 0, List.of(), MorphogenSpec.Solver.EXPLICIT,
                MorphogenSpec.WallCondition.NO_FLUX, MorphogenSpec.CellExchange.OFF,
                PiecewiseLinear.of(new double[] {0, 100}, new double[] {0, 1}), 0.0);
        return TissueSpec.of(new CircuitSetup(gene, NoiseMode.EXACT, OMEGA, new double[] {0.0}),
                new ParameterMapping(gene.defaultParameters(),
                        List.of(SignalCoupling.of("s", new int[] {0}, new CouplingLaw.Linear(0.0, 2.0)))),
                profile, new Domain.Rectangle(100, 10),
                GrowthSpec.of(10, 1.0, 0.0, new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0),
                        Partitioning.binomial()),
                new FateClassifier(List.of(new FateRule("high", new double[] {1.0}, new double[] {Double.NaN})), "low")
                        .withPredictionCells(cells), new Timing(T, 0.05, 1));
    }

    private static MorphogenField field(TissueSpec spec) {
        return new MorphogenField(spec.morphogen(), spec.width(), spec.height(), false);
    }
}
