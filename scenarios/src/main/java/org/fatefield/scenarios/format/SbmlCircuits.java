package org.fatefield.scenarios.format;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.xml.stream.XMLStreamException;
import org.sbml.jsbml.ASTNode;
import org.sbml.jsbml.AssignmentRule;
import org.sbml.jsbml.Compartment;
import org.sbml.jsbml.KineticLaw;
import org.sbml.jsbml.LocalParameter;
import org.sbml.jsbml.Model;
import org.sbml.jsbml.Parameter;
import org.sbml.jsbml.Reaction;
import org.sbml.jsbml.Rule;
import org.sbml.jsbml.SBMLDocument;
import org.sbml.jsbml.SBMLReader;
import org.sbml.jsbml.Species;
import org.sbml.jsbml.SpeciesReference;

/**
 * Reads an SBML Level 3 core reaction network (through JSBML) into the custom-circuit form of a
 * circuit file: {@code [circuit]} of type custom with the species and their initial
 * concentrations, {@code [circuit.parameters]}, and one {@code [[circuit.reaction]]} per
 * reaction, its kinetic law rewritten in the rate-law language. The result is then checked and
 * compiled like any circuit file, so an SBML file can never do more than a rate law can.
 *
 * <p>Supported: one compartment; species (those with {@code constant} or
 * {@code boundaryCondition} become parameters); global parameters and a kinetic law's local ones
 * (renamed {@code <reaction>_<name>}); irreversible reactions with whole stoichiometries;
 * assignment rules that set a parameter (substituted into the laws that use it); in MathML,
 * numbers, names, + - * /, power, exp, ln, log (base 10 or given), root (square or given
 * degree), abs, min, max, pi and e. Everything else (events, function definitions, initial
 * assignments, rate and algebraic rules, constraints, delays, time, piecewise and logical
 * functions, reversible reactions) is refused with a message that says which element and why.
 * A file with a document type declaration is refused before parsing (no external entities).
 */
public final class SbmlCircuits {

