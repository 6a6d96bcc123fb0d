package org.fatefield.viz.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.fatefield.viz.palette.FatePalette;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** Fate fractions along the gradient axis, with the simulated and predicted boundaries marked. */
public final class ProfileChart {

    private ProfileChart() {
    }

    /**
     * @param x         bin centres (µm)
     * @param fractions {@code fractions[f][b]}
     * @param simulated simulated boundary of the default fate (NaN for none)
     * @param predicted predicted boundaries where the switch becomes bistable (µm)
     * @param fateCalls predicted positions where a stable state first meets a fate rule (µm)
     * @param singleCell noise-based predicted fractions {@code [f][b]} from single cells, drawn
     *                   dashed in each fate's colour, or null for none
     */
    public static JFreeChart create(List<String> fates, double[] x, double[][] fractions, double simulated,
            double[] predicted, double[] fateCalls, double[][] singleCell) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int f = 0; f < fates.size(); f++) {
            XYSeries s = new XYSeries(fates.get(f), false, true);
            for (int b = 0; b < x.length; b++) {
                if (Double.isFinite(fractions[f][b])) {
                    s.add(x[b], fractions[f][b]);
                }
            }
            data.addSeries(s);
            renderer.setSeriesPaint(f, FatePalette.fate(f, fates.size()));
            renderer.setSeriesStroke(f, new BasicStroke(2.6f));
        }
        for (int f = 0; singleCell != null && f < fates.size(); f++) {
            XYSeries s = new XYSeries(fates.get(f) + ", predicted from single cells", false, true);
            for (int b = 0; b < x.length; b++) {
                if (Double.isFinite(singleCell[f][b])) {
                    s.add(x[b], singleCell[f][b]);
                }
            }
            data.addSeries(s);
            int series = fates.size() + f;
            renderer.setSeriesPaint(series, FatePalette.fate(f, fates.size()));
            renderer.setSeriesStroke(series, new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {5f, 4f}, 0f));
        }
        NumberAxis xAxis = new NumberAxis("x (µm), along the gradient");
        NumberAxis yAxis = new NumberAxis("fraction of cells");
        yAxis.setRange(0, 1);
        XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        if (Double.isFinite(simulated)) {
            ValueMarker m = marker(simulated, "simulated boundary", new BasicStroke(1.8f), ChartStyle.SPECIAL, 0);
            // Left of its line, so it never overlaps the predicted labels, which sit to the right.
            m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
            m.setLabel(m.getLabel().trim() + " ");
            plot.addDomainMarker(m);
        }
        int row = 0;
        for (double p : predicted) {
            if (Double.isFinite(p)) {
                plot.addDomainMarker(marker(p, "bistable from", new BasicStroke(1.8f, BasicStroke.CAP_BUTT,
                        BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f), ChartStyle.UNSTABLE, row++));
            }
        }
        double previous = Double.NaN;
        for (double p : Arrays.stream(fateCalls).filter(Double::isFinite).sorted().toArray()) {
            // Fates whose rules are met at the same place share one line.
            if (Double.isFinite(previous) && Math.abs(p - previous) < 0.5) {
                continue;
            }
            previous = p;
            plot.addDomainMarker(marker(p, "fate rule met", new BasicStroke(1.8f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_MITER, 10f, new float[] {2f, 3f}, 0f), ChartStyle.UNSTABLE, row++));
        }
        return ChartStyle.chart("Fate profile along the gradient", plot, true);
    }

    /** A vertical line with its label to the right, {@code row} label heights below the top. */
    private static ValueMarker marker(double x, String label, BasicStroke stroke, Color colour, int row) {
        ValueMarker marker = new ValueMarker(x, colour, stroke);
        marker.setLabelOffset(new RectangleInsets(3 + 18 * row, 3, 3, 3));
        marker.setLabel(String.format(Locale.ROOT, " %s %.0f µm", label, x));
        marker.setLabelFont(ChartStyle.SMALL);
        marker.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        marker.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        return marker;
    }
}
