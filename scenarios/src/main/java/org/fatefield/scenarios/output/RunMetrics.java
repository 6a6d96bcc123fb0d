package org.fatefield.scenarios.output;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.metrics.FateProfile;
import org.fatefield.engine.metrics.LineageStatistics;
import org.fatefield.engine.metrics.MixedZone;
import org.fatefield.engine.metrics.PredictedBoundary;
import org.fatefield.engine.metrics.SingleCellProfile;
import org.fatefield.engine.tissue.Tissue;

/**
 * The pattern and lineage metrics of a finished run: {@code profile.csv} (fate fractions along
 * the gradient axis), {@code relatedness.csv} (same-fate fraction against lineage distance),
 * {@code clones.csv} (fate composition per founder) and {@code metrics.json} (boundaries, widths,
 * the predicted boundary, sister agreement; the per-run summary replicates are pooled from).
 *
 * @param profile   fate fractions along x
 * @param lineage   lineage statistics
 * @param predicted boundary predicted from the single-cell analysis
 * @param mixed     committed-against-default boundary and the zone where committed fates mix
 * @param firstPassage time to first enter the timed fate, or null if no fate is timed
 * @param single       the noise-based fate profile predicted from single cells
 * @param amplitudes   the production factor this tissue drew for each field with amplitude
 *                     variability, by field name (empty without)
 */
