package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Where the runs of a calibration round are computed: each folder is a planned sweep folder
 * (base scenario and manifest); afterwards its {@code results/} hold what finished.
 */
public interface RoundBackend {

    /** Runs every missing run of every folder and returns when all have finished or failed. */
    void run(List<Path> folders, String label) throws IOException;
}
