package org.fatefield.circuits.inference;

import java.io.IOException;
import java.util.List;

/**
 * Simulates a batch of candidates, in any order and on any number of workers, and returns each
 * one's summary statistics in the candidates' order. A failed simulation returns {@code null}
 * (the particle is rejected); a statistic the run leaves undefined is {@code NaN}.
 */
@FunctionalInterface
public interface BatchSimulator {

    /** Statistics of every candidate, in order; {@code null} rows for failed runs. */
    double[][] simulate(List<Candidate> batch) throws IOException;
}
