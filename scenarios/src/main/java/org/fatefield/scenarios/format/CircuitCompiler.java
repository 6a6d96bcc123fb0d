package org.fatefield.scenarios.format;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.fatefield.circuits.expr.ExpressionException;
import org.fatefield.circuits.expr.ExpressionParser;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.HillNetwork;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.NoiseMode;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Builds the circuit of a scenario from {@code [circuit]} and the sub-sections of its type: the
 * built-in switch ({@code [circuit.kinetics]}), a Hill network ({@code [circuit.network]}) or a
 * custom circuit ({@code [circuit.parameters]} and {@code [[circuit.reaction]]}). Rate laws are
 * parsed as data into expression trees; a scenario can never run code.
 */
final class CircuitCompiler {

    private final TomlTable toml;
    private final TomlValues values;

    CircuitCompiler(TomlTable toml, TomlValues values) {
        this.toml = toml;
        this.values = values;
    }

    /** The circuit setup, or null after reporting problems. */
    CircuitSetup compile() {
        TomlTable table = toml.getTable("circuit");
        String type = values.text(table, "circuit", "type");
        rejectForeignSections(table, type);
        ReactionNetwork network = switch (type) {
            case ScenarioSchema.HILL_NETWORK -> hillNetwork(table);
            case ScenarioSchema.CUSTOM -> custom(table);
            case ScenarioSchema.TOGGLE -> selfActivatingSwitch(table, true);
            default -> selfActivatingSwitch(table, false);
        };
        if (network == null) {
            return null;
        }
        int n = network.speciesCount();
        double[] fallback = new double[n];
        Arrays.fill(fallback, 0.3);
        double[] initial = TomlValues.numbers(table, "initial", fallback);
        if (initial.length != n || Arrays.stream(initial).anyMatch(v -> v < 0)) {
            values.fail(table, "circuit", "initial", "must give " + n + " concentrations of at least 0, one per species ("
                    + String.join(", ", network.speciesNames()) + ")");
            return null;
        }
        NoiseMode noise = NoiseMode.fromWord(values.text(table, "circuit", "noise"));
        return new CircuitSetup(network, noise, values.number(table, "circuit", "system_size"), initial);
    }

    private void rejectForeignSections(TomlTable table, String type) {
        Map<String, String> owner = Map.of("kinetics", ScenarioSchema.SWITCH, "network", ScenarioSchema.HILL_NETWORK,
                "parameters", ScenarioSchema.CUSTOM, "reaction", ScenarioSchema.CUSTOM, "species", ScenarioSchema.CUSTOM);
        for (Map.Entry<String, String> e : owner.entrySet()) {
            boolean toggleKinetics = e.getKey().equals("kinetics") && type.equals(ScenarioSchema.TOGGLE);
            if (table.contains(e.getKey()) && !e.getValue().equals(type) && !toggleKinetics) {
                values.problem(table, e.getKey(), "circuit." + e.getKey(), null,
                        "belongs to circuit.type = \"" + e.getValue() + "\", but this circuit is \"" + type + "\"");
            }
        }
        if (table.contains("genes") && type.equals(ScenarioSchema.CUSTOM)) {
            values.problem(table, "genes", "circuit.genes", null, "a custom circuit names its species with circuit.species");
        }
    }

    private List<String> geneNames(TomlTable table, int required) {
        List<String> genes = TomlValues.names(table, "genes", List.of("A", "B"));
        Set<String> seen = new HashSet<>();
        boolean ok = (required < 0 ? genes.size() >= 1 : genes.size() == required)
                && genes.stream().allMatch(g -> g.matches("[A-Za-z_][A-Za-z0-9_]*") && seen.add(g));
        if (!ok) {
            values.fail(table, "circuit", "genes", "must name " + (required < 0 ? "at least one gene" : "exactly "
                    + required + " genes") + ", all different, each of letters, digits and _");
            return null;
        }
        return genes;
    }

    private ReactionNetwork selfActivatingSwitch(TomlTable table, boolean toggle) {
        List<String> genes = geneNames(table, 2);
        if (genes == null) {
            return null;
        }
        TomlTable shared = toml.getTableOrEmpty("circuit.kinetics");
        if (toggle) {
            rejectSelfKeys(shared, "circuit.kinetics");
            for (String g : genes) {
                if (shared.isTable(g)) {
                    rejectSelfKeys(shared.getTable(g), "circuit.kinetics." + g);
                }
            }
        }
        for (String key : shared.keySet()) {
            if (shared.isTable(key) && !genes.contains(key)) {
                values.problem(shared, key, "circuit.kinetics." + key, null,
                        "is not a gene of this circuit; genes are " + String.join(", ", genes));
            }
        }
        GeneKinetics[] kinetics = new GeneKinetics[2];
        for (int g = 0; g < 2; g++) {
            TomlTable own = shared.isTable(genes.get(g)) ? shared.getTable(genes.get(g)) : null;
            double[] v = new double[ScenarioSchema.KINETICS.size()];
            for (int k = 0; k < v.length; k++) {
                Key key = ScenarioSchema.KINETICS.get(k);
                Double value = own != null ? ScenarioChecker.asNumber(own.get(key.name())) : null;
                if (value == null) {
                    value = ScenarioChecker.asNumber(shared.get(key.name()));
                }
                v[k] = value != null && key.inRange(value) ? value : Double.parseDouble(key.defaultValue());
                if (toggle && key.name().equals("self_activation")) {
                    v[k] = 0.0;
                }
            }
            kinetics[g] = GeneKinetics.fromArray(v, 0);
        }
        return SelfActivatingSwitch.of(genes.get(0), genes.get(1), kinetics[0], kinetics[1]);
    }

