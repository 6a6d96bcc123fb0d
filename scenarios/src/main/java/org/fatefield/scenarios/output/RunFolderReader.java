package org.fatefield.scenarios.output;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.engine.metrics.FateProfile;

/**
 * Reads a finished run folder back (for reports, replicate sets and resumed sets), through the
 * same names ({@link RunLayout}) and formats ({@link RunTables}, {@link JsonFiles}) that wrote
 * it; every error names the file.
 */
public final class RunFolderReader {

    /**
     * A run's fate profile along the gradient: bin centres, {@code fractions[f][b]} per fate, and
     * the noise-based prediction {@code predicted[f][b]} (null when the run has none).
     */
    public record Profile(double[] x, double[][] fractions, double[][] predicted) {
    }

    private final Path run;

    private RunFolderReader(Path run) {
        this.run = run;
    }

    /** A reader of the run folder {@code run}. */
    public static RunFolderReader of(Path run) {
        return new RunFolderReader(run);
    }

    /** The folder. */
    public Path path() {
        return run;
    }

    /** True if the folder holds a finished run (its provenance, written last, is there). */
    public boolean finished() {
        return Files.exists(run.resolve(RunLayout.PROVENANCE));
    }

    /** {@code run.json}. */
    public JsonObject provenance() throws IOException {
        return JsonFiles.read(run.resolve(RunLayout.PROVENANCE));
    }

    /** {@code metrics.json}. */
    public JsonObject metrics() throws IOException {
        return JsonFiles.read(run.resolve(RunLayout.METRICS));
    }

    /** The copy of the scenario that was run. */
    public String scenarioText() throws IOException {
        Path file = run.resolve(RunLayout.SCENARIO_COPY);
        RunLayout.requireFile(file);
        return Files.readString(file, StandardCharsets.UTF_8);
    }

    /** The bytes of an image (or any file) of the run, named as in {@link RunLayout}. */
    public byte[] bytes(String name) throws IOException {
        Path file = run.resolve(name);
        RunLayout.requireFile(file);
        return Files.readAllBytes(file);
    }

    /** True if the run folder holds {@code name}. */
    public boolean has(String name) {
        return Files.exists(run.resolve(name));
    }

    /** Cells in each of {@code fates} at the last record time ({@code timeseries.csv}'s last row). */
    public long[] finalCounts(List<String> fates) throws IOException {
        List<CSVRecord> records = RunTables.records(run.resolve(RunLayout.TIMESERIES));
        long[] counts = new long[fates.size()];
        if (records.isEmpty()) {
            return counts;
        }
        CSVRecord last = records.get(records.size() - 1);
        for (int f = 0; f < fates.size(); f++) {
            counts[f] = Math.round(parse(last, "count_" + fates.get(f)));
        }
        return counts;
    }

    /** {@code profile.csv} as fractions per fate, for {@code fates}. */
    public Profile profile(List<String> fates) throws IOException {
        List<CSVRecord> records = RunTables.records(run.resolve(RunLayout.PROFILE));
        double[] x = new double[records.size()];
        double[][] fractions = new double[fates.size()][records.size()];
        boolean hasPrediction = !records.isEmpty() && records.get(0).isMapped("predicted_fraction_" + fates.get(0));
        double[][] predicted = hasPrediction ? new double[fates.size()][records.size()] : null;
        for (int b = 0; b < records.size(); b++) {
            x[b] = parse(records.get(b), "x_um");
            for (int f = 0; f < fates.size(); f++) {
                fractions[f][b] = parse(records.get(b), "fraction_" + fates.get(f));
                if (hasPrediction) {
                    predicted[f][b] = parse(records.get(b), "predicted_fraction_" + fates.get(f));
                }
            }
        }
        return new Profile(x, fractions, predicted);
    }

    /**
     * {@code profile.csv} as a {@link FateProfile} over a tissue {@code width} µm wide (counts
     * rebuilt from the fractions), so its boundaries are measured exactly as a live run's.
     */
    public FateProfile fateProfile(List<String> fates, double width) throws IOException {
        List<CSVRecord> rows = RunTables.records(run.resolve(RunLayout.PROFILE));
        int[] counts = new int[rows.size()];
        int[][] byFate = new int[fates.size()][rows.size()];
        for (int b = 0; b < rows.size(); b++) {
            CSVRecord row = rows.get(b);
            counts[b] = (int) parse(row, "cells");
            for (int f = 0; f < fates.size(); f++) {
                double fraction = parse(row, "fraction_" + fates.get(f));
                byFate[f][b] = Double.isNaN(fraction) ? 0 : (int) Math.round(fraction * counts[b]);
            }
        }
        return FateProfile.fromCounts(width, counts, byFate);
    }

    /** Predicted boundary positions (µm) listed in the run's metrics, skipping those off the tissue. */
    public double[] predictedBoundaries() throws IOException {
        return predictedBoundaries(metrics());
    }

    /** Predicted boundary positions (µm) listed in {@code metrics}, skipping those off the tissue. */
    public static double[] predictedBoundaries(JsonObject metrics) {
        List<Double> predicted = new ArrayList<>();
        for (JsonElement e : metrics.getAsJsonArray("predicted_boundaries")) {
            JsonElement p = e.getAsJsonObject().get("position_um");
            if (p != null && !p.isJsonNull()) {
                predicted.add(p.getAsDouble());
            }
        }
        return predicted.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Predicted fate-call boundary positions (µm) listed in {@code metrics} (none in older run folders). */
    public static double[] predictedFateCalls(JsonObject metrics) {
        List<Double> out = new ArrayList<>();
        JsonElement calls = metrics.get("predicted_fate_call_boundaries");
        if (calls != null && calls.isJsonArray()) {
            for (JsonElement e : calls.getAsJsonArray()) {
                JsonElement p = e.getAsJsonObject().get("position_um");
                if (p != null && !p.isJsonNull()) {
                    out.add(p.getAsDouble());
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private double parse(CSVRecord row, String column) throws IOException {
        try {
            return Double.parseDouble(row.get(column));
        } catch (IllegalArgumentException e) {
            throw new IOException(run.resolve(RunLayout.PROFILE) + " line " + row.getRecordNumber() + ": column "
                    + column + " is missing or not a number (" + e.getMessage() + ")", e);
        }
    }
}
