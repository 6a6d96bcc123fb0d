package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import org.fatefield.scenarios.sweep.SweepRunner;

/** Runs calibration rounds on this machine's workers, one folder after the other. */
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
            runner.run(runner.manifest().runs(), workers, log, label);
        }
    }
}
