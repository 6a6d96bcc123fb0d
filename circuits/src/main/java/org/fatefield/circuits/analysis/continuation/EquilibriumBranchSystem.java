package org.fatefield.circuits.analysis.continuation;

/** {@code G(x, lambda) = F(x, lambda)}: a branch of steady states as an underdetermined system. */
final class EquilibriumBranchSystem implements UnderdeterminedSystem {

    private final ParametrisedSystem system;
    private final int n;
    private final double[] x;
    private final double[][] fx;
    private final double[] fl;

    EquilibriumBranchSystem(ParametrisedSystem system) {
        this.system = system;
        this.n = system.dimension();
        this.x = new double[n];
        this.fx = new double[n][n];
        this.fl = new double[n];
    }

    @Override
    public int equations() {
        return n;
    }

    @Override
    public void residual(double[] y, double[] out) {
        System.arraycopy(y, 0, x, 0, n);
        system.value(x, y[n], out);
    }

    @Override
    public void jacobian(double[] y, double[][] out) {
        System.arraycopy(y, 0, x, 0, n);
        system.jacobian(x, y[n], fx);
        system.parameterDerivative(x, y[n], fl);
        for (int i = 0; i < n; i++) {
            System.arraycopy(fx[i], 0, out[i], 0, n);
            out[i][n] = fl[i];
        }
    }
}
