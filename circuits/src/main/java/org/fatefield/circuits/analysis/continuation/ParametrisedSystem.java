package org.fatefield.circuits.analysis.continuation;

/**
 * A system of equations {@code F(x, lambda) = 0} in {@code n} unknowns with one scalar
 * parameter: the steady-state equations of a circuit along a control parameter, or any other
 * problem to continue (a discretised boundary-value problem, say).
 */
public interface ParametrisedSystem {

    /** Number of unknowns (and equations). */
    int dimension();

    /**
     * Writes {@code F(x, lambda)} into {@code out}.
     *
     * @param x      unknowns, not modified
     * @param lambda the parameter
     * @param out    receives {@link #dimension()} values
     */
    void value(double[] x, double lambda, double[] out);

    /** Writes {@code dF/dx} into {@code out} ({@code n x n}). */
    void jacobian(double[] x, double lambda, double[][] out);

    /**
     * Writes {@code dF/dlambda} into {@code out}. The default is a central difference with step
     * {@code 1e-6 (1 + |lambda|)}, accurate to about 1e-10 relative for smooth systems.
     */
    default void parameterDerivative(double[] x, double lambda, double[] out) {
        int n = dimension();
        double h = 1e-6 * (1.0 + Math.abs(lambda));
        double[] up = new double[n];
        double[] down = new double[n];
        value(x, lambda + h, up);
        value(x, lambda - h, down);
        for (int i = 0; i < n; i++) {
            out[i] = (up[i] - down[i]) / (2 * h);
        }
    }
}
