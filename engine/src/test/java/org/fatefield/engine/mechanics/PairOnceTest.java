package org.fatefield.engine.mechanics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.parallel.BlockParallel;
import org.junit.jupiter.api.Test;

/**
 * The pair-once force sum of {@link OverlapRepulsion} against a brute-force reference that visits
 * every ordered pair of cells (all n², nearest image across a strip's seam) and applies the same
 * law; and its independence of the number of workers, on boxes and strips with odd, even and
 * very few bucket rows.
 */
class PairOnceTest {

    private static final double RATE = 20.0;
    private static final double RADIUS = 2.5;
    private static final double ADHESION = 3.0;
    private static final double RANGE = 0.2;
    private static final double DT = 0.01;

    private static CellPopulation packing(int n, double width, double height, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        CellPopulation population = new CellPopulation();
        for (int i = 0; i < n; i++) {
            double volume = 1 + rng.nextDouble();
            population.add(new Cell(i, -1, 0, 0, 10, new double[] {0}, RandomStreams.of(1).seedWords(i),
                    RADIUS + rng.nextDouble() * (width - 2 * RADIUS), RADIUS + rng.nextDouble() * (height - 2 * RADIUS),
                    volume, 1.0));
        }
        return population;
    }

    /** One step by the definition: every other cell's push or pull, summed over all n - 1 of them. */
    private static double[][] bruteForce(CellPopulation p, Domain domain) {
        int n = p.size();
        double[][] out = new double[n][2];
        double[] place = new double[2];
        for (int i = 0; i < n; i++) {
            Cell a = p.get(i);
            double fx = 0;
            double fy = 0;
            for (int k = 0; k < n; k++) {
                if (k == i) {
                    continue;
                }
                Cell b = p.get(k);
                double ex = a.x() - b.x();
                double ey = domain.periodicY() ? domain.nearestImageDy(a.y() - b.y()) : a.y() - b.y();
                double reach = a.radius(RADIUS) + b.radius(RADIUS);
                double d = Math.hypot(ex, ey);
                if (d < reach) {
                    fx += RATE * (reach - d) / d * ex;
                    fy += RATE * (reach - d) / d * ey;
                } else if (d < reach * (1 + RANGE)) {
                    fx -= ADHESION * (d - reach) / d * ex;
                    fy -= ADHESION * (d - reach) / d * ey;
                }
            }
            domain.confine(a.x() + 0.5 * DT * fx, a.y() + 0.5 * DT * fy, a.radius(RADIUS), place);
            out[i] = place.clone();
        }
        return out;
    }

    private static double[][] relaxed(CellPopulation p, Domain domain, int workers) {
        return relaxed(p, domain, workers, Double.NaN);
    }

    private static double[][] relaxed(CellPopulation p, Domain domain, int workers, double volumeBound) {
        try (BlockParallel pool = new BlockParallel(workers)) {
            new OverlapRepulsion(domain, RATE, RADIUS, ADHESION, RANGE).relax(p, DT, pool, volumeBound);
        }
        double[][] out = new double[p.size()][];
        for (int i = 0; i < p.size(); i++) {
            out[i] = new double[] {p.get(i).x(), p.get(i).y()};
        }
        return out;
    }

    @Test
    void eachPairOnceGivesTheStepOfTheAllPairsSum() {
        // 800 cells at about 1.1 x close packing, so most have several overlapping neighbours.
        // The engine keeps radii and forces as floats (relative rounding 6e-8): on forces of
        // up to about 100 µm/h over half a 0.01 h step, and radii of about 5 µm, that moves a
        // cell by well under 1e-6 µm, the tolerance here.
        for (Domain domain : List.of(new Domain.Rectangle(160, 130), new Domain.Strip(160, 130))) {
            CellPopulation p = packing(800, 160, 130, 7);
            double[][] expected = bruteForce(p, domain);
            double[][] got = relaxed(p, domain, 2);
            int moved = 0;
            for (int i = 0; i < expected.length; i++) {
                assertEquals(expected[i][0], got[i][0], 1e-6, domain + " cell " + i + " x");
                assertEquals(expected[i][1], got[i][1], 1e-6, domain + " cell " + i + " y");
            }
            for (int i = 0; i < expected.length; i++) {
                moved += Math.abs(got[i][0] - packing(800, 160, 130, 7).get(i).x()) > 1e-6 ? 1 : 0;
            }
            assertTrue(moved > 600, "most cells feel a neighbour: " + moved);
        }
    }

