package org.fatefield.scenarios.report;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/** Reading the files of a finished run folder for the reports, with errors that name the file. */
final class RunFiles {

    /** A run's fate profile along the gradient: bin centres and {@code fractions[f][b]} per fate. */
    record Profile(double[] x, double[][] fractions) {
    }

    private RunFiles() {
    }

    /** A JSON file of the run. */
    static JsonObject json(Path file) throws IOException {
        if (!Files.exists(file)) {
            throw new IOException(file + " is missing: is this a finished Fatefield run folder?");
        }
        return JsonParser.parseString(Files.readString(file, StandardCharsets.UTF_8)).getAsJsonObject();
    }

    /** The records of a CSV file with a header row. */
    static List<CSVRecord> csv(Path file) throws IOException {
        if (!Files.exists(file)) {
            throw new IOException(file + " is missing: is this a finished Fatefield run folder?");
        }
        try (Reader in = Files.newBufferedReader(file);
                CSVParser parser = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
            return parser.getRecords();
        }
    }

    /** The run's profile.csv for {@code fates}. */
    static Profile profile(Path run, List<String> fates) throws IOException {
        List<CSVRecord> records = csv(run.resolve("profile.csv"));
        double[] x = new double[records.size()];
        double[][] fractions = new double[fates.size()][records.size()];
        for (int b = 0; b < records.size(); b++) {
            x[b] = Double.parseDouble(records.get(b).get("x_um"));
            for (int f = 0; f < fates.size(); f++) {
                fractions[f][b] = Double.parseDouble(records.get(b).get("fraction_" + fates.get(f)));
            }
        }
        return new Profile(x, fractions);
    }

    /** Predicted boundary positions (µm) listed in a run's metrics, skipping those off the tissue. */
    static double[] predictedBoundaries(JsonObject metrics) {
        List<Double> predicted = new ArrayList<>();
        for (JsonElement e : metrics.getAsJsonArray("predicted_boundaries")) {
            JsonElement p = e.getAsJsonObject().get("position_um");
            if (p != null && !p.isJsonNull()) {
                predicted.add(p.getAsDouble());
            }
        }
        return predicted.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
