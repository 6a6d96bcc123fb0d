package org.fatefield.circuits.kinetics;

/**
 * Hill functions, the standard phenomenological form of cooperative activation and repression.
 *
 * <p>With {@code r = (x / theta)^n}: activation {@code r / (1 + r)}, repression
 * {@code 1 / (1 + r)}. Integer exponents up to 8 are computed by repeated multiplication, which
 * is several times faster than {@link Math#pow} and exact to rounding.
 */
public final class HillFunctions {

    private HillFunctions() {
    }

    /** {@code (x / theta)^n} for {@code x >= 0}; negative {@code x} is treated as zero. */
    public static double ratioPower(double x, double theta, double n) {
        double u = x > 0.0 ? x / theta : 0.0;
        int k = (int) n;
        if (k == n && k >= 1 && k <= 8) {
            double r = u;
            for (int i = 1; i < k; i++) {
                r *= u;
            }
            return r;
        }
        return Math.pow(u, n);
    }

    /** Activating Hill function {@code x^n / (theta^n + x^n)}, in [0, 1). */
    public static double activation(double x, double theta, double n) {
        double r = ratioPower(x, theta, n);
        // A huge Hill coefficient overflows r to infinity above theta, where the function is 1.
        return r == Double.POSITIVE_INFINITY ? 1.0 : r / (1.0 + r);
    }

    /** Repressing Hill function {@code theta^n / (theta^n + x^n)}, in (0, 1]. */
    public static double repression(double x, double theta, double n) {
        return 1.0 / (1.0 + ratioPower(x, theta, n));
    }

    /** Derivative of {@link #activation} with respect to {@code x}. */
    public static double activationSlope(double x, double theta, double n) {
        if (!(x > 0.0)) {
            return n == 1.0 ? 1.0 / theta : 0.0;
        }
        double r = ratioPower(x, theta, n);
        if (r == Double.POSITIVE_INFINITY) {
            return 0.0;
        }
        return n * r / (x * (1.0 + r) * (1.0 + r));
    }

    /** Derivative of {@link #repression} with respect to {@code x} (never positive). */
    public static double repressionSlope(double x, double theta, double n) {
        return -activationSlope(x, theta, n);
    }
}
