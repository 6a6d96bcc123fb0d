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
 * A morphogen concentration on a cell-centred square grid (or, with a depth, a cubic grid),
 * advanced by the explicit (forward-time, centred-space) scheme for
 * {@code dc/dt = D lap(c) - k c + s(x)} with no-flux walls.
 *
 * <p>The explicit scheme on the five-point (seven-point in 3-D) Laplacian is stable for
 * {@code dt <= 2 / (k + 4 d D / h^2)} in d dimensions (von Neumann analysis; Morton &amp;
 * Mayers 2005, Numerical Solution of Partial Differential Equations, 2nd ed., Cambridge,
 * ch. 2-3; with k = 0 this is the familiar h^2 / (2 d D)). {@link #advance(double)} splits a step
 * into equal sub-steps no longer than 0.9 of that limit, so any step the tissue takes is stable.
 * Two buffers are swapped each sub-step. With {@link MorphogenSpec.Solver#ADI} the field takes
 * one unconditionally stable step per call instead: {@link AdiSolver} (Peaceman-Rachford) in 2-D,
 * {@link DouglasAdiSolver} in 3-D. In 3-D, source regions and the left-wall condition extend
 * through the whole depth, and cells exchange per unit volume instead of per unit area.
 */
public final class MorphogenField {

    private static final double SAFETY = 0.9;

    private final MorphogenSpec spec;
    private final int nx;
    private final int ny;
    /** Layers along z: 1 for a flat (2-D) field. */
    private final int nz;
    private final double h;
    private final double[] synthesis;
    private double[] current;
    private double[] next;
    private AdiSolver adi;
    private DouglasAdiSolver douglas;
    private final boolean timeVarying;
    private final boolean periodicY;
    private final boolean threeD;
    /** Cells' secretion and uptake per square; null until cells first exchange (saves four grids). */
    private CellExchangeGrid exchange;
    private double time;
    private int adiWorkers;

    /**
     * A flat field over the width x height domain (µm); with {@code periodicY}
     * the field wraps around along y (a strip), which needs a height of a whole number of grid
     * squares, at least three.
     */
    public MorphogenField(MorphogenSpec spec, double width, double height, boolean periodicY) {
        this(spec, width, height, 0.0, periodicY);
    }

    /** Most grid squares (cubes in 3-D) a field may have: four buffers of them fill about 0.5 GB. */
    public static final int MAX_SQUARES = 1 << 24;

    /**
     * A field over the width x height x depth box (µm), flat (2-D) when {@code depth} is 0;
     * with {@code periodicY} the field wraps around along y, which needs a height of a whole
     * number of grid squares, at least three.
     */
    public MorphogenField(MorphogenSpec spec, double width, double height, double depth, boolean periodicY) {
        this.periodicY = periodicY;
        if (!(width > 0) || !(height > 0) || !(depth >= 0) || Double.isInfinite(depth)) {
            throw new IllegalArgumentException("domain must have positive width and height and a finite depth of"
                    + " at least 0, got " + width + " x " + height + " x " + depth);
        }
        this.spec = spec;
        this.h = spec.gridSpacing();
        this.nx = Math.max(1, (int) Math.ceil(width / h - 1e-9));
        this.ny = Math.max(1, (int) Math.ceil(height / h - 1e-9));
        this.nz = depth > 0 ? Math.max(1, (int) Math.ceil(depth / h - 1e-9)) : 1;
        if (nx > 4096 || ny > 4096 || nz > 4096 || (long) nx * ny * nz > MAX_SQUARES) {
            throw new IllegalArgumentException("grid of " + nx + " x " + ny + (depth > 0 ? " x " + nz : "")
                    + " squares is too fine; raise the grid spacing (at most 4096 squares per side and "
                    + MAX_SQUARES + " in all)");
        }
        this.threeD = depth > 0;
        if (periodicY && (ny < 3 || Math.abs(height / h - ny) > 1e-6 * ny)) {
            throw new IllegalArgumentException("a strip's height (" + height + " µm) must be a whole number of grid"
                    + " squares (grid spacing " + h + " µm), at least three, so that the field wraps around exactly;"
                    + " change the height or the grid spacing");
        }
        int squares = nx * ny * nz;
        this.current = new double[squares];
        this.next = new double[squares];
        Arrays.fill(current, spec.initial());
        this.synthesis = new double[squares];
        this.timeVarying = spec.sources().stream().anyMatch(s -> !s.amplitude().isConstant());
        setSynthesis(0.0);
        if (spec.profile() != null) {
            for (int k = 0; k < squares; k++) {
                current[k] = spec.profile().at((k % nx + 0.5) * h);
            }
        }
    }

    /** True for a field with depth (a cubic grid), false for a flat one. */
    public boolean threeD() {
        return threeD;
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
        exchangeGrid().set(amount, uptake);
    }

    /**
     * Gathers secretion and uptake by {@code cells} onto this field's grid for the next step:
     * each secreting cell adds its amount over the area (in 3-D the volume) of its square; uptake
     * scales with the area the cell covers ({@code pi r^2}, the newborn area times the cell's
     * volume), in 3-D with the space it fills ({@code 4/3 pi r^3}). The result does not depend on
     * the order of {@code cells}.
     */
    public void gatherExchange(List<Cell> cells, double newbornRadius) {
        double square = threeD ? h * h * h : h * h;
        double covered = threeD ? 4.0 / 3.0 * Math.PI * Math.pow(newbornRadius, 3)
                : Math.PI * newbornRadius * newbornRadius;
        exchangeGrid().gather(cells, cell -> squareOf(cell.x(), cell.y(), cell.z()), spec.exchange(), square,
                covered);
    }

    private CellExchangeGrid exchangeGrid() {
        if (exchange == null) {
            exchange = new CellExchangeGrid(current.length);
        }
        return exchange;
    }

    /** Index of the grid square holding the point (µm) of a flat field. */
    public int squareOf(double x, double y) {
        int i = Math.min(nx - 1, Math.max(0, (int) (x / h)));
        int j = Math.min(ny - 1, Math.max(0, (int) (y / h)));
        return j * nx + i;
    }

    /** Index of the grid square (cube) holding the point (µm); z is ignored by a flat field. */
    public int squareOf(double x, double y, double z) {
        int l = threeD ? Math.min(nz - 1, Math.max(0, (int) (z / h))) : 0;
        return l * nx * ny + squareOf(x, y);
    }

    /** Fills the synthesis map with every source's rate times its amplitude at time {@code t}. */
    private void setSynthesis(double t) {
        SynthesisMap.fill(synthesis, spec, nx, ny, nz, t);
    }

    /** The largest stable explicit time step (h). */
    public double stableStepLimit() {
        return stableStepLimit(spec, threeD ? 3 : 2);
    }

    /** The largest stable explicit time step (h) of a field of {@code spec} in {@code dimensions} (2 or 3). */
    private static double stableStepLimit(MorphogenSpec spec, int dimensions) {
        double h = spec.gridSpacing();
        double rate = spec.decay() + 4.0 * dimensions * spec.diffusion() / (h * h);
        return rate > 0 ? 2.0 / rate : Double.POSITIVE_INFINITY;
    }

    /** Number of sub-steps {@link #advance(double)} takes for a step of {@code dt}. */
    public int subStepsFor(double dt) {
        return (int) subSteps(spec, dt, threeD ? 3 : 2);
    }

    /**
     * Explicit sub-steps a field of {@code spec} in {@code dimensions} (2 or 3) takes per step of
     * {@code dt} (as a double: for estimates of work, where a hopeless scenario may ask for more
     * than an int holds).
     */
    public static double subSteps(MorphogenSpec spec, double dt, int dimensions) {
        return Math.max(1, Math.ceil(dt / (SAFETY * stableStepLimit(spec, dimensions))));
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
        if (spec.solver() == MorphogenSpec.Solver.ADI && threeD) {
            if (douglas == null || douglas.workers() < pool.workers()) {
                douglas = new DouglasAdiSolver(nx, ny, nz, spec.diffusion(), spec.decay(), h, pool.workers(),
                        periodicY);
            }
            douglas.step(current, synthesis, cellSource(), cellUptake(), dt, pool, leftFixed(),
                    spec.leftWall().value());
            return;
        }
        if (spec.solver() == MorphogenSpec.Solver.ADI) {
            if (adi == null || adiWorkers < pool.workers()) {
                adi = new AdiSolver(nx, ny, spec.diffusion(), spec.decay(), h, pool.workers(), periodicY);
                adiWorkers = pool.workers();
            }
            adi.step(current, synthesis, cellSource(), cellUptake(), dt, pool, leftFixed(), spec.leftWall()
                    .value());
            return;
        }
        int steps = subStepsFor(dt);
        double tau = dt / steps;
        for (int s = 0; s < steps; s++) {
            explicitStep(tau, pool);
        }
    }

    private double[] cellSource() {
        return exchange == null ? null : exchange.source;
    }

    private double[] cellUptake() {
        return exchange == null ? null : exchange.uptake;
    }

    /** One forward-Euler step of {@code tau} hours, whatever its length (stability tests take it past the limit). */
    void explicitStep(double tau, BlockParallel pool) {
        double[] c = current;
        double[] out = next;
        ExplicitScheme scheme = new ExplicitScheme(nx, ny, nz, spec.diffusion() * tau / (h * h),
                1.0 - spec.decay() * tau, tau, periodicY, leftFixed(), spec.leftWall().value());
        double[] cellSource = cellSource();
        double[] cellUptake = cellUptake();
        pool.forEach(ny * nz, (from, to, worker) -> scheme.rows(c, out, synthesis, cellSource, cellUptake, from,
                to));
        current = out;
        next = c;
    }

    /**
     * Concentration at a point (µm) of a flat field, interpolated bilinearly between grid-square
     * centres and held constant beyond the outermost centres (along a periodic y, interpolated
     * across the seam); of a field with depth, the mean over the depth at (x, y).
     */
    public double sample(double x, double y) {
        if (!threeD) {
            return sampleLayer(x, y, 0);
        }
        double sum = 0.0;
        for (int l = 0; l < nz; l++) {
            sum += sampleLayer(x, y, l * nx * ny);
        }
        return sum / nz;
    }

    /**
     * Concentration at a point (µm), interpolated trilinearly between cube centres in 3-D (held
     * constant beyond the outermost centres); a flat field ignores z.
     */
    public double sample(double x, double y, double z) {
        if (!threeD) {
            return sampleLayer(x, y, 0);
        }
        double gz = z / h - 0.5;
        int l0 = (int) Math.floor(gz);
        double fz = gz - l0;
        int layer = nx * ny;
        double below = sampleLayer(x, y, GridInterpolation.clamp(l0, nz) * layer);
        double above = sampleLayer(x, y, GridInterpolation.clamp(l0 + 1, nz) * layer);
        return below * (1 - fz) + above * fz;
    }

    /** Bilinear interpolation within the layer starting at index {@code base}. */
    private double sampleLayer(double x, double y, int base) {
        return GridInterpolation.layer(current, base, nx, ny, h, periodicY, x, y);
    }

    /**
     * Sets every grid square to {@code profile(x, y)} at its centre (µm), in every layer:
     * initial conditions for numerical studies and tests.
     */
    public void fill(DoubleBinaryOperator profile) {
        fill((x, y, z) -> profile.applyAsDouble(x, y));
    }

    /** Sets every grid square (cube) to {@code profile(x, y, z)} at its centre (µm). */
    public void fill(Profile3d profile) {
        for (int l = 0; l < nz; l++) {
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    current[(l * ny + j) * nx + i] = profile.at((i + 0.5) * h, (j + 0.5) * h, (l + 0.5) * h);
                }
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

    /** Value of grid square (i, j), with i along x; with depth, the mean over the layers. */
    public double value(int i, int j) {
        if (!threeD) {
            return current[j * nx + i];
        }
        double sum = 0.0;
        for (int l = 0; l < nz; l++) {
            sum += current[(l * ny + j) * nx + i];
        }
        return sum / nz;
    }

    /** Value of grid cube (i, j, l), with l along z (0 for a flat field). */
    public double value(int i, int j, int l) {
        return current[(l * ny + j) * nx + i];
    }

    /** Layers along z (1 for a flat field). */
    public int layers() {
        return nz;
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
