package org.fatefield.scenarios.sweep;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Overrides;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.Progress;
import org.fatefield.scenarios.output.RunMetrics;

/**
 * Runs the missing runs of a planned sweep. Each finished run's metrics go to
 * {@code results/<id>.json}, written to a temporary name and renamed, so a sweep killed at any
 * moment keeps every finished result and nothing half-written; started again, it skips valid
 * results and reruns missing, truncated or corrupt ones. A run that fails is recorded in
 * {@code results/<id>.failed.json} with its error, and the others go on. Progress shows as a bar
 * with ETA on a terminal and as plain log lines otherwise (cluster logs).
 */
public final class SweepRunner {

    /** Base scenario file inside a sweep folder. */
    public static final String BASE = "base-scenario.toml";
    /** Result folder inside a sweep folder. */
    public static final String RESULTS = "results";

    private final Path folder;
    private final Manifest manifest;
    private final String baseText;

    /** A runner for the planned sweep in {@code folder}. */
    public SweepRunner(Path folder) throws IOException {
        this.folder = folder;
        this.manifest = Manifest.read(folder);
        this.baseText = Files.readString(folder.resolve(BASE), StandardCharsets.UTF_8);
    }

    /** The manifest. */
    public Manifest manifest() {
        return manifest;
    }

    /** Counts of a pass over the runs. */
    public record Outcome(int skipped, int finished, int failed) {
    }

    /**
     * Runs the runs of {@code runs} that have no valid result, on {@code workers} threads,
     * reporting progress to {@code log}.
     */
    public Outcome run(List<Manifest.Run> runs, int workers, PrintStream log) throws IOException {
        return run(runs, workers, log, "sweep");
    }

    /** As {@link #run(List, int, PrintStream)}, with progress lines and bar named {@code label}. */
    public Outcome run(List<Manifest.Run> runs, int workers, PrintStream log, String label) throws IOException {
        Files.createDirectories(folder.resolve(RESULTS));
        List<Manifest.Run> todo = new ArrayList<>();
        for (Manifest.Run run : runs) {
            if (!valid(run)) {
                todo.add(run);
            }
        }
        AtomicInteger done = new AtomicInteger();
        AtomicInteger failed = new AtomicInteger();
        long start = System.nanoTime();
        boolean terminal = System.console() != null;
        Progress bar = terminal
                ? Progress.forConsole(label, todo.size(), log)
                : Progress.silent();
        ExecutorService executor = Executors.newFixedThreadPool(Math.max(1, workers));
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (Manifest.Run run : todo) {
                futures.add(executor.submit(() -> {
                    boolean ok = runOne(run);
                    if (!ok) {
                        failed.incrementAndGet();
                    }
                    int n = done.incrementAndGet();
                    double elapsed = (System.nanoTime() - start) / 1e9;
                    double eta = elapsed / n * (todo.size() - n);
                    synchronized (log) {
                        if (terminal) {
                            bar.update(n, todo.size());
                        } else {
                            log.printf(Locale.ROOT, "%s: %d/%d runs done (%s %s), %.0f s elapsed, about %.0f s left%n",
                                    label, n, todo.size(), run.id(), ok ? "ok" : "FAILED", elapsed, eta);
                            log.flush();
                        }
                    }
                    return null;
                }));
            }
            for (Future<?> future : futures) {
                future.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        } catch (ExecutionException e) {
            throw new IOException("a run crashed the sweep runner: " + e.getCause(), e.getCause());
        } finally {
            executor.shutdownNow();
            bar.close();
        }
        return new Outcome(runs.size() - todo.size(), todo.size() - failed.get(), failed.get());
    }

    /** True if the run has a complete, parseable result for this very run. */
    public boolean valid(Manifest.Run run) {
        Path file = resultFile(run);
        if (!Files.exists(file)) {
            return false;
        }
        try {
            JsonObject json = JsonFiles.read(file);
            return json.has("complete") && json.get("complete").getAsBoolean()
                    && run.id().equals(json.get("run_id").getAsString()) && json.has("metrics")
                    && json.get("seed").getAsLong() == run.seed();
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    /**
     * The scenario of {@code run}: the sweep's base scenario with the run's values of the varied
     * keys as overrides.
     *
     * @throws org.fatefield.scenarios.format.ScenarioException if the values do not make a valid scenario
     */
    public Scenario scenarioOf(Manifest.Run run) throws org.fatefield.scenarios.format.ScenarioException {
        Overrides variant = Overrides.none();
        for (int k = 0; k < manifest.keys().size(); k++) {
            variant = variant.with(manifest.keys().get(k), run.values()[k]);
        }
        return ScenarioReader.parse(run.id(), run.id(), baseText.getBytes(StandardCharsets.UTF_8),
                folder.toAbsolutePath(), variant);
    }

    /** Where the run's result lives. */
    public Path resultFile(Manifest.Run run) {
        return folder.resolve(RESULTS).resolve(run.id() + ".json");
    }

    private boolean runOne(Manifest.Run run) {
        JsonObject result = new JsonObject();
        result.addProperty("run_id", run.id());
        result.addProperty("seed", run.seed());
        try {
            Scenario scenario = scenarioOf(run);
            Tissue tissue = new Tissue(scenario.tissue(), run.seed(), 1);
            tissue.start();
            tissue.runToEnd();
            tissue.finish();
            RunMetrics metrics = RunMetrics.pattern(tissue);
            result.add("metrics", SweepMetrics.of(tissue, metrics));
            result.add("profile", SweepMetrics.profile(tissue, metrics));
            result.addProperty("complete", true);
            Files.deleteIfExists(folder.resolve(RESULTS).resolve(run.id() + ".failed.json"));
            write(resultFile(run), result);
            return true;
        } catch (Exception e) {
            result.addProperty("error", e.getClass().getSimpleName() + ": " + e.getMessage());
            try {
                write(folder.resolve(RESULTS).resolve(run.id() + ".failed.json"), result);
            } catch (IOException ignored) {
                // The failure still counts; the missing file will show the run as missing.
                return false;
            }
            return false;
        }
    }

    private static void write(Path target, JsonObject json) throws IOException {
        Path temporary = target.resolveSibling("." + target.getFileName() + ".partial");
        Files.writeString(temporary, JsonFiles.text(json), StandardCharsets.UTF_8);
        Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }
}
