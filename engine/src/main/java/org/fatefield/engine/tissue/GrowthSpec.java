package org.fatefield.engine.tissue;

import org.fatefield.engine.division.CellSize;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.mechanics.DomainShape;

/**
 * Founding population, cell size, mechanics and division.
 *
 * @param initialCells  founder cells, placed uniformly at random, at least 1
 * @param cellRadius    radius of a newborn cell (µm), greater than 0
 * @param repulsionRate overlap relaxation rate (1 / h), at least 0
 * @param cycle         cycle-time distribution
 * @param partition     how molecules are shared at division
 * @param axis          direction along which daughters are placed
 * @param deathRate     probability per hour that a cell dies and is removed (extrusion), at least 0
 * @param dilution      if true, concentrations dilute as the cell's volume grows (volume doubles
 *                      linearly over the cycle); if false, degradation rates are taken to include dilution
 * @param adhesion      attraction rate between near neighbours (1 / h), at least 0
 * @param shape         where cells live: the rectangle, its inscribed disc, or a strip periodic along y
 * @param size          when cells divide and how unequally they share their volume
 */
public record GrowthSpec(int initialCells, double cellRadius, double repulsionRate, CycleTimeDistribution cycle,
        Partitioning partition, DivisionAxis axis, double deathRate, boolean dilution, double adhesion,
        DomainShape shape, CellSize size) {


    /** Without adhesion, in a rectangle. */
    public GrowthSpec(int initialCells, double cellRadius, double repulsionRate, CycleTimeDistribution cycle,
            Partitioning partition, DivisionAxis axis, double deathRate, boolean dilution) {
        this(initialCells, cellRadius, repulsionRate, cycle, partition, axis, deathRate, dilution, 0,
                DomainShape.RECTANGLE, CellSize.FIXED);
    }

    /** Direction of the division axis. */
    public enum DivisionAxis {
        /** Uniformly random. */
        RANDOM,
        /** Along x, the gradient axis. */
        X,
        /** Along y, across the gradient. */
        Y
    }

    /** Random axis, no death, dilution folded into degradation. */
    public GrowthSpec(int initialCells, double cellRadius, double repulsionRate, CycleTimeDistribution cycle,
            Partitioning partition) {
        this(initialCells, cellRadius, repulsionRate, cycle, partition, DivisionAxis.RANDOM, 0.0, false, 0,
                DomainShape.RECTANGLE, CellSize.FIXED);
    }

    /** Validates. */
    public GrowthSpec {
        if (initialCells < 1) {
            throw new IllegalArgumentException("initial cells must be at least 1, got " + initialCells);
        }
        if (!(cellRadius > 0) || Double.isInfinite(cellRadius)) {
            throw new IllegalArgumentException("cell radius must be finite and greater than 0, got " + cellRadius);
        }
        if (!(repulsionRate >= 0) || Double.isInfinite(repulsionRate)) {
            throw new IllegalArgumentException("repulsion rate must be finite and at least 0, got " + repulsionRate);
        }
        if (!(adhesion >= 0) || Double.isInfinite(adhesion)) {
            throw new IllegalArgumentException("adhesion must be finite and at least 0, got " + adhesion);
        }
        if (shape == null) {
            throw new IllegalArgumentException("domain shape must be given (rectangle, disc or strip)");
        }
        if (size == null) {
            throw new IllegalArgumentException("cell size rules must be given (CellSize.FIXED for timer and equal halves)");
        }
        if (!(deathRate >= 0) || Double.isInfinite(deathRate)) {
            throw new IllegalArgumentException("death rate must be finite and at least 0, got " + deathRate);
        }
    }
}
