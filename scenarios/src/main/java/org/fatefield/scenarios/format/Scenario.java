package org.fatefield.scenarios.format;

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
 */
public record Scenario(String name, String description, String source, String sha256, long seed, TissueSpec tissue,
        String text) {
}
