package org.fatefield.engine.field;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleBinaryOperator;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.parallel.BlockParallel;

/**
 * A morphogen concentration on a cell-centred square grid, advanced by the explicit
 * (forward-time, centred-space) scheme for {@code dc/dt = D lap(c) - k c + s(x)} with no-flux
 * walls.
 *
 * <p>The explicit scheme on the five-point Laplacian is stable for
 * {@code dt <= 2 / (k + 8 D / h^2)} (von Neumann analysis; Morton &amp; Mayers 2005, Numerical
 * Solution of Partial Differential Equations, 2nd ed., Cambridge, ch. 2-3; with k = 0 this is
 * the familiar h^2 / (2 d D) for d = 2). {@link #advance(double)} splits a step into equal
 * sub-steps no longer than 0.9 of that limit, so any step the tissue takes is stable.
 * Two buffers are swapped each sub-step. With {@link MorphogenSpec.Solver#ADI} the field takes
 * one unconditionally stable {@link AdiSolver} step per call instead.
 */
public final class MorphogenField {

    private static final double SAFETY = 0.9;

    private final MorphogenSpec spec;
    private final int nx;
    private final int ny;
    private final double h;
    private final double[] synthesis;
    private double[] current;
    private double[] next;
    private AdiSolver adi;
    private final boolean timeVarying;
    private final boolean periodicY;
    /** Cells' secretion and uptake per square; null until cells first exchange (saves two grids). */
    private double[] exchangeSource;
    private double[] exchangeUptake;
    /** Secreting cells and their summed volume (fixed point) per grid square, for gatherExchange. */
    private int[] secretingCells;
    private long[] coveredVolume;
    private static final double FIXED_POINT = 0x1p40;
    private double time;
    private int adiWorkers;

