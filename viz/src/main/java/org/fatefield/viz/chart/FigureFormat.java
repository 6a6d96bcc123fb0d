package org.fatefield.viz.chart;

import java.util.Locale;

/**
 * How a figure is written: its layout size in CSS pixels (96 per inch; fonts and lines are laid
 * out at this size) and the resolution of its PNG, which is rendered at {@code dpi / 96} times
 * the layout size and carries that resolution in its metadata. The SVG has the layout size and a
 * matching view box. Immutable; {@code width} and {@code height} of 0 mean "each figure's own".
 */
public record FigureFormat(int dpi, int width, int height) {

    /** Layout units per inch (CSS pixels). */
    public static final int LAYOUT_DPI = 96;
    /** Lowest accepted resolution. */
    public static final int MIN_DPI = 48;
    /** Highest accepted resolution. */
    public static final int MAX_DPI = 1200;
    /** Smallest and largest accepted layout size, in CSS pixels. */
    public static final int MIN_SIZE = 200;
    /** Largest accepted layout size, in CSS pixels. */
    public static final int MAX_SIZE = 4000;
    /** Screen resolution at each figure's own size. */
    public static final FigureFormat DEFAULT = new FigureFormat(LAYOUT_DPI, 0, 0);

    /**
     * @throws IllegalArgumentException if the resolution or a size is outside its range
     */
    public FigureFormat {
        if (dpi < MIN_DPI || dpi > MAX_DPI) {
            throw new IllegalArgumentException("figure resolution must be from " + MIN_DPI + " to " + MAX_DPI
                    + " dots per inch, got " + dpi);
        }
        if ((width == 0) != (height == 0)) {
            throw new IllegalArgumentException("give a figure both a width and a height, got " + width + "x" + height);
        }
        if (width != 0 && (width < MIN_SIZE || width > MAX_SIZE || height < MIN_SIZE || height > MAX_SIZE)) {
            throw new IllegalArgumentException("figure width and height must each be from " + MIN_SIZE + " to "
                    + MAX_SIZE + " (CSS pixels, 96 per inch), got " + width + "x" + height);
        }
    }

    /**
     * Parses a size written {@code WIDTHxHEIGHT} (CSS pixels).
     *
     * @throws IllegalArgumentException naming the expected form if {@code text} is not one
     */
    public static int[] parseSize(String text) {
        String[] parts = text.trim().toLowerCase(Locale.ROOT).split("x", -1);
        if (parts.length != 2) {
            throw new IllegalArgumentException("write a figure size as WIDTHxHEIGHT in CSS pixels, such as 1200x800; got '"
                    + text + "'");
        }
        try {
            return new int[] {Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim())};
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("write a figure size as WIDTHxHEIGHT in CSS pixels, such as 1200x800; got '"
                    + text + "'", e);
        }
    }

    /** Layout width: the set one, or {@code own}. */
    public int widthOr(int own) {
        return width == 0 ? own : width;
    }

    /** Layout height: the set one, or {@code own}. */
    public int heightOr(int own) {
        return height == 0 ? own : height;
    }

    /** PNG pixels per layout unit. */
    public double scale() {
        return dpi / (double) LAYOUT_DPI;
    }
}
