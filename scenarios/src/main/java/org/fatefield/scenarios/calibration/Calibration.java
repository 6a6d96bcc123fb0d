package org.fatefield.scenarios.calibration;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;
import org.fatefield.circuits.inference.AbcModel;
import org.fatefield.circuits.inference.AbcSmc;
import org.fatefield.circuits.inference.Generation;
import org.fatefield.circuits.inference.ScaledDistance;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.Provenance;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.viz.chart.FigureFormat;

/**
 * Runs a calibration into its folder and resumes it. A new folder gets the calibration and data
 * files and {@code calibration.json} (the checksum of every input, and whether it finished); a
 * folder holding the same inputs is resumed by replaying the calibration, which reads every
 * finished tissue back from {@code rounds/} and simulates only what is missing; a folder holding
 * other inputs or other files is refused, never overwritten.
 */
public final class Calibration {

    /** The folder's marker and state file. */
    public static final String STATE = "calibration.json";

    private Calibration() {
    }

    /** What came out. */
    public record Outcome(AbcSmc.Result result, boolean resumed, long failedTissues) {
    }

    /**
     * Runs (or resumes) {@code definition} into {@code out}, computing rounds with {@code backend}
     * and reporting to {@code log}.
     */
    public static Outcome run(CalibrationDefinition definition, Path out, RoundBackend backend, PrintStream log,
            FigureFormat figures) throws IOException {
        String inputs = checksum(definition);
        boolean resumed = prepare(definition, out, inputs);
        if (resumed) {
            log.println("Resuming the calibration in " + out + ": finished tissues are read back, missing ones run");
        }
        RunFolder folder = RunFolder.open(out);
        List<AbcModel> models = definition.models().stream().map(CalibrationModel::abc).toList();
        List<Observation> observations = definition.data().observations();
        ScaledDistance distance = new ScaledDistance(observations.stream().mapToDouble(Observation::value).toArray(),
                observations.stream().mapToDouble(Observation::sd).toArray());
        TissueBatchSimulator simulator = new TissueBatchSimulator(out, definition.models(), observations,
                definition.replicates(), backend);
        AbcSmc.Result result;
        try {
            result = smc(definition, models, distance, simulator, folder, log);
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        }
        CalibrationTables.writePopulation(folder, "posterior.csv", result.last(), definition.models());
        PredictiveCheck.run(definition, result.last(), simulator, folder, figures);
        CalibrationFigures.write(definition, result.last(), folder, figures);
        JsonObject summary = CalibrationTables.summary(result, definition.models(), simulator.failed());
        folder.writeText("summary.json", w -> w.write(JsonFiles.text(summary)));
        folder.writeText(STATE, w -> w.write(JsonFiles.text(state(inputs, true))));
        return new Outcome(result, resumed, simulator.failed());
    }

    private static AbcSmc.Result smc(CalibrationDefinition definition, List<AbcModel> models, ScaledDistance distance,
            TissueBatchSimulator simulator, RunFolder folder, PrintStream log) throws IOException {
        List<Generation> done = new ArrayList<>();
        return new AbcSmc(models, distance, definition.settings(), simulator).run(new AbcSmc.Listener() {
            @Override
            public void round(int generation, int round, int size, double tolerance) {
                log.printf(Locale.ROOT, "generation %d, round %d: %d candidate%s at tolerance %s%n", generation,
                        round + 1, size, size == 1 ? "" : "s", Double.isInfinite(tolerance) ? "none (the prior)"
                                : String.format(Locale.ROOT, "%.4g", tolerance));
                log.flush();
            }

            @Override
            public void generation(Generation g) {
                done.add(g);
                try {
                    CalibrationTables.writePopulation(folder, CalibrationTables.populationFile(g.index()), g,
                            definition.models());
                    CalibrationTables.writeGenerations(folder, done, definition.models());
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
                log.printf(Locale.ROOT, "generation %d done: tolerance %s, acceptance %.3g, effective sample size %s%n",
                        g.index(), Double.isInfinite(g.tolerance()) ? "none" : String.format(Locale.ROOT, "%.4g",
                                g.tolerance()), g.acceptanceRate(), ess(g));
                log.flush();
            }
        });
    }

    private static String ess(Generation g) {
        List<String> parts = new ArrayList<>();
        g.populations().forEach(p -> parts.add(String.format(Locale.ROOT, "%.0f", p.effectiveSampleSize())));
        return String.join(" / ", parts);
    }

    /** Makes or checks the folder; true if it is resumed. */
    private static boolean prepare(CalibrationDefinition definition, Path out, String inputs) throws IOException {
        Path state = out.resolve(STATE);
        if (Files.isRegularFile(state)) {
            JsonObject json;
            try {
                json = JsonFiles.read(state);
            } catch (IOException | RuntimeException e) {
                throw new IOException(state + " is not a calibration state file (" + e.getMessage() + "); choose"
                        + " another --out");
            }
            if (!json.has("inputs_sha256") || !inputs.equals(json.get("inputs_sha256").getAsString())) {
                throw new IOException("the calibration in " + out + " was made from other inputs (calibration, data or"
                        + " scenario files differ); choose another --out, or restore the inputs to resume it");
            }
            return true;
        }
        RunFolder.checkUsable(out, false, false);
        RunFolder folder = RunFolder.open(out);
        folder.writeText("inputs/calibration.toml", w -> w.write(definition.text()));
        folder.writeText("inputs/data.toml", w -> w.write(definition.data().text()));
        if (definition.data().profileText() != null) {
            folder.writeText("inputs/" + Path.of(definition.data().profileName()).getFileName(),
                    w -> w.write(definition.data().profileText()));
        }
        for (int m = 0; m < definition.models().size(); m++) {
            String prefix = "inputs/model-" + (m + 1) + "/";
            definition.models().get(m).base().copyInto("scenario.toml",
                    (name, text) -> folder.writeText(prefix + name, w -> w.write(text)));
        }
        folder.writeText(STATE, w -> w.write(JsonFiles.text(state(inputs, false))));
        return false;
    }

    private static JsonObject state(String inputs, boolean complete) {
        JsonObject json = new JsonObject();
        json.addProperty("inputs_sha256", inputs);
        json.addProperty("complete", complete);
        return json;
    }

    /** SHA-256 over the calibration file, the data (and profile) and every model's scenario and includes. */
    static String checksum(CalibrationDefinition d) {
        List<String> parts = new ArrayList<>(List.of(d.text(), d.data().text(),
                d.data().profileText() == null ? "" : d.data().profileText()));
        for (CalibrationModel m : d.models()) {
            parts.add(m.base().text());
            new TreeMap<>(m.base().includes()).forEach((name, text) -> {
                parts.add(name);
                parts.add(text);
            });
        }
        // Each part prefixed by its length, so that no two different lists of parts hash alike.
        StringBuilder all = new StringBuilder();
        parts.forEach(p -> all.append(p.length()).append(':').append(p));
        return Provenance.sha256(all.toString());
    }
}
