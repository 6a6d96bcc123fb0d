package org.fatefield.scenarios.output;

import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.fatefield.scenarios.format.Key;
import org.fatefield.scenarios.format.ScenarioSchema;
import org.fatefield.scenarios.format.Section;

/**
 * Figure labels in words with units for the names tables and sweeps use: a metric such as
 * {@code boundary_progenitor_um} reads "progenitor boundary (µm along the gradient)", a
 * scenario key such as {@code morphogen.source[1].rate} reads "morphogen source 1: rate (1/h)"
 * (tables of a repeated section are numbered from 1, as in validation messages).
 * A name it does not know is returned as it is, so a label is never lost.
 */
public final class AxisWords {

    private static final Pattern BOUNDARY = Pattern.compile("boundary_(.+)_um");
    private static final Pattern WIDTH = Pattern.compile("width_(.+)_um");
    private static final Pattern FRACTION = Pattern.compile("fraction_(.+)");
    private static final Pattern COMMITTED = Pattern.compile("committed_boundary_um");
    private static final Pattern INDEXED = Pattern.compile("([a-z_]+)\\[(\\d+)]");

    private static final Pattern POSITIONAL_ERROR = Pattern.compile("positional_error_(.+)_um");
    private static final Pattern PROFILE_POINT = Pattern.compile("profile_(.+)_at_(.+)um");

    private AxisWords() {
    }

    /** A metric name in words, with its unit. */
    public static String metric(String name) {
        Matcher m = BOUNDARY.matcher(name);
        if (m.matches()) {
            return m.group(1) + " boundary (µm along the gradient)";
        }
        m = WIDTH.matcher(name);
        if (m.matches()) {
            return m.group(1) + " boundary width, 10-90% (µm)";
        }
        m = FRACTION.matcher(name);
        if (m.matches()) {
            return "fraction of cells that are " + m.group(1) + " at the end";
        }
        if (COMMITTED.matcher(name).matches()) {
            return "committed boundary (µm along the gradient)";
        }
        m = POSITIONAL_ERROR.matcher(name);
        if (m.matches()) {
            return m.group(1) + " positional error (sd across tissues, µm)";
        }
        m = PROFILE_POINT.matcher(name);
        if (m.matches()) {
            return "fraction " + m.group(1) + " at x = " + m.group(2) + " µm";
        }
        return switch (name) {
            case "population" -> "cells at the end";
            case "mixed_zone_width_um" -> "width of the mixed zone (µm)";
            case "predicted_boundary_um" -> "predicted bistability boundary (µm along the gradient)";
            case "sister_agreement" -> "sister-fate agreement (fraction of sister pairs)";
            default -> name;
        };
    }

    /** A scenario key path in words, with the key's unit from the scenario schema when it has one. */
    public static String key(String path) {
        String[] parts = path.split("\\.");
        if (parts.length < 2) {
            return path;
        }
        StringBuilder words = new StringBuilder();
        StringBuilder sectionPath = new StringBuilder();
        for (int i = 0; i < parts.length - 1; i++) {
            Matcher m = INDEXED.matcher(parts[i]);
            String name = m.matches() ? m.group(1) : parts[i];
            if (i > 0) {
                sectionPath.append('.');
            }
            sectionPath.append(name);
            words.append(i == 0 ? "" : " ").append(name.replace('_', ' '));
            if (m.matches()) {
                words.append(' ').append(m.group(2));
            }
        }
        String keyName = parts[parts.length - 1];
        words.append(": ").append(keyName.replace('_', ' '));
        Optional<Section> section = ScenarioSchema.section(sectionPath.toString());
        Optional<Key> key = section.flatMap(s -> s.key(keyName));
        String unit = key.map(Key::unit).orElse("");
        if (!unit.isEmpty() && !List.of("–", "-").contains(unit)) {
            words.append(" (").append(unit).append(')');
        }
        return words.toString();
    }
}
