package org.fatefield.circuits.analysis.continuation;

/**
 * {@code m} equations {@code G(y) = 0} in {@code m + 1} unknowns: the form pseudo-arclength
 * continuation works on. For a branch of steady states {@code y = (x, lambda)}; for a fold curve
 * {@code y = (x, lambda1, lambda2)} with the fold condition appended.
 */
public interface UnderdeterminedSystem {

    /** Number of equations {@code m}; there are {@code m + 1} unknowns. */
    int equations();

    /** Writes {@code G(y)} ({@code m} values) into {@code out}. */
    void residual(double[] y, double[] out);

    /** Writes the {@code m x (m + 1)} Jacobian {@code dG/dy} into {@code out}. */
    void jacobian(double[] y, double[][] out);
}
