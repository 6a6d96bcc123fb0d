package org.fatefield.scenarios.report;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.DoubleFunction;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.engine.control.ControlCircuit;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.scenarios.output.RunFolderReader;
import org.fatefield.scenarios.output.RunLayout;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.viz.analysis.BifurcationDiagramChart;
import org.fatefield.viz.analysis.GridMapChart;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.ProfileChart;
import org.jfree.chart.JFreeChart;

/**
 * A self-contained HTML page about a finished run (images embedded as data URIs, no network):
 * the scenario and its parameters, the figures (fate proportions, tissue, animation, fate profile
 * with simulated and predicted boundaries, the circuit's bifurcation diagram along its control
 * parameter and its landscape), metric tables and provenance.
 */
public final class RunReport {

    /** Landscape values above this (in units of -ln P) share the top colour. */

    private RunReport() {
    }

    /** A figure for the page: caption and PNG bytes. */
    record Figure(String caption, byte[] png) {
    }

    /** The report of the run folder {@code run}. */
    public static String html(Path run) throws IOException {
        return html(run, circuitFigures(RunFolderReader.of(run).scenarioText(), run));
    }

    /**
     * The report of {@code run} with the circuit's figures already drawn (they depend only on the
     * scenario, so a replicate set draws them once for all its runs).
     */
    static String html(Path run, List<Figure> circuit) throws IOException {
        RunFolderReader folder = RunFolderReader.of(run);
        JsonObject provenance = folder.provenance();
        JsonObject metrics = folder.metrics();
        String scenarioText = folder.scenarioText();
        HtmlPage page = new HtmlPage("Fatefield report: " + provenance.getAsJsonObject("scenario").get("name").getAsString());
        page.paragraph("Research software output: for exploring models, not for clinical or diagnostic decisions.");
        page.heading("Figures");
        page.image("Fate proportions over time", folder.bytes(RunLayout.FATE_CHART), "png");
        page.image("The tissue at the end", folder.bytes(RunLayout.TISSUE_IMAGE), "png");
        if (folder.has(RunLayout.ANIMATION)) {
            page.image("The tissue over time", folder.bytes(RunLayout.ANIMATION), "gif");
        }
        List<String> fates = new ArrayList<>(metrics.getAsJsonObject("boundaries").keySet());
        page.image("Fate profile along the gradient", profile(folder, fates, metrics), "png");
        for (Figure f : circuit) {
            page.image(f.caption(), f.png(), "png");
        }
        page.heading("Pattern");
        long[] counts = folder.finalCounts(fates);
        long total = java.util.Arrays.stream(counts).sum();
        List<List<String>> tally = new ArrayList<>();
        for (int f = 0; f < fates.size(); f++) {
            tally.add(List.of(fates.get(f), Long.toString(counts[f]),
                    total > 0 ? String.format(Locale.ROOT, "%.1f%%", 100.0 * counts[f] / total) : "–"));
        }
        tally.add(List.of("all cells", Long.toString(total), total > 0 ? "100%" : "–"));
        page.paragraph("Cells at the end of the run:");
        page.table(List.of("fate", "cells", "share of cells"), tally);
        List<List<String>> rows = new ArrayList<>();
        for (String fate : fates) {
            JsonObject b = metrics.getAsJsonObject("boundaries").getAsJsonObject(fate);
            JsonElement crossings = b.get("crossings_of_one_half");
            String position = text(b.get("position_um"));
            if ("–".equals(position) && crossings != null && crossings.getAsInt() > 1) {
                position = "not defined: the fraction crosses 1/2 " + crossings.getAsInt()
                        + " times (a mixed fate; see below)";
            }
            rows.add(List.of(fate, position, text(b.get("width_10_90_um"))));
        }
        page.table(List.of("fate", "boundary (µm, fraction crosses 1/2 once)", "width 10-90% (µm)"), rows);
        page.paragraph("Committed fates against the default (best step fit): "
                + text(metrics.get("committed_boundary_um")) + " µm.");
        JsonElement zone = metrics.get("mixed_zone");
        if (zone != null && zone.isJsonObject() && zone.getAsJsonObject().get("committed_cells").getAsLong() > 0) {
            JsonObject z = zone.getAsJsonObject();
            List<List<String>> shares = new ArrayList<>();
            for (Map.Entry<String, JsonElement> e : z.getAsJsonObject("shares").entrySet()) {
                JsonObject share = e.getValue().getAsJsonObject();
                shares.add(List.of(e.getKey(), text(share.get("share")),
                        text(share.get("ci95_low")) + " to " + text(share.get("ci95_high"))));
            }
            page.paragraph("Committed fates mix from " + text(z.get("start_um")) + " to " + text(z.get("end_um"))
                    + " µm (" + z.get("committed_cells").getAsLong() + " committed cells):");
            page.table(List.of("fate", "share of committed cells", "95% interval (Wilson)"), shares);
        }
        List<List<String>> predicted = new ArrayList<>();
        for (JsonElement e : metrics.getAsJsonArray("predicted_boundaries")) {
            JsonObject p = e.getAsJsonObject();
            predicted.add(List.of(text(p.get("critical_control_value")),
                    p.has("kind") ? p.get("kind").getAsString() : "", text(p.get("position_um"))));
        }
        page.table(List.of("critical control value", "bifurcation", "predicted position (µm)"), predicted);
        List<List<String>> calls = new ArrayList<>();
        JsonElement fateCalls = metrics.get("predicted_fate_call_boundaries");
        if (fateCalls != null && fateCalls.isJsonArray()) {
            for (JsonElement e : fateCalls.getAsJsonArray()) {
                JsonObject p = e.getAsJsonObject();
                calls.add(List.of(p.get("fate").getAsString(), text(p.get("control_value")), text(p.get("position_um")),
                        text(p.get("predicted_positional_error_um"))));
            }
        }
        if (!calls.isEmpty()) {
            page.paragraph("Where a stable steady state first satisfies each fate's rule (the fate-call boundary;"
                    + " it can lie inside the bistable range when a rule asks for more than being on a branch):");
            page.table(List.of("fate", "control value", "predicted position (µm)",
                    "positional error from the gradient's amplitude variability (µm)"), calls);
        }
        singleCellPrediction(page, metrics, fates);
        JsonElement undefined = metrics.get("predicted_boundaries_undefined");
        if (undefined != null && !undefined.isJsonNull()) {
            page.paragraph("No boundary is predicted: " + undefined.getAsString() + ".");
        }
        page.heading("Lineages");
        List<List<String>> related = new ArrayList<>();
        for (Map.Entry<String, JsonElement> e : metrics.getAsJsonObject("same_fate_by_lineage_distance").entrySet()) {
            related.add(List.of(e.getKey(), text(e.getValue())));
        }
        page.paragraph("Sister-fate agreement: " + text(metrics.get("sister_fate_agreement")) + " (partitioning: "
                + metrics.get("partition").getAsString() + ").");
        page.table(List.of("lineage distance (divisions)", "pairs sharing a fate"), related);
        page.heading("Scenario");
        page.preformatted(scenarioText);
        page.heading("Provenance");
        List<List<String>> facts = new ArrayList<>();
        String[][] labels = {{"tool", "program"}, {"tool_version", "program version"}, {"java_version", "Java version"},
            {"java_vendor", "Java vendor"}, {"os", "operating system"}, {"seed", "master seed"},
            {"started", "started (UTC)"}, {"wall_time_s", "wall-clock time (s)"},
            {"simulated_time_h", "simulated time (h)"}, {"steps", "time steps"}, {"final_population", "cells at the end"}};
        for (String[] label : labels) {
            facts.add(List.of(label[1], text(provenance.get(label[0]))));
        }
        JsonObject scenario = provenance.getAsJsonObject("scenario");
        facts.add(List.of("scenario source", text(scenario.get("source"))));
        facts.add(List.of("scenario SHA-256", text(scenario.get("sha256"))));
        page.table(List.of("what", "value"), facts);
        return page.finish();
    }

