package org.fatefield.engine.bench;

import java.util.Arrays;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.domain.Domain3d;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * Measures the tissue's speed in cell-steps per second against a bare array loop doing the same
 * circuit arithmetic, in the same process. A benchmark, not a test: numbers vary between
 * machines, only the ratio travels.
 */
public final class TissueBenchmark {

    /**
     * One measurement.
     *
     * @param cells           cells in the tissue
     * @param tickRate        full tick (field, cells, division check, mechanics) in cell-steps per second
     * @param cellStepRate    the cell loop alone (signal, parameters, circuit, ageing) in cell-steps per second
     * @param bareRate        the bare loop in cell-steps per second
     * @param fieldRate       the field stage alone (every field, one step), in cell-steps per second
     * @param bareFieldRate   its bare baseline ({@link BareFieldLoop}), in cell-steps per second
     * @param mechanicsRate   the mechanics stage alone (one relaxation), in cell-steps per second
     * @param bareMechanicsRate its bare baseline ({@link BareMechanicsLoop}), in cell-steps per second
     */
    public record Result(int cells, double tickRate, double cellStepRate, double bareRate, double fieldRate,
            double bareFieldRate, double mechanicsRate, double bareMechanicsRate) {

        /** Cell loop over bare loop: 1 means no overhead. */
        public double ratio() {
            return cellStepRate / bareRate;
        }
    }

    private TissueBenchmark() {
    }

    /**
     * Space per cell of the template's founders, the density the tissue starts at: area (µm²)
     * in a flat tissue, volume (µm³) in a 3-D one.
     */
    public static double founderSpace(TissueSpec template) {
        double depth = template.domain().threeD() ? template.domain().depth() : 1.0;
        return template.width() * template.height() * depth / template.growth().initialCells();
    }

    /**
     * Space per cell of a confluent tissue: the mean cell size over the cycle (1.5 newborn cells)
     * over the packing fraction. Flat: discs in a hexagonal packing, 0.9 (common practice), in
     * µm²; 3-D: spheres at random close packing, 0.64 (Scott &amp; Kilgour 1969, J. Phys. D
     * 2:863), in µm³.
     */
    public static double confluentSpace(TissueSpec template) {
        double r = template.growth().cellRadius();
        return template.domain().threeD() ? 1.5 * 4.0 / 3.0 * Math.PI * r * r * r / 0.64 : 1.5 * Math.PI * r * r / 0.9;
    }

    /**
     * The template in three dimensions, for the 3-D benchmark: a box (a slab if the template is
     * periodic along y) as wide and tall as the template and a quarter of its height deep, the
     * template's founders spread through it. A 3-D template is returned as it is.
     */
    public static TissueSpec inThreeDimensions(TissueSpec template) {
        if (template.domain().threeD()) {
            return template;
        }
        double depth = 0.25 * template.height();
        Domain solid = template.domain().periodicY() ? new Domain3d.Slab(template.width(), template.height(), depth)
                : new Domain3d.Box(template.width(), template.height(), depth);
        return TissueSpec.of(template.circuit(), template.mapping(), template.morphogen(), solid, template.growth(),
                template.fates(), template.timing());
    }

    /**
     * Measures a tissue of {@code cells} cells built like {@code template} (same circuit, field
     * and coupling; the domain scaled to the template's founder density; no division), taking
     * the median of {@code repeats} timings of {@code steps} steps each.
     */
    public static Result measure(TissueSpec template, int cells, int steps, int repeats, long seed) {
        return measure(template, cells, steps, repeats, seed, 1, founderSpace(template));
    }

