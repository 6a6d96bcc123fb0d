package org.fatefield.scenarios.output;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.viz.chart.ChartFiles;
import org.fatefield.viz.chart.FateProportionChart;
import org.fatefield.viz.tissue.TissueRenderer;

/**
 * Runs a scenario to the end and writes its run folder: {@code timeseries.csv},
 * {@code cells.csv}, {@code lineage.csv} (streamed during the run), {@code lineage.nwk}, the
 * metrics of {@link RunMetrics}, {@code fate-proportions.png}, {@code tissue.png} and, last,
 * {@code run.json} (so a folder with {@code run.json} holds a finished run).
 */
public final class ScenarioRunner {

    /** File names of a run folder. */
    public static final String TIMESERIES = "timeseries.csv";
    /** Final cell table. */
    public static final String CELLS = "cells.csv";
    /** Fate proportions chart. */
    public static final String FATE_CHART = "fate-proportions.png";
    /** Fate proportions chart as SVG. */
    public static final String FATE_CHART_SVG = "fate-proportions.svg";
    /** Final tissue image. */
    public static final String TISSUE_IMAGE = "tissue.png";
    /** Copy of the scenario that was run. */
    public static final String SCENARIO_COPY = "scenario.toml";
    /** Provenance, written last. */
    public static final String PROVENANCE = "run.json";

    private ScenarioRunner() {
    }

    /**
     * Runs {@code scenario} with {@code seed} into folder {@code out}.
     *
     * @param threads threads to step cells on (the result does not depend on it)
     * @param force   overwrite run files in a folder that already holds files
     * @return the finished tissue
     * @throws IOException if the folder may not be used or a file cannot be written
     */
    public static Tissue run(Scenario scenario, long seed, int threads, Path out, boolean force, Progress progress)
            throws IOException {
        return run(scenario, seed, threads, out, force, progress, 0, false);
    }

    /**
     * As {@link #run(Scenario, long, int, Path, boolean, Progress)}, writing a checkpoint every
     * {@code checkpointSteps} steps (0: never) and, with {@code resume}, continuing from the
     * folder's checkpoint. The checkpoint is deleted once the run has finished.
     */
    public static Tissue run(Scenario scenario, long seed, int threads, Path out, boolean force, Progress progress,
            long checkpointSteps, boolean resume) throws IOException {
        return run(scenario, seed, threads, out, force, progress, checkpointSteps, resume, 0);
    }

    /**
     * As above, also writing a PNG frame of the tissue every {@code frameSteps} steps (0: none) into
     * {@code frames/}, and at the end {@code tissue.gif}, an animation of them.
     */
    public static Tissue run(Scenario scenario, long seed, int threads, Path out, boolean force, Progress progress,
            long checkpointSteps, boolean resume, long frameSteps) throws IOException {
        Checkpoints checkpoints = new Checkpoints(out, scenario, seed);
        Checkpoints.Saved saved = resume ? checkpoints.load() : null;
        if (!resume) {
            RunFolder.checkUsable(out, force);
        }
        Instant started = Instant.now();
        long startNanos = System.nanoTime();
        Tissue tissue = new Tissue(scenario.tissue(), seed, threads);
        RunFolder folder = RunFolder.open(out);
        LineageFiles lineage = new LineageFiles(out, scenario.tissue().fates().fateNames(),
                saved == null ? -1 : saved.lineageBytes());
        tissue.setLineageSink(lineage);
        tissue.start();
        if (saved != null) {
            saved.restoreInto(tissue);
        }
        long total = scenario.tissue().timing().totalSteps();
        Frames frames = new Frames(out, scenario.name() + ", seed " + seed);
        if (frameSteps > 0 && saved == null) {
            frames.write(tissue);
        }
        try (progress) {
            while (!tissue.finished()) {
                tissue.schedule.step(tissue);
                progress.update(tissue.steps(), total);
                if (frameSteps > 0 && tissue.steps() % frameSteps == 0) {
                    frames.write(tissue);
                }
                if (checkpointSteps > 0 && tissue.steps() % checkpointSteps == 0 && !tissue.finished()) {
                    checkpoints.save(tissue, lineage.flushedLength());
                }
            }
        } finally {
            tissue.finish();
            lineage.close();
        }
        List<String> files = new ArrayList<>();
        if (frameSteps > 0) {
            files.addAll(frames.finish(folder));
        }
        files.add(LineageFiles.TABLE);
        folder.writeText(SCENARIO_COPY, w -> w.write(scenario.text()));
        files.add(SCENARIO_COPY);
        folder.writeText(LineageFiles.TREES, w -> LineageFiles.writeTrees(out.resolve(LineageFiles.TABLE), tissue.time(), w));
        files.add(LineageFiles.TREES);
        files.addAll(RunMetrics.of(tissue).write(folder, tissue.series().fateNames(), seed,
                scenario.tissue().growth().partition().mode().name().toLowerCase(Locale.ROOT)));
        folder.writeText(TIMESERIES, w -> RunTables.writeTimeSeries(tissue.series(), w));
        files.add(TIMESERIES);
        folder.writeText(CELLS, w -> RunTables.writeCells(tissue, w));
        files.add(CELLS);
        String title = scenario.name() + ", seed " + seed;
        var proportions = FateProportionChart.create(tissue.series(), "Fate proportions: " + title);
        folder.write(FATE_CHART, o -> ChartFiles.png(proportions, 960, 560, o));
        folder.write(FATE_CHART_SVG, o -> ChartFiles.svg(proportions, 960, 560, o));
        files.add(FATE_CHART);
        files.add(FATE_CHART_SVG);
        String tissueTitle = String.format(Locale.ROOT, "%s at t = %.1f h (%d cells)", title, tissue.time(),
                tissue.cells().size());
        folder.write(TISSUE_IMAGE, o -> ImageIO.write(TissueRenderer.render(tissue, tissueTitle, 900), "png", o));
        files.add(TISSUE_IMAGE);
        double wall = (System.nanoTime() - startNanos) / 1e9;
        folder.writeText(PROVENANCE, w -> w.write(RunProvenance.json(scenario, seed, tissue, started, wall, files)));
        checkpoints.delete();
        return tissue;
    }
}
