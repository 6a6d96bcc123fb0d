package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.nio.file.FileSystemException;
import org.fatefield.scenarios.format.TextLimits;

/** A file error in words: which file and what was wrong, where Java's message is the bare path. */
final class IoMessages {

    private IoMessages() {
    }

    /** {@code e} as "file: reason" ({@link TextLimits#describe} gives the reason). */
    static String describe(IOException e) {
        if (e instanceof FileSystemException fs && fs.getReason() == null && fs.getFile() != null) {
            return fs.getFile() + ": " + TextLimits.describe(e);
        }
        return TextLimits.describe(e);
    }
}
