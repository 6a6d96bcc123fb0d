package org.fatefield.scenarios.calibration;

/**
 * One measured summary statistic with its uncertainty.
 *
 * @param name  the statistic, as the runs report it ({@code boundary_progenitor_um}) or a
 *              profile point ({@code profile_<fate>_at_<x>um})
 * @param value the measured value
 * @param sd    its uncertainty (a standard deviation), which scales the distance
 * @param unit  its unit as written in the file (may be empty)
 * @param fate  for a profile point, the fate; otherwise null
 * @param x     for a profile point, the position along the gradient (µm); otherwise NaN
 */
public record Observation(String name, double value, double sd, String unit, String fate, double x) {

    /** A summary statistic that is not a profile point. */
    public static Observation summary(String name, double value, double sd, String unit) {
        return new Observation(name, value, sd, unit, null, Double.NaN);
    }

    /** True for a point of a measured fate profile. */
    public boolean profilePoint() {
        return fate != null;
    }
}