    static {
        // JSBML logs through Log4j; without its core, the API's simple logger, switched off, keeps the
        // command line's output to Fatefield's own messages.
        setIfAbsent("log4j2.loggerContextFactory", "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
        setIfAbsent("org.apache.logging.log4j.simplelog.level", "OFF");
        setIfAbsent("log4j2.statusLoggerLevel", "OFF");
    }

    private SbmlCircuits() {
    }

    private static void setIfAbsent(String key, String value) {
        if (System.getProperty(key) == null) {
            System.setProperty(key, value);
        }
    }

    /** The circuit file text for the SBML {@code bytes}, or null after adding problems. */
    public static String toToml(byte[] bytes, String label, List<Problem> problems) {
        String xml = new String(bytes, StandardCharsets.UTF_8);
        if (xml.toUpperCase(Locale.ROOT).contains("<!DOCTYPE") || xml.toUpperCase(Locale.ROOT).contains("<!ENTITY")) {
            problems.add(problem(label, "an SBML file may not carry a document type declaration or entities"
                    + " (they could reach other files); remove the <!DOCTYPE ...> part"));
            return null;
        }
        SBMLDocument document;
        try {
            document = new SBMLReader().readSBMLFromString(xml);
        } catch (XMLStreamException | RuntimeException e) {
            problems.add(problem(label, "not a readable SBML file: " + e.getMessage()));
            return null;
        }
        if (document == null || !document.isSetModel()) {
            problems.add(problem(label, "no <model> in this SBML file"));
            return null;
        }
        if (document.getLevel() != 3) {
            problems.add(problem(label, "SBML Level " + document.getLevel() + " is not supported; convert the file"
                    + " to Level 3 (version 1 or 2) core"));
            return null;
        }
        Model model = document.getModel();
        int before = problems.size();
        refuseUnsupported(model, label, problems);
        if (model.getNumCompartments() > 1) {
            problems.add(problem(label, "the model has " + model.getNumCompartments() + " compartments; a cell's"
                    + " circuit has one"));
        }
        double volume = 1;
        Map<String, String> substitutions = new HashMap<>();
        for (Compartment c : model.getListOfCompartments()) {
            volume = c.isSetSize() ? c.getSize() : 1;
            if (!(volume > 0) || !Double.isFinite(volume)) {
                problems.add(problem(label, "compartment " + c.getId() + " has size " + volume + "; give it a"
                        + " positive size"));
                volume = 1;
            }
            substitutions.put(c.getId(), number(volume));
        }
        List<String> species = new ArrayList<>();
        List<Double> initial = new ArrayList<>();
        Map<String, Double> parameters = new LinkedHashMap<>();
        for (Species s : model.getListOfSpecies()) {
            double value = s.isSetInitialConcentration() ? s.getInitialConcentration()
                    : s.isSetInitialAmount() ? s.getInitialAmount() / volume : Double.NaN;
            if (!Double.isFinite(value) || value < 0) {
                problems.add(problem(label, "species " + s.getId() + " needs a finite initialConcentration or"
                        + " initialAmount of at least 0"));
                value = 0;
            }
            if (s.getHasOnlySubstanceUnits() && volume != 1) {
                problems.add(problem(label, "species " + s.getId() + " has hasOnlySubstanceUnits=\"true\" in a"
                        + " compartment of size " + number(volume) + "; use concentrations, or a compartment of size 1"));
            }
            if (s.getConstant() || s.getBoundaryCondition()) {
                parameters.put(s.getId(), value);
            } else {
                species.add(s.getId());
                initial.add(value);
            }
        }
        for (Parameter p : model.getListOfParameters()) {
            if (!p.isSetValue() && model.getRuleByVariable(p.getId()) == null) {
                problems.add(problem(label, "parameter " + p.getId() + " has no value"));
            }
            if (model.getRuleByVariable(p.getId()) == null) {
                parameters.put(p.getId(), p.isSetValue() ? p.getValue() : 0.0);
            }
        }
        Map<String, ASTNode> assigned = new HashMap<>();
        for (Rule r : model.getListOfRules()) {
            if (r instanceof AssignmentRule a) {
                if (species.contains(a.getVariable())) {
                    problems.add(problem(label, "the assignment rule for species " + a.getVariable() + " is not"
                            + " supported; a species changes only through reactions"));
                } else {
                    assigned.put(a.getVariable(), a.getMath());
                }
            }
        }
        StringBuilder reactions = new StringBuilder();
        for (Reaction r : model.getListOfReactions()) {
            reaction(r, species, volume, substitutions, assigned, parameters, reactions, label, problems);
        }
        if (species.isEmpty()) {
            problems.add(problem(label, "the model has no species that change"));
        }
        if (problems.size() > before) {
            return null;
        }
        StringBuilder out = new StringBuilder();
        out.append("# Read from the SBML model ").append(quote(model.getId())).append(" by Fatefield.\n");
        out.append("[circuit]\ntype = \"custom\"\nspecies = [");
        out.append(String.join(", ", species.stream().map(SbmlCircuits::quote).toList())).append("]\n");
        out.append("initial = [").append(String.join(", ", initial.stream().map(SbmlCircuits::number).toList()))
                .append("]\n");
        out.append("\n[circuit.parameters]\n");
        parameters.forEach((name, value) -> out.append(name).append(" = ").append(number(value)).append('\n'));
        out.append(reactions);
        return out.toString();
    }

    private static void refuseUnsupported(Model model, String label, List<Problem> problems) {
        if (model.getNumEvents() > 0) {
            problems.add(problem(label, "events are not supported (" + model.getNumEvents() + " in the model);"
                    + " a circuit's rates change only through its species and parameters"));
        }
        if (model.getNumFunctionDefinitions() > 0) {
            problems.add(problem(label, "function definitions are not supported; write them out in the kinetic laws"));
        }
        if (model.getNumInitialAssignments() > 0) {
            problems.add(problem(label, "initial assignments are not supported; give the values directly"));
        }
        if (model.getNumConstraints() > 0) {
            problems.add(problem(label, "constraints are not supported; remove them"));
        }
        for (Rule r : model.getListOfRules()) {
            if (!(r instanceof AssignmentRule)) {
                problems.add(problem(label, (r.isRate() ? "rate" : "algebraic") + " rules are not supported; write the"
                        + " change as a reaction"));
            }
        }
    }

    private static void reaction(Reaction r, List<String> species, double volume, Map<String, String> substitutions,
            Map<String, ASTNode> assigned, Map<String, Double> parameters, StringBuilder out, String label,
            List<Problem> problems) {
        String where = "reaction " + r.getId();
        if (r.isSetReversible() && r.getReversible()) {
            problems.add(problem(label, where + " is reversible; split it into a forward and a backward reaction,"
                    + " each with a rate of at least 0"));
            return;
        }
        if (!r.isSetKineticLaw() || !r.getKineticLaw().isSetMath()) {
            problems.add(problem(label, where + " has no kinetic law"));
            return;
        }
        Map<String, Integer> change = new LinkedHashMap<>();
        for (int side = 0; side < 2; side++) {
            for (SpeciesReference s : side == 0 ? r.getListOfReactants() : r.getListOfProducts()) {
                double stoichiometry = s.isSetStoichiometry() ? s.getStoichiometry() : 1;
                if (stoichiometry != Math.rint(stoichiometry) || Math.abs(stoichiometry) > 1000) {
                    problems.add(problem(label, where + ": stoichiometry " + stoichiometry + " of " + s.getSpecies()
                            + " is not a whole number up to 1000"));
                    return;
                }
                if (species.contains(s.getSpecies())) {
                    change.merge(s.getSpecies(), (side == 0 ? -1 : 1) * (int) stoichiometry, Integer::sum);
                }
            }
        }
        change.values().removeIf(v -> v == 0);
        KineticLaw law = r.getKineticLaw();
        Map<String, String> local = new HashMap<>(substitutions);
        for (LocalParameter p : law.getListOfLocalParameters()) {
            String name = r.getId() + "_" + p.getId();
            parameters.put(name, p.getValue());
            local.put(p.getId(), name);
        }
        String rate;
        try {
            rate = formula(law.getMath(), local, assigned, 0);
        } catch (IllegalArgumentException e) {
            problems.add(problem(label, where + ": " + e.getMessage()));
            return;
        }
        if (change.isEmpty()) {
            return;
        }
        if (volume != 1) {
            rate = "(" + rate + ") / " + number(volume);
        }
        out.append("\n[[circuit.reaction]]\nname = ").append(quote(r.getId())).append("\nchange = { ");
        List<String> parts = new ArrayList<>();
        change.forEach((s, v) -> parts.add(s + " = " + v));
        out.append(String.join(", ", parts)).append(" }\nrate = ").append(quote(rate)).append('\n');
    }

    /** The MathML tree in the rate-law language, with names replaced as {@code names} says. */
    static String formula(ASTNode node, Map<String, String> names, Map<String, ASTNode> assigned, int depth) {
        if (depth > 64) {
            throw new IllegalArgumentException("assignment rules refer to each other in a loop, or nest too deeply");
        }
        String type = node.getType().name();
        int n = node.getChildCount();
        switch (type) {
            case "INTEGER":
                return number(node.getInteger());
            case "REAL", "REAL_E", "RATIONAL":
                return number(node.getReal());
            case "CONSTANT_PI":
                return number(Math.PI);
            case "CONSTANT_E":
                return number(Math.E);
            case "NAME":
                if (assigned.containsKey(node.getName())) {
                    return "(" + formula(assigned.get(node.getName()), names, assigned, depth + 1) + ")";
                }
                return names.getOrDefault(node.getName(), node.getName());
            case "PLUS", "TIMES":
                if (n == 0) {
                    return type.equals("PLUS") ? "0" : "1";
                }
                List<String> terms = new ArrayList<>();
                for (int i = 0; i < n; i++) {
                    terms.add(formula(node.getChild(i), names, assigned, depth));
                }
                return "(" + String.join(type.equals("PLUS") ? " + " : " * ", terms) + ")";
            case "MINUS":
                return n == 1 ? "(-" + formula(node.getChild(0), names, assigned, depth) + ")"
                        : "(" + formula(node.getChild(0), names, assigned, depth) + " - "
                                + formula(node.getChild(1), names, assigned, depth) + ")";
            case "DIVIDE":
                return "(" + formula(node.getChild(0), names, assigned, depth) + " / "
                        + formula(node.getChild(1), names, assigned, depth) + ")";
            case "POWER", "FUNCTION_POWER":
                return "(" + formula(node.getChild(0), names, assigned, depth) + " ^ "
                        + formula(node.getChild(1), names, assigned, depth) + ")";
            case "FUNCTION_EXP":
                return "exp(" + formula(node.getChild(0), names, assigned, depth) + ")";
            case "FUNCTION_LN":
                return "log(" + formula(node.getChild(0), names, assigned, depth) + ")";
            case "FUNCTION_LOG": {
                String base = n == 2 ? formula(node.getChild(0), names, assigned, depth) : "10";
                String arg = formula(node.getChild(n - 1), names, assigned, depth);
                return "(log(" + arg + ") / log(" + base + "))";
            }
            case "FUNCTION_ROOT": {
                String arg = formula(node.getChild(n - 1), names, assigned, depth);
                if (n == 1) {
                    return "sqrt(" + arg + ")";
                }
                return "(" + arg + " ^ (1 / " + formula(node.getChild(0), names, assigned, depth) + "))";
            }
            case "FUNCTION_ABS":
                return "abs(" + formula(node.getChild(0), names, assigned, depth) + ")";
            case "FUNCTION_MIN", "FUNCTION_MAX": {
                String word = type.equals("FUNCTION_MIN") ? "min" : "max";
                String acc = formula(node.getChild(0), names, assigned, depth);
                for (int i = 1; i < n; i++) {
                    acc = word + "(" + acc + ", " + formula(node.getChild(i), names, assigned, depth) + ")";
                }
                return acc;
            }
            default:
                throw new IllegalArgumentException("the MathML element '" + type.toLowerCase(Locale.ROOT)
                        + "' is not supported in a kinetic law (supported: numbers, names, + - * /, power, exp, ln, log,"
                        + " root, abs, min, max, pi, e)");
        }
    }

    private static String number(double v) {
        return BigDecimal.valueOf(v).toPlainString();
    }

    private static String quote(String text) {
        return "\"" + text.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }

    private static Problem problem(String label, String message) {
        return new Problem(label, 0, 0, "", null, message);
    }
}
