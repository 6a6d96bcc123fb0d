package org.fatefield.scenarios.sweep;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.scenarios.format.Problem;
import org.fatefield.scenarios.format.TextLimits;
import org.fatefield.scenarios.output.RunTables;
import org.tomlj.TomlTable;

/**
 * A sweep's own design matrix (design = "table"): a CSV next to the sweep file whose header
 * names the scenario keys to vary and whose every row is one point, such as points chosen by
 * another tool, or a posterior sample.
 *
 * @param keys the varied scenario keys, from the header
 * @param rows one array of values per point, in file order
 */
record DesignTable(List<String> keys, List<double[]> rows) {

    /** Copies. */
    DesignTable {
        keys = List.copyOf(keys);
        rows = List.copyOf(rows);
    }

    /** The table named at {@code sweep.table}, or null after adding problems. */
    static DesignTable read(String label, Path sweepFile, TomlTable sweep, long maxRows, List<Problem> problems) {
        if (!sweep.isString("table")) {
            problems.add(new Problem(label, 0, 0, "sweep.table", null, "design = \"table\" needs table = \"<file>.csv\":"
                    + " a CSV next to the sweep file, its header the scenario keys, one row per point"));
            return null;
        }
        String name = sweep.getString("table");
        Path folder = sweepFile.toAbsolutePath().getParent().normalize();
        Path file = folder.resolve(name).normalize();
        if (Path.of(name).isAbsolute() || !file.startsWith(folder)) {
            problems.add(BaseScenarioText.at(label, sweep, "table", "sweep.table", "must name a file in the sweep's"
                    + " folder or below it"));
            return null;
        }
        String text;
        try {
            text = new String(TextLimits.read(file, TextLimits.MAX_TABLE_BYTES, "a design table is a CSV of numbers"),
                    StandardCharsets.UTF_8);
        } catch (IOException e) {
            problems.add(BaseScenarioText.at(label, sweep, "table", "sweep.table", "cannot be read: "
                    + TextLimits.describe(e)));
            return null;
        }
        int before = problems.size();
        List<double[]> rows = new ArrayList<>();
        List<String> keys;
        try (CSVParser parser = RunTables.parser(new StringReader(text))) {
            keys = parser.getHeaderNames();
            if (keys.isEmpty() || keys.stream().anyMatch(k -> k.isBlank())) {
                problems.add(new Problem(name, 1, 0, "", null, "the header must name the scenario keys to vary, such as"
                        + " morphogen.decay,coupling[1].gain"));
                return null;
            }
            for (CSVRecord r : parser) {
                if (rows.size() >= maxRows) {
                    problems.add(new Problem(name, (int) r.getRecordNumber() + 1, 0, "", null, "more than " + maxRows
                            + " points; split the design"));
                    break;
                }
                double[] row = new double[keys.size()];
                for (int k = 0; k < keys.size(); k++) {
                    String cell = r.size() > k ? r.get(k).trim() : "";
                    try {
                        row[k] = Double.parseDouble(cell);
                    } catch (NumberFormatException e) {
                        row[k] = Double.NaN;
                    }
                    if (!Double.isFinite(row[k])) {
                        problems.add(new Problem(name, (int) r.getRecordNumber() + 1, k + 1, keys.get(k), cell,
                                "must be a finite number"));
                    }
                }
                rows.add(row);
            }
        } catch (IOException | IllegalStateException | IllegalArgumentException e) {
            problems.add(new Problem(name, 0, 0, "", null, "not a readable CSV table: " + e.getMessage()));
            return null;
        }
        if (rows.isEmpty() && problems.size() == before) {
            problems.add(new Problem(name, 0, 0, "", null, "the table has no rows: give one row per point"));
        }
        return problems.size() == before ? new DesignTable(keys, rows) : null;
    }

    /** One listed parameter per column (its values, for the sweep's plots and summaries). */
    List<SweepParameter> parameters() {
        List<SweepParameter> out = new ArrayList<>();
        for (int k = 0; k < keys.size(); k++) {
            double[] column = new double[rows.size()];
            for (int r = 0; r < rows.size(); r++) {
                column[r] = rows.get(r)[k];
            }
            out.add(new SweepParameter(keys.get(k), column, 0, 0, 0, false));
        }
        return out;
    }
}
