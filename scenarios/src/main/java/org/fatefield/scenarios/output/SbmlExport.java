package org.fatefield.scenarios.output;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.expr.ExpressionParser;
import org.fatefield.circuits.expr.Node;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.HillNetwork;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.model.SelfActivatingSwitch;

/**
 * Writes a circuit as an SBML Level 3 Version 2 core model: one compartment of size 1 (the cell;
 * concentrations are the circuit's own unit), each species with its initial concentration, each
 * parameter with its value, and each reaction with its stoichiometry and kinetic law in MathML
 * (Hill functions written out as x^n / (K^n + x^n) and K^n / (K^n + x^n)). Custom circuits, Hill
 * networks and the self-activating switch (and so the toggle) are written; dotted parameter names
 * ({@code <gene>.<name>}, {@code <target>.<source>.hill}) get underscores, since SBML names
 * cannot hold a dot. Reading
 * the file back ({@code circuit.file}) gives the same circuit.
 */
public final class SbmlExport {

    private SbmlExport() {
    }

    /**
     * The SBML document of {@code network} with {@code initial} concentrations.
     *
     * @throws IllegalArgumentException for a kind of circuit that cannot be written
     */
    public static String of(String modelId, ReactionNetwork network, double[] initial) {
        List<String> species = network.speciesNames();
        List<String> parameters = new ArrayList<>();
        network.parameterNames().forEach(n -> parameters.add(n.replace('.', '_')));
        List<Node> laws = laws(network, parameters);
        double[] values = network.defaultParameters();
        StringBuilder x = new StringBuilder();
        x.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        x.append("<sbml xmlns=\"http://www.sbml.org/sbml/level3/version2/core\" level=\"3\" version=\"2\">\n");
        x.append("  <model id=\"").append(id(modelId)).append("\" name=\"").append(escape(modelId))
                .append(" (written by Fatefield)\">\n");
        x.append("    <listOfCompartments>\n      <compartment id=\"cell\" size=\"1\" spatialDimensions=\"3\""
                + " constant=\"true\"/>\n    </listOfCompartments>\n");
        x.append("    <listOfSpecies>\n");
        for (int s = 0; s < species.size(); s++) {
            x.append("      <species id=\"").append(species.get(s)).append("\" compartment=\"cell\" initialConcentration=\"")
                    .append(number(initial[s])).append("\" hasOnlySubstanceUnits=\"false\" boundaryCondition=\"false\""
                            + " constant=\"false\"/>\n");
        }
        x.append("    </listOfSpecies>\n    <listOfParameters>\n");
        for (int p = 0; p < parameters.size(); p++) {
            x.append("      <parameter id=\"").append(parameters.get(p)).append("\" value=\"").append(number(values[p]))
                    .append("\" constant=\"true\"/>\n");
        }
        x.append("    </listOfParameters>\n    <listOfReactions>\n");
        for (int j = 0; j < network.reactionCount(); j++) {
            x.append("      <reaction id=\"r").append(j + 1).append("\" reversible=\"false\">\n");
            side(x, network, species, j, false);
            side(x, network, species, j, true);
            x.append("        <kineticLaw>\n          <math xmlns=\"http://www.w3.org/1998/Math/MathML\">");
            mathml(laws.get(j), parameters, x);
            x.append("</math>\n        </kineticLaw>\n      </reaction>\n");
        }
        x.append("    </listOfReactions>\n  </model>\n</sbml>\n");
        return x.toString();
    }

    private static List<Node> laws(ReactionNetwork network, List<String> parameters) {
        List<Node> laws = new ArrayList<>();
        if (network instanceof CustomNetwork custom) {
            for (int j = 0; j < custom.reactionCount(); j++) {
                laws.add(custom.rateTree(j));
            }
            return laws;
        }
        if (network instanceof SelfActivatingSwitch) {
            List<String> g = network.speciesNames();
            for (int i = 0; i < 2; i++) {
                String own = g.get(i);
                String other = g.get(1 - i);
                String p = own + "_";
                laws.add(ExpressionParser.parse(p + GeneKinetics.NAMES[0] + " + " + p + GeneKinetics.NAMES[1] + " * hill_act("
                        + own + ", " + p + GeneKinetics.NAMES[2] + ", " + p + GeneKinetics.NAMES[3] + ") + " + p
                        + GeneKinetics.NAMES[4] + " * hill_rep(" + other + ", " + p + GeneKinetics.NAMES[5] + ", " + p
                        + GeneKinetics.NAMES[6] + ")", g, parameters));
                laws.add(ExpressionParser.parse(p + GeneKinetics.NAMES[7] + " * " + own, g, parameters));
            }
            return laws;
        }
        if (network instanceof HillNetwork hill) {
            return hillLaws(hill, parameters);
        }
        throw new IllegalArgumentException("this kind of circuit (" + network.getClass().getSimpleName() + ") cannot be"
                + " written as SBML yet; custom circuits, Hill networks and the switch or toggle can");
    }

