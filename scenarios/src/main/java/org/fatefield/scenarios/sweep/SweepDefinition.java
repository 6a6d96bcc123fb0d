package org.fatefield.scenarios.sweep;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.format.Problem;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.TextLimits;
import org.tomlj.TomlArray;
import org.tomlj.TomlInvalidTypeException;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * A sweep file: the base scenario, the values to vary, the design, replicates per point and the
 * master seed. Keys (all documented in {@code fatefield sweep --help}):
 * <pre>
 * [sweep]
 * scenario = "base.toml"          # file next to the sweep file, or a built-in name
 * design = "grid"                 # grid | latin-hypercube | sobol | table
 * table = "design.csv"            # design = "table": header = keys, one row per point
 * points = 16                     # points of a latin-hypercube or sobol design
 * replicates = 3                  # tissues per point, each with its own seed
 * seed = 1                        # master seed
 *
 * [[parameter]]
 * key = "morphogen.source[1].rate"
 * values = [1.0, 2.0, 4.0]        # or: low = 1.0, high = 4.0, steps = 4, scale = "log"
 * </pre>
 *
 * @param scenarioText   the base scenario's text
 * @param scenarioLabel  where it came from
 * @param design         grid, latin-hypercube or sobol
 * @param points         points of a sampled design
 * @param replicates     tissues per point
 * @param seed           master seed
 * @param parameters     varied values
 * @param table          the points of a table design (empty for the others)
 */
