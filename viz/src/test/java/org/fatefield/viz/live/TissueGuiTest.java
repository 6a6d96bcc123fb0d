package org.fatefield.viz.live;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.Comparator;
import java.util.List;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.NoiseMode;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueSpec;
import org.junit.jupiter.api.Test;

/** The live view follows a clicked cell by id, through the population's relocation in memory and its division. */
class TissueGuiTest {

    @Test
    void selectionSurvivesRelocationAndEndsAtDivision() {
        CustomNetwork decay = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {1},
                List.of(new CustomNetwork.ReactionDefinition("decay", new int[] {-1}, "k * X")));
        TissueSpec spec = TissueSpec.of(new CircuitSetup(decay, NoiseMode.NONE, 100, new double[] {1.0}),
                new ParameterMapping(decay.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 10, 0, List.of()),
                new Domain.Rectangle(200, 100), GrowthSpec.of(30, 4, 10,
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 4, 0), Partitioning.equal()),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})), "low"),
                new Timing(10, 0.01, 0.5));
        Tissue tissue = new Tissue(spec, 3);
        tissue.setMemoryLayout(1, 1);
        TissueGui gui = new TissueGui(tissue);
        gui.start();
        // The youngest founder divides last: it lives through several relocations first.
        Cell chosen = tissue.cells().stream().max(Comparator.comparingDouble(Cell::birthTime)).orElseThrow();
        gui.select(chosen);
        tissue.advance(3);
        Cell followed = gui.selected();
        assertNotNull(followed, "the cell is still alive after 3 steps");
        assertNotSame(chosen, followed, "relocating every step replaced the object");
        assertEquals(chosen.id(), followed.id());
        assertEquals(4, gui.selectedTrace().size(), "one sample at start and one per step, from the tick's observer");
        tissue.advance(500);
        assertNull(gui.selected(), "the founder has divided");
        assertEquals(chosen.id(), gui.selectedId());
        tissue.finish();
    }

    /**
     * In a 3-D box the view holds exactly the cells whose sphere the chosen plane cuts
     * (|z - plane| < R, counted here directly), and moving the plane changes that set.
     */
    @Test
    void theViewOfABoxHoldsTheCellsItsSliceCuts() {
        CustomNetwork decay = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {1},
                List.of(new CustomNetwork.ReactionDefinition("decay", new int[] {-1}, "k * X")));
        TissueSpec spec = TissueSpec.of(new CircuitSetup(decay, NoiseMode.NONE, 100, new double[] {1.0}),
                new ParameterMapping(decay.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 10, 0, List.of()),
                new org.fatefield.engine.domain.Domain3d.Box(200, 100, 60), GrowthSpec.of(300, 4, 0,
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0), Partitioning.equal()),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})), "low"),
                new Timing(1, 0.01, 0.5));
        Tissue tissue = new Tissue(spec, 3);
        TissueGui gui = new TissueGui(tissue);
        gui.start();
        assertEquals(30.0, gui.slicePlane(), 0.0);
        for (double plane : new double[] {30.0, 8.0, 55.0}) {
            gui.setSlicePlane(plane);
            long cut = tissue.cells().stream().filter(c -> Math.abs(c.z() - plane) < c.sphereRadius(4)).count();
            assertEquals(cut, gui.liveCells().stream().filter(c -> gui.cells().getField() instanceof
                    sim.field.continuous.Continuous2D space && space.getObjectLocation(c) != null).count(),
                    "plane " + plane);
            org.junit.jupiter.api.Assertions.assertTrue(cut > 10 && cut < 300, "a slice, not the whole: " + cut);
        }
        tissue.finish();
    }
}
