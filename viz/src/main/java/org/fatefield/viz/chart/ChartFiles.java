package org.fatefield.viz.chart;

import java.awt.Rectangle;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import javax.imageio.ImageIO;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Writes charts as PNG (raster, for quick looks) and SVG (vector, for papers). */
public final class ChartFiles {

    private ChartFiles() {
    }

    /** Writes {@code chart} as a PNG of {@code width x height} pixels. */
    public static void png(JFreeChart chart, int width, int height, OutputStream out) throws IOException {
        ImageIO.write(chart.createBufferedImage(width, height), "png", out);
    }

    /** Writes {@code chart} as an SVG document of {@code width x height} units (JFreeSVG). */
    public static void svg(JFreeChart chart, int width, int height, OutputStream out) throws IOException {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        chart.draw(g, new Rectangle(0, 0, width, height));
        out.write(g.getSVGDocument().getBytes(StandardCharsets.UTF_8));
    }
}
