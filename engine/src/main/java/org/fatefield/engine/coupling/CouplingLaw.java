package org.fatefield.engine.coupling;

import java.util.Objects;
import org.fatefield.circuits.kinetics.HillFunctions;
import org.fatefield.engine.field.PiecewiseLinear;

/**
 * How a local morphogen level {@code c} sets a circuit parameter: {@link Linear}, saturating
 * {@link Hill} or a lookup {@link Table}. Each law validates its own constants and knows the
 * range of values it gives, which the single-cell analyses continue over.
 */
public sealed interface CouplingLaw permits CouplingLaw.Linear, CouplingLaw.Hill, CouplingLaw.Table {

    /** The parameter value at morphogen level {@code c}. */
    double valueAt(double c);

    /**
     * The parameter range the law spans: for Hill the limits at no and at saturating morphogen,
     * for a table its lowest and highest value, for a linear law its values at c = 0 and c = 1
     * (a linear law has no natural end; the analyses take one unit of morphogen).
     */
    double[] range();

    /** {@code base + gain * c}. */
    record Linear(double base, double gain) implements CouplingLaw {

        /** Validates. */
        public Linear {
            checkFinite(base, gain);
        }

        @Override
        public double valueAt(double c) {
            return base + gain * c;
        }

        @Override
        public double[] range() {
            return new double[] {Math.min(base, base + gain), Math.max(base, base + gain)};
        }
    }

    /** {@code base + gain * c^n / (K^n + c^n)}: saturating, the usual receptor-occupancy form. */
    record Hill(double base, double gain, double halfMax, double coefficient) implements CouplingLaw {

        /** Validates. */
        public Hill {
            checkFinite(base, gain);
            if (!(halfMax > 0) || !(coefficient > 0) || Double.isInfinite(halfMax) || Double.isInfinite(coefficient)) {
                throw new IllegalArgumentException("a Hill coupling needs a finite half_max > 0 and hill > 0, got "
                        + halfMax + ", " + coefficient);
            }
        }

        @Override
        public double valueAt(double c) {
            return base + gain * HillFunctions.activation(c, halfMax, coefficient);
        }

        @Override
        public double[] range() {
            return new double[] {Math.min(base, base + gain), Math.max(base, base + gain)};
        }
    }

    /** A lookup table of (c, value) points, linear between them and constant beyond. */
    record Table(PiecewiseLinear points) implements CouplingLaw {

        /** Validates. */
        public Table {
            Objects.requireNonNull(points, "a table coupling needs its table of (morphogen, value) points");
        }

        @Override
        public double valueAt(double c) {
            return points.at(c);
        }

        @Override
        public double[] range() {
            return new double[] {points.minimum(), points.maximum()};
        }
    }

    private static void checkFinite(double base, double gain) {
        if (!Double.isFinite(base) || !Double.isFinite(gain)) {
            throw new IllegalArgumentException("coupling base and gain must be finite, got " + base + ", " + gain);
        }
    }
}
