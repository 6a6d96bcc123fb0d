package org.fatefield.viz.palette;

import java.awt.Color;

/**
 * Colours of fates and of the morphogen, chosen to stay distinct under the common forms of
 * colour-vision deficiency. Fate hues are those of Okabe &amp; Ito (2008, Color Universal Design);
 * the last fate of a classifier (the default, uncommitted one) is a neutral grey, so committed
 * fates stand out against it.
 */
public final class FatePalette {

    private static final Color[] FATES = {
        new Color(0xD55E00), new Color(0x0072B2), new Color(0x009E73), new Color(0xCC79A7),
        new Color(0xE69F00), new Color(0x56B4E9), new Color(0xF0E442)};
    private static final Color UNCOMMITTED = new Color(0xB8B8B8);
    private static final Color FIELD_LOW = new Color(0xFBFAF5);
    private static final Color FIELD_HIGH = new Color(0x6E6A3F);

    private FatePalette() {
    }

    /**
     * Colour of fate {@code index} among {@code fateCount} fates, the last being the default.
     */
    public static Color fate(int index, int fateCount) {
        if (index == fateCount - 1) {
            return UNCOMMITTED;
        }
        return FATES[index % FATES.length];
    }

    /**
     * Colour of a cell that has held fate {@code index} for {@code heldFraction} of the reference
     * time (clamped to [0, 1]): pale when it has only just switched, the full fate colour once it
     * has held on for the whole reference time. The default fate stays grey.
     */
    public static Color held(int index, int fateCount, double heldFraction) {
        Color full = fate(index, fateCount);
        if (index == fateCount - 1 || !(heldFraction > 0)) {
            return index == fateCount - 1 ? full : mixColour(Color.WHITE, full, 0.2);
        }
        return mixColour(Color.WHITE, full, 0.2 + 0.8 * Math.min(1.0, heldFraction));
    }

    private static Color mixColour(Color a, Color b, double t) {
        return new Color(mix(a.getRed(), b.getRed(), t), mix(a.getGreen(), b.getGreen(), t),
                mix(a.getBlue(), b.getBlue(), t));
    }

    /** Colour of a morphogen level as a fraction of the scale (clamped to [0, 1]). */
    public static Color morphogen(double fraction) {
        double t = Math.max(0.0, Math.min(1.0, fraction));
        // A perceptually gentle ramp: ease in so low levels stay near white.
        double s = Math.sqrt(t);
        return new Color(mix(FIELD_LOW.getRed(), FIELD_HIGH.getRed(), s),
                mix(FIELD_LOW.getGreen(), FIELD_HIGH.getGreen(), s),
                mix(FIELD_LOW.getBlue(), FIELD_HIGH.getBlue(), s));
    }

    private static int mix(int a, int b, double t) {
        return (int) Math.round(a + (b - a) * t);
    }
}