public record RunMetrics(FateProfile profile, LineageStatistics lineage, PredictedBoundary predicted,
        MixedZone mixed, SingleCellProfile single, FirstPassageSummary firstPassage,
        Map<String, double[]> amplitudes) {

    /** Copies the factors. */
    public RunMetrics {
        amplitudes = Collections.unmodifiableMap(new LinkedHashMap<>(amplitudes));
    }


    /** Computes the metrics of {@code tissue} at its end. */
    public static RunMetrics of(Tissue tissue) {
        return of(tissue, true);
    }

    /**
     * The metrics of {@code tissue} without the single-cell prediction (which simulates many
     * lone cells for the whole run, and costs about twice the demo tissue): for sweeps and
     * calibrations, whose tables do not use it.
     */
    public static RunMetrics pattern(Tissue tissue) {
        return of(tissue, false);
    }

    private static RunMetrics of(Tissue tissue, boolean singleCell) {
        int fates = tissue.spec().fates().fateCount();
        FateProfile profile = FateProfile.of(tissue);
        Map<String, double[]> amplitudes = new LinkedHashMap<>();
        for (int f = 0; f < tissue.fields().size(); f++) {
            double cv = tissue.fields().get(f).spec().amplitudeCv();
            if (cv > 0) {
                amplitudes.put(tissue.fields().get(f).spec().name(), new double[] {cv, tissue.amplitudeFactor(f)});
            }
        }
        return new RunMetrics(profile, LineageStatistics.of(tissue.cells(), tissue.ancestry(), fates),
                PredictedBoundary.of(tissue.spec(), tissue.controlField()),
                MixedZone.of(tissue.cells(), fates, profile, tissue.spec().width()),
                singleCell ? SingleCellProfile.of(tissue.spec(), tissue.fields(), profile.centres(), tissue.seed(),
                        tissue.threads()) : SingleCellProfile.undefined("not computed for sweeps and calibrations"),
                null, amplitudes);
    }

    /** With the first-passage summary {@code value}. */
    public RunMetrics withFirstPassage(FirstPassageSummary value) {
        return new RunMetrics(profile, lineage, predicted, mixed, single, value, amplitudes);
    }

    /** Writes the three tables and the JSON summary into {@code folder}; returns their names. */
    public List<String> write(RunFolder folder, List<String> fateNames, long seed, String partition) throws IOException {
        folder.writeText(RunLayout.PROFILE, w -> {
            CSVPrinter printer = RunTables.printer(w);
            printer.printRecord("x_um", "fate", "cells", "fraction", "predicted_fraction");
            for (int b = 0; b < profile.centres().length; b++) {
                for (int f = 0; f < fateNames.size(); f++) {
                    double fraction = profile.fractions()[f][b];
                    long cells = Double.isNaN(fraction) ? 0 : Math.round(fraction * profile.counts()[b]);
                    printer.printRecord(RunTables.number(profile.centres()[b]), fateNames.get(f), Long.toString(cells),
                            RunTables.number(fraction),
                            single.defined() ? RunTables.number(single.fractions()[f][b]) : RunTables.MISSING);
                }
            }
            printer.flush();
        });
        folder.writeText(RunLayout.RELATEDNESS, w -> {
            CSVPrinter printer = RunTables.printer(w);
            printer.printRecord("lineage_distance_divisions", "pairs", "same_fate_fraction");
            for (Map.Entry<Integer, Long> e : lineage.pairs().entrySet()) {
                printer.printRecord(e.getKey(), e.getValue(), RunTables.number(lineage.sameFate().get(e.getKey())));
            }
            printer.flush();
        });
        folder.writeText(RunLayout.CLONES, w -> {
            CSVPrinter printer = RunTables.printer(w);
            printer.printRecord("founder_id", "fate", "cells");
            for (Map.Entry<Long, int[]> e : lineage.clones().entrySet()) {
                for (int f = 0; f < fateNames.size(); f++) {
                    printer.printRecord(Long.toString(e.getKey()), fateNames.get(f), Integer.toString(e.getValue()[f]));
                }
            }
            printer.flush();
        });
        folder.writeText(RunLayout.METRICS, w -> w.write(json(fateNames, seed, partition)));
        return List.of(RunLayout.PROFILE, RunLayout.RELATEDNESS, RunLayout.CLONES, RunLayout.METRICS);
    }

    /** The noise-based predicted profile's summary: its boundaries and its distance to the simulated profile. */
    private JsonObject singleCellJson(List<String> fateNames) {
        JsonObject out = new JsonObject();
        out.addProperty("undefined", single.defined() ? (String) null : single.undefined());
        if (!single.defined()) {
            return out;
        }
        out.addProperty("cells_per_position", single.cellsPerPosition());
        out.addProperty("committed_boundary_um", JsonFiles.finite(single.committedBoundary()));
        JsonObject fates = new JsonObject();
        for (int f = 0; f < fateNames.size(); f++) {
            JsonObject one = new JsonObject();
            one.addProperty("position_um", JsonFiles.finite(single.boundary(f)));
            one.addProperty("rms_difference_to_simulated", JsonFiles.finite(single.rmsDifference(profile, f)));
            fates.add(fateNames.get(f), one);
        }
        out.add("fates", fates);
        return out;
    }

    /** The summary as JSON. */
    public String json(List<String> fateNames, long seed, String partition) {
        JsonObject root = new JsonObject();
        root.addProperty("seed", seed);
        root.addProperty("partition", partition);
        JsonObject boundaries = new JsonObject();
        for (int f = 0; f < fateNames.size(); f++) {
            JsonObject b = new JsonObject();
            b.addProperty("position_um", JsonFiles.finite(profile.boundary(f)));
            b.addProperty("width_10_90_um", JsonFiles.finite(profile.width(f)));
            b.addProperty("crossings_of_one_half", profile.crossings(f, 0.5).length);
            boundaries.add(fateNames.get(f), b);
        }
        root.add("boundaries", boundaries);
        root.addProperty("committed_boundary_um", JsonFiles.finite(mixed.committedBoundary()));
        JsonObject zone = new JsonObject();
        zone.addProperty("start_um", JsonFiles.finite(mixed.start()));
        zone.addProperty("end_um", JsonFiles.finite(mixed.end()));
        zone.addProperty("committed_cells", mixed.committedInZone());
        JsonObject shares = new JsonObject();
        for (int f = 0; f + 1 < fateNames.size() && mixed.committedInZone() > 0; f++) {
            JsonObject share = new JsonObject();
            double[] ci = mixed.shareInterval(f);
            share.addProperty("share", mixed.share(f));
            share.addProperty("ci95_low", ci[0]);
            share.addProperty("ci95_high", ci[1]);
            shares.add(fateNames.get(f), share);
        }
        zone.add("shares", shares);
        root.add("mixed_zone", zone);
        JsonArray predicted = new JsonArray();
        for (int k = 0; k < this.predicted.criticalValues().length; k++) {
            JsonObject p = new JsonObject();
            p.addProperty("critical_control_value", this.predicted.criticalValues()[k]);
            p.addProperty("kind", this.predicted.kinds()[k]);
            p.addProperty("position_um", JsonFiles.finite(this.predicted.positions()[k]));
            p.addProperty("predicted_positional_error_um", JsonFiles.finite(this.predicted.positionErrors()[k]));
            predicted.add(p);
        }
        root.add("predicted_boundaries", predicted);
        JsonArray fateCalls = new JsonArray();
        for (int k = 0; k < this.predicted.fateCalls().size(); k++) {
            JsonObject p = new JsonObject();
            p.addProperty("fate", fateNames.get(this.predicted.fateCalls().get(k).fate()));
            p.addProperty("control_value", this.predicted.fateCalls().get(k).controlValue());
            p.addProperty("position_um", JsonFiles.finite(this.predicted.fateCallPositions()[k]));
            p.addProperty("predicted_positional_error_um",
                    JsonFiles.finite(this.predicted.fateCallPositionErrors()[k]));
            fateCalls.add(p);
        }
        root.add("predicted_fate_call_boundaries", fateCalls);
        root.add("predicted_profile", singleCellJson(fateNames));
        root.addProperty("predicted_boundaries_undefined", this.predicted.undefined().isEmpty() ? null
                : this.predicted.undefined());
        root.addProperty("sister_fate_agreement", JsonFiles.finite(lineage.sisterAgreement()));
        JsonObject related = new JsonObject();
        lineage.sameFate().forEach((d, v) -> related.addProperty(Integer.toString(d), JsonFiles.finite(v)));
        root.add("same_fate_by_lineage_distance", related);
        if (firstPassage != null) {
            root.add("first_passage", firstPassage.json());
        }
        JsonObject amplitude = new JsonObject();
        amplitudes.forEach((field, cvAndFactor) -> {
            JsonObject a = new JsonObject();
            a.addProperty("amplitude_cv", cvAndFactor[0]);
            a.addProperty("factor", cvAndFactor[1]);
            amplitude.add(field, a);
        });
        root.add("tissue_amplitude", amplitude);
        return JsonFiles.text(root);
    }

}
