package org.fatefield.circuits.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.fatefield.circuits.kinetics.HillFunctions;

/**
 * A general gene-regulatory network of n genes with Hill-type interactions.
 *
 * <p>A signed interaction matrix says which gene acts on which: {@code sign[i][j] = +1} if gene
 * j activates gene i, {@code -1} if it represses it, 0 if it has no effect. Each input is a Hill
 * term {@code h_ij} (activation {@code x^n/(K^n+x^n)} or repression {@code K^n/(K^n+x^n)} of x_j,
 * with its own threshold K_ij and coefficient n_ij). The inputs of gene i combine as
 * <ul>
 *   <li>{@link Combination#ADDITIVE}: {@code production_i = basal_i + max_i * mean_j h_ij} (any
 *       input can drive expression: OR-like);</li>
 *   <li>{@link Combination#MULTIPLICATIVE}: {@code production_i = basal_i + max_i * prod_j h_ij}
 *       (all inputs must agree: AND-like).</li>
 * </ul>
 * A gene with no inputs is made at {@code basal_i + max_i}. Loss is {@code degradation_i x_i}.
 * Parameters are named {@code <gene>.basal}, {@code <gene>.max_rate}, {@code <gene>.degradation},
 * {@code <target>.<source>.threshold} and {@code <target>.<source>.hill}.
 */
public final class HillNetwork implements ReactionNetwork {

    /** How the inputs of one gene combine. */
    public enum Combination {
        /** Mean of the input terms. */
        ADDITIVE,
        /** Product of the input terms. */
        MULTIPLICATIVE
    }

    private final List<String> genes;
    private final int[][] sign;
    private final Combination combination;
    private final List<String> parameterNames;
    private final double[] defaults;
    private final int[][] inputs;
    private final int[][] thresholdIndex;
    private final int[][] hillIndex;

