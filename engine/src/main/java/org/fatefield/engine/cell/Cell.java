package org.fatefield.engine.cell;

import java.util.Arrays;
import org.fatefield.circuits.random.XoroshiroStep;
import org.fatefield.engine.division.SizeControl;

/**
 * One cell: where it is, how far through its cycle, and its own copy of the circuit.
 *
 * <p>Each cell draws only from its own random stream, derived from the run seed and its id, so
 * the tissue's history does not depend on the order or thread in which cells are stepped. The
 * stream's two state words are fields of the cell (a million cells then need a million fewer
 * objects), but the cell is not itself a random source: only a {@link CellRandom} pointed at it
 * draws, and the architecture test allows that only inside the engine's tick, so a viewer
 * cannot change a run by drawing from a cell.
 * The mutators are for the engine's tick; everything else only reads.
 */
public final class Cell {

    /** State words of the cell's own xoroshiro128++ stream, stepped by {@link CellRandom}. */
    long stream0;
    long stream1;

    /** Ids fit in 31 bits (the ancestry's limit), so ints hold them: 8 bytes a cell. */
    private final int id;
    private final int parentId;
    /** Divisions since the founder; shorts (this and fate) help keep the cell object at 96 bytes. */
    private final short generation;
    private final double birthTime;
    /** Drawn cycle time in single precision (1e-6 h at 16 h, far below any time step), to fit 96 bytes. */
    private final float cycleTime;
    private final double[] state;
    /**
     * Where the cell's position (x, y, z; z is 0 in a flat tissue) and volume live: four doubles
     * from {@code base}. In a population they are its {@link CellPopulation} place array, so the
     * mechanics streams 32 bytes a cell instead of whole cell objects; a cell outside one has an
     * array of its own.
     */
    double[] place;
    int base;
    private final double birthVolume;
    short fate = -1;
    /** A recording time, in single precision (as firstEntry). */
    float fateSince = Float.NaN;
    /** Time this cell itself first entered the timed fate; a float fills the object's padding (no extra heap). */
    float firstEntry = Float.NaN;
    /** Birth position in single precision (6e-5 µm at 1000 µm): three floats fit where two doubles were. */
    final float birthX;
    final float birthY;
    final float birthZ;
    double[] scores = NO_SCORES;
    static final double[] NO_SCORES = new double[0];

    /**
     * A cell. A founder is born before time 0 (a negative birth time) so that it starts part-way
     * through its cycle.
     *
     * @param id          unique id, never reused
     * @param parentId    id of the mother, or -1 for a founder cell
     * @param generation  divisions since the founder (founders are generation 0)
     * @param birthTime   time of birth (h)
     * @param cycleTime   time from birth to division (h)
     * @param state       circuit state (concentrations), owned by the cell from now on
     * @param stream      the two state words of the cell's own random stream (see RandomStreams.seedWords)
     * @param x           position (µm)
     * @param y           position (µm)
     * @param birthVolume volume at birth, in units of a mean newborn cell, greater than 0
     * @param volume      volume now, in the same units, greater than 0
     */
    public Cell(long id, long parentId, int generation, double birthTime, double cycleTime, double[] state,
            long[] stream, double x, double y, double birthVolume, double volume) {
        this(id, parentId, generation, birthTime, cycleTime, state, stream, x, y, 0.0, birthVolume, volume);
    }

    /**
     * A cell in a three-dimensional tissue, at (x, y, z) µm; otherwise as the flat cell.
     *
     * @throws IllegalArgumentException if a volume is not greater than 0 or the generation is
     *                                  past {@value Short#MAX_VALUE}
     */
    public Cell(long id, long parentId, int generation, double birthTime, double cycleTime, double[] state,
            long[] stream, double x, double y, double z, double birthVolume, double volume) {
        this(id, parentId, generation, birthTime, cycleTime, state, stream, x, y, z, birthVolume, volume, null, 0);
    }

