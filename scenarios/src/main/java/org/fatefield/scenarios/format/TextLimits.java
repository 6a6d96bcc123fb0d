package org.fatefield.scenarios.format;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import org.tomlj.Toml;
import org.tomlj.TomlParseResult;

/**
 * Limits on input text, checked before a parser sees it, so that untrusted files end in a
 * clear message instead of exhausting memory or the stack: a file is read only up to a size
 * (a device such as {@code /dev/zero} never ends), and TOML arrays and inline tables may nest
 * only so deep (the TOML parser recurses once per level).
 */
public final class TextLimits {

    /** Largest scenario, circuit or sweep file read (1 MiB: these are short texts). */
    public static final int MAX_TOML_BYTES = 1 << 20;

    /** Largest measured-profile CSV read (16 MiB). */
    public static final int MAX_TABLE_BYTES = 1 << 24;

    /** Deepest nesting of arrays and inline tables in a TOML text. */
    public static final int MAX_NESTING = 32;

    private TextLimits() {
    }

    /**
     * The bytes of {@code file}, read up to {@code max}; an IOException saying so if the file
     * is longer or never ends.
     */
    public static byte[] read(Path file, int max, String what) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes(max + 1);
            if (bytes.length > max) {
                throw new IOException("is larger than " + max / 1024 + " KiB; " + what);
            }
            return bytes;
        }
    }

    /**
     * What went wrong with a file, in words ("no such file or folder") where Java's message is
     * the bare path; otherwise Java's message.
     */
    public static String describe(IOException e) {
        if (e instanceof FileSystemException fs && fs.getReason() == null) {
            return e instanceof NoSuchFileException ? "no such file or folder"
                    : e instanceof AccessDeniedException ? "permission denied"
                    : e instanceof FileAlreadyExistsException ? "already exists" : e.getClass().getSimpleName();
        }
        return e.getMessage();
    }

    /**
     * Where {@code text} first nests arrays and inline tables more than {@link #MAX_NESTING}
     * deep, as {@code {line, column}} (1-based), or null if it never does. Brackets inside
     * strings and comments do not count.
     */
    public static int[] tooDeep(String text) {
        int depth = 0;
        int line = 1;
        int column = 0;
        char quote = 0;
        boolean multiline = false;
        boolean comment = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            column++;
            if (c == '\n') {
                line++;
                column = 0;
                comment = false;
                if (quote != 0 && !multiline) {
                    quote = 0;
                }
                continue;
            }
            if (comment) {
                continue;
            }
            if (quote != 0) {
                if (quote == '"' && c == '\\') {
                    i++;
                    column++;
                } else if (c == quote && (!multiline || text.startsWith(triple(quote), i))) {
                    if (multiline) {
                        i += 2;
                        column += 2;
                    }
                    quote = 0;
                }
                continue;
            }
            if (c == '#') {
                comment = true;
            } else if (c == '"' || c == '\'') {
                quote = c;
                multiline = text.startsWith(triple(c), i);
                if (multiline) {
                    i += 2;
                    column += 2;
                }
            } else if (c == '[' || c == '{') {
                if (++depth > MAX_NESTING) {
                    return new int[] {line, column};
                }
            } else if ((c == ']' || c == '}') && depth > 0) {
                depth--;
            }
        }
        return null;
    }

    private static String triple(char quote) {
        return String.valueOf(quote).repeat(3);
    }

    /**
     * Parses a short TOML text (a sweep, calibration or data file), refusing nesting deeper than
     * {@link #MAX_NESTING}; null, with every problem added, if it is not valid.
     */
    public static TomlParseResult parseToml(String label, String text, List<Problem> problems) {
        int[] deep = tooDeep(text);
        if (deep != null) {
            problems.add(new Problem(label, deep[0], deep[1], "", null, "arrays or inline tables nest more than "
                    + MAX_NESTING + " deep here"));
            return null;
        }
        TomlParseResult toml = Toml.parse(text);
        if (toml.hasErrors()) {
            toml.errors().forEach(e -> problems.add(new Problem(label, e.position().line(), e.position().column(), "",
                    null, "not valid TOML: " + e.getMessage())));
            return null;
        }
        return toml;
    }
}
