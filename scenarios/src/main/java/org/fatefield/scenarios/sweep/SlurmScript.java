package org.fatefield.scenarios.sweep;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * A ready-to-submit SLURM batch script for a planned sweep: one array task per shard, each
 * running {@code fatefield sweep run} on its share, which it finds from the array task id.
 *
 * @param tasks       array tasks (shards)
 * @param time        wall-time limit per task, as SLURM writes it (e.g. 01:00:00)
 * @param memory      memory per task (e.g. 4G)
 * @param cpus        CPUs per task (the workers of each task)
 * @param concurrent  most tasks running at once (0: no limit)
 */
public record SlurmScript(int tasks, String time, String memory, int cpus, int concurrent) {

    /** Validates. */
    public SlurmScript {
        if (tasks < 1 || cpus < 1 || concurrent < 0) {
            throw new IllegalArgumentException("tasks and cpus must be at least 1 and the concurrency limit at least 0");
        }
        if (!time.matches("(\\d+-)?\\d{1,2}:\\d{2}:\\d{2}")) {
            throw new IllegalArgumentException("--time must look like HH:MM:SS or D-HH:MM:SS, got " + time);
        }
        if (!memory.matches("\\d+[KMGT]?")) {
            throw new IllegalArgumentException("--mem must look like 4G or 500M, got " + memory);
        }
    }

    /**
     * The command line that starts this very tool on a cluster node: {@code java -jar} on the
     * packaged jar, or the class path and {@code mainClass} when running from classes
     * (development, tests).
     */
    public static String launcher(Class<?> mainClass) {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Path jar;
        try {
            jar = Path.of(mainClass.getProtectionDomain().getCodeSource().getLocation().toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException("cannot locate the running tool: " + e.getMessage(), e);
        }
        return Files.isRegularFile(jar)
                ? "\"" + java + "\" -jar \"" + jar.toAbsolutePath() + "\""
                : "\"" + java + "\" -Djava.awt.headless=true -cp \"" + System.getProperty("java.class.path") + "\" "
                        + mainClass.getName();
    }

    /** The script for the sweep in {@code folder}, run with the tool at {@code jar}. */
    public String text(Path folder, Path jar, String java) {
        return text(folder, "\"" + java + "\" -jar \"" + jar.toAbsolutePath().normalize() + "\"");
    }

    /** The script for the sweep in {@code folder}, run with the command line {@code launcher}. */
    public String text(Path folder, String launcher) {
        Path abs = folder.toAbsolutePath().normalize();
        return String.format(Locale.ROOT, """
                #!/bin/bash
                # Fatefield sweep: submit with  sbatch %1$s/sweep.sbatch
                #SBATCH --job-name=fatefield-sweep
                #SBATCH --array=1-%2$d%3$s
                #SBATCH --time=%4$s
                #SBATCH --mem=%5$s
                #SBATCH --cpus-per-task=%6$d
                #SBATCH --output=%1$s/logs/%%A_%%a.out
                #SBATCH --error=%1$s/logs/%%A_%%a.err
                set -euo pipefail
                # Each task takes its shard from SLURM_ARRAY_TASK_ID and SLURM_ARRAY_TASK_COUNT.
                %7$s sweep run "%1$s" --workers %6$d
                """, abs, tasks, concurrent > 0 ? "%" + concurrent : "", time, memory, cpus, launcher);
    }
}
