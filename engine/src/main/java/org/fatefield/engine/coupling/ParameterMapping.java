package org.fatefield.engine.coupling;

import java.util.List;

/**
 * The map from a cell's local morphogen level to its circuit parameters: base parameters with
 * the coupled entries overwritten. The first coupling is the tissue's control parameter, the one
 * whose local value is reported per cell and compared with the single-cell bifurcation.
 */
public final class ParameterMapping {

    private final double[] base;
    private final List<SignalCoupling> couplings;
    private final SignalCoupling[] applied;

    /**
     * @param base      default parameter vector of the circuit (copied)
     * @param couplings couplings applied in order; a later one wins where two set the same entry
     */
    public ParameterMapping(double[] base, List<SignalCoupling> couplings) {
        this.base = base.clone();
        this.couplings = List.copyOf(couplings);
        this.applied = this.couplings.toArray(new SignalCoupling[0]);
        for (SignalCoupling coupling : this.couplings) {
            for (int index : coupling.parameterIndices()) {
                if (index < 0 || index >= base.length) {
                    throw new IllegalArgumentException("coupled parameter index " + index
                            + " is outside the circuit's " + base.length + " parameters");
                }
            }
        }
    }

    /** Writes the parameters for morphogen level {@code c} into {@code out} (length of the base vector). */
    public void parametersAt(double c, double[] out) {
        System.arraycopy(base, 0, out, 0, base.length);
        applySignal(c, out);
    }

    /**
     * Overwrites only the coupled entries of {@code out} for morphogen level {@code c}: the fast
     * path for a buffer that {@link #parametersAt} (or a copy of {@link #base()}) filled before,
     * since the uncoupled entries never change.
     */
    public void applySignal(double c, double[] out) {
        for (SignalCoupling coupling : applied) {
            coupling.apply(c, out);
        }
    }

    /**
     * Overwrites the coupled entries of {@code out} from per-field levels {@code signals}
     * (indexed by field), each coupling reading its own field.
     */
    public void applySignals(double[] signals, double[] out) {
        for (SignalCoupling coupling : applied) {
            coupling.apply(signals[coupling.field()], out);
        }
    }

    /** Index of the field the control parameter reads (0 without couplings). */
    public int controlField() {
        return couplings.isEmpty() ? 0 : couplings.get(0).field();
    }

    /** Value of the control parameter at morphogen level {@code c}; NaN without couplings. */
    public double controlAt(double c) {
        return couplings.isEmpty() ? Double.NaN : couplings.get(0).valueAt(c);
    }

    /** Number of circuit parameters. */
    public int parameterCount() {
        return base.length;
    }

    /** A copy of the base parameters. */
    public double[] base() {
        return base.clone();
    }

    /** The couplings, in application order. */
    public List<SignalCoupling> couplings() {
        return couplings;
    }
}