    /**
     * The cell of the public constructor, whose position and volume are the four doubles of
     * {@code existing} from {@code at} if it is not null (they are left as they are), or a new
     * array of its own holding (x, y, z, volume).
     */
    private Cell(long id, long parentId, int generation, double birthTime, double cycleTime, double[] state,
            long[] stream, double x, double y, double z, double birthVolume, double volume, double[] existing,
            int at) {
        XoroshiroStep.checkState(stream[0], stream[1]);
        if (id < 0 || id >= Integer.MAX_VALUE || parentId < -1 || parentId >= Integer.MAX_VALUE) {
            throw new IllegalArgumentException("cell id " + id + " and parent id " + parentId + " must be from 0 (-1"
                    + " for a founder's parent) to " + (Integer.MAX_VALUE - 1));
        }
        if (generation < 0 || generation > Short.MAX_VALUE) {
            throw new IllegalArgumentException("cell " + id + ": generation must be from 0 to " + Short.MAX_VALUE
                    + ", got " + generation);
        }
        this.stream0 = stream[0];
        this.stream1 = stream[1];
        if (!(birthVolume > 0) || !(volume > 0)) {
            throw new IllegalArgumentException("cell " + id + ": volumes must be greater than 0, got birth volume "
                    + birthVolume + " and volume " + volume);
        }
        this.birthVolume = birthVolume;
        this.id = (int) id;
        this.parentId = (int) parentId;
        this.generation = (short) generation;
        this.birthTime = birthTime;
        this.cycleTime = (float) cycleTime;
        this.state = state;
        this.place = existing != null ? existing : new double[] {x, y, z, volume};
        this.base = existing != null ? at : 0;
        this.birthX = (float) x;
        this.birthY = (float) y;
        this.birthZ = (float) z;
    }

    /**
     * An identical cell in a new object, its state array allocated right after it (its random
     * stream continues from where this one's is), whose position and volume are this cell's
     * place (the population's slot it occupies). Copying the population in stepping order lays
     * the cells out in memory in that order, so the cell loop reads memory sequentially instead
     * of missing the cache on every cell.
     */
    Cell relocated() {
        Cell cell = new Cell(id, parentId, generation, birthTime, cycleTime, state.clone(), new long[] {stream0,
                stream1}, birthX, birthY, birthZ, birthVolume, volume(), place, base);
        cell.fate = fate;
        cell.fateSince = fateSince;
        cell.firstEntry = firstEntry;
        cell.scores = scores.length == 0 ? NO_SCORES : scores.clone();
        return cell;
    }

    /** Copies this cell's position and volume to {@code places} from {@code at}, and keeps them there from now on. */
    void attach(double[] places, int at) {
        System.arraycopy(place, base, places, at, 4);
        place = places;
        base = at;
    }

    /** Gives this cell an array of its own for its position and volume (it is leaving its population). */
    void detach() {
        place = Arrays.copyOfRange(place, base, base + 4);
        base = 0;
    }

    /** Unique id. */
    public long id() {
        return id;
    }

    /** Mother's id, -1 for a founder. */
    public long parentId() {
        return parentId;
    }

    /** Divisions since the founder. */
    public int generation() {
        return generation;
    }

    /** Birth time (h). */
    public double birthTime() {
        return birthTime;
    }

    /** Drawn cycle time (h). */
    public double cycleTime() {
        return cycleTime;
    }

    /** Position along x (µm). */
    public double x() {
        return place[base];
    }

    /** Position along y (µm). */
    public double y() {
        return place[base + 1];
    }

    /** Position along z (µm), 0 in a flat tissue. */
    public double z() {
        return place[base + 2];
    }

    /** Time since birth (h) at time {@code now} (h). */
    public double age(double now) {
        return now - birthTime;
    }

    /** Fate index, as last classified. */
    public int fate() {
        return fate;
    }

    /** A copy of the circuit state (concentrations). */
    public double[] state() {
        return state.clone();
    }

    /** Concentration of species {@code i}. */
    public double concentration(int i) {
        return state[i];
    }

    /**
     * Radius (µm) for a cell of newborn radius {@code r0}: in two dimensions a cell's area is its
     * volume, so the radius scales as the square root of the volume.
     */
    public double radius(double r0) {
        return discRadius(r0, volume());
    }

