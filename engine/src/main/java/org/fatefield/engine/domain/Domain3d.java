package org.fatefield.engine.domain;

import org.apache.commons.rng.UniformRandomProvider;

/**
 * The three-dimensional domains: a {@link Box} with walls on all six faces and a {@link Slab},
 * a box periodic along y (the solid counterpart of the strip). The gradient axis is x in both,
 * as in the flat domains, so profiles along x mean the same thing in 2-D and 3-D.
 */
public final class Domain3d {

    private Domain3d() {
    }

    /** Checks a depth: finite and greater than 0. */
    private static void checkDepth(double depth) {
        if (!(depth > 0) || Double.isInfinite(depth)) {
            throw new IllegalArgumentException("a three-dimensional domain needs a finite depth greater than 0, got "
                    + depth);
        }
    }

    /** A uniform point at which a sphere of radius {@code r} lies inside the box (y drawn over the whole period if periodic). */
    private static void point(UniformRandomProvider rng, double r, double width, double height, double depth,
            boolean periodicY, double[] out) {
        out[0] = r + (width - 2 * r) * rng.nextDouble();
        out[1] = periodicY ? height * rng.nextDouble() : r + (height - 2 * r) * rng.nextDouble();
        out[2] = r + (depth - 2 * r) * rng.nextDouble();
    }

    /** Clamps into the box for radius {@code r}, wrapping y instead when periodic. */
    private static void clamp(double x, double y, double z, double r, double width, double height, double depth,
            boolean periodicY, double[] out) {
        double rr = Math.min(r, 0.5 * Math.min(width, Math.min(height, depth)));
        out[0] = Math.min(Math.max(x, rr), width - rr);
        out[1] = periodicY ? Domain.wrap(y, height) : Math.min(Math.max(y, rr), height - rr);
        out[2] = Math.min(Math.max(z, rr), depth - rr);
    }

    /** The width x height x depth box, with walls on all six faces. */
    public record Box(double width, double height, double depth) implements Domain {

        /** Validates. */
        public Box {
            Domain.checkSize(width, height);
            checkDepth(depth);
        }

        @Override
        public String shape() {
            return "box";
        }

        @Override
        public void samplePoint(UniformRandomProvider rng, double r, double[] out) {
            point(rng, r, width, height, depth, false, out);
        }

        @Override
        public void confine(double x, double y, double r, double[] out) {
            clamp(x, y, 0.5 * depth, r, width, height, depth, false, out);
        }

        @Override
        public void confine(double x, double y, double z, double r, double[] out) {
            clamp(x, y, z, r, width, height, depth, false, out);
        }

        @Override
        public Domain resized(double newWidth, double newHeight) {
            return new Box(newWidth, newHeight, depth);
        }
    }

    /**
     * A box periodic along y: cells and fields leaving at the top come back at the bottom; walls
     * at x = 0 and x = width and at z = 0 and z = depth (a sheet of tissue of finite thickness).
     */
    public record Slab(double width, double height, double depth) implements Domain {

        /** Validates. */
        public Slab {
            Domain.checkSize(width, height);
            checkDepth(depth);
        }

        @Override
        public String shape() {
            return "slab";
        }

        @Override
        public boolean periodicY() {
            return true;
        }

        @Override
        public void samplePoint(UniformRandomProvider rng, double r, double[] out) {
            point(rng, r, width, height, depth, true, out);
        }

        @Override
        public void confine(double x, double y, double r, double[] out) {
            clamp(x, y, 0.5 * depth, r, width, height, depth, true, out);
        }

        @Override
        public void confine(double x, double y, double z, double r, double[] out) {
            clamp(x, y, z, r, width, height, depth, true, out);
        }

        @Override
        public double nearestImageDy(double dy) {
            return dy > 0.5 * height ? dy - height : (dy < -0.5 * height ? dy + height : dy);
        }

        @Override
        public void checkGrid(double gridSpacing) {
            Domain.checkPeriodicGrid("slab", height, gridSpacing);
        }

        @Override
        public Domain resized(double newWidth, double newHeight) {
            return new Slab(newWidth, newHeight, depth);
        }
    }
}
