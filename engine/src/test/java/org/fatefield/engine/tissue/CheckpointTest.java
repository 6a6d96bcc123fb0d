package org.fatefield.engine.tissue;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.model.GeneKinetics;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.field.SourceRegion;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.variability.ExtrinsicNoise;
import org.junit.jupiter.api.Test;

/** A run stopped at a checkpoint and resumed equals a straight run, bit for bit. */
class CheckpointTest {

    private static TissueSpec spec() {
        return spec(new Domain.Rectangle(200, 100));
    }

    private static TissueSpec spec(Domain domain) {
        SelfActivatingSwitch sw = SelfActivatingSwitch.symmetric("A", "B",
                new GeneKinetics(0.05, 0.2, 0.5, 4, 1.0, 0.5, 4, 1.0));
        return TissueSpec.of(new CircuitSetup(sw, NoiseMode.LANGEVIN, 50, new double[] {0.3, 0.3}),
                new ParameterMapping(sw.defaultParameters(), List.of(SignalCoupling.of("repression",
                        sw.parameterGroup("repression"), new CouplingLaw.Hill(0.2, 1.8, 1, 2)))),
                        MorphogenSpec.of(2000, 0.3, 10, 0, List.of(new SourceRegion(0, 0, 20, 100, 3))),
                                domain, GrowthSpec.of(60, 3, 20,
                                new CycleTimeDistribution(CycleTimeDistribution.Kind.GAMMA, 3, 0.2),
                                Partitioning.binomial()).withAxis(GrowthSpec.DivisionAxis.RANDOM).withDeathRate(0.02)
                                .withDilution(true), new FateClassifier(List.of(
                        new FateRule("a", new double[] {0.6, Double.NaN}, new double[] {Double.NaN, 0.35}),
                        new FateRule("b", new double[] {Double.NaN, 0.6}, new double[] {0.35, Double.NaN})), "p"),
                                new Timing(8, 0.01, 0.5)).withExtrinsic(List.of(new ExtrinsicNoise("degradation",
                                sw.parameterGroup("degradation"), 0.1, 0.8)));
    }

    @Test
    void resumedRunEqualsTheStraightRun() throws IOException {
        resumesExactly(new Domain.Rectangle(200, 100));
    }

    /** The same in a 3-D box: positions along z, spheres, and the explicit scheme on a cubic grid. */
    @Test
    void resumedThreeDimensionalRunEqualsTheStraightRun() throws IOException {
        resumesExactly(new org.fatefield.engine.domain.Domain3d.Box(200, 100, 30));
    }

    private static void resumesExactly(Domain domain) throws IOException {
        List<LineageRecord> straightRecords = new ArrayList<>();
        Tissue straight = new Tissue(spec(domain), 77, 2);
        straight.setLineageSink(straightRecords::add);
        straight.start();
        straight.runToEnd();

        List<LineageRecord> resumedRecords = new ArrayList<>();
        Tissue first = new Tissue(spec(domain), 77, 1);
        first.setLineageSink(resumedRecords::add);
        first.start();
        first.advance(333);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        first.writeCheckpoint(new DataOutputStream(bytes));
        first.finish();

        Tissue resumed = new Tissue(spec(domain), 77, 2);
        resumed.setLineageSink(resumedRecords::add);
        resumed.start();
        resumed.readCheckpoint(new DataInputStream(new ByteArrayInputStream(bytes.toByteArray())));
        resumed.runToEnd();

        assertTrue(straight.cells().size() > 200, "cells " + straight.cells().size());
        assertEquals(straight.cells().size(), resumed.cells().size());
        for (int i = 0; i < straight.cells().size(); i++) {
            Cell a = straight.cells().get(i);
            Cell b = resumed.cells().get(i);
            assertEquals(a.id(), b.id());
            assertEquals(a.x(), b.x(), 0.0);
            assertEquals(a.z(), b.z(), 0.0);
            assertArrayEquals(a.state(), b.state(), 0.0);
            assertArrayEquals(a.scores(), b.scores(), 0.0);
        }
        assertEquals(straight.series().rows().size(), resumed.series().rows().size());
        for (int r = 0; r < straight.series().rows().size(); r++) {
            assertArrayEquals(straight.series().rows().get(r).fateCounts(), resumed.series().rows().get(r)
                    .fateCounts());
        }
        assertEquals(straightRecords, resumedRecords);
    }

    /**
     * A checkpoint whose bytes were altered without breaking its file checksum (crafted): a cell
     * count, an array length or a row width that does not fit the scenario is refused with a
     * message before anything is allocated from it.
     */
    @Test
    void craftedLengthsAreRefusedWithAMessage() throws IOException {
        Tissue first = new Tissue(spec(), 5, 1);
        first.start();
        first.advance(120);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        first.writeCheckpoint(new DataOutputStream(bytes));
        first.finish();
        byte[] good = bytes.toByteArray();
        // Layout: magic, steps, next id (8 bytes each), cell count (4), then the first cell: id,
        // parent (8 each), generation (4), birth and cycle time (8 each), state length (4).
        int[][] edits = {{24, Integer.MAX_VALUE}, {24, -3}, {64, 1_000_000_000}, {64, 3}};
        for (int[] edit : edits) {
            byte[] bad = good.clone();
            java.nio.ByteBuffer.wrap(bad).putInt(edit[0], edit[1]);
            Tissue resumed = new Tissue(spec(), 5, 1);
            resumed.start();
            IOException e = org.junit.jupiter.api.Assertions.assertThrows(IOException.class,
                    () -> resumed.readCheckpoint(new DataInputStream(new ByteArrayInputStream(bad))),
                    "offset " + edit[0] + " set to " + edit[1]);
            assertTrue(e.getMessage().contains("damaged") || e.getMessage().contains("does not fit"), e.getMessage());
            resumed.finish();
        }
    }
}
