package org.fatefield.viz.analysis;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.annotations.AbstractXYAnnotation;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A polyline in data coordinates drawn as one path (one SVG element), optionally with an
 * arrowhead at its end showing the direction of travel.
 */
final class FlowPath extends AbstractXYAnnotation {

    private static final long serialVersionUID = 1L;

    private final double[] xs;
    private final double[] ys;
    private final Color colour;
    private final float width;
    private final boolean arrow;

    FlowPath(double[] xs, double[] ys, Color colour, float width, boolean arrow) {
        this.xs = xs.clone();
        this.ys = ys.clone();
        this.colour = colour;
        this.width = width;
        this.arrow = arrow;
    }

    @Override
    public void draw(Graphics2D g2, XYPlot plot, Rectangle2D dataArea, ValueAxis domainAxis, ValueAxis rangeAxis,
            int rendererIndex, PlotRenderingInfo info) {
        if (xs.length < 2 || plot.getOrientation() != PlotOrientation.VERTICAL) {
            return;
        }
        RectangleEdge xEdge = plot.getDomainAxisEdge();
        RectangleEdge yEdge = plot.getRangeAxisEdge();
        Path2D.Double path = new Path2D.Double();
        double px = 0;
        double py = 0;
        double qx = 0;
        double qy = 0;
        for (int k = 0; k < xs.length; k++) {
            qx = px;
            qy = py;
            px = domainAxis.valueToJava2D(xs[k], dataArea, xEdge);
            py = rangeAxis.valueToJava2D(ys[k], dataArea, yEdge);
            if (k == 0) {
                path.moveTo(px, py);
            } else {
                path.lineTo(px, py);
            }
        }
        g2.setPaint(colour);
        g2.setStroke(new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g2.draw(path);
        double dx = px - qx;
        double dy = py - qy;
        double norm = Math.hypot(dx, dy);
        if (arrow && norm > 0) {
            double ux = dx / norm;
            double uy = dy / norm;
            double size = 4 + 2 * width;
            Path2D.Double head = new Path2D.Double();
            head.moveTo(px + ux * size * 0.5, py + uy * size * 0.5);
            head.lineTo(px - ux * size + uy * size * 0.6, py - uy * size - ux * size * 0.6);
            head.lineTo(px - ux * size - uy * size * 0.6, py - uy * size + ux * size * 0.6);
            head.closePath();
            g2.fill(head);
        }
    }
}
