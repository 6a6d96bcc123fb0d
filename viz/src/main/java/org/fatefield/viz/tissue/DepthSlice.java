package org.fatefield.viz.tissue;

import java.util.Locale;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.tissue.Tissue;

/**
 * What a flat picture shows of a three-dimensional tissue: the plane z = depth / 2, cut through
 * the spheres (each cell crossing the plane drawn as its cross-section, a disc of radius
 * {@code sqrt(R^2 - dz^2)}) and through the fields (the grid layer holding the plane). A flat
 * tissue is shown whole, as it is. The live window can move the plane through the depth.
 */
public final class DepthSlice {

    private DepthSlice() {
    }

    /** The depth of the plane shown (µm): half the tissue's depth, 0 for a flat tissue. */
    public static double plane(Tissue tissue) {
        return 0.5 * tissue.spec().domain().depth();
    }

    /**
     * The radius (µm) to draw {@code cell} with: its disc in a flat tissue, its cross-section
     * with the plane in 3-D, 0 if it does not reach the plane.
     */
    public static double drawnRadius(Tissue tissue, Cell cell) {
        return drawnRadius(tissue, cell, plane(tissue));
    }

    /** As {@link #drawnRadius(Tissue, Cell)}, cut by the plane z = {@code plane} (µm). */
    public static double drawnRadius(Tissue tissue, Cell cell, double plane) {
        double r0 = tissue.spec().growth().cellRadius();
        if (!tissue.spec().domain().threeD()) {
            return cell.radius(r0);
        }
        double r = cell.sphereRadius(r0);
        double dz = cell.z() - plane;
        return Math.abs(dz) < r ? Math.sqrt(r * r - dz * dz) : 0.0;
    }

    /** The field's grid layer that holds the mid-depth plane (0 for a flat field). */
    public static int layer(Tissue tissue, MorphogenField field) {
        return layer(field, plane(tissue));
    }

    /** The field's grid layer that holds the plane z = {@code plane} (µm). */
    public static int layer(MorphogenField field, double plane) {
        int l = (int) (plane / field.spacing());
        return Math.min(field.layers() - 1, Math.max(0, l));
    }

    /** A caption for a picture's title: empty for a flat tissue, the plane's depth in 3-D. */
    public static String caption(Tissue tissue) {
        return tissue.spec().domain().threeD()
                ? String.format(Locale.ROOT, ", mid-depth slice z = %.4g of %.4g µm", plane(tissue),
                        tissue.spec().domain().depth())
                : "";
    }
}
