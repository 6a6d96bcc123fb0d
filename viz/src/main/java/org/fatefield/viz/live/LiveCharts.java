package org.fatefield.viz.live;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.analysis.BifurcationDiagramChart;
import org.fatefield.viz.chart.ChartStyle;
import org.fatefield.viz.palette.FatePalette;
import org.fatefield.viz.palette.SpeciesPalette;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The live view's charts besides fate proportions: every cell as a point at (its local control
 * parameter, its first species), in its fate's colour, over the circuit's bifurcation diagram
 * (the same drawing as {@code analyze}'s: stable branches solid, unstable dashed, bistable range
 * shaded, special points as diamonds), so cells can be seen dropping onto a branch as they cross
 * the threshold; and the clicked cell's circuit trace, back through its ancestors, each species in
 * its own colour.
 */
final class LiveCharts {

    private final List<XYSeries> cells = new ArrayList<>();
    private final XYSeriesCollection cellData = new XYSeriesCollection();
    private final List<String> fateNames;
    private final XYLineAndShapeRenderer traceRenderer;
    private final JFreeChart phase;
    private final XYSeriesCollection trace = new XYSeriesCollection();
    private final JFreeChart traceChart;
    private final List<String> species;

    LiveCharts(Tissue tissue, List<Branch> branches, String parameter) {
        fateNames = tissue.spec().fates().fateNames();
        JFreeChart diagram = BifurcationDiagramChart.create(branches, 0, parameter + " (local)",
                tissue.spec().circuit().network().speciesNames().get(0));
        XYPlot plot = (XYPlot) diagram.getPlot();
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        for (int f = 0; f < fateNames.size(); f++) {
            XYSeries series = new XYSeries(fateNames.get(f) + " cells", false, true);
            cells.add(series);
            cellData.addSeries(series);
            dots.setSeriesPaint(f, FatePalette.fate(f, fateNames.size()));
            dots.setSeriesShape(f, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        }
        // Cells are drawn under the branches, so the branches stay readable where cells crowd.
        int index = plot.getDatasetCount();
        plot.setDataset(index, cellData);
        plot.setRenderer(index, dots);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.REVERSE);
        diagram.setTitle(new TextTitle("Cells on the bifurcation branches", ChartStyle.TITLE));
        diagram.getLegend().setItemFont(ChartStyle.SMALL);
        phase = diagram;
        species = tissue.spec().circuit().network().speciesNames();
        NumberAxis time = new NumberAxis("time (h)");
        time.setAutoRangeIncludesZero(false);
        traceRenderer = new XYLineAndShapeRenderer(true, false);
        for (int s = 0; s < species.size(); s++) {
            traceRenderer.setSeriesPaint(s, SpeciesPalette.species(s));
            traceRenderer.setSeriesStroke(s, new BasicStroke(1.6f));
        }
        traceChart = ChartStyle.chart("Clicked cell and its ancestors", new XYPlot(trace, time,
                new NumberAxis("concentration (circuit units)"), traceRenderer), true);
    }

    /** The clicked cell's trace. */
    JFreeChart trace() {
        return traceChart;
    }

    /** Replots the trace of the clicked cell ({@code null}: none clicked). */
    void showTrace(CellTraces.Trace t) {
        trace.removeAllSeries();
        if (t == null) {
            return;
        }
        for (int s = 0; s < species.size(); s++) {
            XYSeries line = new XYSeries(species.get(s), true, true);
            for (int k = 0; k < t.size(); k++) {
                line.add(t.time(k), t.value(k, s), false);
            }
            trace.addSeries(line);
        }
    }

    JFreeChart phase() {
        return phase;
    }

    /** Replots the cells, each in its fate's colour (call on the Swing thread). */
    void update(Tissue tissue) {
        for (XYSeries series : cells) {
            series.setNotify(false);
            series.clear();
        }
        int step = Math.max(1, tissue.cells().size() / 2000);
        for (int i = 0; i < tissue.cells().size(); i += step) {
            Cell c = tissue.cells().get(i);
            cells.get(Math.max(0, c.fate())).add(tissue.spec().mapping().controlAt(tissue.signalAt(c)),
                    c.concentration(0), false);
        }
        for (XYSeries series : cells) {
            series.setNotify(true);
        }
    }
}
