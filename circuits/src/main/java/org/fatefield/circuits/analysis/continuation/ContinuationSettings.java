package org.fatefield.circuits.analysis.continuation;

/**
 * Step control of a continuation.
 *
 * @param initialStep first arclength step, greater than 0
 * @param minStep     smallest step before a branch is abandoned, greater than 0
 * @param maxStep     largest step, at least the initial step
 * @param maxPoints   points per branch, at least 2
 * @param tolerance   Newton tolerance of the corrector, greater than 0
 */
public record ContinuationSettings(double initialStep, double minStep, double maxStep, int maxPoints,
        double tolerance) {

    /** Validates. */
    public ContinuationSettings {
        if (!(minStep > 0) || !(initialStep >= minStep) || !(maxStep >= initialStep)) {
            throw new IllegalArgumentException("steps must satisfy 0 < min <= initial <= max, got min " + minStep
                    + ", initial " + initialStep + ", max " + maxStep);
        }
        if (maxPoints < 2) {
            throw new IllegalArgumentException("max points must be at least 2, got " + maxPoints);
        }
        if (!(tolerance > 0)) {
            throw new IllegalArgumentException("tolerance must be greater than 0, got " + tolerance);
        }
    }

    /** Defaults suited to circuits whose states and parameters are of order one. */
    public static ContinuationSettings defaults() {
        return new ContinuationSettings(0.01, 1e-7, 0.1, 2000, 1e-11);
    }

    /** A copy with another largest step. */
    public ContinuationSettings withMaxStep(double step) {
        return new ContinuationSettings(Math.min(initialStep, step), minStep, step, maxPoints, tolerance);
    }
}
