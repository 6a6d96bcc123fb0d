package org.fatefield.scenarios.sweep;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.format.Problem;
import org.fatefield.scenarios.format.ScenarioException;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlInvalidTypeException;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * A sweep file: the base scenario, the values to vary, the design, replicates per point and the
 * master seed. Keys (all documented in {@code fatefield sweep --help}):
 * <pre>
 * [sweep]
 * scenario = "base.toml"          # file next to the sweep file, or a built-in name
 * design = "grid"                 # grid | latin-hypercube | sobol
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
 */
public record SweepDefinition(String scenarioText, String scenarioLabel, String design, int points, int replicates,
        long seed, List<SweepParameter> parameters) {

    /** Reads and checks a sweep file, reporting every problem at once. */
    public static SweepDefinition read(Path file) throws ScenarioException {
        String label = file.toString();
        List<Problem> problems = new ArrayList<>();
        TomlParseResult toml;
        try {
            toml = Toml.parse(file);
        } catch (IOException e) {
            throw new ScenarioException(List.of(new Problem(label, 0, 0, "", null, "cannot read: " + e.getMessage())));
        }
        if (toml.hasErrors()) {
            toml.errors().forEach(e -> problems.add(new Problem(label, e.position().line(), e.position().column(), "",
                    null, "not valid TOML: " + e.getMessage())));
            throw new ScenarioException(problems);
        }
        for (String key : toml.keySet()) {
            if (!key.equals("sweep") && !key.equals("parameter")) {
                problems.add(at(label, toml, key, key, "unknown section; a sweep file has [sweep] and [[parameter]]"));
            }
        }
        TomlTable sweep = toml.getTableOrEmpty("sweep");
        for (String key : sweep.keySet()) {
            if (!List.of("scenario", "design", "points", "replicates", "seed").contains(key)) {
                problems.add(at(label, sweep, key, "sweep." + key, "unknown key; keys are scenario, design, points,"
                        + " replicates, seed"));
            }
        }
        String scenario = sweep.getString("scenario");
        String text = null;
        if (scenario == null) {
            problems.add(new Problem(label, 0, 0, "sweep.scenario", null, "required: the base scenario file or built-in"));
        } else {
            Path base = file.toAbsolutePath().getParent().resolve(scenario);
            try {
                Optional<byte[]> builtin = BuiltinScenarios.bytes(scenario);
                text = Files.exists(base) ? Files.readString(base, StandardCharsets.UTF_8)
                        : builtin.map(b -> new String(b, StandardCharsets.UTF_8)).orElse(null);
            } catch (IOException e) {
                text = null;
            }
            if (text == null) {
                problems.add(at(label, sweep, "scenario", "sweep.scenario", "no such file next to the sweep file and no"
                        + " built-in of that name"));
            }
        }
        String design = sweep.getString("design") != null ? sweep.getString("design") : "grid";
        if (!List.of("grid", "latin-hypercube", "sobol").contains(design)) {
            problems.add(at(label, sweep, "design", "sweep.design", "must be one of \"grid\", \"latin-hypercube\","
                    + " \"sobol\""));
        }
        long points = sweep.getLong("points", () -> 8L);
        long replicates = sweep.getLong("replicates", () -> 1L);
        if (points < 1 || points > 100_000) {
            problems.add(at(label, sweep, "points", "sweep.points", "must be a whole number from 1 to 100000"));
        }
        if (replicates < 1 || replicates > 10_000) {
            problems.add(at(label, sweep, "replicates", "sweep.replicates", "must be a whole number from 1 to 10000"));
        }
        List<SweepParameter> parameters = new ArrayList<>();
        TomlArray array = toml.getArrayOrEmpty("parameter");
        if (array.isEmpty()) {
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
        if (!problems.isEmpty()) {
            throw new ScenarioException(problems);
        }
        return new SweepDefinition(text, scenario, design, (int) points, (int) replicates,
                sweep.getLong("seed", () -> 1L), parameters);
    }

    private static SweepParameter parameter(TomlTable p) {
        String key = p.getString("key");
        if (key == null) {
            throw new IllegalArgumentException("needs key = \"<scenario key path>\"");
        }
        for (String k : p.keySet()) {
            if (!List.of("key", "values", "low", "high", "steps", "scale").contains(k)) {
                throw new IllegalArgumentException("unknown key " + k + "; keys are key, values, low, high, steps, scale");
            }
        }
        if (p.contains("values")) {
            TomlArray values = p.getArray("values");
            double[] v = new double[values.size()];
            for (int i = 0; i < v.length; i++) {
                Object o = values.get(i);
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
        return new SweepParameter(key, new double[0], ((Number) low).doubleValue(), ((Number) high).doubleValue(),
                (int) p.getLong("steps", () -> 5L), scale.equals("log"));
    }

    private static Problem at(String label, TomlTable table, String key, String path, String message) {
        TomlPosition position = table.inputPositionOf(List.of(key));
        return new Problem(label, position == null ? 0 : position.line(), position == null ? 0 : position.column(),
                path, null, message);
    }

    /** The sweep's points as parameter values, one array per point. */
    public List<double[]> pointValues() {
        List<double[]> out = new ArrayList<>();
        if (design.equals("grid")) {
            return Designs.grid(parameters);
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
