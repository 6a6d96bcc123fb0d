package org.fatefield.engine.tissue;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.field.AmplitudeVariability;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.lineage.Ancestry;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.lineage.LineageSink;
import org.fatefield.engine.mechanics.OverlapRepulsion;
import org.fatefield.engine.parallel.BlockParallel;
import org.fatefield.engine.record.TimeSeries;
import sim.engine.Schedule;
import sim.engine.SimState;

/**
 * A growing tissue of cells, each carrying its own noisy copy of a switch circuit whose
 * parameters the local morphogen sets.
 *
 * <p>MASON's schedule runs one {@link TissueTick} per time step; inside it the cells are stepped
 * in one plain loop (a schedule entry per cell costs a heap operation per cell per step). One
 * tick: (1) advance the morphogen field; (2) each cell reads its local morphogen, maps it to
 * circuit parameters, advances its circuit and ages; (3) cells past their cycle time divide, in
 * order of id, sharing molecules between daughters; (4) overlaps relax; (5) when a record is due,
 * fates are classified and counted, and then every {@link TissueObserver} sees the new state. Every cell draws only from its own stream, derived
 * from the seed and its id. Every few steps the population is reordered block by block in space
 * so that the cell loop reads the morphogen grid (and the cells) with good memory locality.
 */
public final class Tissue extends SimState {

    private static final long PLACEMENT_STREAM = -1L;
    private static final Comparator<Cell> BY_ID = Comparator.comparingLong(Cell::id);

    /** Steps between spatial reorderings of the population (for memory locality). */
    private int reorderEvery = 10;
    /** Steps between relocations of the cells in memory in stepping order (see CellPopulation). */
    private int relocateEvery = 100;
    private final List<TissueObserver> observers = new ArrayList<>();

    private final TissueSpec spec;
    private final RandomStreams streams;
    private CellPopulation population;
    private MorphogenField field;
    private MorphogenField[] fields;
    private TimeSeries series;
    private final int threads;
    private BlockParallel pool;
    private OverlapRepulsion mechanics;
    /** Steps between mechanics relaxations (multi-rate stepping, {@link Timing#mechanicsEvery}). */
    private int mechanicsEvery = 1;
    private CellDivision division;
    private CellLoop cellLoop;
    /** Which cells the last cell loop found ready to divide, by population index. */
    private boolean[] ready = new boolean[0];
    private long steps;
    private double[] amplitudeFactors;
    private double blockSide;
    private LineageSink lineage = LineageSink.NONE;
    private Ancestry ancestry;
    private boolean lineageClosed;

    /** A tissue following {@code spec}, reproducible from {@code seed}, stepped on one thread. */
    public Tissue(TissueSpec spec, long seed) {
        this(spec, seed, 1);
    }

    /**
     * A tissue stepped on {@code threads} threads; the result is the same for any thread count.
     */
    public Tissue(TissueSpec spec, long seed, int threads) {
        super(seed);
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        this.spec = spec;
        this.streams = RandomStreams.of(seed);
        this.threads = threads;
    }

    @Override
    public void start() {
        super.start();
        GrowthSpec growth = spec.growth();
        population = new CellPopulation();
        List<MorphogenSpec> specs = spec.fields();
        fields = new MorphogenField[specs.size()];
        amplitudeFactors = new double[fields.length];
        for (int f = 0; f < fields.length; f++) {
            amplitudeFactors[f] = AmplitudeVariability.factor(specs.get(f).amplitudeCv(),
                    streams.stream(PLACEMENT_STREAM - 1 - f));
            fields[f] = new MorphogenField(specs.get(f).withProductionScaled(amplitudeFactors[f]), spec.width(),
                    spec.height(), spec.domain().depth(), spec.domain().periodicY());
        }
        field = fields[0];
        series = new TimeSeries(spec.fates().fateNames());
        if (pool != null) {
            pool.close();
        }
        pool = new BlockParallel(threads);
        cellLoop = new CellLoop(spec, threads, fields.length);
        mechanics = new OverlapRepulsion(spec.domain(), growth.repulsionRate(), growth.cellRadius(),
                growth.adhesion(), 0.2);
        mechanicsEvery = spec.timing().mechanicsEvery(Math.max(growth.repulsionRate(), growth.adhesion()));
        division = new CellDivision(spec, streams, cellLoop.serialRandom());
        steps = 0;
        ancestry = new Ancestry();
        lineageClosed = false;
        blockSide = 4 * spec.morphogen().gridSpacing();
        Founders.place(spec, streams, streams.stream(PLACEMENT_STREAM), cellLoop, population, ancestry);
        population.sortByBlock(blockSide, spec.width(), spec.height(), pool);
        population.relocateInOrder();
        record();
        schedule.scheduleRepeating(Schedule.EPOCH, 0, new TissueTick(this), 1.0);
    }