    /** The noise-based prediction from single cells, beside the simulated boundaries. */
    private static void singleCellPrediction(HtmlPage page, JsonObject metrics, List<String> fates) {
        JsonElement element = metrics.get("predicted_profile");
        if (element == null || !element.isJsonObject()) {
            return;
        }
        JsonObject single = element.getAsJsonObject();
        JsonElement undefined = single.get("undefined");
        if (undefined != null && !undefined.isJsonNull()) {
            page.paragraph("No fate profile is predicted from single cells: " + undefined.getAsString() + ".");
            return;
        }
        page.paragraph("Predicted from single cells (" + single.get("cells_per_position").getAsInt() + " noisy cells"
                + " per position, held at the local parameters for the whole run, without division; dashed in the"
                + " profile figure): committed fates against the default at " + text(single.get("committed_boundary_um"))
                + " µm.");
        List<List<String>> rows = new ArrayList<>();
        JsonObject byFate = single.getAsJsonObject("fates");
        for (String fate : fates) {
            JsonObject f = byFate.getAsJsonObject(fate);
            rows.add(List.of(fate, text(f.get("position_um")), text(f.get("rms_difference_to_simulated"))));
        }
        page.table(List.of("fate", "predicted boundary (µm, fraction crosses 1/2 once)",
                "RMS difference to the simulated fraction"), rows);
    }

