package org.fatefield.viz.analysis;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Polygon;
import java.awt.Shape;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.analysis.continuation.MultistableRanges;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * One-parameter bifurcation diagram: steady states of one species against the parameter, stable
 * branches solid, unstable dashed (the usual convention), the range where two or more stable
 * states coexist shaded and labelled, special points marked with open diamonds and described in
 * the legend.
 */
public final class BifurcationDiagramChart {

    /** Open diamond marking a special point, in every chart that marks them. */
    public static final Shape DIAMOND = new Polygon(new int[] {0, 7, 0, -7}, new int[] {-7, 0, 7, 0}, 4);
    private static final int MAX_SPECIALS_IN_LEGEND = 6;

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
        // One path per series, so dashes run on along a branch of many short segments.
        renderer.setDrawSeriesLineAsPath(true);
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
        NumberAxis x = new NumberAxis(parameter);
        NumberAxis y = new NumberAxis(speciesName + " (concentration)");
        x.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        for (MultistableRanges.Range range : MultistableRanges.of(branches)) {
            IntervalMarker band = new IntervalMarker(range.from(), range.to(), ChartStyle.BISTABLE);
            band.setLabel(String.format(Locale.ROOT, "bistable, %s %.4g to %.4g", parameter, range.from(), range.to()));
            band.setLabelFont(ChartStyle.SMALL);
            band.setLabelBackgroundColor(new Color(255, 255, 255, 0));
            band.setLabelAnchor(RectangleAnchor.TOP);
            band.setLabelTextAnchor(TextAnchor.TOP_CENTER);
            band.setLabelOffset(new RectangleInsets(6, 0, 0, 0));
            plot.addDomainMarker(band, Layer.BACKGROUND);
        }
        // Special points are described in the legend, not beside the curve, so no label covers a branch.
        XYSeriesCollection markData = new XYSeriesCollection();
        XYLineAndShapeRenderer markRenderer = new XYLineAndShapeRenderer(false, true);
        int shown = 0;
        for (Branch branch : branches) {
            for (SpecialPoint s : branch.specials()) {
                String name = shown < MAX_SPECIALS_IN_LEGEND
                        ? String.format(Locale.ROOT, "%s at %s = %.4g", s.description(), parameter, s.parameter())
                        : "further special points";
                int series = markData.getSeriesIndex(name);
                if (series < 0) {
                    markData.addSeries(new XYSeries(name, false, true));
                    series = markData.getSeriesCount() - 1;
                    markRenderer.setSeriesShape(series, DIAMOND);
                    markRenderer.setSeriesPaint(series, ChartStyle.SPECIAL);
                    markRenderer.setSeriesFillPaint(series, Color.WHITE);
                    markRenderer.setSeriesOutlineStroke(series, new BasicStroke(1.8f));
                }
                markData.getSeries(series).add(s.parameter(), s.state()[species]);
                shown++;
            }
        }
        markRenderer.setUseFillPaint(true);
        markRenderer.setUseOutlinePaint(false);
        markRenderer.setDrawOutlines(true);
        plot.setDataset(1, markData);
        plot.setRenderer(1, markRenderer);
        renderer.setLegendItemLabelGenerator((dataset, series) ->
                renderer.getSeriesPaint(series) == ChartStyle.STABLE ? "stable steady states" : "unstable steady states");
        return ChartStyle.chart("Bifurcation diagram: " + speciesName + " against " + parameter, plot, true);
    }
}
