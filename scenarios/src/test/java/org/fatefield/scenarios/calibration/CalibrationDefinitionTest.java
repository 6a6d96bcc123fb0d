package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.fatefield.circuits.inference.Prior;
import org.fatefield.scenarios.format.ScenarioException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The calibration and data files: a good pair reads into the settings written, and each kind of
 * mistake is reported with where it is and what to write instead, all at once, before anything
 * runs.
 */
class CalibrationDefinitionTest {

    @TempDir
    Path tmp;

    private static final String DATA = """
            [data]
            description = "test"
            [[statistic]]
            name = "boundary_progenitor_um"
            value = 250.0
            sd = 8.0
            unit = "um"
            """;

    private Path write(String calibration, String data) throws Exception {
        Files.writeString(tmp.resolve("data.toml"), data);
        Path file = tmp.resolve("calibration.toml");
        Files.writeString(file, calibration);
        return file;
    }

    @Test
    void aGoodFileReadsIntoItsSettings() throws Exception {
        CalibrationDefinition d = CalibrationDefinition.read(write("""
                [calibration]
                scenario = "demo"
                data = "data.toml"
                particles = 50
                generations = 4
                seed = 9
                [[parameter]]
                key = "morphogen.decay"
                prior = "log-uniform"
                low = 0.1
                high = 0.5
                """, DATA));
        assertEquals(50, d.settings().particles());
        assertEquals(50, d.settings().batch());
        assertEquals(4, d.settings().maxGenerations());
        assertEquals(9, d.settings().seed());
        assertEquals(new Prior.LogUniform(0.1, 0.5), d.models().get(0).parameters().get(0).prior());
        assertEquals(250.0, d.data().observations().get(0).value(), 0.0);
    }

    @Test
    void everyMistakeIsReportedWithItsPlaceAndAFix() throws Exception {
        ScenarioException e = assertThrows(ScenarioException.class, () -> CalibrationDefinition.read(write("""
                [calibration]
                scenario = "demo"
                data = "data.toml"
                particels = 50
                [[parameter]]
                key = "morphogen.decay"
                prior = "uniform"
                low = 0.1
                [[parameter]]
                key = "morphogen.no_such_key"
                prior = "normal"
                mean = 1.0
                sd = 0.1
                """, DATA.replace("boundary_progenitor_um", "boundary_progenitr_um")
                        + "[[statistic]]\nname = \"positional_error_progenitor_um\"\nvalue = 5.0\nsd = 1.0\n")));
        String m = e.getMessage();
        assertTrue(m.contains("calibration.particels") && m.contains("did you mean 'particles'"), m);
        assertTrue(m.contains("a uniform prior takes low and high"), m);
        assertTrue(m.contains("no_such_key"), m);
        assertTrue(m.contains("did you mean 'boundary_progenitor_um'"), m);
        assertTrue(m.contains("set calibration.replicates to 2 or more"), m);
    }

    @Test
    void aDataFileOutsideTheFolderAndAMismatchedUnitAreRefused() throws Exception {
        ScenarioException e = assertThrows(ScenarioException.class, () -> CalibrationDefinition.read(write("""
                [calibration]
                scenario = "demo"
                data = "../elsewhere.toml"
                [[parameter]]
                key = "morphogen.decay"
                prior = "uniform"
                low = 0.1
                high = 0.5
                """, DATA)));
        assertTrue(e.getMessage().contains("must name a file in this file's folder"), e.getMessage());
        ScenarioException unit = assertThrows(ScenarioException.class, () -> CalibrationDefinition.read(write("""
                [calibration]
                scenario = "demo"
                data = "data.toml"
                [[parameter]]
                key = "morphogen.decay"
                prior = "uniform"
                low = 0.1
                high = 0.5
                """, DATA.replace("unit = \"um\"", "unit = \"mm\""))));
        assertTrue(unit.getMessage().contains("unit \"mm\" does not fit: this statistic is in um"), unit.getMessage());
    }

    @Test
    void aMeasuredProfileBecomesOnePointPerRowAndFateAndABadRowIsNamed() throws Exception {
        String calibration = """
                [calibration]
                scenario = "demo"
                data = "data.toml"
                [[parameter]]
                key = "morphogen.decay"
                prior = "uniform"
                low = 0.1
                high = 0.5
                """;
        Files.writeString(tmp.resolve("profile.csv"), "x_um,fate,fraction,sd\n100,photocyte,0.4,0.05\n"
                + "200,photocyte,,0.05\n300,photocyte,0.1,0.02\n");
        CalibrationDefinition d = CalibrationDefinition.read(write(calibration, DATA + "[profile]\nfile = \"profile.csv\"\n"));
        assertEquals(3, d.data().observations().size(), "one statistic and two profile points (an empty cell is no point)");
        Observation last = d.data().observations().get(2);
        assertEquals("photocyte", last.fate());
        assertEquals(300.0, last.x(), 0.0);
        assertEquals(0.1, last.value(), 0.0);
        assertEquals(0.02, last.sd(), 0.0);

        Files.writeString(tmp.resolve("profile.csv"), "x_um,fate,fraction,sd\n100,photocyte,1.5,0.05\n");
        ScenarioException e = assertThrows(ScenarioException.class, () -> CalibrationDefinition.read(write(calibration,
                DATA + "[profile]\nfile = \"profile.csv\"\n")));
        assertTrue(e.getMessage().contains("profile.csv:2") && e.getMessage().contains("the fraction from 0 to 1"),
                e.getMessage());

        // A wide table (a column per fate) is named for what it lacks.
        Files.writeString(tmp.resolve("profile.csv"), "x_um,fraction_photocyte,sd_photocyte\n100,0.4,0.05\n");
        ScenarioException wide = assertThrows(ScenarioException.class, () -> CalibrationDefinition.read(write(
                calibration, DATA + "[profile]\nfile = \"profile.csv\"\n")));
        assertTrue(wide.getMessage().contains("missing columns fate, fraction, sd: the profile has one row per position"
                + " and fate"), wide.getMessage());
    }
}
