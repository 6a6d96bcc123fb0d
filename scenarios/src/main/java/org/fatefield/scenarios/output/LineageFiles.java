package org.fatefield.scenarios.output;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.CRC32;
import java.util.zip.CheckedOutputStream;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.lineage.LineageSink;

/**
 * {@code lineage.csv}, streamed to disk as cells divide (so memory does not grow with history;
 * written under a temporary name and renamed when complete), and {@code lineage.nwk}, the family
 * trees in Newick format, one tree per founder, labelled {@code c<id>_<fate>} with lifetimes (h)
 * as branch lengths.
 */
public final class LineageFiles implements LineageSink, AutoCloseable {

    private final Path folder;
    private final Path partial;
    private final CSVPrinter printer;
    /** CRC-32 of every byte the table holds, kept up to date as bytes reach the file. */
    private final CRC32 crc;
    private final List<String> fates;
    /** True for a 3-D tissue: rows carry birth_z_um. */
    private final boolean threeD;

    /** Starts a new table in {@code folder} for a flat tissue with these fate names. */
    public static LineageFiles start(Path folder, List<String> fates) throws IOException {
        return start(folder, fates, false);
    }

    /** Starts a new table in {@code folder} for a run with these fate names, flat or 3-D. */
    public static LineageFiles start(Path folder, List<String> fates, boolean threeD) throws IOException {
        return new LineageFiles(folder, fates, -1, new CRC32(), threeD);
    }

    /**
     * Continues the partial table in {@code folder}, cut back to {@code length} bytes (the
     * length it had at the checkpoint being resumed), after checking that its first
     * {@code length} bytes are those the checkpoint saw ({@code crc}, a CRC-32 of them). A table
     * already renamed into place (a run killed while writing its results) is taken back.
     *
     * @throws IOException saying the folder is damaged if the table is missing, shorter than the
     *                     checkpoint's or altered, so that a resumed run never silently loses rows
     */
    public static LineageFiles resume(Path folder, List<String> fates, long length, long crc, boolean threeD)
            throws IOException {
        Path partial = RunLayout.partial(folder.resolve(RunLayout.LINEAGE));
        Path complete = folder.resolve(RunLayout.LINEAGE);
        if (!Files.exists(partial) && Files.exists(complete)) {
            Files.move(complete, partial);
        }
        String damaged = "cannot resume from the checkpoint in " + folder + ": the lineage table ";
        String fix = "; the folder was changed since the checkpoint was written, start the run again"
                + " (without --resume, with --force)";
        if (!Files.exists(partial)) {
            throw new IOException(damaged + "(" + partial.getFileName() + ") is missing" + fix);
        }
        long size = Files.size(partial);
        if (size < length) {
            throw new IOException(damaged + "holds " + size + " bytes but held " + length + " at the checkpoint" + fix);
        }
        CRC32 prefix = prefixCrc(partial, length);
        if (prefix.getValue() != crc) {
            throw new IOException(damaged + "does not hold the rows it held at the checkpoint" + fix);
        }
        return new LineageFiles(folder, fates, length, prefix, threeD);
    }

