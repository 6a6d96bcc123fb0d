package org.fatefield.scenarios.calibration;

import java.util.ArrayList;
import java.util.List;

/**
 * The summary statistics a calibration can compare with data, for a scenario's fates: the
 * per-run metrics of a sweep (averaged over a particle's replicate tissues) and, with two or more
 * replicates, the positional error of each boundary (its standard deviation across them).
 */
final class StatisticNames {

    private StatisticNames() {
    }

    /** Every statistic name available for {@code fates}, in a stable order. */
    static List<String> known(List<String> fates) {
        List<String> out = new ArrayList<>(List.of("population", "committed_boundary_um", "mixed_zone_width_um",
                "predicted_boundary_um", "sister_agreement", "positional_error_committed_um"));
        for (String f : fates) {
            out.add("fraction_" + f);
            out.add("boundary_" + f + "_um");
            out.add("width_" + f + "_um");
            out.add("positional_error_" + f + "_um");
        }
        return out;
    }

    /** True if {@code name} needs two or more replicate tissues per particle. */
    static boolean needsReplicates(String name) {
        return name.startsWith("positional_error_");
    }

    /** The unit a statistic is in, in words the file may use: "um", "cells" or "1" (a fraction). */
    static String unit(String name) {
        if (name.endsWith("_um")) {
            return "um";
        }
        return name.equals("population") ? "cells" : "1";
    }

    /** True if {@code written} (from a data file) names the same unit as {@code expected}. */
    static boolean unitMatches(String written, String expected) {
        String w = written.trim().toLowerCase(java.util.Locale.ROOT);
        return switch (expected) {
            case "um" -> List.of("um", "µm", "micrometre", "micrometer", "micron").contains(w);
            case "cells" -> List.of("cells", "cell", "count", "1").contains(w);
            default -> List.of("1", "", "fraction", "dimensionless").contains(w);
        };
    }
}
