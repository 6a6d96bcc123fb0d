package org.fatefield.engine.tissue;

import java.util.Arrays;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.EmbeddedStream;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.cell.CellPopulation;
import org.fatefield.engine.cell.CellRandom;
import org.fatefield.engine.division.CellSize;
import org.fatefield.engine.lineage.Ancestry;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.lineage.LineageSink;
import org.fatefield.engine.variability.ExtrinsicNoise;

/**
 * Divides every cell that is ready, in order of the mothers' ids (so the daughters' ids, and
 * with them their random streams, do not depend on the population's memory order): writes the
 * mother's lineage record, shares her volume and molecules, and puts the first daughter in her
 * slot and the second at the end of the population. Every draw comes from the mother's own
 * stream, then each daughter's.
 */
final class CellDivision {

    private final TissueSpec spec;
    private final RandomStreams streams;
    private final double[] firstDaughter;
    private final double[] secondDaughter;
    private final CellRandom random;
    private final boolean threeD;
    private long[] order = new long[0];
    private final double[] place = new double[3];

    CellDivision(TissueSpec spec, RandomStreams streams, CellRandom random) {
        this.spec = spec;
        this.streams = streams;
        this.random = random;
        int species = spec.circuit().network().speciesCount();
        this.firstDaughter = new double[species];
        this.secondDaughter = new double[species];
        this.threeD = spec.domain().threeD();
    }

    /**
     * Divides the cells of {@code population} marked in {@code ready} (by population index, as
     * the cell loop found them at time {@code now}), in order of id.
     */
    void divideReady(CellPopulation population, boolean[] ready, Ancestry ancestry, LineageSink lineage,
            double now) {
        GrowthSpec growth = spec.growth();
        CellSize size = growth.size();
        int count = readyInIdOrder(population, ready);
        for (int k = 0; k < count; k++) {
            int i = (int) order[k];
            Cell mother = population.get(i);
            lineage.accept(new LineageRecord(mother.id(), mother.parentId(), mother.generation(), mother.birthTime(),
                    now, mother.birthX(), mother.birthY(), mother.birthZ(), spec.fates().classify(mother.liveState()), -1, Double.NaN,
                    Double.NaN, mother.birthVolume(), mother.volume(), mother.firstEntry()));
            UniformRandomProvider rng = random.of(mother);
            double fraction = size.firstFraction(rng);
            growth.partition().split(mother.liveState(), mother.volume(), fraction, spec.circuit().systemSize(), rng,
                    firstDaughter, secondDaughter);
            double angle = switch (growth.axis()) {
                case X -> 0.0;
                case Y -> 0.5 * Math.PI;
                case RANDOM -> 2 * Math.PI * rng.nextDouble();
            };
            // In 3-D a random axis is uniform on the sphere (Archimedes: z uniform on [-1, 1]).
            double cosPolar = threeD && growth.axis() == GrowthSpec.DivisionAxis.RANDOM ? 2 * rng.nextDouble() - 1 : 0.0;
            double sinPolar = Math.sqrt(1 - cosPolar * cosPolar);
            double half = mother.volume() / 2.0;
            double offset = 0.5 * growth.cellRadius() * (threeD ? Math.cbrt(half) : Math.sqrt(half));
            double ox = offset * sinPolar * Math.cos(angle);
            double oy = offset * sinPolar * Math.sin(angle);
            double oz = offset * cosPolar;
            double v = mother.volume();
            population.replace(i, daughter(population, ancestry, mother, firstDaughter, fraction * v, now,
                    mother.x() + ox, mother.y() + oy, mother.z() + oz));
            population.add(daughter(population, ancestry, mother, secondDaughter, (1 - fraction) * v, now,
                    mother.x() - ox, mother.y() - oy, mother.z() - oz));
        }
    }

    private Cell daughter(CellPopulation population, Ancestry ancestry, Cell mother, double[] state, double volume,
            double now, double x, double y, double z) {
        long id = population.newId();
        ancestry.add(id, mother.id());
        EmbeddedStream.Detached birth = new EmbeddedStream.Detached(streams.seedWords(id));
        double cycle = spec.growth().cycle().sample(birth);
        spec.domain().confine(x, y, z, spec.growth().cellRadius(), place);
        Cell cell = new Cell(id, mother.id(), mother.generation() + 1, now, cycle, state.clone(), birth.streamWords(),
                place[0], place[1], place[2], volume, volume);
        cell.setFate(mother.fate(), mother.fateSince());
        if (spec.fates().inFirstPassageFate(cell.liveState())) {
            // Born in the timed fate: its own first entry is its birth.
            cell.noteInFirstPassageFate(now);
        }
        if (!spec.extrinsic().isEmpty()) {
            cell.setScores(ExtrinsicNoise.daughterScores(spec.extrinsic(), mother.scores(), random.of(cell)));
        }
        return cell;
    }

    /**
     * Puts the population indices of the ready cells into {@link #order}, sorted by the cells'
     * ids, and returns how many there are. Ids and indices are packed into one sortable long
     * (an id in the high bits, the index in the low 32), so the sort allocates nothing; ids fit
     * in 31 bits, as {@link Ancestry} requires.
     */
    private int readyInIdOrder(CellPopulation population, boolean[] ready) {
        int n = population.size();
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (ready[i]) {
                if (count == order.length) {
                    order = Arrays.copyOf(order, Math.max(16, count + count / 2));
                }
                order[count++] = (population.get(i).id() << 32) | i;
            }
        }
        Arrays.sort(order, 0, count);
        for (int j = 0; j < count; j++) {
            order[j] &= 0xffffffffL;
        }
        return count;
    }
}
