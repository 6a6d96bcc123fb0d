package org.fatefield.scenarios.output;

import java.io.BufferedOutputStream;
import java.io.ByteArrayInputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.zip.CRC32;
import java.util.zip.CheckedOutputStream;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;

/**
 * The checkpoint file of a run folder, {@code checkpoint.bin}: which scenario (its SHA-256) and
 * seed it belongs to, how long the streamed lineage table was and the CRC-32 of those bytes, and
 * the tissue's whole state, closed by a CRC-32 of everything before it. Written atomically
 * (temporary file, then rename), so a run killed at any moment leaves the last complete
 * checkpoint; a checkpoint cut short or altered is refused with a message, never half-read.
 */
final class Checkpoints {

    private static final long MAGIC = 0x4646434b50543035L;

    private final Path folder;
    private final Scenario scenario;
    private final long seed;

    Checkpoints(Path folder, Scenario scenario, long seed) {
        this.folder = folder;
        this.scenario = scenario;
        this.seed = seed;
    }

    /** A loaded checkpoint. */
    record Saved(long lineageBytes, long lineageCrc, byte[] state) {

        /** Restores the tissue state into a started tissue. */
        void restoreInto(Tissue tissue, Path file) throws IOException {
            try {
                tissue.readCheckpoint(new DataInputStream(new ByteArrayInputStream(state)));
            } catch (IOException | RuntimeException e) {
                throw new IOException(file + " passed its checksum but does not fit this scenario's tissue ("
                        + e.getMessage() + "); start the run again (without --resume, with --force)", e);
            }
        }
    }

    /** Writes a checkpoint of {@code tissue}, with the lineage table's length and checksum then. */
    void save(Tissue tissue, long lineageBytes, long lineageCrc) throws IOException {
        Path target = folder.resolve(RunLayout.CHECKPOINT);
        Path temporary = RunLayout.partial(target);
        CRC32 crc = new CRC32();
        try (OutputStream file = new BufferedOutputStream(Files.newOutputStream(temporary))) {
            DataOutputStream out = new DataOutputStream(new CheckedOutputStream(file, crc));
            out.writeLong(MAGIC);
            out.writeUTF(scenario.sha256());
            out.writeLong(seed);
            out.writeLong(lineageBytes);
            out.writeLong(lineageCrc);
            tissue.writeCheckpoint(out);
            out.flush();
            new DataOutputStream(file).writeLong(crc.getValue());
        }
        Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    /** Reads the folder's checkpoint, checking that it is whole and belongs to this scenario and seed. */
    Saved load() throws IOException {
        Path file = folder.resolve(RunLayout.CHECKPOINT);
        if (!Files.exists(file)) {
            throw new IOException("nothing to resume: " + folder + " holds no " + RunLayout.CHECKPOINT
                    + " (run without --resume to start, with --checkpoint-every to save progress)");
        }
        byte[] bytes = Files.readAllBytes(file);
        String damaged = file + " is damaged (cut short or altered since it was written), so the run cannot be"
                + " resumed from it; start the run again (without --resume, with --force)";
        if (bytes.length < 16) {
            throw new IOException(damaged);
        }
        CRC32 crc = new CRC32();
        crc.update(bytes, 0, bytes.length - 8);
        long stored = ByteBuffer.wrap(bytes, bytes.length - 8, 8).getLong();
        if (crc.getValue() != stored) {
            throw new IOException(damaged);
        }
        try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(bytes, 0, bytes.length - 8))) {
            if (in.readLong() != MAGIC) {
                throw new IOException(file + " is not a checkpoint of this Fatefield version; start the run again"
                        + " (without --resume, with --force)");
            }
            String sha = in.readUTF();
            long savedSeed = in.readLong();
            if (!sha.equals(scenario.sha256()) || savedSeed != seed) {
                throw new IOException("the checkpoint in " + folder + " belongs to another scenario or seed (seed "
                        + savedSeed + "); resume with the same scenario file and --seed");
            }
            long lineageBytes = in.readLong();
            long lineageCrc = in.readLong();
            return new Saved(lineageBytes, lineageCrc, in.readAllBytes());
        }
    }

    /** Removes the checkpoint of a finished run. */
    void delete() throws IOException {
        Files.deleteIfExists(folder.resolve(RunLayout.CHECKPOINT));
    }
}
