package org.fatefield.scenarios.format;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

/**
 * The scenario format as a JSON Schema (draft 2020-12), generated from {@link ScenarioSchema},
 * the same table that drives validation and {@code scenario-help}, so editors with TOML support
 * (which read JSON Schemas for TOML files) can complete section and key names, show each key's
 * unit, default and meaning, and flag unknown keys, wrong types and out-of-range numbers.
 *
 * <p>It is an editing aid, looser than {@code fatefield validate}: it checks each value on its
 * own, not the rules between values (a fate rule naming a species the circuit lacks, say), and
 * marks required only the sections that are always required.
 */
public final class ScenarioJsonSchema {

    private ScenarioJsonSchema() {
    }

    /** The schema as pretty-printed JSON, with a final newline. */
    public static String text() {
        return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(schema()) + "\n";
    }

    /** The schema. */
    public static JsonObject schema() {
        JsonObject root = new JsonObject();
        root.addProperty("$schema", "https://json-schema.org/draft/2020-12/schema");
        root.addProperty("title", "Fatefield scenario");
        root.addProperty("description", "A Fatefield scenario file (TOML). Generated from the scenario schema that"
                + " drives validation; see fatefield scenario-help.");
        root.addProperty("type", "object");
        root.add("properties", new JsonObject());
        root.add("required", new JsonArray());
        root.addProperty("additionalProperties", false);
        for (Section section : ScenarioSchema.sections()) {
            place(root, section);
        }
        return root;
    }

    /** Puts {@code section} under its parent section's object schema (the root for a top-level one). */
    private static void place(JsonObject root, Section section) {
        String[] parts = section.path().split("\\.");
        JsonObject parent = root;
        for (int i = 0; i < parts.length - 1; i++) {
            JsonObject child = parent.getAsJsonObject("properties").getAsJsonObject(parts[i]);
            parent = child.has("items") ? child.getAsJsonObject("items") : child;
        }
        JsonObject table = table(section);
        String name = parts[parts.length - 1];
        if (section.repeated()) {
            JsonObject array = new JsonObject();
            array.addProperty("type", "array");
            array.addProperty("description", section.description());
            array.add("items", table);
            parent.getAsJsonObject("properties").add(name, array);
        } else {
            parent.getAsJsonObject("properties").add(name, table);
        }
        if (section.required()) {
            parent.getAsJsonArray("required").add(name);
        }
    }

    private static JsonObject table(Section section) {
        JsonObject table = new JsonObject();
        table.addProperty("type", "object");
        table.addProperty("description", section.description());
        JsonObject properties = new JsonObject();
        for (Key key : section.keys()) {
            properties.add(key.name(), value(key));
        }
        table.add("properties", properties);
        table.add("required", new JsonArray());
        if (section.open()) {
            JsonObject number = new JsonObject();
            number.addProperty("type", "number");
            table.add("additionalProperties", number);
        } else if (section.path().equals("circuit.kinetics")) {
            // [circuit.kinetics.<gene>]: one gene's own values of the same keys.
            JsonObject gene = new JsonObject();
            gene.addProperty("type", "object");
            gene.addProperty("description", "kinetics of one gene, overriding the shared values");
            gene.add("properties", properties.deepCopy());
            gene.addProperty("additionalProperties", false);
            table.add("additionalProperties", gene);
        } else {
            table.addProperty("additionalProperties", false);
        }
        return table;
    }

    private static JsonObject value(Key key) {
        JsonObject v = new JsonObject();
        switch (key.type()) {
            case NUMBER, INTEGER -> {
                v.addProperty("type", key.type() == KeyType.INTEGER ? "integer" : "number");
                if (!Double.isNaN(key.min())) {
                    v.addProperty(key.minExclusive() ? "exclusiveMinimum" : "minimum", key.min());
                }
                if (!Double.isNaN(key.max())) {
                    v.addProperty("maximum", key.max());
                }
            }
            case CHOICE -> {
                JsonArray words = new JsonArray();
                key.choices().forEach(words::add);
                v.add("enum", words);
            }
            case BOOLEAN -> v.addProperty("type", "boolean");
            case TEXT -> v.addProperty("type", "string");
            case NAMES -> array(v, "string");
            case NUMBERS -> array(v, "number");
            case SPECIES_NUMBERS -> {
                v.addProperty("type", "object");
                JsonObject number = new JsonObject();
                number.addProperty("type", "number");
                v.add("additionalProperties", number);
            }
            case MATRIX -> {
                v.addProperty("type", "array");
                JsonObject row = new JsonObject();
                array(row, "number");
                v.add("items", row);
            }
            default -> throw new IllegalStateException("no JSON Schema for key type " + key.type());
        }
        StringBuilder description = new StringBuilder(key.description());
        if (!key.unit().isEmpty()) {
            description.append(" [").append(key.unit()).append(']');
        }
        description.append(key.required() ? " (required)" : " (default " + key.defaultValue() + ")");
        v.addProperty("description", description.toString());
        return v;
    }

    private static void array(JsonObject v, String itemType) {
        v.addProperty("type", "array");
        JsonObject item = new JsonObject();
        item.addProperty("type", itemType);
        v.add("items", item);
    }
}
