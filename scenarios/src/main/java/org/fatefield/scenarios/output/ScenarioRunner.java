package org.fatefield.scenarios.output;

import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueObserver;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.FateProportionChart;
import org.fatefield.viz.tissue.TissueRenderer;

/**
 * Runs a scenario to the end and writes its run folder: {@code timeseries.csv}, {@code population.csv},
 * {@code cells.csv}, {@code lineage.csv} (streamed during the run), {@code lineage.nwk}, the
 * metrics of {@link RunMetrics}, {@code fate-proportions.png}, {@code tissue.png} and, last,
 * {@code run.json} (so a folder with {@code run.json} holds a finished run).
 */
public final class ScenarioRunner {

    private ScenarioRunner() {
    }

    /**
     * Runs {@code request} to the end and writes its run folder. Progress, frames and
     * checkpoints are observers of the tissue's tick; the run folder's files are written after
     * the last step, {@code run.json} last. With {@code resume}, the run continues from the
     * folder's checkpoint; the checkpoint is deleted once the run has finished.
     *
     * @return the finished tissue
     * @throws IOException if the folder may not be used or a file cannot be written
     */
    public static Tissue run(RunRequest request) throws IOException {
        if (!request.resume()) {
            RunFolder.checkUsable(request.out(), request.force());
        } else if (!Files.isDirectory(request.out())) {
            throw new IOException("nothing to resume: " + request.out() + " is not a folder");
        }
        RunFolder folder = RunFolder.open(request.out());
        try (Closeable held = folder.lock()) {
            return run(request, folder);
        }
    }

