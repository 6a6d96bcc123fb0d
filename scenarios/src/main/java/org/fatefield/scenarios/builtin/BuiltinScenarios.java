package org.fatefield.scenarios.builtin;

import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Optional;

/** Scenarios shipped inside the tool, run by name ({@code fatefield run demo}). */
public final class BuiltinScenarios {

    private static final List<String> NAMES = List.of("demo");

    private BuiltinScenarios() {
    }

    /** Names of the built-in scenarios. */
    public static List<String> names() {
        return NAMES;
    }

    /** The TOML text of built-in {@code name}, if there is one. */
    public static Optional<byte[]> bytes(String name) {
        if (!NAMES.contains(name)) {
            return Optional.empty();
        }
        try (InputStream in = BuiltinScenarios.class.getResourceAsStream(name + ".toml")) {
            if (in == null) {
                throw new IllegalStateException("built-in scenario '" + name + "' is missing from the jar");
            }
            return Optional.of(in.readAllBytes());
        } catch (IOException e) {
            throw new IllegalStateException("cannot read built-in scenario '" + name + "'", e);
        }
    }
}
