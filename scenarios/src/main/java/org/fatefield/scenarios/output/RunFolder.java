package org.fatefield.scenarios.output;

import java.io.BufferedOutputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.stream.Stream;

/**
 * The folder a run writes into. A folder that already holds files is never overwritten unless
 * the user says so, and every file is written to a temporary name and then renamed, so a killed
 * run leaves complete files or none, never a truncated one.
 */
public final class RunFolder {

    /** Writes the content of one file. */
    @FunctionalInterface
    public interface Content {
        /** Writes to {@code out}. */
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes the content of one text file. */
    @FunctionalInterface
    public interface TextContent {
        /** Writes to {@code out}. */
        void writeTo(Writer out) throws IOException;
    }

    private final Path path;

    private RunFolder(Path path) {
        this.path = path;
    }

    /**
     * Checks that {@code path} may receive a run, without creating anything.
     *
     * @throws IOException with a message saying what to do if it holds files and {@code force}
     *                     is false, or if it is a file
     */
    public static void checkUsable(Path path, boolean force) throws IOException {
        checkUsable(path, force, true);
    }

    /**
     * As {@link #checkUsable(Path, boolean)}, for a command that has a {@code --force} option
     * ({@code forceOption}) or not: the message suggests only what the command offers.
     */
    public static void checkUsable(Path path, boolean force, boolean forceOption) throws IOException {
        if (Files.exists(path) && !Files.isDirectory(path)) {
            throw new IOException("output path " + path + " is a file, not a folder; choose another --out");
        }
        if (Files.isDirectory(path) && !force) {
            try (Stream<Path> entries = Files.list(path)) {
                if (entries.findAny().isPresent()) {
                    throw new IOException("output folder " + path + " already holds files; choose another --out"
                            + (forceOption ? ", or add --force to overwrite the run files in it" : ""));
                }
            }
        }
    }

    /** Creates (if needed) and opens the folder; call {@link #checkUsable} first. */
    public static RunFolder open(Path path) throws IOException {
        Files.createDirectories(path);
        return new RunFolder(path);
    }

    /** The folder. */
    public Path path() {
        return path;
    }

    /**
     * Takes the folder for one run: an exclusive lock on its lock file, released (and the file
     * removed) by closing what this returns.
     *
     * @throws IOException saying so if another run (in this or another process) holds the folder
     */
    public Closeable lock() throws IOException {
        Path file = path.resolve(RunLayout.LOCK);
        FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null;
        }
        if (lock == null) {
            channel.close();
            throw new IOException("another Fatefield run is writing into " + path + "; wait for it to finish, or"
                    + " choose another --out");
        }
        FileLock held = lock;
        return () -> {
            held.release();
            channel.close();
            Files.deleteIfExists(file);
        };
    }

    /**
     * Writes {@code name} atomically: to a temporary file first, forced to disk, then renamed over
     * the target; an error names the file.
     */
    public Path write(String name, Content content) throws IOException {
        Path target = path.resolve(name);
        Path temporary = RunLayout.partial(target);
        Files.createDirectories(target.getParent());
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.CREATE,
                    StandardOpenOption.TRUNCATE_EXISTING, StandardOpenOption.WRITE)) {
                OutputStream out = new BufferedOutputStream(Channels.newOutputStream(channel));
                content.writeTo(out);
                out.flush();
                // On disk before it takes its final name: a crash leaves the old file or the new one, whole.
                channel.force(true);
            } catch (IOException e) {
                throw new IOException("cannot write " + target + ": " + e.getMessage(), e);
            }
            try {
                Files.move(temporary, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
        return target;
    }

    /** Writes a UTF-8 text file atomically. */
    public Path writeText(String name, TextContent content) throws IOException {
        return write(name, out -> {
            Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            content.writeTo(writer);
            writer.flush();
        });
    }
}