    /**
     * @param genes       gene names
     * @param sign        n x n matrix of -1, 0, +1: effect of gene j (column) on gene i (row)
     * @param combination how inputs combine
     * @param basal       basal production per gene (1/h)
     * @param maxRate     regulated production per gene (1/h)
     * @param degradation loss rate per gene (1/h)
     * @param threshold   n x n thresholds (used where sign is non-zero)
     * @param hill        n x n Hill coefficients (used where sign is non-zero)
     */
    public HillNetwork(List<String> genes, int[][] sign, Combination combination, double[] basal, double[] maxRate,
            double[] degradation, double[][] threshold, double[][] hill) {
        int n = genes.size();
        if (sign.length != n || basal.length != n || maxRate.length != n || degradation.length != n
                || threshold.length != n || hill.length != n) {
            throw new IllegalArgumentException("every per-gene list and matrix needs " + n + " rows, one per gene");
        }
        this.genes = List.copyOf(genes);
        this.combination = combination;
        this.sign = new int[n][];
        this.inputs = new int[n][];
        this.thresholdIndex = new int[n][];
        this.hillIndex = new int[n][];
        List<String> names = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (sign[i].length != n || threshold[i].length != n || hill[i].length != n) {
                throw new IllegalArgumentException("row " + (i + 1) + " of a matrix needs " + n + " entries");
            }
            requireNonNegative(genes.get(i) + ".basal", basal[i]);
            requireNonNegative(genes.get(i) + ".max_rate", maxRate[i]);
            requirePositive(genes.get(i) + ".degradation", degradation[i]);
            names.add(genes.get(i) + ".basal");
            values.add(basal[i]);
            names.add(genes.get(i) + ".max_rate");
            values.add(maxRate[i]);
            names.add(genes.get(i) + ".degradation");
            values.add(degradation[i]);
        }
        for (int i = 0; i < n; i++) {
            this.sign[i] = sign[i].clone();
            List<Integer> in = new ArrayList<>();
            for (int j = 0; j < n; j++) {
                if (sign[i][j] < -1 || sign[i][j] > 1) {
                    throw new IllegalArgumentException("interaction of " + genes.get(j) + " on " + genes.get(i)
                            + " must be -1, 0 or 1, got " + sign[i][j]);
                }
                if (sign[i][j] != 0) {
                    in.add(j);
                }
            }
            inputs[i] = in.stream().mapToInt(Integer::intValue).toArray();
            thresholdIndex[i] = new int[inputs[i].length];
            hillIndex[i] = new int[inputs[i].length];
            for (int k = 0; k < inputs[i].length; k++) {
                int j = inputs[i][k];
                String edge = genes.get(i) + "." + genes.get(j);
                requirePositive(edge + ".threshold", threshold[i][j]);
                requirePositive(edge + ".hill", hill[i][j]);
                thresholdIndex[i][k] = names.size();
                names.add(edge + ".threshold");
                values.add(threshold[i][j]);
                hillIndex[i][k] = names.size();
                names.add(edge + ".hill");
                values.add(hill[i][j]);
            }
        }
        this.parameterNames = List.copyOf(names);
        this.defaults = values.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static void requireNonNegative(String name, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and at least 0, got " + v);
        }
    }

    private static void requirePositive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and greater than 0, got " + v);
        }
    }

    /** How the inputs of a gene combine. */
    public Combination combination() {
        return combination;
    }

    /** The effect of gene {@code source} on gene {@code target}: +1 activates, -1 represses, 0 none. */
    public int sign(int target, int source) {
        return sign[target][source];
    }

    @Override
    public List<String> speciesNames() {
        return genes;
    }

    @Override
    public List<String> parameterNames() {
        return parameterNames;
    }

    @Override
    public double[] defaultParameters() {
        return defaults.clone();
    }

    @Override
    public int reactionCount() {
        return 2 * genes.size();
    }

    @Override
    public int stoichiometry(int reaction, int species) {
        if (reaction / 2 != species) {
            return 0;
        }
        return reaction % 2 == 0 ? 1 : -1;
    }

    private double term(int i, int k, double[] x, double[] p) {
        int j = inputs[i][k];
        double theta = p[thresholdIndex[i][k]];
        double n = p[hillIndex[i][k]];
        return sign[i][j] > 0 ? HillFunctions.activation(x[j], theta, n) : HillFunctions.repression(x[j], theta, n);
    }

    private double regulation(int i, double[] x, double[] p) {
        int count = inputs[i].length;
        if (count == 0) {
            return 1.0;
        }
        double value = combination == Combination.ADDITIVE ? 0.0 : 1.0;
        for (int k = 0; k < count; k++) {
            double h = term(i, k, x, p);
            value = combination == Combination.ADDITIVE ? value + h : value * h;
        }
        return combination == Combination.ADDITIVE ? value / count : value;
    }

    @Override
    public void propensities(double[] x, double[] p, double[] out) {
        for (int i = 0; i < genes.size(); i++) {
            out[2 * i] = p[3 * i] + p[3 * i + 1] * regulation(i, x, p);
            out[2 * i + 1] = p[3 * i + 2] * Math.max(x[i], 0.0);
        }
    }

    @Override
    public void jacobian(double[] x, double[] p, double[][] out) {
        int n = genes.size();
        for (int i = 0; i < n; i++) {
            Arrays.fill(out[i], 0.0);
            out[i][i] = -p[3 * i + 2];
            int count = inputs[i].length;
            for (int k = 0; k < count; k++) {
                int j = inputs[i][k];
                double slope = sign[i][j] * HillFunctions.activationSlope(x[j], p[thresholdIndex[i][k]],
                        p[hillIndex[i][k]]);
                double factor;
                if (combination == Combination.ADDITIVE) {
                    factor = 1.0 / count;
                } else {
                    factor = 1.0;
                    for (int other = 0; other < count; other++) {
                        if (other != k) {
                            factor *= term(i, other, x, p);
                        }
                    }
                }
                out[i][j] += p[3 * i + 1] * factor * slope;
            }
        }
    }
}
