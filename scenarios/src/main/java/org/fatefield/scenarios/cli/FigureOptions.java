package org.fatefield.scenarios.cli;

import org.fatefield.viz.chart.FigureFormat;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code --dpi N} and {@code --figure-size WxH}: the resolution of every PNG a command writes
 * (kept in the file's metadata) and the layout size of its figures; SVGs take the same size.
 */
final class FigureOptions {

    @Spec(Spec.Target.MIXEE)
    private CommandSpec spec;

    private int dpi = FigureFormat.LAYOUT_DPI;
    private int[] size = {0, 0};

    @Option(names = "--dpi", paramLabel = "N", description = "resolution of the PNG figures in dots per inch, from "
            + FigureFormat.MIN_DPI + " to " + FigureFormat.MAX_DPI + " (default: 96, screen size; 300 for print)")
    void setDpi(int value) {
        if (value < FigureFormat.MIN_DPI || value > FigureFormat.MAX_DPI) {
            throw new ParameterException(spec.commandLine(), "--dpi must be from " + FigureFormat.MIN_DPI + " to "
                    + FigureFormat.MAX_DPI + ", got " + value);
        }
        this.dpi = value;
    }

    @Option(names = "--figure-size", paramLabel = "WxH", description = "layout size of every figure in CSS pixels"
            + " (96 per inch), such as 1200x800 (default: each figure's own, about 960x640); text keeps its size,"
            + " so a larger figure has room for more")
    void setSize(String text) {
        try {
            int[] parsed = FigureFormat.parseSize(text);
            new FigureFormat(FigureFormat.LAYOUT_DPI, parsed[0], parsed[1]);
            this.size = parsed;
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--figure-size: " + e.getMessage());
        }
    }

    /** The format given. */
    FigureFormat format() {
        return new FigureFormat(dpi, size[0], size[1]);
    }
}
