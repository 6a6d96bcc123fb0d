package org.fatefield.viz.tissue;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Locale;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.palette.FatePalette;

/**
 * Draws a tissue headless: the morphogen field as a heat map, each cell as a disc in its fate's
 * colour, axes in µm, a fate legend with counts and a morphogen colour bar.
 */
public final class TissueRenderer {

    private static final int LEFT = 70;
    private static final int RIGHT = 200;
    private static final int TOP = 48;
    private static final int BOTTOM = 58;
    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 17);
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 14);
    private static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    private TissueRenderer() {
    }

    /**
     * Renders {@code tissue} with a plot area {@code plotWidth} pixels wide (the height follows
     * the domain's aspect ratio).
     */
    public static BufferedImage render(Tissue tissue, String title, int plotWidth) {
        double width = tissue.spec().width();
        double height = tissue.spec().height();
        double scale = plotWidth / width;
        int plotHeight = (int) Math.round(height * scale);
        BufferedImage image = new BufferedImage(LEFT + plotWidth + RIGHT, TOP + plotHeight + BOTTOM,
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, image.getWidth(), image.getHeight());
            double fieldMax = Math.max(tissue.field().max(), 1e-12);
            drawField(g, tissue.field(), DepthSlice.layer(tissue, tissue.field()), scale, plotHeight, fieldMax);
            List<String> fates = tissue.spec().fates().fateNames();
            int[] counts = new int[fates.size()];
            drawCells(g, tissue, scale, plotHeight, counts);
            g.setColor(new Color(0x333333));
            g.setStroke(new BasicStroke(1f));
            g.drawRect(LEFT, TOP, plotWidth, plotHeight);
            drawAxes(g, width, height, scale, plotWidth, plotHeight);
            g.setFont(TITLE);
            g.drawString(title + DepthSlice.caption(tissue), LEFT, TOP - 18);
            drawLegend(g, fates, counts, LEFT + plotWidth + 24, TOP, fieldMax, plotHeight, tissue.field().spec().name());
        } finally {
            g.dispose();
        }
        return image;
    }

    private static void drawField(Graphics2D g, MorphogenField field, int layer, double scale, int plotHeight,
            double max) {
        double side = field.spacing() * scale;
        for (int j = 0; j < field.rows(); j++) {
            for (int i = 0; i < field.columns(); i++) {
                g.setColor(FatePalette.morphogen(field.value(i, j, layer) / max));
                double x0 = LEFT + i * side;
                double y0 = TOP + plotHeight - (j + 1) * side;
                g.fill(new Rectangle2D.Double(x0, y0, side + 0.6, side + 0.6));
            }
        }
    }

    private static void drawCells(Graphics2D g, Tissue tissue, double scale, int plotHeight, int[] counts) {
        int fateCount = counts.length;
        Color outline = new Color(0, 0, 0, 90);
        g.setStroke(new BasicStroke(0.6f));
        for (Cell cell : tissue.cells()) {
            counts[cell.fate()]++;
            double r = DepthSlice.drawnRadius(tissue, cell) * scale;
            if (r <= 0) {
                continue;
            }
            double cx = LEFT + cell.x() * scale;
            double cy = TOP + plotHeight - cell.y() * scale;
            Ellipse2D disc = new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r);
            g.setColor(FatePalette.fate(cell.fate(), fateCount));
            g.fill(disc);
            if (r > 2.5) {
                g.setColor(outline);
                g.draw(disc);
            }
        }
    }

    private static void drawAxes(Graphics2D g, double width, double height, double scale, int plotWidth,
            int plotHeight) {
        g.setFont(SMALL);
        FontMetrics fm = g.getFontMetrics();
        double tick = niceStep(width / 6);
        for (double x = 0; x <= width + 1e-9; x += tick) {
            int px = (int) Math.round(LEFT + x * scale);
            g.drawLine(px, TOP + plotHeight, px, TOP + plotHeight + 5);
            String label = format(x);
            g.drawString(label, px - fm.stringWidth(label) / 2, TOP + plotHeight + 19);
        }
        for (double y = 0; y <= height + 1e-9; y += niceStep(height / 4)) {
            int py = (int) Math.round(TOP + plotHeight - y * scale);
            g.drawLine(LEFT - 5, py, LEFT, py);
            String label = format(y);
            g.drawString(label, LEFT - 8 - fm.stringWidth(label), py + 4);
        }
        g.setFont(LABEL);
        String xLabel = "x (µm), along the gradient";
        g.drawString(xLabel, LEFT + (plotWidth - g.getFontMetrics().stringWidth(xLabel)) / 2, TOP + plotHeight + 42);
        Graphics2D rotated = (Graphics2D) g.create();
        rotated.rotate(-Math.PI / 2);
        rotated.drawString("y (µm)", -(TOP + plotHeight / 2 + 20), 22);
        rotated.dispose();
    }

    private static void drawLegend(Graphics2D g, List<String> fates, int[] counts, int x, int y, double fieldMax,
            int plotHeight, String fieldName) {
        g.setFont(LABEL);
        g.setColor(new Color(0x222222));
        g.drawString("fate (cells)", x, y + 12);
        int row = y + 24;
        for (int f = 0; f < fates.size(); f++) {
            g.setColor(FatePalette.fate(f, fates.size()));
            g.fill(new Ellipse2D.Double(x, row, 14, 14));
            g.setColor(new Color(0x222222));
            g.setFont(SMALL);
            g.drawString(fates.get(f) + " (" + counts[f] + ")", x + 22, row + 12);
            row += 22;
        }
        int barTop = row + 30;
        int barHeight = Math.max(60, Math.min(160, TOP + plotHeight - barTop));
        g.setFont(LABEL);
        g.drawString(fieldName + " (a.u.)", x, barTop - 10);
        for (int k = 0; k < barHeight; k++) {
            g.setColor(FatePalette.morphogen(1.0 - (double) k / (barHeight - 1)));
            g.fillRect(x, barTop + k, 18, 1);
        }
        g.setColor(new Color(0x333333));
        g.drawRect(x, barTop, 18, barHeight);
        g.setFont(SMALL);
        g.drawString(String.format(Locale.ROOT, "%.3g", fieldMax), x + 24, barTop + 10);
        g.drawString("0", x + 24, barTop + barHeight);
    }

    private static double niceStep(double raw) {
        double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
        double fraction = raw / magnitude;
        double nice = fraction < 1.5 ? 1 : fraction < 3.5 ? 2 : fraction < 7.5 ? 5 : 10;
        return nice * magnitude;
    }

    private static String format(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : String.format(Locale.ROOT, "%.1f", v);
    }
}
