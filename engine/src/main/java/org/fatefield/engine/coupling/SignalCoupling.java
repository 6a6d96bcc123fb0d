package org.fatefield.engine.coupling;

import java.util.Arrays;
import java.util.Locale;
import java.util.Objects;

/**
 * Sets one or more circuit parameters from the local level of one field, by a {@link CouplingLaw}.
 *
 * @param label            the parameter as the scenario names it (e.g. {@code repression})
 * @param parameterIndices indices in the circuit's parameter vector that take the value
 * @param law              how the level maps to the value
 * @param field            index of the field it reads (0: the primary morphogen)
 */
public record SignalCoupling(String label, int[] parameterIndices, CouplingLaw law, int field) {

    /** A coupling to the primary field. */
    public static SignalCoupling of(String label, int[] parameterIndices, CouplingLaw law) {
        return new SignalCoupling(label, parameterIndices, law, 0);
    }

    /** Validates and copies. */
    public SignalCoupling {
        if (parameterIndices.length == 0) {
            throw new IllegalArgumentException("a coupling must set at least one parameter");
        }
        parameterIndices = parameterIndices.clone();
        Objects.requireNonNull(law, "coupling law");
        if (field < 0) {
            throw new IllegalArgumentException("field index must be at least 0, got " + field);
        }
    }

    @Override
    public int[] parameterIndices() {
        return parameterIndices.clone();
    }

    /** The parameter value at morphogen level {@code c}. */
    public double valueAt(double c) {
        return law.valueAt(c);
    }

    /** Writes the value at {@code c} into every coupled entry of {@code params}. */
    void apply(double c, double[] params) {
        double value = law.valueAt(c);
        int[] indices = parameterIndices;
        for (int i = 0; i < indices.length; i++) {
            params[indices[i]] = value;
        }
    }

    @Override
    public String toString() {
        return law.getClass().getSimpleName().toLowerCase(Locale.ROOT) + " coupling of " + label + " "
                + Arrays.toString(parameterIndices);
    }
}
