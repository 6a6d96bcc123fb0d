package org.fatefield.scenarios.sweep;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * Writes a variant of a scenario with some values replaced, as TOML text that then goes through
 * full validation like any scenario file. Keys are dotted paths with 1-based indices for arrays of
 * tables, as in validation messages: {@code morphogen.source[1].rate},
 * {@code circuit.kinetics.repression}, {@code coupling[2].gain}.
 */
public final class ScenarioOverrides {

    private final Map<String, Object> tree;

    private ScenarioOverrides(Map<String, Object> tree) {
        this.tree = tree;
    }

    /**
     * Reads scenario text.
     *
     * @throws IllegalArgumentException if it is not valid TOML
     */
    public static ScenarioOverrides of(String text) {
        TomlParseResult toml = Toml.parse(text);
        if (toml.hasErrors()) {
            throw new IllegalArgumentException("the base scenario is not valid TOML: " + toml.errors().get(0));
        }
        return new ScenarioOverrides(copy(toml));
    }

    private static Map<String, Object> copy(TomlTable table) {
        Map<String, Object> out = new LinkedHashMap<>();
        for (String key : table.keySet()) {
            out.put(key, copyValue(table.get(List.of(key))));
        }
        return out;
    }

    private static Object copyValue(Object value) {
        if (value instanceof TomlTable t) {
            return copy(t);
        }
        if (value instanceof TomlArray a) {
            List<Object> list = new ArrayList<>();
            for (int i = 0; i < a.size(); i++) {
                list.add(copyValue(a.get(i)));
            }
            return list;
        }
        return value;
    }

    /**
     * The scenario text with {@code path} set to {@code value} (a number).
     *
     * @throws IllegalArgumentException if the path does not lead to an existing table
     */
    public ScenarioOverrides with(String path, double value) {
        Map<String, Object> copy = deepCopy(tree);
        List<String> parts = List.of(path.split("\\."));
        Map<String, Object> table = copy;
        for (int k = 0; k < parts.size() - 1; k++) {
            table = step(table, parts.get(k), path);
        }
        String last = parts.get(parts.size() - 1);
        if (last.contains("[")) {
            throw new IllegalArgumentException("key " + path + " must end in a value, not a table");
        }
        table.put(last, value == Math.rint(value) && Math.abs(value) < 1e15 && isInteger(table.get(last))
                ? (Object) (long) value : (Object) value);
        return new ScenarioOverrides(copy);
    }

    private static boolean isInteger(Object existing) {
        return existing instanceof Long;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> step(Map<String, Object> table, String part, String path) {
        String name = part;
        int index = -1;
        int open = part.indexOf('[');
        if (open >= 0) {
            name = part.substring(0, open);
            index = Integer.parseInt(part.substring(open + 1, part.length() - 1)) - 1;
        }
        Object next = table.get(name);
        if (index >= 0) {
            if (!(next instanceof List<?> list) || index >= list.size() || !(list.get(index) instanceof Map)) {
                throw new IllegalArgumentException("key " + path + ": the scenario has no " + part);
            }
            return (Map<String, Object>) list.get(index);
        }
        if (next == null) {
            Map<String, Object> created = new LinkedHashMap<>();
            table.put(name, created);
            return created;
        }
        if (!(next instanceof Map)) {
            throw new IllegalArgumentException("key " + path + ": " + name + " is a value, not a table");
        }
        return (Map<String, Object>) next;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> deepCopy(Map<String, Object> map) {
        Map<String, Object> out = new LinkedHashMap<>();
        map.forEach((k, v) -> out.put(k, v instanceof Map ? deepCopy((Map<String, Object>) v)
                : v instanceof List<?> l ? deepCopyList(l) : v));
        return out;
    }

    @SuppressWarnings("unchecked")
    private static List<Object> deepCopyList(List<?> list) {
        List<Object> out = new ArrayList<>();
        for (Object v : list) {
            out.add(v instanceof Map ? deepCopy((Map<String, Object>) v) : v instanceof List<?> l ? deepCopyList(l) : v);
        }
        return out;
    }

    /** The scenario as TOML text. */
    public String toToml() {
        StringBuilder out = new StringBuilder();
        writeTable(out, "", tree);
        return out.toString();
    }

    @SuppressWarnings("unchecked")
    private static void writeTable(StringBuilder out, String prefix, Map<String, Object> table) {
        for (Map.Entry<String, Object> e : table.entrySet()) {
            if (!isSection(e.getValue())) {
                out.append(key(e.getKey())).append(" = ").append(inline(e.getValue())).append('\n');
            }
        }
        for (Map.Entry<String, Object> e : table.entrySet()) {
            String name = prefix.isEmpty() ? key(e.getKey()) : prefix + "." + key(e.getKey());
            if (e.getValue() instanceof Map && isSection(e.getValue())) {
                out.append("\n[").append(name).append("]\n");
                writeTable(out, name, (Map<String, Object>) e.getValue());
            } else if (isTableArray(e.getValue())) {
                for (Object item : (List<?>) e.getValue()) {
                    out.append("\n[[").append(name).append("]]\n");
                    writeTable(out, name, (Map<String, Object>) item);
                }
            }
        }
    }

    @SuppressWarnings("unchecked")
    private static boolean isSection(Object value) {
        if (value instanceof Map<?, ?> map) {
            // Small tables of plain values stay inline (like above = { Lum = 0.6 }).
            return !map.values().stream().allMatch(v -> !(v instanceof Map) && !(v instanceof List))
                    || ((Map<String, Object>) value).isEmpty() || map.size() > 3;
        }
        return isTableArray(value);
    }

    private static boolean isTableArray(Object value) {
        return value instanceof List<?> list && !list.isEmpty() && list.stream().allMatch(v -> v instanceof Map);
    }

    private static String inline(Object value) {
        if (value instanceof String s) {
            return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
        }
        if (value instanceof Double d) {
            return d.isNaN() || d.isInfinite() ? (d.isNaN() ? "nan" : d > 0 ? "inf" : "-inf")
                    : String.format(Locale.ROOT, "%s", d);
        }
        if (value instanceof List<?> list) {
            List<String> items = new ArrayList<>();
            list.forEach(v -> items.add(inline(v)));
            return "[" + String.join(", ", items) + "]";
        }
        if (value instanceof Map<?, ?> map) {
            List<String> items = new ArrayList<>();
            map.forEach((k, v) -> items.add(key((String) k) + " = " + inline(v)));
            return "{ " + String.join(", ", items) + " }";
        }
        return String.valueOf(value);
    }

    private static String key(String name) {
        return name.matches("[A-Za-z0-9_-]+") ? name : "\"" + name.replace("\"", "\\\"") + "\"";
    }
}
