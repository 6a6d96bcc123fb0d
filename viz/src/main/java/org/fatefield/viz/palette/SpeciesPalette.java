package org.fatefield.viz.palette;

import java.awt.Color;

/**
 * Colours of circuit species (nullclines, traces, species colour bars) and of clones, kept apart
 * from the fate colours so that a species or a clone is never read as a fate. Species take the
 * dark colours and clones the light and medium ones of Paul Tol's "muted" and "light" schemes
 * (Tol 2021, Colour Schemes, SRON/EPS/TN/09-002), none of which is a fate colour.
 */
public final class SpeciesPalette {

    private static final Color[] SPECIES = {
        new Color(0x882255), new Color(0x117733), new Color(0x332288), new Color(0x999933),
        new Color(0x44AA99), new Color(0xAA4499)};
    private static final Color[] CLONES = {
        new Color(0x88CCEE), new Color(0xDDCC77), new Color(0xCC6677), new Color(0x44AA99), new Color(0xAA4499),
        new Color(0x999933), new Color(0x332288), new Color(0xEEDD88), new Color(0x225522), new Color(0xFFAABB),
        new Color(0x99DDFF), new Color(0xBBCC33)};

    private SpeciesPalette() {
    }

    /** Colour of species {@code index} (cycling after six). */
    public static Color species(int index) {
        return SPECIES[Math.floorMod(index, SPECIES.length)];
    }

    /** Colour of clone {@code founder} (cycling after twelve; neighbouring founders differ). */
    public static Color clone(long founder) {
        return CLONES[(int) Math.floorMod(founder, (long) CLONES.length)];
    }

    /** Number of distinct clone colours. */
    public static int cloneColours() {
        return CLONES.length;
    }

    /**
     * Colour of a species level as a fraction of its scale (clamped to [0, 1]): from near white
     * to the species' own colour.
     */
    public static Color level(int species, double fraction) {
        double t = Math.max(0.0, Math.min(1.0, fraction));
        Color full = species(species);
        double w = 0.94;
        return new Color(mix(255 * w, full.getRed(), t), mix(255 * w, full.getGreen(), t),
                mix(255 * w, full.getBlue(), t));
    }

    private static int mix(double a, double b, double t) {
        return (int) Math.round(a + (b - a) * t);
    }
}
