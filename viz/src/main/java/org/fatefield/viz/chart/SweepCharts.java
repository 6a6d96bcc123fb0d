package org.fatefield.viz.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Paint;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/** Charts of a sweep: a metric against one varied value (mean and 95% band), or over two (map). */
public final class SweepCharts {

    private SweepCharts() {
    }

    /**
     * Mean of a metric against one parameter with its 95% confidence band.
     *
     * @param x    parameter values, increasing
     * @param mean metric means
     * @param low  lower ends of the intervals
     * @param high upper ends of the intervals
     */
    public static JFreeChart line(String parameter, String metric, double[] x, double[] mean, double[] low,
            double[] high) {
        YIntervalSeries series = new YIntervalSeries(metric + " (mean, 95% interval)");
        for (int i = 0; i < x.length; i++) {
            if (Double.isFinite(mean[i])) {
                series.add(x[i], mean[i], Double.isFinite(low[i]) ? low[i] : mean[i],
                        Double.isFinite(high[i]) ? high[i] : mean[i]);
            }
        }
        DeviationRenderer renderer = new DeviationRenderer(true, true);
        renderer.setSeriesPaint(0, ChartStyle.STABLE);
        renderer.setSeriesFillPaint(0, new Color(0x9DB9D5));
        renderer.setSeriesStroke(0, new BasicStroke(2.4f));
        NumberAxis xAxis = new NumberAxis(parameter);
        xAxis.setAutoRangeIncludesZero(false);
        NumberAxis yAxis = new NumberAxis(metric);
        yAxis.setAutoRangeIncludesZero(false);
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        data.addSeries(series);
        return ChartStyle.chart(metric + " against " + parameter, new XYPlot(data, xAxis, yAxis, renderer), true);
    }

    /** Mean of a metric over a grid of two parameters, as a map. */
    public static JFreeChart map(String first, String second, String metric, double[] x, double[] y, double[] z) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : z) {
            if (Double.isFinite(v)) {
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
        }
        double lo = Double.isFinite(min) ? min : 0;
        double hi = max > lo ? max : lo + 1;
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries(metric, new double[][] {x, y, z});
        XYBlockRenderer renderer = new XYBlockRenderer();
        renderer.setBlockWidth(step(x));
        renderer.setBlockHeight(step(y));
        PaintScale scale = new PaintScale() {
            @Override
            public double getLowerBound() {
                return lo;
            }

            @Override
            public double getUpperBound() {
                return hi;
            }

            @Override
            public Paint getPaint(double value) {
                if (!Double.isFinite(value)) {
                    return Color.LIGHT_GRAY;
                }
                float t = (float) Math.max(0, Math.min(1, (value - lo) / (hi - lo)));
                return new Color(0.12f + 0.83f * t, 0.25f + 0.6f * t, 0.45f - 0.2f * t);
            }
        };
        renderer.setPaintScale(scale);
        NumberAxis xAxis = new NumberAxis(first);
        NumberAxis yAxis = new NumberAxis(second);
        xAxis.setAutoRangeIncludesZero(false);
        yAxis.setAutoRangeIncludesZero(false);
        JFreeChart chart = ChartStyle.chart(metric + " over " + first + " and " + second,
                new XYPlot(data, xAxis, yAxis, renderer), false);
        PaintScaleLegend legend = new PaintScaleLegend(scale, new NumberAxis(metric));
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setMargin(10, 10, 10, 10);
        chart.addSubtitle(legend);
        return chart;
    }

    private static double step(double[] v) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < v.length; i++) {
            for (int j = 0; j < v.length; j++) {
                double d = Math.abs(v[i] - v[j]);
                if (d > 0) {
                    best = Math.min(best, d);
                }
            }
        }
        return Double.isFinite(best) ? best : 1;
    }
}
