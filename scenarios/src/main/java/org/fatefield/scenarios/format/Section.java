package org.fatefield.scenarios.format;

import java.util.List;
import java.util.Optional;

/**
 * A section of the scenario format: a TOML table ({@code [name]}) or an array of tables
 * ({@code [[name]]}), with its documented keys.
 *
 * @param path        dotted section name
 * @param repeated    true for an array of tables
 * @param required    true if the section must be present
 * @param keys        the keys it may contain
 * @param description what the section describes
 * @param open        true if it takes keys of the user's choosing (each a number)
 */
public record Section(String path, boolean repeated, boolean required, List<Key> keys, String description,
        boolean open) {

    /** A section with a fixed set of keys. */
    public Section(String path, boolean repeated, boolean required, List<Key> keys, String description) {
        this(path, repeated, required, keys, description, false);
    }

    /** The key called {@code name}, if documented here. */
    public Optional<Key> key(String name) {
        return keys.stream().filter(k -> k.name().equals(name)).findFirst();
    }

    /** How the section is written in TOML. */
    public String header() {
        return repeated ? "[[" + path + "]]" : "[" + path + "]";
    }
}
