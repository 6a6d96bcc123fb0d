package org.fatefield.scenarios.output;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.TreeMap;

/**
 * The one provenance record every command writes (inside {@code run.json}, and as
 * {@code provenance.json} in analysis, robustness, sweep and calibration folders): the tool
 * version and build commit, the command line, threads and processors, Java and OS, the versions
 * of the libraries the results depend on, and the SHA-256 of every input.
 */
public final class Provenance {

    private static volatile List<String> commandLine = List.of();

    private Provenance() {
    }

    /** Remembers the arguments of the command being run (called once per command by the CLI). */
    public static void recordCommandLine(String[] args) {
        commandLine = List.of(args);
    }

    /**
     * The record.
     *
     * @param command the command (run, analyze, ...)
     * @param threads threads (or workers) the command computes on
     * @param inputs  each input's label and its SHA-256
     */
    public static JsonObject of(String command, int threads, Map<String, String> inputs) {
        JsonObject root = new JsonObject();
        root.addProperty("tool", "fatefield");
        root.addProperty("tool_version", RunProvenance.toolVersion());
        root.addProperty("build_commit", RunProvenance.buildCommit());
        root.addProperty("command", command);
        JsonArray line = new JsonArray();
        line.add("fatefield");
        commandLine.forEach(line::add);
        root.add("command_line", line);
        root.addProperty("threads", threads);
        root.addProperty("processors", Runtime.getRuntime().availableProcessors());
        root.addProperty("java_version", System.getProperty("java.version"));
        root.addProperty("java_vendor", System.getProperty("java.vendor"));
        root.addProperty("os", System.getProperty("os.name") + " " + System.getProperty("os.arch"));
        root.addProperty("written", Instant.now().toString());
        JsonObject libraries = new JsonObject();
        dependencies().forEach(libraries::addProperty);
        root.add("libraries", libraries);
        JsonObject files = new JsonObject();
        new TreeMap<>(inputs).forEach(files::addProperty);
        root.add("inputs_sha256", files);
        return root;
    }

    /** Writes the record as {@code provenance.json} into {@code folder}. */
    public static void write(RunFolder folder, String command, int threads, Map<String, String> inputs)
            throws IOException {
        JsonObject record = of(command, threads, inputs);
        folder.writeText("provenance.json", w -> w.write(JsonFiles.text(record)));
    }

    /** The versions of the libraries the build pinned, by library name. */
    public static Map<String, String> dependencies() {
        Map<String, String> out = new TreeMap<>();
        try (InputStream in = Provenance.class.getResourceAsStream("/org/fatefield/scenarios/dependencies.properties")) {
            if (in != null) {
                Properties p = new Properties();
                p.load(new InputStreamReader(in, StandardCharsets.UTF_8));
                p.stringPropertyNames().forEach(k -> out.put(k, p.getProperty(k)));
            }
        } catch (IOException e) {
            out.put("unavailable", e.getMessage());
        }
        return out;
    }

    /** SHA-256 of a text, as lowercase hex. */
    public static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
