package org.fatefield.viz.analysis;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.viz.chart.ChartStyle;
import org.fatefield.viz.palette.SpeciesPalette;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYLineAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Phase portrait in the plane of two species: both nullclines (each in its species' colour),
 * evenly spaced streamlines of the flow shaded by speed, and the steady states (filled when
 * stable, open when not).
 */
public final class PhasePortraitChart {

    private static final Color SLOW = new Color(0xD0D0D0);
    private static final Color FAST = new Color(0x505050);
    /** Streamline spacing as a fraction of the plot's side. */
    private static final double SEPARATION = 0.045;
    /** Points per shaded piece of a streamline. */
    private static final int PIECE = 12;

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
        renderer.setSeriesPaint(0, SpeciesPalette.species(xSpecies));
        renderer.setSeriesPaint(1, SpeciesPalette.species(ySpecies));
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
        addStreamlines(plot, network, params, base, xSpecies, ySpecies, lower, upper);
        for (double[] s : Contours.zeroLevel(xs, ys, fx)) {
            plot.addAnnotation(new XYLineAnnotation(s[0], s[1], s[2], s[3], new BasicStroke(2.4f), SpeciesPalette.species(xSpecies)));
        }
        for (double[] s : Contours.zeroLevel(xs, ys, fy)) {
            plot.addAnnotation(new XYLineAnnotation(s[0], s[1], s[2], s[3], new BasicStroke(2.4f), SpeciesPalette.species(ySpecies)));
        }
        legend.addSeries(new XYSeries("streamlines (darker: faster flow)"));
        renderer.setSeriesPaint(4, FAST);
        renderer.setSeriesShapesVisible(4, false);
        renderer.setSeriesStroke(4, new BasicStroke(1.6f));
        return ChartStyle.chart("Phase portrait: nullclines, flow and steady states", plot, true);
    }

    /**
     * Streamlines of the flow, cut into short pieces shaded by speed on a log scale (darker and
     * wider: faster), each line with an arrowhead halfway along showing the direction.
     */
    private static void addStreamlines(XYPlot plot, ReactionNetwork network, double[] params, double[] base,
            int xSpecies, int ySpecies, double[] lower, double[] upper) {
        double[] work = new double[network.reactionCount()];
        double[] f = new double[network.speciesCount()];
        double[] x = base.clone();
        List<Streamlines.Line> lines = Streamlines.trace((px, py, out) -> {
            x[xSpecies] = px;
            x[ySpecies] = py;
            network.drift(x, params, f, work);
            out[0] = f[xSpecies];
            out[1] = f[ySpecies];
        }, lower[0], upper[0], lower[1], upper[1], SEPARATION);
        double[] logs = lines.stream().flatMapToDouble(l -> java.util.Arrays.stream(l.speeds()))
                .map(Math::log).sorted().toArray();
        if (logs.length == 0) {
            return;
        }
        double lo = logs[(int) (0.05 * (logs.length - 1))];
        double hi = logs[(int) (0.95 * (logs.length - 1))];
        for (Streamlines.Line line : lines) {
            int n = line.xs().length;
            int middle = n / 2;
            for (int start = 0; start < n - 1; start += PIECE) {
                int end = Math.min(n - 1, start + PIECE);
                boolean arrow = middle > start && middle <= end;
                int stop = arrow ? middle : end;
                double t = hi > lo ? (Math.log(line.speeds()[start]) - lo) / (hi - lo) : 0.5;
                t = Math.max(0, Math.min(1, t));
                Color shade = new Color(mix(SLOW.getRed(), FAST.getRed(), t), mix(SLOW.getGreen(), FAST.getGreen(), t),
                        mix(SLOW.getBlue(), FAST.getBlue(), t));
                float width = (float) (0.7 + 1.3 * t);
                plot.addAnnotation(new FlowPath(java.util.Arrays.copyOfRange(line.xs(), start, stop + 1),
                        java.util.Arrays.copyOfRange(line.ys(), start, stop + 1), shade, width, arrow), false);
                if (arrow && stop < end) {
                    plot.addAnnotation(new FlowPath(java.util.Arrays.copyOfRange(line.xs(), stop, end + 1),
                            java.util.Arrays.copyOfRange(line.ys(), stop, end + 1), shade, width, false), false);
                }
            }
        }
    }

    private static int mix(int a, int b, double t) {
        return (int) Math.round(a + (b - a) * t);
    }
}
