package org.fatefield.circuits.inference;

/**
 * Settings of an ABC-SMC calibration.
 *
 * @param particles       accepted particles kept per model and generation
 * @param batch           candidates proposed per model in one round (one round is one parallel
 *                        batch, or one cluster array job)
 * @param quantile        the next tolerance is this quantile of the accepted distances (0 &lt; q &lt; 1)
 * @param minAcceptance   stop once a generation accepts fewer than this fraction of its proposals
 * @param maxGenerations  most generations, the prior generation 0 included
 * @param targetTolerance stop once the tolerance is at or below this
 * @param seed            master seed: the same seed gives the same calibration on any worker count
 */
public record AbcSettings(int particles, int batch, double quantile, double minAcceptance, int maxGenerations,
        double targetTolerance, long seed) {

    /** Validates, naming the setting at fault and its allowed range. */
    public AbcSettings {
        if (particles < 2 || particles > 1_000_000) {
            throw new IllegalArgumentException("particles must be from 2 to 1000000, got " + particles);
        }
        if (batch < 1 || batch > 1_000_000) {
            throw new IllegalArgumentException("batch must be from 1 to 1000000, got " + batch);
        }
        if (!(quantile > 0 && quantile < 1)) {
            throw new IllegalArgumentException("quantile must be between 0 and 1 (exclusive), got " + quantile);
        }
        if (!(minAcceptance > 0 && minAcceptance <= 1)) {
            throw new IllegalArgumentException("min_acceptance must be above 0 and at most 1, got " + minAcceptance);
        }
        if (maxGenerations < 1 || maxGenerations > 1000) {
            throw new IllegalArgumentException("generations must be from 1 to 1000, got " + maxGenerations);
        }
        if (!(targetTolerance >= 0) || Double.isInfinite(targetTolerance)) {
            throw new IllegalArgumentException("tolerance must be finite and at least 0, got " + targetTolerance);
        }
        if (seed < 0) {
            throw new IllegalArgumentException("seed must be at least 0, got " + seed);
        }
    }

    /**
     * The most candidates one model may propose in a generation, particles / min_acceptance: a
     * generation that reaches it is below the acceptance floor and is the last.
     */
    public long proposalCap() {
        return (long) Math.ceil(particles / minAcceptance);
    }
}
