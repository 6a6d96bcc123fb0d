package org.fatefield.engine.field;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.fatefield.engine.field.MorphogenSpec.CellExchange;
import org.fatefield.engine.field.MorphogenSpec.Solver;
import org.fatefield.engine.field.MorphogenSpec.WallCondition;
import org.fatefield.engine.field.MorphogenSpec.WallKind;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.api.Test;

/**
 * Left-wall conditions against the steady states of D c'' - k c = 0 on [0, L] with no flux at L
 * (derived here; lambda = sqrt(D / k)): a held value v gives c = v cosh((L - x)/lambda) /
 * cosh(L/lambda); an inflow J gives c = (J lambda / D) cosh((L - x)/lambda) / sinh(L/lambda).
 * Within 1% on a fine grid, for both solvers.
 */
class WallAndExchangeTest {

    private static final double D = 100;
    private static final double K = 1;
    private static final double L = 60;

    private static MorphogenField relaxed(WallCondition wall, Solver solver) {
        MorphogenSpec spec = new MorphogenSpec("m", D, K, 0.5, 0, List.of(), solver, wall, CellExchange.OFF, null, 0.0);
        MorphogenField field = new MorphogenField(spec, L, 0.5, false);
        double dt = solver == Solver.ADI ? 0.05 : 0.001;
        for (int i = 0; i < Math.round(40 / dt); i++) {
            field.advance(dt);
        }
        return field;
    }

    @ParameterizedTest
    @EnumSource(Solver.class)
    void fixedValueWall(Solver solver) {
        double lambda = Math.sqrt(D / K);
        MorphogenField field = relaxed(new WallCondition(WallKind.FIXED_VALUE, 2.0), solver);
        for (int i = 0; i < field.columns(); i++) {
            double x = (i + 0.5) * 0.5;
            double expected = 2.0 * Math.cosh((L - x) / lambda) / Math.cosh(L / lambda);
            assertEquals(expected, field.value(i, 0), 0.01 * expected, "x = " + x);
        }
    }

    @ParameterizedTest
    @EnumSource(Solver.class)
    void inflowWall(Solver solver) {
        double lambda = Math.sqrt(D / K);
        double inflow = 3.0;
        MorphogenField field = relaxed(new WallCondition(WallKind.FLUX, inflow), solver);
        for (int i = 0; i < field.columns(); i++) {
            double x = (i + 0.5) * 0.5;
            double expected = inflow * lambda / D * Math.cosh((L - x) / lambda) / Math.sinh(L / lambda);
            assertEquals(expected, field.value(i, 0), 0.01 * expected, "x = " + x);
        }
    }

    @Test
    void secretionAgainstDecayBalances() {
        // Without diffusion, a square receiving amount q per hour (per unit area) and losing k c
        // settles at q / k exactly; uptake u adds to the loss: q / (k + u).
        MorphogenSpec spec = new MorphogenSpec("m", 0, K, 10, 0, List.of(), Solver.EXPLICIT, WallCondition.NO_FLUX,
                new CellExchange(CellExchange.ALL, 50, 0.5), null, 0.0);
        MorphogenField field = new MorphogenField(spec, 30, 10, false);
        double[] amount = new double[3];
        double[] uptake = new double[3];
        amount[1] = 50.0 / 100;
        uptake[1] = 0.5;
        field.setCellExchange(amount, uptake);
        for (int i = 0; i < 4000; i++) {
            field.advance(0.01);
        }
        assertEquals(0.5 / (K + 0.5), field.value(1, 0), 1e-9);
        assertEquals(0.0, field.value(0, 0), 0.0);
    }
}
