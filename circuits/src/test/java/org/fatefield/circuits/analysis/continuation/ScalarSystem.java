package org.fatefield.circuits.analysis.continuation;

import java.util.function.DoubleBinaryOperator;

/** A one-unknown test problem x' = f(x, r) with its derivative in x. */
final class ScalarSystem implements ParametrisedSystem {

    private final DoubleBinaryOperator f;
    private final DoubleBinaryOperator fx;

    ScalarSystem(DoubleBinaryOperator f, DoubleBinaryOperator fx) {
        this.f = f;
        this.fx = fx;
    }

    @Override
    public int dimension() {
        return 1;
    }

    @Override
    public void value(double[] x, double lambda, double[] out) {
        out[0] = f.applyAsDouble(x[0], lambda);
    }

    @Override
    public void jacobian(double[] x, double lambda, double[][] out) {
        out[0][0] = fx.applyAsDouble(x[0], lambda);
    }
}
