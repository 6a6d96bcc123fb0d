package org.fatefield.engine.tissue;

/**
 * Sees the tissue after every step: the last stage of the tick, where progress, frames,
 * checkpoints and the live view's traces are taken. An observer reads the tissue and must not
 * change it; an observer that writes files wraps its I/O errors in
 * {@link java.io.UncheckedIOException}, which ends the run with that error.
 */
@FunctionalInterface
public interface TissueObserver {

    /** Called after each step, once the step's records are complete. */
    void afterStep(Tissue tissue);

    /**
     * An observer that passes on only the steps that are a multiple of {@code interval}
     * (at least 1), as a run's checkpoints and frames are taken.
     */
    static TissueObserver every(long interval, TissueObserver observer) {
        if (interval < 1) {
            throw new IllegalArgumentException("observer interval must be at least 1 step, got " + interval);
        }
        return tissue -> {
            if (tissue.steps() % interval == 0) {
                observer.afterStep(tissue);
            }
        };
    }
}
