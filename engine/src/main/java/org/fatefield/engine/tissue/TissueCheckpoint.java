package org.fatefield.engine.tissue;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellRecords;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.record.TimeSeries;

/**
 * The binary checkpoint of a tissue: a magic number, the step count, the id counter, every live
 * cell (its random stream's state included), every field, the recorded rows and the ancestry.
 */
final class TissueCheckpoint {

    /**
     * "FFCKPT06": version 2 added cell volumes; 3 embedded random streams and a 4-byte ancestry;
     * 4 dropped the cells' age and signal (derived from the clock and the field); 5 added each
     * cell's first entry into the timed fate; 6 added z and birth z, birth positions as floats.
     */
    private static final long MAGIC = 0x4646434b50543036L;

    private TissueCheckpoint() {
    }

    static void write(Tissue tissue, DataOutputStream out) throws IOException {
        out.writeLong(MAGIC);
        out.writeLong(tissue.steps());
        out.writeLong(tissue.population().peekNextId());
        out.writeInt(tissue.cells().size());
        for (Cell cell : tissue.cells()) {
            CellRecords.write(cell, out);
        }
        for (MorphogenField f : tissue.fields()) {
            f.write(out);
        }
        out.writeInt(tissue.series().rows().size());
        for (TimeSeries.Row row : tissue.series().rows()) {
            out.writeDouble(row.time());
            int[] counts = row.fateCounts();
            out.writeInt(counts.length);
            for (int c : counts) {
                out.writeInt(c);
            }
            out.writeInt(row.population());
            out.writeDouble(row.meanMorphogen());
        }
        tissue.ancestry().write(out);
    }

    static void read(Tissue tissue, DataInputStream in) throws IOException {
        if (in.readLong() != MAGIC) {
            throw new IOException("not a tissue checkpoint of this Fatefield version (an older version's checkpoint"
                    + " cannot be resumed: start the run again)");
        }
        TissueSpec spec = tissue.spec();
        long steps = in.readLong();
        long nextId = in.readLong();
        int n = in.readInt();
        require(steps >= 0 && steps <= spec.timing().totalSteps(), "step count " + steps + " outside the run's 0 to "
                + spec.timing().totalSteps());
        require(n >= 0 && n <= 4 * WorkEstimate.MAX_CELLS && nextId >= n && nextId < Integer.MAX_VALUE,
                n + " cells with next id " + nextId);
        tissue.population().reset(nextId);
        int species = spec.circuit().network().speciesCount();
        for (int i = 0; i < n; i++) {
            Cell cell = CellRecords.read(in);
            require(cell.liveState().length == species && cell.scores().length <= spec.extrinsic().size()
                    && cell.id() >= 0 && cell.id() < nextId, "cell record " + i + " does not fit this scenario");
            tissue.population().add(cell);
        }
        for (MorphogenField f : tissue.fields()) {
            f.read(in);
        }
        TimeSeries series = new TimeSeries(tissue.spec().fates().fateNames());
        int rows = in.readInt();
        require(rows >= 0 && rows <= steps + 1, rows + " recorded rows after " + steps + " steps");
        for (int r = 0; r < rows; r++) {
            double time = in.readDouble();
            int fates = in.readInt();
            require(fates == spec.fates().fateCount(), "a recorded row with " + fates + " fates, not "
                    + spec.fates().fateCount());
            int[] counts = new int[fates];
            for (int k = 0; k < counts.length; k++) {
                counts[k] = in.readInt();
            }
            series.add(new TimeSeries.Row(time, counts, in.readInt(), in.readDouble()));
        }
        tissue.ancestry().read(in, nextId);
        tissue.restoreProgress(steps, series);
    }

    /** Refuses a checkpoint whose contents do not fit the run, with {@code what} was found. */
    private static void require(boolean ok, String what) throws IOException {
        if (!ok) {
            throw new IOException("the checkpoint does not fit this scenario (" + what + "): it is damaged or from"
                    + " another run; start the run again");
        }
    }
}
