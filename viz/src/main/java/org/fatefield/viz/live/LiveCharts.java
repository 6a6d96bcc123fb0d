package org.fatefield.viz.live;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.chart.ChartStyle;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The live view's charts besides fate proportions: every cell as a point at (its local control
 * parameter, its first species) over the circuit's stable and unstable steady-state branches, so
 * cells can be seen dropping onto a branch as they cross the threshold; and the clicked cell's
 * circuit trace, back through its ancestors.
 */
final class LiveCharts {

    private final XYSeries cells = new XYSeries("cells", false, true);
    private final JFreeChart phase;
    private final XYSeriesCollection trace = new XYSeriesCollection();
    private final JFreeChart traceChart;
    private final List<String> species;

    LiveCharts(Tissue tissue, List<Branch> branches, String parameter) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer lines = new XYLineAndShapeRenderer(true, false);
        for (Branch b : branches) {
            XYSeries stable = new XYSeries("stable " + b.id(), false, true);
            XYSeries unstable = new XYSeries("unstable " + b.id(), false, true);
            for (BranchPoint p : b.points()) {
                (p.stable() ? stable : unstable).add(p.parameter(), p.state()[0]);
            }
            int s = data.getSeriesCount();
            data.addSeries(stable);
            data.addSeries(unstable);
            lines.setSeriesPaint(s, ChartStyle.STABLE);
            lines.setSeriesLinesVisible(s, false);
            lines.setSeriesShapesVisible(s, true);
            lines.setSeriesShape(s, new Ellipse2D.Double(-1.5, -1.5, 3, 3));
            lines.setSeriesPaint(s + 1, ChartStyle.UNSTABLE);
            lines.setSeriesLinesVisible(s + 1, false);
            lines.setSeriesShapesVisible(s + 1, true);
            lines.setSeriesShape(s + 1, new Ellipse2D.Double(-1, -1, 2, 2));
        }
        NumberAxis x = new NumberAxis(parameter + " (local)");
        NumberAxis y = new NumberAxis(tissue.spec().circuit().network().speciesNames().get(0));
        x.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, lines);
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        dots.setSeriesPaint(0, new Color(0x555555));
        dots.setSeriesShape(0, new Ellipse2D.Double(-2, -2, 4, 4));
        plot.setDataset(1, new XYSeriesCollection(cells));
        plot.setRenderer(1, dots);
        lines.setDefaultStroke(new BasicStroke(2f));
        phase = ChartStyle.chart("Cells on the bifurcation branches", plot, false);
        species = tissue.spec().circuit().network().speciesNames();
        NumberAxis time = new NumberAxis("time (h)");
        time.setAutoRangeIncludesZero(false);
        traceChart = ChartStyle.chart("Clicked cell and its ancestors", new XYPlot(trace, time,
                new NumberAxis("level"), new XYLineAndShapeRenderer(true, false)), true);
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

    /** Replots the cells (call on the Swing thread). */
    void update(Tissue tissue) {
        cells.clear();
        int step = Math.max(1, tissue.cells().size() / 2000);
        for (int i = 0; i < tissue.cells().size(); i += step) {
            Cell c = tissue.cells().get(i);
            cells.add(tissue.spec().mapping().controlAt(tissue.signalAt(c)), c.concentration(0), false);
        }
        cells.fireSeriesChanged();
    }
}
