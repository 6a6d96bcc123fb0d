package org.fatefield.scenarios.format;

import java.util.List;

/**
 * One documented key of the scenario format: its type, unit, default and allowed values.
 *
 * @param name         key name inside its section
 * @param type         value type
 * @param unit         unit, or "" for dimensionless values and words
 * @param defaultValue default as written in the reference, or null if the key is required
 * @param min          smallest allowed number (NaN for none)
 * @param minExclusive whether {@code min} itself is excluded
 * @param max          largest allowed number (NaN for none)
 * @param choices      allowed words for {@link KeyType#CHOICE}
 * @param description  what the key means
 */
public record Key(String name, KeyType type, String unit, String defaultValue, double min, boolean minExclusive,
        double max, List<String> choices, String description) {

    /** A required number greater than {@code min}. */
    static Key positive(String name, String unit, String defaultValue, String description) {
        return new Key(name, KeyType.NUMBER, unit, defaultValue, 0.0, true, Double.NaN, List.of(), description);
    }

    /** A number of at least 0. */
    static Key nonNegative(String name, String unit, String defaultValue, String description) {
        return new Key(name, KeyType.NUMBER, unit, defaultValue, 0.0, false, Double.NaN, List.of(), description);
    }

    /** A number with no range limit. */
    static Key anyNumber(String name, String unit, String defaultValue, String description) {
        return new Key(name, KeyType.NUMBER, unit, defaultValue, Double.NaN, false, Double.NaN, List.of(), description);
    }

    /** A whole number in [min, max]. */
    static Key integer(String name, String defaultValue, double min, double max, String description) {
        return new Key(name, KeyType.INTEGER, "", defaultValue, min, false, max, List.of(), description);
    }

    /** One of {@code choices}. */
    static Key choice(String name, String defaultValue, List<String> choices, String description) {
        return new Key(name, KeyType.CHOICE, "", defaultValue, Double.NaN, false, Double.NaN, choices, description);
    }

    /** A key of another type without range. */
    static Key of(String name, KeyType type, String unit, String defaultValue, String description) {
        return new Key(name, type, unit, defaultValue, Double.NaN, false, Double.NaN, List.of(), description);
    }

    /** True if the key must be given. */
    public boolean required() {
        return defaultValue == null;
    }

    /** The allowed values in words, for error messages and the reference. */
    public String allowed() {
        return switch (type) {
            case CHOICE -> "one of " + String.join(", ", choices.stream().map(c -> "\"" + c + "\"").toList());
            case NUMBER, INTEGER -> rangeText();
            default -> type.description();
        };
    }

    private String rangeText() {
        String kind = type == KeyType.INTEGER ? "a whole number" : "a number";
        boolean hasMin = !Double.isNaN(min);
        boolean hasMax = !Double.isNaN(max);
        if (hasMin && hasMax) {
            return kind + " from " + plain(min) + " to " + plain(max);
        }
        if (hasMin) {
            return kind + (minExclusive ? " greater than " : " of at least ") + plain(min);
        }
        if (hasMax) {
            return kind + " of at most " + plain(max);
        }
        return kind;
    }

    private static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /** True if {@code value} is in range. */
    boolean inRange(double value) {
        if (!Double.isFinite(value)) {
            return false;
        }
        if (!Double.isNaN(min) && (minExclusive ? !(value > min) : !(value >= min))) {
            return false;
        }
        return Double.isNaN(max) || value <= max;
    }
}
