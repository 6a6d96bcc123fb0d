package org.fatefield.viz.chart;

import java.awt.Color;
import java.awt.Font;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;

/** The project's chart look: white ground, light grid, readable fonts, unframed legend. */
public final class ChartStyle {

    /** Title font. */
    public static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 18);
    /** Axis-label and legend font. */
    public static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 14);
    /** Tick-label and annotation font. */
    public static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    /**
     * Colour of stable branches and attracting states: near-black, so that no branch is read as
     * a fate (fates take the Okabe-Ito hues and grey; see FatePalette).
     */
    public static final Color STABLE = new Color(0x1A1A1A);
    /** Colour of unstable branches and states (drawn dashed): a dark grey, distinct from fate grey. */
    public static final Color UNSTABLE = new Color(0x5A5A5A);
    /** Colour of marked special points (drawn as open diamonds). */
    public static final Color SPECIAL = new Color(0x111111);
    /** Fill of the bistable range of the control parameter. */
    public static final Color BISTABLE = new Color(0xEDE7F6);

    private ChartStyle() {
    }

    /** Wraps {@code plot} in a styled chart with {@code title}. */
    public static JFreeChart chart(String title, XYPlot plot, boolean legend) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xE0E0E0));
        plot.setRangeGridlinePaint(new Color(0xE0E0E0));
        plot.setOutlineVisible(false);
        for (int i = 0; i < plot.getDomainAxisCount(); i++) {
            style(plot.getDomainAxis(i));
        }
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            style(plot.getRangeAxis(i));
        }
        JFreeChart chart = new JFreeChart(null, TITLE, plot, legend);
        chart.setTitle(new TextTitle(title, TITLE));
        chart.setBackgroundPaint(Color.WHITE);
        if (legend) {
            chart.getLegend().setItemFont(LABEL);
            chart.getLegend().setFrame(BlockBorder.NONE);
        }
        return chart;
    }

    /** Fonts, and at most {@link ModerateTickUnits#MAX_INTERVALS} tick intervals on a number axis. */
    public static void style(ValueAxis axis) {
        if (axis != null) {
            axis.setLabelFont(LABEL);
            axis.setTickLabelFont(SMALL);
            if (axis instanceof NumberAxis number) {
                ModerateTickUnits.apply(number);
            }
        }
    }
}
