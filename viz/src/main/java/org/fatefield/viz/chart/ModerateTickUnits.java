package org.fatefield.viz.chart;

import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.TickUnit;
import org.jfree.chart.axis.TickUnitSource;

/**
 * Tick units that never put more than {@link #MAX_INTERVALS} intervals on an axis: JFreeChart's
 * own choice fills every axis with as many ticks as their labels allow (30 on a 0-3 axis), which
 * reads as clutter in a figure. Units still come from the axis's own source (1, 2, 2.5, 5 times a
 * power of ten, or whole numbers for counts); only the smallest allowed unit is raised.
 */
public final class ModerateTickUnits implements TickUnitSource {

    /** Most intervals between ticks on one axis. */
    public static final int MAX_INTERVALS = 8;

    private final NumberAxis axis;
    private final TickUnitSource units;

    private ModerateTickUnits(NumberAxis axis, TickUnitSource units) {
        this.axis = axis;
        this.units = units;
    }

    /** Limits the ticks of {@code axis} (keeping its kind of units). */
    public static void apply(NumberAxis axis) {
        TickUnitSource own = axis.getStandardTickUnits();
        if (own instanceof ModerateTickUnits) {
            return;
        }
        axis.setStandardTickUnits(new ModerateTickUnits(axis, own != null ? own : NumberAxis.createStandardTickUnits()));
    }

    private double smallest() {
        double length = axis.getRange().getLength();
        return length > 0 && Double.isFinite(length) ? length / MAX_INTERVALS : 0;
    }

    private TickUnit atLeastSmallest(TickUnit unit) {
        TickUnit u = unit;
        double floor = smallest();
        for (int guard = 0; guard < 64 && u.getSize() < floor; guard++) {
            TickUnit larger = units.getLargerTickUnit(u);
            if (larger.getSize() <= u.getSize()) {
                break;
            }
            u = larger;
        }
        return u;
    }

    @Override
    public TickUnit getLargerTickUnit(TickUnit unit) {
        return atLeastSmallest(units.getLargerTickUnit(unit));
    }

    @Override
    public TickUnit getCeilingTickUnit(TickUnit unit) {
        return atLeastSmallest(units.getCeilingTickUnit(unit));
    }

    @Override
    public TickUnit getCeilingTickUnit(double size) {
        return atLeastSmallest(units.getCeilingTickUnit(Math.max(size, smallest())));
    }
}
