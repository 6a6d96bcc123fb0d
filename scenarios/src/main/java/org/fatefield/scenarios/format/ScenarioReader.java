package org.fatefield.scenarios.format;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * Reads a scenario file into a {@link Scenario}, reporting every problem at once.
 *
 * <p>A scenario file is untrusted: it is parsed as TOML data and checked against
 * {@link ScenarioSchema}; nothing in it is ever executed.
 */
public final class ScenarioReader {

    private ScenarioReader() {
    }

    /** Reads and validates the file at {@code path}. */
    public static Scenario read(Path path) throws ScenarioException {
        return read(path, Overrides.none());
    }

    /** Reads and validates the file at {@code path} with {@code overrides} laid over it. */
    public static Scenario read(Path path, Overrides overrides) throws ScenarioException {
        byte[] bytes;
        try {
            bytes = TextLimits.read(path, TextLimits.MAX_TOML_BYTES, "a scenario file is a short text");
        } catch (IOException e) {
            throw new ScenarioException(List.of(new Problem(path.toString(), 0, 0, "", null,
                    "cannot read the file: " + TextLimits.describe(e))));
        }
        String fallbackName = path.getFileName().toString().replaceFirst("\\.toml$", "");
        Path folder = path.toAbsolutePath().getParent();
        return parse(path.toString(), fallbackName, bytes, folder, overrides);
    }

    /** Validates scenario text that cannot include a circuit file (no folder to find it in). */
    public static Scenario parse(String label, String fallbackName, byte[] bytes) throws ScenarioException {
        return parse(label, fallbackName, bytes, null);
    }

    /**
     * Validates scenario text.
     *
     * @param label        how the file is named in messages and provenance
     * @param fallbackName scenario name when the file gives none
     * @param bytes        the file's UTF-8 bytes
     * @param folder       folder a {@code circuit.file} is looked up in, or null if none may be included
     */
    public static Scenario parse(String label, String fallbackName, byte[] bytes, Path folder) throws ScenarioException {
        return parse(label, fallbackName, bytes, folder, Overrides.none());
    }

    /**
     * Validates scenario text with {@code overrides} laid over its parsed tree: the overridden
     * values are checked and compiled exactly as the file's own (a sweep point, a robustness
     * perturbation, live settings). Overrides of {@code circuit.*} keys go to the included
     * circuit file when the scenario names one.
     */
    public static Scenario parse(String label, String fallbackName, byte[] bytes, Path folder, Overrides overrides)
            throws ScenarioException {
        String text = new String(bytes, StandardCharsets.UTF_8);
        ScenarioChecker checker = new ScenarioChecker(label);
        TomlParseResult parsed = checker.parse(text);
        List<Problem> problems = new ArrayList<>(checker.problems());
        if (parsed == null) {
            throw new ScenarioException(sorted(problems));
        }
        boolean included = parsed.contains("circuit.file");
        Overrides own = included ? overrides.matching(path -> !CircuitDocument.belongsToCircuitFile(path)) : overrides;
        List<String> missing = new ArrayList<>();
        TomlTable toml = checker.check(own.applyTo(parsed, missing));
        problems.addAll(checker.problems());
        missing.forEach(m -> problems.add(new Problem(label, 0, 0, "", null, m)));
        CircuitDocument circuit = new CircuitDocument(label, toml, checker, bytes);
        if (checker.circuitIncluded() && problems.isEmpty()) {
            Overrides forFile = Overrides.none();
            if (CircuitDocument.isSbml(toml.getString("circuit.file"))) {
                // How to simulate an SBML circuit is said in the scenario; it goes onto the circuit read from SBML.
                for (String key : CircuitDocument.SBML_SETTINGS) {
                    if (toml.contains("circuit." + key)) {
                        forFile = forFile.with("circuit." + key, toml.get("circuit." + key));
                    }
                }
            }
            circuit = CircuitDocument.include(label, toml, folder, problems,
                    forFile.and(overrides.matching(CircuitDocument::belongsToCircuitFile)));
            if (circuit == null) {
                throw new ScenarioException(sorted(problems));
            }
        }
        byte[] provenance = circuit.bytes() == bytes ? bytes : concat(bytes, circuit.bytes());
        if (!overrides.isEmpty()) {
            provenance = concat(provenance, ("\n# overrides\n" + String.join("\n", overrides.describe()))
                    .getBytes(StandardCharsets.UTF_8));
        }
        ScenarioCompiler compiler = new ScenarioCompiler(label, toml, checker, circuit, folder);
        Scenario scenario = null;
        try {
            scenario = compiler.compile(fallbackName, sha256(provenance), text, overrides.describe());
        } catch (RuntimeException e) {
            if (problems.isEmpty()) {
                throw e;
            }
        }
        Set<String> reported = new HashSet<>();
        problems.forEach(p -> reported.add(p.keyPath()));
        for (Problem p : compiler.problems()) {
            if (reported.add(p.keyPath())) {
                problems.add(p);
            }
        }
        if (!problems.isEmpty() || scenario == null) {
            throw new ScenarioException(sorted(problems));
        }
        if (checker.circuitIncluded()) {
            scenario = scenario.withIncludes(Map.of(toml.getString("circuit.file"),
                    new String(circuit.bytes(), StandardCharsets.UTF_8)));
        }
        return scenario;
    }

    /** Problems in file order; absences (line 0) last. */
    private static List<Problem> sorted(List<Problem> problems) {
        List<Problem> copy = new ArrayList<>(problems);
        copy.sort((a, b) -> a.line() != b.line() ? Integer.compare(lineKey(a), lineKey(b))
                : Integer.compare(a.column(), b.column()));
        return copy;
    }

    private static int lineKey(Problem p) {
        return p.line() == 0 ? Integer.MAX_VALUE : p.line();
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
