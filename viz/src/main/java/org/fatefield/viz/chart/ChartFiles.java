package org.fatefield.viz.chart;

import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * Writes charts as PNG (raster, with its resolution in the pHYs chunk) and SVG (vector, with a
 * view box, so it scales in a page). The SVG is byte-identical for identical charts: its element
 * ids use a fixed prefix rather than JFreeSVG's clock-based one.
 */
public final class ChartFiles {

    private static final double METRES_PER_INCH = 0.0254;

    private ChartFiles() {
    }

    /** Something that draws itself into an area: a chart ({@code chart::draw}) or a grid of them. */
    @FunctionalInterface
    public interface Drawing {
        /** Draws into {@code area} of {@code g}. */
        void draw(Graphics2D g, Rectangle area);
    }

    /** Writes {@code chart} as a PNG of {@code width x height} pixels at screen resolution. */
    public static void png(JFreeChart chart, int width, int height, OutputStream out) throws IOException {
        png(chart, width, height, FigureFormat.DEFAULT, out);
    }

    /**
     * Writes {@code chart} as a PNG laid out at {@code width x height} CSS pixels (or the size in
     * {@code format}), rendered at the format's resolution.
     */
    public static void png(JFreeChart chart, int width, int height, FigureFormat format, OutputStream out)
            throws IOException {
        png((Drawing) (g, area) -> chart.draw(g, area), width, height, format, out);
    }

    /** Writes {@code drawing} as a PNG, as {@link #png(JFreeChart, int, int, FigureFormat, OutputStream)}. */
    public static void png(Drawing drawing, int width, int height, FigureFormat format, OutputStream out)
            throws IOException {
        int w = format.widthOr(width);
        int h = format.heightOr(height);
        double scale = format.scale();
        BufferedImage image = new BufferedImage((int) Math.round(w * scale), (int) Math.round(h * scale),
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.scale(scale, scale);
        drawing.draw(g, new Rectangle(0, 0, w, h));
        g.dispose();
        writePng(image, format.dpi(), out);
    }

    /** Writes {@code image} as a PNG whose metadata says {@code dpi} dots per inch. */
    public static void writePng(BufferedImage image, int dpi, OutputStream out) throws IOException {
        Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("png");
        ImageWriter writer = writers.next();
        try (ImageOutputStream stream = ImageIO.createImageOutputStream(new NonClosing(out))) {
            ImageWriteParam param = writer.getDefaultWriteParam();
            IIOMetadata metadata = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image), param);
            IIOMetadataNode phys = new IIOMetadataNode("pHYs");
            String perMetre = Long.toString(Math.round(dpi / METRES_PER_INCH));
            phys.setAttribute("pixelsPerUnitXAxis", perMetre);
            phys.setAttribute("pixelsPerUnitYAxis", perMetre);
            phys.setAttribute("unitSpecifier", "meter");
            IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
            root.appendChild(phys);
            try {
                metadata.mergeTree("javax_imageio_png_1.0", root);
            } catch (IIOInvalidTreeException e) {
                throw new IOException("cannot set the PNG resolution: " + e.getMessage(), e);
            }
            writer.setOutput(stream);
            writer.write(null, new IIOImage(image, null, metadata), param);
        } finally {
            writer.dispose();
        }
    }

    /** Writes {@code chart} as an SVG document of {@code width x height} units (JFreeSVG). */
    public static void svg(JFreeChart chart, int width, int height, OutputStream out) throws IOException {
        svg(chart, width, height, FigureFormat.DEFAULT, out);
    }

    /** Writes {@code chart} as an SVG laid out at {@code width x height} (or the format's size). */
    public static void svg(JFreeChart chart, int width, int height, FigureFormat format, OutputStream out)
            throws IOException {
        svg((Drawing) (g, area) -> chart.draw(g, area), width, height, format, out);
    }

    /** Writes {@code drawing} as an SVG, as {@link #svg(JFreeChart, int, int, FigureFormat, OutputStream)}. */
    public static void svg(Drawing drawing, int width, int height, FigureFormat format, OutputStream out)
            throws IOException {
        int w = format.widthOr(width);
        int h = format.heightOr(height);
        SVGGraphics2D g = new SVGGraphics2D(w, h);
        g.setDefsKeyPrefix("ff");
        drawing.draw(g, new Rectangle(0, 0, w, h));
        String element = g.getSVGElement(null, true, new ViewBox(0, 0, w, h), null, null);
        String document = "<?xml version=\"1.0\"?>\n" + element + "\n";
        out.write(document.getBytes(StandardCharsets.UTF_8));
    }

    /** Lets ImageIO close its stream without closing the caller's. */
    private static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
