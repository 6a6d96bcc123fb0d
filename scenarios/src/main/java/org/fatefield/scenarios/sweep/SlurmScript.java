package org.fatefield.scenarios.sweep;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * A ready-to-submit SLURM batch script for a planned sweep: one array task per shard, each
 * running {@code fatefield sweep run} on its share. The task's shard is its array task id out of
 * the script's task count, written into the script, so resubmitting some ids ({@code sbatch
 * --array=3,7 sweep.sbatch}) runs exactly those shards. Java is {@code $FATEFIELD_JAVA} if set,
 * else {@code java} on the node's PATH (never the submitting host's path), or the tool runs from a
 * {@link ContainerImage}; either way with a heap of 85% of {@code --mem} so the task stays inside
 * its memory limit.
 *
 * @param tasks       array tasks (shards)
 * @param time        wall-time limit per task, as SLURM writes it (e.g. 01:00:00)
 * @param memory      memory per task (e.g. 4G)
 * @param cpus        CPUs per task (the workers of each task)
 * @param concurrent  most tasks running at once (0: no limit)
 * @param partition   partition to submit to, or "" for the cluster's default
 * @param account     account to charge, or "" for the user's default
 */
public record SlurmScript(int tasks, String time, String memory, int cpus, int concurrent, String partition,
        String account) {

    /** Share of the task's memory given to the Java heap (the rest: JVM, native and file buffers). */
    static final double HEAP_SHARE = 0.85;

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
        if (heapMegabytes(memory) < 64) {
            throw new IllegalArgumentException("--mem must leave Java at least 64 MB of heap (give 100M or more), got "
                    + memory);
        }
        for (String[] named : new String[][] {{"--partition", partition}, {"--account", account}}) {
            if (!named[1].matches("[A-Za-z0-9_.,-]*")) {
                throw new IllegalArgumentException(named[0] + " must be a SLURM name (letters, digits, _ . , -), got "
                        + named[1]);
            }
        }
    }

    /** Without partition and account (the cluster's defaults). */
    public SlurmScript(int tasks, String time, String memory, int cpus, int concurrent) {
        this(tasks, time, memory, cpus, concurrent, "", "");
    }

    /**
     * How the tool is started on a node: the default Java command and the arguments after it, or,
     * when {@code container} is not null, that container image.
     */
    public record Launcher(String defaultJava, String arguments, ContainerImage container) {

        /** Java on the node. */
        public Launcher(String defaultJava, String arguments) {
            this(defaultJava, arguments, null);
        }

        /** The same tool, started from {@code image} instead (null: Java on the node). */
        public Launcher in(ContainerImage image) {
            return new Launcher(defaultJava, arguments, image);
        }
    }

    /**
     * How to start this very tool on a cluster node: {@code java -jar} on the packaged jar (Java
     * from the node's PATH), or, when running from classes (development, tests), this JVM with
     * the class path and {@code mainClass}.
     */
    public static Launcher launcher(Class<?> mainClass) {
        Path jar;
        try {
            jar = Path.of(mainClass.getProtectionDomain().getCodeSource().getLocation().toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException("cannot locate the running tool: " + e.getMessage(), e);
        }
        if (Files.isRegularFile(jar)) {
            return new Launcher("java", "-jar \"" + jar.toAbsolutePath() + "\"");
        }
        return new Launcher(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Djava.awt.headless=true -cp \"" + System.getProperty("java.class.path") + "\" " + mainClass.getName());
    }

    /** The Java heap for a task with {@code memory} (SLURM's units: K, M, G, T; none is M), in MB. */
    static long heapMegabytes(String memory) {
        char last = memory.charAt(memory.length() - 1);
        boolean suffixed = !Character.isDigit(last);
        long amount = Long.parseLong(suffixed ? memory.substring(0, memory.length() - 1) : memory);
        double megabytes = switch (suffixed ? last : 'M') {
            case 'K' -> amount / 1024.0;
            case 'G' -> amount * 1024.0;
            case 'T' -> amount * 1024.0 * 1024.0;
            default -> amount;
        };
        return (long) Math.floor(HEAP_SHARE * megabytes);
    }

    /** The lines that start the tool, up to its arguments: Java on the node, or a container. */
    private String start(Path folder, Launcher launcher) {
        long heap = heapMegabytes(memory);
        if (launcher.container() != null) {
            return "# Fatefield from the container image " + launcher.container().image() + " ("
                    + launcher.container().runtime() + "); heap 85% of --mem.\n"
                    + launcher.container().command(folder, heap);
        }
        return "# Java from FATEFIELD_JAVA if set, else from the node's PATH; heap 85% of --mem.\n"
                + "JAVA=\"${FATEFIELD_JAVA:-" + launcher.defaultJava() + "}\"\n"
                + "\"$JAVA\" -Xmx" + heap + "m " + launcher.arguments();
    }

    /** The script for the sweep in {@code folder}, started with {@code launcher}. */
    public String text(Path folder, Launcher launcher) {
        Path abs = folder.toAbsolutePath().normalize();
        StringBuilder options = new StringBuilder();
        if (!partition.isEmpty()) {
            options.append("#SBATCH --partition=").append(partition).append('\n');
        }
        if (!account.isEmpty()) {
            options.append("#SBATCH --account=").append(account).append('\n');
        }
        return String.format(Locale.ROOT, """
                #!/bin/bash
                # Fatefield sweep: submit with  sbatch %1$s/sweep.sbatch
                # Rerun some shards only with  sbatch --array=3,7 %1$s/sweep.sbatch
                #SBATCH --job-name=fatefield-sweep
                #SBATCH --array=1-%2$d%3$s
                #SBATCH --time=%4$s
                #SBATCH --mem=%5$s
                #SBATCH --cpus-per-task=%6$d
                %7$s#SBATCH --output=%1$s/logs/%%A_%%a.out
                #SBATCH --error=%1$s/logs/%%A_%%a.err
                set -euo pipefail
                %8$s sweep run "%1$s" --workers %6$d --shard "${SLURM_ARRAY_TASK_ID}/%2$d"
                """, abs, tasks, concurrent > 0 ? "%" + concurrent : "", time, memory, cpus, options,
                start(abs, launcher));
    }
}
