package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.inference.AbcSettings;
import org.fatefield.circuits.inference.Prior;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.scenarios.format.Problem;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.Suggestions;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.scenarios.format.TextLimits;
import org.fatefield.scenarios.sweep.BaseScenarioText;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * A calibration file: which scenario (or competing scenarios) to fit, to which data, over which
 * values with which priors, and the ABC-SMC settings. Keys (documented in {@code fatefield
 * calibrate --help} and the README):
 * <pre>
 * [calibration]
 * scenario = "embryo.toml"       # next to this file, or a built-in; or one [[model]] per hypothesis
 * data = "embryo-data.toml"      # the observations
 * particles = 100                # accepted particles per generation
 * batch = 100                    # candidates simulated per round (default: particles)
 * generations = 6                # most generations, the prior's included
 * quantile = 0.5                 # next tolerance: this quantile of the accepted distances
 * min_acceptance = 0.05          # stop below this acceptance rate
 * tolerance = 0.0                # stop at or below this tolerance
 * replicates = 1                 # tissues per particle (2 or more for positional errors)
 * predictive = 40                # posterior predictive tissues
 * seed = 1
 *
 * [[parameter]]
 * key = "morphogen.source[1].rate"
 * prior = "log-uniform"          # uniform | log-uniform (low, high) | normal (mean, sd)
 * low = 0.5
 * high = 10.0
 * </pre>
 *
 * @param label    the file as named
 * @param text     the file's text
 * @param models   the hypotheses (one without model choice)
 * @param data     the observations
 * @param settings the ABC-SMC settings
 * @param replicates tissues simulated per particle
 * @param predictive tissues of the posterior predictive check, per model
 */
