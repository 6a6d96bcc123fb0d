package org.fatefield.scenarios.format;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * A validated scenario, ready to run.
 *
 * @param name        short name
 * @param description what it models
 * @param source      where it came from (a path, or {@code builtin:<name>})
 * @param sha256      SHA-256 of the file's bytes, hex, for provenance
 * @param seed        master seed from the file (the command line may override it)
 * @param tissue      the model objects
 * @param text        the scenario file's text (a run folder keeps a copy)
 * @param overrides   values laid over the file's ({@code key = value}, in order; empty for none),
 *                    recorded in the provenance beside the file's copy
 * @param includes    the files the scenario includes (a circuit file), by the relative path it names
 *                    them with, and their text: with {@code text} they are the whole scenario, copied
 *                    together into run and sweep folders
 */
public record Scenario(String name, String description, String source, String sha256, long seed, TissueSpec tissue,
        String text, List<String> overrides, Map<String, String> includes) {

    /** Copies. */
    public Scenario {
        overrides = List.copyOf(overrides);
        includes = Map.copyOf(includes);
    }

    /** This scenario with its included files. */
    Scenario withIncludes(Map<String, String> files) {
        return new Scenario(name, description, source, sha256, seed, tissue, text, overrides, files);
    }

    /**
     * Writes the scenario file as {@code fileName} and every include beside it, at the relative
     * path the scenario names it with (through {@code writer}, which writes one text file), so
     * that the copy reads exactly as the original did.
     */
    public void copyInto(String fileName, FileWriter writer) throws IOException {
        writer.write(fileName, text);
        for (Map.Entry<String, String> include : includes.entrySet()) {
            writer.write(include.getKey(), include.getValue());
        }
    }

    /** Writes one text file of a scenario's copy. */
    @FunctionalInterface
    public interface FileWriter {
        /** Writes {@code text} as {@code relativePath}. */
        void write(String relativePath, String text) throws IOException;
    }
}
