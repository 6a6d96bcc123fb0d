package org.fatefield.viz.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * Zero contours of a function sampled on a grid, by marching squares (Lorensen &amp; Cline 1987,
 * SIGGRAPH 21(4):163, in its two-dimensional form), as line segments with linear interpolation
 * along cell edges. Used to draw nullclines.
 */
final class Contours {

    private Contours() {
    }

    /**
     * Segments {x1, y1, x2, y2} of the zero level of {@code values[j][i]} sampled at
     * ({@code xs[i]}, {@code ys[j]}).
     */
    static List<double[]> zeroLevel(double[] xs, double[] ys, double[][] values) {
        List<double[]> segments = new ArrayList<>();
        for (int j = 0; j + 1 < ys.length; j++) {
            for (int i = 0; i + 1 < xs.length; i++) {
                double[] corner = {values[j][i], values[j][i + 1], values[j + 1][i + 1], values[j + 1][i]};
                double[][] at = {{xs[i], ys[j]}, {xs[i + 1], ys[j]}, {xs[i + 1], ys[j + 1]}, {xs[i], ys[j + 1]}};
                List<double[]> crossings = new ArrayList<>();
                for (int e = 0; e < 4; e++) {
                    double a = corner[e];
                    double b = corner[(e + 1) % 4];
                    if ((a < 0) != (b < 0)) {
                        double t = a / (a - b);
                        crossings.add(new double[] {at[e][0] + t * (at[(e + 1) % 4][0] - at[e][0]),
                            at[e][1] + t * (at[(e + 1) % 4][1] - at[e][1])});
                    }
                }
                if (crossings.size() == 2) {
                    segments.add(new double[] {crossings.get(0)[0], crossings.get(0)[1], crossings.get(1)[0],
                        crossings.get(1)[1]});
                } else if (crossings.size() == 4) {
                    segments.add(new double[] {crossings.get(0)[0], crossings.get(0)[1], crossings.get(1)[0],
                        crossings.get(1)[1]});
                    segments.add(new double[] {crossings.get(2)[0], crossings.get(2)[1], crossings.get(3)[0],
                        crossings.get(3)[1]});
                }
            }
        }
        return segments;
    }
}
