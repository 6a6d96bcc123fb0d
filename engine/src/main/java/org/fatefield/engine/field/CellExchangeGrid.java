package org.fatefield.engine.field;

import java.util.Arrays;
import java.util.List;
import java.util.function.ToIntFunction;
import org.fatefield.engine.cell.Cell;

/**
 * What the cells add to and take from a field, per grid square: secretion (concentration per
 * hour) and first-order uptake (per hour). Allocated only when cells first exchange, since most
 * fields never do. Counts and volumes are summed exactly (volumes in fixed point, to 2^-40), so
 * the result does not depend on the order in which cells are gathered.
 */
final class CellExchangeGrid {

    private static final double FIXED_POINT = 0x1p40;

    /** Secretion per square (concentration / h). */
    final double[] source;
    /** Uptake per square (1 / h). */
    final double[] uptake;
    private final int[] secretingCells;
    private final long[] coveredVolume;

    CellExchangeGrid(int squares) {
        source = new double[squares];
        uptake = new double[squares];
        secretingCells = new int[squares];
        coveredVolume = new long[squares];
    }

    /** Copies given secretion and uptake maps (one value per square). */
    void set(double[] amount, double[] rate) {
        System.arraycopy(amount, 0, source, 0, source.length);
        System.arraycopy(rate, 0, uptake, 0, uptake.length);
    }

    /**
     * Gathers {@code cells} by {@code squareOf}: each secreting cell adds {@code secretionRate}
     * over {@code squareSize} (the area, or in 3-D the volume, of a square); uptake is
     * {@code uptakeRate} times the share of the square the cells fill, a cell of volume V filling
     * {@code V * newbornSize}.
     */
    void gather(List<Cell> cells, ToIntFunction<Cell> squareOf, MorphogenSpec.CellExchange exchange,
            double squareSize, double newbornSize) {
        Arrays.fill(secretingCells, 0);
        Arrays.fill(coveredVolume, 0L);
        int secreting = exchange.secretingFate();
        for (Cell cell : cells) {
            int k = squareOf.applyAsInt(cell);
            if (secreting == MorphogenSpec.CellExchange.ALL || secreting == cell.fate()) {
                secretingCells[k]++;
            }
            coveredVolume[k] += Math.round(cell.volume() * FIXED_POINT);
        }
        double perCell = exchange.secretionRate() / squareSize;
        double perVolume = exchange.uptake() * newbornSize / squareSize / FIXED_POINT;
        for (int k = 0; k < source.length; k++) {
            source[k] = secretingCells[k] * perCell;
            uptake[k] = coveredVolume[k] * perVolume;
        }
    }
}
