package org.fatefield.viz.chart;

import java.awt.Color;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.StatisticalBarRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.statistics.DefaultStatisticalCategoryDataset;

/** Sensitivities of one metric to each perturbed quantity, as bars with 95% interval whiskers. */
public final class SensitivityChart {

    private SensitivityChart() {
    }

    /**
     * @param names      perturbed quantities
     * @param values     sensitivities
     * @param halfWidths half-widths of their 95% intervals (NaN for none)
     */
    public static JFreeChart create(String metric, double fraction, List<String> names, double[] values,
            double[] halfWidths) {
        DefaultStatisticalCategoryDataset data = new DefaultStatisticalCategoryDataset();
        for (int i = 0; i < names.size(); i++) {
            data.add(values[i], Double.isFinite(halfWidths[i]) ? halfWidths[i] : 0.0, metric, names.get(i));
        }
        StatisticalBarRenderer renderer = new StatisticalBarRenderer();
        renderer.setSeriesPaint(0, new Color(0x7FA7CF));
        renderer.setErrorIndicatorPaint(ChartStyle.SPECIAL);
        renderer.setDrawBarOutline(false);
        CategoryAxis categories = new CategoryAxis("perturbed quantity");
        categories.setTickLabelFont(ChartStyle.SMALL);
        categories.setLabelFont(ChartStyle.LABEL);
        NumberAxis axis = new NumberAxis("change in " + metric + " per relative change");
        ChartStyle.style(axis);
        CategoryPlot plot = new CategoryPlot(data, categories, axis, renderer);
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(new Color(0xE0E0E0));
        plot.setOutlineVisible(false);
        JFreeChart chart = new JFreeChart(null, ChartStyle.TITLE, plot, false);
        chart.setTitle(new TextTitle("Sensitivity of " + metric + " (±" + Math.round(fraction * 100)
                + "%, 95% intervals)", ChartStyle.TITLE));
        chart.setBackgroundPaint(Color.WHITE);
        return chart;
    }
}
