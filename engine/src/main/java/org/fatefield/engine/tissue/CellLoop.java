package org.fatefield.engine.tissue;

import java.util.Arrays;
import java.util.List;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.cell.CellRandom;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.SizeControl;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.parallel.BlockParallel;
import org.fatefield.engine.variability.ExtrinsicNoise;

/**
 * The cell stage of the tick, in parallel over blocks of cells: each cell reads every field at
 * its position, sets its parameters from them (and its extrinsic factors), advances its circuit
 * on its own random stream, grows, dilutes, and is marked if it is ready to divide. Each worker
 * has its own stepper, parameter and signal buffers and stream view, padded past a cache line
 * (false sharing made two threads slower than one). A state that is not a finite number stops
 * the tissue with a {@link SimulationFailure} naming the cell of lowest id, whatever the thread
 * count.
 */
final class CellLoop {

    /** Per worker, spaced a cache line apart: the lowest id whose state the loop found not finite. */
    private static final int PAD = 16;

    private final TissueSpec spec;
    private final int threads;
    private final CircuitStepper[] steppers;
    private final CellRandom[] randoms;
    private final double[][] params;
    private final double[][] signals;
    private final double[] baseParameters;
    private final int[] noisyIndices;
    private final long[] failedCell;
    private final int[] failedSpecies;
    private final double[] failedValue;
    /** Per worker, spaced a cache line apart: the largest cell volume the last pass left. */
    private final double[] largestVolume;
    /** Which cells the last pass found ready to divide, by population index. */
    private boolean[] ready = new boolean[0];

    CellLoop(TissueSpec spec, int threads, int fieldCount) {
        this.spec = spec;
        this.threads = threads;
        CircuitSetup circuit = spec.circuit();
        baseParameters = spec.mapping().base();
        noisyIndices = spec.extrinsic().stream().flatMapToInt(noise -> Arrays.stream(noise.indices())).distinct()
                .toArray();
        steppers = new CircuitStepper[threads];
        randoms = new CellRandom[threads];
        params = new double[threads][];
        CircuitStepper prototype = circuit.noise().stepper(circuit.network(), circuit.systemSize());
        for (int w = 0; w < threads; w++) {
            steppers[w] = w == 0 ? prototype : prototype.copy();
            randoms[w] = new CellRandom();
            params[w] = Arrays.copyOf(baseParameters, spec.mapping().parameterCount() + CircuitStepper.SCRATCH_PADDING);
        }
        signals = new double[threads][fieldCount + CircuitStepper.SCRATCH_PADDING];
        failedCell = new long[threads * PAD];
        Arrays.fill(failedCell, Long.MAX_VALUE);
        failedSpecies = new int[threads * PAD];
        failedValue = new double[threads * PAD];
        largestVolume = new double[threads * PAD];
        Arrays.fill(largestVolume, Double.NaN);
    }

    /**
     * The largest volume of any cell after the last pass (NaN before the first): an upper bound
     * on every volume until the next pass, as division and death only shrink or remove cells.
     */
    double largestVolume() {
        double largest = largestVolume[0];
        for (int w = 1; w < threads; w++) {
            largest = Math.max(largest, largestVolume[w * PAD]);
        }
        return largest;
    }

    /** The stream view of worker 0, for the serial stages (founders, division, death). */
    CellRandom serialRandom() {
        return randoms[0];
    }

    /**
     * Steps every cell of {@code cells} by {@code dt} to time {@code end}; returns the cells found
     * ready to divide, by population index (a buffer reused by the next pass).
     */
    boolean[] step(CellPopulation cells, MorphogenField[] fields, double dt, double end, BlockParallel pool) {
        ParameterMapping mapping = spec.mapping();
        boolean dilute = spec.growth().dilution();
        SizeControl size = spec.growth().size().control();
        List<ExtrinsicNoise> extrinsic = spec.extrinsic();
        FateClassifier fates = spec.fates();
        boolean timed = fates.firstPassageFate() >= 0;
        if (ready.length < cells.size()) {
            ready = new boolean[cells.size() + cells.size() / 4];
        }
        boolean[] readyNow = ready;
        for (int w = 0; w < threads; w++) {
            largestVolume[w * PAD] = 0;
        }
        pool.forEach(cells.size(), (from, to, worker) -> {
            CircuitStepper circuit = steppers[worker];
            CellRandom random = randoms[worker];
            double[] p = params[worker];
            double[] levels = signals[worker];
            double largest = 0;
            for (int i = from; i < to; i++) {
                Cell cell = cells.get(i);
                for (int f = 0; f < fields.length; f++) {
                    levels[f] = fields[f].sample(cell.x(), cell.y(), cell.z());
                }
                if (!extrinsic.isEmpty()) {
                    restoreNoisy(p);
                }
                mapping.applySignals(levels, p);
                for (int k = 0; k < extrinsic.size(); k++) {
                    extrinsic.get(k).apply(cell.scores()[k], p);
                }
                double[] state = cell.liveState();
                circuit.advance(state, p, dt, random.of(cell));
                if (timed && fates.inFirstPassageFate(state)) {
                    cell.noteInFirstPassageFate(end);
                }
                for (int s = 0; s < state.length; s++) {
                    if (!Double.isFinite(state[s]) && cell.id() < failedCell[worker * PAD]) {
                        failedCell[worker * PAD] = cell.id();
                        failedSpecies[worker * PAD] = s;
                        failedValue[worker * PAD] = state[s];
                    }
                }
                cell.grow(end, size, dilute);
                largest = Math.max(largest, cell.volume());
                readyNow[i] = cell.readyToDivide(size, end);
            }
            largestVolume[worker * PAD] = Math.max(largestVolume[worker * PAD], largest);
        });
        checkFinite(end);
        return readyNow;
    }

    /**
     * Stops the run if the pass left any state that is not a finite number, naming the cell of
     * lowest id (the same whatever the thread count).
     */
    private void checkFinite(double now) {
        int worst = -1;
        for (int w = 0; w < threads; w++) {
            if (failedCell[w * PAD] != Long.MAX_VALUE && (worst < 0 || failedCell[w * PAD] < failedCell[worst * PAD])) {
                worst = w;
            }
        }
        if (worst >= 0) {
            throw new SimulationFailure(failedCell[worst * PAD], now,
                    spec.circuit().network().speciesNames().get(failedSpecies[worst * PAD]), failedValue[worst * PAD]);
        }
    }

    /** Resets the parameters extrinsic noise multiplies to their base values. */
    private void restoreNoisy(double[] p) {
        for (int index : noisyIndices) {
            p[index] = baseParameters[index];
        }
    }
}
