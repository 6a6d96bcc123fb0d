package org.fatefield.scenarios.sweep;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.hipparchus.random.SobolSequenceGenerator;

/**
 * Points of a sweep in the unit cube, one coordinate per varied parameter.
 *
 * <p>Full grid: every combination of the parameters' grid values. Latin hypercube (McKay,
 * Beckman &amp; Conover 1979, Technometrics 21:239): each of the K strata of every dimension is hit
 * exactly once, at a uniformly random place within it, strata paired by independent random
 * permutations. Sobol: the low-discrepancy sequence of Hipparchus' {@link SobolSequenceGenerator}
 * (direction numbers of Joe &amp; Kuo 2008, SIAM J. Sci. Comput. 30:2635), first point skipped as
 * it sits on the corner.
 */
public final class Designs {

    private Designs() {
    }

    /** Every combination of grid values, as parameter values (not unit coordinates). */
    public static List<double[]> grid(List<SweepParameter> parameters) {
        List<double[]> points = new ArrayList<>();
        points.add(new double[0]);
        for (SweepParameter p : parameters) {
            List<double[]> next = new ArrayList<>();
            for (double[] prefix : points) {
                for (double v : p.gridValues()) {
                    double[] point = Arrays.copyOf(prefix, prefix.length + 1);
                    point[prefix.length] = v;
                    next.add(point);
                }
            }
            points = next;
        }
        return points;
    }

    /** {@code k} Latin-hypercube points in {@code d} dimensions (unit cube). */
    public static List<double[]> latinHypercube(int k, int d, UniformRandomProvider rng) {
        double[][] coordinates = new double[k][d];
        for (int j = 0; j < d; j++) {
            int[] order = new int[k];
            for (int i = 0; i < k; i++) {
                order[i] = i;
            }
            for (int i = k - 1; i > 0; i--) {
                int swap = rng.nextInt(i + 1);
                int t = order[i];
                order[i] = order[swap];
                order[swap] = t;
            }
            for (int i = 0; i < k; i++) {
                coordinates[i][j] = (order[i] + rng.nextDouble()) / k;
            }
        }
        return List.of(coordinates);
    }

    /** The first {@code k} Sobol points in {@code d} dimensions after the origin (unit cube). */
    public static List<double[]> sobol(int k, int d) {
        SobolSequenceGenerator generator = new SobolSequenceGenerator(d);
        generator.nextVector();
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            points.add(generator.nextVector());
        }
        return points;
    }
}
