package org.fatefield.scenarios.format;

/** The TOML value a scenario key takes. */
public enum KeyType {
    /** A number (integer or decimal). */
    NUMBER("number"),
    /** A whole number. */
    INTEGER("integer"),
    /** One of a fixed set of words. */
    CHOICE("text, one of the listed words"),
    /** true or false. */
    BOOLEAN("true or false"),
    /** Free text. */
    TEXT("text"),
    /** A list of names. */
    NAMES("list of names"),
    /** A list of numbers. */
    NUMBERS("list of numbers"),
    /** An inline table from species name to number. */
    SPECIES_NUMBERS("table of species name = number"),
    /** A list of rows, each a list of numbers. */
    MATRIX("list of rows of numbers, like [[0, -1], [-1, 0]]");

    private final String description;

    KeyType(String description) {
        this.description = description;
    }

    /** How the type is described to users. */
    public String description() {
        return description;
    }
}