    @Test
    void aLooserVolumeBoundAndCellsOfEqualXGiveTheSameStep() {
        // Volumes are below 2; a bound of 3.7 widens the buckets and the x windows (more
        // candidates, none missed). Every fourth cell is moved onto one of a few shared x values,
        // so the x-sorted slots must break ties (by id) and the windows include equal x.
        for (Domain domain : List.of(new Domain.Rectangle(160, 130), new Domain.Strip(160, 130))) {
            CellPopulation p = packing(800, 160, 130, 13);
            for (int i = 0; i < p.size(); i += 4) {
                p.get(i).moveTo(40.0 + 20.0 * (i % 5), p.get(i).y());
            }
            double[][] expected = bruteForce(p, domain);
            double[][] got = relaxed(p, domain, 2, 3.7);
            for (int i = 0; i < expected.length; i++) {
                assertEquals(expected[i][0], got[i][0], 1e-6, domain + " cell " + i + " x");
                assertEquals(expected[i][1], got[i][1], 1e-6, domain + " cell " + i + " y");
            }
        }
    }

    @Test
    void theStepIsTheSameBitForBitWhateverTheNumberOfWorkers() {
        // Strip heights chosen for 1, 2, 3, 4 and 7 bucket rows (a row is at least one
        // interaction range, about 17 µm here), and a box.
        List<Domain> domains = new ArrayList<>(List.of(new Domain.Rectangle(300, 140)));
        for (double height : new double[] {18, 36, 54, 72, 126}) {
            domains.add(new Domain.Strip(300, height));
        }
        for (Domain domain : domains) {
            int n = (int) (300 * domain.height() / 25);
            double[][] one = relaxed(packing(n, 300, domain.height(), 11), domain, 1);
            for (int workers : new int[] {2, 3, 4}) {
                double[][] many = relaxed(packing(n, 300, domain.height(), 11), domain, workers);
                for (int i = 0; i < n; i++) {
                    assertEquals(Double.doubleToLongBits(one[i][0]), Double.doubleToLongBits(many[i][0]),
                            domain + " height " + domain.height() + ", " + workers + " workers, cell " + i);
                    assertEquals(Double.doubleToLongBits(one[i][1]), Double.doubleToLongBits(many[i][1]));
                }
            }
            double[][] reference = bruteForce(packing(n, 300, domain.height(), 11), domain);
            for (int i = 0; i < n; i++) {
                assertEquals(reference[i][1], one[i][1], 1e-6, "height " + domain.height() + " cell " + i);
            }
        }
    }

    @Test
    void rowsOfOnePassNeverWriteTheSameRowAndEveryRowIsInOnePass() {
        for (boolean periodic : new boolean[] {false, true}) {
            for (int rows = 1; rows <= 40; rows++) {
                Set<Integer> seen = new HashSet<>();
                for (int[] pass : RowPasses.of(rows, periodic)) {
                    Set<Integer> written = new HashSet<>();
                    for (int row : pass) {
                        assertTrue(seen.add(row), rows + " rows: row " + row + " twice");
                        assertTrue(written.add(row), rows + " rows, periodic " + periodic + ": row " + row);
                        if (RowPasses.pairsWithNext(row, rows, periodic)) {
                            assertTrue(written.add((row + 1) % rows), rows + " rows, periodic " + periodic
                                    + ": row " + (row + 1) % rows + " written twice in one pass");
                        }
                    }
                }
                assertEquals(rows, seen.size());
            }
        }
    }
}
