package org.fatefield.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.google.gson.JsonObject;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.fatefield.scenarios.cli.FatefieldCommandAccess;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The provenance record a command writes: its command line, the SHA-256 of its input file
 * (against the JDK's own digest of the bytes on disk), and library versions that are exactly the
 * ones the parent pom pins.
 */
class ProvenanceTest {

    @TempDir
    Path tmp;

    @Test
    void aSweepPlanRecordsItsCommandLineInputsAndPinnedLibraries() throws Exception {
        Path file = tmp.resolve("sweep.toml");
        Files.writeString(file, "[sweep]\nscenario = \"demo\"\n[[parameter]]\nkey = \"morphogen.decay\"\n"
                + "values = [0.2, 0.3]\n");
        Path out = tmp.resolve("plan");
        assertEquals(0, FatefieldCommandAccess.run("sweep", "plan", file.toString(), "--out", out.toString()));
        JsonObject record = JsonFiles.read(out.resolve("provenance.json"));
        assertEquals("sweep plan", record.get("command").getAsString());
        assertEquals("[\"fatefield\",\"sweep\",\"plan\",\"" + file + "\",\"--out\",\"" + out + "\"]",
                record.get("command_line").toString());
        String digest = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        assertEquals(digest, record.getAsJsonObject("inputs_sha256").get(file.toString()).getAsString());
        String pom = Files.readString(Path.of("..", "pom.xml"));
        JsonObject libraries = record.getAsJsonObject("libraries");
        for (String[] pair : new String[][] {{"mason", "mason.version"}, {"hipparchus", "hipparchus.version"},
            {"commons-rng", "commons-rng.version"}, {"jfreechart", "jfreechart.version"}}) {
            Matcher m = Pattern.compile("<" + Pattern.quote(pair[1]) + ">([^<]+)</").matcher(pom);
            assertEquals(true, m.find(), pair[1]);
            assertEquals(m.group(1), libraries.get(pair[0]).getAsString(), pair[0]);
        }
        assertFalse(record.get("build_commit").getAsString().isEmpty());
    }
}
