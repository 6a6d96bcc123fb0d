package org.fatefield.circuits.analysis.continuation;

/** Small vector operations shared by the continuations. */
final class Vectors {

    private Vectors() {
    }

    /** {@code y + h t}, as a new array. */
    static double[] add(double[] y, double[] t, double h) {
        double[] out = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            out[i] = y[i] + h * t[i];
        }
        return out;
    }

    /** {@code -t}, as a new array. */
    static double[] negate(double[] t) {
        double[] out = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            out[i] = -t[i];
        }
        return out;
    }

    /** The dot product. */
    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }
}
