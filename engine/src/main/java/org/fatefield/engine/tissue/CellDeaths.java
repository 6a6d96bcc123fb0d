package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.cell.CellRandom;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.lineage.LineageSink;

/**
 * The death stage of the tick: each cell dies with probability {@code deathRate * dt} per step
 * (a constant hazard), drawn from its own stream, so who dies does not depend on the thread
 * count or the memory layout. The dead are removed (extruded) and their lineage records written
 * in order of id; the survivors keep their order.
 */
final class CellDeaths {

    private CellDeaths() {
    }

    /** Removes this step's dead from {@code population} at time {@code now}, recording each in {@code lineage}. */
    static void remove(TissueSpec spec, CellPopulation population, CellRandom random, LineageSink lineage, double dt,
            double now) {
        double p = spec.growth().deathRate() * dt;
        List<Cell> dead = new ArrayList<>();
        population.removeIf(cell -> {
            if (random.of(cell).nextDouble() >= p) {
                return false;
            }
            dead.add(cell);
            return true;
        });
        dead.sort(Comparator.comparingLong(Cell::id));
        for (Cell cell : dead) {
            lineage.accept(new LineageRecord(cell.id(), cell.parentId(), cell.generation(), cell.birthTime(),
                    Double.NaN, cell.birthX(), cell.birthY(), cell.birthZ(), -1, spec.fates().classify(cell.liveState()),
                    cell.fateSince(), now, cell.birthVolume(), cell.volume(), cell.firstEntry()));
        }
    }
}
