package org.fatefield.engine.tissue;

import sim.engine.SimState;
import sim.engine.Steppable;

/** The single schedule entry of a tissue: one whole tick per call. */
final class TissueTick implements Steppable {

    private static final long serialVersionUID = 1L;

    private final Tissue tissue;

    TissueTick(Tissue tissue) {
        this.tissue = tissue;
    }

    @Override
    public void step(SimState state) {
        if (!tissue.finished()) {
            tissue.tick();
        }
    }
}
