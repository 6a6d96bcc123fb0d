package org.fatefield.scenarios.output;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.metrics.SampleSummary;

/**
 * The boundaries of a set of replicate tissues, read from each run's {@code metrics.json}, and
 * their spread: {@code replicates.csv} (one row per tissue) and {@code replicates.json} (mean
 * and SD across tissues, the simulated positional error, beside the positional error the
 * gradient's amplitude variability predicts and the fate-call prediction).
 */
public final class ReplicateSet {

    private final List<String> fates;
    private final List<Long> seeds = new ArrayList<>();
    private final List<double[]> boundaries = new ArrayList<>();
    private final List<double[]> widths = new ArrayList<>();
    private final List<Double> committed = new ArrayList<>();
    private final List<double[]> committedPredictions = new ArrayList<>();
    private final List<double[]> fateCalls = new ArrayList<>();
    private final List<double[]> fateCallErrors = new ArrayList<>();

    /** An empty set for a scenario with {@code fates}, the default last. */
    public ReplicateSet(List<String> fates) {
        this.fates = List.copyOf(fates);
    }

    /** Adds the tissue run on {@code seed} whose metrics are {@code metrics}. */
    public void add(long seed, JsonObject metrics) {
        seeds.add(seed);
        double[] b = new double[fates.size()];
        double[] w = new double[fates.size()];
        double[] calls = new double[fates.size()];
        double[] errors = new double[fates.size()];
        JsonObject all = metrics.getAsJsonObject("boundaries");
        for (int f = 0; f < fates.size(); f++) {
            JsonObject one = all.getAsJsonObject(fates.get(f));
            b[f] = number(one, "position_um");
            w[f] = number(one, "width_10_90_um");
            calls[f] = Double.NaN;
            errors[f] = Double.NaN;
        }
        double simulatedCommitted = number(metrics, "committed_boundary_um");
        // For the committed boundary: the fate-call entry nearest to it, with its error.
        double[] nearest = {Double.NaN, Double.NaN, Double.NaN};
        JsonElement list = metrics.get("predicted_fate_call_boundaries");
        if (list != null && list.isJsonArray()) {
            for (JsonElement e : list.getAsJsonArray()) {
                JsonObject call = e.getAsJsonObject();
                int f = fates.indexOf(call.get("fate").getAsString());
                double x = number(call, "position_um");
                if (f >= 0 && Double.isNaN(calls[f]) && Double.isFinite(x)) {
                    calls[f] = x;
                    errors[f] = number(call, "predicted_positional_error_um");
                }
                if (Double.isFinite(x) && (Double.isNaN(nearest[0])
                        || Math.abs(x - simulatedCommitted) < Math.abs(nearest[0] - simulatedCommitted))) {
                    nearest[0] = x;
                    nearest[1] = number(call, "predicted_positional_error_um");
                }
            }
        }
        JsonElement single = metrics.get("predicted_profile");
        if (single != null && single.isJsonObject()) {
            nearest[2] = number(single.getAsJsonObject(), "committed_boundary_um");
        }
        boundaries.add(b);
        widths.add(w);
        committed.add(simulatedCommitted);
        committedPredictions.add(nearest);
        fateCalls.add(calls);
        fateCallErrors.add(errors);
    }

    /** Number of tissues added. */
    public int size() {
        return seeds.size();
    }

    /** Writes {@code replicates.csv} and {@code replicates.json} into {@code folder}. */
    public void write(RunFolder folder) throws IOException {
        folder.writeText(RunLayout.REPLICATES_TABLE, w -> {
            CSVPrinter printer = RunTables.printer(w);
            List<String> header = new ArrayList<>(List.of("seed"));
            header.addAll(MetricRows.COLUMNS);
            printer.printRecord(header);
            for (int r = 0; r < seeds.size(); r++) {
                String seed = Long.toString(seeds.get(r));
                for (int f = 0; f < fates.size(); f++) {
                    printer.printRecord(seed, "boundary_um", fates.get(f), RunTables.number(boundaries.get(r)[f]));
                    printer.printRecord(seed, "width_um", fates.get(f), RunTables.number(widths.get(r)[f]));
                }
                printer.printRecord(seed, "committed_boundary_um", "", RunTables.number(committed.get(r)));
            }
            printer.flush();
        });
        folder.writeText(RunLayout.REPLICATES_SUMMARY, w -> w.write(JsonFiles.text(summary())));
    }

    /** The summary written to {@code replicates.json}. */
    public JsonObject summary() {
        JsonObject summary = new JsonObject();
        summary.addProperty("runs", seeds.size());
        summary.addProperty("first_seed", seeds.isEmpty() ? null : seeds.get(0));
        for (int f = 0; f < fates.size(); f++) {
            int k = f;
            SampleSummary stats = SampleSummary.of(column(boundaries, k));
            JsonObject fate = new JsonObject();
            fate.addProperty("runs_with_boundary", stats.count());
            fate.addProperty("mean_boundary_um", JsonFiles.finite(stats.mean()));
            fate.addProperty("positional_error_sd_um", JsonFiles.finite(stats.sd()));
            SampleSummary call = SampleSummary.of(column(fateCalls, k));
            fate.addProperty("mean_predicted_fate_call_um", JsonFiles.finite(call.mean()));
            fate.addProperty("predicted_positional_error_um",
                    JsonFiles.finite(SampleSummary.of(column(fateCallErrors, k)).mean()));
            summary.add(fates.get(f), fate);
        }
        SampleSummary stats = SampleSummary.of(committed.stream().mapToDouble(Double::doubleValue).toArray());
        JsonObject c = new JsonObject();
        c.addProperty("runs_with_boundary", stats.count());
        c.addProperty("mean_boundary_um", JsonFiles.finite(stats.mean()));
        c.addProperty("positional_error_sd_um", JsonFiles.finite(stats.sd()));
        c.addProperty("mean_predicted_fate_call_um", JsonFiles.finite(SampleSummary.of(column(committedPredictions, 0))
                .mean()));
        c.addProperty("predicted_positional_error_um",
                JsonFiles.finite(SampleSummary.of(column(committedPredictions, 1)).mean()));
        c.addProperty("mean_predicted_from_single_cells_um",
                JsonFiles.finite(SampleSummary.of(column(committedPredictions, 2)).mean()));
        summary.add("committed_boundary", c);
        return summary;
    }

    private static double[] column(List<double[]> rows, int f) {
        return rows.stream().mapToDouble(r -> r[f]).toArray();
    }

    private static double number(JsonObject object, String key) {
        JsonElement e = object == null ? null : object.get(key);
        return e == null || e.isJsonNull() ? Double.NaN : e.getAsDouble();
    }
}
