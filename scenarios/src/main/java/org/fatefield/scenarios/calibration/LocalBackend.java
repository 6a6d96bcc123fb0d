package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import org.fatefield.scenarios.sweep.SweepRunner;

/**
 * Runs calibration rounds on this machine's workers, one folder after the other. On a terminal
 * each round shows a progress bar; elsewhere (logs) the calibration's own line per round is
 * enough, so the per-tissue lines of a sweep are left out.
 */
public final class LocalBackend implements RoundBackend {

    private final int workers;
    private final PrintStream log;

    /** On {@code workers} threads, reporting progress to {@code log}. */
    public LocalBackend(int workers, PrintStream log) {
        this.workers = workers;
        this.log = log;
    }

    @Override
    public void run(List<Path> folders, String label) throws IOException {
        for (Path folder : folders) {
            SweepRunner runner = new SweepRunner(folder);
            PrintStream perTissue = System.console() != null ? log : new PrintStream(OutputStream.nullOutputStream());
            runner.run(runner.manifest().runs(), workers, perTissue, label);
        }
    }
}
