package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;

/** A file error in words: which file and what was wrong, where Java's message is the bare path. */
final class IoMessages {

    private IoMessages() {
    }

    /** {@code e} as "file: reason". */
    static String describe(IOException e) {
        if (e instanceof FileSystemException fs && fs.getReason() == null) {
            String file = fs.getFile();
            String reason = e instanceof NoSuchFileException ? "no such file or folder (or a parent cannot be made)"
                    : e instanceof AccessDeniedException ? "permission denied"
                    : e instanceof FileAlreadyExistsException ? "already exists" : e.getClass().getSimpleName();
            return file + ": " + reason;
        }
        return e.getMessage();
    }
}