    /**
     * As {@link #measure(TissueSpec, int, int, int, long)}, the tissue stepped on {@code threads}
     * threads, in a domain of the template's proportions with {@code spacePerCell} µm² (in 3-D µm³)
     * per cell.
     */
    public static Result measure(TissueSpec template, int cells, int steps, int repeats, long seed, int threads,
            double spacePerCell) {
        double dt = template.timing().step();
        Timing timing = new Timing(dt * (repeats + 1) * steps * 3, dt, dt * steps);
        TissueSpec spec = scaled(template, cells, spacePerCell, timing);
        Tissue tissue = new Tissue(spec, seed, threads);
        tissue.start();
        if (!(template.mapping().couplings().get(0).law() instanceof CouplingLaw.Hill hill)) {
            throw new IllegalArgumentException("the benchmark's bare loop is written for a Hill coupling of the"
                    + " switch; the first [[coupling]] of this scenario is not form = \"hill\"");
        }
        BareSwitchLoop bare = new BareSwitchLoop(cells, template.mapping().base(), template.circuit().systemSize(),
                new double[] {hill.base(), hill.gain(), hill.halfMax(), hill.coefficient()}, seed);
        double[] tick = new double[repeats];
        double[] cellsOnly = new double[repeats];
        double[] bareLoop = new double[repeats];
        double[] fieldOnly = new double[repeats];
        double[] bareField = new double[repeats];
        double[] mechanicsOnly = new double[repeats];
        double[] bareMechanics = new double[repeats];
        MorphogenField primary = tissue.fields().get(0);
        BareFieldLoop fieldLoop = new BareFieldLoop(primary.columns(), primary.rows(), primary.layers(),
                primary.spec().diffusion() * dt / primary.subStepsFor(dt) / (primary.spacing() * primary.spacing()),
                1 - primary.spec().decay() * dt / primary.subStepsFor(dt), primary.subStepsFor(dt));
        BareMechanicsLoop mechanicsLoop = bareMechanics(tissue, spec);
        double sink = 0;
        for (int r = -1; r < repeats; r++) {
            // A collection before each timing, so that garbage left by one part is not charged to the next.
            System.gc();
            long t0 = System.nanoTime();
            tissue.advance(steps);
            long t1 = System.nanoTime();
            System.gc();
            long t1b = System.nanoTime();
            for (int s = 0; s < steps; s++) {
                tissue.stepOnly(Tissue.Stage.CELLS);
            }
            long t2 = System.nanoTime();
            System.gc();
            long t2b = System.nanoTime();
            for (int s = 0; s < steps; s++) {
                bare.step(dt);
            }
            long t3 = System.nanoTime();
            sink += bare.checksum();
            long[] t = new long[8];
            t[0] = System.nanoTime();
            for (int s = 0; s < steps; s++) {
                tissue.stepOnly(Tissue.Stage.FIELDS);
            }
            t[1] = System.nanoTime();
            for (int s = 0; s < steps; s++) {
                fieldLoop.step();
            }
            t[2] = System.nanoTime();
            System.gc();
            t[3] = System.nanoTime();
            for (int s = 0; s < steps; s++) {
                tissue.stepOnly(Tissue.Stage.MECHANICS);
            }
            t[4] = System.nanoTime();
            for (int s = 0; s < steps; s++) {
                mechanicsLoop.step(dt);
            }
            t[5] = System.nanoTime();
            sink += fieldLoop.checksum() + mechanicsLoop.checksum();
            if (r >= 0) {
                double work = (double) cells * steps;
                tick[r] = work / ((t1 - t0) / 1e9);
                cellsOnly[r] = work / ((t2 - t1b) / 1e9);
                bareLoop[r] = work / ((t3 - t2b) / 1e9);
                fieldOnly[r] = work / ((t[1] - t[0]) / 1e9);
                bareField[r] = work / ((t[2] - t[1]) / 1e9);
                mechanicsOnly[r] = work / ((t[4] - t[3]) / 1e9);
                bareMechanics[r] = work / ((t[5] - t[4]) / 1e9);
            }
        }
        if (Double.isNaN(sink)) {
            throw new IllegalStateException("benchmark state became NaN");
        }
        tissue.finish();
        return new Result(tissue.cells().size(), median(tick), median(cellsOnly), median(bareLoop), median(fieldOnly),
                median(bareField), median(mechanicsOnly), median(bareMechanics));
    }

