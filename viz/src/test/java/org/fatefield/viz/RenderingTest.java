package org.fatefield.viz;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.fatefield.circuits.model.CustomNetwork;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.NoiseMode;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueSpec;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.FateProportionChart;
import org.fatefield.viz.palette.FatePalette;
import org.fatefield.viz.tissue.TissueRenderer;
import org.junit.jupiter.api.Test;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


/** Headless drawing checked pixel by pixel, and the SVG export checked as XML with its series. */
class RenderingTest {

    /**
     * A tissue of {@code founders} cells of radius {@code radius} that neither divide nor move,
     * with an inert species X = 1: cell "high" (X above 0.5) or "low".
     */
    private static TissueSpec fixedCells(Domain domain, int founders, double radius) {
        CustomNetwork inert = CustomNetwork.of(List.of("X"), List.of("k"), new double[] {0},
                List.of(new CustomNetwork.ReactionDefinition("none", new int[] {1}, "k * X")));
        return TissueSpec.of(new CircuitSetup(inert, NoiseMode.NONE, 100, new double[] {1.0}),
                new ParameterMapping(inert.defaultParameters(), List.of()), MorphogenSpec.of(0, 0, 10, 0, List.of()),
                domain, GrowthSpec.of(founders, radius, 0,
                new CycleTimeDistribution(CycleTimeDistribution.Kind.FIXED, 1e6, 0), Partitioning.equal()),
                new FateClassifier(List.of(new FateRule("high", new double[] {0.5}, new double[] {Double.NaN})), "low"),
                new Timing(0.02, 0.01, 0.01));
    }

    @Test
    void cellsAreDrawnInTheirFateColoursAtTheirCentres() {
        // Two fixed cells: "high" (X = 1) at (25, 25) and "low" (X = 0) at (75, 25) in a 100 x 50 domain.
        Tissue tissue = new Tissue(fixedCells(new Domain.Rectangle(100, 50), 1, 5), 1);
        tissue.start();
        tissue.runToEnd();
        Cell only = tissue.cells().get(0);
        only.moveTo(25, 25);
        only.setFate(0, 0);
        int plotWidth = 400;
        BufferedImage image = TissueRenderer.render(tissue, "test", plotWidth);
        double scale = plotWidth / 100.0;
        int left = 70;
        int top = 48;
        int plotHeight = (int) Math.round(50 * scale);
        int px = (int) Math.round(left + 25 * scale);
        int py = (int) Math.round(top + plotHeight - 25 * scale);
        assertEquals(FatePalette.fate(0, 2).getRGB(), image.getRGB(px, py), "the cell's centre has its fate colour");
        only.setFate(1, 0);
        image = TissueRenderer.render(tissue, "test", plotWidth);
        assertEquals(FatePalette.fate(1, 2).getRGB(), image.getRGB(px, py), "recoloured for the default fate");
        // Far from the cell the field (zero everywhere) shows its lowest colour.
        int fx = (int) Math.round(left + 80 * scale);
        assertEquals(FatePalette.morphogen(0).getRGB(), image.getRGB(fx, py));
        assertTrue(new Color(image.getRGB(2, 2)).equals(Color.WHITE));
    }

    /**
     * In 3-D the picture is the mid-depth slice: a sphere of radius R whose centre is dz from the
     * plane is drawn as its cross-section, a disc of radius sqrt(R^2 - dz^2) (Pythagoras), and a
     * sphere that misses the plane is not drawn.
     */
    @Test
    void aThreeDimensionalTissueIsDrawnAsItsMidDepthSlice() {
        Tissue tissue = new Tissue(fixedCells(new org.fatefield.engine.domain.Domain3d.Box(100, 50, 40), 2, 10), 1);
        tissue.start();
        tissue.runToEnd();
        Cell cut = tissue.cells().get(0);
        Cell missed = tissue.cells().get(1);
        double radius = cut.sphereRadius(10);
        cut.moveTo(25, 25, 20 + 0.6 * radius);
        missed.moveTo(75, 25, 20 + 1.01 * radius);
        cut.setFate(0, 0);
        missed.setFate(0, 0);
        assertEquals(radius * 0.8, org.fatefield.viz.tissue.DepthSlice.drawnRadius(tissue, cut), 1e-12);
        assertEquals(0.0, org.fatefield.viz.tissue.DepthSlice.drawnRadius(tissue, missed), 0.0);
        int plotWidth = 400;
        BufferedImage image = TissueRenderer.render(tissue, "test", plotWidth);
        double scale = plotWidth / 100.0;
        int left = 70;
        int top = 48;
        int plotHeight = (int) Math.round(50 * scale);
        int py = (int) Math.round(top + plotHeight - 25 * scale);
        int fate = FatePalette.fate(0, 2).getRGB();
        assertEquals(fate, image.getRGB((int) Math.round(left + 25 * scale), py), "the cut sphere is drawn");
        // Inside the cross-section (0.7 R from the centre) and outside it (0.9 R): 0.8 R is the edge.
        assertEquals(fate, image.getRGB((int) Math.round(left + (25 + 0.7 * radius) * scale), py));
        assertTrue(fate != image.getRGB((int) Math.round(left + (25 + 0.9 * radius) * scale), py));
        assertTrue(fate != image.getRGB((int) Math.round(left + 75 * scale), py), "the missed sphere is not drawn");
    }

    @Test
    void svgExportParsesAndHoldsEverySeries() throws Exception {
        TimeSeries series = new TimeSeries(List.of("alpha", "beta", "rest"));
        for (int t = 0; t < 5; t++) {
            series.add(new TimeSeries.Row(t, new int[] {t, 2 * t, 10 - 3 * t}, 10, 0.1 * t));
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChartFiles.svg(FateProportionChart.create(series, "Proportions"), 800, 500, out);
        String svg = out.toString(StandardCharsets.UTF_8);
        var factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        var doc = factory.newDocumentBuilder().parse(new ByteArrayInputStream(out.toByteArray()));
        assertEquals("svg", doc.getDocumentElement().getNodeName());
        for (String name : List.of("alpha", "beta", "rest", "population (right axis)", "Proportions")) {
            assertTrue(svg.contains(name), name + " in the SVG");
        }
    }
}