    /**
     * One time step; called by {@link TissueTick}. The stages, in order: fields; the cell loop
     * (in parallel); divisions in order of cell id; deaths; mechanics (every
     * {@link Timing#mechanicsEvery} steps, over that many steps, and at the last); memory layout; records
     * (time series when due, the live cells' lineage records after the last step); observers.
     * Nothing but memory order depends on the layout stage: divisions and deaths go by id, and
     * mechanics and field exchange sum in an order fixed by position and id.
     */
    void tick() {
        double dt = spec.timing().step();
        for (MorphogenField f : fields) {
            if (f.spec().exchange().active()) {
                f.gatherExchange(population.view(), spec.growth().cellRadius());
            }
            f.advance(dt, pool);
        }
        stepCells(dt, (steps + 1) * dt);
        steps++;
        division.divideReady(population, ready, ancestry, lineage, time());
        if (spec.growth().deathRate() > 0) {
            CellDeaths.remove(spec, population, cellLoop.serialRandom(), lineage, dt, time());
        }
        long sinceMechanics = steps % mechanicsEvery;
        if (sinceMechanics == 0 || steps == spec.timing().totalSteps()) {
            mechanics.relax(population, dt * (sinceMechanics == 0 ? mechanicsEvery : sinceMechanics), pool,
                    cellLoop.largestVolume());
        }
        if (steps % reorderEvery == 0) {
            population.sortByBlock(blockSide, spec.width(), spec.height(), pool);
        }
        if (steps % relocateEvery == 0) {
            population.relocateInOrder();
        }
        if (steps % spec.timing().stepsPerRecord() == 0 || steps == spec.timing().totalSteps()) {
            record();
        }
        if (finished()) {
            closeLineage();
        }
        for (TissueObserver observer : observers) {
            observer.afterStep(this);
        }
    }

    /** The cell stage of the tick (see {@link CellLoop}). */
    private void stepCells(double dt, double end) {
        ready = cellLoop.step(population, fields, dt, end, pool);
    }

    private void record() {
        int[] counts = new int[spec.fates().fateCount()];
        for (Cell cell : population.view()) {
            int fate = spec.fates().classify(cell.liveState());
            cell.setFate(fate, time());
            counts[fate]++;
        }
        series.add(new TimeSeries.Row(time(), counts, population.size(), field.mean()));
    }

    /** One stage of the tick, for benchmarks that time it alone. */
    public enum Stage { CELLS, FIELDS, MECHANICS }

    /**
     * Runs one stage of a tick (the cells: signal, parameters, circuit, ageing; every field; or
     * one mechanics relaxation) without time advancing or division: for benchmarks only.
     */
    public void stepOnly(Stage stage) {
        double dt = spec.timing().step();
        switch (stage) {
            case CELLS -> stepCells(dt, time() + dt);
            case FIELDS -> {
                for (MorphogenField f : fields) {
                    f.advance(dt, pool);
                }
            }
            case MECHANICS -> mechanics.relax(population, dt, pool, cellLoop.largestVolume());
        }
    }

    /**
     * Writes everything the run needs to continue (cells with their random streams, the fields,
     * the records so far, the ancestry, the step count). Call between ticks.
     */
    public void writeCheckpoint(DataOutputStream out) throws IOException {
        TissueCheckpoint.write(this, out);
    }

    /**
     * Restores a checkpoint written by {@link #writeCheckpoint} from a run of the same scenario and
     * seed; call after {@link #start()}. The run then continues exactly as the original would have.
     */
    public void readCheckpoint(DataInputStream in) throws IOException {
        TissueCheckpoint.read(this, in);
    }

    /** The live population, for the checkpoint code. */
    CellPopulation population() {
        return population;
    }

    /** Sets the step count and the records, for the checkpoint code. */
    void restoreProgress(long restoredSteps, TimeSeries restoredSeries) {
        this.steps = restoredSteps;
        this.series = restoredSeries;
    }

    /** Runs every remaining step. */
    public void runToEnd() {
        advance(Long.MAX_VALUE);
    }

