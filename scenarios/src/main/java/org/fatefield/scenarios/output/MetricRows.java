package org.fatefield.scenarios.output;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The long layout of per-run summary tables ({@code replicates.csv}, a sweep's {@code runs.csv}
 * and {@code summary.csv}, a calibration's {@code predictive.csv}): the columns that identify a
 * run come first, then {@code metric}, {@code fate} (empty when the metric is not one fate's)
 * and the value. A fate is thus a value in a column, never part of a column name, so a table
 * reads straight into R's or pandas' group-by.
 *
 * <p>Inside Fatefield (sweep results, calibration statistics) a per-fate metric has one compound
 * name, such as {@code boundary_<fate>_um}; {@link #split} and {@link #join} convert between the
 * two forms.
 */
public final class MetricRows {

    /** The columns after a table's identifying ones, in this order. */
    public static final List<String> COLUMNS = List.of("metric", "fate", "value");

    private static final Pattern BOUNDARY = Pattern.compile("boundary_(.+)_um");
    private static final Pattern WIDTH = Pattern.compile("width_(.+)_um");
    private static final Pattern FRACTION = Pattern.compile("fraction_(.+)");
    private static final Pattern POSITIONAL_ERROR = Pattern.compile("positional_error_(.+)_um");

    /** A metric of one run, {@code fate} empty when it is not one fate's. */
    public record Metric(String metric, String fate) {
    }

    private MetricRows() {
    }

    /**
     * Splits a compound metric name: {@code boundary_<fate>_um} is {@code (boundary_um, fate)},
     * likewise {@code width_<fate>_um}, {@code fraction_<fate>} and
     * {@code positional_error_<fate>_um}; any other name (such as {@code committed_boundary_um},
     * {@code positional_error_committed_um} or {@code population}) is itself with no fate.
     */
    public static Metric split(String name) {
        if (name.equals("positional_error_committed_um")) {
            return new Metric(name, "");
        }
        Matcher m = BOUNDARY.matcher(name);
        if (m.matches()) {
            return new Metric("boundary_um", m.group(1));
        }
        m = WIDTH.matcher(name);
        if (m.matches()) {
            return new Metric("width_um", m.group(1));
        }
        m = POSITIONAL_ERROR.matcher(name);
        if (m.matches()) {
            return new Metric("positional_error_um", m.group(1));
        }
        m = FRACTION.matcher(name);
        if (m.matches()) {
            return new Metric("fraction", m.group(1));
        }
        return new Metric(name, "");
    }

    /** The compound name of {@code metric} for {@code fate} (the inverse of {@link #split}). */
    public static String join(String metric, String fate) {
        if (fate.isEmpty()) {
            return metric;
        }
        return switch (metric) {
            case "fraction" -> "fraction_" + fate;
            case "boundary_um", "width_um", "positional_error_um" ->
                    metric.substring(0, metric.length() - "um".length()) + fate + "_um";
            default -> throw new IllegalArgumentException("metric " + metric + " is not a per-fate metric");
        };
    }

    /** The row tail of a value: {@code metric, fate, value} (the value empty when undefined). */
    public static List<String> tail(String compoundName, double value) {
        Metric m = split(compoundName);
        List<String> out = new ArrayList<>(3);
        out.add(m.metric());
        out.add(m.fate());
        out.add(RunTables.number(value));
        return out;
    }
}
