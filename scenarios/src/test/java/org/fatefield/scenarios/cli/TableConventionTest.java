package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.scenarios.output.RunTables;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every CSV table every command writes follows the README's one convention (long, empty for
 * missing, units in names) and every column is in the README's column dictionary. The commands
 * run once, small, as a user runs them: run with snapshots (flat and in a box), replicates,
 * analyze with a second parameter, a sweep, robustness and a calibration.
 */
class TableConventionTest {

    private static final List<String> FATES = List.of("photocyte", "shieldcyte", "progenitor");
    private static final List<String> SPECIES = List.of("Lum", "Ark");

    @TempDir
    static Path tmp;

    private static final Map<String, Set<String>> WRITTEN = new HashMap<>();
    private static final Map<String, List<CSVRecord>> ROWS = new HashMap<>();

    @BeforeAll
    static void runEveryCommand() throws IOException {
        Path scenario = ShortDemo.write(tmp, "4.0");
        run("run", scenario.toString(), "--out", tmp.resolve("run").toString(), "--snapshots", "--quiet");
        run("run", scenario.toString(), "--set", "tissue.shape=box", "--set", "tissue.depth=40", "--out",
                tmp.resolve("run-3d").toString(), "--snapshots", "--quiet");
        run("replicates", scenario.toString(), "--runs", "2", "--out", tmp.resolve("replicates").toString(), "--quiet");
        run("analyze", "demo", "--out", tmp.resolve("analyze").toString(), "--trajectories", "4", "--grid", "30",
                "--second", "Lum.basal", "--second-range", "0:0.2", "--quiet");
        Path sweep = tmp.resolve("sweep.toml");
        Files.writeString(sweep, "[sweep]\nscenario = \"short.toml\"\ndesign = \"grid\"\nreplicates = 1\nseed = 3\n"
                + "[[parameter]]\nkey = \"morphogen.decay\"\nlow = 0.1\nhigh = 0.3\nsteps = 2\n");
        run("sweep", "plan", sweep.toString(), "--out", tmp.resolve("sweep").toString());
        run("sweep", "run", tmp.resolve("sweep").toString(), "--workers", "2", "--quiet");
        run("sweep", "collect", tmp.resolve("sweep").toString());
        run("robustness", scenario.toString(), "--only", "tissue", "--replicates", "2", "--out",
                tmp.resolve("robustness").toString(), "--quiet");
        Files.writeString(tmp.resolve("data.toml"), "[data]\n[[statistic]]\nname = \"population\"\nvalue = 200\n"
                + "sd = 20\nunit = \"cells\"\n[[statistic]]\nname = \"boundary_progenitor_um\"\nvalue = 300\nsd = 30\n"
                + "unit = \"um\"\n");
        Path calibration = tmp.resolve("calibration.toml");
        Files.writeString(calibration, "[calibration]\nscenario = \"short.toml\"\ndata = \"data.toml\"\nparticles = 6\n"
                + "batch = 6\ngenerations = 2\npredictive = 3\nseed = 5\n[[parameter]]\nkey = \"division.cycle_mean\"\n"
                + "prior = \"uniform\"\nlow = 4.0\nhigh = 12.0\n");
        run("calibrate", calibration.toString(), "--out", tmp.resolve("calibrate").toString(), "--workers", "2",
                "--quiet");
        try (Stream<Path> files = Files.walk(tmp)) {
            for (Path file : files.filter(p -> p.toString().endsWith(".csv")).toList()) {
                Path relative = tmp.relativize(file);
                if (relative.getNameCount() < 2 || relative.startsWith(Path.of("calibrate", "rounds"))
                        || relative.toString().contains("sweep/results")) {
                    continue;
                }
                String name = generic(relative.subpath(1, relative.getNameCount()).toString());
                List<CSVRecord> rows = RunTables.records(file);
                ROWS.computeIfAbsent(name, k -> new ArrayList<>()).addAll(rows);
                try (var reader = Files.newBufferedReader(file)) {
                    String header = reader.readLine();
                    for (String column : header.split(",")) {
                        WRITTEN.computeIfAbsent(name, k -> new HashSet<>()).add(generic(column));
                    }
                }
            }
        }
    }

    private static void run(String... args) {
        assertEquals(0, FatefieldCommandAccess.run(args), String.join(" ", args));
    }

    /** A file or column name with its scenario-specific parts replaced by the README's placeholders. */
    private static String generic(String name) {
        String out = name.replace('\\', '/').replaceAll("^seed-\\d+/", "").replaceAll("-\\d{8}\\.csv$", "-<step>.csv")
                .replaceAll("/g\\d{2}\\.csv$", "/g<NN>.csv").replaceAll("eigenvalue_\\d+_", "eigenvalue_<k>_");
        for (String s : SPECIES) {
            out = out.equals(s) ? "<species>" : out.replaceAll("^" + s + "_", "<species>_")
                    .replaceAll("^attractor_" + s + "$", "attractor_<species>");
        }
        out = out.replace("control_repression", "control_<parameter>");
        if (out.equals("repression")) {
            return "<parameter>";
        }
        if (out.equals("Lum.basal")) {
            return "<second>";
        }
        return out.contains(".") && !out.endsWith(".csv") ? "<key>" : out;
    }