    private void rejectSelfKeys(TomlTable kinetics, String path) {
        for (String key : kinetics.keySet()) {
            if (key.startsWith("self_")) {
                values.problem(kinetics, key, path + "." + key, ScenarioChecker.render(kinetics.get(key)),
                        "a toggle has no self-activation; use circuit.type = \"self-activating-switch\" for it");
            }
        }
    }

    private ReactionNetwork hillNetwork(TomlTable table) {
        List<String> genes = geneNames(table, -1);
        if (genes == null) {
            return null;
        }
        int n = genes.size();
        TomlTable net = toml.getTableOrEmpty("circuit.network");
        if (!net.contains("interaction")) {
            values.problem("circuit.network.interaction", "a hill-network circuit needs [circuit.network] with an"
                    + " interaction matrix (" + n + " rows of " + n + " entries of -1, 0 or 1)");
            return null;
        }
        double[][] interaction = TomlValues.matrix(net, "interaction", n, 0);
        double[][] threshold = TomlValues.matrix(net, "threshold", n, 0.5);
        double[][] hill = TomlValues.matrix(net, "hill", n, 4);
        boolean ok = true;
        for (String key : List.of("interaction", "threshold", "hill")) {
            if (TomlValues.matrix(net, key, n, 0) == null) {
                values.fail(net, "circuit.network", key, "must have " + n + " rows of " + n + " numbers, one per gene");
                ok = false;
            }
        }
        int[][] sign = new int[n][n];
        for (int i = 0; ok && i < n; i++) {
            for (int j = 0; j < n; j++) {
                double s = interaction[i][j];
                if (s != -1 && s != 0 && s != 1) {
                    values.fail(net, "circuit.network", "interaction", "entries must be -1, 0 or 1; row " + (i + 1)
                            + " has " + s);
                    ok = false;
                }
                sign[i][j] = (int) s;
            }
        }
        double[] basal = perGene(net, "basal", n, 0.05);
        double[] maxRate = perGene(net, "max_rate", n, 1);
        double[] degradation = perGene(net, "degradation", n, 1);
        if (!ok || basal == null || maxRate == null || degradation == null) {
            return null;
        }
        HillNetwork.Combination combination = HillNetwork.Combination.valueOf(
                values.text(net, "circuit.network", "combine").toUpperCase(Locale.ROOT));
        try {
            return new HillNetwork(genes, sign, combination, basal, maxRate, degradation, threshold, hill);
        } catch (IllegalArgumentException e) {
            values.problem(toml.getTable("circuit"), "network", "circuit.network", null, e.getMessage());
            return null;
        }
    }

    private double[] perGene(TomlTable net, String key, int n, double fill) {
        double[] fallback = new double[n];
        Arrays.fill(fallback, fill);
        double[] v = TomlValues.numbers(net, key, fallback);
        if (v.length != n) {
            values.fail(net, "circuit.network", key, "must give " + n + " numbers, one per gene");
            return null;
        }
        return v;
    }

    private ReactionNetwork custom(TomlTable table) {
        if (!table.contains("species")) {
            values.problem("circuit.species", "a custom circuit needs circuit.species, the list of its species names");
            return null;
        }
        List<String> species = TomlValues.names(table, "species", List.of());
        TomlTable parameters = toml.getTableOrEmpty("circuit.parameters");
        List<String> names = new ArrayList<>(parameters.keySet());
        double[] defaults = names.stream().mapToDouble(k -> ScenarioChecker.asNumber(parameters.get(k))).toArray();
        TomlArray reactions = toml.getArrayOrEmpty("circuit.reaction");
        if (reactions.isEmpty()) {
            values.problem("circuit.reaction", "a custom circuit needs at least one [[circuit.reaction]]");
            return null;
        }
        List<CustomNetwork.ReactionDefinition> definitions = new ArrayList<>();
        boolean ok = true;
        for (int r = 0; r < reactions.size(); r++) {
            TomlTable reaction = reactions.getTable(r);
            String path = "circuit.reaction[" + (r + 1) + "]";
            int[] change = new int[species.size()];
            TomlTable changes = reaction.getTable("change");
            for (String s : changes.keySet()) {
                double v = ScenarioChecker.asNumber(changes.get(s));
                int index = species.indexOf(s);
                if (index < 0) {
                    values.problem(reaction, "change", path + ".change." + s, ScenarioChecker.render(v),
                            "is not a species; species are " + String.join(", ", species));
                    ok = false;
                } else if (v != Math.rint(v)) {
                    values.problem(reaction, "change", path + ".change." + s, ScenarioChecker.render(v),
                            "must be a whole number of molecules");
                    ok = false;
                } else {
                    change[index] = (int) v;
                }
            }
            String rate = reaction.getString("rate");
            try {
                ExpressionParser.parse(rate, species, names);
            } catch (ExpressionException e) {
                values.problem(reaction, "rate", path + ".rate", ScenarioChecker.render(rate),
                        "rate law of reaction '" + reaction.getString("name") + "': " + e.getMessage());
                ok = false;
            }
            definitions.add(new CustomNetwork.ReactionDefinition(reaction.getString("name"), change, rate));
        }
        if (!ok) {
            return null;
        }
        try {
            return CustomNetwork.of(species, names, defaults, definitions);
        } catch (IllegalArgumentException e) {
            values.problem(table, "species", "circuit", null, e.getMessage());
            return null;
        }
    }
}