    /** The bare mechanics loop on the tissue's own cells, with their positions and radii. */
    private static BareMechanicsLoop bareMechanics(Tissue tissue, TissueSpec spec) {
        int n = tissue.cells().size();
        double[] x = new double[n];
        double[] y = new double[n];
        boolean threeD = spec.domain().threeD();
        double[] z = threeD ? new double[n] : null;
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            Cell c = tissue.cells().get(i);
            x[i] = c.x();
            y[i] = c.y();
            if (threeD) {
                z[i] = c.z();
            }
            r[i] = threeD ? c.sphereRadius(spec.growth().cellRadius()) : c.radius(spec.growth().cellRadius());
        }
        return new BareMechanicsLoop(x, y, z, r, spec.growth().repulsionRate());
    }

    /**
     * A tissue like {@code template} (circuit, field, coupling, fates) of {@code cells} founders
     * that never divide, in a domain of the template's shape and proportions with
     * {@code spacePerCell} µm² (in 3-D µm³) per cell.
     */
    private static TissueSpec scaled(TissueSpec template, int cells, double spacePerCell, Timing timing) {
        Domain domain = template.domain();
        double width;
        double height;
        Domain resized;
        if (domain.threeD()) {
            double scale = Math.cbrt(cells * spacePerCell / (domain.width() * domain.height() * domain.depth()));
            width = domain.width() * scale;
            height = domain.height() * scale;
            resized = Domain.of(domain.shape(), width, height, domain.depth() * scale);
        } else {
            double scale = Math.sqrt(cells * spacePerCell / (template.width() * template.height()));
            width = template.width() * scale;
            height = template.height() * scale;
            resized = domain.resized(width, height);
        }
        GrowthSpec growth = GrowthSpec.of(cells, template.growth().cellRadius(), template.growth().repulsionRate(),
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e9, 0), template.growth().partition());
        return TissueSpec.of(template.circuit(), template.mapping(), scaledField(template, resized), resized, growth,
                template.fates(), timing);
    }

    /**
     * The template's field with its grid coarsened, if needed, to at most 2048 squares a side
     * (in 3-D, to at most 2^22 cubes in all).
     */
    private static MorphogenSpec scaledField(TissueSpec template, Domain domain) {
        MorphogenSpec m = template.morphogen();
        double spacing = Math.max(m.gridSpacing(), Math.max(domain.width(), domain.height()) / 2048);
        if (domain.threeD()) {
            spacing = Math.max(spacing, Math.cbrt(domain.width() * domain.height() * domain.depth() / (1 << 22)));
        }
        return m.withGridSpacing(spacing);
    }

    /**
     * Heap bytes per live cell of a tissue of {@code cells} founders built like {@code template}
     * with {@code spacePerCell} µm² (µm³) per cell (cells, their states and streams, the field and the
     * work buffers, divided by the cell count), measured as the change in used heap after garbage
     * collection; approximate.
     */
    public static double bytesPerCell(TissueSpec template, int cells, double spacePerCell) {
        double dt = template.timing().step();
        TissueSpec spec = scaled(template, cells, spacePerCell, new Timing(dt * 10, dt, dt));
        long before = usedHeap();
        Tissue tissue = new Tissue(spec, 1L);
        tissue.start();
        tissue.advance(1);
        long after = usedHeap();
        double perCell = (double) (after - before) / tissue.cells().size();
        tissue.finish();
        return perCell;
    }

    private static long usedHeap() {
        Runtime runtime = Runtime.getRuntime();
        for (int i = 0; i < 3; i++) {
            System.gc();
        }
        return runtime.totalMemory() - runtime.freeMemory();
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }
}
