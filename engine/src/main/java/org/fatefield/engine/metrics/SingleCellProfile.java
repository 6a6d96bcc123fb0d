package org.fatefield.engine.metrics;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.circuits.sim.CircuitStepper;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.tissue.NoiseMode;
import org.fatefield.engine.tissue.TissueSpec;
import org.fatefield.engine.variability.ExtrinsicNoise;

/**
 * The noise-based predicted fate profile: the fraction of cells expected to reach each fate at
 * each position along the gradient, from the single-cell stochastic model alone. At each bin
 * centre x, {@code cells} independent cells are held at the parameters the fields set there
 * (the row-averaged fields at the end of the run), each with its own extrinsic factors, and
 * simulated from the founders' state for the run's duration with the tissue's method and step;
 * the fate rules then classify them. This is the commitment probability along the gradient,
 * against which the simulated profile shows what the tissue adds: division (partition noise,
 * inherited states), movement, and the field's rise from its initial value.
 *
 * @param centres          bin centres along x (µm), those of the simulated profile
 * @param fractions        {@code fractions[f][b]}: predicted fraction of bin b's cells in fate f
 * @param cellsPerPosition single cells simulated per bin
 * @param undefined        why there is no prediction, or empty when there is one
 */
public record SingleCellProfile(double[] centres, double[][] fractions, int cellsPerPosition, String undefined) {

    /** Largest number of circuit steps (or, for the exact method, estimated reactions) spent on a prediction. */
    public static final double WORK_LIMIT = 2e9;

    /** Keys of the predicted cells' streams, far from the cell ids and the tissue's own streams. */
    private static final long STREAM_BASE = Long.MIN_VALUE / 2;

    /** Copies the arrays. */
    public SingleCellProfile {
        centres = centres.clone();
        fractions = fractions.clone();
        for (int f = 0; f < fractions.length; f++) {
            fractions[f] = fractions[f].clone();
        }
    }

    /** No prediction, for the reason given. */
    public static SingleCellProfile undefined(String reason) {
        return new SingleCellProfile(new double[0], new double[0][0], 0, reason);
    }

    /** True when there is a prediction. */
    public boolean defined() {
        return undefined.isEmpty();
    }

