package org.fatefield.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.junit.jupiter.api.Test;

/**
 * The generated batch script: the heap is 85% of --mem in SLURM's units (4G is 4096 MB, so
 * 3481 MB), Java comes from FATEFIELD_JAVA or the node's PATH, partition and account appear only
 * when given, and each task's shard is its array id out of the script's own task count, so a
 * resubmitted subset of ids (--array=3,7) runs exactly shards 3 and 7 of 5.
 */
class SlurmScriptTest {

    @Test
    void heapFollowsTheMemoryLimitInSlurmUnits() {
        assertEquals(3481, SlurmScript.heapMegabytes("4G"));
        assertEquals(425, SlurmScript.heapMegabytes("500M"));
        assertEquals(425, SlurmScript.heapMegabytes("500"));
        assertEquals(891289, SlurmScript.heapMegabytes("1T"));
        assertThrows(IllegalArgumentException.class, () -> new SlurmScript(2, "01:00:00", "50M", 1, 0));
    }

    @Test
    void theScriptNamesItsShardJavaHeapPartitionAndAccount() {
        SlurmScript.Launcher jar = new SlurmScript.Launcher("java", "-jar \"/opt/fatefield.jar\"");
        String text = new SlurmScript(5, "02:00:00", "4G", 2, 3, "short", "lab-x").text(Path.of("/tmp/sweep"), jar);
        assertTrue(text.contains("#SBATCH --array=1-5%3\n"), text);
        assertTrue(text.contains("#SBATCH --partition=short\n#SBATCH --account=lab-x\n"), text);
        assertTrue(text.contains("JAVA=\"${FATEFIELD_JAVA:-java}\"\n"), text);
        assertTrue(text.contains("\"$JAVA\" -Xmx3481m -jar \"/opt/fatefield.jar\" sweep run \"/tmp/sweep\" --workers 2"
                + " --shard \"${SLURM_ARRAY_TASK_ID}/5\"\n"), text);
        String plain = new SlurmScript(5, "02:00:00", "4G", 1, 0).text(Path.of("/tmp/sweep"), jar);
        assertFalse(plain.contains("--partition") || plain.contains("--account"), plain);
        assertThrows(IllegalArgumentException.class, () -> new SlurmScript(5, "02:00:00", "4G", 1, 0, "a b", ""));
    }

    @Test
    void aContainerTaskBindsTheSweepFolderAndPassesTheHeap() {
        SlurmScript.Launcher jar = new SlurmScript.Launcher("java", "-jar \"/opt/fatefield.jar\"");
        String podman = new SlurmScript(2, "01:00:00", "2G", 1, 0).text(Path.of("/data/sweep"),
                jar.in(ContainerImage.of("registry.example.org/lab/fatefield:0.1.0", null)));
        assertTrue(podman.contains("podman run --rm --network=none --user \"$(id -u):$(id -g)\" --env"
                + " FATEFIELD_JAVA_OPTIONS=-Xmx1740m --volume \"/data/sweep:/data/sweep\" --workdir \"/data/sweep\""
                + " \"registry.example.org/lab/fatefield:0.1.0\" sweep run \"/data/sweep\" --workers 1 --shard"
                + " \"${SLURM_ARRAY_TASK_ID}/2\"\n"), podman);
        assertFalse(podman.contains("FATEFIELD_JAVA:-"), "no Java on the node is used: " + podman);
        String apptainer = new SlurmScript(2, "01:00:00", "2G", 1, 0).text(Path.of("/data/sweep"),
                jar.in(ContainerImage.of("/images/fatefield.sif", null)));
        assertTrue(apptainer.contains("apptainer run --containall --env FATEFIELD_JAVA_OPTIONS=-Xmx1740m --bind"
                + " \"/data/sweep\" \"/images/fatefield.sif\" sweep run \"/data/sweep\""), apptainer);
        assertEquals("docker", ContainerImage.of("fatefield:0.1.0", "docker").runtime());
        IllegalArgumentException quote = assertThrows(IllegalArgumentException.class,
                () -> ContainerImage.of("fatefield\"; rm -rf /", null));
        assertTrue(quote.getMessage().contains("--container must be an image reference"), quote.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ContainerImage.of("fatefield:1", "apptainer"));
        assertThrows(IllegalArgumentException.class, () -> ContainerImage.of("fatefield:1", "lxc"));
    }

    @Test
    void aResubmittedSubsetOfArrayIdsRunsThoseShards() {
        Manifest manifest = new Manifest(List.of("k"), java.util.stream.IntStream.range(0, 12)
                .mapToObj(i -> new Manifest.Run("p" + i, i, 0, i, new double[] {i})).toList());
        for (int id : new int[] {3, 5}) {
            int[] shard = FatefieldCommandAccess.shard(id + "/5", java.util.Map.of("SLURM_ARRAY_TASK_ID",
                    Integer.toString(id), "SLURM_ARRAY_TASK_COUNT", "2", "SLURM_ARRAY_TASK_MIN", "3"));
            assertEquals(id, shard[0]);
            assertEquals(5, shard[1]);
            List<Manifest.Run> runs = manifest.shard(shard[0], shard[1]);
            assertEquals("p" + (id - 1), runs.get(0).id(), "shard " + id + " starts at run " + (id - 1));
        }
    }
}
