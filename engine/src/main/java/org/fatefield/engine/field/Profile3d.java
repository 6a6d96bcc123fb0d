package org.fatefield.engine.field;

/** A concentration as a function of position (µm), for {@link MorphogenField#fill(Profile3d)}. */
@FunctionalInterface
public interface Profile3d {

    /** The concentration at (x, y, z). */
    double at(double x, double y, double z);
}
