package org.fatefield.scenarios.format;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.fatefield.engine.field.PiecewiseLinear;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Typed reads from checked TOML tables with the schema's defaults, and problem reporting at the
 * key's line: shared by the scenario and circuit compilers.
 */
final class TomlValues {

    private final String file;
    private final ScenarioChecker locator;
    private final List<Problem> problems;

    TomlValues(String file, ScenarioChecker locator, List<Problem> problems) {
        this.file = file;
        this.locator = locator;
        this.problems = problems;
    }

    List<Problem> problems() {
        return problems;
    }

    /**
     * The number at {@code key}, or the default when it is absent or invalid (an invalid value
     * was already reported by the checker; the default keeps later checks from cascading).
     */
    double number(TomlTable table, String section, String key) {
        Key spec = schemaKey(section, key);
        Double value = ScenarioChecker.asNumber(table.get(key));
        if (value != null && spec.inRange(value)) {
            return value;
        }
        return spec.required() ? 1.0 : Double.parseDouble(spec.defaultValue());
    }

    /** The word at {@code key}, or the default when absent or not allowed. */
    String text(TomlTable table, String section, String key) {
        Key spec = schemaKey(section, key);
        Object value = table.get(key);
        if (value instanceof String s && (spec.choices().isEmpty() || spec.choices().contains(s))) {
            return s;
        }
        return spec.required() ? spec.choices().get(0) : spec.defaultValue().replace("\"", "");
    }

    static List<String> names(TomlTable table, String key, List<String> fallback) {
        TomlArray array = table.getArray(key);
        if (array == null) {
            return fallback;
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            out.add(array.getString(i));
        }
        return out;
    }

    static double[] numbers(TomlTable table, String key, double[] fallback) {
        TomlArray array = table.getArray(key);
        if (array == null) {
            return fallback;
        }
        double[] out = new double[array.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = ScenarioChecker.asNumber(array.get(i));
        }
        return out;
    }

    /** A square matrix of side {@code n} at {@code key}, or {@code fill} everywhere if absent; null if misshapen. */
    static double[][] matrix(TomlTable table, String key, int n, double fill) {
        TomlArray rows = table.getArray(key);
        double[][] out = new double[n][n];
        if (rows == null) {
            for (double[] row : out) {
                Arrays.fill(row, fill);
            }
            return out;
        }
        if (rows.size() != n) {
            return null;
        }
        for (int i = 0; i < n; i++) {
            TomlArray row = rows.getArray(i);
            if (row.size() != n) {
                return null;
            }
            for (int j = 0; j < n; j++) {
                out[i][j] = ScenarioChecker.asNumber(row.get(j));
            }
        }
        return out;
    }

    static Key schemaKey(String section, String key) {
        return ScenarioSchema.section(section).flatMap(s -> s.key(key))
                .orElseThrow(() -> new IllegalStateException("undocumented key " + section + "." + key));
    }

    /** Reports a problem at {@code key} of {@code table}. */
    void problem(TomlTable table, String key, String path, String value, String message) {
        problems.add(locator.at(table, key, path, value, message));
    }

    /** Reports a problem with the whole file (an absence). */
    void problem(String path, String message) {
        problems.add(new Problem(file, 0, 0, path, null, message));
    }

    /** Reports that {@code section.key} is wrong, at its line, or as its default if absent. */
    void fail(TomlTable table, String section, String key, String message) {
        Object value = table.get(key);
        if (value == null) {
            problems.add(new Problem(file, 0, 0, section + "." + key, schemaKey(section, key).defaultValue()
                    + " (default)", message));
        } else {
            problems.add(locator.at(table, key, section + "." + key, ScenarioChecker.render(value), message));
        }
    }

    /** A table of (x, y) rows at {@code key}, or null after reporting what was wrong. */
    PiecewiseLinear pairs(TomlTable table, String key, String path, String expected) {
        TomlArray rows = table.getArray(key);
        double[] xs = new double[rows.size()];
        double[] ys = new double[rows.size()];
        for (int k = 0; k < rows.size(); k++) {
            TomlArray row = rows.getArray(k);
            if (row.size() != 2) {
                problem(table, key, path, ScenarioChecker.render(rows), "must be " + expected
                        + "; row " + (k + 1) + " has " + row.size() + " numbers");
                return null;
            }
            xs[k] = ScenarioChecker.asNumber(row.get(0));
            ys[k] = ScenarioChecker.asNumber(row.get(1));
        }
        try {
            return PiecewiseLinear.of(xs, ys);
        } catch (IllegalArgumentException e) {
            problem(table, key, path, ScenarioChecker.render(rows), "must be " + expected + ": " + e.getMessage());
            return null;
        }
    }

}