    /**
     * A field over the width x height domain (µm); with {@code periodicY}
     * the field wraps around along y (a strip), which needs a height of a whole number of grid
     * squares, at least three.
     */
    public MorphogenField(MorphogenSpec spec, double width, double height, boolean periodicY) {
        this.periodicY = periodicY;
        if (!(width > 0) || !(height > 0)) {
            throw new IllegalArgumentException("domain must have positive width and height, got "
                    + width + " x " + height);
        }
        this.spec = spec;
        this.h = spec.gridSpacing();
        this.nx = Math.max(1, (int) Math.ceil(width / h - 1e-9));
        this.ny = Math.max(1, (int) Math.ceil(height / h - 1e-9));
        if (nx > 4096 || ny > 4096) {
            throw new IllegalArgumentException("grid of " + nx + " x " + ny
                    + " squares is too fine; raise the grid spacing (at most 4096 squares per side)");
        }
        if (periodicY && (ny < 3 || Math.abs(height / h - ny) > 1e-6 * ny)) {
            throw new IllegalArgumentException("a strip's height (" + height + " µm) must be a whole number of grid"
                    + " squares (grid spacing " + h + " µm), at least three, so that the field wraps around exactly;"
                    + " change the height or the grid spacing");
        }
        this.current = new double[nx * ny];
        this.next = new double[nx * ny];
        Arrays.fill(current, spec.initial());
        this.synthesis = new double[nx * ny];
        this.timeVarying = spec.sources().stream().anyMatch(s -> !s.amplitude().isConstant());
        setSynthesis(0.0);
        if (spec.profile() != null) {
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    current[j * nx + i] = spec.profile().at((i + 0.5) * h);
                }
            }
        }
    }

    private boolean leftFixed() {
        return spec.leftWall().kind() == MorphogenSpec.WallKind.FIXED_VALUE;
    }

    /**
     * Sets the cells' contribution for the next step: {@code amount[k]} added per hour and
     * {@code uptake[k]} removed per hour per unit concentration, per grid square (both per unit
     * area: divide a cell's amount by the square's area). Arrays are copied.
     */
    public void setCellExchange(double[] amount, double[] uptake) {
        allocateExchange();
        System.arraycopy(amount, 0, exchangeSource, 0, exchangeSource.length);
        System.arraycopy(uptake, 0, exchangeUptake, 0, exchangeUptake.length);
    }

    /**
     * Gathers secretion and uptake by {@code cells} onto this field's grid for the next step:
     * each secreting cell adds its amount over the area of its square; uptake scales with the
     * area the cell covers ({@code pi r^2}, which is the newborn area times the cell's volume).
     * Counts and volumes are summed exactly (volumes in fixed point, to 2^-40), so the result does
     * not depend on the order of {@code cells}.
     */
    public void gatherExchange(List<Cell> cells, double newbornRadius) {
        MorphogenSpec.CellExchange exchange = spec.exchange();
        double area = h * h;
        allocateExchange();
        Arrays.fill(secretingCells, 0);
        Arrays.fill(coveredVolume, 0L);
        int secreting = exchange.secretingFate();
        for (Cell cell : cells) {
            int k = squareOf(cell.x(), cell.y());
            if (secreting == MorphogenSpec.CellExchange.ALL || secreting == cell.fate()) {
                secretingCells[k]++;
            }
            coveredVolume[k] += Math.round(cell.volume() * FIXED_POINT);
        }
        double perCell = exchange.secretionRate() / area;
        double perVolume = exchange.uptake() * Math.PI * newbornRadius * newbornRadius / area / FIXED_POINT;
        for (int k = 0; k < exchangeSource.length; k++) {
            exchangeSource[k] = secretingCells[k] * perCell;
            exchangeUptake[k] = coveredVolume[k] * perVolume;
        }
    }

    private void allocateExchange() {
        if (exchangeSource == null) {
            exchangeSource = new double[nx * ny];
            exchangeUptake = new double[nx * ny];
            secretingCells = new int[nx * ny];
            coveredVolume = new long[nx * ny];
        }
    }

    /** Index of the grid square holding the point (µm). */
    public int squareOf(double x, double y) {
        int i = Math.min(nx - 1, Math.max(0, (int) (x / h)));
        int j = Math.min(ny - 1, Math.max(0, (int) (y / h)));
        return j * nx + i;
    }

    /** Fills the synthesis map with every source's rate times its amplitude at time {@code t}. */
    private void setSynthesis(double t) {
        Arrays.fill(synthesis, 0.0);
        if (spec.leftWall().kind() == MorphogenSpec.WallKind.FLUX) {
            for (int j = 0; j < ny; j++) {
                synthesis[j * nx] += spec.leftWall().value() / h;
            }
        }
        for (SourceRegion source : spec.sources()) {
            double rate = source.rate() * source.amplitude().at(t);
            int i0 = Math.max(0, (int) Math.floor(source.x0() / h));
            int i1 = Math.min(nx - 1, (int) Math.floor(source.x1() / h));
            int j0 = Math.max(0, (int) Math.floor(source.y0() / h));
            int j1 = Math.min(ny - 1, (int) Math.floor(source.y1() / h));
            for (int j = j0; j <= j1; j++) {
                for (int i = i0; i <= i1; i++) {
                    synthesis[j * nx + i] += rate * source.coverage(i * h, j * h, h);
                }
            }
        }
    }

    /** The largest stable explicit time step (h). */
    public double stableStepLimit() {
        return stableStepLimit(spec);
    }

    /** The largest stable explicit time step (h) of a field of {@code spec}. */
    private static double stableStepLimit(MorphogenSpec spec) {
        double h = spec.gridSpacing();
        double rate = spec.decay() + 8.0 * spec.diffusion() / (h * h);
        return rate > 0 ? 2.0 / rate : Double.POSITIVE_INFINITY;
    }

    /** Number of sub-steps {@link #advance(double)} takes for a step of {@code dt}. */
    public int subStepsFor(double dt) {
        return (int) subSteps(spec, dt);
    }

    /**
     * Explicit sub-steps a field of {@code spec} takes per step of {@code dt} (as a double: for
     * estimates of work, where a hopeless scenario may ask for more than an int holds).
     */
    public static double subSteps(MorphogenSpec spec, double dt) {
        return Math.max(1, Math.ceil(dt / (SAFETY * stableStepLimit(spec))));
    }

    /** Advances the field by {@code dt} hours in stable sub-steps, on the caller's thread. */
    public void advance(double dt) {
        try (BlockParallel serial = new BlockParallel(1)) {
            advance(dt, serial);
        }
    }

    /**
     * Advances the field by {@code dt} hours in stable sub-steps, rows split among the pool's
     * workers (each row's update reads only the previous buffer, so the result is the same for any
     * number of workers).
     */
    public void advance(double dt, BlockParallel pool) {
        if (spec.profile() != null) {
            time += dt;
            return;
        }
        if (timeVarying) {
            setSynthesis(time + 0.5 * dt);
        }
        time += dt;
        if (spec.solver() == MorphogenSpec.Solver.ADI) {
            if (adi == null || adiWorkers < pool.workers()) {
                adi = new AdiSolver(nx, ny, spec.diffusion(), spec.decay(), h, pool.workers(), periodicY);
                adiWorkers = pool.workers();
            }
            adi.step(current, synthesis, exchangeSource, exchangeUptake, dt, pool, leftFixed(), spec.leftWall()
                    .value());
            return;
        }
        int steps = subStepsFor(dt);
        double tau = dt / steps;
        for (int s = 0; s < steps; s++) {
            double[] c = current;
            double[] out = next;
            pool.forEach(ny, (from, to, worker) -> explicitRows(tau, c, out, from, to));
            current = out;
            next = c;
        }
    }

    private void explicitRows(double tau, double[] c, double[] out, int fromRow, int toRow) {
        double diffusionNumber = spec.diffusion() * tau / (h * h);
        double decayFactor = 1.0 - spec.decay() * tau;
        boolean fixed = leftFixed();
        double wall = spec.leftWall().value();
        double[] cellSource = exchangeSource;
        double[] cellUptake = exchangeUptake;
        for (int j = fromRow; j < toRow; j++) {
            int row = j * nx;
            int down = j > 0 ? row - nx : periodicY ? (ny - 1) * nx : row;
            int up = j < ny - 1 ? row + nx : periodicY ? 0 : row;
            for (int i = 0; i < nx; i++) {
                int k = row + i;
                double centre = c[k];
                double left = i > 0 ? c[k - 1] : fixed ? 2 * wall - centre : centre;
                double right = i < nx - 1 ? c[k + 1] : centre;
                double laplacian = left + right + c[down + i] + c[up + i] - 4.0 * centre;
                double cells = cellSource == null ? 0.0 : cellSource[k] - cellUptake[k] * centre;
                out[k] = decayFactor * centre + diffusionNumber * laplacian + tau * (synthesis[k] + cells);
            }
        }
    }

    /**
     * Concentration at a point (µm), interpolated bilinearly between grid-square centres and held
     * constant beyond the outermost centres (along a periodic y, interpolated across the seam).
     */
    public double sample(double x, double y) {
        double gx = x / h - 0.5;
        double gy = y / h - 0.5;
        int i0 = (int) Math.floor(gx);
        int j0 = (int) Math.floor(gy);
        double fx = gx - i0;
        double fy = gy - j0;
        int ia = clamp(i0, nx);
        int ib = clamp(i0 + 1, nx);
        int ja = periodicY ? Math.floorMod(j0, ny) : clamp(j0, ny);
        int jb = periodicY ? Math.floorMod(j0 + 1, ny) : clamp(j0 + 1, ny);
        double bottom = current[ja * nx + ia] * (1 - fx) + current[ja * nx + ib] * fx;
        double top = current[jb * nx + ia] * (1 - fx) + current[jb * nx + ib] * fx;
        return bottom * (1 - fy) + top * fy;
    }

    private static int clamp(int index, int size) {
        return index < 0 ? 0 : (index >= size ? size - 1 : index);
    }

    /**
     * Sets every grid square to {@code profile(x, y)} at its centre (µm): initial conditions for
     * numerical studies and tests.
     */
    public void fill(DoubleBinaryOperator profile) {
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                current[j * nx + i] = profile.applyAsDouble((i + 0.5) * h, (j + 0.5) * h);
            }
        }
    }

    /** Writes the concentrations and the field's clock (checkpoints). */
    public void write(DataOutputStream out) throws IOException {
        out.writeDouble(time);
        out.writeInt(current.length);
        for (double v : current) {
            out.writeDouble(v);
        }
    }

    /** Restores what {@link #write} wrote, into a field of the same grid. */
    public void read(DataInputStream in) throws IOException {
        time = in.readDouble();
        int n = in.readInt();
        if (n != current.length) {
            throw new IOException("checkpoint field has " + n + " squares, this grid " + current.length);
        }
        for (int k = 0; k < n; k++) {
            current[k] = in.readDouble();
        }
    }

    /** Mean concentration over the grid. */
    public double mean() {
        double sum = 0.0;
        for (double v : current) {
            sum += v;
        }
        return sum / current.length;
    }

    /** Value of grid square (i, j), with i along x. */
    public double value(int i, int j) {
        return current[j * nx + i];
    }

    /** Squares along x. */
    public int columns() {
        return nx;
    }

    /** Squares along y. */
    public int rows() {
        return ny;
    }

    /** Grid spacing (µm). */
    public double spacing() {
        return h;
    }

    /** The physics this field follows. */
    public MorphogenSpec spec() {
        return spec;
    }

    /** Largest value on the grid. */
    public double max() {
        double m = 0.0;
        for (double v : current) {
            m = Math.max(m, v);
        }
        return m;
    }
}
