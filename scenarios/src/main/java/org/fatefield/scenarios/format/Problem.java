package org.fatefield.scenarios.format;

/**
 * One thing wrong with a scenario file, located precisely enough to fix it.
 *
 * @param file    the file as the user named it
 * @param line    1-based line, or 0 when the problem is an absence
 * @param column  1-based column, or 0 if unknown
 * @param keyPath dotted key path, e.g. {@code tissue.width} or {@code coupling[2].form}
 * @param value   the offending value as written, or null for a missing key or section
 * @param message what is wrong and what is allowed
 */
public record Problem(String file, int line, int column, String keyPath, String value, String message) {

    /** Longest value shown in a message; a longer one is cut, with its length said. */
    private static final int SHOWN = 120;

    /** {@code file:line:column: key = value: message}, the form editors can jump to. */
    public String format() {
        StringBuilder out = new StringBuilder(file);
        if (line > 0) {
            out.append(':').append(line);
            if (column > 0) {
                out.append(':').append(column);
            }
        }
        out.append(": ");
        if (keyPath != null && !keyPath.isEmpty()) {
            out.append(keyPath);
            if (value != null) {
                out.append(" = ").append(value.length() <= SHOWN ? value
                        : value.substring(0, SHOWN) + "... (" + value.length() + " characters)");
            }
            out.append(": ");
        }
        return out.append(message).toString();
    }
}
