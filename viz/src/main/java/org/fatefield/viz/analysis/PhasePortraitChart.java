package org.fatefield.viz.analysis;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYLineAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Phase portrait in the plane of two species: both nullclines, a field of direction arrows and
 * the steady states (filled when stable, open when not).
 */
public final class PhasePortraitChart {

    private static final Color X_NULLCLINE = new Color(0xD55E00);
    private static final Color Y_NULLCLINE = new Color(0x0072B2);
    private static final Color ARROW = new Color(0x9A9A9A);

    private PhasePortraitChart() {
    }

    /**
     * @param base   values of the species not on the axes
     * @param states steady states to mark
     */
    public static JFreeChart create(ReactionNetwork network, double[] params, double[] base, int xSpecies,
            int ySpecies, double[] lower, double[] upper, List<SteadyState> states) {
        int grid = 161;
        double[] xs = new double[grid];
        double[] ys = new double[grid];
        for (int i = 0; i < grid; i++) {
            xs[i] = lower[0] + (upper[0] - lower[0]) * i / (grid - 1);
            ys[i] = lower[1] + (upper[1] - lower[1]) * i / (grid - 1);
        }
        double[][] fx = new double[grid][grid];
        double[][] fy = new double[grid][grid];
        double[] work = new double[network.reactionCount()];
        double[] f = new double[network.speciesCount()];
        for (int j = 0; j < grid; j++) {
            for (int i = 0; i < grid; i++) {
                double[] x = base.clone();
                x[xSpecies] = xs[i];
                x[ySpecies] = ys[j];
                network.drift(x, params, f, work);
                fx[j][i] = f[xSpecies];
                fy[j][i] = f[ySpecies];
            }
        }
        String xName = network.speciesNames().get(xSpecies);
        String yName = network.speciesNames().get(ySpecies);
        XYSeriesCollection legend = new XYSeriesCollection();
        legend.addSeries(new XYSeries("d" + xName + "/dt = 0"));
        legend.addSeries(new XYSeries("d" + yName + "/dt = 0"));
        XYSeries stable = new XYSeries("stable steady state");
        XYSeries unstable = new XYSeries("unstable steady state");
        for (SteadyState s : states) {
            (s.isStable() ? stable : unstable).add(s.state()[xSpecies], s.state()[ySpecies]);
        }
        legend.addSeries(stable);
        legend.addSeries(unstable);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
        renderer.setSeriesPaint(0, X_NULLCLINE);
        renderer.setSeriesPaint(1, Y_NULLCLINE);
        renderer.setSeriesStroke(0, new BasicStroke(2.4f));
        renderer.setSeriesStroke(1, new BasicStroke(2.4f));
        for (int s = 2; s < 4; s++) {
            renderer.setSeriesLinesVisible(s, false);
            renderer.setSeriesShape(s, new Ellipse2D.Double(-6, -6, 12, 12));
            renderer.setSeriesPaint(s, ChartStyle.SPECIAL);
        }
        renderer.setSeriesShapesVisible(0, false);
        renderer.setSeriesShapesVisible(1, false);
        renderer.setSeriesShapesFilled(2, true);
        renderer.setSeriesShapesFilled(3, true);
        renderer.setUseFillPaint(true);
        renderer.setSeriesFillPaint(2, ChartStyle.SPECIAL);
        renderer.setSeriesFillPaint(3, Color.WHITE);
        renderer.setDrawOutlines(true);
        NumberAxis xAxis = new NumberAxis(xName + " (concentration)");
        NumberAxis yAxis = new NumberAxis(yName + " (concentration)");
        xAxis.setRange(lower[0], upper[0]);
        yAxis.setRange(lower[1], upper[1]);
        XYPlot plot = new XYPlot(legend, xAxis, yAxis, renderer);
        addArrows(plot, network, params, base, xSpecies, ySpecies, lower, upper);
        for (double[] s : Contours.zeroLevel(xs, ys, fx)) {
            plot.addAnnotation(new XYLineAnnotation(s[0], s[1], s[2], s[3], new BasicStroke(2.4f), X_NULLCLINE));
        }
        for (double[] s : Contours.zeroLevel(xs, ys, fy)) {
            plot.addAnnotation(new XYLineAnnotation(s[0], s[1], s[2], s[3], new BasicStroke(2.4f), Y_NULLCLINE));
        }
        return ChartStyle.chart("Phase portrait: nullclines and steady states", plot, true);
    }

    private static void addArrows(XYPlot plot, ReactionNetwork network, double[] params, double[] base, int xSpecies,
            int ySpecies, double[] lower, double[] upper) {
        int arrows = 21;
        double wx = (upper[0] - lower[0]) / arrows;
        double wy = (upper[1] - lower[1]) / arrows;
        double[] work = new double[network.reactionCount()];
        double[] f = new double[network.speciesCount()];
        BasicStroke stroke = new BasicStroke(1.0f);
        for (int j = 0; j < arrows; j++) {
            for (int i = 0; i < arrows; i++) {
                double cx = lower[0] + (i + 0.5) * wx;
                double cy = lower[1] + (j + 0.5) * wy;
                double[] x = base.clone();
                x[xSpecies] = cx;
                x[ySpecies] = cy;
                network.drift(x, params, f, work);
                double ux = f[xSpecies] / wx;
                double uy = f[ySpecies] / wy;
                double norm = Math.hypot(ux, uy);
                if (!(norm > 0)) {
                    continue;
                }
                double dx = 0.4 * wx * ux / norm;
                double dy = 0.4 * wy * uy / norm;
                double tx = cx + dx;
                double ty = cy + dy;
                plot.addAnnotation(new XYLineAnnotation(cx - dx, cy - dy, tx, ty, stroke, ARROW));
                double hx = -0.35 * dx;
                double hy = -0.35 * dy;
                plot.addAnnotation(new XYLineAnnotation(tx, ty, tx + hx - 0.5 * hy * wx / wy, ty + hy + 0.5 * hx * wy / wx,
                        stroke, ARROW));
                plot.addAnnotation(new XYLineAnnotation(tx, ty, tx + hx + 0.5 * hy * wx / wy, ty + hy - 0.5 * hx * wy / wx,
                        stroke, ARROW));
            }
        }
    }
}
