package org.fatefield.viz.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageInputStream;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.viz.analysis.GridMapChart;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Node;

/**
 * Figure files: PNG resolution read back from the pHYs chunk (PNG specification, W3C 2003,
 * section 11.3.5.3: pixels per metre), SVG view box and byte-identical output, a grid map
 * embedded as one image, and at most eight tick intervals on an axis (common practice).
 */
class ChartFilesTest {

    private static JFreeChart proportions() {
        TimeSeries series = new TimeSeries(List.of("alpha", "rest"));
        for (int t = 0; t <= 30; t++) {
            series.add(new TimeSeries.Row(t * 0.1, new int[] {t, 30 - t}, 30, 0.01 * t));
        }
        return FateProportionChart.create(series, "Proportions");
    }

    @Test
    void pngCarriesItsResolutionAndScalesItsPixels() throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChartFiles.png(proportions(), 400, 300, new FigureFormat(300, 0, 0), out);
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(out.toByteArray()))) {
            ImageReader reader = ImageIO.getImageReaders(in).next();
            reader.setInput(in);
            BufferedImage image = reader.read(0);
            assertEquals(1250, image.getWidth(), "400 CSS pixels at 300/96");
            assertEquals(938, image.getHeight(), "300 CSS pixels at 300/96, rounded");
            IIOMetadataNode root = (IIOMetadataNode) reader.getImageMetadata(0).getAsTree("javax_imageio_png_1.0");
            Node phys = root.getElementsByTagName("pHYs").item(0);
            // 300 dots per inch = 300 / 0.0254 = 11811.02 pixels per metre.
            assertEquals("11811", phys.getAttributes().getNamedItem("pixelsPerUnitXAxis").getNodeValue());
            assertEquals("meter", phys.getAttributes().getNamedItem("unitSpecifier").getNodeValue());
        }
    }

    @Test
    void svgHasAViewBoxAndIsByteIdenticalForTheSameChart() throws Exception {
        ByteArrayOutputStream a = new ByteArrayOutputStream();
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        ChartFiles.svg(proportions(), 800, 500, FigureFormat.DEFAULT, a);
        Thread.sleep(5);
        ChartFiles.svg(proportions(), 800, 500, FigureFormat.DEFAULT, b);
        assertArrayEquals(a.toByteArray(), b.toByteArray());
        String svg = a.toString(StandardCharsets.UTF_8);
        assertTrue(svg.contains("viewBox='0.0 0.0 800.0 500.0'"), svg.substring(0, 300));
    }

    @Test
    void gridMapIsOneEmbeddedImage() throws Exception {
        int n = 121;
        double[] xs = new double[n];
        double[][] u = new double[n][n];
        for (int i = 0; i < n; i++) {
            xs[i] = 3.0 * i / (n - 1);
        }
        for (int j = 0; j < n; j++) {
            for (int i = 0; i < n; i++) {
                u[j][i] = (xs[i] - 1) * (xs[i] - 1) + (xs[j] - 2) * (xs[j] - 2);
            }
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChartFiles.svg(GridMapChart.landscape(xs, xs, u, GridMapChart.LANDSCAPE_CEILING, "X", "Y", "map"), 960, 640,
                FigureFormat.DEFAULT, out);
        String svg = out.toString(StandardCharsets.UTF_8);
        Matcher images = Pattern.compile("<image").matcher(svg);
        int count = 0;
        while (images.find()) {
            count++;
        }
        assertEquals(1, count, "one embedded picture for 14641 grid points");
        assertTrue(svg.length() < 400_000, "size " + svg.length());
        assertTrue(!svg.contains("<rect x=\"7"), "no rectangle per grid point");
    }

    @Test
    void axesCarryAtMostEightIntervals() {
        JFreeChart chart = proportions();
        chart.createBufferedImage(1600, 1000);
        XYPlot plot = (XYPlot) chart.getPlot();
        for (int k = 0; k < plot.getRangeAxisCount(); k++) {
            NumberAxis axis = (NumberAxis) plot.getRangeAxis(k);
            double intervals = axis.getRange().getLength() / axis.getTickUnit().getSize();
            assertTrue(intervals <= ModerateTickUnits.MAX_INTERVALS + 1e-9, "range axis " + k + ": " + intervals);
        }
        NumberAxis time = (NumberAxis) plot.getDomainAxis();
        assertTrue(time.getRange().getLength() / time.getTickUnit().getSize() <= ModerateTickUnits.MAX_INTERVALS);
    }
}
