package org.fatefield.scenarios.calibration;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.fatefield.scenarios.sweep.Manifest;
import org.fatefield.scenarios.sweep.SlurmScript;

/**
 * Runs each calibration round as SLURM array jobs, one per folder (each task runs {@code fatefield
 * sweep run} on its share), and waits for them: the calibration itself stays on the submitting
 * node and only decides which particles to simulate next.
 */
public final class SlurmBackend implements RoundBackend {

    private final SlurmScript limits;
    private final SlurmScript.Launcher launcher;
    private final PrintStream log;

    /**
     * With the per-task limits of {@code limits} (its task count is the most array tasks per
     * round), starting the tool with {@code launcher} on the nodes.
     */
    public SlurmBackend(SlurmScript limits, SlurmScript.Launcher launcher, PrintStream log) {
        this.limits = limits;
        this.launcher = launcher;
        this.log = log;
    }

    @Override
    public void run(List<Path> folders, String label) throws IOException {
        List<String> jobs = new ArrayList<>();
        for (Path folder : folders) {
            int runs = Manifest.read(folder).runs().size();
            SlurmScript script = new SlurmScript(Math.max(1, Math.min(limits.tasks(), runs)), limits.time(),
                    limits.memory(), limits.cpus(), limits.concurrent(), limits.partition(), limits.account());
            Files.createDirectories(folder.resolve("logs"));
            Path file = folder.resolve("sweep.sbatch");
            Files.writeString(file, script.text(folder, launcher), StandardCharsets.UTF_8);
            String out = command(List.of("sbatch", "--parsable", file.toString()));
            String job = out.trim().split(";")[0];
            if (!job.matches("\\d+")) {
                throw new IOException("sbatch did not return a job id for " + file + ": " + out.trim());
            }
            jobs.add(job);
            log.printf("%s: submitted SLURM job %s (%d runs, %d array tasks)%n", label, job, runs, script.tasks());
            log.flush();
        }
        for (String job : jobs) {
            while (queued(job)) {
                try {
                    Thread.sleep(1000);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IOException("interrupted while waiting for SLURM job " + job, e);
                }
            }
        }
    }

    /** True while SLURM still lists the job (a job it no longer knows has finished). */
    private static boolean queued(String job) throws IOException {
        try {
            return !command(List.of("squeue", "-h", "-j", job)).isBlank();
        } catch (IOException e) {
            if (e.getMessage().contains("Invalid job id")) {
                return false;
            }
            throw e;
        }
    }

    private static String command(List<String> command) throws IOException {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        try {
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!p.waitFor(120, TimeUnit.SECONDS) || p.exitValue() != 0) {
                throw new IOException(String.join(" ", command) + " failed: " + out.trim());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted: " + String.join(" ", command), e);
        }
    }
}
