package org.fatefield.viz.analysis;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * One-parameter bifurcation diagram: steady states of one species against the parameter, stable
 * branches solid, unstable dashed (the usual convention), special points marked and labelled.
 */
public final class BifurcationDiagramChart {

    private BifurcationDiagramChart() {
    }

    /**
     * @param branches  branches from the continuation
     * @param species   index of the species on the vertical axis
     * @param parameter name of the parameter (axis label)
     * @param speciesName name of the species (axis label)
     */
    public static JFreeChart create(List<Branch> branches, int species, String parameter, String speciesName) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        BasicStroke solid = new BasicStroke(2.4f);
        BasicStroke dashed = new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {7f, 5f}, 0f);
        boolean stableShown = false;
        boolean unstableShown = false;
        for (Branch branch : branches) {
            List<BranchPoint> points = branch.points();
            int start = 0;
            for (int i = 1; i <= points.size(); i++) {
                if (i == points.size() || points.get(i).stable() != points.get(start).stable()) {
                    boolean stable = points.get(start).stable();
                    String key = "branch " + branch.id() + " part " + start;
                    XYSeries series = new XYSeries(key, false, true);
                    for (int k = start; k < Math.min(i + 1, points.size()); k++) {
                        series.add(points.get(k).parameter(), points.get(k).state()[species]);
                    }
                    int index = data.getSeriesCount();
                    data.addSeries(series);
                    renderer.setSeriesPaint(index, stable ? ChartStyle.STABLE : ChartStyle.UNSTABLE);
                    renderer.setSeriesStroke(index, stable ? solid : dashed);
                    boolean first = stable ? !stableShown : !unstableShown;
                    renderer.setSeriesVisibleInLegend(index, first);
                    stableShown |= stable;
                    unstableShown |= !stable;
                    start = i;
                }
            }
        }
        XYSeries marks = new XYSeries("special points", false, true);
        NumberAxis x = new NumberAxis(parameter);
        NumberAxis y = new NumberAxis(speciesName + " (concentration)");
        x.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        for (Branch branch : branches) {
            for (SpecialPoint s : branch.specials()) {
                double sx = s.parameter();
                double sy = s.state()[species];
                marks.add(sx, sy);
                XYTextAnnotation label = new XYTextAnnotation(
                        String.format(Locale.ROOT, "  %s, %s = %.4g", s.description(), parameter, sx), sx, sy);
                label.setFont(ChartStyle.SMALL);
                label.setTextAnchor(TextAnchor.BOTTOM_LEFT);
                plot.addAnnotation(label);
            }
        }
        XYSeriesCollection markData = new XYSeriesCollection(marks);
        XYLineAndShapeRenderer markRenderer = new XYLineAndShapeRenderer(false, true);
        markRenderer.setSeriesShape(0, new Ellipse2D.Double(-5, -5, 10, 10));
        markRenderer.setSeriesPaint(0, ChartStyle.SPECIAL);
        plot.setDataset(1, markData);
        plot.setRenderer(1, markRenderer);
        renderer.setLegendItemLabelGenerator((dataset, series) ->
                renderer.getSeriesPaint(series) == ChartStyle.STABLE ? "stable steady states" : "unstable steady states");
        return ChartStyle.chart("Bifurcation diagram: " + speciesName + " against " + parameter, plot, true);
    }
}
