package org.fatefield.scenarios.format;

import java.util.List;
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
 */
public record Scenario(String name, String description, String source, String sha256, long seed, TissueSpec tissue,
        String text, List<String> overrides) {

    /** Copies. */
    public Scenario {
        overrides = List.copyOf(overrides);
    }
}