    /**
     * The prediction for the tissue of {@code spec} whose fields ended as {@code fields}, at the
     * bin centres {@code centres}, reproducible from {@code seed} and the same for any
     * {@code threads}.
     */
    public static SingleCellProfile of(TissueSpec spec, List<MorphogenField> fields, double[] centres, long seed,
            int threads) {
        int cells = spec.fates().predictionCells();
        if (cells == 0) {
            return undefined("fates.predicted_cells is 0");
        }
        if (spec.circuit().noise() == NoiseMode.NONE && spec.extrinsic().isEmpty()) {
            return undefined("the circuit has no noise (noise = \"none\", no extrinsic variability): every cell at a"
                    + " position reaches the same state, which the fate-call boundary already predicts");
        }
        double work = work(spec, cells * (double) centres.length);
        if (work > WORK_LIMIT) {
            return undefined(String.format(Locale.ROOT, "it would take about %.2g %s, above %.0g;"
                    + " lower fates.predicted_cells", work, spec.circuit().noise() == NoiseMode.EXACT
                    ? "reactions" : "circuit steps", WORK_LIMIT));
        }
        int fates = spec.fates().fateCount();
        double[][] fractions = new double[fates][centres.length];
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            pool.submit(() -> IntStream.range(0, centres.length).parallel()
                    .forEach(b -> predictBin(spec, fields, centres[b], b, cells, seed, fractions))).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return undefined("interrupted");
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            return undefined("a single-cell simulation failed: " + cause.getMessage());
        } finally {
            pool.shutdown();
        }
        return new SingleCellProfile(centres, fractions, cells, "");
    }

    /** Simulates the cells of bin {@code b} and writes their fate fractions into {@code fractions[.][b]}. */
    private static void predictBin(TissueSpec spec, List<MorphogenField> fields, double x, int b, int cells,
            long seed, double[][] fractions) {
        ReactionNetwork network = spec.circuit().network();
        CircuitStepper stepper = spec.circuit().noise().stepper(network, spec.circuit().systemSize());
        double[] signals = new double[fields.size()];
        for (int f = 0; f < fields.size(); f++) {
            signals[f] = rowMean(fields.get(f), x);
        }
        double[] local = spec.mapping().base();
        spec.mapping().applySignals(signals, local);
        RandomStreams streams = RandomStreams.of(seed);
        List<ExtrinsicNoise> extrinsic = spec.extrinsic();
        double dt = spec.timing().step();
        long steps = spec.timing().totalSteps();
        int[] counts = new int[spec.fates().fateCount()];
        double[] p = new double[local.length + CircuitStepper.SCRATCH_PADDING];
        for (int k = 0; k < cells; k++) {
            UniformRandomProvider rng = streams.stream(STREAM_BASE + (long) b * cells + k);
            System.arraycopy(local, 0, p, 0, local.length);
            for (ExtrinsicNoise noise : extrinsic) {
                noise.apply(noise.founderScore(rng), p);
            }
            double[] state = spec.circuit().initialState();
            for (long s = 0; s < steps; s++) {
                stepper.advance(state, p, dt, rng);
            }
            counts[spec.fates().classify(state)]++;
        }
        for (int f = 0; f < counts.length; f++) {
            fractions[f][b] = (double) counts[f] / cells;
        }
    }

    /** Mean of {@code field} over its rows at {@code x}. */
    private static double rowMean(MorphogenField field, double x) {
        double sum = 0;
        for (int j = 0; j < field.rows(); j++) {
            sum += field.sample(x, (j + 0.5) * field.spacing());
        }
        return sum / field.rows();
    }

    /** Circuit steps, or for the exact method reactions at the founders' rates, for {@code cells} cells. */
    private static double work(TissueSpec spec, double cells) {
        if (spec.circuit().noise() == NoiseMode.EXACT) {
            double rate = spec.circuit().network().totalRate(spec.circuit().initialState(), spec.mapping().base());
            return cells * rate * spec.circuit().systemSize() * spec.timing().duration();
        }
        return cells * spec.timing().totalSteps();
    }

    /** Where the predicted fraction of fate {@code f} crosses 1/2, if it crosses exactly once (else NaN). */
    public double boundary(int f) {
        return defined() ? asProfile(fractions).boundary(f) : Double.NaN;
    }

    /**
     * Where the predicted fraction of committed cells (any fate but the default, the last)
     * crosses 1/2, if it crosses exactly once (else NaN).
     */
    public double committedBoundary() {
        if (!defined()) {
            return Double.NaN;
        }
        double[][] committed = {new double[centres.length]};
        for (int b = 0; b < centres.length; b++) {
            committed[0][b] = 1 - fractions[fractions.length - 1][b];
        }
        return asProfile(committed).boundary(0);
    }

    /** {@code fractions} over this prediction's bins, as a profile whose boundaries are measured like a tissue's. */
    private FateProfile asProfile(double[][] fractions) {
        int[] counts = new int[centres.length];
        Arrays.fill(counts, cellsPerPosition);
        return new FateProfile(centres, counts, fractions);
    }

    /**
     * Root-mean-square difference between the predicted and the simulated fraction of fate
     * {@code f} over the bins that hold cells in {@code simulated}; NaN without a prediction.
     */
    public double rmsDifference(FateProfile simulated, int f) {
        if (!defined()) {
            return Double.NaN;
        }
        double sum = 0;
        int n = 0;
        for (int b = 0; b < centres.length; b++) {
            double s = simulated.fractions()[f][b];
            if (!Double.isNaN(s)) {
                sum += (fractions[f][b] - s) * (fractions[f][b] - s);
                n++;
            }
        }
        return n == 0 ? Double.NaN : Math.sqrt(sum / n);
    }
}
