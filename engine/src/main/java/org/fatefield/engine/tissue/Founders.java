package org.fatefield.engine.tissue;

import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.EmbeddedStream;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.lineage.Ancestry;
import org.fatefield.engine.variability.ExtrinsicNoise;

/**
 * The founders of a tissue at time 0: placed uniformly at random in the domain, each with its
 * own random stream (keyed by its id), spread over its first cycle, with extrinsic scores drawn
 * and first-passage entry noted when it starts in the timed fate.
 */
final class Founders {

    private Founders() {
    }

    /**
     * Adds {@code spec}'s founders to {@code population} and {@code ancestry}, positions from
     * {@code placement}, cell streams from {@code streams}.
     */
    static void place(TissueSpec spec, RandomStreams streams, UniformRandomProvider placement, CellLoop cellLoop,
            CellPopulation population, Ancestry ancestry) {
        GrowthSpec growth = spec.growth();
        CircuitSetup circuit = spec.circuit();
        double r = growth.cellRadius();
        double[] point = new double[3];
        population.reserve(population.size() + growth.initialCells());
        for (int i = 0; i < growth.initialCells(); i++) {
            spec.domain().samplePoint(placement, r, point);
            long id = population.newId();
            EmbeddedStream.Detached birth = new EmbeddedStream.Detached(streams.seedWords(id));
            // Rounded as the cell keeps it, so that its starting volume is the one its own growth gives.
            double cycle = (float) growth.cycle().sample(birth);
            // Founders are spread over their cycle; cells that never divide all start at age 0.
            double age = growth.cycle().divides() ? cycle * birth.nextDouble() : 0.0;
            double z = spec.domain().threeD() ? point[2] : 0.0;
            Cell founder = new Cell(id, -1, 0, -age, cycle, circuit.initialState(), birth.streamWords(), point[0],
                    point[1], z, 1.0, growth.size().control().volume(1.0, age, cycle));
            if (!spec.extrinsic().isEmpty()) {
                founder.setScores(ExtrinsicNoise.founderScores(spec.extrinsic(),
                        cellLoop.serialRandom().of(founder)));
            }
            if (spec.fates().inFirstPassageFate(founder.liveState())) {
                founder.noteInFirstPassageFate(0.0);
            }
            population.add(founder);
            ancestry.add(id, -1);
        }
    }
}
