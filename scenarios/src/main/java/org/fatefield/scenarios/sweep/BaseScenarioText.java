package org.fatefield.scenarios.sweep;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.fatefield.scenarios.format.Problem;
import org.tomlj.TomlPosition;
import org.tomlj.TomlTable;

/**
 * The scenario a sweep or calibration file names: a file in that file's folder or below it (such
 * a file cannot reach elsewhere), or a built-in scenario; and the located problems of such files.
 */
public final class BaseScenarioText {

    /** Largest base scenario file read (a scenario is a short text; this refuses /dev/zero). */
    private static final long MAX_SCENARIO_BYTES = 1 << 20;

    private BaseScenarioText() {
    }

    /**
     * The text of the scenario named at {@code key} of {@code table}, read next to {@code file}
     * (a file of {@code kind}: "sweep", "calibration"); null, with a problem added, if it is
     * missing, not text, outside the folder or unreadable.
     */
    public static String read(String label, Path file, String kind, TomlTable table, String key, String path,
            List<Problem> problems) {
        String scenario = table.isString(key) ? table.getString(key) : null;
        if (scenario == null) {
            problems.add(table.contains(key) ? at(label, table, key, path,
                    "must be text: a scenario file in the " + kind + "'s folder, or a built-in name")
                    : new Problem(label, 0, 0, path, null, "required: the base scenario file or built-in"));
            return null;
        }
        Path folder = file.toAbsolutePath().getParent().normalize();
        Path base = folder.resolve(scenario).normalize();
        Optional<byte[]> builtin = BuiltinScenarios.bytes(scenario);
        if (Path.of(scenario).isAbsolute() || !base.startsWith(folder)) {
            problems.add(at(label, table, key, path, "must name a file in the " + kind + "'s folder or below it (a "
                    + kind + " file cannot reach elsewhere), or a built-in scenario"));
        } else if (Files.isRegularFile(base)) {
            try {
                if (Files.size(base) > MAX_SCENARIO_BYTES) {
                    problems.add(at(label, table, key, path, "is larger than " + MAX_SCENARIO_BYTES / 1024
                            + " KiB; a scenario file is a short text"));
                } else {
                    return Files.readString(base, StandardCharsets.UTF_8);
                }
            } catch (IOException e) {
                problems.add(at(label, table, key, path, "cannot be read: " + e.getMessage()));
            }
        } else if (builtin.isPresent()) {
            return new String(builtin.get(), StandardCharsets.UTF_8);
        } else {
            problems.add(at(label, table, key, path, "no such file next to the " + kind + " file and no built-in of"
                    + " that name"));
        }
        return null;
    }

    /** A problem located at {@code key} of {@code table}. */
    public static Problem at(String label, TomlTable table, String key, String path, String message) {
        TomlPosition position = table.inputPositionOf(List.of(key));
        return new Problem(label, position == null ? 0 : position.line(), position == null ? 0 : position.column(),
                path, null, message);
    }
}