    /** A JSON number, NaN for null or absent. */
    private static double number(JsonElement e) {
        return e == null || e.isJsonNull() || !e.isJsonPrimitive() ? Double.NaN : e.getAsDouble();
    }

    private static byte[] profile(RunFolderReader folder, List<String> fates, JsonObject metrics) throws IOException {
        RunFolderReader.Profile profile = folder.profile(fates);
        double[] simulated = new double[fates.size()];
        for (int f = 0; f < fates.size(); f++) {
            simulated[f] = number(metrics.getAsJsonObject("boundaries").getAsJsonObject(fates.get(f)).get("position_um"));
        }
        double committed = number(metrics.get("committed_boundary_um"));
        return png(ProfileChart.create(fates, profile.x(), profile.fractions(), simulated, committed,
                RunFolderReader.predictedBoundaries(metrics), RunFolderReader.predictedFateCalls(metrics),
                profile.predicted()));
    }

    /**
     * The circuit's bifurcation diagram along its control parameter and its landscape where the
     * most stable states coexist; none if the scenario has no coupling or does not parse.
     */
    static List<Figure> circuitFigures(String scenarioText, Path run) throws IOException {
        Scenario scenario;
        try {
            scenario = ScenarioReader.parse(RunLayout.SCENARIO_COPY, "run", scenarioText.getBytes(StandardCharsets.UTF_8),
                    run.toAbsolutePath());
        } catch (ScenarioException e) {
            return List.of();
        }
        ControlCircuit circuit = ControlCircuit.of(scenario.tissue(), 40);
        if (circuit == null) {
            return List.of();
        }
        List<Figure> figures = new ArrayList<>();
        List<String> species = scenario.tissue().circuit().network().speciesNames();
        figures.add(new Figure("Single-cell bifurcation diagram along the control parameter",
                png(BifurcationDiagramChart.create(circuit.branches(), 0, circuit.parameter(), species.get(0)))));
        DoubleFunction<QuasiPotential> landscape = circuit.landscape();
        if (landscape != null) {
            double at = circuit.middle();
            QuasiPotential u = landscape.apply(at);
            String title = String.format(Locale.ROOT, "Landscape at %s = %s (middle of the range)", circuit.parameter(),
                    RunTables.number(at));
            figures.add(new Figure(title + " (U = -ln P of the stationary distribution, one cell, no morphogen change)",
                    png(GridMapChart.landscape(u.xs(), u.ys(), u.u(), GridMapChart.LANDSCAPE_CEILING,
                            species.get(0) + " (concentration)", species.get(1) + " (concentration)", title))));
        }
        return figures;
    }

    private static byte[] png(JFreeChart chart) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChartFiles.png(chart, 900, 520, out);
        return out.toByteArray();
    }

    /** A JSON value for reading: numbers to 4 significant digits, "–" for none. */
    private static String text(JsonElement e) {
        if (e == null || e.isJsonNull()) {
            return "–";
        }
        if (e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber()) {
            double v = e.getAsDouble();
            if (v == Math.rint(v) && Math.abs(v) < 1e6) {
                return Long.toString((long) v);
            }
            return new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros()
                    .toPlainString();
        }
        return e.isJsonPrimitive() ? e.getAsString() : e.toString();
    }
}
