package org.fatefield.circuits.inference;

/**
 * One proposed particle to simulate.
 *
 * @param model      index of the model it belongs to
 * @param generation SMC generation (0 samples the prior)
 * @param round      batch within the generation
 * @param index      position within the model's batch
 * @param theta      parameter values (natural scale, in the model's parameter order)
 * @param seed       the simulation's seed, from 0 to 2^53 - 1
 */
public record Candidate(int model, int generation, int round, int index, double[] theta, long seed) {

    /** A stable name, {@code m<model>-g<generation>-r<round>-<index>}, unique within one calibration. */
    public String id() {
        return String.format(java.util.Locale.ROOT, "m%d-g%02d-r%03d-%05d", model, generation, round, index);
    }
}
