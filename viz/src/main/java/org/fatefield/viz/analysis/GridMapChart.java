package org.fatefield.viz.analysis;

import java.awt.Color;
import java.awt.Paint;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYDataImageAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Maps of a value over a regular grid of two variables: the basin map (one colour per attractor)
 * and the quasi-potential landscape (a continuous scale, deep wells dark). The grid is drawn as
 * one image placed in data coordinates, so an SVG embeds one picture rather than a rectangle per
 * grid cell, and a PNG shows crisp cell edges.
 */
public final class GridMapChart {

    /**
     * Landscape values at or above this (in units of -ln P relative to the deepest well) share
     * the top colour. One value for every landscape Fatefield draws, so that maps can be compared.
     */
    public static final double LANDSCAPE_CEILING = 10;
    /** Colour of grid points from which no attractor was reached (drawn dark: they trace the separatrix). */
    public static final Color UNDECIDED = new Color(0x444444);

    private static final Color LOW = new Color(0x1B2A49);
    private static final Color HIGH = new Color(0xF4F1E8);
    /** Target width of the embedded image, in image pixels, so that a grid cell spans several. */
    private static final int IMAGE_PIXELS = 480;

    private GridMapChart() {
    }

    /**
     * Basin map: grid point (i, j) coloured by {@code labels[j][i]}, the attractor index (-1: no
     * attractor reached).
     *
     * @param attractorNames   legend names of the attractors
     * @param attractorColours their colours (a fate's colour when the attractor lies in that fate)
     */
    public static JFreeChart basins(double[] xs, double[] ys, int[][] labels, String[] attractorNames,
            Color[] attractorColours, String xName, String yName) {
        Color[] fills = new Color[attractorColours.length];
        for (int k = 0; k < fills.length; k++) {
            fills[k] = lighter(attractorColours[k]);
        }
        BufferedImage image = image(xs.length, ys.length, (i, j) -> {
            int a = labels[j][i];
            return (a >= 0 && a < fills.length ? fills[a] : UNDECIDED).getRGB();
        });
        JFreeChart chart = chart(image, xs, ys, xName, yName, "Basins of attraction", true);
        XYPlot plot = (XYPlot) chart.getPlot();
        LegendItemCollection items = new LegendItemCollection();
        for (int k = 0; k < attractorNames.length; k++) {
            items.add(new LegendItem(attractorNames[k], (Paint) fills[k]));
        }
        items.add(new LegendItem("undecided (no attractor reached in time)", (Paint) UNDECIDED));
        plot.setFixedLegendItems(items);
        return chart;
    }

    /**
     * Landscape map: {@code u[j][i]} on a continuous scale up to {@code ceiling} (higher values
     * and unvisited grid points shown at the ceiling).
     */
    public static JFreeChart landscape(double[] xs, double[] ys, double[][] u, double ceiling, String xName,
            String yName, String title) {
        PaintScale scale = new PaintScale() {
            @Override
            public double getLowerBound() {
                return 0;
            }

            @Override
            public double getUpperBound() {
                return ceiling;
            }

            @Override
            public Paint getPaint(double value) {
                double t = Double.isNaN(value) ? 1 : Math.max(0, Math.min(1, value / ceiling));
                return new Color((int) (LOW.getRed() + t * (HIGH.getRed() - LOW.getRed())),
                        (int) (LOW.getGreen() + t * (HIGH.getGreen() - LOW.getGreen())),
                        (int) (LOW.getBlue() + t * (HIGH.getBlue() - LOW.getBlue())));
            }
        };
        BufferedImage image = image(xs.length, ys.length, (i, j) -> ((Color) scale.getPaint(u[j][i])).getRGB());
        JFreeChart chart = chart(image, xs, ys, xName, yName, title, false);
        NumberAxis legendAxis = new NumberAxis("quasi-potential U = -ln P (capped at "
                + (int) Math.round(ceiling) + ")");
        ChartStyle.style(legendAxis);
        legendAxis.setRange(0, ceiling);
        PaintScaleLegend legend = new PaintScaleLegend(scale, legendAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setMargin(10, 10, 10, 10);
        legend.setBackgroundPaint(Color.WHITE);
        chart.addSubtitle(legend);
        return chart;
    }

    private interface Pixel {
        int rgb(int i, int j);
    }

    /** The grid as an image, each grid point a square of pixels, row 0 of the image at the top (highest y). */
    private static BufferedImage image(int nx, int ny, Pixel pixel) {
        int k = Math.max(1, Math.min(16, IMAGE_PIXELS / Math.max(nx, ny)));
        BufferedImage image = new BufferedImage(nx * k, ny * k, BufferedImage.TYPE_INT_RGB);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int rgb = pixel.rgb(i, j);
                int top = (ny - 1 - j) * k;
                for (int dy = 0; dy < k; dy++) {
                    for (int dx = 0; dx < k; dx++) {
                        image.setRGB(i * k + dx, top + dy, rgb);
                    }
                }
            }
        }
        return image;
    }

    /** The colour mixed halfway to white: opaque, so neighbouring blocks show no seams. */
    private static Color lighter(Color c) {
        return new Color((c.getRed() + 255) / 2, (c.getGreen() + 255) / 2, (c.getBlue() + 255) / 2);
    }

    private static JFreeChart chart(BufferedImage image, double[] xs, double[] ys, String xName, String yName,
            String title, boolean legend) {
        double w = xs.length > 1 ? (xs[xs.length - 1] - xs[0]) / (xs.length - 1) : 1;
        double h = ys.length > 1 ? (ys[ys.length - 1] - ys[0]) / (ys.length - 1) : 1;
        double x0 = xs[0] - w / 2;
        double y0 = ys[0] - h / 2;
        double width = w * xs.length;
        double height = h * ys.length;
        NumberAxis x = new NumberAxis(xName);
        NumberAxis y = new NumberAxis(yName);
        x.setRange(x0, x0 + width);
        y.setRange(y0, y0 + height);
        XYPlot plot = new XYPlot(new XYSeriesCollection(), x, y, new XYLineAndShapeRenderer());
        plot.addAnnotation(new XYDataImageAnnotation(image, x0, y0, width, height, false));
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        JFreeChart chart = ChartStyle.chart(title, plot, legend);
        chart.getRenderingHints().put(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
        return chart;
    }
}
