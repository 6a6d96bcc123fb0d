package org.fatefield.circuits.model;

import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.kinetics.HillFunctions;

/**
 * The two-gene switch in which each gene activates itself and represses the other.
 *
 * <pre>
 *   dA/dt = bA + sA act(A) + rA rep(B) - kA A
 *   dB/dt = bB + sB act(B) + rB rep(A) - kB B
 * </pre>
 *
 * with Hill activation and repression ({@link HillFunctions}). With self-activation off it is the
 * mutual-repression toggle of Gardner, Cantor &amp; Collins (2000, Nature 403:339); with both
 * terms it is the fate-decision motif whose symmetric state loses stability in a pitchfork as
 * self-activation grows or degradation falls (Huang, Guo, May &amp; Enver 2007, Dev Biol 305:695).
 *
 * <p>Reactions, in order: production of the first gene, loss of the first gene, production of
 * the second gene, loss of the second gene. Parameters are named {@code <species>.<name>} with
 * the names of {@link GeneKinetics#NAMES}.
 */
public final class SelfActivatingSwitch implements ReactionNetwork {

    private static final int PER_GENE = GeneKinetics.NAMES.length;

    private final List<String> species;
    private final List<String> parameterNames;
    private final double[] defaults;

    private SelfActivatingSwitch(String first, String second, GeneKinetics firstGene, GeneKinetics secondGene) {
        this.species = List.of(first, second);
        List<String> names = new ArrayList<>();
        for (String gene : species) {
            for (String name : GeneKinetics.NAMES) {
                names.add(gene + "." + name);
            }
        }
        this.parameterNames = List.copyOf(names);
        this.defaults = new double[2 * PER_GENE];
        System.arraycopy(firstGene.toArray(), 0, defaults, 0, PER_GENE);
        System.arraycopy(secondGene.toArray(), 0, defaults, PER_GENE, PER_GENE);
    }

    /**
     * A switch of two named genes with the given default kinetics.
     *
     * @throws IllegalArgumentException if a name is blank, contains a dot, or both are equal
     */
    public static SelfActivatingSwitch of(String first, String second, GeneKinetics firstGene,
            GeneKinetics secondGene) {
        requireName(first);
        requireName(second);
        if (first.equals(second)) {
            throw new IllegalArgumentException("the two genes need different names, both are '" + first + "'");
        }
        return new SelfActivatingSwitch(first, second, firstGene, secondGene);
    }

    /** A symmetric switch: both genes share the same kinetics. */
    public static SelfActivatingSwitch symmetric(String first, String second, GeneKinetics kinetics) {
        return of(first, second, kinetics, kinetics);
    }

    /** Offset of the first parameter of gene {@code gene} (0 or 1) in the parameter vector. */
    public static int geneOffset(int gene) {
        return gene * PER_GENE;
    }

    private static void requireName(String name) {
        if (name == null || name.isBlank() || name.contains(".")) {
            throw new IllegalArgumentException("gene names must be non-blank and contain no dot, got '" + name + "'");
        }
    }

    @Override
    public List<String> speciesNames() {
        return species;
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
    public String reactionName(int r) {
        return (r % 2 == 0 ? "production of " : "loss of ") + species.get(r / 2);
    }

    @Override
    public int reactionCount() {
        return 4;
    }

    @Override
    public int stoichiometry(int reaction, int species) {
        if (reaction / 2 != species) {
            return 0;
        }
        return reaction % 2 == 0 ? 1 : -1;
    }

    @Override
    public void propensities(double[] x, double[] p, double[] out) {
        double a = x[0];
        double b = x[1];
        out[0] = production(p, 0, a, b);
        out[1] = loss(p, 0, a);
        out[2] = production(p, PER_GENE, b, a);
        out[3] = loss(p, PER_GENE, b);
    }

    /**
     * Loss (degradation and dilution) propensity of a gene whose parameters start at {@code o}
     * in {@code p}, at level {@code own} (clipped at zero); as {@link #production}, the exact
     * arithmetic of {@link #propensities}.
     */
    public static double loss(double[] p, int o, double own) {
        return p[o + 7] * Math.max(own, 0.0);
    }

    /**
     * Production propensity of a gene whose parameters start at {@code o} in {@code p}
     * ({@link #geneOffset}): basal, self-activation of {@code own}, repression by {@code other}.
     * The exact arithmetic of {@link #propensities}, for steppers that fuse it into their update.
     */
    public static double production(double[] p, int o, double own, double other) {
        return p[o] + p[o + 1] * HillFunctions.activation(own, p[o + 2], p[o + 3])
                + p[o + 4] * HillFunctions.repression(other, p[o + 5], p[o + 6]);
    }

    @Override
    public void drift(double[] x, double[] p, double[] out, double[] work) {
        double a = x[0];
        double b = x[1];
        out[0] = production(p, 0, a, b) - p[7] * a;
        out[1] = production(p, PER_GENE, b, a) - p[PER_GENE + 7] * b;
    }

    @Override
    public void jacobian(double[] x, double[] p, double[][] out) {
        double a = x[0];
        double b = x[1];
        int o = PER_GENE;
        out[0][0] = p[1] * HillFunctions.activationSlope(a, p[2], p[3]) - p[7];
        out[0][1] = p[4] * HillFunctions.repressionSlope(b, p[5], p[6]);
        out[1][0] = p[o + 4] * HillFunctions.repressionSlope(a, p[o + 5], p[o + 6]);
        out[1][1] = p[o + 1] * HillFunctions.activationSlope(b, p[o + 2], p[o + 3]) - p[o + 7];
    }
}
