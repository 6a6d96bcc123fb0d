package org.fatefield.scenarios.format;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class ScenarioReferenceTest {

    @Test
    void committedReferencePageMatchesTheSchema() throws IOException {
        // Surefire runs in the module folder; the page lives beside this module's pom.
        String committed = Files.readString(Path.of("SCENARIO-FORMAT.md"), StandardCharsets.UTF_8);
        assertEquals(ScenarioReference.markdown(), committed,
                "regenerate with: java -jar scenarios/target/fatefield.jar scenario-help > scenarios/SCENARIO-FORMAT.md");
    }
}
