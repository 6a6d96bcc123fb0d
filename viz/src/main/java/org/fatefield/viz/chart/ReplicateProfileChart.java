package org.fatefield.viz.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Locale;
import org.fatefield.engine.metrics.SampleSummary;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * One fate's profile along the gradient in every replicate tissue (thin lines) and on average
 * (bold), with the band of mean ± one standard deviation of the replicates' boundary positions
 * (the positional error) and, if known, the predicted boundary.
 */
public final class ReplicateProfileChart {

    private static final Color REPLICATE = new Color(0x9AA5B1);
    private static final Color BAND = new Color(0x56, 0xB4, 0xE9, 70);

    private ReplicateProfileChart() {
    }

    /**
     * @param fate       the fate's name
     * @param x          bin centres (µm), shared by all replicates
     * @param fractions  {@code fractions[r][b]}: replicate r's fraction of that fate in bin b
     * @param boundaries each replicate's boundary (µm; NaN where it had none)
     * @param predicted  predicted boundary (µm), NaN if unknown
     */
    public static JFreeChart create(String fate, double[] x, double[][] fractions, double[] boundaries,
            double predicted) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer lines = new XYLineAndShapeRenderer(true, false);
        double[] mean = new double[x.length];
        int[] counted = new int[x.length];
        for (int r = 0; r < fractions.length; r++) {
            XYSeries s = new XYSeries("replicate " + (r + 1), false, true);
            for (int b = 0; b < x.length; b++) {
                s.add(x[b], fractions[r][b]);
                if (Double.isFinite(fractions[r][b])) {
                    mean[b] += fractions[r][b];
                    counted[b]++;
                }
            }
            data.addSeries(s);
            lines.setSeriesPaint(r, REPLICATE);
            lines.setSeriesStroke(r, new BasicStroke(1f));
            lines.setSeriesVisibleInLegend(r, false);
        }
        XYSeries average = new XYSeries("mean of " + fractions.length + " replicates", false, true);
        for (int b = 0; b < x.length; b++) {
            // Bins empty of cells in some tissues are averaged over the tissues that have cells there.
            average.add(x[b], counted[b] > 0 ? mean[b] / counted[b] : Double.NaN);
        }
        data.addSeries(average);
        lines.setSeriesPaint(fractions.length, ChartStyle.SPECIAL);
        lines.setSeriesStroke(fractions.length, new BasicStroke(2.5f));
        NumberAxis yAxis = new NumberAxis("fraction " + fate);
        yAxis.setRange(0, 1);
        XYPlot plot = new XYPlot(data, new NumberAxis("x (µm), along the gradient"), yAxis, lines);
        SampleSummary spread = SampleSummary.of(boundaries);
        int n = spread.count();
        if (n >= 2) {
            double m = spread.mean();
            double sd = spread.sd();
            IntervalMarker band = new IntervalMarker(m - sd, m + sd, BAND);
            band.setLabel(String.format(Locale.ROOT, " boundary %.0f ± %.1f µm (n = %d)", m, sd, n));
            band.setLabelFont(ChartStyle.SMALL);
            band.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            band.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            plot.addDomainMarker(band);
        }
        if (Double.isFinite(predicted)) {
            ValueMarker p = new ValueMarker(predicted, ChartStyle.UNSTABLE, new BasicStroke(1.8f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f));
            p.setLabel(String.format(Locale.ROOT, " predicted %.0f µm", predicted));
            p.setLabelFont(ChartStyle.SMALL);
            p.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            p.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            plot.addDomainMarker(p);
        }
        return ChartStyle.chart("Replicate tissues: " + fate + " along the gradient", plot, true);
    }
}
