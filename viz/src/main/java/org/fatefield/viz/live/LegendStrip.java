package org.fatefield.viz.live;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Graphics;
import java.awt.RenderingHints;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;
import java.util.function.DoubleSupplier;
import javax.swing.JComponent;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.viz.palette.FatePalette;
import org.fatefield.viz.palette.SpeciesPalette;

/**
 * The strip under the live tissue: a legend that follows the colour mode (fate swatches with
 * counts; the commitment ramp; clone colours; a colour bar with its unit for a species level) on
 * the first row; the morphogen's colour bar (when the field is shown) and a scale bar in µm at the
 * current zoom on the second.
 */
final class LegendStrip extends JComponent {

    private static final long serialVersionUID = 1L;
    private static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    private static final int BAR_WIDTH = 140;
    private static final int BAR_HEIGHT = 12;

    private final transient TissueGuiSource source;
    private final transient DoubleSupplier pixelsPerMicron;
    private final transient java.util.function.BooleanSupplier fieldShown;

    /** Where the strip reads the current view from (the window replaces its view on reset). */
    interface TissueGuiSource {
        TissueGui gui();
    }

    LegendStrip(TissueGuiSource source, DoubleSupplier pixelsPerMicron, java.util.function.BooleanSupplier fieldShown) {
        this.source = source;
        this.pixelsPerMicron = pixelsPerMicron;
        this.fieldShown = fieldShown;
        setPreferredSize(new Dimension(600, 78));
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        TissueGui gui = source.gui();
        if (gui == null) {
            return;
        }
        Graphics2D g = (Graphics2D) graphics.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setFont(FONT);
        g.setColor(getBackground());
        g.fillRect(0, 0, getWidth(), getHeight());
        int x = 8;
        int y = 14;
        Tissue t = gui.tissue();
        List<String> fates = t.spec().fates().fateNames();
        switch (gui.mode()) {
            case FATE -> x = fateSwatches(g, x, y, t, fates);
            case COMMITMENT -> {
                x = fateSwatches(g, x, y, t, fates);
                int fate = 0;
                x = bar(g, x, y, v -> FatePalette.held(fate, fates.size(), v), "0 h",
                        number(t.spec().growth().cycle().mean()) + " h", "time in fate (to one mean cycle)");
            }
            case CLONE -> {
                for (int k = 0; k < Math.min(6, SpeciesPalette.cloneColours()); k++) {
                    g.setColor(SpeciesPalette.clone(k));
                    g.fillOval(x, y - 10, 12, 12);
                    x += 15;
                }
                x = text(g, x + 4, y, "clones: the descendants of one founder share a colour ("
                        + SpeciesPalette.cloneColours() + " colours, repeating)") + 16;
            }
            case SPECIES -> {
                int s = gui.species();
                String name = t.spec().circuit().network().speciesNames().get(s);
                x = bar(g, x, y, v -> SpeciesPalette.level(s, v), "0", number(gui.speciesMax()),
                        name + " (concentration, circuit units)");
            }
            default -> throw new IllegalStateException("unknown colour mode " + gui.mode());
        }
        x = 8;
        y = 50;
        if (fieldShown.getAsBoolean()) {
            boolean none = gui.fieldMax() <= 1e-12;
            x = bar(g, x, y, FatePalette::morphogen, "0", none ? "0" : number(gui.fieldMax()),
                    none ? "morphogen (none yet; concentration, arbitrary units)"
                            : "morphogen (concentration, arbitrary units)");
        }
        scaleBar(g, Math.max(x, getWidth() - 190), y, t.spec().width());
        g.dispose();
    }

    private static int fateSwatches(Graphics2D g, int x0, int y, Tissue t, List<String> fates) {
        int[] counts = new int[fates.size()];
        for (Cell c : t.cells()) {
            counts[Math.max(0, c.fate())]++;
        }
        int x = x0;
        for (int f = 0; f < fates.size(); f++) {
            g.setColor(FatePalette.fate(f, fates.size()));
            g.fillOval(x, y - 10, 12, 12);
            g.setColor(new Color(0, 0, 0, 90));
            g.drawOval(x, y - 10, 12, 12);
            x = text(g, x + 16, y, fates.get(f) + " (" + counts[f] + ")") + 14;
        }
        return x;
    }

    /** A horizontal colour bar with its end labels under it and its title to the right. */
    private static int bar(Graphics2D g, int x, int y, DoubleFunction<Color> colour, String low, String high,
            String title) {
        for (int i = 0; i < BAR_WIDTH; i++) {
            g.setColor(colour.apply(i / (double) (BAR_WIDTH - 1)));
            g.fillRect(x + i, y - 10, 1, BAR_HEIGHT);
        }
        g.setColor(Color.GRAY);
        g.drawRect(x, y - 10, BAR_WIDTH, BAR_HEIGHT);
        FontMetrics m = g.getFontMetrics();
        g.setColor(Color.DARK_GRAY);
        g.drawString(low, x, y + 16);
        g.drawString(high, x + BAR_WIDTH - m.stringWidth(high), y + 16);
        return text(g, x + BAR_WIDTH + 6, y, title) + 18;
    }

    /** A bar of a round length in µm (about 120 screen pixels at the current zoom). */
    private void scaleBar(Graphics2D g, int x, int y, double tissueWidth) {
        double perMicron = pixelsPerMicron.getAsDouble();
        if (!(perMicron > 0)) {
            return;
        }
        double length = roundLength(120 / perMicron);
        int pixels = (int) Math.round(length * perMicron);
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(3f));
        g.drawLine(x, y, x + pixels, y);
        g.setStroke(new BasicStroke(1.5f));
        g.drawLine(x, y - 5, x, y + 5);
        g.drawLine(x + pixels, y - 5, x + pixels, y + 5);
        g.drawString(number(length) + " µm", x, y + 18);
    }

    /** 1, 2 or 5 times a power of ten, at most {@code limit}. */
    static double roundLength(double limit) {
        double power = Math.pow(10, Math.floor(Math.log10(limit)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * power <= limit) {
                return m * power;
            }
        }
        return power;
    }

    private static int text(Graphics2D g, int x, int y, String s) {
        g.setColor(Color.BLACK);
        g.drawString(s, x, y);
        return x + g.getFontMetrics().stringWidth(s);
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }
}
