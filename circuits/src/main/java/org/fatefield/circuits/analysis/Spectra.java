package org.fatefield.circuits.analysis;

import java.util.Arrays;
import java.util.Comparator;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;

/** Eigenvalues of Jacobians, sorted the same way everywhere in the analysis. */
public final class Spectra {

    private Spectra() {
    }

    /**
     * Eigenvalues of the square matrix {@code jac} (Hipparchus' non-symmetric QR algorithm),
     * sorted by decreasing real part, then increasing imaginary part.
     */
    public static Complex[] eigenvalues(double[][] jac) {
        boolean zero = true;
        for (double[] row : jac) {
            for (double v : row) {
                zero &= v == 0.0;
            }
        }
        if (zero) {
            // The decomposition refuses a zero matrix (it normalises eigenvectors); all eigenvalues are 0.
            Complex[] zeros = new Complex[jac.length];
            Arrays.fill(zeros, Complex.ZERO);
            return zeros;
        }
        Complex[] eigen = new EigenDecompositionNonSymmetric(new Array2DRowRealMatrix(jac, true)).getEigenvalues();
        Arrays.sort(eigen, Comparator.comparingDouble(Complex::getReal).reversed()
                .thenComparing(Comparator.comparingDouble(Complex::getImaginary)));
        return eigen;
    }

    /** True if every eigenvalue has a negative real part. */
    public static boolean stable(Complex[] eigenvalues) {
        return eigenvalues.length == 0 || eigenvalues[0].getReal() < 0;
    }

    /** Number of eigenvalues with a positive real part. */
    public static int unstableCount(Complex[] eigenvalues) {
        int count = 0;
        for (Complex lambda : eigenvalues) {
            if (lambda.getReal() > 0) {
                count++;
            }
        }
        return count;
    }

    /**
     * Real part of the complex pair nearest the imaginary axis (NaN if all eigenvalues are real
     * within {@code imaginaryTolerance}): the Hopf test function.
     */
    public static double criticalPairRealPart(Complex[] eigenvalues, double imaginaryTolerance) {
        double best = Double.NaN;
        for (Complex lambda : eigenvalues) {
            if (lambda.getImaginary() > imaginaryTolerance
                    && (Double.isNaN(best) || Math.abs(lambda.getReal()) < Math.abs(best))) {
                best = lambda.getReal();
            }
        }
        return best;
    }

    /** Imaginary part of the complex pair nearest the imaginary axis, NaN if none. */
    public static double criticalPairFrequency(Complex[] eigenvalues, double imaginaryTolerance) {
        double best = Double.NaN;
        double frequency = Double.NaN;
        for (Complex lambda : eigenvalues) {
            if (lambda.getImaginary() > imaginaryTolerance
                    && (Double.isNaN(best) || Math.abs(lambda.getReal()) < Math.abs(best))) {
                best = lambda.getReal();
                frequency = lambda.getImaginary();
            }
        }
        return frequency;
    }
}
