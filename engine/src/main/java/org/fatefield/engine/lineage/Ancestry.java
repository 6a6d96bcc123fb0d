package org.fatefield.engine.lineage;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.Arrays;

/**
 * The mother of every cell ever born, by id (ids are dense from 0), kept in memory for lineage
 * statistics: four bytes per cell ever born (ids up to 2^31 - 1), while the full records go to disk.
 */
public final class Ancestry {

    private int[] parent = new int[1024];
    private long size;

    /** Records that cell {@code id} is a daughter of {@code parentId} (-1 for a founder). */
    public void add(long id, long parentId) {
        if (id >= Integer.MAX_VALUE) {
            throw new IllegalStateException("more than " + Integer.MAX_VALUE + " cells born in one run; the ancestry"
                    + " table holds at most that many (shorten the run or lower the founder count)");
        }
        if (id >= parent.length) {
            parent = Arrays.copyOf(parent, (int) Math.min(Integer.MAX_VALUE - 8, Math.max(id + 1, 2L * parent.length)));
        }
        parent[(int) id] = (int) parentId;
        size = Math.max(size, id + 1);
    }

    /** Writes the table (checkpoints). */
    public void write(DataOutputStream out) throws IOException {
        out.writeLong(size);
        for (long i = 0; i < size; i++) {
            out.writeInt(parent[(int) i]);
        }
    }

    /**
     * Reads a table written by {@link #write}, replacing this one's contents; it must hold
     * exactly the {@code ids} cells born so far.
     */
    public void read(DataInputStream in, long ids) throws IOException {
        long n = in.readLong();
        if (n != ids) {
            throw new IOException("the checkpoint's ancestry holds " + n + " cells where " + ids + " were born: it is"
                    + " damaged; start the run again");
        }
        parent = new int[(int) Math.max(1024, n)];
        size = n;
        for (int i = 0; i < n; i++) {
            parent[i] = in.readInt();
        }
    }

    /** The mother of {@code id}, -1 for a founder. */
    public long parent(long id) {
        if (id < 0 || id >= size) {
            throw new IllegalArgumentException("no cell with id " + id);
        }
        return parent[(int) id];
    }

    /** The ancestor {@code k} generations above {@code id} (0: itself), -1 if the lineage is shorter. */
    public long ancestor(long id, int k) {
        long a = id;
        for (int i = 0; i < k && a >= 0; i++) {
            a = parent(a);
        }
        return a;
    }

    /** The founder of {@code id}'s clone. */
    public long founder(long id) {
        long a = id;
        while (parent(a) >= 0) {
            a = parent(a);
        }
        return a;
    }
}