public record SweepDefinition(String scenarioText, String scenarioLabel, String design, int points, int replicates,
        long seed, List<SweepParameter> parameters, List<double[]> table) {

    /** Most points a design may have, and steps a parameter may take. */
    private static final long MAX_POINTS = 100_000;
    /** Most runs (points times replicates) one sweep may plan. */
    private static final long MAX_RUNS = 1_000_000;

    /** Reads and checks a sweep file, reporting every problem at once. */
    public static SweepDefinition read(Path file) throws ScenarioException {
        String label = file.toString();
        List<Problem> problems = new ArrayList<>();
        String fileText;
        try {
            fileText = new String(TextLimits.read(file, TextLimits.MAX_TOML_BYTES, "a sweep file is a short text"),
                    StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new ScenarioException(List.of(new Problem(label, 0, 0, "", null, "cannot read: " + e.getMessage())));
        }
        TomlParseResult toml = TextLimits.parseToml(label, fileText, problems);
        if (toml == null) {
            throw new ScenarioException(problems);
        }
        for (String key : toml.keySet()) {
            if (!key.equals("sweep") && !key.equals("parameter")) {
                problems.add(at(label, toml, key, key, "unknown section; a sweep file has [sweep] and [[parameter]]"));
            }
        }
        TomlTable sweep = toml.getTableOrEmpty("sweep");
        for (String key : sweep.keySet()) {
            if (!List.of("scenario", "design", "points", "replicates", "seed", "table").contains(key)) {
                problems.add(at(label, sweep, key, "sweep." + key, "unknown key; keys are scenario, design, table, points,"
                        + " replicates, seed"));
            }
        }
        String scenario = sweep.isString("scenario") ? sweep.getString("scenario") : null;
        String text = BaseScenarioText.read(label, file, "sweep", sweep, "scenario", "sweep.scenario", problems);
        String design = sweep.isString("design") ? sweep.getString("design") : sweep.contains("design") ? "" : "grid";
        if (!List.of("grid", "latin-hypercube", "sobol", "table").contains(design)) {
            problems.add(at(label, sweep, "design", "sweep.design", "must be one of \"grid\", \"latin-hypercube\","
                    + " \"sobol\", \"table\""));
        }
        long points = wholeNumber(label, sweep, "points", 8, 1, MAX_POINTS, problems);
        long replicates = wholeNumber(label, sweep, "replicates", 1, 1, 10_000, problems);
        long seed = wholeNumber(label, sweep, "seed", 1, 0, RandomStreams.MAX_SEED, problems);
        List<SweepParameter> parameters = new ArrayList<>();
        TomlArray array = toml.getArrayOrEmpty("parameter");
        DesignTable table = null;
        if (design.equals("table")) {
            table = DesignTable.read(label, file, sweep, MAX_POINTS, problems);
            if (!array.isEmpty()) {
                problems.add(new Problem(label, 0, 0, "parameter", null, "a table design takes its keys from the"
                        + " table's header; remove the [[parameter]] sections"));
            }
            if (table != null) {
                parameters.addAll(table.parameters());
                points = table.rows().size();
            }
        } else if (array.isEmpty()) {
            problems.add(new Problem(label, 0, 0, "parameter", null, "at least one [[parameter]] to vary is needed"));
        }
        for (int i = 0; i < array.size(); i++) {
            TomlTable p = array.getTable(i);
            String path = "parameter[" + (i + 1) + "]";
            try {
                parameters.add(parameter(p));
            } catch (IllegalArgumentException | ClassCastException | TomlInvalidTypeException e) {
                problems.add(at(label, p, p.contains("key") ? "key" : p.keySet().iterator().next(), path,
                        e.getMessage()));
            }
        }
        if (problems.isEmpty()) {
            double designPoints = design.equals("grid") ? gridSize(parameters) : points;
            if (designPoints * replicates > MAX_RUNS) {
                problems.add(new Problem(label, 0, 0, "sweep", null, String.format(Locale.ROOT,
                        "the design has %.3g runs (%.3g points x %d replicates); at most %d runs fit one sweep:"
                                + " use fewer steps or values, or split the sweep", designPoints * replicates,
                        designPoints, replicates, MAX_RUNS)));
            }
        }
        if (!problems.isEmpty()) {
            throw new ScenarioException(problems);
        }
        return new SweepDefinition(text, scenario, design, (int) points, (int) replicates, seed, parameters,
                table == null ? List.of() : table.rows());
    }

    /** Points of a full grid over {@code parameters}: the product of their value counts. */
    private static double gridSize(List<SweepParameter> parameters) {
        double size = 1;
        for (SweepParameter p : parameters) {
            size *= p.values().length > 0 ? p.values().length : p.steps();
        }
        return size;
    }

    /** A whole number from {@code min} to {@code max} at {@code key}, or a problem saying so. */
    private static long wholeNumber(String label, TomlTable table, String key, long fallback, long min, long max,
            List<Problem> problems) {
        if (!table.contains(key)) {
            return fallback;
        }
        if (table.isLong(key) && table.getLong(key) >= min && table.getLong(key) <= max) {
            return table.getLong(key);
        }
        problems.add(at(label, table, key, "sweep." + key, "must be a whole number from " + min + " to " + max));
        return fallback;
    }

    private static SweepParameter parameter(TomlTable p) {
        if (!p.isString("key")) {
            throw new IllegalArgumentException("needs key = \"<scenario key path>\" (text)");
        }
        String key = p.getString("key");
        for (String k : p.keySet()) {
            if (!List.of("key", "values", "low", "high", "steps", "scale").contains(k)) {
                throw new IllegalArgumentException("unknown key " + k + "; keys are key, values, low, high, steps, scale");
            }
        }
        if (p.contains("values")) {
            if (!p.isArray("values")) {
                throw new IllegalArgumentException("values must be a list of numbers, like [0.1, 0.2]");
            }
            TomlArray values = p.getArray("values");
            if (values.size() > MAX_POINTS) {
                throw new IllegalArgumentException("values holds " + values.size() + " numbers; at most " + MAX_POINTS);
            }
            double[] v = new double[values.size()];
            for (int i = 0; i < v.length; i++) {
                Object o = values.get(i);
                if (!(o instanceof Long) && !(o instanceof Double)) {
                    throw new IllegalArgumentException("values must be numbers; item " + (i + 1) + " is " + o);
                }
                v[i] = o instanceof Long l ? l : (Double) o;
            }
            if (v.length == 0) {
                throw new IllegalArgumentException("values must not be empty");
            }
            return new SweepParameter(key, v, 0, 0, 0, false);
        }
        Object low = p.get("low");
        Object high = p.get("high");
        if (low == null || high == null) {
            throw new IllegalArgumentException("give values = [...] or low and high");
        }
        String scale = p.getString("scale") != null ? p.getString("scale") : "linear";
        if (!scale.equals("linear") && !scale.equals("log")) {
            throw new IllegalArgumentException("scale must be \"linear\" or \"log\", got \"" + scale + "\"");
        }
        if (!(low instanceof Number) || !(high instanceof Number)) {
            throw new IllegalArgumentException("low and high must be numbers");
        }
        if (p.contains("steps") && !(p.isLong("steps") && p.getLong("steps") >= 1 && p.getLong("steps") <= MAX_POINTS)) {
            throw new IllegalArgumentException("steps must be a whole number from 1 to " + MAX_POINTS);
        }
        return new SweepParameter(key, new double[0], ((Number) low).doubleValue(), ((Number) high).doubleValue(),
                (int) p.getLong("steps", () -> 5L), scale.equals("log"));
    }

    private static Problem at(String label, TomlTable table, String key, String path, String message) {
        return BaseScenarioText.at(label, table, key, path, message);
    }

    /** The sweep's points as parameter values, one array per point. */
    public List<double[]> pointValues() {
        List<double[]> out = new ArrayList<>();
        if (design.equals("grid")) {
            return Designs.grid(parameters);
        }
        if (design.equals("table")) {
            table.forEach(row -> out.add(row.clone()));
            return out;
        }
        List<double[]> unit = design.equals("sobol") ? Designs.sobol(points, parameters.size())
                : Designs.latinHypercube(points, parameters.size(),
                        RandomStreams.of(seed).stream(-7));
        for (double[] u : unit) {
            double[] v = new double[u.length];
            for (int j = 0; j < u.length; j++) {
                v[j] = parameters.get(j).at(u[j]);
            }
            out.add(v);
        }
        return out;
    }
}
