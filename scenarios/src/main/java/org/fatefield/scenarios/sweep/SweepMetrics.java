package org.fatefield.scenarios.sweep;

import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import java.util.List;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.output.RunMetrics;

/**
 * The metrics a sweep collects from each run: {@code population}, {@code fraction_<fate>},
 * {@code boundary_<fate>_um}, {@code width_<fate>_um}, {@code committed_boundary_um},
 * {@code mixed_zone_width_um}, {@code predicted_boundary_um} (the last critical crossing) and
 * {@code sister_agreement}; undefined values are left out. Beside them, {@link #profile} keeps the
 * fate profile itself, for calibration against a measured profile.
 */
final class SweepMetrics {

    private SweepMetrics() {
    }

    static JsonObject of(Tissue tissue, RunMetrics metrics) {
        JsonObject out = new JsonObject();
        TimeSeries.Row last = tissue.series().last();
        List<String> fates = tissue.series().fateNames();
        out.addProperty("population", last.population());
        for (int f = 0; f < fates.size(); f++) {
            out.addProperty("fraction_" + fates.get(f), last.fraction(f));
            put(out, "boundary_" + fates.get(f) + "_um", metrics.profile().boundary(f));
            put(out, "width_" + fates.get(f) + "_um", metrics.profile().width(f));
        }
        put(out, "committed_boundary_um", metrics.mixed().committedBoundary());
        put(out, "mixed_zone_width_um", metrics.mixed().end() - metrics.mixed().start());
        double[] predicted = metrics.predicted().positions();
        if (predicted.length > 0) {
            put(out, "predicted_boundary_um", predicted[predicted.length - 1]);
        }
        put(out, "sister_agreement", metrics.lineage().sisterAgreement());
        return out;
    }

    /** The fate profile: bin centres {@code x_um} and one fraction array per fate ({@code NaN} bins as null). */
    static JsonObject profile(Tissue tissue, RunMetrics metrics) {
        JsonObject out = new JsonObject();
        out.add("x_um", array(metrics.profile().centres()));
        List<String> fates = tissue.series().fateNames();
        for (int f = 0; f < fates.size(); f++) {
            out.add("fraction_" + fates.get(f), array(metrics.profile().fractions()[f]));
        }
        return out;
    }

    private static JsonArray array(double[] values) {
        JsonArray a = new JsonArray();
        for (double v : values) {
            if (Double.isFinite(v)) {
                a.add(v);
            } else {
                a.add(JsonNull.INSTANCE);
            }
        }
        return a;
    }

    private static void put(JsonObject out, String name, double value) {
        if (Double.isFinite(value)) {
            out.addProperty(name, value);
        }
    }
}
