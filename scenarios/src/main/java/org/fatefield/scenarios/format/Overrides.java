package org.fatefield.scenarios.format;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Values that replace or add to those of a scenario file, by key path: a sweep's point, a
 * robustness perturbation, the live window's settings. They are laid over the parsed TOML tree
 * ({@link OverlayTable}) and then checked and compiled exactly like the file's own values, so
 * an override can never make the text invalid and a bad value is reported like a bad line.
 *
 * <p>Key paths are dotted, with 1-based indices for arrays of tables, as in validation messages:
 * {@code morphogen.source[1].rate}, {@code circuit.kinetics.repression}, {@code coupling[2].gain}.
 * Values are numbers, booleans or text.
 */
public final class Overrides {

    private static final Pattern PART = Pattern.compile("([A-Za-z0-9_-]+)(?:\\[(\\d+)])?");
    private static final Overrides NONE = new Overrides(new LinkedHashMap<>());

    /** Key path to value, in the order given (a later value for the same path wins). */
    private final Map<String, Object> values;

    private Overrides(Map<String, Object> values) {
        this.values = values;
    }

    /** No overrides. */
    public static Overrides none() {
        return NONE;
    }

    /**
     * These overrides and {@code path} set to {@code value} (an Integer or Long, a Double, a Boolean
     * or a String).
     *
     * @throws IllegalArgumentException if the path is not a key path or the value not one of those
     */
    public Overrides with(String path, Object value) {
        parts(path);
        if (value instanceof Integer whole) {
            value = whole.longValue();
        }
        if (!(value instanceof Long || value instanceof Double || value instanceof Boolean || value instanceof String)) {
            throw new IllegalArgumentException("an override of " + path + " must be a number, true/false or text,"
                    + " got " + value);
        }
        Map<String, Object> copy = new LinkedHashMap<>(values);
        copy.remove(path);
        copy.put(path, value);
        return new Overrides(copy);
    }

    /**
     * A value as written after {@code key =} in a setting: a whole number, a number, true or
     * false, or text (in double quotes, or bare).
     */
    public static Object parseValue(String text) {
        String t = text.trim();
        if (t.equals("true") || t.equals("false")) {
            return Boolean.parseBoolean(t);
        }
        if (t.length() >= 2 && t.startsWith("\"") && t.endsWith("\"")) {
            return t.substring(1, t.length() - 1);
        }
        try {
            return Long.parseLong(t);
        } catch (NumberFormatException notWhole) {
            try {
                return Double.parseDouble(t);
            } catch (NumberFormatException notNumber) {
                return t;
            }
        }
    }

    /** These overrides followed by {@code later} (whose values win where both set a path). */
    public Overrides and(Overrides later) {
        Map<String, Object> copy = new LinkedHashMap<>(values);
        later.values.forEach((path, value) -> {
            copy.remove(path);
            copy.put(path, value);
        });
        return new Overrides(copy);
    }

    /** Only the overrides whose path {@code test} accepts. */
    public Overrides matching(Predicate<String> test) {
        Map<String, Object> kept = new LinkedHashMap<>();
        values.forEach((path, value) -> {
            if (test.test(path)) {
                kept.put(path, value);
            }
        });
        return new Overrides(kept);
    }

    /** True if there are none. */
    public boolean isEmpty() {
        return values.isEmpty();
    }

    /** Each override as {@code path = value}, in order (for provenance). */
    public List<String> describe() {
        List<String> out = new ArrayList<>();
        values.forEach((path, value) -> out.add(path + " = " + render(value)));
        return out;
    }

    /**
     * The tree {@code base} with these overrides laid over it; paths whose array index the file
     * does not have are added to {@code missing} as messages.
     */
    TomlTable applyTo(TomlTable base, List<String> missing) {
        Node root = new Node();
        values.forEach((path, value) -> {
            Node node = root;
            TomlTable table = base;
            List<String[]> parts = parts(path);
            for (int k = 0; k < parts.size(); k++) {
                String name = parts.get(k)[0];
                String index = parts.get(k)[1];
                boolean last = k == parts.size() - 1;
                if (index != null) {
                    int i = Integer.parseInt(index) - 1;
                    TomlArray array = table == null ? null : table.getArray(name);
                    if (array == null || i < 0 || i >= array.size() || !(array.get(i) instanceof TomlTable)) {
                        missing.add("override " + path + ": the scenario has no " + parts.get(k)[2]);
                        return;
                    }
                    if (last) {
                        missing.add("override " + path + " must end in a value, not a table");
                        return;
                    }
                    node = node.items.computeIfAbsent(name, n -> new LinkedHashMap<>()).computeIfAbsent(i,
                            n -> new Node());
                    table = array.getTable(i);
                } else if (last) {
                    Object existing = table == null ? null : table.get(List.of(name));
                    node.leaves.put(name, value instanceof Double d && existing instanceof Long && d == Math.rint(d)
                            && Math.abs(d) < 1e15 ? (Object) d.longValue() : value);
                } else {
                    node = node.tables.computeIfAbsent(name, n -> new Node());
                    Object next = table == null ? null : table.get(List.of(name));
                    if (next != null && !(next instanceof TomlTable)) {
                        missing.add("override " + path + ": " + name + " is a value, not a table");
                        return;
                    }
                    table = (TomlTable) next;
                }
            }
        });
        return new OverlayTable(base, root);
    }

    /** The override tree below one table: values, sub-tables, and elements of arrays of tables. */
    static final class Node {
        final Map<String, Object> leaves = new LinkedHashMap<>();
        final Map<String, Node> tables = new LinkedHashMap<>();
        final Map<String, Map<Integer, Node>> items = new LinkedHashMap<>();
    }

    /** The parts of a key path: name, 1-based index (or null) and the part as written. */
    private static List<String[]> parts(String path) {
        List<String[]> out = new ArrayList<>();
        for (String part : path.split("\\.", -1)) {
            Matcher m = PART.matcher(part);
            if (!m.matches()) {
                throw new IllegalArgumentException("'" + path + "' is not a scenario key path; write it as in"
                        + " validation messages, e.g. morphogen.source[1].rate or circuit.kinetics.repression");
            }
            out.add(new String[] {m.group(1), m.group(2), part});
        }
        return out;
    }

    private static String render(Object value) {
        if (value instanceof String s) {
            return "\"" + s + "\"";
        }
        return value instanceof Double d ? String.format(Locale.ROOT, "%s", d) : String.valueOf(value);
    }
}
