package org.fatefield.viz.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * Evenly spaced streamlines of a planar vector field, after Jobard &amp; Lefer (1997, "Creating
 * evenly-spaced streamlines of arbitrary density", Visualization in Scientific Computing '97,
 * Springer, 43-55): seeds are taken on a regular grid, and each line is traced forwards and
 * backwards (classical fourth-order Runge-Kutta on the direction field, in coordinates scaled to
 * the unit square so both axes count alike) until it leaves the box, nears a steady state, or
 * comes within half the separation of a line already drawn. The speed of the flow is kept at
 * every point, so a drawing can show where the flow is fast.
 */
public final class Streamlines {

    /** A planar vector field. */
    @FunctionalInterface
    public interface Field {
        /** Writes the velocity at ({@code x}, {@code y}) into {@code out[0..1]}. */
        void velocity(double x, double y, double[] out);
    }

    /** One streamline: points in the direction of the flow, with the flow's speed at each. */
    public record Line(double[] xs, double[] ys, double[] speeds) {
    }

    private static final int MAX_POINTS = 2000;

    private final Field field;
    private final double x0;
    private final double y0;
    private final double wx;
    private final double wy;
    private final double separation;
    private final double step;
    private final int cells;
    private final List<List<double[]>> occupied;

    private Streamlines(Field field, double x0, double x1, double y0, double y1, double separation) {
        this.field = field;
        this.x0 = x0;
        this.y0 = y0;
        this.wx = x1 - x0;
        this.wy = y1 - y0;
        this.separation = separation;
        this.step = separation / 8;
        this.cells = (int) Math.ceil(1 / separation);
        this.occupied = new ArrayList<>(cells * cells);
        for (int k = 0; k < cells * cells; k++) {
            occupied.add(new ArrayList<>());
        }
    }

    /**
     * Streamlines over [x0, x1] x [y0, y1] about {@code separation} apart (a fraction of the box
     * side, such as 0.04).
     *
     * @throws IllegalArgumentException if the box is empty or the separation not in (0, 0.5]
     */
    public static List<Line> trace(Field field, double x0, double x1, double y0, double y1, double separation) {
        if (!(x1 > x0) || !(y1 > y0)) {
            throw new IllegalArgumentException("streamline box must have x1 > x0 and y1 > y0, got [" + x0 + ", " + x1
                    + "] x [" + y0 + ", " + y1 + "]");
        }
        if (!(separation > 0 && separation <= 0.5)) {
            throw new IllegalArgumentException("streamline separation must be in (0, 0.5], got " + separation);
        }
        return new Streamlines(field, x0, x1, y0, y1, separation).all();
    }

    private List<Line> all() {
        List<Line> lines = new ArrayList<>();
        int seeds = (int) Math.round(1 / separation);
        for (int j = 0; j < seeds; j++) {
            for (int i = 0; i < seeds; i++) {
                double u = (i + 0.5) / seeds;
                double v = (j + 0.5) / seeds;
                if (near(u, v, separation)) {
                    continue;
                }
                Line line = traceFrom(u, v);
                if (line != null) {
                    lines.add(line);
                }
            }
        }
        return lines;
    }

    private Line traceFrom(double u, double v) {
        List<double[]> backward = half(u, v, -1);
        List<double[]> forward = half(u, v, +1);
        List<double[]> points = new ArrayList<>();
        for (int k = backward.size() - 1; k >= 1; k--) {
            points.add(backward.get(k));
        }
        points.addAll(forward);
        if (points.size() < 4) {
            return null;
        }
        double[] xs = new double[points.size()];
        double[] ys = new double[points.size()];
        double[] speeds = new double[points.size()];
        for (int k = 0; k < points.size(); k++) {
            double[] p = points.get(k);
            occupy(p);
            xs[k] = x0 + p[0] * wx;
            ys[k] = y0 + p[1] * wy;
            speeds[k] = p[2];
        }
        return new Line(xs, ys, speeds);
    }

    /** Points from (u, v) along {@code sign} times the flow, each {u, v, speed}; the first is the seed. */
    private List<double[]> half(double u, double v, int sign) {
        List<double[]> points = new ArrayList<>();
        double[] k1 = new double[3];
        double[] k2 = new double[3];
        double[] k3 = new double[3];
        double[] k4 = new double[3];
        double pu = u;
        double pv = v;
        if (!direction(pu, pv, sign, k1)) {
            return points;
        }
        points.add(new double[] {pu, pv, k1[2]});
        while (points.size() < MAX_POINTS) {
            double h = step;
            if (!direction(pu + 0.5 * h * k1[0], pv + 0.5 * h * k1[1], sign, k2)
                    || !direction(pu + 0.5 * h * k2[0], pv + 0.5 * h * k2[1], sign, k3)
                    || !direction(pu + h * k3[0], pv + h * k3[1], sign, k4)) {
                break;
            }
            double nu = pu + h / 6 * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
            double nv = pv + h / 6 * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
            if (nu < 0 || nu > 1 || nv < 0 || nv > 1 || near(nu, nv, 0.5 * separation)) {
                break;
            }
            if (!direction(nu, nv, sign, k1)) {
                break;
            }
            pu = nu;
            pv = nv;
            points.add(new double[] {pu, pv, k1[2]});
            if (closesLoop(points)) {
                break;
            }
        }
        return points;
    }

    /** Stops a line that comes back to its own start (a closed orbit). */
    private boolean closesLoop(List<double[]> points) {
        if (points.size() < 16) {
            return false;
        }
        double[] a = points.get(0);
        double[] b = points.get(points.size() - 1);
        return Math.hypot(a[0] - b[0], a[1] - b[1]) < 0.5 * step;
    }

    /** Unit direction of the flow (scaled to the unit box) into out[0..1], speed into out[2]; false where it vanishes. */
    private boolean direction(double u, double v, int sign, double[] out) {
        double[] f = new double[2];
        field.velocity(x0 + u * wx, y0 + v * wy, f);
        double fu = f[0] / wx;
        double fv = f[1] / wy;
        double speed = Math.hypot(fu, fv);
        if (!(speed > 1e-12) || !Double.isFinite(speed)) {
            return false;
        }
        out[0] = sign * fu / speed;
        out[1] = sign * fv / speed;
        out[2] = speed;
        return true;
    }

    private void occupy(double[] p) {
        occupied.get(cell(p[0], p[1])).add(p);
    }

    private int cell(double u, double v) {
        int i = Math.min(cells - 1, Math.max(0, (int) (u * cells)));
        int j = Math.min(cells - 1, Math.max(0, (int) (v * cells)));
        return j * cells + i;
    }

    /** Whether a line already drawn lies within {@code distance} of (u, v). */
    private boolean near(double u, double v, double distance) {
        int ci = Math.min(cells - 1, Math.max(0, (int) (u * cells)));
        int cj = Math.min(cells - 1, Math.max(0, (int) (v * cells)));
        for (int j = Math.max(0, cj - 1); j <= Math.min(cells - 1, cj + 1); j++) {
            for (int i = Math.max(0, ci - 1); i <= Math.min(cells - 1, ci + 1); i++) {
                for (double[] p : occupied.get(j * cells + i)) {
                    if (Math.hypot(p[0] - u, p[1] - v) < distance) {
                        return true;
                    }
                }
            }
        }
        return false;
    }
}
