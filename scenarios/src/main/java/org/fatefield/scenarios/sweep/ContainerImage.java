package org.fatefield.scenarios.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * A container image the array tasks of a SLURM script run Fatefield from, instead of a Java on the
 * node: the image built from {@code scenarios/container/Dockerfile} (run by podman or docker) or
 * the Apptainer image built from {@code scenarios/container/fatefield.def}. The task's folder is
 * bound into the container at the same path, so results land where they would without it; the
 * Java heap goes in through {@code FATEFIELD_JAVA_OPTIONS}, which the image's start script reads.
 *
 * @param runtime podman, docker or apptainer
 * @param image   an image reference (podman, docker) or a {@code .sif} file (apptainer)
 */
public record ContainerImage(String runtime, String image) {

    /** The runtimes a script can name. */
    public static final List<String> RUNTIMES = List.of("podman", "docker", "apptainer");

    /** Validates: the runtime is known and the image is a plain reference or path (it goes into a shell script). */
    public ContainerImage {
        if (!RUNTIMES.contains(runtime)) {
            throw new IllegalArgumentException("--container-runtime must be one of " + String.join(", ", RUNTIMES)
                    + ", got " + runtime);
        }
        if (!image.matches("[A-Za-z0-9/.][A-Za-z0-9._/:@+-]*")) {
            throw new IllegalArgumentException("--container must be an image reference such as fatefield:0.1.0 or"
                    + " registry.example.org/lab/fatefield:0.1.0, or a .sif file (letters, digits and . _ / : @ + -),"
                    + " got " + image);
        }
        if (runtime.equals("apptainer") && !image.endsWith(".sif")) {
            throw new IllegalArgumentException("apptainer runs an image file: give the .sif built from"
                    + " scenarios/container/fatefield.def, got " + image);
        }
    }

    /**
     * The image, run by apptainer if it is a {@code .sif} file (made absolute, as a task may start
     * elsewhere), else by {@code runtime} or podman; null when no image is given (Java on the node).
     *
     * @throws IllegalArgumentException if a runtime is given without an image, or either is bad
     */
    public static ContainerImage of(String image, String runtime) {
        if (image == null) {
            if (runtime != null) {
                throw new IllegalArgumentException("--container-runtime needs --container IMAGE");
            }
            return null;
        }
        String chosen = runtime != null ? runtime.toLowerCase(Locale.ROOT)
                : image.endsWith(".sif") ? "apptainer" : "podman";
        boolean file = chosen.equals("apptainer") && image.endsWith(".sif") && !image.contains("\0");
        return new ContainerImage(chosen, file ? Path.of(image).toAbsolutePath().normalize().toString() : image);
    }

    /**
     * The shell command that starts Fatefield in the container with {@code heapMegabytes} of Java
     * heap and {@code folder} bound at its own path; the tool's arguments follow it.
     */
    public String command(Path folder, long heapMegabytes) {
        String abs = folder.toAbsolutePath().normalize().toString();
        String heap = "FATEFIELD_JAVA_OPTIONS=-Xmx" + heapMegabytes + "m";
        if (runtime.equals("apptainer")) {
            // --containall: nothing of the node but the bound folder; --env passes the heap.
            return String.format(Locale.ROOT, "apptainer run --containall --env %s --bind \"%s\" \"%s\"", heap, abs,
                    image);
        }
        // No network: a run needs none. The task's own uid, so the files it writes are the user's.
        return String.format(Locale.ROOT, "%s run --rm --network=none --user \"$(id -u):$(id -g)\" --env %s"
                + " --volume \"%s:%s\" --workdir \"%s\" \"%s\"", runtime, heap, abs, abs, abs, image);
    }
}
