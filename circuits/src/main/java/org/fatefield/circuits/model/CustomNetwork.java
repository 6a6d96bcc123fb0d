package org.fatefield.circuits.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.fatefield.circuits.expr.CompiledExpression;
import org.fatefield.circuits.expr.Differentiator;
import org.fatefield.circuits.expr.ExpressionException;
import org.fatefield.circuits.expr.ExpressionParser;
import org.fatefield.circuits.expr.Node;

/**
 * A circuit written by the user: species, parameters and reactions, each reaction with a
 * stoichiometry and a rate law in ordinary math notation. Rate laws are parsed into expression
 * trees of arithmetic and a few functions only ({@link ExpressionParser}), compiled for speed,
 * and differentiated symbolically for an exact Jacobian.
 */
public final class CustomNetwork implements ReactionNetwork {

    /**
     * One reaction as the user wrote it.
     *
     * @param name    name used in messages
     * @param change  net change of each species when it fires once (species order)
     * @param rateLaw propensity in concentration per hour, in terms of species and parameters
     */
    public record ReactionDefinition(String name, int[] change, String rateLaw) {

        /** Copies the stoichiometry. */
        public ReactionDefinition {
            change = change.clone();
        }

        @Override
        public int[] change() {
            return change.clone();
        }
    }

    /** A rate law that cannot be read, naming the reaction and the column. */
    public static final class RateLawException extends IllegalArgumentException {

        private static final long serialVersionUID = 1L;

        private final String reaction;
        private final int column;

        RateLawException(String reaction, ExpressionException cause) {
            super("reaction '" + reaction + "': " + cause.getMessage(), cause);
            this.reaction = reaction;
            this.column = cause.column();
        }

        /** The reaction whose rate law is wrong. */
        public String reaction() {
            return reaction;
        }

        /** 1-based column in the rate law. */
        public int column() {
            return column;
        }
    }

    private final List<String> species;
    private final List<String> parameterNames;
    private final double[] defaults;
    private final int[][] stoichiometry;
    private final CompiledExpression[] rates;
    private final int[][] jacobianSpecies;
    private final CompiledExpression[][] jacobianTerms;
    private final List<Node> trees;
    private final List<String> reactionNames;

    private CustomNetwork(List<String> species, List<String> parameterNames, double[] defaults,
            List<ReactionDefinition> reactions) {
        this.species = List.copyOf(species);
        this.parameterNames = List.copyOf(parameterNames);
        this.defaults = defaults.clone();
        this.reactionNames = reactions.stream().map(ReactionDefinition::name).toList();
        int m = reactions.size();
        this.stoichiometry = new int[m][];
        this.rates = new CompiledExpression[m];
        this.jacobianSpecies = new int[m][];
        this.jacobianTerms = new CompiledExpression[m][];
        List<Node> parsed = new ArrayList<>();
        for (int j = 0; j < m; j++) {
            ReactionDefinition reaction = reactions.get(j);
            Node tree;
            try {
                tree = ExpressionParser.parse(reaction.rateLaw(), this.species, this.parameterNames);
            } catch (ExpressionException e) {
                throw new RateLawException(reaction.name(), e);
            }
            parsed.add(tree);
            stoichiometry[j] = reaction.change();
            rates[j] = CompiledExpression.compile(tree);
            List<Integer> which = new ArrayList<>();
            List<CompiledExpression> terms = new ArrayList<>();
            for (int k = 0; k < species.size(); k++) {
                Node derivative = Differentiator.bySpecies(tree, k);
                if (!(derivative instanceof Node.Constant c && c.value() == 0)) {
                    which.add(k);
                    terms.add(CompiledExpression.compile(derivative));
                }
            }
            jacobianSpecies[j] = which.stream().mapToInt(Integer::intValue).toArray();
            jacobianTerms[j] = terms.toArray(new CompiledExpression[0]);
        }
        this.trees = List.copyOf(parsed);
    }

    /**
     * Builds and checks a custom circuit.
     *
     * @throws IllegalArgumentException if names repeat, a stoichiometry has the wrong length, or
     *                                  there are no reactions
     * @throws RateLawException         if a rate law cannot be read
     */
    public static CustomNetwork of(List<String> species, List<String> parameterNames, double[] defaults,
            List<ReactionDefinition> reactions) {
        Set<String> names = new HashSet<>();
        for (String name : species) {
            requireName(name, names);
        }
        for (String name : parameterNames) {
            requireName(name, names);
        }
        if (defaults.length != parameterNames.size()) {
            throw new IllegalArgumentException(parameterNames.size() + " parameters but " + defaults.length + " values");
        }
        if (species.isEmpty() || reactions.isEmpty()) {
            throw new IllegalArgumentException("a circuit needs at least one species and one reaction");
        }
        for (ReactionDefinition r : reactions) {
            if (r.change().length != species.size()) {
                throw new IllegalArgumentException("reaction '" + r.name() + "' changes " + r.change().length
                        + " species, the circuit has " + species.size());
            }
        }
        return new CustomNetwork(species, parameterNames, defaults, reactions);
    }

    private static void requireName(String name, Set<String> seen) {
        if (name == null || !name.matches("[A-Za-z_][A-Za-z0-9_]*")) {
            throw new IllegalArgumentException("'" + name + "' is not a valid name: use letters, digits and _,"
                    + " starting with a letter or _");
        }
        if (Arrays.stream(Node.Function.values())
                .anyMatch(f -> f.word().equals(name))) {
            throw new IllegalArgumentException("'" + name + "' is a function name and cannot name a species or parameter");
        }
        if (!seen.add(name)) {
            throw new IllegalArgumentException("the name '" + name + "' is used twice");
        }
    }

    /** The parsed rate law of reaction {@code j} (for inspection and tests). */
    public Node rateTree(int j) {
        return trees.get(j);
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
        return "reaction '" + reactionNames.get(r) + "'";
    }

    @Override
    public int reactionCount() {
        return rates.length;
    }

    @Override
    public int stoichiometry(int reaction, int speciesIndex) {
        return stoichiometry[reaction][speciesIndex];
    }

    @Override
    public void propensities(double[] x, double[] p, double[] out) {
        for (int j = 0; j < rates.length; j++) {
            out[j] = rates[j].evaluate(x, p);
        }
    }

    @Override
    public void jacobian(double[] x, double[] p, double[][] out) {
        int n = species.size();
        for (int i = 0; i < n; i++) {
            Arrays.fill(out[i], 0.0);
        }
        for (int j = 0; j < rates.length; j++) {
            int[] ks = jacobianSpecies[j];
            for (int t = 0; t < ks.length; t++) {
                double d = jacobianTerms[j][t].evaluate(x, p);
                for (int i = 0; i < n; i++) {
                    int nu = stoichiometry[j][i];
                    if (nu != 0) {
                        out[i][ks[t]] += nu * d;
                    }
                }
            }
        }
    }
}
