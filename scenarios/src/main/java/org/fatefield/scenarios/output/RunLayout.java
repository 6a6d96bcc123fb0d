package org.fatefield.scenarios.output;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Every file name of a run folder and of a replicate set, in one place: the runner writes
 * them, {@link RunFolderReader} reads them, and the README's table lists them. To add an
 * output, add its name here, write it from {@link ScenarioRunner} (or the command that owns
 * it) and read it through {@link RunFolderReader}.
 */
public final class RunLayout {

    /** Fate counts over time, one row per record time and fate. */
    public static final String TIMESERIES = "timeseries.csv";
    /** Live cells and mean morphogen over time. */
    public static final String POPULATION = "population.csv";
    /** The live cells at the end. */
    public static final String CELLS = "cells.csv";
    /** Every cell ever born, streamed during the run. */
    public static final String LINEAGE = "lineage.csv";
    /** The family trees, Newick. */
    public static final String TREES = "lineage.nwk";
    /** Fate fractions along the gradient. */
    public static final String PROFILE = "profile.csv";
    /** Same-fate fraction against lineage distance. */
    public static final String RELATEDNESS = "relatedness.csv";
    /** Fate composition of each founder's clone. */
    public static final String CLONES = "clones.csv";
    /** Boundaries, widths, predictions, sister agreement. */
    public static final String METRICS = "metrics.json";
    /** Fate proportions over time, PNG. */
    public static final String FATE_CHART = "fate-proportions.png";
    /** Fate proportions over time, SVG. */
    public static final String FATE_CHART_SVG = "fate-proportions.svg";
    /** The final tissue. */
    public static final String TISSUE_IMAGE = "tissue.png";
    /** Animation of the frames. */
    public static final String ANIMATION = "tissue.gif";
    /** Folder of PNG frames. */
    public static final String FRAMES = "frames";
    /** Folder of the per-record-time cell and field tables. */
    public static final String SNAPSHOTS = "snapshots";
    /** Copy of the scenario that was run. */
    public static final String SCENARIO_COPY = "scenario.toml";
    /** Provenance, written last: its presence marks a finished run. */
    public static final String PROVENANCE = "run.json";
    /** The run's state for --resume, deleted when the run finishes. */
    public static final String CHECKPOINT = "checkpoint.bin";
    /** Held (locked) while a run writes into its folder, so a second run cannot write there too. */
    public static final String LOCK = ".fatefield.lock";
    /** The offline HTML report. */
    public static final String REPORT = "report.html";
    /** A replicate set's table of runs. */
    public static final String REPLICATES_TABLE = "replicates.csv";
    /** A replicate set's summary. */
    public static final String REPLICATES_SUMMARY = "replicates.json";

    private RunLayout() {
    }

    /**
     * The temporary name a file is written under before it is renamed into place: hidden, and
     * never taken for a finished file.
     */
    public static Path partial(Path target) {
        return target.resolveSibling("." + target.getFileName() + ".partial");
    }

    /**
     * The folder a command writes to without {@code --out}: {@code <name><suffix>} in the current
     * folder, the scenario's name reduced to letters, digits, '.', '_' and '-' (a scenario file
     * is untrusted: its name can never choose a folder elsewhere, such as {@code ../../x} or an
     * absolute path).
     */
    public static Path defaultFolder(String scenarioName, String suffix) {
        String safe = scenarioName.replaceAll("[^A-Za-z0-9._-]", "_").replaceAll("^[.]+", "");
        return Path.of((safe.isEmpty() ? "scenario" : safe) + suffix);
    }

    /**
     * Checks that a file a finished run folder holds is there.
     *
     * @throws IOException naming it, if it is missing
     */
    static Path requireFile(Path file) throws IOException {
        if (!Files.exists(file)) {
            throw new IOException(file + " is missing: is this a finished Fatefield run folder?");
        }
        return file;
    }

    /** The folder of the replicate run with {@code seed} in a replicate set. */
    public static String replicateFolder(long seed) {
        return "seed-" + seed;
    }
}
