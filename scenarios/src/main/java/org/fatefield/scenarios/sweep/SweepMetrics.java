package org.fatefield.scenarios.sweep;

import com.google.gson.JsonObject;
import java.util.List;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.output.RunMetrics;

/**
 * The metrics a sweep collects from each run: {@code population}, {@code fraction_<fate>},
 * {@code boundary_<fate>_um}, {@code width_<fate>_um}, {@code predicted_boundary_um} (the last
 * critical crossing) and {@code sister_agreement}; undefined values are left out.
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
        double[] predicted = metrics.predicted().positions();
        if (predicted.length > 0) {
            put(out, "predicted_boundary_um", predicted[predicted.length - 1]);
        }
        put(out, "sister_agreement", metrics.lineage().sisterAgreement());
        return out;
    }

    private static void put(JsonObject out, String name, double value) {
        if (Double.isFinite(value)) {
            out.addProperty(name, value);
        }
    }
}
