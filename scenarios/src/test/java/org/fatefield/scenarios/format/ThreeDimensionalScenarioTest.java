package org.fatefield.scenarios.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.engine.domain.Domain3d;
import org.junit.jupiter.api.Test;

/**
 * The 3-D keys of a scenario: a box or slab with a depth compiles to a 3-D domain whose field
 * grid has the expected cubes; every inconsistent combination is refused before anything runs,
 * naming the key and how to fix it (validate accepts only what runs).
 */
class ThreeDimensionalScenarioTest {

    private static final Path EXAMPLE = Path.of("examples", "glassfin-block-3d.toml");

    private static Scenario read(Overrides overrides) throws Exception {
        return ScenarioReader.parse(EXAMPLE.toString(), "block", Files.readAllBytes(EXAMPLE), Path.of("examples"),
                overrides);
    }

    private static String refused(Overrides overrides) {
        return assertThrows(ScenarioException.class, () -> read(overrides)).getMessage();
    }

    @Test
    void aBoxCompilesToASolidDomainAndASlabToAPeriodicOne() throws Exception {
        Scenario box = read(Overrides.none());
        assertEquals(new Domain3d.Box(600, 240, 80), box.tissue().domain());
        Scenario slab = read(Overrides.none().with("tissue.shape", "slab"));
        assertTrue(slab.tissue().domain() instanceof Domain3d.Slab && slab.tissue().domain().periodicY());
    }

    @Test
    void inconsistentShapesAndDepthsAreRefusedWithTheKeyAndTheFix() {
        String flat = refused(Overrides.none().with("tissue.shape", "rectangle"));
        assertTrue(flat.contains("tissue.depth") && flat.contains("use shape = \"box\" or \"slab\""), flat);
        String noDepth = refused(Overrides.none().with("tissue.depth", 0.0));
        assertTrue(noDepth.contains("a box is three-dimensional: give tissue.depth"), noDepth);
        String thin = refused(Overrides.none().with("tissue.depth", 6.0));
        assertTrue(thin.contains("cell_radius") && thin.contains("6.0 µm deep"), thin);
        String fine = refused(Overrides.none().with("morphogen.grid_spacing", 0.5));
        assertTrue(fine.contains("grid_spacing") && fine.contains("grid cubes") && fine.contains("at most 16777216"),
                fine);
    }
}