    /** Radius (µm) of a flat cell of {@code volume} and newborn radius {@code r0}, as {@link #radius(double)}. */
    public static double discRadius(double r0, double volume) {
        return r0 * Math.sqrt(volume);
    }

    /** Radius (µm) of a 3-D cell of {@code volume} and newborn radius {@code r0}, as {@link #sphereRadius(double)}. */
    public static double sphereRadius(double r0, double volume) {
        return r0 * Math.cbrt(volume);
    }

    /** Radius (µm) in a three-dimensional tissue, where the radius scales as the cube root of the volume. */
    public double sphereRadius(double r0) {
        return sphereRadius(r0, volume());
    }

    /** Volume now, in units of a mean newborn cell. */
    public double volume() {
        return place[base + 3];
    }

    /** Volume at birth, in units of a mean newborn cell. */
    public double birthVolume() {
        return birthVolume;
    }

    /** The live circuit state, advanced in place by the tick. */
    public double[] liveState() {
        return state;
    }

    /** Moves the cell to (x, y) µm. */
    public void moveTo(double newX, double newY) {
        place[base] = newX;
        place[base + 1] = newY;
    }

    /** Moves the cell to (x, y, z) µm. */
    public void moveTo(double newX, double newY, double newZ) {
        place[base] = newX;
        place[base + 1] = newY;
        place[base + 2] = newZ;
    }

    /**
     * Grows the cell's volume to its size at time {@code now} (h) by {@code control}'s law; with
     * {@code dilute}, the concentrations scale by {@code V(before) / V(after)}, exactly the
     * dilution the growth causes since the last call.
     */
    public void grow(double now, SizeControl control, boolean dilute) {
        double before = place[base + 3];
        double volume = control.volume(birthVolume, now - birthTime, cycleTime);
        place[base + 3] = volume;
        if (dilute) {
            double factor = before / volume;
            for (int i = 0; i < state.length; i++) {
                state[i] *= factor;
            }
        }
    }

    /** True once the cell should divide under {@code control} at time {@code now} (h). */
    public boolean readyToDivide(SizeControl control, double now) {
        return control.ready(birthVolume, volume(), now - birthTime, cycleTime);
    }

    /**
     * Time (h) at which this cell, in its own life, was first seen in the timed fate
     * ({@link org.fatefield.engine.fate.FateClassifier#firstPassageFate()}); NaN if not yet.
     * Kept in single precision (about 1e-3 h at 10^4 h).
     */
    public double firstEntry() {
        return shortest(firstEntry);
    }

    /** Notes that the cell is in the timed fate at {@code now}, if it had not been before. */
    public void noteInFirstPassageFate(double now) {
        if (Float.isNaN(firstEntry)) {
            firstEntry = (float) now;
        }
    }

    /** Records the cell's fate index at time {@code now}; notes when it last changed. */
    public void setFate(int value, double now) {
        if (value != fate) {
            fateSince = (float) now;
        }
        this.fate = (short) value;
    }

    /**
     * Time since when the cell has had its current fate, as seen at the recordings (the time it
     * last entered that fate's region of states, to the recording interval); NaN before any.
     */
    public double fateSince() {
        return shortest(fateSince);
    }

    /** Extrinsic-noise scores, one per noisy parameter (see ExtrinsicNoise); live array. */
    public double[] scores() {
        return scores;
    }

    /** Sets the extrinsic-noise scores (the array is kept). */
    public void setScores(double[] values) {
        this.scores = values;
    }

    /** Position along x at birth (µm), to single precision. */
    public double birthX() {
        return shortest(birthX);
    }

    /** Position along y at birth (µm), to single precision. */
    public double birthY() {
        return shortest(birthY);
    }

    /** Position along z at birth (µm), to single precision; 0 in a flat tissue. */
    public double birthZ() {
        return shortest(birthZ);
    }

    /** The shortest decimal of a float as a double, so 12.34f reads back as 12.34 and not 12.340000152. */
    private static double shortest(float value) {
        return Float.isNaN(value) ? Double.NaN : Double.parseDouble(Float.toString(value));
    }
}
