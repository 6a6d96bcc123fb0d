package org.fatefield.circuits.model;


/**
 * Kinetic parameters of one gene of the self-activating mutual-repression switch.
 *
 * <p>Production rate = {@code basal + selfActivation * act(own; selfThreshold, selfHill)
 * + repressible * rep(other; repressionThreshold, repressionHill)}; loss rate =
 * {@code degradation * own}. Concentrations and thresholds share one dimensionless unit; rates
 * are per hour. The degradation rate is the effective first-order loss, dilution by growth
 * included.
 *
 * @param basal               constitutive production rate (concentration / h), at least 0
 * @param selfActivation      maximal production added by self-activation (concentration / h), at least 0
 * @param selfThreshold       concentration of half-maximal self-activation, greater than 0
 * @param selfHill            Hill coefficient of self-activation, greater than 0
 * @param repressible         production that the other gene can repress, maximal when the other is absent (concentration / h), at least 0
 * @param repressionThreshold concentration of the other gene giving half repression, greater than 0
 * @param repressionHill      Hill coefficient of the repression, greater than 0
 * @param degradation         first-order loss rate (1 / h), greater than 0
 */
public record GeneKinetics(double basal, double selfActivation, double selfThreshold, double selfHill,
        double repressible, double repressionThreshold, double repressionHill, double degradation) {

    /** Parameter names in the order {@link #toArray()} writes them. */
    public static final String[] NAMES = {
        "basal", "self_activation", "self_threshold", "self_hill",
        "repression", "repression_threshold", "repression_hill", "degradation"};

    /** Validates every field; the message names the field, the value and the allowed range. */
    public GeneKinetics {
        requireAtLeastZero("basal", basal);
        requireAtLeastZero("self_activation", selfActivation);
        requirePositive("self_threshold", selfThreshold);
        requirePositive("self_hill", selfHill);
        requireAtLeastZero("repression", repressible);
        requirePositive("repression_threshold", repressionThreshold);
        requirePositive("repression_hill", repressionHill);
        requirePositive("degradation", degradation);
    }

    /** The eight values in {@link #NAMES} order. */
    public double[] toArray() {
        return new double[] {basal, selfActivation, selfThreshold, selfHill,
            repressible, repressionThreshold, repressionHill, degradation};
    }

    /** Rebuilds from eight values in {@link #NAMES} order starting at {@code offset}. */
    public static GeneKinetics fromArray(double[] values, int offset) {
        return new GeneKinetics(values[offset], values[offset + 1], values[offset + 2], values[offset + 3],
                values[offset + 4], values[offset + 5], values[offset + 6], values[offset + 7]);
    }

    private static void requireAtLeastZero(String name, double value) {
        if (!(value >= 0.0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and at least 0, got " + value);
        }
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0.0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and greater than 0, got " + value);
        }
    }
}