public record CalibrationDefinition(String label, String text, List<CalibrationModel> models, ObservedData data,
        AbcSettings settings, int replicates, int predictive) {

    private static final List<String> KEYS = List.of("scenario", "data", "particles", "batch", "generations",
            "quantile", "min_acceptance", "tolerance", "replicates", "predictive", "seed");
    private static final List<String> PARAMETER_KEYS = List.of("key", "prior", "low", "high", "mean", "sd");

    /** Copies. */
    public CalibrationDefinition {
        models = List.copyOf(models);
    }

    /** Reads and checks a calibration file and its data file, reporting every problem at once. */
    public static CalibrationDefinition read(Path file) throws ScenarioException {
        String label = file.toString();
        List<Problem> problems = new ArrayList<>();
        String text;
        try {
            text = new String(TextLimits.read(file, TextLimits.MAX_TOML_BYTES, "a calibration file is a short text"),
                    StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new ScenarioException(List.of(new Problem(label, 0, 0, "", null, "cannot read: " + e.getMessage())));
        }
        TomlParseResult toml = TextLimits.parseToml(label, text, problems);
        if (toml == null) {
            throw new ScenarioException(problems);
        }
        for (String key : toml.keySet()) {
            if (!List.of("calibration", "parameter", "model").contains(key)) {
                problems.add(BaseScenarioText.at(label, toml, key, key, "unknown section"
                        + Suggestions.didYouMean(key, List.of("calibration", "parameter", "model"))
                        + "; a calibration file has [calibration], [[parameter]] and [[model]]"));
            }
        }
        TomlTable c = toml.getTableOrEmpty("calibration");
        for (String key : c.keySet()) {
            if (!KEYS.contains(key)) {
                problems.add(BaseScenarioText.at(label, c, key, "calibration." + key, "unknown key"
                        + Suggestions.didYouMean(key, KEYS) + "; keys are " + String.join(", ", KEYS)));
            }
        }
        Numbers n = new Numbers(label, c, problems);
        int particles = (int) n.whole("particles", 100, 2, 100_000);
        int batch = (int) n.whole("batch", particles, 1, 100_000);
        int generations = (int) n.whole("generations", 6, 1, 100);
        double quantile = n.real("quantile", 0.5, 0.01, 0.99);
        double minAcceptance = n.real("min_acceptance", 0.05, 1e-4, 1);
        double tolerance = n.real("tolerance", 0, 0, 1e300);
        int replicates = (int) n.whole("replicates", 1, 1, 100);
        int predictive = (int) n.whole("predictive", 40, 0, 10_000);
        long seed = n.whole("seed", 1, 0, RandomStreams.MAX_SEED);

        List<CalibrationModel> models = new ArrayList<>();
        TomlArray modelTables = toml.getArrayOrEmpty("model");
        if (modelTables.isEmpty()) {
            CalibrationModel m = model(label, file, c, toml.getArrayOrEmpty("parameter"), "calibration", "parameter",
                    null, problems);
            if (m != null) {
                models.add(m);
            }
        } else {
            if (c.contains("scenario") || toml.contains("parameter")) {
                problems.add(new Problem(label, 0, 0, "model", null, "give either calibration.scenario with"
                        + " [[parameter]], or one [[model]] per hypothesis (each with scenario and [[model.parameter]]),"
                        + " not both"));
            }
            for (int i = 0; i < modelTables.size(); i++) {
                TomlTable t = modelTables.getTable(i);
                String path = "model[" + (i + 1) + "]";
                for (String key : t.keySet()) {
                    if (!List.of("name", "scenario", "parameter").contains(key)) {
                        problems.add(BaseScenarioText.at(label, t, key, path + "." + key, "unknown key; keys are"
                                + " name, scenario and [[model.parameter]]"));
                    }
                }
                String name = t.isString("name") ? t.getString("name") : "model " + (i + 1);
                CalibrationModel m = model(label, file, t, t.getArrayOrEmpty("parameter"), path, path + ".parameter",
                        name, problems);
                if (m != null) {
                    models.add(m);
                }
            }
        }
        ObservedData data = null;
        if (!c.isString("data")) {
            problems.add(new Problem(label, 0, 0, "calibration.data", null, "required: the data file (observations),"
                    + " next to this file"));
        } else {
            Path folder = file.toAbsolutePath().getParent().normalize();
            Path dataFile = folder.resolve(c.getString("data")).normalize();
            if (Path.of(c.getString("data")).isAbsolute() || !dataFile.startsWith(folder)) {
                problems.add(BaseScenarioText.at(label, c, "data", "calibration.data", "must name a file in this file's"
                        + " folder or below it"));
            } else if (!Files.isRegularFile(dataFile)) {
                problems.add(BaseScenarioText.at(label, c, "data", "calibration.data", "no such file: " + dataFile));
            } else {
                data = ObservedData.read(dataFile, problems);
            }
        }
        if (data != null) {
            for (CalibrationModel m : models) {
                data.check(m.base().tissue().fates().fateNames(), replicates, problems);
            }
        }
        if (!problems.isEmpty()) {
            throw new ScenarioException(problems);
        }
        AbcSettings settings = new AbcSettings(particles, batch, quantile, minAcceptance, generations, tolerance, seed);
        return new CalibrationDefinition(label, text, models, data, settings, replicates, predictive);
    }

    private static CalibrationModel model(String label, Path file, TomlTable table, TomlArray parameters,
            String path, String parameterPath, String name, List<Problem> problems) {
        String scenarioText = BaseScenarioText.read(label, file, "calibration", table, "scenario", path + ".scenario", problems);
        if (parameters.isEmpty()) {
            problems.add(new Problem(label, 0, 0, parameterPath, null, "at least one [[" + parameterPath
                    + "]] to calibrate is needed"));
        }
        List<CalibrationParameter> list = new ArrayList<>();
        List<TomlTable> tables = new ArrayList<>();
        List<String> paths = new ArrayList<>();
        for (int i = 0; i < parameters.size(); i++) {
            TomlTable p = parameters.getTable(i);
            String at = parameterPath + "[" + (i + 1) + "]";
            try {
                list.add(parameter(p));
                tables.add(p);
                paths.add(at);
            } catch (IllegalArgumentException e) {
                problems.add(BaseScenarioText.at(label, p, p.contains("key") ? "key" : "prior", at, e.getMessage()));
            }
        }
        if (scenarioText == null) {
            return null;
        }
        String scenarioLabel = table.getString("scenario");
        Path base = file.toAbsolutePath().getParent().resolve(scenarioLabel).normalize();
        Path folder = Files.isRegularFile(base) ? base.getParent() : null;
        byte[] bytes = scenarioText.getBytes(StandardCharsets.UTF_8);
        Scenario scenario;
        try {
            scenario = ScenarioReader.parse(scenarioLabel, "base", bytes, folder);
        } catch (ScenarioException e) {
            for (Problem p : e.problems()) {
                problems.add(new Problem(label, 0, 0, path, null, "the scenario " + scenarioLabel + ": " + p.format()));
            }
            return null;
        }
        // Every value the priors reach most easily must make a valid scenario.
        for (int i = 0; i < list.size(); i++) {
            CalibrationParameter p = list.get(i);
            TomlTable where = tables.get(i);
            String at = paths.get(i);
            for (double v : probes(p.prior())) {
                try {
                    Scenario variant = ScenarioReader.parse("variant of " + scenarioLabel, "variant", bytes, folder,
                            Overrides.none().with(p.key(), v));
                    WorkEstimate work = WorkEstimate.of(variant.tissue());
                    if (!work.impossible().isEmpty()) {
                        problems.add(BaseScenarioText.at(label, where, "key", at, "at " + p.key() + " = " + v
                                + " the scenario asks for " + work.summary() + ": "
                                + String.join("; ", work.impossible())));
                    }
                } catch (ScenarioException e) {
                    for (Problem q : e.problems()) {
                        problems.add(BaseScenarioText.at(label, where, "key", at, "in " + scenarioLabel + " at "
                                + p.key() + " = " + v + " (a value the prior reaches): " + q.message()));
                    }
                    break;
                } catch (IllegalArgumentException e) {
                    problems.add(BaseScenarioText.at(label, where, "key", at, e.getMessage()));
                    break;
                }
            }
        }
        String modelName = name != null ? name : scenario.name();
        return new CalibrationModel(modelName, scenarioLabel, scenario, folder, list);
    }

    /** Values each prior is checked at: its ends, or its mean and two standard deviations each side. */
    private static double[] probes(Prior prior) {
        if (prior instanceof Prior.Uniform u) {
            return new double[] {u.low(), u.high()};
        }
        if (prior instanceof Prior.LogUniform l) {
            return new double[] {l.low(), l.high()};
        }
        Prior.Normal g = (Prior.Normal) prior;
        return new double[] {g.mean() - 2 * g.sd(), g.mean(), g.mean() + 2 * g.sd()};
    }

    private static CalibrationParameter parameter(TomlTable p) {
        for (String k : p.keySet()) {
            if (!PARAMETER_KEYS.contains(k)) {
                throw new IllegalArgumentException("unknown key " + k + Suggestions.didYouMean(k, PARAMETER_KEYS)
                        + "; keys are " + String.join(", ", PARAMETER_KEYS));
            }
        }
        if (!p.isString("key")) {
            throw new IllegalArgumentException("needs key = \"<scenario key path>\" (text)");
        }
        String kind = p.isString("prior") ? p.getString("prior") : "";
        Double low = number(p, "low");
        Double high = number(p, "high");
        Double mean = number(p, "mean");
        Double sd = number(p, "sd");
        Prior prior = switch (kind) {
            case "uniform" -> {
                require(low != null && high != null && mean == null && sd == null, "a uniform prior takes low and high");
                yield new Prior.Uniform(low, high);
            }
            case "log-uniform" -> {
                require(low != null && high != null && mean == null && sd == null,
                        "a log-uniform prior takes low and high");
                yield new Prior.LogUniform(low, high);
            }
            case "normal" -> {
                require(mean != null && sd != null && low == null && high == null, "a normal prior takes mean and sd");
                yield new Prior.Normal(mean, sd);
            }
            default -> throw new IllegalArgumentException("prior must be \"uniform\", \"log-uniform\" or \"normal\""
                    + (kind.isEmpty() ? "" : ", got \"" + kind + "\"" + Suggestions.didYouMean(kind,
                            List.of("uniform", "log-uniform", "normal"))));
        };
        return new CalibrationParameter(p.getString("key"), prior);
    }

    private static void require(boolean ok, String message) {
        if (!ok) {
            throw new IllegalArgumentException(message);
        }
    }

    private static Double number(TomlTable t, String key) {
        Object o = t.get(key);
        if (o == null) {
            return null;
        }
        if (o instanceof Long l) {
            return l.doubleValue();
        }
        if (o instanceof Double d) {
            return d;
        }
        throw new IllegalArgumentException(key + " must be a number, got " + o);
    }

    /** Numbers of the [calibration] table, each checked against its range. */
    private record Numbers(String label, TomlTable table, List<Problem> problems) {
        long whole(String key, long fallback, long min, long max) {
            if (!table.contains(key)) {
                return fallback;
            }
            if (table.isLong(key) && table.getLong(key) >= min && table.getLong(key) <= max) {
                return table.getLong(key);
            }
            problems.add(BaseScenarioText.at(label, table, key, "calibration." + key, "must be a whole number from "
                    + min + " to " + max));
            return fallback;
        }

        double real(String key, double fallback, double min, double max) {
            if (!table.contains(key)) {
                return fallback;
            }
            Object o = table.get(key);
            double v = o instanceof Long l ? l : o instanceof Double d ? d : Double.NaN;
            if (v >= min && v <= max) {
                return v;
            }
            problems.add(BaseScenarioText.at(label, table, key, "calibration." + key, "must be a number from " + min
                    + " to " + max));
            return fallback;
        }
    }
}
