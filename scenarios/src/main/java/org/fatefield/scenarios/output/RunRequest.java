package org.fatefield.scenarios.output;

import java.nio.file.Path;
import java.util.Objects;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.viz.chart.FigureFormat;

/**
 * What to run and how: the scenario, the seed, the output folder and the run's options, built
 * as {@code RunRequest.of(scenario, out).withSeed(7).withThreads(2)...}; each {@code with}
 * returns a validated copy.
 *
 * @param scenario        the scenario to run
 * @param out             the run folder
 * @param seed            master seed, at least 0 (default: the scenario's)
 * @param threads         threads to step cells on, at least 1 (the result does not depend on it)
 * @param force           overwrite run files in a folder that already holds files
 * @param progress        where progress goes
 * @param checkpointSteps steps between checkpoints, 0 for none
 * @param resume          continue from the folder's checkpoint
 * @param frameSteps      steps between PNG frames, 0 for none
 * @param snapshots       what to write at every record time into {@code snapshots/}
 * @param figures         resolution and size of the figures
 * @param parquet         also write the large tables (lineage, cells, cell snapshots) as Parquet
 */
public record RunRequest(Scenario scenario, Path out, long seed, int threads, boolean force, Progress progress,
        long checkpointSteps, boolean resume, long frameSteps, SnapshotFormat snapshots, FigureFormat figures,
        boolean parquet) {

    /** Validates. */
    public RunRequest {
        Objects.requireNonNull(scenario, "scenario");
        Objects.requireNonNull(out, "out");
        Objects.requireNonNull(progress, "progress");
        Objects.requireNonNull(snapshots, "snapshots");
        Objects.requireNonNull(figures, "figures");
        if (seed < 0) {
            throw new IllegalArgumentException("seed must be 0 or greater, got " + seed);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        if (checkpointSteps < 0 || frameSteps < 0) {
            throw new IllegalArgumentException("checkpoint and frame intervals must be 0 (none) or more steps, got "
                    + checkpointSteps + " and " + frameSteps);
        }
    }

    /** A run of {@code scenario} into {@code out} with its own seed, one thread, no extras, silent. */
    public static RunRequest of(Scenario scenario, Path out) {
        return new RunRequest(scenario, out, scenario.seed(), 1, false, Progress.silent(), 0, false, 0, SnapshotFormat.NONE,
                FigureFormat.DEFAULT, false);
    }

    /** With master seed {@code value}. */
    public RunRequest withSeed(long value) {
        return new RunRequest(scenario, out, value, threads,
                force, progress, checkpointSteps, resume, frameSteps, snapshots, figures, parquet);
    }

    /** Stepped on {@code value} threads. */
    public RunRequest withThreads(int value) {
        return new RunRequest(scenario, out, seed,
                value, force, progress, checkpointSteps, resume, frameSteps, snapshots, figures, parquet);
    }

    /** Allowed (or not) to overwrite the run files of a folder that holds files. */
    public RunRequest withForce(boolean value) {
        return new RunRequest(scenario, out, seed, threads,
                value, progress, checkpointSteps, resume, frameSteps, snapshots, figures, parquet);
    }

    /** Reporting progress to {@code value}. */
    public RunRequest withProgress(Progress value) {
        return new RunRequest(scenario, out, seed, threads,
                force, value, checkpointSteps, resume, frameSteps, snapshots, figures, parquet);
    }

    /** Checkpointing every {@code steps} steps (0: never). */
    public RunRequest withCheckpointSteps(long steps) {
        return new RunRequest(scenario, out, seed, threads, force, progress, steps, resume, frameSteps, snapshots, figures, parquet);
    }

    /** Continuing (or not) from the folder's checkpoint. */
    public RunRequest withResume(boolean value) {
        return new RunRequest(scenario, out, seed, threads,
                force, progress, checkpointSteps, value, frameSteps, snapshots, figures, parquet);
    }

    /** Writing a frame every {@code steps} steps (0: never). */
    public RunRequest withFrameSteps(long steps) {
        return new RunRequest(scenario, out, seed, threads,
                force, progress, checkpointSteps, resume, steps, snapshots, figures, parquet);
    }

    /** Writing figures in {@code value}. */
    public RunRequest withFigures(FigureFormat value) {
        return new RunRequest(scenario, out, seed, threads, force, progress, checkpointSteps, resume, frameSteps,
                snapshots, value, parquet);
    }

    /** Writing {@code value} at every record time. */
    public RunRequest withSnapshots(SnapshotFormat value) {
        return new RunRequest(scenario, out, seed, threads,
                force, progress, checkpointSteps, resume, frameSteps, value, figures, parquet);
    }

    /** Also writing (or not) the large tables as Parquet. */
    public RunRequest withParquet(boolean value) {
        return new RunRequest(scenario, out, seed, threads, force, progress, checkpointSteps, resume, frameSteps,
                snapshots, figures, value);
    }
}
