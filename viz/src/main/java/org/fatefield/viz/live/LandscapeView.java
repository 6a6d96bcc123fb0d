package org.fatefield.viz.live;

import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.viz.analysis.GridMapChart;
import org.jfree.chart.ChartPanel;

/**
 * The live window's landscape chart: the circuit's quasi-potential at the clicked cell's local
 * control value, or at the middle of the bifurcation diagram's range before a cell is clicked
 * (the value {@code analyze} uses by default), on the colour scale every Fatefield landscape uses.
 */
final class LandscapeView {

    private final ChartPanel panel = new ChartPanel(null);
    private final DoubleFunction<QuasiPotential> landscape;
    private final String parameter;
    private final double middle;
    private double shownAt = Double.NaN;

    /**
     * @param landscape the circuit's landscape at a control value, or null when it cannot be computed
     */
    LandscapeView(DoubleFunction<QuasiPotential> landscape, String parameter, List<Branch> branches) {
        this.landscape = landscape;
        this.parameter = parameter;
        this.middle = middleOf(branches);
    }

    ChartPanel panel() {
        return panel;
    }

    /** Shows the landscape at the middle of the range (forgetting what was shown). */
    void showMiddle(List<String> species) {
        shownAt = Double.NaN;
        show(middle, "middle of the range", species);
    }

    /** Shows the landscape at {@code value} (unless it is already shown). */
    void show(double value, String note, List<String> species) {
        if (landscape == null) {
            panel.setChart(null);
            return;
        }
        if (Double.isNaN(value) || value == shownAt) {
            return;
        }
        shownAt = value;
        QuasiPotential u = landscape.apply(value);
        panel.setChart(GridMapChart.landscape(u.xs(), u.ys(), u.u(), GridMapChart.LANDSCAPE_CEILING,
                species.get(0) + " (concentration)", species.size() > 1 ? species.get(1) + " (concentration)" : "", String.format(Locale.ROOT, "Landscape at %s = %.4g (%s)",
                        parameter, value, note)));
    }

    private static double middleOf(List<Branch> branches) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Branch b : branches) {
            for (var p : b.points()) {
                lo = Math.min(lo, p.parameter());
                hi = Math.max(hi, p.parameter());
            }
        }
        return lo <= hi ? 0.5 * (lo + hi) : Double.NaN;
    }
}
