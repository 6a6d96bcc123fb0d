package org.fatefield.scenarios.report;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.MetricRows;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunFolderReader;
import org.fatefield.scenarios.output.RunLayout;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.ReplicateProfileChart;

/**
 * The report of a replicate set (the folder {@code fatefield replicates} writes): for each fate,
 * its profile in every replicate tissue with the boundary's positional error; the positional
 * error table; one row per replicate linking to that tissue's own report (written beside it);
 * the scenario and provenance. Offline, images embedded.
 */
public final class ReplicateReport {

    private ReplicateReport() {
    }

    /** True if {@code folder} holds a replicate set. */
    public static boolean isReplicateSet(Path folder) {
        return Files.exists(folder.resolve(RunLayout.REPLICATES_SUMMARY))
                && Files.exists(folder.resolve(RunLayout.REPLICATES_TABLE));
    }

    /** The report of the replicate set {@code set}; also writes each replicate's own report. */
    public static String html(Path set) throws IOException {
        JsonObject summary = JsonFiles.read(set.resolve(RunLayout.REPLICATES_SUMMARY));
        List<CSVRecord> records = RunTables.records(set.resolve(RunLayout.REPLICATES_TABLE));
        Map<String, Map<String, String>> rows = bySeed(records);
        if (rows.isEmpty()) {
            throw new IOException(set.resolve(RunLayout.REPLICATES_TABLE) + " lists no runs: has the replicate set"
                    + " started?");
        }
        List<RunFolderReader> runs = new ArrayList<>();
        List<RunReport.Figure> circuit = null;
        for (String seed : rows.keySet()) {
            Path run = set.resolve(RunLayout.replicateFolder(Long.parseLong(seed)));
            RunFolderReader reader = RunFolderReader.of(run);
            if (circuit == null) {
                circuit = RunReport.circuitFigures(reader.scenarioText(), run);
            }
            String html = RunReport.html(run, circuit);
            RunFolder.open(run).writeText(RunLayout.REPORT, w -> w.write(html));
            runs.add(reader);
        }
        JsonObject first = runs.get(0).provenance();
        JsonObject metrics = runs.get(0).metrics();
        List<String> fates = new ArrayList<>(metrics.getAsJsonObject("boundaries").keySet());
        HtmlPage page = new HtmlPage("Fatefield replicate report: "
                + first.getAsJsonObject("scenario").get("name").getAsString() + " (" + rows.size() + " tissues)");
        page.paragraph("Research software output: for exploring models, not for clinical or diagnostic decisions.");
        page.paragraph("Each tissue ran the same scenario on its own seed; the spread of a boundary across tissues"
                + " is its positional error.");
        page.heading("Figures");
        double[] predictions = RunFolderReader.predictedBoundaries(metrics);
        double predicted = predictions.length > 0 ? predictions[0] : Double.NaN;
        List<RunFolderReader.Profile> profiles = new ArrayList<>();
        for (RunFolderReader run : runs) {
            profiles.add(run.profile(fates));
        }
        List<Map<String, String>> tissues = new ArrayList<>(rows.values());
        for (int f = 0; f < fates.size(); f++) {
            String fate = fates.get(f);
            double[][] fractions = new double[runs.size()][];
            double[] boundaries = new double[runs.size()];
            for (int r = 0; r < runs.size(); r++) {
                fractions[r] = profiles.get(r).fractions()[f];
                boundaries[r] = RunTables.parseNumber(tissues.get(r).getOrDefault(MetricRows.join("boundary_um", fate),
                        ""));
            }
            ByteArrayOutputStream png = new ByteArrayOutputStream();
            ChartFiles.png(ReplicateProfileChart.create(fate, profiles.get(0).x(), fractions, boundaries, predicted),
                    900, 520, png);
            page.image(fate + " along the gradient in every tissue, with the boundary's mean ± SD",
                    png.toByteArray(), "png");
        }
        page.heading("Positional error");
        List<List<String>> error = new ArrayList<>();
        for (String fate : fates) {
            JsonObject f = summary.getAsJsonObject(fate);
            error.add(List.of(fate, f.get("runs_with_boundary").getAsString(), number(f.get("mean_boundary_um")),
                    number(f.get("positional_error_sd_um")), number(f.get("mean_predicted_fate_call_um")),
                    number(f.get("predicted_positional_error_um"))));
        }
        JsonObject committed = summary.getAsJsonObject("committed_boundary");
        if (committed != null) {
            error.add(List.of("any committed fate against " + fates.get(fates.size() - 1),
                    committed.get("runs_with_boundary").getAsString(), number(committed.get("mean_boundary_um")),
                    number(committed.get("positional_error_sd_um")), number(committed.get("mean_predicted_fate_call_um")),
                    number(committed.get("predicted_positional_error_um"))));
            page.paragraph("Committed fates against the default, predicted from single cells (mean over tissues): "
                    + number(committed.get("mean_predicted_from_single_cells_um")) + " µm.");
        }
        page.table(List.of("fate", "tissues with a boundary", "mean boundary (µm)", "SD across tissues (µm)",
                "predicted fate-call boundary (µm)", "positional error predicted from the gradient (µm)"), error);
        page.paragraph("The predicted positional error is σ_x = σ_c / |dc/dx| at the fate-call boundary (Gregor et al."
                + " 2007), from the morphogen's tissue-to-tissue amplitude_cv; it is not defined (–) without amplitude"
                + " variability. Expression noise adds to the simulated SD.");
        page.heading("Tissues");
        List<String> header = new ArrayList<>(List.of("seed"));
        tissues.forEach(t -> t.keySet().stream().filter(k -> !header.contains(k)).forEach(header::add));
        List<List<String>> table = new ArrayList<>();
        for (Map.Entry<String, Map<String, String>> tissue : rows.entrySet()) {
            List<String> cells = new ArrayList<>(List.of(tissue.getKey()));
            // An undefined value (empty in the table) shows as a dash, as in the tables above.
            header.stream().skip(1).forEach(h -> cells.add(tissue.getValue().getOrDefault(h, "").isEmpty() ? "–"
                    : tissue.getValue().get(h)));
            table.add(cells);
        }
        page.table(header, table);
        for (RunFolderReader run : runs) {
            String name = run.path().getFileName().toString();
            page.link("report of " + name, name + "/" + RunLayout.REPORT);
        }
        page.heading("Scenario");
        page.preformatted(runs.get(0).scenarioText());
        page.heading("Provenance");
        JsonObject scenario = first.getAsJsonObject("scenario");
        page.table(List.of("what", "value"), List.of(List.of("tissues", String.valueOf(rows.size())),
                List.of("first seed", summary.get("first_seed").getAsString()),
                List.of("program version", first.get("tool_version").getAsString()),
                List.of("Java version", first.get("java_version").getAsString()),
                List.of("scenario SHA-256", scenario.get("sha256").getAsString())));
        return page.finish();
    }

    private static String number(JsonElement e) {
        return e == null || e.isJsonNull() ? "–" : String.format(Locale.ROOT, "%.1f", e.getAsDouble());
    }

    /** The long {@code replicates.csv} as seed to compound metric name to value, in file order. */
    private static Map<String, Map<String, String>> bySeed(List<CSVRecord> records) {
        Map<String, Map<String, String>> out = new LinkedHashMap<>();
        for (CSVRecord r : records) {
            out.computeIfAbsent(r.get("seed"), k -> new LinkedHashMap<>())
                    .put(MetricRows.join(r.get("metric"), r.get("fate")), r.get("value"));
        }
        return out;
    }
}
