package org.fatefield.viz.calibration;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import java.text.DecimalFormat;
import java.util.List;
import java.util.Locale;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The pairs plot of a weighted posterior sample: on the diagonal each parameter's weighted
 * histogram over its prior range, below it every pair as a scatter of the particles (the darker
 * the point, the larger its weight), above it the weighted correlation coefficient. Log-uniform
 * parameters are drawn on logarithmic axes. Axis titles sit on the outer row and column only.
 */
public final class PairsPlot implements ChartFiles.Drawing {

    private static final Color BAR = new Color(0x33, 0x66, 0x99);
    private static final int BINS = 24;

    private final String title;
    private final List<String> names;
    private final double[][] theta;
    private final double[] weights;
    private final double[][] ranges;
    private final boolean[] log;

    /**
     * @param title   figure title
     * @param names   parameter labels
     * @param theta   particles, one row each
     * @param weights normalised weights
     * @param ranges  per parameter {low, high} (the prior's range, or the sample's for a normal prior)
     * @param log     per parameter, true for a logarithmic axis
     */
    public PairsPlot(String title, List<String> names, double[][] theta, double[] weights, double[][] ranges,
            boolean[] log) {
        this.title = title;
        this.names = List.copyOf(names);
        this.theta = theta;
        this.weights = weights;
        this.ranges = ranges;
        this.log = log;
    }

    @Override
    public void draw(Graphics2D g, Rectangle area) {
        g.setColor(Color.WHITE);
        g.fill(area);
        g.setColor(Color.BLACK);
        g.setFont(ChartStyle.TITLE);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(title, area.x + (area.width - fm.stringWidth(title)) / 2, area.y + fm.getAscent() + 6);
        int k = names.size();
        int top = area.y + fm.getHeight() + 14;
        int cellW = area.width / k;
        int cellH = (area.height - (top - area.y)) / k;
        for (int row = 0; row < k; row++) {
            for (int col = 0; col < k; col++) {
                Rectangle cell = new Rectangle(area.x + col * cellW, top + row * cellH, cellW, cellH);
                if (row == col) {
                    histogram(row, row == k - 1).draw(g, cell);
                } else if (row > col) {
                    scatter(col, row, row == k - 1, col == 0).draw(g, cell);
                } else {
                    correlation(g, cell, col, row);
                }
            }
        }
    }

    private JFreeChart histogram(int a, boolean bottom) {
        XYIntervalSeries bars = new XYIntervalSeries("weight");
        double lo = ranges[a][0];
        double hi = ranges[a][1];
        double[] mass = new double[BINS];
        for (int j = 0; j < theta.length; j++) {
            int b = (int) Math.floor(position(a, theta[j][a]) * BINS);
            mass[Math.max(0, Math.min(BINS - 1, b))] += weights[j];
        }
        for (int b = 0; b < BINS; b++) {
            double x0 = at(a, (double) b / BINS);
            double x1 = at(a, (double) (b + 1) / BINS);
            bars.add((x0 + x1) / 2, x0, x1, mass[b], 0, mass[b]);
        }
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(bars);
        XYBarRenderer renderer = new XYBarRenderer();
        renderer.setBarPainter(new StandardXYBarPainter());
        renderer.setShadowVisible(false);
        renderer.setSeriesPaint(0, BAR);
        NumberAxis y = new NumberAxis(names.size() == 1 || a == 0 ? "posterior weight" : null);
        XYPlot plot = new XYPlot(data, axis(a, bottom), y, renderer);
        plot.getDomainAxis().setRange(lo, hi);
        return ChartStyle.chart("", plot, false);
    }

    private JFreeChart scatter(int ax, int ay, boolean bottom, boolean left) {
        XYSeriesCollection data = new XYSeriesCollection();
        double max = 0;
        for (double w : weights) {
            max = Math.max(max, w);
        }
        // Five weight classes, from light to dark, so heavy particles show.
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        for (int c = 0; c < 5; c++) {
            data.addSeries(new XYSeries("class " + c, false, true));
            int shade = 200 - 40 * c;
            renderer.setSeriesPaint(c, new Color(shade / 3, shade / 2, shade));
            renderer.setSeriesShape(c, new Ellipse2D.Double(-2, -2, 4, 4));
        }
        for (int j = 0; j < theta.length; j++) {
            int c = max > 0 ? Math.min(4, (int) (5 * weights[j] / max)) : 0;
            data.getSeries(c).add(theta[j][ax], theta[j][ay]);
        }
        XYPlot plot = new XYPlot(data, axis(ax, bottom), axis(ay, left), renderer);
        plot.getDomainAxis().setRange(ranges[ax][0], ranges[ax][1]);
        plot.getRangeAxis().setRange(ranges[ay][0], ranges[ay][1]);
        return ChartStyle.chart("", plot, false);
    }

    private void correlation(Graphics2D g, Rectangle cell, int a, int b) {
        double ma = 0;
        double mb = 0;
        for (int j = 0; j < theta.length; j++) {
            ma += weights[j] * theta[j][a];
            mb += weights[j] * theta[j][b];
        }
        double saa = 0;
        double sbb = 0;
        double sab = 0;
        for (int j = 0; j < theta.length; j++) {
            double da = theta[j][a] - ma;
            double db = theta[j][b] - mb;
            saa += weights[j] * da * da;
            sbb += weights[j] * db * db;
            sab += weights[j] * da * db;
        }
        double r = sab / Math.sqrt(saa * sbb);
        String text = Double.isFinite(r) ? String.format(Locale.ROOT, "r = %.2f", r) : "r not defined";
        g.setColor(new Color(0x444444));
        g.setStroke(new BasicStroke(1f));
        g.setFont(ChartStyle.LABEL);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(text, cell.x + (cell.width - fm.stringWidth(text)) / 2, cell.y + cell.height / 2);
    }

    private ValueAxis axis(int a, boolean labelled) {
        ValueAxis axis = log[a] ? new LogAxis(labelled ? names.get(a) : null) : new NumberAxis(labelled ? names.get(a)
                : null);
        if (axis instanceof NumberAxis n) {
            n.setAutoRangeIncludesZero(false);
        }
        if (axis instanceof LogAxis l) {
            l.setSmallestValue(Math.min(ranges[a][0], ranges[a][1]) / 10);
            l.setNumberFormatOverride(new DecimalFormat("0.###"));
            // Ticks a decade apart (half a decade over a short range), with minor ticks between.
            double decades = Math.log10(ranges[a][1] / ranges[a][0]);
            l.setTickUnit(new NumberTickUnit(decades >= 1.2 ? 1.0 : 0.5));
            l.setMinorTickCount(9);
            l.setMinorTickMarksVisible(true);
        }
        return axis;
    }

    /** Position of {@code v} in [0, 1] along parameter {@code a}'s axis. */
    private double position(int a, double v) {
        double lo = ranges[a][0];
        double hi = ranges[a][1];
        return log[a] ? Math.log(v / lo) / Math.log(hi / lo) : (v - lo) / (hi - lo);
    }

    private double at(int a, double p) {
        double lo = ranges[a][0];
        double hi = ranges[a][1];
        return log[a] ? lo * Math.pow(hi / lo, p) : lo + p * (hi - lo);
    }
}
