package org.fatefield.viz.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.List;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.viz.palette.FatePalette;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Fraction of cells in each fate over time, with the population size on a second axis.
 */
public final class FateProportionChart {

    private FateProportionChart() {
    }

    /** Builds the chart for {@code series} under {@code title}. */
    public static JFreeChart create(TimeSeries series, String title) {
        List<String> fates = series.fateNames();
        XYSeriesCollection fractions = new XYSeriesCollection();
        for (int f = 0; f < fates.size(); f++) {
            XYSeries line = new XYSeries(fates.get(f), false, false);
            for (TimeSeries.Row row : series.rows()) {
                line.add(row.time(), row.fraction(f));
            }
            fractions.addSeries(line);
        }
        XYSeriesCollection population = new XYSeriesCollection();
        XYSeries cells = new XYSeries("population (right axis)", false, false);
        for (TimeSeries.Row row : series.rows()) {
            cells.add(row.time(), row.population());
        }
        population.addSeries(cells);

        NumberAxis time = new NumberAxis("time (h)");
        double last = series.rows().isEmpty() ? 0 : series.rows().get(series.rows().size() - 1).time();
        if (last > 0) {
            time.setRange(0, last);
        } else {
            // Before the first step there is one point, at t = 0: one hour of axis, not ticks of 1e-9 h.
            time.setRange(0, 1);
        }
        NumberAxis fraction = new NumberAxis("fraction of cells");
        fraction.setRange(0.0, 1.0);
        XYLineAndShapeRenderer fateLines = new XYLineAndShapeRenderer(true, false);
        for (int f = 0; f < fates.size(); f++) {
            fateLines.setSeriesPaint(f, FatePalette.fate(f, fates.size()));
            fateLines.setSeriesStroke(f, new BasicStroke(2.8f));
        }
        XYPlot plot = new XYPlot(fractions, time, fraction, fateLines);
        NumberAxis count = new NumberAxis("cells");
        count.setAutoRangeIncludesZero(true);
        count.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        plot.setRangeAxis(1, count);
        plot.setDataset(1, population);
        plot.mapDatasetToRangeAxis(1, 1);
        XYLineAndShapeRenderer populationLine = new XYLineAndShapeRenderer(true, false);
        populationLine.setSeriesPaint(0, new Color(0x404040));
        populationLine.setSeriesStroke(0, new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER,
                10f, new float[] {6f, 5f}, 0f));
        plot.setRenderer(1, populationLine);
        return ChartStyle.chart(title, plot, true);
    }
}
