package org.fatefield.scenarios.format;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * First pass over a scenario file: TOML syntax, known sections and keys, value types and
 * ranges, required keys. It collects every problem instead of stopping at the first, and never
 * evaluates anything from the file: values are only read as data.
 */
final class ScenarioChecker {

    /** What a checked file may hold. */
    enum Scope {
        /** A whole scenario. */
        SCENARIO,
        /** A circuit file included by a scenario: only {@code [circuit]} and its sub-sections. */
        CIRCUIT_FILE
    }

    private final String file;
    private final Scope scope;
    private final List<Problem> problems = new ArrayList<>();
    private TomlTable toml;
    private boolean circuitIncluded;

    ScenarioChecker(String file) {
        this(file, Scope.SCENARIO);
    }

    ScenarioChecker(String file, Scope scope) {
        this.file = file;
        this.scope = scope;
    }

    /** Parses and checks {@code text}; returns the parse result (null after a syntax error). */
    TomlTable check(String text) {
        TomlParseResult parsed = parse(text);
        return parsed == null ? null : check(parsed);
    }

    /** Parses {@code text} as TOML; null (with the syntax errors as problems) if it is not TOML. */
    TomlParseResult parse(String text) {
        int[] deep = TextLimits.tooDeep(text);
        if (deep != null) {
            problems.add(new Problem(file, deep[0], deep[1], keyOnLine(text, deep[0]), null, "arrays or inline tables"
                    + " nest more than " + TextLimits.MAX_NESTING + " deep here; no scenario value needs more than 3"));
            return null;
        }
        TomlParseResult parsed = Toml.parse(text);
        if (parsed.hasErrors()) {
            for (TomlParseError error : parsed.errors()) {
                TomlPosition at = error.position();
                int line = at == null ? 0 : at.line();
                problems.add(new Problem(file, line, at == null ? 0 : at.column(), keyOnLine(text, line), null,
                        "not valid TOML: " + stripPosition(error.getMessage())));
            }
            return null;
        }
        return parsed;
    }

    /** Checks a parsed tree (a file's, or one with overrides laid over it) against the schema; returns it. */
    TomlTable check(TomlTable tree) {
        toml = tree;
        Set<String> roots = ScenarioSchema.sections().stream().filter(this::inScope)
                .map(s -> s.path().split("\\.")[0]).collect(Collectors.toCollection(LinkedHashSet::new));
        circuitIncluded = scope == Scope.SCENARIO && toml.contains("circuit.file");
        if (scope == Scope.CIRCUIT_FILE && toml.contains("circuit.file")) {
            problems.add(at(toml.getTable("circuit"), "file", "circuit.file", null,
                    "a circuit file cannot include another one"));
        }
        for (String key : toml.keySet()) {
            if (!roots.contains(key)) {
                problems.add(at(toml, key, key, null, "unknown section" + suggestion(key, roots)
                        + "; sections are " + String.join(", ", roots)));
            }
        }
        for (Section section : ScenarioSchema.sections()) {
            if (!inScope(section)) {
                continue;
            }
            if (circuitIncluded && section.path().startsWith("circuit")) {
                checkIncludeOnly(section);
            } else {
                checkSection(section);
            }
        }
        return toml;
    }

    private boolean inScope(Section section) {
        return scope == Scope.SCENARIO || section.path().startsWith("circuit");
    }

    /** With {@code circuit.file}, the scenario's own [circuit] holds nothing else. */
    private void checkIncludeOnly(Section section) {
        if (!section.path().equals("circuit")) {
            if (toml.get(section.path()) != null) {
                problems.add(at(toml, section.path(), section.path(), null,
                        "belongs in the circuit file named by circuit.file, not in the scenario"));
            }
            return;
        }
        TomlTable circuit = toml.getTable("circuit");
        boolean sbml = circuit.isString("file") && CircuitDocument.isSbml(circuit.getString("file"));
        for (String key : circuit.keySet()) {
            if (key.equals("file")) {
                checkValue(section.key("file").orElseThrow(), circuit, key, "circuit.file");
            } else if (sbml && CircuitDocument.SBML_SETTINGS.contains(key)) {
                checkValue(section.key(key).orElseThrow(), circuit, key, "circuit." + key);
            } else if (!circuit.isTable(key) && !circuit.isArray(key)) {
                problems.add(at(circuit, key, "circuit." + key, render(circuit.get(key)),
                        "belongs in the circuit file named by circuit.file, not in the scenario"));
            }
        }
    }

