package org.fatefield.viz.analysis;

import java.awt.Color;
import java.awt.Paint;
import org.fatefield.viz.chart.ChartStyle;
import org.fatefield.viz.palette.FatePalette;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.LookupPaintScale;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.DefaultXYZDataset;

/**
 * Maps of a value over a grid of two species: the basin map (one colour per attractor) and the
 * quasi-potential landscape (a continuous scale, deep wells dark).
 */
public final class GridMapChart {

    private static final Color LOW = new Color(0x1B2A49);
    private static final Color HIGH = new Color(0xF4F1E8);

    private GridMapChart() {
    }

    /**
     * Basin map: cell (i, j) coloured by {@code labels[j][i]}, the attractor index (-1: none).
     *
     * @param attractorNames legend names of the attractors
     */
    public static JFreeChart basins(double[] xs, double[] ys, int[][] labels, String[] attractorNames, String xName,
            String yName) {
        DefaultXYZDataset data = dataset(xs, ys, (i, j) -> labels[j][i]);
        LookupPaintScale scale = new LookupPaintScale(-1.5, attractorNames.length + 0.5, Color.LIGHT_GRAY);
        scale.add(-1.5, new Color(0xDDDDDD));
        for (int k = 0; k < attractorNames.length; k++) {
            Color c = FatePalette.fate(k, attractorNames.length + 1);
            scale.add(k - 0.5, lighter(c));
        }
        JFreeChart chart = chart(data, scale, xs, ys, xName, yName, "Basins of attraction", true);
        XYPlot plot = (XYPlot) chart.getPlot();
        LegendItemCollection items = new LegendItemCollection();
        for (int k = 0; k < attractorNames.length; k++) {
            items.add(new LegendItem(attractorNames[k], (Paint) scale.getPaint(k)));
        }
        plot.setFixedLegendItems(items);
        return chart;
    }

    /**
     * Landscape map: {@code u[j][i]} on a continuous scale up to {@code ceiling} (higher values
     * and unvisited bins shown at the ceiling).
     */
    public static JFreeChart landscape(double[] xs, double[] ys, double[][] u, double ceiling, String xName,
            String yName, String title) {
        DefaultXYZDataset data = dataset(xs, ys, (i, j) -> Math.min(u[j][i], ceiling));
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
                double t = Math.max(0, Math.min(1, value / ceiling));
                return new Color((int) (LOW.getRed() + t * (HIGH.getRed() - LOW.getRed())),
                        (int) (LOW.getGreen() + t * (HIGH.getGreen() - LOW.getGreen())),
                        (int) (LOW.getBlue() + t * (HIGH.getBlue() - LOW.getBlue())));
            }
        };
        JFreeChart chart = chart(data, scale, xs, ys, xName, yName, title, false);
        NumberAxis legendAxis = new NumberAxis("U = -ln P");
        legendAxis.setLabelFont(ChartStyle.LABEL);
        legendAxis.setRange(0, ceiling);
        PaintScaleLegend legend = new PaintScaleLegend(scale, legendAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setMargin(10, 10, 10, 10);
        legend.setBackgroundPaint(Color.WHITE);
        chart.addSubtitle(legend);
        return chart;
    }

    private interface Cell {
        double value(int i, int j);
    }

    private static DefaultXYZDataset dataset(double[] xs, double[] ys, Cell cell) {
        int count = xs.length * ys.length;
        double[][] series = new double[3][count];
        int k = 0;
        for (int j = 0; j < ys.length; j++) {
            for (int i = 0; i < xs.length; i++) {
                series[0][k] = xs[i];
                series[1][k] = ys[j];
                series[2][k] = cell.value(i, j);
                k++;
            }
        }
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries("map", series);
        return data;
    }

    /** The colour mixed halfway to white: opaque, so neighbouring blocks show no seams. */
    private static Color lighter(Color c) {
        return new Color((c.getRed() + 255) / 2, (c.getGreen() + 255) / 2, (c.getBlue() + 255) / 2);
    }

    private static JFreeChart chart(DefaultXYZDataset data, PaintScale scale, double[] xs, double[] ys, String xName,
            String yName, String title, boolean legend) {
        XYBlockRenderer renderer = new XYBlockRenderer();
        double w = xs.length > 1 ? xs[1] - xs[0] : 1;
        double h = ys.length > 1 ? ys[1] - ys[0] : 1;
        renderer.setBlockWidth(w);
        renderer.setBlockHeight(h);
        renderer.setPaintScale(scale);
        NumberAxis x = new NumberAxis(xName);
        NumberAxis y = new NumberAxis(yName);
        x.setRange(xs[0] - w / 2, xs[xs.length - 1] + w / 2);
        y.setRange(ys[0] - h / 2, ys[ys.length - 1] + h / 2);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        return ChartStyle.chart(title, plot, legend);
    }
}
