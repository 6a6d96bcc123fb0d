package org.fatefield.engine.tissue;

import org.fatefield.engine.division.CellSize;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;

/**
 * Founding population, cell size, mechanics and division. Built with {@link #of} and the
 * {@code with} copies for everything beyond the basics.
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
 * @param size          when cells divide and how unequally they share their volume
 */
public record GrowthSpec(int initialCells, double cellRadius, double repulsionRate, CycleTimeDistribution cycle,
        Partitioning partition, DivisionAxis axis, double deathRate, boolean dilution, double adhesion,
        CellSize size) {

    /** Direction of the division axis. */
    public enum DivisionAxis {
        /** Uniformly random. */
        RANDOM,
        /** Along x, the gradient axis. */
        X,
        /** Along y, across the gradient. */
        Y
    }

    /**
     * Founders, their size and mechanics, and how they divide; daughters placed along a random
     * axis, no death, dilution folded into degradation, no adhesion, timer size control.
     */
    public static GrowthSpec of(int initialCells, double cellRadius, double repulsionRate,
            CycleTimeDistribution cycle, Partitioning partition) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, cycle, partition, DivisionAxis.RANDOM, 0.0,
                false, 0, CellSize.FIXED);
    }

    /** With daughters placed along {@code value}. */
    public GrowthSpec withAxis(DivisionAxis value) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, cycle, partition, value, deathRate, dilution,
                adhesion, size);
    }

    /** With death (extrusion) at {@code value} per hour. */
    public GrowthSpec withDeathRate(double value) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, cycle, partition, axis, value, dilution,
                adhesion, size);
    }

    /** With (or without) dilution of concentrations by growth. */
    public GrowthSpec withDilution(boolean value) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, cycle, partition, axis, deathRate, value,
                adhesion, size);
    }

    /** With adhesion between near neighbours at {@code value} per hour. */
    public GrowthSpec withAdhesion(double value) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, cycle, partition, axis, deathRate, dilution,
                value, size);
    }

    /** With the size rules {@code value}. */
    public GrowthSpec withSize(CellSize value) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, cycle, partition, axis, deathRate, dilution,
                adhesion, value);
    }

    /** With {@code value} founders. */
    public GrowthSpec withInitialCells(int value) {
        return new GrowthSpec(value, cellRadius, repulsionRate, cycle, partition, axis, deathRate, dilution,
                adhesion, size);
    }

    /** With cycle times drawn from {@code value}. */
    public GrowthSpec withCycle(CycleTimeDistribution value) {
        return new GrowthSpec(initialCells, cellRadius, repulsionRate, value, partition, axis, deathRate, dilution,
                adhesion, size);
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
        if (size == null) {
            throw new IllegalArgumentException("cell size rules must be given (CellSize.FIXED for timer and equal halves)");
        }
        if (!(deathRate >= 0) || Double.isInfinite(deathRate)) {
            throw new IllegalArgumentException("death rate must be finite and at least 0, got " + deathRate);
        }
    }
}
