package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * --quiet silences the progress lines and nothing else: the same tables are written and the
 * summary line still comes. --verbose adds the resolved settings and the files written, and
 * changes no result either; on sweep run and calibrate it prints the shard, the first run and
 * the inference settings.
 */
class QuietTest {

    @TempDir
    Path tmp;

    @Test
    void quietAnalysisPrintsNoProgressButTheSameResults() throws Exception {
        String scenario = Path.of("src", "test", "resources", "one-gene-switch.toml").toString();
        StringWriter loudErr = new StringWriter();
        StringWriter quietErr = new StringWriter();
        StringWriter quietOut = new StringWriter();
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(loudErr), "analyze",
                scenario, "--out", tmp.resolve("loud").toString()));
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(quietOut), new PrintWriter(quietErr), "analyze",
                scenario, "--out", tmp.resolve("quiet").toString(), "--quiet"));
        assertTrue(loudErr.toString().contains("analyze: steady states"), loudErr.toString());
        assertEquals("", quietErr.toString());
        assertTrue(quietOut.toString().startsWith("Analysed one-gene-switch"), quietOut.toString());
        assertEquals(Files.readString(tmp.resolve("loud").resolve("steady-states.csv")),
                Files.readString(tmp.resolve("quiet").resolve("steady-states.csv")));
    }

    @Test
    void verboseRunPrintsTheResolvedSettingsAndTheFilesButTheSameResults() throws Exception {
        String[] base = {"run", "demo", "--set", "run.duration=2.0", "--set", "run.step=0.005", "--set",
            "tissue.repulsion=4.0"};
        StringWriter out = new StringWriter();
        String[] verbose = java.util.stream.Stream.concat(java.util.Arrays.stream(base),
                java.util.stream.Stream.of("--out", tmp.resolve("verbose").toString(), "--verbose"))
                .toArray(String[]::new);
        String[] plain = java.util.stream.Stream.concat(java.util.Arrays.stream(base),
                java.util.stream.Stream.of("--out", tmp.resolve("plain").toString(), "--quiet")).toArray(String[]::new);
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(out), new PrintWriter(new StringWriter()), verbose));
        assertEquals(0, FatefieldCommandAccess.run(plain));
        // 0.1 / (4/h x 0.005 h) = 5 steps of mechanics (Timing.MECHANICS_ACCURACY).
        assertTrue(out.toString().contains("time: 2 h in 400 steps of 0.005 h; records every 100 steps; mechanics"
                + " every 5 steps (0.025 h, set from the repulsion time scale)"), out.toString());
        // The demo ends with about 2100 cells, under SharedOptions.Threads.SMALL_TISSUE: one thread, and the plan says why.
        assertTrue(out.toString().contains("seed: 1; threads: 1 (automatic: fewer than 5000 cells expected"),
                out.toString());
        assertTrue(out.toString().contains("  override: tissue.repulsion = 4.0") && out.toString()
                .contains("  timeseries.csv ("), out.toString());
        for (String table : new String[] {"timeseries.csv", "cells.csv", "lineage.csv"}) {
            assertEquals(Files.readString(tmp.resolve("plain").resolve(table)),
                    Files.readString(tmp.resolve("verbose").resolve(table)), table);
        }
        StringWriter analysis = new StringWriter();
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(analysis), new PrintWriter(new StringWriter()),
                "analyze", Path.of("src", "test", "resources", "one-gene-switch.toml").toString(), "--out",
                tmp.resolve("analysis").toString(), "--verbose", "--range", "0.5:2", "--at", "1"));
        assertTrue(analysis.toString().contains("steady states at 1\n") && analysis.toString().contains("from 0.5 to 2;"),
                analysis.toString());
        StringWriter err = new StringWriter();
        assertEquals(2, FatefieldCommand.execute(new PrintWriter(new StringWriter()), new PrintWriter(err), "run",
                "demo", "--quiet", "--verbose", "--out", tmp.resolve("both").toString()));
        assertTrue(err.toString().contains("--quiet and --verbose contradict each other"), err.toString());
    }

    @Test
    void verboseSweepRunAndCalibrationPrintTheirPlans() throws Exception {
        Path scenario = ShortDemo.write(tmp, "2.0");
        Path sweep = tmp.resolve("sweep.toml");
        Files.writeString(sweep, "[sweep]\nscenario = \"short.toml\"\ndesign = \"grid\"\nreplicates = 1\nseed = 3\n"
                + "[[parameter]]\nkey = \"morphogen.decay\"\nlow = 0.1\nhigh = 0.3\nsteps = 3\n");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", sweep.toString(), "--out",
                tmp.resolve("s").toString()));
        StringWriter out = new StringWriter();
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(out), new PrintWriter(new StringWriter()), "sweep",
                "run", tmp.resolve("s").toString(), "--shard", "2/3", "--workers", "1", "--verbose"));
        assertTrue(out.toString().contains("sweep: shard 2/3 holds 1 of the manifest's 3 runs, 0 already done; 1 at"
                + " once") && out.toString().contains("first run to do: ") && out.toString().contains("override:"
                + " morphogen.decay = 0.2"), out.toString());
        Files.writeString(tmp.resolve("data.toml"), "[data]\n[[statistic]]\nname = \"population\"\nvalue = 200\n"
                + "sd = 20\nunit = \"cells\"\n");
        Path calibration = tmp.resolve("calibration.toml");
        Files.writeString(calibration, "[calibration]\nscenario = \"" + scenario.getFileName() + "\"\ndata ="
                + " \"data.toml\"\nparticles = 4\nbatch = 4\ngenerations = 1\npredictive = 1\nseed = 5\n"
                + "[[parameter]]\nkey = \"division.cycle_mean\"\nprior = \"uniform\"\nlow = 4.0\nhigh = 12.0\n");
        StringWriter plan = new StringWriter();
        assertEquals(0, FatefieldCommand.execute(new PrintWriter(plan), new PrintWriter(new StringWriter()),
                "calibrate", calibration.toString(), "--out", tmp.resolve("c").toString(), "--workers", "2",
                "--verbose"));
        assertTrue(plan.toString().contains("calibration: 4 particles, batches of 4, at most 1 generations")
                && plan.toString().contains("  division.cycle_mean ~ uniform(4.0, 12.0)")
                && plan.toString().contains("  population = 200 +- 20 cells")
                && plan.toString().contains("time: 2 h in"), plan.toString());
    }
}