    /** True if the scenario takes its circuit from another file. */
    boolean circuitIncluded() {
        return circuitIncluded;
    }

    List<Problem> problems() {
        return problems;
    }

    private void checkSection(Section section) {
        Object value = toml.get(section.path());
        if (value == null) {
            if (section.required()) {
                problems.add(new Problem(file, 0, 0, section.path(), null, "missing section " + section.header()
                        + " (" + section.description() + ")"));
            }
            return;
        }
        if (section.repeated()) {
            if (!(value instanceof TomlArray array) || !all(array, TomlTable.class)) {
                problems.add(at(toml, section.path(), section.path(), render(value),
                        "must be written as " + section.header() + " tables"));
                return;
            }
            for (int i = 0; i < array.size(); i++) {
                TomlPosition header = array.inputPositionOf(i);
                checkTable(section, array.getTable(i), section.path() + "[" + (i + 1) + "]", header);
            }
        } else if (value instanceof TomlTable table) {
            checkTable(section, table, section.path(), toml.inputPositionOf(section.path()));
        } else {
            problems.add(at(toml, section.path(), section.path(), render(value),
                    "must be a table written as " + section.header()));
        }
    }

    private void checkTable(Section section, TomlTable table, String path, TomlPosition header) {
        for (String key : table.keySet()) {
            if (section.open()) {
                Double v = asNumber(table.get(key));
                if (v == null || !Double.isFinite(v)) {
                    problems.add(at(table, key, path + "." + key, render(table.get(key)), "must be a number"));
                } else if (!key.matches("[A-Za-z_][A-Za-z0-9_]*")) {
                    problems.add(at(table, key, path + "." + key, null,
                            "is not a usable name: letters, digits and _, starting with a letter or _"));
                }
            } else if (section.key(key).isPresent()) {
                checkValue(section.key(key).get(), table, key, path + "." + key);
            } else if (!isSubSection(section.path() + "." + key) && !isGeneKinetics(section, table, key)) {
                List<String> names = section.keys().stream().map(Key::name).toList();
                problems.add(at(table, key, path + "." + key, render(table.get(key)), "unknown key in "
                        + section.header() + suggestion(key, names) + "; keys here are " + String.join(", ", names)));
            }
        }
        for (Key key : section.keys()) {
            if (key.required() && !table.contains(key.name())) {
                problems.add(new Problem(file, header == null ? 0 : header.line(), 0, path + "." + key.name(), null,
                        "required key is missing: " + key.description() + " (" + key.allowed()
                                + unitText(key) + ")"));
            }
        }
    }

    private boolean isGeneKinetics(Section section, TomlTable table, String key) {
        if (!section.path().equals("circuit.kinetics") || !table.isTable(key)) {
            return false;
        }
        Section gene = new Section("circuit.kinetics." + key, false, false, ScenarioSchema.KINETICS, "");
        checkTable(gene, table.getTable(key), "circuit.kinetics." + key, table.inputPositionOf(key));
        return true;
    }

    private static boolean isSubSection(String path) {
        return ScenarioSchema.section(path).isPresent();
    }

    private void checkValue(Key key, TomlTable table, String name, String path) {
        Object value = table.get(name);
        String problem = switch (key.type()) {
            case NUMBER -> asNumber(value) == null || !key.inRange(asNumber(value)) ? key.allowed() : null;
            case INTEGER -> !(value instanceof Long l) || !key.inRange(l) ? key.allowed() : null;
            case CHOICE -> !(value instanceof String s) || !key.choices().contains(s) ? key.allowed() : null;
            case TEXT -> value instanceof String s && !s.isBlank() ? null : "non-blank text in quotes";
            case BOOLEAN -> value instanceof Boolean ? null : "true or false (no quotes)";
            case NAMES -> value instanceof TomlArray a && all(a, String.class) ? null
                    : "a list of names in quotes, like [\"A\", \"B\"]";
            case NUMBERS -> isNumberList(value) ? null : "a list of numbers, like [0.1, 0.2]";
            case SPECIES_NUMBERS -> isSpeciesNumbers(value) ? null
                    : "an inline table of gene = number, like { A = 0.8 }";
            case MATRIX -> isMatrix(value) ? null : "a list of rows of numbers, like [[0, -1], [-1, 0]]";
        };
        if (problem != null) {
            problems.add(at(table, name, path, render(value), "must be " + problem + unitText(key)));
        }
    }

