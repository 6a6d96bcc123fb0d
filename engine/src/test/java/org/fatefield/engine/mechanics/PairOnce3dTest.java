package org.fatefield.engine.mechanics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.domain.Domain3d;
import org.fatefield.engine.parallel.BlockParallel;
import org.junit.jupiter.api.Test;

/**
 * Mechanics of spheres in a box and a slab: the pair-once sum over the 13-bucket half stencil
 * against a brute force over all n² ordered pairs with the same law (nearest image across the
 * slab's seam, radius as the cube root of volume); bit-identical steps for 1 to 4 workers; and
 * two overlapping spheres relaxing to contact, where the overlap {@code u} obeys
 * {@code du/dt = -rate u} (each cell moves at half of {@code rate u}), so
 * {@code u(t) = u0 exp(-rate t)} in the limit of small steps (explicit Euler: {@code (1 - rate dt)^n}).
 */
class PairOnce3dTest {

    private static final double RATE = 20.0;
    private static final double RADIUS = 2.5;
    private static final double ADHESION = 3.0;
    private static final double RANGE = 0.2;
    private static final double DT = 0.01;

    private static CellPopulation packing(int n, Domain domain, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        CellPopulation population = new CellPopulation();
        for (int i = 0; i < n; i++) {
            double volume = 1 + rng.nextDouble();
            population.add(new Cell(i, -1, 0, 0, 10, new double[] {0}, RandomStreams.of(1).seedWords(i),
                    RADIUS + rng.nextDouble() * (domain.width() - 2 * RADIUS),
                    RADIUS + rng.nextDouble() * (domain.height() - 2 * RADIUS),
                    RADIUS + rng.nextDouble() * (domain.depth() - 2 * RADIUS), volume, 1.0));
        }
        return population;
    }

    private static double[][] bruteForce(CellPopulation p, Domain domain) {
        int n = p.size();
        double[][] out = new double[n][];
        double[] place = new double[3];
        for (int i = 0; i < n; i++) {
            Cell a = p.get(i);
            double[] f = new double[3];
            for (int k = 0; k < n; k++) {
                if (k == i) {
                    continue;
                }
                Cell b = p.get(k);
                double[] e = {a.x() - b.x(), domain.nearestImageDy(a.y() - b.y()), a.z() - b.z()};
                double reach = a.sphereRadius(RADIUS) + b.sphereRadius(RADIUS);
                double d = Math.sqrt(e[0] * e[0] + e[1] * e[1] + e[2] * e[2]);
                double scale = d < reach ? RATE * (reach - d) / d
                        : d < reach * (1 + RANGE) ? -ADHESION * (d - reach) / d : 0;
                for (int c = 0; c < 3; c++) {
                    f[c] += scale * e[c];
                }
            }
            domain.confine(a.x() + 0.5 * DT * f[0], a.y() + 0.5 * DT * f[1], a.z() + 0.5 * DT * f[2],
                    a.sphereRadius(RADIUS), place);
            out[i] = place.clone();
        }
        return out;
    }

    private static double[][] relaxed(CellPopulation p, Domain domain, int workers) {
        try (BlockParallel pool = new BlockParallel(workers)) {
            new OverlapRepulsion(domain, RATE, RADIUS, ADHESION, RANGE).relax(p, DT, pool);
        }
        double[][] out = new double[p.size()][];
        for (int i = 0; i < p.size(); i++) {
            out[i] = new double[] {p.get(i).x(), p.get(i).y(), p.get(i).z()};
        }
        return out;
    }

    @Test
    void eachPairOnceGivesTheStepOfTheAllPairsSumInABoxAndASlab() {
        // 900 spheres at about 1.2 x close packing in 60 x 50 x 40 µm; tolerance as in the flat
        // test (float radii and forces move a cell by well under 1e-6 µm).
        for (Domain domain : List.of(new Domain3d.Box(60, 50, 40), new Domain3d.Slab(60, 50, 40),
                new Domain3d.Slab(60, 18, 12))) {
            int n = (int) (domain.width() * domain.height() * domain.depth() / 130);
            double[][] expected = bruteForce(packing(n, domain, 5), domain);
            double[][] one = relaxed(packing(n, domain, 5), domain, 1);
            int moved = 0;
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < 3; c++) {
                    assertEquals(expected[i][c], one[i][c], 1e-6, domain + " cell " + i + " axis " + c);
                }
                moved += Math.abs(one[i][2] - packing(n, domain, 5).get(i).z()) > 1e-6 ? 1 : 0;
            }
            assertTrue(moved > 0.6 * n, "most cells feel a neighbour: " + moved + " of " + n);
            for (int workers = 2; workers <= 4; workers++) {
                double[][] many = relaxed(packing(n, domain, 5), domain, workers);
                for (int i = 0; i < n; i++) {
                    for (int c = 0; c < 3; c++) {
                        assertEquals(Double.doubleToLongBits(one[i][c]), Double.doubleToLongBits(many[i][c]),
                                domain + ", " + workers + " workers, cell " + i);
                    }
                }
            }
        }
    }

    @Test
    void twoOverlappingSpheresRelaxToContactAtTheRepulsionRate() {
        Domain box = new Domain3d.Box(100, 100, 100);
        CellPopulation p = new CellPopulation();
        double reach = 2 * RADIUS;
        double overlap = 1.0;
        // Along the body diagonal, so all three components are exercised.
        double s = (reach - overlap) / Math.sqrt(3) / 2;
        p.add(new Cell(0, -1, 0, 0, 10, new double[] {0}, RandomStreams.of(1).seedWords(0), 50 - s, 50 - s, 50 - s,
                1.0, 1.0));
        p.add(new Cell(1, -1, 0, 0, 10, new double[] {0}, RandomStreams.of(1).seedWords(1), 50 + s, 50 + s, 50 + s,
                1.0, 1.0));
        OverlapRepulsion mechanics = OverlapRepulsion.withoutAdhesion(box, RATE, RADIUS);
        int steps = 50;
        double dt = 0.001;
        for (int k = 0; k < steps; k++) {
            mechanics.relax(p, dt);
        }
        Cell a = p.get(0);
        Cell b = p.get(1);
        double d = Math.sqrt(Math.pow(a.x() - b.x(), 2) + Math.pow(a.y() - b.y(), 2) + Math.pow(a.z() - b.z(), 2));
        double expected = overlap * Math.pow(1 - RATE * dt, steps);
        assertEquals(expected, reach - d, 1e-6);
        // The continuum exp(-rate t) to the Euler step's first-order error.
        assertEquals(overlap * Math.exp(-RATE * steps * dt), reach - d, 0.01);
        // They separate along the diagonal and stay centred on it (to the single precision in
        // which the forces read z: 6e-8 relative, 3e-6 µm at 50 µm).
        assertEquals(100.0, a.x() + b.x(), 1e-9);
        assertEquals(a.x() - b.x(), a.z() - b.z(), 1e-6);
    }
}