    /** The run, in a folder this process holds. */
    private static Tissue run(RunRequest request, RunFolder folder) throws IOException {
        Scenario scenario = request.scenario();
        Path out = request.out();
        long seed = request.seed();
        Checkpoints checkpoints = new Checkpoints(out, scenario, seed);
        Checkpoints.Saved saved = request.resume() ? checkpoints.load() : null;
        Instant started = Instant.now();
        long startNanos = System.nanoTime();
        Tissue tissue = new Tissue(scenario.tissue(), seed, request.threads());
        List<String> fates = scenario.tissue().fates().fateNames();
        boolean threeD = scenario.tissue().domain().threeD();
        LineageFiles lineage = saved == null ? LineageFiles.start(out, fates, threeD)
                : LineageFiles.resume(out, fates, saved.lineageBytes(), saved.lineageCrc(), threeD);
        tissue.setLineageSink(lineage);
        tissue.start();
        if (saved != null) {
            saved.restoreInto(tissue, out.resolve(RunLayout.CHECKPOINT));
        }
        long total = scenario.tissue().timing().totalSteps();
        Frames frames = new Frames(out, scenario.name() + ", seed " + seed);
        Progress progress = request.progress();
        tissue.addObserver(t -> progress.update(t.steps(), total));
        if (request.frameSteps() > 0) {
            if (saved == null) {
                frames.write(tissue);
            }
            tissue.addObserver(TissueObserver.every(request.frameSteps(), unchecked(frames::write)));
        }
        if (request.snapshots().any()) {
            Snapshots snapshots = new Snapshots(out, request.snapshots() == SnapshotFormat.TABLES_AND_VTK);
            if (saved == null) {
                snapshots.write(tissue);
            }
            tissue.addObserver(TissueObserver.every(scenario.tissue().timing().stepsPerRecord(),
                    unchecked(snapshots::write)));
        }
        if (request.checkpointSteps() > 0) {
            tissue.addObserver(TissueObserver.every(request.checkpointSteps(), unchecked(t -> {
                if (!t.finished()) {
                    checkpoints.save(t, lineage.flushedLength(), lineage.flushedCrc());
                }
            })));
        }
        boolean simulated = false;
        try (progress) {
            tissue.runToEnd();
            simulated = true;
        } catch (UncheckedIOException e) {
            throw e.getCause();
        } finally {
            tissue.finish();
            if (simulated) {
                lineage.close();
            } else {
                lineage.abandon();
            }
        }
        List<String> files = new ArrayList<>();
        if (request.frameSteps() > 0) {
            files.addAll(frames.finish(folder));
        }
        if (request.snapshots().any()) {
            files.add(RunLayout.SNAPSHOTS + "/");
        }
        files.add(RunLayout.LINEAGE);
        scenario.copyInto(RunLayout.SCENARIO_COPY, (name, text) -> {
            folder.writeText(name, w -> w.write(text));
            files.add(name);
        });
        folder.writeText(RunLayout.TREES, w -> LineageFiles.writeTrees(out.resolve(RunLayout.LINEAGE), tissue.time(),
                w));
        files.add(RunLayout.TREES);
        folder.writeText(RunLayout.TIMESERIES, w -> RunTables.writeTimeSeries(tissue.series(), w));
        files.add(RunLayout.TIMESERIES);
        folder.writeText(RunLayout.POPULATION, w -> RunTables.writePopulation(tissue.series(), w));
        files.add(RunLayout.POPULATION);
        folder.writeText(RunLayout.CELLS, w -> RunTables.writeCells(tissue, w));
        files.add(RunLayout.CELLS);
        if (request.parquet()) {
            files.addAll(parquetCopies(out, request.snapshots().any()));
        }
        RunMetrics metrics = RunMetrics.of(tissue);
        int timed = tissue.spec().fates().firstPassageFate();
        if (timed >= 0) {
            metrics = metrics.withFirstPassage(FirstPassageSummary.read(out.resolve(RunLayout.LINEAGE),
                    tissue.spec().fates().fateNames().get(timed), tissue.time()));
        }
        files.addAll(metrics.write(folder, tissue.series().fateNames(), seed,
                scenario.tissue().growth().partition().mode().name().toLowerCase(Locale.ROOT)));
        String title = scenario.name() + ", seed " + seed;
        var proportions = FateProportionChart.create(tissue.series(), "Fate proportions: " + title);
        folder.write(RunLayout.FATE_CHART, o -> ChartFiles.png(proportions, 960, 560, request.figures(), o));
        folder.write(RunLayout.FATE_CHART_SVG, o -> ChartFiles.svg(proportions, 960, 560, request.figures(), o));
        files.add(RunLayout.FATE_CHART);
        files.add(RunLayout.FATE_CHART_SVG);
        String tissueTitle = String.format(Locale.ROOT, "%s at t = %.1f h (%d cells)", title, tissue.time(),
                tissue.cells().size());
        folder.write(RunLayout.TISSUE_IMAGE, o -> ImageIO.write(TissueRenderer.render(tissue, tissueTitle, 900), "png",
                o));
        files.add(RunLayout.TISSUE_IMAGE);
        double wall = (System.nanoTime() - startNanos) / 1e9;
        folder.writeText(RunLayout.PROVENANCE, w -> w.write(RunProvenance.json(scenario, seed, tissue, started, wall,
                files)));
        checkpoints.delete();
        return tissue;
    }

    /** An observer whose I/O errors end the run with that error. */
    private interface IoObserver {
        void afterStep(Tissue tissue) throws IOException;
    }

    private static TissueObserver unchecked(IoObserver observer) {
        return tissue -> {
            try {
                observer.afterStep(tissue);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        };
    }

    /**
     * Parquet copies of lineage.csv, cells.csv and, with snapshots, of every cell snapshot;
     * returns the names of the first two (the snapshots folder is listed already).
     */
    private static List<String> parquetCopies(Path out, boolean snapshots) throws IOException {
        List<Path> tables = new ArrayList<>(List.of(out.resolve(RunLayout.LINEAGE), out.resolve(RunLayout.CELLS)));
        if (snapshots) {
            try (var listing = Files.list(out.resolve(RunLayout.SNAPSHOTS))) {
                listing.filter(p -> p.getFileName().toString().matches("cells-\\d+\\.csv")).sorted()
                        .forEach(tables::add);
            }
        }
        for (Path table : tables) {
            ParquetTables.copy(table);
        }
        return List.of(ParquetTables.besides(Path.of(RunLayout.LINEAGE)).toString(),
                ParquetTables.besides(Path.of(RunLayout.CELLS)).toString());
    }
}
