package org.fatefield.scenarios.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.dialect.Dialects;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.fatefield.scenarios.builtin.BuiltinScenarios;
import org.junit.jupiter.api.Test;
import org.tomlj.Toml;

/**
 * The published JSON Schema of the scenario format: the committed scenarios/scenario.schema.json
 * is exactly what the scenario schema generates (so it cannot drift from validation), it is a
 * valid draft 2020-12 schema by the networknt validator's bundled meta-schema, every shipped
 * scenario (the built-in demo, scenarios/examples, the test corpus's valid files) passes it, and
 * files with an unknown key, a wrong type or an out-of-range number fail it.
 */
class ScenarioJsonSchemaTest {

    private static final SchemaRegistry REGISTRY = SchemaRegistry.withDialect(Dialects.getDraft202012());

    private static List<Error> check(String toml) {
        Schema schema = REGISTRY.getSchema(ScenarioJsonSchema.text(), InputFormat.JSON);
        return schema.validate(Toml.parse(toml).toJson(), InputFormat.JSON);
    }

    @Test
    void theCommittedSchemaIsTheGeneratedOne() throws Exception {
        assertEquals(ScenarioJsonSchema.text(), Files.readString(Path.of("scenario.schema.json"), StandardCharsets.UTF_8),
                "regenerate with: fatefield scenario-help --json-schema > scenarios/scenario.schema.json");
    }

    @Test
    void theSchemaIsAValidDraft202012Schema() {
        Schema meta = REGISTRY.getSchema(SchemaLocation.of(Dialects.getDraft202012().getId()));
        List<Error> errors = meta.validate(ScenarioJsonSchema.text(), InputFormat.JSON);
        assertTrue(errors.isEmpty(), errors.toString());
    }

    @Test
    void everyShippedScenarioPassesAndBrokenOnesFail() throws Exception {
        List<String> texts = new ArrayList<>();
        texts.add(new String(BuiltinScenarios.bytes("demo").orElseThrow(), StandardCharsets.UTF_8));
        List<Path> files = new ArrayList<>();
        try (Stream<Path> walk = Files.walk(Path.of("examples"))) {
            walk.filter(p -> p.toString().endsWith(".toml")).filter(ScenarioJsonSchemaTest::isScenario).forEach(files::add);
        }
        files.add(Path.of("src", "test", "resources", "integrator.toml"));
        files.add(Path.of("src", "test", "resources", "one-gene-switch.toml"));
        for (Path f : files) {
            texts.add(Files.readString(f, StandardCharsets.UTF_8));
        }
        assertTrue(files.size() >= 4, "examples found: " + files);
        for (int i = 0; i < texts.size(); i++) {
            List<Error> errors = check(texts.get(i));
            assertTrue(errors.isEmpty(), (i == 0 ? "demo" : files.get(i - 1)) + ": " + errors);
        }
        String demo = texts.get(0);
        assertFalse(check(demo.replace("decay = 0.2 ", "decai = 0.2 ")).isEmpty(), "unknown key");
        assertFalse(check(demo.replace("founders = 120", "founders = \"many\"")).isEmpty(), "wrong type");
        assertFalse(check(demo.replace("cycle_cv = 0.15", "cycle_cv = -1.0")).isEmpty(), "out of range");
        assertFalse(check(demo.replace("partition = \"binomial\"", "partition = \"fair\"")).isEmpty(), "not a choice");
    }

    /** Scenario files, not calibration or data files that live beside them. */
    private static boolean isScenario(Path p) {
        try {
            return Toml.parse(Files.readString(p)).contains("tissue");
        } catch (java.io.IOException e) {
            return false;
        }
    }
}
