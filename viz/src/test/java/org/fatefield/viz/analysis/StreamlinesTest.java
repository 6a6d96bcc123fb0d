package org.fatefield.viz.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Streamlines checked against the exact integrals of linear flows (Strogatz, S. H. 2015,
 * Nonlinear Dynamics and Chaos, 2nd ed., ch. 5): circles for a rotation, y = C x^2 for the node
 * x' = -x, y' = -2y; and the spacing rule of Jobard &amp; Lefer (1997).
 */
class StreamlinesTest {

    @Test
    void rotationGivesCirclesTracedCounterclockwise() {
        List<Streamlines.Line> lines = Streamlines.trace((x, y, out) -> {
            out[0] = -y;
            out[1] = x;
        }, -1, 1, -1, 1, 0.05);
        assertTrue(lines.size() > 10, "lines: " + lines.size());
        for (Streamlines.Line line : lines) {
            double r0 = Math.hypot(line.xs()[0], line.ys()[0]);
            for (int k = 0; k < line.xs().length; k++) {
                // RK4 with step separation/8 = 0.0125 (of the box side): radius kept to 1e-6 relative.
                assertEquals(r0, Math.hypot(line.xs()[k], line.ys()[k]), 1e-6 * Math.max(r0, 1));
            }
            // Counterclockwise: the cross product of position and step is positive.
            int n = line.xs().length;
            double cross = line.xs()[n / 2] * (line.ys()[n / 2 + 1] - line.ys()[n / 2])
                    - line.ys()[n / 2] * (line.xs()[n / 2 + 1] - line.xs()[n / 2]);
            assertTrue(cross > 0);
        }
    }

    @Test
    void stableNodeLinesKeepTheirIntegralAndPointInwards() {
        // x' = -x, y' = -2y: y / x^2 is constant along every trajectory; the speed falls towards 0.
        List<Streamlines.Line> lines = Streamlines.trace((x, y, out) -> {
            out[0] = -x;
            out[1] = -2 * y;
        }, 0.1, 2, 0.1, 2, 0.04);
        assertTrue(lines.size() > 10, "lines: " + lines.size());
        for (Streamlines.Line line : lines) {
            double c = line.ys()[0] / (line.xs()[0] * line.xs()[0]);
            int n = line.xs().length;
            for (int k = 0; k < n; k++) {
                assertEquals(c, line.ys()[k] / (line.xs()[k] * line.xs()[k]), 1e-6 * c);
                double speed = Math.hypot(line.xs()[k] / 1.9, 2 * line.ys()[k] / 1.9);
                assertEquals(speed, line.speeds()[k], 1e-9 * speed, "speed in box-scaled units");
            }
            assertTrue(Math.hypot(line.xs()[n - 1], line.ys()[n - 1]) < Math.hypot(line.xs()[0], line.ys()[0]),
                    "traced in the direction of the flow");
        }
    }

    @Test
    void linesStayApartBySeparationRule() {
        double separation = 0.05;
        List<Streamlines.Line> lines = Streamlines.trace((x, y, out) -> {
            out[0] = 1;
            out[1] = 0.3 * Math.sin(3 * x);
        }, 0, 1, 0, 1, separation);
        // A line stops when it comes within half the separation of one already drawn, so two
        // lines may come no closer than that, less one integration step (separation / 8).
        double limit = 0.5 * separation - separation / 8;
        for (int a = 0; a < lines.size(); a++) {
            for (int b = a + 1; b < lines.size(); b++) {
                Streamlines.Line p = lines.get(a);
                Streamlines.Line q = lines.get(b);
                for (int i = 0; i < p.xs().length; i++) {
                    for (int j = 0; j < q.xs().length; j++) {
                        double d = Math.hypot(p.xs()[i] - q.xs()[j], p.ys()[i] - q.ys()[j]);
                        assertTrue(d >= limit, "lines " + a + " and " + b + " at distance " + d);
                    }
                }
            }
        }
    }
}
