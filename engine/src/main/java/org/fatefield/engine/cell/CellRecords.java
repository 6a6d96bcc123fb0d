package org.fatefield.engine.cell;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;

/**
 * A cell as a checkpoint record: everything about it, its random stream's state included, so
 * that {@link #read} rebuilds a cell identical to the one {@link #write} was given. Fields go in
 * a fixed order as big-endian values ({@link DataOutputStream}); arrays as a length and values.
 */
public final class CellRecords {

    /** Longest state or score array a stored cell may hold (far more species than any circuit has). */
    private static final int MAX_STORED_ARRAY = 1 << 16;

    private CellRecords() {
    }

    /** Writes {@code cell} to {@code out}. */
    public static void write(Cell cell, DataOutputStream out) throws IOException {
        out.writeLong(cell.id());
        out.writeLong(cell.parentId());
        out.writeInt(cell.generation());
        out.writeDouble(cell.birthTime());
        out.writeDouble(cell.cycleTime());
        writeArray(out, cell.liveState());
        out.writeLong(cell.stream0);
        out.writeLong(cell.stream1);
        out.writeDouble(cell.x());
        out.writeDouble(cell.y());
        out.writeDouble(cell.z());
        out.writeDouble(cell.birthVolume());
        out.writeDouble(cell.volume());
        out.writeInt(cell.fate);
        out.writeDouble(cell.fateSince);
        out.writeFloat(cell.firstEntry);
        out.writeFloat(cell.birthX);
        out.writeFloat(cell.birthY);
        out.writeFloat(cell.birthZ);
        writeArray(out, cell.scores);
    }

    /**
     * Reads a cell written by {@link #write}.
     *
     * @throws IOException if the stream ends early or holds an array longer than any cell has
     */
    public static Cell read(DataInputStream in) throws IOException {
        long id = in.readLong();
        long parentId = in.readLong();
        int generation = in.readInt();
        double birthTime = in.readDouble();
        double cycleTime = in.readDouble();
        double[] state = readArray(in);
        long[] stream = {in.readLong(), in.readLong()};
        double x = in.readDouble();
        double y = in.readDouble();
        double z = in.readDouble();
        double birthVolume = in.readDouble();
        double volume = in.readDouble();
        int fate = in.readInt();
        float fateSince = (float) in.readDouble();
        float firstEntry = in.readFloat();
        float birthX = in.readFloat();
        float birthY = in.readFloat();
        float birthZ = in.readFloat();
        double[] scores = readArray(in);
        Cell cell = new Cell(id, parentId, generation, birthTime, cycleTime, state, stream, birthX, birthY, birthZ,
                birthVolume, volume);
        cell.moveTo(x, y, z);
        cell.fate = (short) fate;
        cell.fateSince = fateSince;
        cell.firstEntry = firstEntry;
        cell.scores = scores.length == 0 ? Cell.NO_SCORES : scores;
        return cell;
    }

    private static void writeArray(DataOutputStream out, double[] values) throws IOException {
        out.writeInt(values.length);
        for (double v : values) {
            out.writeDouble(v);
        }
    }

    private static double[] readArray(DataInputStream in) throws IOException {
        int length = in.readInt();
        if (length < 0 || length > MAX_STORED_ARRAY) {
            throw new IOException("a cell record holds an array of " + length + " values (at most "
                    + MAX_STORED_ARRAY + "): the checkpoint is damaged");
        }
        double[] values = new double[length];
        for (int i = 0; i < values.length; i++) {
            values[i] = in.readDouble();
        }
        return values;
    }
}
