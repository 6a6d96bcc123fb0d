package org.fatefield.engine.cell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.parallel.BlockParallel;
import org.junit.jupiter.api.Test;

/**
 * The population keeps positions and volumes in its own array: every operation that adds,
 * replaces, removes or reorders cells must leave each cell reading its own values, and a cell
 * that leaves must keep the values it had. Checked against a plain model (a JDK list of cells and
 * a map from id to the values each cell was last given) over a fixed-seed random sequence of
 * 2000 operations.
 */
class CellPlacesTest {

    private final SplittableRandom random = new SplittableRandom(20261204L);
    private final CellPopulation population = new CellPopulation();
    private final List<Cell> model = new ArrayList<>();
    private final Map<Long, double[]> values = new HashMap<>();
    private final List<Cell> gone = new ArrayList<>();

    private Cell newCell() {
        long id = population.newId();
        double[] v = {random.nextDouble(0, 100), random.nextDouble(0, 100), random.nextDouble(0, 10),
            random.nextDouble(0.5, 2)};
        values.put(id, v);
        return new Cell(id, -1, 0, 0, 10, new double[] {0}, RandomStreams.of(3).seedWords(id), v[0], v[1], v[2], 1.0,
                v[3]);
    }

    @Test
    void everyCellReadsItsOwnValuesThroughAddReplaceRemoveSortAndRelocate() {
        try (BlockParallel pool = new BlockParallel(2)) {
            for (int i = 0; i < 50; i++) {
                Cell c = newCell();
                population.add(c);
                model.add(c);
            }
            for (int op = 0; op < 2000; op++) {
                int kind = random.nextInt(6);
                if (kind == 0 || model.isEmpty()) {
                    Cell c = newCell();
                    population.add(c);
                    model.add(c);
                } else if (kind == 1) {
                    int i = random.nextInt(model.size());
                    Cell c = newCell();
                    gone.add(model.get(i));
                    population.replace(i, c);
                    model.set(i, c);
                } else if (kind == 2) {
                    long cut = random.nextLong(population.peekNextId() + 1);
                    population.removeIf(c -> c.id() % 7 == cut % 7);
                    model.removeIf(c -> {
                        boolean out = c.id() % 7 == cut % 7;
                        if (out) {
                            gone.add(c);
                        }
                        return out;
                    });
                } else if (kind == 3) {
                    int i = random.nextInt(model.size());
                    double[] v = values.get(model.get(i).id());
                    v[0] = random.nextDouble(0, 100);
                    v[1] = random.nextDouble(0, 100);
                    v[2] = random.nextDouble(0, 10);
                    if (random.nextBoolean()) {
                        population.moveTo(i, v[0], v[1], v[2]);
                    } else {
                        model.get(i).moveTo(v[0], v[1], v[2]);
                    }
                } else if (kind == 4) {
                    List<Long> before = ids(model);
                    population.sortByBlock(20, 100, 100, pool);
                    model.clear();
                    model.addAll(population.view());
                    assertEquals(before, ids(model), "the sort must keep exactly the same cells");
                } else {
                    population.relocateInOrder();
                    model.clear();
                    model.addAll(population.view());
                }
                check();
            }
        }
    }

    private static List<Long> ids(List<Cell> cells) {
        return cells.stream().map(Cell::id).sorted().toList();
    }

    private void check() {
        assertEquals(model.size(), population.size());
        for (int i = 0; i < model.size(); i++) {
            Cell c = population.get(i);
            assertSame(model.get(i), c);
            double[] v = values.get(c.id());
            assertEquals(v[0], c.x(), 0.0, "x of cell " + c.id());
            assertEquals(v[1], c.y(), 0.0);
            assertEquals(v[2], c.z(), 0.0);
            assertEquals(v[3], c.volume(), 0.0);
            assertEquals(v[0], population.x(i), 0.0);
            assertEquals(v[3], population.volume(i), 0.0);
        }
        for (Cell c : gone) {
            double[] v = values.get(c.id());
            assertEquals(v[0], c.x(), 0.0, "a cell that left, id " + c.id());
            assertEquals(v[3], c.volume(), 0.0);
        }
    }
}
