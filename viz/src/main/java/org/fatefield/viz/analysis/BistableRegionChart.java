package org.fatefield.viz.analysis;

import java.awt.BasicStroke;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldCurve;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldPoint;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** The bistable region in a plane of two parameters, bounded by saddle-node (fold) curves. */
public final class BistableRegionChart {

    private BistableRegionChart() {
    }

    /** Draws the fold curves and marks their cusps. */
    public static JFreeChart create(List<FoldCurve> curves, String first, String second) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        XYSeries cusps = new XYSeries("cusp", false, true);
        for (FoldCurve curve : curves) {
            XYSeries line = new XYSeries("saddle-node (fold) curve " + (data.getSeriesCount() + 1), false, true);
            for (FoldPoint p : curve.points()) {
                line.add(p.mu(), p.nu());
            }
            for (FoldPoint p : curve.cusps()) {
                cusps.add(p.mu(), p.nu());
            }
            int index = data.getSeriesCount();
            data.addSeries(line);
            renderer.setSeriesPaint(index, ChartStyle.STABLE);
            renderer.setSeriesStroke(index, new BasicStroke(2.4f));
            renderer.setSeriesVisibleInLegend(index, index == 0);
        }
        int cuspIndex = data.getSeriesCount();
        data.addSeries(cusps);
        renderer.setSeriesLinesVisible(cuspIndex, false);
        renderer.setSeriesShapesVisible(cuspIndex, true);
        renderer.setSeriesShape(cuspIndex, new Rectangle2D.Double(-5, -5, 10, 10));
        renderer.setSeriesPaint(cuspIndex, ChartStyle.UNSTABLE);
        renderer.setLegendItemLabelGenerator((dataset, series) ->
                series == cuspIndex ? "cusp" : "saddle-node (fold) curve: edge of the bistable region");
        NumberAxis x = new NumberAxis(first);
        NumberAxis y = new NumberAxis(second);
        x.setAutoRangeIncludesZero(false);
        y.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        return ChartStyle.chart("Bistable region in the (" + first + ", " + second + ") plane", plot, true);
    }
}
