package org.fatefield.engine.domain;

import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;

/**
 * Where cells live: a {@link Rectangle} with walls, the {@link Disc} inscribed in it, or a
 * {@link Strip} periodic along y; in three dimensions a {@link Box} with walls on all six faces
 * or a {@link Slab} periodic along y. The morphogen fields always fill the width x height
 * rectangle (x depth box); the domain decides where founders are placed, how a position is kept
 * inside the walls (or wrapped across the periodic seam) and how distances cross that seam.
 * Every stage that places or moves cells asks the domain, so a new shape is one new record here.
 */
public sealed interface Domain permits Domain.Rectangle, Domain.Disc, Domain.Strip, Domain3d.Box, Domain3d.Slab {

    /** Width along x, the gradient axis (µm). */
    double width();

    /** Height along y (µm). */
    double height();

    /** The shape's scenario word: "rectangle", "disc", "strip", "box" or "slab". */
    String shape();

    /** Depth along z (µm); 0 for a flat (two-dimensional) tissue. */
    default double depth() {
        return 0.0;
    }

    /** True for a three-dimensional domain (a depth greater than 0). */
    default boolean threeD() {
        return depth() > 0;
    }

    /** True if cells and fields wrap around along y. */
    default boolean periodicY() {
        return false;
    }

    /**
     * Draws a uniformly random position for a cell of radius {@code r} inside the domain into
     * {@code out} ({@code out[0]} = x, {@code out[1]} = y and, in 3-D, {@code out[2]} = z).
     */
    void samplePoint(UniformRandomProvider rng, double r, double[] out);

    /**
     * Puts into {@code out} (three values) the position nearest to (x, y, z) at which a cell of
     * radius {@code r} lies inside the walls, or brought across the periodic seam; a flat
     * domain ignores z and puts 0.
     */
    default void confine(double x, double y, double z, double r, double[] out) {
        confine(x, y, r, out);
        out[2] = 0.0;
    }

    /**
     * Puts into {@code out} the position nearest to (x, y) at which a cell of radius {@code r}
     * lies inside the walls, or (x, y) brought across the periodic seam. A radius larger than
     * half the domain's smaller side is treated as that half.
     */
    void confine(double x, double y, double r, double[] out);

    /** The y offset {@code dy} between two cells, by the nearest image across a periodic seam. */
    default double nearestImageDy(double dy) {
        return dy;
    }

    /**
     * Checks that a field grid of squares {@code gridSpacing} µm wide fits this domain.
     *
     * @throws IllegalArgumentException saying what to change if it does not
     */
    default void checkGrid(double gridSpacing) {
    }

    /** The same shape with another width and height (a 3-D shape keeps its depth). */
    Domain resized(double newWidth, double newHeight);

    /**
     * The flat domain of scenario word {@code shape} ("rectangle", "disc" or "strip") with this size.
     *
     * @throws IllegalArgumentException naming the allowed words for any other
     */
    static Domain of(String shape, double width, double height) {
        return of(shape, width, height, 0.0);
    }

    /**
     * The domain of scenario word {@code shape} with this size: "rectangle", "disc" or "strip"
     * with a depth of 0, "box" or "slab" with a depth greater than 0.
     *
     * @throws IllegalArgumentException naming the allowed words for any other, or saying which
     *                                  depth the shape needs
     */
    static Domain of(String shape, double width, double height, double depth) {
        String word = shape.toLowerCase(Locale.ROOT);
        boolean solid = threeDimensional(word);
        if (solid && !(depth > 0)) {
            throw new IllegalArgumentException("a " + word + " is three-dimensional: give it a depth greater than 0"
                    + " (tissue.depth, µm), or use a flat shape (rectangle, disc or strip)");
        }
        if (!solid && depth != 0) {
            throw new IllegalArgumentException("a " + word + " is flat but has a depth of " + depth + " µm; for a"
                    + " three-dimensional tissue use shape \"box\" or \"slab\", or remove tissue.depth");
        }
        return switch (word) {
            case "rectangle" -> new Rectangle(width, height);
            case "disc" -> new Disc(width, height);
            case "strip" -> new Strip(width, height);
            case "box" -> new Domain3d.Box(width, height, depth);
            case "slab" -> new Domain3d.Slab(width, height, depth);
            default -> throw new IllegalArgumentException("domain shape must be \"rectangle\", \"disc\", \"strip\","
                    + " \"box\" or \"slab\", got \"" + shape + "\"");
        };
    }

    /** True if the scenario word {@code shape} names a three-dimensional shape ("box" or "slab"). */
    static boolean threeDimensional(String shape) {
        String word = shape.toLowerCase(Locale.ROOT);
        return word.equals("box") || word.equals("slab");
    }

    /** {@code y} brought into [0, period) by whole periods. */
    static double wrap(double y, double period) {
        double w = y - period * Math.floor(y / period);
        return w >= period ? 0.0 : w;
    }

