package org.fatefield.viz.live;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import org.fatefield.engine.cell.Cell;
import org.fatefield.viz.tissue.DepthSlice;
import sim.portrayal.DrawInfo2D;
import sim.portrayal.SimplePortrayal2D;

/** Draws one cell as a disc of its radius, coloured by the window's current colour mode; the selected cell is ringed. */
final class CellPortrayal extends SimplePortrayal2D {

    private static final long serialVersionUID = 1L;
    private static final Color OUTLINE = new Color(0, 0, 0, 90);
    private static final Color SELECTED = new Color(0x111111);

    private final TissueGui gui;

    CellPortrayal(TissueGui gui) {
        this.gui = gui;
    }

    @Override
    public void draw(Object object, Graphics2D g, DrawInfo2D info) {
        Cell cell = (Cell) object;
        double r = DepthSlice.drawnRadius(gui.tissue(), cell, gui.slicePlane());
        double w = 2 * r * info.draw.width;
        double h = 2 * r * info.draw.height;
        Ellipse2D disc = new Ellipse2D.Double(info.draw.x - w / 2, info.draw.y - h / 2, w, h);
        g.setColor(gui.colourOf(cell));
        g.fill(disc);
        if (w > 4) {
            g.setColor(OUTLINE);
            g.draw(disc);
        }
        if (cell.id() == gui.selectedId()) {
            // A white ring inside a black one, a few pixels out: visible on every fill and field colour.
            double pad = Math.max(5, 0.5 * w);
            Ellipse2D ring = new Ellipse2D.Double(disc.getX() - pad, disc.getY() - pad, w + 2 * pad, h + 2 * pad);
            Stroke before = g.getStroke();
            g.setStroke(new BasicStroke(4f));
            g.setColor(Color.WHITE);
            g.draw(ring);
            g.setStroke(new BasicStroke(2f));
            g.setColor(SELECTED);
            g.draw(ring);
            g.setStroke(before);
        }
    }

    @Override
    public boolean hitObject(Object object, DrawInfo2D range) {
        Cell cell = (Cell) object;
        double r = DepthSlice.drawnRadius(gui.tissue(), cell, gui.slicePlane());
        double w = 2 * r * range.draw.width;
        double h = 2 * r * range.draw.height;
        return new Ellipse2D.Double(range.draw.x - w / 2, range.draw.y - h / 2, w, h).intersects(range.clip);
    }
}
