package org.fatefield.engine.coupling;

import java.util.Arrays;
import org.fatefield.circuits.kinetics.Hill;
import org.fatefield.engine.field.PiecewiseLinear;

/**
 * Sets one or more circuit parameters from the local morphogen level.
 *
 * @param label            the parameter as the scenario names it (e.g. {@code repression})
 * @param parameterIndices indices in the circuit's parameter vector that take the value
 * @param form             linear or Hill
 * @param base             value at zero morphogen (parameter units)
 * @param gain             slope (linear) or maximal increase (Hill), parameter units
 * @param halfMax          morphogen level of half-maximal effect (Hill only), greater than 0
 * @param hill             Hill coefficient (Hill only), greater than 0
 * @param table            lookup table (table form only), else null
 * @param field            index of the field it reads (0: the primary morphogen)
 */
public record SignalCoupling(String label, int[] parameterIndices, CouplingForm form, double base, double gain,
        double halfMax, double hill, PiecewiseLinear table, int field) {

    /** A linear or Hill coupling to the primary field. */
    public SignalCoupling(String label, int[] parameterIndices, CouplingForm form, double base, double gain,
            double halfMax, double hill) {
        this(label, parameterIndices, form, base, gain, halfMax, hill, null, 0);
    }

    /** A coupling to the primary field. */
    public SignalCoupling(String label, int[] parameterIndices, CouplingForm form, double base, double gain,
            double halfMax, double hill, PiecewiseLinear table) {
        this(label, parameterIndices, form, base, gain, halfMax, hill, table, 0);
    }

    /** Validates and copies. */
    public SignalCoupling {
        if (parameterIndices.length == 0) {
            throw new IllegalArgumentException("a coupling must set at least one parameter");
        }
        parameterIndices = parameterIndices.clone();
        if (!Double.isFinite(base) || !Double.isFinite(gain)) {
            throw new IllegalArgumentException("coupling base and gain must be finite, got " + base + ", " + gain);
        }
        if (field < 0) {
            throw new IllegalArgumentException("field index must be at least 0, got " + field);
        }
        if (form == CouplingForm.TABLE && table == null) {
            throw new IllegalArgumentException("a table coupling needs its table of (morphogen, value) points");
        }
        if (form == CouplingForm.HILL && (!(halfMax > 0) || !(hill > 0))) {
            throw new IllegalArgumentException("a Hill coupling needs half_max > 0 and hill > 0, got "
                    + halfMax + ", " + hill);
        }
    }

    @Override
    public int[] parameterIndices() {
        return parameterIndices.clone();
    }

    /** The parameter value at morphogen level {@code c}. */
    public double valueAt(double c) {
        return switch (form) {
            case LINEAR -> base + gain * c;
            case HILL -> base + gain * Hill.activation(c, halfMax, hill);
            case TABLE -> table.at(c);
        };
    }

    /** Writes the value at {@code c} into every coupled entry of {@code params}. */
    void apply(double c, double[] params) {
        double value = valueAt(c);
        int[] indices = parameterIndices;
        for (int i = 0; i < indices.length; i++) {
            params[indices[i]] = value;
        }
    }

    @Override
    public String toString() {
        return form + " coupling of " + label + " " + Arrays.toString(parameterIndices);
    }
}
