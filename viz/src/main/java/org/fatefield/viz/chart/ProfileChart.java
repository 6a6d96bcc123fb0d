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
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** Fate fractions along the gradient axis, with the simulated and predicted boundaries marked. */
public final class ProfileChart {

    private ProfileChart() {
    }

    /**
     * @param x         bin centres (µm)
     * @param fractions {@code fractions[f][b]}
     * @param simulated simulated boundary of each fate (NaN where none is reported)
     * @param committed best step fit of committed against default cells (NaN for none)
     * @param predicted predicted boundaries where the switch becomes bistable (µm)
     * @param fateCalls predicted positions where a stable state first meets a fate rule (µm)
     * @param singleCell noise-based predicted fractions {@code [f][b]} from single cells, drawn
     *                   dashed in each fate's colour, or null for none
     */
    public static JFreeChart create(List<String> fates, double[] x, double[][] fractions, double[] simulated,
            double committed, double[] predicted, double[] fateCalls, double[][] singleCell) {
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
            int series = data.getSeriesCount() - 1;
            renderer.setSeriesPaint(series, FatePalette.fate(f, fates.size()));
            renderer.setSeriesStroke(series, dashed(1.6f, 5f, 4f));
        }
        NumberAxis xAxis = new NumberAxis("x (µm), along the gradient");
        NumberAxis yAxis = new NumberAxis("fraction of cells");
        yAxis.setRange(0, 1);
        XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        // Boundary lines are named in the legend (by an empty series of the same look), never
        // labelled on the plot, so no label covers a curve or another label.
        for (int f = 0; f < fates.size() && f < simulated.length; f++) {
            if (Double.isFinite(simulated[f])) {
                line(plot, data, renderer, simulated[f], String.format(Locale.ROOT, "%s boundary %.0f µm (simulated)",
                        fates.get(f), simulated[f]), new BasicStroke(2.2f), darker(FatePalette.fate(f, fates.size())));
            }
        }
        if (Double.isFinite(committed)) {
            line(plot, data, renderer, committed, String.format(Locale.ROOT, "committed boundary %.0f µm (simulated)",
                    committed), dashed(2.2f, 10f, 3f), ChartStyle.SPECIAL);
        }
        for (double p : predicted) {
            if (Double.isFinite(p)) {
                line(plot, data, renderer, p, String.format(Locale.ROOT, "bistable from %.0f µm (predicted)", p),
                        dashed(1.8f, 6f, 4f), ChartStyle.UNSTABLE);
            }
        }
        double previous = Double.NaN;
        for (double p : Arrays.stream(fateCalls).filter(Double::isFinite).sorted().toArray()) {
            // Fates whose rules are met at the same place share one line.
            if (Double.isFinite(previous) && Math.abs(p - previous) < 0.5) {
                continue;
            }
            previous = p;
            line(plot, data, renderer, p, String.format(Locale.ROOT, "fate rule met at %.0f µm (predicted)", p),
                    dashed(1.8f, 2f, 3f), ChartStyle.UNSTABLE);
        }
        return ChartStyle.chart("Fate profile along the gradient", plot, true);
    }

    private static void line(XYPlot plot, XYSeriesCollection data, XYLineAndShapeRenderer renderer, double x,
            String name, BasicStroke stroke, Color colour) {
        plot.addDomainMarker(new ValueMarker(x, colour, stroke));
        data.addSeries(new XYSeries(name, false, true));
        int series = data.getSeriesCount() - 1;
        renderer.setSeriesPaint(series, colour);
        renderer.setSeriesStroke(series, stroke);
    }

    private static BasicStroke dashed(float width, float on, float off) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {on, off}, 0f);
    }

    /** A fate colour darkened, so its boundary line stands out from its fraction curve. */
    private static Color darker(Color c) {
        return new Color(c.getRed() * 3 / 5, c.getGreen() * 3 / 5, c.getBlue() * 3 / 5);
    }
}
