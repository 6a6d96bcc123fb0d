package org.fatefield.viz.calibration;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Rectangle;
import java.awt.geom.Line2D;
import java.util.List;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * The posterior predictive check: for every statistic, where the tissues simulated from the
 * posterior fall relative to the measurement, in units of the measurement's uncertainty,
 * z = (simulated - observed) / sd. A dot is the predictive median, its bar the central 95% of the
 * predictive tissues; the shaded band is the measurement's own ±1 sd. A bar that misses the band
 * is a statistic the fitted model does not reproduce.
 */
public final class PredictiveCheckChart {

    private PredictiveCheckChart() {
    }

    /**
     * @param title   chart title
     * @param labels  statistic labels, in words
     * @param median  predictive median of z per statistic
     * @param low     its 2.5% quantile
     * @param high    its 97.5% quantile
     */
    public static JFreeChart create(String title, List<String> labels, double[] median, double[] low, double[] high) {
        YIntervalSeries series = new YIntervalSeries("posterior predictive: median and central 95%");
        for (int i = 0; i < labels.size(); i++) {
            if (Double.isFinite(median[i])) {
                series.add(i, median[i], low[i], high[i]);
            }
        }
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        data.addSeries(series);
        XYErrorRenderer renderer = new XYErrorRenderer();
        renderer.setDrawXError(false);
        renderer.setSeriesPaint(0, new Color(0x1A1A1A));
        renderer.setErrorPaint(new Color(0x1A1A1A));
        renderer.setErrorStroke(new BasicStroke(2f));
        renderer.setSeriesLinesVisible(0, false);
        renderer.setSeriesShapesVisible(0, true);
        SymbolAxis x = new SymbolAxis(null, labels.toArray(new String[0]));
        x.setGridBandsVisible(false);
        x.setVerticalTickLabels(labels.size() > 3 || labels.stream().anyMatch(l -> l.length() > 28));
        NumberAxis y = new NumberAxis("(simulated - observed) / uncertainty");
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setOrientation(PlotOrientation.VERTICAL);
        Color bandColour = new Color(0xE3EEF7);
        plot.addRangeMarker(new IntervalMarker(-1, 1, bandColour), org.jfree.chart.ui.Layer.BACKGROUND);
        Color observed = new Color(0x336699);
        plot.addRangeMarker(new ValueMarker(0, observed, new BasicStroke(1.2f)));
        LegendItemCollection legend = new LegendItemCollection();
        legend.add(renderer.getLegendItem(0, 0));
        legend.add(new LegendItem("measurement ± 1 sd", null, null, null, new Rectangle(-6, -6, 12, 12), bandColour));
        legend.add(new LegendItem("measured value", null, null, null, new Line2D.Double(-7, 0, 7, 0),
                new BasicStroke(1.2f), observed));
        plot.setFixedLegendItems(legend);
        JFreeChart chart = ChartStyle.chart(title, plot, true);
        x.setRange(-0.5, labels.size() - 0.5);
        x.setTickLabelFont(ChartStyle.SMALL);
        return chart;
    }
}