    /** The README's dictionary: file to its columns. */
    private static Map<String, Set<String>> dictionary() throws IOException {
        String readme = Files.readString(Path.of("..", "README.md"));
        String section = readme.substring(readme.indexOf("### Column dictionary"));
        section = section.substring(0, section.indexOf("\n## "));
        Map<String, Set<String>> out = new HashMap<>();
        Pattern row = Pattern.compile("^\\| (.+?) \\| (.+?) \\| .*\\|$", Pattern.MULTILINE);
        Matcher m = row.matcher(section);
        Pattern code = Pattern.compile("`([^`]+)`");
        while (m.find()) {
            List<String> files = new ArrayList<>();
            code.matcher(m.group(1)).results().forEach(r -> files.add(r.group(1)));
            for (String file : files) {
                code.matcher(m.group(2)).results().forEach(r -> out.computeIfAbsent(file, k -> new HashSet<>())
                        .add(r.group(1)));
            }
        }
        return out;
    }

    @Test
    void everyColumnWrittenIsInTheReadmeDictionary() throws IOException {
        Map<String, Set<String>> dictionary = dictionary();
        List<String> expectedFiles = List.of("timeseries.csv", "population.csv", "cells.csv", "lineage.csv",
                "profile.csv", "relatedness.csv", "clones.csv", "snapshots/cells-<step>.csv",
                "snapshots/fields-<step>.csv", "replicates.csv", "manifest.csv", "runs.csv", "summary.csv",
                "robustness.csv", "steady-states.csv", "branches.csv", "special-points.csv", "fold-curve.csv",
                "basins.csv", "landscape.csv", "landscape-along-parameter.csv", "switching.csv", "commitment.csv",
                "posterior.csv", "populations/g<NN>.csv", "generations.csv", "predictive.csv",
                "predictive-summary.csv");
        assertTrue(WRITTEN.keySet().containsAll(expectedFiles), "the commands wrote " + WRITTEN.keySet());
        List<String> undocumented = new ArrayList<>();
        WRITTEN.forEach((file, columns) -> columns.stream()
                .filter(c -> !dictionary.getOrDefault(file, Set.of()).contains(c))
                .forEach(c -> undocumented.add(file + ": " + c)));
        assertTrue(undocumented.isEmpty(), "columns missing from the README's column dictionary: " + undocumented);
        List<String> stale = new ArrayList<>();
        dictionary.forEach((file, columns) -> columns.stream()
                .filter(c -> !WRITTEN.getOrDefault(file, Set.of()).contains(c))
                .forEach(c -> stale.add(file + ": " + c)));
        assertTrue(stale.isEmpty(), "README lists columns no command wrote: " + stale);
    }

    @Test
    void noTableCodesMissingAsNanOrMinusOneOrNamesAColumnAfterAFate() {
        ROWS.forEach((file, rows) -> {
            for (CSVRecord r : rows) {
                for (String header : r.getParser().getHeaderNames()) {
                    String v = r.get(header);
                    assertTrue(!v.equalsIgnoreCase("NaN") && !v.equals("Infinity") && !v.equals("-Infinity"),
                            file + " line " + r.getRecordNumber() + " column " + header + ": " + v);
                    if (header.endsWith("id") || header.equals("attractor")) {
                        assertTrue(!v.equals("-1"), file + " column " + header + " codes none as -1");
                    }
                }
            }
            for (String column : WRITTEN.get(file)) {
                for (String fate : FATES) {
                    assertTrue(!column.contains(fate), file + ": column " + column + " names fate " + fate
                            + " (a fate is a value of column fate)");
                }
            }
        });
    }

    @Test
    void longTablesHaveOneRowPerTimeAndFateAndAgreeWithTheirTotals() {
        // timeseries.csv (all tables of the flat run, the 3-D run and the two replicates): 3 fate
        // rows per record time, summing to population.csv's cells at that time, fractions
        // summing to 1.
        Map<String, Long> sums = new HashMap<>();
        Map<String, Double> fractions = new HashMap<>();
        for (CSVRecord r : ROWS.get("timeseries.csv")) {
            sums.merge(r.get("time_h"), Long.parseLong(r.get("cells")), Long::sum);
            fractions.merge(r.get("time_h"), Double.parseDouble(r.get("fraction")), Double::sum);
        }
        assertEquals(ROWS.get("timeseries.csv").size(), 3 * 4 * sums.size(), "3 fates x 4 runs per record time");
        fractions.forEach((t, f) -> assertEquals(4.0, f, 1e-8, "fractions over 4 runs at " + t));
        long population = ROWS.get("population.csv").stream().mapToLong(r -> Long.parseLong(r.get("cells"))).sum();
        assertEquals(population, sums.values().stream().mapToLong(Long::longValue).sum(),
                "fate counts add up to the population");
    }
}
