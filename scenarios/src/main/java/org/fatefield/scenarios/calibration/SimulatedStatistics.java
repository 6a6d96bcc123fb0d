package org.fatefield.scenarios.calibration;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.util.List;

/**
 * The statistics of one particle from its replicate tissues' sweep results, in the order of the
 * observations: a run metric is the mean over the replicates (undefined if any replicate leaves
 * it undefined); {@code positional_error_<fate>_um} is the sample standard deviation of that
 * boundary across the replicates; a profile point is the mean simulated fraction at x, linearly
 * interpolated between the centres of the bins either side (undefined outside them or next to an
 * empty bin).
 */
final class SimulatedStatistics {

    private SimulatedStatistics() {
    }

    /** The statistics of the results (one per replicate, each with "metrics" and "profile"). */
    static double[] of(List<JsonObject> results, List<Observation> observations) {
        double[] out = new double[observations.size()];
        for (int i = 0; i < out.length; i++) {
            Observation o = observations.get(i);
            if (o.profilePoint()) {
                out[i] = mean(results, r -> profileAt(r.getAsJsonObject("profile"), o.fate(), o.x()));
            } else if (o.name().startsWith("positional_error_")) {
                String fate = o.name().substring("positional_error_".length(), o.name().length() - "_um".length());
                String metric = fate.equals("committed") ? "committed_boundary_um" : "boundary_" + fate + "_um";
                out[i] = sd(results, metric);
            } else {
                out[i] = mean(results, r -> metric(r, o.name()));
            }
        }
        return out;
    }

    private interface Extract {
        double of(JsonObject result);
    }

    private static double mean(List<JsonObject> results, Extract extract) {
        double sum = 0;
        for (JsonObject r : results) {
            double v = extract.of(r);
            if (!Double.isFinite(v)) {
                return Double.NaN;
            }
            sum += v;
        }
        return sum / results.size();
    }

    private static double sd(List<JsonObject> results, String metric) {
        if (results.size() < 2) {
            return Double.NaN;
        }
        double m = mean(results, r -> metric(r, metric));
        double ss = 0;
        for (JsonObject r : results) {
            double d = metric(r, metric) - m;
            ss += d * d;
        }
        return Math.sqrt(ss / (results.size() - 1));
    }

    private static double metric(JsonObject result, String name) {
        JsonObject metrics = result.getAsJsonObject("metrics");
        return metrics != null && metrics.has(name) ? metrics.get(name).getAsDouble() : Double.NaN;
    }

    /** The profile's fraction of {@code fate} at {@code x}, interpolated between bin centres. */
    static double profileAt(JsonObject profile, String fate, double x) {
        if (profile == null || !profile.has("fraction_" + fate)) {
            return Double.NaN;
        }
        JsonArray xs = profile.getAsJsonArray("x_um");
        JsonArray fs = profile.getAsJsonArray("fraction_" + fate);
        for (int b = 0; b + 1 < xs.size(); b++) {
            double x0 = xs.get(b).getAsDouble();
            double x1 = xs.get(b + 1).getAsDouble();
            if (x >= x0 && x <= x1) {
                double f0 = value(fs.get(b));
                double f1 = value(fs.get(b + 1));
                return f0 + (f1 - f0) * (x - x0) / (x1 - x0);
            }
        }
        return Double.NaN;
    }

    private static double value(JsonElement e) {
        return e == null || e.isJsonNull() ? Double.NaN : e.getAsDouble();
    }
}
