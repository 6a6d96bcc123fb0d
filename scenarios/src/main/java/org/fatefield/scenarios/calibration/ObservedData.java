package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.scenarios.format.Problem;
import org.fatefield.scenarios.format.Suggestions;
import org.fatefield.scenarios.format.TextLimits;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.scenarios.sweep.BaseScenarioText;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * A data file: what was measured, as summary statistics with uncertainties and, optionally, a
 * measured fate profile along the gradient (a CSV next to the file). Keys:
 * <pre>
 * [data]
 * description = "..."
 *
 * [[statistic]]
 * name = "boundary_progenitor_um"   # a statistic the runs report (fatefield calibrate --help)
 * value = 252.0
 * sd = 9.0                          # its uncertainty, which scales the distance
 * unit = "um"                       # optional; must agree with the name
 *
 * [profile]
 * file = "profile.csv"              # long: columns x_um, fate, fraction, sd
 * </pre>
 *
 * @param label        the file as named
 * @param description  what the data are
 * @param observations every statistic, profile points last
 * @param text         the file's text (copied into the calibration folder)
 * @param profileText  the profile CSV's text, or null
 * @param profileName  the profile CSV's name as written, or null
 */
public record ObservedData(String label, String description, List<Observation> observations, String text,
        String profileText, String profileName) {

    private static final List<String> PROFILE_COLUMNS = List.of("x_um", "fate", "fraction", "sd");

    /** Copies. */
    public ObservedData {
        observations = List.copyOf(observations);
    }

    /** Reads {@code file}, adding its problems to {@code problems}; null if it cannot be used. */
    static ObservedData read(Path file, List<Problem> problems) {
        String label = file.toString();
        String text;
        try {
            text = new String(TextLimits.read(file, TextLimits.MAX_TOML_BYTES, "a data file is a short text"),
                    StandardCharsets.UTF_8);
        } catch (IOException e) {
            problems.add(new Problem(label, 0, 0, "", null, "cannot read the data file: " + e.getMessage()));
            return null;
        }
        TomlParseResult toml = TextLimits.parseToml(label, text, problems);
        if (toml == null) {
            return null;
        }
        int before = problems.size();
        for (String key : toml.keySet()) {
            if (!List.of("data", "statistic", "profile").contains(key)) {
                problems.add(BaseScenarioText.at(label, toml, key, key, "unknown section"
                        + Suggestions.didYouMean(key, List.of("data", "statistic", "profile"))
                        + "; a data file has [data], [[statistic]] and [profile]"));
            }
        }
        TomlTable data = toml.getTableOrEmpty("data");
        String description = data.isString("description") ? data.getString("description") : "";
        List<Observation> observations = new ArrayList<>();
        TomlArray statistics = toml.getArrayOrEmpty("statistic");
        for (int i = 0; i < statistics.size(); i++) {
            Observation o = statistic(label, statistics.getTable(i), "statistic[" + (i + 1) + "]", problems);
            if (o != null) {
                observations.add(o);
            }
        }
        String profileText = null;
        String profileName = null;
        if (toml.isTable("profile")) {
            TomlTable profile = toml.getTable("profile");
            profileName = profile.isString("file") ? profile.getString("file") : null;
            Path folder = file.toAbsolutePath().getParent().normalize();
            if (profileName == null) {
                problems.add(new Problem(label, 0, 0, "profile.file", null, "required: the measured profile's CSV"
                        + " file, next to the data file"));
            } else if (Path.of(profileName).isAbsolute() || !folder.resolve(profileName).normalize().startsWith(folder)) {
                problems.add(BaseScenarioText.at(label, profile, "file", "profile.file", "must name a file in the data"
                        + " file's folder or below it"));
            } else {
                try {
                    profileText = new String(TextLimits.read(folder.resolve(profileName), TextLimits.MAX_TOML_BYTES,
                            "a profile is a short table"), StandardCharsets.UTF_8);
                    observations.addAll(profile(profileName, profileText, problems));
                } catch (IOException e) {
                    problems.add(BaseScenarioText.at(label, profile, "file", "profile.file", "cannot be read: "
                            + e.getMessage()));
                }
            }
        }
        if (observations.isEmpty() && problems.size() == before) {
            problems.add(new Problem(label, 0, 0, "statistic", null, "no observations: give at least one [[statistic]]"
                    + " or a [profile]"));
        }
        return problems.size() == before ? new ObservedData(label, description, observations, text, profileText,
                profileName) : null;
    }

    private static Observation statistic(String label, TomlTable t, String path, List<Problem> problems) {
        for (String key : t.keySet()) {
            if (!List.of("name", "value", "sd", "unit").contains(key)) {
                problems.add(BaseScenarioText.at(label, t, key, path + "." + key, "unknown key"
                        + Suggestions.didYouMean(key, List.of("name", "value", "sd", "unit"))
                        + "; keys are name, value, sd, unit"));
            }
        }
        if (!t.isString("name")) {
            problems.add(new Problem(label, 0, 0, path + ".name", null, "required: the statistic's name (text)"));
            return null;
        }
        Double value = number(t, "value");
        Double sd = number(t, "sd");
        if (value == null || !Double.isFinite(value)) {
            problems.add(BaseScenarioText.at(label, t, "name", path + ".value", "required: the measured value, a"
                    + " finite number"));
            return null;
        }
        if (sd == null || !(sd > 0) || !Double.isFinite(sd)) {
            problems.add(BaseScenarioText.at(label, t, "name", path + ".sd", "required: the measurement's uncertainty,"
                    + " a number above 0 (it scales the distance)"));
            return null;
        }
        String unit = t.isString("unit") ? t.getString("unit") : "";
        return Observation.summary(t.getString("name"), value, sd, unit);
    }

    private static Double number(TomlTable t, String key) {
        Object o = t.get(key);
        return o instanceof Long l ? Double.valueOf(l) : o instanceof Double d ? d : null;
    }

    /**
     * Profile points from the CSV, long like a run's {@code profile.csv}: columns {@code x_um},
     * {@code fate}, {@code fraction} and {@code sd}, one row per position and fate; a row with an
     * empty fraction is a position not measured for that fate.
     */
    private static List<Observation> profile(String name, String text, List<Problem> problems) {
        List<Observation> out = new ArrayList<>();
        try (CSVParser parser = RunTables.parser(new StringReader(text))) {
            List<String> header = parser.getHeaderNames();
            List<String> missing = PROFILE_COLUMNS.stream().filter(c -> !header.contains(c)).toList();
            if (!missing.isEmpty()) {
                problems.add(new Problem(name, 1, 0, "", null, "missing column" + (missing.size() > 1 ? "s " : " ")
                        + String.join(", ", missing) + ": the profile has one row per position and fate, with columns"
                        + " x_um (position along the gradient, µm), fate, fraction (0 to 1) and sd (its uncertainty)"));
                return out;
            }
            for (CSVRecord r : parser) {
                String fate = r.get("fate").trim();
                try {
                    String fraction = r.get("fraction").trim();
                    if (fraction.isEmpty()) {
                        continue;
                    }
                    double x = Double.parseDouble(r.get("x_um"));
                    double value = Double.parseDouble(fraction);
                    double sd = Double.parseDouble(r.get("sd"));
                    if (fate.isEmpty() || !Double.isFinite(x) || !(value >= 0 && value <= 1) || !(sd > 0)
                            || !Double.isFinite(sd)) {
                        throw new NumberFormatException("the fate must be named, x finite, the fraction from 0 to 1"
                                + " and sd above 0");
                    }
                    out.add(new Observation(String.format(Locale.ROOT, "profile_%s_at_%gum", fate, x), value, sd,
                            "1", fate, x));
                } catch (NumberFormatException e) {
                    problems.add(new Problem(name, (int) r.getRecordNumber() + 1, 0, "", null, "row "
                            + r.getRecordNumber() + (fate.isEmpty() ? "" : ", fate " + fate) + ": " + e.getMessage()));
                }
            }
            if (out.isEmpty() && problems.isEmpty()) {
                problems.add(new Problem(name, 1, 0, "", null, "no measured fraction: every row's fraction is empty"));
            }
        } catch (IOException | IllegalStateException | IllegalArgumentException e) {
            problems.add(new Problem(name, 0, 0, "", null, "not a readable CSV table: " + e.getMessage()));
        }
        return out;
    }

    /** Checks every name against the scenario's statistics and units, adding problems. */
    void check(List<String> fates, int replicates, List<Problem> problems) {
        List<String> known = StatisticNames.known(fates);
        for (Observation o : observations) {
            if (o.profilePoint()) {
                if (!fates.contains(o.fate())) {
                    problems.add(new Problem(profileName, 0, 0, "", null, "fate " + o.fate() + ": the scenario"
                            + " has no such fate" + "; its fates are " + String.join(", ", fates)));
                }
                continue;
            }
            if (!known.contains(o.name())) {
                problems.add(new Problem(label, 0, 0, "statistic", o.name(), "not a statistic the runs report"
                        + Suggestions.didYouMean(o.name(), known) + "; they are " + String.join(", ", known)));
            } else if (StatisticNames.needsReplicates(o.name()) && replicates < 2) {
                problems.add(new Problem(label, 0, 0, "statistic", o.name(), "a positional error is the spread of"
                        + " a boundary across tissues: set calibration.replicates to 2 or more"));
            } else if (!StatisticNames.unitMatches(o.unit(), StatisticNames.unit(o.name()))) {
                problems.add(new Problem(label, 0, 0, "statistic", o.name(), "unit \"" + o.unit() + "\" does not fit:"
                        + " this statistic is in " + StatisticNames.unit(o.name())));
            }
        }
    }
}
