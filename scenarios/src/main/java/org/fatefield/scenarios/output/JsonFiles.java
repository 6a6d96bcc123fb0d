package org.fatefield.scenarios.output;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The one JSON configuration of every file Fatefield writes (run.json, metrics.json, sweep
 * results, replicate summaries): pretty-printed, nulls kept (a metric that cannot be computed
 * is {@code null}, never left out), no HTML escaping, a final newline; and the one way to read
 * such a file back, with errors that name it.
 */
public final class JsonFiles {

    private static final Gson GSON = new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping()
            .create();

    private JsonFiles() {
    }

    /** The text of {@code json} as Fatefield writes it. */
    public static String text(JsonElement json) {
        return GSON.toJson(json) + "\n";
    }

    /** A finite number, or null for NaN and infinities (JSON has no NaN). */
    public static Double finite(double value) {
        return Double.isFinite(value) ? value : null;
    }

    /**
     * Reads the JSON object in {@code file}.
     *
     * @throws IOException naming the file if it is missing or is not a JSON object
     */
    public static JsonObject read(Path file) throws IOException {
        RunLayout.requireFile(file);
        try {
            return JsonParser.parseString(Files.readString(file, StandardCharsets.UTF_8)).getAsJsonObject();
        } catch (JsonParseException | IllegalStateException e) {
            throw new IOException(file + " is not a JSON object as Fatefield writes it (" + e.getMessage()
                    + "); was it edited or cut short?", e);
        }
    }
}