    /**
     * Runs up to {@code maxSteps} steps, fewer if the run finishes first; every driver (the run
     * command, the benchmark, the live window) steps the tissue through here, and whatever must
     * happen between steps is a {@link TissueObserver}.
     */
    public void advance(long maxSteps) {
        for (long k = 0; k < maxSteps && !finished(); k++) {
            schedule.step(this);
        }
    }

    /**
     * Adds an observer, called after every step in the order added (after the tissue's own
     * records). Observers must not change the tissue.
     */
    public void addObserver(TissueObserver observer) {
        observers.add(Objects.requireNonNull(observer, "observer"));
    }

    /**
     * Sets how often the population is reordered in space and copied into new objects in that
     * order (both only for memory locality; results do not depend on them). Call before
     * {@link #start()}.
     *
     * @param reorder  steps between spatial reorderings, at least 1 (default 10)
     * @param relocate steps between relocations in memory, at least 1 (default 100)
     */
    public void setMemoryLayout(int reorder, int relocate) {
        if (reorder < 1 || relocate < 1) {
            throw new IllegalArgumentException("reorder and relocate intervals must be at least 1 step, got "
                    + reorder + " and " + relocate);
        }
        this.reorderEvery = reorder;
        this.relocateEvery = relocate;
    }

    /**
     * Sends lineage records to {@code sink}: one per division as it happens and, on
     * {@link #closeLineage()}, one per live cell. Set before {@link #start()}.
     */
    public void setLineageSink(LineageSink sink) {
        this.lineage = sink;
    }

    /**
     * Emits the records of the cells alive now, in order of id; the tick calls it after the last
     * step, so a finished run's lineage is complete.
     */
    private void closeLineage() {
        if (lineageClosed) {
            return;
        }
        lineageClosed = true;
        for (Cell cell : cellsById()) {
            lineage.accept(new LineageRecord(cell.id(), cell.parentId(), cell.generation(), cell.birthTime(),
                    Double.NaN, cell.birthX(), cell.birthY(), cell.birthZ(), -1, cell.fate(), cell.fateSince(), Double.NaN,
                    cell.birthVolume(), cell.volume(), cell.firstEntry()));
        }
    }

    /** Mother of every cell ever born. */
    public Ancestry ancestry() {
        return ancestry;
    }

    /** Stops the worker threads (also stopped by {@link #start()} before new ones). */
    @Override
    public void finish() {
        super.finish();
        if (pool != null) {
            pool.close();
            pool = null;
        }
    }

    /** Threads the cells are stepped on. */
    public int threads() {
        return threads;
    }

    /** True once the run's duration has been simulated. */
    public boolean finished() {
        return steps >= spec.timing().totalSteps();
    }

    /** Simulated time (h). */
    public double time() {
        return steps * spec.timing().step();
    }

    /** Steps taken. */
    public long steps() {
        return steps;
    }

    /** The run's specification. */
    public TissueSpec spec() {
        return spec;
    }

    /** Live cells, in population order (read-only; the order is a memory layout, not a meaning). */
    public List<Cell> cells() {
        return population.view();
    }

    /** Live cells in order of id (a new list): the order every table is written in. */
    public List<Cell> cellsById() {
        List<Cell> sorted = new ArrayList<>(population.view());
        sorted.sort(BY_ID);
        return sorted;
    }

    /**
     * The live cell with {@code id}, if it is alive: a linear search, for viewers that follow a
     * cell (cell objects are replaced when the population is relocated; ids never change).
     */
    public Optional<Cell> cellById(long id) {
        for (Cell cell : population.view()) {
            if (cell.id() == id) {
                return Optional.of(cell);
            }
        }
        return Optional.empty();
    }

    /** Every field, the primary morphogen first. */
    public List<MorphogenField> fields() {
        return List.of(fields);
    }

    /** The level of the control field (the one the first coupling reads) at {@code cell} now. */
    public double signalAt(Cell cell) {
        return controlField().sample(cell.x(), cell.y(), cell.z());
    }

    /** The factor this tissue drew for field {@code f}'s production (1 without amplitude variability). */
    public double amplitudeFactor(int f) {
        return amplitudeFactors[f];
    }

    /** The field the control parameter (the first coupling) reads. */
    public MorphogenField controlField() {
        return fields[spec.mapping().controlField()];
    }

    /** The primary morphogen field. */
    public MorphogenField field() {
        return field;
    }

    /** The recorded fate counts. */
    public TimeSeries series() {
        return series;
    }
}