    /** The CRC-32 of the first {@code length} bytes of {@code file}, ready to go on with what follows. */
    private static CRC32 prefixCrc(Path file, long length) throws IOException {
        CRC32 crc = new CRC32();
        byte[] buffer = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(file)) {
            long left = length;
            while (left > 0) {
                int read = in.read(buffer, 0, (int) Math.min(buffer.length, left));
                if (read < 0) {
                    break;
                }
                crc.update(buffer, 0, read);
                left -= read;
            }
        }
        return crc;
    }

    /**
     * Opens the table; with {@code resumeAt >= 0} it is cut back to that many bytes, whose
     * checksum {@code crc} already holds, and continued.
     */
    private LineageFiles(Path folder, List<String> fates, long resumeAt, CRC32 crc, boolean threeD)
            throws IOException {
        this.threeD = threeD;
        this.folder = folder;
        this.partial = RunLayout.partial(folder.resolve(RunLayout.LINEAGE));
        this.fates = List.copyOf(fates);
        this.crc = crc;
        if (resumeAt >= 0) {
            try (FileChannel channel = FileChannel.open(partial, StandardOpenOption.WRITE)) {
                channel.truncate(resumeAt);
            }
        }
        OutputStream raw = resumeAt >= 0 ? Files.newOutputStream(partial, StandardOpenOption.APPEND)
                : Files.newOutputStream(partial);
        this.printer = RunTables.printer(new BufferedWriter(new OutputStreamWriter(new CheckedOutputStream(raw, crc),
                StandardCharsets.UTF_8)));
        if (resumeAt < 0) {
            printer.printRecord(RunTables.lineageHeader(threeD));
        }
    }

    /** Flushes what is written and returns the partial table's length in bytes (for checkpoints). */
    public long flushedLength() throws IOException {
        printer.flush();
        return Files.size(partial);
    }

    /**
     * The CRC-32 of the table as flushed so far (for checkpoints, beside {@link #flushedLength});
     * kept as the bytes are written, so a checkpoint never reads the table back.
     */
    public long flushedCrc() throws IOException {
        printer.flush();
        return crc.getValue();
    }

    @Override
    public void accept(LineageRecord r) {
        try {
            printer.printRecord(RunTables.lineageRow(r, fates, threeD));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + partial, e);
        }
    }

    /**
     * Closes the table of a run that did not finish, leaving it under its temporary name (so no
     * file looks finished; a checkpoint can still resume from it).
     */
    public void abandon() throws IOException {
        printer.close();
    }

    /** Completes the table (renamed into place), then writes the trees from it. */
    @Override
    public void close() throws IOException {
        printer.close();
        Path table = folder.resolve(RunLayout.LINEAGE);
        Files.move(partial, table, StandardCopyOption.REPLACE_EXISTING);
    }

    /** Writes {@code lineage.nwk} from a finished lineage table, at simulated end time {@code end}. */
    public static void writeTrees(Path table, double end, Writer out) throws IOException {
        Map<Long, List<Long>> children = new HashMap<>();
        Map<Long, String> label = new HashMap<>();
        Map<Long, Double> length = new HashMap<>();
        List<Long> roots = new ArrayList<>();
        try (Reader in = Files.newBufferedReader(table,
                StandardCharsets.UTF_8); CSVParser parser = RunTables.parser(in)) {
            for (CSVRecord r : parser) {
                long id = Long.parseLong(r.get("id"));
                long parent = RunTables.parseId(r.get("parent_id"));
                String fate = r.get("fate_at_end").isEmpty() ? r.get("fate_at_division") : r.get("fate_at_end");
                label.put(id, "c" + id + "_" + fate.replaceAll("[^A-Za-z0-9_-]", "_"));
                double birth = RunTables.parseNumber(r.get("birth_time_h"));
                double division = RunTables.parseNumber(r.get("division_time_h"));
                double death = RunTables.parseNumber(r.get("death_time_h"));
                double last = !Double.isNaN(division) ? division : !Double.isNaN(death) ? death : end;
                length.put(id, last - birth);
                if (parent < 0) {
                    roots.add(id);
                } else {
                    children.computeIfAbsent(parent, k -> new ArrayList<>()).add(id);
                }
            }
        }
        roots.sort(Long::compare);
        for (long root : roots) {
            out.write(newick(root, children, label, length));
            out.write(";\n");
        }
    }

    /** One tree in Newick form, built without recursion (trees can be deep). */
    private static String newick(long root, Map<Long, List<Long>> children, Map<Long, String> label,
            Map<Long, Double> length) {
        StringBuilder sb = new StringBuilder();
        Deque<Object> stack = new ArrayDeque<>();
        stack.push(root);
        while (!stack.isEmpty()) {
            Object item = stack.pop();
            if (item instanceof String text) {
                sb.append(text);
                continue;
            }
            long id = (Long) item;
            List<Long> kids = children.getOrDefault(id, List.of());
            String tail = label.get(id) + ":" + RunTables.number(length.get(id));
            if (kids.isEmpty()) {
                sb.append(tail);
                continue;
            }
            sb.append('(');
            stack.push(")" + tail);
            for (int k = kids.size() - 1; k >= 0; k--) {
                stack.push(kids.get(k));
                if (k > 0) {
                    stack.push(",");
                }
            }
        }
        return sb.toString();
    }
}
