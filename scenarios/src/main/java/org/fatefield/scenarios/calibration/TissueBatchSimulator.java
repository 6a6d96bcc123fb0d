package org.fatefield.scenarios.calibration;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.fatefield.circuits.inference.BatchSimulator;
import org.fatefield.circuits.inference.Candidate;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.sweep.Manifest;
import org.fatefield.scenarios.sweep.SweepRunner;

/**
 * Simulates ABC candidates as tissues. Each round becomes one planned sweep folder per model,
 * {@code rounds/g<generation>-r<round>-m<model>}, with the model's scenario and a manifest holding
 * every candidate's values and seeds (one run per replicate tissue); a {@link RoundBackend} runs
 * them, and the statistics are read back from the results. A folder planned before is reused
 * only if its manifest is exactly the one this round would write, so a replayed (resumed)
 * calibration reads every finished tissue from disk and computes only what is missing.
 */
public final class TissueBatchSimulator implements BatchSimulator {

    /** Folder of the round folders, inside a calibration folder. */
    public static final String ROUNDS = "rounds";

    private final Path rounds;
    private final List<CalibrationModel> models;
    private final List<Observation> observations;
    private final int replicates;
    private final RoundBackend backend;
    private long failed;

    /** Rounds under {@code calibrationFolder}, run by {@code backend}. */
    public TissueBatchSimulator(Path calibrationFolder, List<CalibrationModel> models, List<Observation> observations,
            int replicates, RoundBackend backend) {
        this.rounds = calibrationFolder.resolve(ROUNDS);
        this.models = List.copyOf(models);
        this.observations = List.copyOf(observations);
        this.replicates = replicates;
        this.backend = backend;
    }

    /** Candidates whose tissues failed or did not finish so far (counted as rejected). */
    public long failed() {
        return failed;
    }

    @Override
    public double[][] simulate(List<Candidate> batch) throws IOException {
        if (batch.isEmpty()) {
            return new double[0][];
        }
        Candidate first = batch.get(0);
        return simulate(String.format(Locale.ROOT, "g%02d-r%03d", first.generation(), first.round()), batch);
    }

    /** Simulates {@code batch} in round folders named {@code label-m<model>}. */
    public double[][] simulate(String label, List<Candidate> batch) throws IOException {
        List<Path> folders = new ArrayList<>();
        for (int m = 0; m < models.size(); m++) {
            List<Candidate> mine = of(batch, m);
            if (!mine.isEmpty()) {
                Path folder = rounds.resolve(label + "-m" + m);
                prepare(folder, models.get(m), mine);
                folders.add(folder);
            }
        }
        backend.run(folders, label);
        double[][] out = new double[batch.size()][];
        for (int i = 0; i < batch.size(); i++) {
            Candidate c = batch.get(i);
            Path results = rounds.resolve(label + "-m" + c.model()).resolve(SweepRunner.RESULTS);
            List<JsonObject> tissues = new ArrayList<>();
            for (int r = 0; r < replicates; r++) {
                Path file = results.resolve(runId(c, r) + ".json");
                JsonObject json = Files.exists(file) ? read(file) : null;
                if (json != null && json.has("complete") && json.get("complete").getAsBoolean()) {
                    tissues.add(json);
                }
            }
            if (tissues.size() == replicates) {
                out[i] = SimulatedStatistics.of(tissues, observations);
            } else {
                failed++;
            }
        }
        return out;
    }

    private static JsonObject read(Path file) {
        try {
            return JsonFiles.read(file);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    private static List<Candidate> of(List<Candidate> batch, int model) {
        return batch.stream().filter(c -> c.model() == model).toList();
    }

    private void prepare(Path folder, CalibrationModel model, List<Candidate> candidates) throws IOException {
        List<Manifest.Run> runs = new ArrayList<>();
        for (Candidate c : candidates) {
            for (int r = 0; r < replicates; r++) {
                runs.add(new Manifest.Run(runId(c, r), c.index(), r, replicateSeed(c.seed(), r), c.theta()));
            }
        }
        Manifest manifest = new Manifest(model.parameters().stream().map(CalibrationParameter::key).toList(), runs);
        StringWriter text = new StringWriter();
        manifest.write(text);
        Path file = folder.resolve(Manifest.NAME);
        if (Files.exists(file)) {
            if (!Files.readString(file, StandardCharsets.UTF_8).equals(text.toString())) {
                throw new IOException(folder + " was planned with other values than this calibration now proposes;"
                        + " the calibration folder belongs to other settings: start a new --out");
            }
            return;
        }
        RunFolder out = RunFolder.open(folder);
        model.base().copyInto(SweepRunner.BASE, (name, content) -> out.writeText(name, w -> w.write(content)));
        out.writeText(Manifest.NAME, w -> w.write(text.toString()));
    }

    private static String runId(Candidate c, int replicate) {
        return c.id() + "-t" + replicate;
    }

    /** The seed of replicate tissue {@code r} of a particle: its own seed for the first, derived ones after. */
    static long replicateSeed(long seed, int r) {
        return r == 0 ? seed : RandomStreams.of(seed).stream(r).nextLong() >>> 11;
    }
}