    private static String unitText(Key key) {
        return key.unit().isEmpty() ? "" : ", in " + key.unit();
    }

    private static boolean all(TomlArray array, Class<?> type) {
        for (int i = 0; i < array.size(); i++) {
            if (!type.isInstance(array.get(i))) {
                return false;
            }
        }
        return true;
    }

    static Double asNumber(Object value) {
        if (value instanceof Long l) {
            return l.doubleValue();
        }
        if (value instanceof Double d) {
            return d;
        }
        return null;
    }

    private static boolean isNumberList(Object value) {
        if (!(value instanceof TomlArray array)) {
            return false;
        }
        for (int i = 0; i < array.size(); i++) {
            Double v = asNumber(array.get(i));
            if (v == null || !Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }

    private static boolean isMatrix(Object value) {
        if (!(value instanceof TomlArray rows) || rows.isEmpty()) {
            return false;
        }
        for (int i = 0; i < rows.size(); i++) {
            if (!isNumberList(rows.get(i))) {
                return false;
            }
        }
        return true;
    }

    private static boolean isSpeciesNumbers(Object value) {
        if (!(value instanceof TomlTable table)) {
            return false;
        }
        for (Map.Entry<String, Object> entry : table.entrySet()) {
            Double v = asNumber(entry.getValue());
            if (v == null || !Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }

    /** A problem located at {@code key} of {@code table}. */
    Problem at(TomlTable table, String key, String path, String value, String message) {
        TomlPosition position = table.inputPositionOf(List.of(key));
        return new Problem(file, position == null ? 0 : position.line(), position == null ? 0 : position.column(),
                path, value, message);
    }

    /** The value as it would be written in TOML, on one line. */
    static String render(Object value) {
        if (value instanceof String s) {
            return "\"" + s + "\"";
        }
        if (value instanceof TomlArray array) {
            List<String> items = new ArrayList<>();
            for (int i = 0; i < array.size(); i++) {
                items.add(render(array.get(i)));
            }
            return "[" + String.join(", ", items) + "]";
        }
        if (value instanceof TomlTable table) {
            return "{ " + table.entrySet().stream().map(e -> e.getKey() + " = " + render(e.getValue()))
                    .collect(Collectors.joining(", ")) + " }";
        }
        return String.valueOf(value);
    }

    /**
     * The dotted key written on 1-based {@code line}, qualified by the table header above it, or
     * "" if the line holds no key: lets a syntax error name the key it broke.
     */
    static String keyOnLine(String text, int line) {
        String[] lines = text.split("\\R", -1);
        if (line < 1 || line > lines.length) {
            return "";
        }
        Matcher key = Pattern.compile("^\\s*([A-Za-z0-9_.\\-]+)\\s*=")
                .matcher(lines[line - 1]);
        String table = "";
        Pattern header = Pattern.compile("^\\s*\\[{1,2}\\s*([A-Za-z0-9_.\\-]+)\\s*]{1,2}");
        for (int i = line - 1; i >= 0; i--) {
            Matcher h = header.matcher(lines[i]);
            if (h.find()) {
                table = h.group(1);
                break;
            }
        }
        if (key.find()) {
            return table.isEmpty() ? key.group(1) : table + "." + key.group(1);
        }
        return table;
    }

    private static String stripPosition(String message) {
        return message.replaceFirst("\\s*\\(line \\d+, column \\d+\\)\\s*$", "");
    }

    /** ", did you mean 'x'?" when a known name is within two edits, else "". */
    static String suggestion(String word, Iterable<String> known) {
        return Suggestions.didYouMean(word, known);
    }
}