    /**
     * A Hill network's laws, per gene: production {@code basal + max_rate * regulation}, where
     * regulation is the mean (additive) or product (multiplicative) of its inputs' Hill terms, or 1
     * without inputs; then loss {@code degradation * x}.
     */
    private static List<Node> hillLaws(HillNetwork network, List<String> parameters) {
        List<String> g = network.speciesNames();
        List<Node> laws = new ArrayList<>();
        for (int i = 0; i < g.size(); i++) {
            List<String> terms = new ArrayList<>();
            for (int j = 0; j < g.size(); j++) {
                int sign = network.sign(i, j);
                if (sign != 0) {
                    String edge = g.get(i) + "_" + g.get(j) + "_";
                    terms.add((sign > 0 ? "hill_act(" : "hill_rep(") + g.get(j) + ", " + edge + "threshold, " + edge
                            + "hill)");
                }
            }
            String regulation = terms.isEmpty() ? "1"
                    : network.combination() == HillNetwork.Combination.ADDITIVE
                    ? "(" + String.join(" + ", terms) + ") / " + terms.size()
                    : String.join(" * ", terms);
            String p = g.get(i) + "_";
            laws.add(ExpressionParser.parse(p + "basal + " + p + "max_rate * (" + regulation + ")", g, parameters));
            laws.add(ExpressionParser.parse(p + "degradation * " + g.get(i), g, parameters));
        }
        return laws;
    }

    private static void side(StringBuilder x, ReactionNetwork network, List<String> species, int j, boolean products) {
        StringBuilder refs = new StringBuilder();
        for (int s = 0; s < species.size(); s++) {
            int v = network.stoichiometry(j, s);
            if (products ? v > 0 : v < 0) {
                refs.append("          <speciesReference species=\"").append(species.get(s)).append("\" stoichiometry=\"")
                        .append(Math.abs(v)).append("\" constant=\"true\"/>\n");
            }
        }
        if (refs.length() > 0) {
            String list = products ? "listOfProducts" : "listOfReactants";
            x.append("        <").append(list).append(">\n").append(refs).append("        </").append(list).append(">\n");
        }
    }

    private static void mathml(Node node, List<String> parameters, StringBuilder x) {
        if (node instanceof Node.Constant c) {
            x.append("<cn> ").append(number(c.value())).append(" </cn>");
        } else if (node instanceof Node.Variable v) {
            x.append("<ci> ").append(v.species() ? v.name() : parameters.get(v.index())).append(" </ci>");
        } else if (node instanceof Node.Negate n) {
            apply(x, "minus", parameters, n.argument());
        } else if (node instanceof Node.Binary b) {
            apply(x, switch (b.operator()) {
                case ADD -> "plus";
                case SUBTRACT -> "minus";
                case MULTIPLY -> "times";
                case DIVIDE -> "divide";
                case POWER -> "power";
            }, parameters, b.left(), b.right());
        } else {
            call((Node.Call) node, parameters, x);
        }
    }

    private static void call(Node.Call c, List<String> parameters, StringBuilder x) {
        List<Node> a = c.arguments();
        switch (c.function()) {
            case EXP -> apply(x, "exp", parameters, a.get(0));
            case LOG -> apply(x, "ln", parameters, a.get(0));
            case SQRT -> apply(x, "root", parameters, a.get(0));
            case ABS -> apply(x, "abs", parameters, a.get(0));
            case MIN -> apply(x, "min", parameters, a.get(0), a.get(1));
            case MAX -> apply(x, "max", parameters, a.get(0), a.get(1));
            case HILL_ACT, HILL_REP -> {
                Node xn = new Node.Binary(Node.Operator.POWER, a.get(0), a.get(2));
                Node kn = new Node.Binary(Node.Operator.POWER, a.get(1), a.get(2));
                Node sum = new Node.Binary(Node.Operator.ADD, kn, xn);
                mathml(new Node.Binary(Node.Operator.DIVIDE, c.function() == Node.Function.HILL_ACT ? xn : kn, sum),
                        parameters, x);
            }
            default -> throw new IllegalArgumentException("the internal function " + c.function().word()
                    + " has no SBML form");
        }
    }

    private static void apply(StringBuilder x, String operator, List<String> parameters, Node... arguments) {
        x.append("<apply><").append(operator).append("/>");
        for (Node n : arguments) {
            mathml(n, parameters, x);
        }
        x.append("</apply>");
    }

    private static String number(double v) {
        return BigDecimal.valueOf(v).toPlainString();
    }

    private static String id(String name) {
        String id = name.replaceAll("[^A-Za-z0-9_]", "_");
        return id.isEmpty() || Character.isDigit(id.charAt(0)) ? "_" + id : id;
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
