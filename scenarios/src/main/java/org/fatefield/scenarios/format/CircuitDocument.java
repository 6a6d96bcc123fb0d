package org.fatefield.scenarios.format;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * Where a scenario's circuit is written: in the scenario itself, or in a circuit file it names
 * with {@code circuit.file}. An included file must sit in the scenario's folder (or below it), end
 * in {@code .toml} and hold only {@code [circuit]} and its sub-sections; it is read as data, like
 * the scenario.
 *
 * @param label   the file's name in messages
 * @param toml    its parse result
 * @param locator its checker, which locates keys in it
 * @param bytes   its bytes, for provenance
 */
record CircuitDocument(String label, TomlTable toml, ScenarioChecker locator, byte[] bytes) {

    /**
     * Reads and checks the circuit file named by the scenario, or returns null after adding
     * problems.
     */
    static CircuitDocument include(String scenarioLabel, TomlTable scenario, Path folder, List<Problem> problems,
            Overrides overrides) {
        String name = scenario.getString("circuit.file");
        if (folder == null) {
            problems.add(new Problem(scenarioLabel, scenario.inputPositionOf("circuit.file").line(), 0, "circuit.file",
                    "\"" + name + "\"", "a built-in scenario cannot include a circuit file"));
            return null;
        }
        Path target = folder.resolve(name).normalize();
        boolean sbml = isSbml(name);
        if (Path.of(name).isAbsolute() || !target.startsWith(folder.normalize()) || !(name.endsWith(".toml") || sbml)) {
            problems.add(new Problem(scenarioLabel, scenario.inputPositionOf("circuit.file").line(), 0, "circuit.file",
                    "\"" + name + "\"", "must name a .toml circuit file or an SBML file (.xml, .sbml) in this"
                            + " scenario's folder or below it"));
            return null;
        }
        byte[] bytes;
        try {
            bytes = TextLimits.read(target, sbml ? TextLimits.MAX_TABLE_BYTES : TextLimits.MAX_TOML_BYTES,
                    "a circuit file is a short text");
        } catch (IOException e) {
            problems.add(new Problem(scenarioLabel, scenario.inputPositionOf("circuit.file").line(), 0, "circuit.file",
                    "\"" + name + "\"", "cannot read the circuit file " + target + ": " + TextLimits.describe(e)));
            return null;
        }
        String label = target.toString();
        String text = new String(bytes, StandardCharsets.UTF_8);
        if (sbml) {
            text = SbmlCircuits.toToml(bytes, label, problems);
            if (text == null) {
                return null;
            }
        }
        ScenarioChecker checker = new ScenarioChecker(label, ScenarioChecker.Scope.CIRCUIT_FILE);
        TomlParseResult parsed = checker.parse(text);
        if (parsed == null) {
            problems.addAll(checker.problems());
            return null;
        }
        List<String> missing = new ArrayList<>();
        TomlTable toml = checker.check(overrides.applyTo(parsed, missing));
        problems.addAll(checker.problems());
        missing.forEach(m -> problems.add(new Problem(label, 0, 0, "", null, m)));
        return !missing.isEmpty() || !checker.problems().isEmpty() ? null
                : new CircuitDocument(label, toml, checker, bytes);
    }

    /** True if a circuit file name is an SBML file ({@code .xml} or {@code .sbml}). */
    static boolean isSbml(String name) {
        return name.endsWith(".xml") || name.endsWith(".sbml");
    }

    /** [circuit] keys a scenario may give beside an SBML circuit file: how to simulate it, which SBML does not say. */
    static final List<String> SBML_SETTINGS = List.of("noise", "system_size");

    /** True if an override of {@code path} belongs in an included circuit file (every circuit key but the include). */
    static boolean belongsToCircuitFile(String path) {
        return path.startsWith("circuit.") && !path.equals("circuit.file");
    }
}
