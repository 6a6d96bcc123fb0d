package org.fatefield.scenarios.output;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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

    /** Cells in each of {@code fates} at the last record time ({@code timeseries.csv}'s last rows). */
    public long[] finalCounts(List<String> fates) throws IOException {
        Path file = run.resolve(RunLayout.TIMESERIES);
        List<CSVRecord> records = RunTables.records(file);
        long[] counts = new long[fates.size()];
        if (records.isEmpty()) {
            return counts;
        }
        String last = records.get(records.size() - 1).get("time_h");
        for (CSVRecord r : records) {
            int f = fates.indexOf(r.get("fate"));
            if (r.get("time_h").equals(last) && f >= 0) {
                counts[f] = Math.round(parse(file, r, "cells"));
            }
        }
        return counts;
    }

    /**
     * {@code profile.csv} as fractions per fate, for {@code fates}: bins in the order of their
     * first row, fate rows looked up by name.
     */
    public Profile profile(List<String> fates) throws IOException {
        Bins bins = bins(fates);
        return new Profile(bins.x, bins.fractions, bins.hasPrediction ? bins.predicted : null);
    }

    /**
     * {@code profile.csv} as a {@link FateProfile} over a tissue {@code width} µm wide (counts
     * read per fate), so its boundaries are measured exactly as a live run's.
     */
    public FateProfile fateProfile(List<String> fates, double width) throws IOException {
        Bins bins = bins(fates);
        int[] counts = new int[bins.x.length];
        for (int[] byBin : bins.cells) {
            for (int b = 0; b < counts.length; b++) {
                counts[b] += byBin[b];
            }
        }
        return FateProfile.fromCounts(width, counts, bins.cells);
    }

    /** The long {@code profile.csv} gathered into arrays per fate and bin. */
    private record Bins(double[] x, int[][] cells, double[][] fractions, double[][] predicted, boolean hasPrediction) {
    }

    private Bins bins(List<String> fates) throws IOException {
        Path file = run.resolve(RunLayout.PROFILE);
        List<CSVRecord> rows = RunTables.records(file);
        Map<String, Integer> binOf = new LinkedHashMap<>();
        for (CSVRecord r : rows) {
            binOf.putIfAbsent(r.get("x_um"), binOf.size());
        }
        int n = binOf.size();
        double[] x = new double[n];
        int[][] cells = new int[fates.size()][n];
        double[][] fractions = new double[fates.size()][n];
        double[][] predicted = new double[fates.size()][n];
        for (double[] row : fractions) {
            Arrays.fill(row, Double.NaN);
        }
        for (double[] row : predicted) {
            Arrays.fill(row, Double.NaN);
        }
        boolean hasPrediction = false;
        for (CSVRecord r : rows) {
            int b = binOf.get(r.get("x_um"));
            x[b] = parse(file, r, "x_um");
            int f = fates.indexOf(r.get("fate"));
            if (f < 0) {
                throw new IOException(file + " line " + r.getRecordNumber() + ": fate '" + r.get("fate")
                        + "' is not one of the scenario's fates " + fates);
            }
            cells[f][b] = (int) parse(file, r, "cells");
            fractions[f][b] = parse(file, r, "fraction");
            predicted[f][b] = parse(file, r, "predicted_fraction");
            hasPrediction |= !Double.isNaN(predicted[f][b]);
        }
        return new Bins(x, cells, fractions, predicted, hasPrediction);
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

    private static double parse(Path file, CSVRecord row, String column) throws IOException {
        try {
            return RunTables.parseNumber(row.get(column));
        } catch (IllegalArgumentException e) {
            throw new IOException(file + " line " + row.getRecordNumber() + ": column " + column
                    + " is missing or not a number (" + e.getMessage() + ")", e);
        }
    }
}