    /**
     * Checks that a shape periodic along y ({@code shape}: "strip" or "slab") is a whole number of
     * grid squares tall, at least three, so the fields wrap around exactly.
     */
    static void checkPeriodicGrid(String shape, double height, double gridSpacing) {
        double squares = height / gridSpacing;
        if (Math.abs(squares - Math.round(squares)) > 1e-6 * squares || Math.round(squares) < 3) {
            throw new IllegalArgumentException("a " + shape + "'s height must be a whole number of morphogen grid"
                    + " squares, at least three, so the fields wrap around exactly: height " + height
                    + " µm / grid spacing " + gridSpacing + " µm = " + squares
                    + "; change tissue.height or the grid spacing");
        }
    }

    /** Checks a size: finite and greater than 0 on both sides. */
    static void checkSize(double width, double height) {
        if (!(width > 0) || !(height > 0) || Double.isInfinite(width) || Double.isInfinite(height)) {
            throw new IllegalArgumentException("domain must be finite with positive width and height, got "
                    + width + " x " + height);
        }
    }

    /** A uniform point at which a disc of radius {@code r} lies inside the width x height box. */
    private static void boxPoint(UniformRandomProvider rng, double r, double width, double height, double[] out) {
        out[0] = r + (width - 2 * r) * rng.nextDouble();
        out[1] = r + (height - 2 * r) * rng.nextDouble();
    }

    /** Clamps x (and, for walls along y, y) into the box for radius {@code r}. */
    private static void clampToBox(double x, double y, double r, double width, double height, boolean wrapY,
            double[] out) {
        double rr = Math.min(r, 0.5 * Math.min(width, height));
        out[0] = Math.min(Math.max(x, rr), width - rr);
        out[1] = wrapY ? wrap(y, height) : Math.min(Math.max(y, rr), height - rr);
    }

    /** The width x height rectangle, with walls on all four sides. */
    record Rectangle(double width, double height) implements Domain {

        /** Validates. */
        public Rectangle {
            checkSize(width, height);
        }

        @Override
        public String shape() {
            return "rectangle";
        }

        @Override
        public void samplePoint(UniformRandomProvider rng, double r, double[] out) {
            boxPoint(rng, r, width, height, out);
        }

        @Override
        public void confine(double x, double y, double r, double[] out) {
            clampToBox(x, y, r, width, height, false, out);
        }

        @Override
        public Domain resized(double newWidth, double newHeight) {
            return new Rectangle(newWidth, newHeight);
        }
    }

    /** The disc inscribed in the width x height rectangle, with a circular wall. */
    record Disc(double width, double height) implements Domain {

        /** Validates. */
        public Disc {
            checkSize(width, height);
        }

        @Override
        public String shape() {
            return "disc";
        }

        @Override
        public void samplePoint(UniformRandomProvider rng, double r, double[] out) {
            // Rejection from the bounding box: uniform in the disc.
            do {
                boxPoint(rng, r, width, height, out);
            } while (Math.hypot(out[0] - 0.5 * width, out[1] - 0.5 * height) > 0.5 * Math.min(width, height) - r);
        }

        @Override
        public void confine(double x, double y, double r, double[] out) {
            clampToBox(x, y, r, width, height, false, out);
            double rr = Math.min(r, 0.5 * Math.min(width, height));
            double cx = 0.5 * width;
            double cy = 0.5 * height;
            double limit = 0.5 * Math.min(width, height) - rr;
            double ex = out[0] - cx;
            double ey = out[1] - cy;
            double d = Math.hypot(ex, ey);
            if (d > limit && d > 0) {
                out[0] = cx + ex * limit / d;
                out[1] = cy + ey * limit / d;
            }
        }

        @Override
        public Domain resized(double newWidth, double newHeight) {
            return new Disc(newWidth, newHeight);
        }
    }

    /**
     * A band of the rectangle's size, periodic along y: cells and fields leaving at the top come
     * back at the bottom, so the tissue has no lateral edges; walls at x = 0 and x = width.
     */
    record Strip(double width, double height) implements Domain {

        /** Validates. */
        public Strip {
            checkSize(width, height);
        }

        @Override
        public String shape() {
            return "strip";
        }

        @Override
        public boolean periodicY() {
            return true;
        }

        @Override
        public void samplePoint(UniformRandomProvider rng, double r, double[] out) {
            out[0] = r + (width - 2 * r) * rng.nextDouble();
            out[1] = height * rng.nextDouble();
        }

        @Override
        public void confine(double x, double y, double r, double[] out) {
            clampToBox(x, y, r, width, height, true, out);
        }

        @Override
        public double nearestImageDy(double dy) {
            return dy > 0.5 * height ? dy - height : (dy < -0.5 * height ? dy + height : dy);
        }

        @Override
        public void checkGrid(double gridSpacing) {
            checkPeriodicGrid("strip", height, gridSpacing);
        }

        @Override
        public Domain resized(double newWidth, double newHeight) {
            return new Strip(newWidth, newHeight);
        }
    }
}
