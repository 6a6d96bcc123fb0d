package org.fatefield.viz.chart;

import java.awt.Color;
import java.awt.Font;
import org.jfree.chart.JFreeChart;
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
    /** Colour of stable branches and attracting states. */
    public static final Color STABLE = new Color(0x1F4E79);
    /** Colour of unstable branches and states. */
    public static final Color UNSTABLE = new Color(0xA23B2A);
    /** Colour of marked special points. */
    public static final Color SPECIAL = new Color(0x111111);

    private ChartStyle() {
    }

    /** Wraps {@code plot} in a styled chart with {@code title}. */
    public static JFreeChart chart(String title, XYPlot plot, boolean legend) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xE0E0E0));
        plot.setRangeGridlinePaint(new Color(0xE0E0E0));
        plot.setOutlineVisible(false);
        style(plot.getDomainAxis());
        style(plot.getRangeAxis());
        JFreeChart chart = new JFreeChart(null, TITLE, plot, legend);
        chart.setTitle(new TextTitle(title, TITLE));
        chart.setBackgroundPaint(Color.WHITE);
        if (legend) {
            chart.getLegend().setItemFont(LABEL);
            chart.getLegend().setFrame(BlockBorder.NONE);
        }
        return chart;
    }

    private static void style(ValueAxis axis) {
        if (axis != null) {
            axis.setLabelFont(LABEL);
            axis.setTickLabelFont(SMALL);
        }
    }
}
