package org.fatefield.scenarios.output;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.ByteArrayInputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;

/**
 * The checkpoint file of a run folder, {@code checkpoint.bin}: which scenario (its SHA-256) and
 * seed it belongs to, how long the streamed lineage table was, and the tissue's whole state.
 * Written atomically (temporary file, then rename), so a run killed at any moment leaves the last
 * complete checkpoint.
 */
final class Checkpoints {

    private final Path folder;
    private final Scenario scenario;
    private final long seed;

    Checkpoints(Path folder, Scenario scenario, long seed) {
        this.folder = folder;
        this.scenario = scenario;
        this.seed = seed;
    }

    /** A loaded checkpoint. */
    record Saved(long lineageBytes, byte[] state) {

        /** Restores the tissue state into a started tissue. */
        void restoreInto(Tissue tissue) throws IOException {
            tissue.readCheckpoint(new DataInputStream(new ByteArrayInputStream(state)));
        }
    }

    /** Writes a checkpoint of {@code tissue}. */
    void save(Tissue tissue, long lineageBytes) throws IOException {
        Path temporary = RunLayout.partial(folder.resolve(RunLayout.CHECKPOINT));
        try (DataOutputStream out = new DataOutputStream(new BufferedOutputStream(Files.newOutputStream(temporary)))) {
            out.writeUTF(scenario.sha256());
            out.writeLong(seed);
            out.writeLong(lineageBytes);
            tissue.writeCheckpoint(out);
        }
        Files.move(temporary, folder.resolve(RunLayout.CHECKPOINT), StandardCopyOption.REPLACE_EXISTING,
                StandardCopyOption.ATOMIC_MOVE);
    }

    /** Reads the folder's checkpoint, checking it belongs to this scenario and seed. */
    Saved load() throws IOException {
        Path file = folder.resolve(RunLayout.CHECKPOINT);
        if (!Files.exists(file)) {
            throw new IOException("nothing to resume: " + folder + " holds no " + RunLayout.CHECKPOINT
                    + " (run without --resume to start, with --checkpoint-every to save progress)");
        }
        try (DataInputStream in = new DataInputStream(new BufferedInputStream(Files.newInputStream(file)))) {
            String sha = in.readUTF();
            long savedSeed = in.readLong();
            if (!sha.equals(scenario.sha256()) || savedSeed != seed) {
                throw new IOException("the checkpoint in " + folder + " belongs to another scenario or seed (seed "
                        + savedSeed + "); resume with the same scenario file and --seed");
            }
            long lineageBytes = in.readLong();
            return new Saved(lineageBytes, in.readAllBytes());
        }
    }

    /** Removes the checkpoint of a finished run. */
    void delete() throws IOException {
        Files.deleteIfExists(folder.resolve(RunLayout.CHECKPOINT));
    }
}
