package org.fatefield.engine.mechanics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.domain.Domain;
import org.junit.jupiter.api.Test;

class OverlapRepulsionTest {

    private static Cell cellAt(long id, double x, double y) {
        return new Cell(id, -1, 0, 0, 10, new double[] {0}, RandomStreams.of(1).seedWords(id), x, y, 1.0, 1.0);
    }

    @Test
    void twoOverlappingCellsRelaxExponentiallyToContact() {
        // Overlap d = 2r - s obeys d' = -rate d (each disc moves rate d / 2): d(t) = d0 e^(-rate t),
        // and explicit Euler gives d0 (1 - rate dt)^n exactly.
        CellPopulation population = new CellPopulation();
        population.add(cellAt(0, 50, 50));
        population.add(cellAt(1, 53, 50));
        OverlapRepulsion repulsion = OverlapRepulsion.withoutAdhesion(new Domain.Rectangle(100, 100), 10.0, 2.5);
        double dt = 0.01;
        int steps = 200;
        for (int i = 0; i < steps; i++) {
            repulsion.relax(population, dt);
        }
        double separation = population.get(1).x() - population.get(0).x();
        double expectedOverlap = 2.0 * Math.pow(1 - 10.0 * dt, steps);
        assertEquals(5.0 - expectedOverlap, separation, 1e-9);
        assertEquals(50.0, population.get(0).y(), 0.0);
    }

    @Test
    void adhesionClosesASmallGapExponentially() {
        // Gap g between neighbours within reach obeys g' = -adhesion g (each moves adhesion g / 2);
        // explicit Euler gives g0 (1 - adhesion dt)^n exactly.
        CellPopulation population = new CellPopulation();
        population.add(cellAt(0, 50, 50));
        population.add(cellAt(1, 55.6, 50));
        OverlapRepulsion mechanics = new OverlapRepulsion(new Domain.Rectangle(100, 100), 10.0, 2.5, 4.0, 0.2);
        for (int i = 0; i < 100; i++) {
            mechanics.relax(population, 0.01);
        }
        double gap = population.get(1).x() - population.get(0).x() - 5.0;
        assertEquals(0.6 * Math.pow(1 - 4.0 * 0.01, 100), gap, 1e-9);
    }

    /**
     * On a strip two cells 2 µm apart across the seam overlap by 3 µm (radius 2.5), so in one
     * step each moves 0.5 dt rate overlap = 0.15 µm away from the other, across the seam
     * (computed by hand); in a rectangle they are 98 µm apart and do not move.
     */
    @Test
    void stripCellsPushAcrossTheSeamAndWrapAround() {
        CellPopulation strip = new CellPopulation();
        strip.add(cellAt(0, 50, 1));
        strip.add(cellAt(1, 50, 99));
        strip.add(cellAt(2, 20, 0.1));
        strip.add(cellAt(3, 20, 2.1));
        new OverlapRepulsion(new Domain.Strip(100, 100), 10.0, 2.5, 0, 0.2).relax(strip, 0.01);
        assertEquals(1.15, strip.get(0).y(), 1e-12);
        assertEquals(98.85, strip.get(1).y(), 1e-12);
        assertEquals(99.95, strip.get(2).y(), 1e-12);
        assertEquals(2.25, strip.get(3).y(), 1e-12);
        CellPopulation box = new CellPopulation();
        box.add(cellAt(0, 50, 3));
        box.add(cellAt(1, 50, 97));
        new OverlapRepulsion(new Domain.Rectangle(100, 100), 10.0, 2.5, 0, 0.2).relax(box, 0.01);
        assertEquals(3.0, box.get(0).y(), 0.0);
        assertEquals(97.0, box.get(1).y(), 0.0);
    }

    @Test
    void cellsStayInsideADisc() {
        CellPopulation population = new CellPopulation();
        for (int i = 0; i < 200; i++) {
            population.add(cellAt(i, 5 + 0.4 * i, 5 + 0.3 * (i % 17)));
        }
        OverlapRepulsion mechanics = new OverlapRepulsion(new Domain.Disc(100, 60), 20.0, 1.0, 0, 0.2);
        mechanics.relax(population, 0.01);
        for (Cell c : population.view()) {
            assertTrue(Math.hypot(c.x() - 50, c.y() - 30) <= 30 - 1.0 + 1e-9, c.x() + "," + c.y());
        }
    }

    @Test
    void cellsStayInsideTheWalls() {
        CellPopulation population = new CellPopulation();
        for (int i = 0; i < 50; i++) {
            population.add(cellAt(i, 1 + 0.01 * i, 1));
        }
        OverlapRepulsion repulsion = OverlapRepulsion.withoutAdhesion(new Domain.Rectangle(20, 20), 50.0, 1.0);
        for (int s = 0; s < 500; s++) {
            repulsion.relax(population, 0.01);
        }
        for (Cell c : population.view()) {
            assertTrue(c.x() >= 1.0 && c.x() <= 19.0 && c.y() >= 1.0 && c.y() <= 19.0, c.x() + "," + c.y());
        }
    }
}
