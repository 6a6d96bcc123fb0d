package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.commons.rng.UniformRandomProvider;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.format.Key;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.scenarios.format.ScenarioSchema;
import org.fatefield.scenarios.format.Section;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Generated hostile scenarios (property-based testing on a fixed seed): the corpus's base
 * scenario with one key of a single section of the schema set to a generated value of any type
 * and size (NaN, infinities, huge and tiny numbers, negative and zero, text with quotes and
 * escapes, lists, nested lists, inline tables, booleans). Each of the 120 cases must be refused by
 * {@code validate} with a message naming the key (or the work it would take), or be accepted
 * and then run to exit 0, or be refused before it starts (exit 1 with a message); an accepted one
 * whose estimated work is above 2e6 cell-steps or 2e9 field updates is not run here (validate
 * printed the estimate, and the run reports its progress). Never a stack
 * trace, never more than two minutes. The case number and the generated line are in each test's
 * name, so a failure can be replayed by hand.
 */
class GeneratedHostileValuesTest {

    private static final Path BASE = Path.of("src/test/resources/hostile/sweeps/base.toml");
    /** Cases per run; {@code -Dfatefield.fuzz.cases=N} tries more. */
    private static final int CASES = Integer.getInteger("fatefield.fuzz.cases", 120);
    /** The generator's seed; {@code -Dfatefield.fuzz.seed=S} tries other cases. */
    private static final long SEED = Long.getLong("fatefield.fuzz.seed", 20261203L);
    private static final String[] SPECIAL = {"nan", "inf", "-inf", "0", "-0.0", "1e308", "-1e308", "1e-308",
        "4.9e-324", "9223372036854775807", "-9223372036854775808", "1e15", "2", "0.5", "1", "-1"};

    @TempDir
    Path tmp;

    /** One key of the schema: its section and name. */
    private record Target(String section, String key) {
    }

    @TestFactory
    Stream<DynamicTest> anyValueOfAnyKeyEndsInAMessageOrARun() throws IOException {
        List<Target> targets = new ArrayList<>();
        for (Section s : ScenarioSchema.sections()) {
            if (!s.repeated() && List.of("run", "tissue", "division", "circuit", "circuit.kinetics", "morphogen",
                    "fates").contains(s.path())) {
                for (Key k : s.keys()) {
                    if (!k.name().equals("file") && !k.name().equals("profile")) {
                        targets.add(new Target(s.path(), k.name()));
                    }
                }
            }
        }
        String base = Files.readString(BASE, StandardCharsets.UTF_8);
        UniformRandomProvider rng = RandomStreams.of(SEED).stream(0);
        List<DynamicTest> tests = new ArrayList<>();
        for (int c = 0; c < CASES; c++) {
            Target target = targets.get(rng.nextInt(targets.size()));
            String value = value(rng, 0);
            String line = target.section() + "." + target.key() + " = " + value;
            int number = c;
            tests.add(DynamicTest.dynamicTest("case " + c + ": " + (line.length() > 80 ? line.substring(0, 80) + "..."
                    : line), () -> check(number, mutate(base, target, value), target, line)));
        }
        return tests.stream();
    }

    private void check(int number, String scenario, Target target, String what) throws IOException {
        Path dir = tmp.resolve("case-" + number);
        Files.createDirectories(dir);
        Path file = dir.resolve("generated.toml");
        Files.writeString(file, scenario);
        assertTimeoutPreemptively(Duration.ofSeconds(120), () -> {
            HostileInputTest.Outcome validated = HostileInputTest.fatefield("validate", file.toString());
            HostileInputTest.assertNoTrace(validated.text(), what);
            if (validated.code() != 0) {
                assertEquals(FatefieldCommand.INVALID_INPUT, validated.code(), what + "\n" + validated.text());
                assertTrue(validated.text().contains(target.key()) || validated.text().contains("cannot run")
                        || validated.text().contains("circuit:"), what + ": the message names the key\n"
                        + validated.text());
                return;
            }
            WorkEstimate work = WorkEstimate.of(ScenarioReader.read(file).tissue());
            if (work.cellSteps() > 2e6 || work.fieldUpdates() > 2e9) {
                // Valid and long: validate printed the estimate; running it here would only test patience.
                return;
            }
            HostileInputTest.Outcome run = HostileInputTest.fatefield("run", file.toString(), "--out",
                    dir.resolve("out").toString(), "--quiet", "--threads", "1");
            HostileInputTest.assertNoTrace(run.text(), what);
            assertTrue(run.code() == 0 || run.code() == FatefieldCommand.INVALID_INPUT, what + "\n" + run.text());
        }, what + ": did not end within two minutes");
    }

    /** A generated TOML value: a number most often, else text, a list, a nested list, a table or a boolean. */
    private static String value(UniformRandomProvider rng, int depth) {
        int kind = rng.nextInt(depth > 0 ? 3 : 8);
        return switch (kind) {
            case 0 -> SPECIAL[rng.nextInt(SPECIAL.length)];
            case 1 -> Double.toString((rng.nextDouble() - 0.5) * Math.pow(10, rng.nextInt(25) - 12));
            case 2 -> Long.toString(rng.nextLong());
            case 3 -> text(rng);
            case 4, 5 -> list(rng, depth);
            case 6 -> "{ " + List.of("a", "Lum", "x_um").get(rng.nextInt(3)) + " = " + value(rng, depth + 1) + " }";
            default -> rng.nextBoolean() ? "true" : "false";
        };
    }

    private static String list(UniformRandomProvider rng, int depth) {
        List<String> items = new ArrayList<>();
        int n = rng.nextInt(6);
        for (int i = 0; i < n; i++) {
            items.add(depth < 2 && rng.nextInt(4) == 0 ? list(rng, depth + 1) : value(rng, depth + 1));
        }
        return "[" + String.join(", ", items) + "]";
    }

    private static String text(UniformRandomProvider rng) {
        StringBuilder s = new StringBuilder("\"");
        IntStream.range(0, rng.nextInt(30)).forEach(i -> {
            int c = 32 + rng.nextInt(0x250);
            s.append(c == '"' ? "\\\"" : c == '\\' ? "\\\\" : c == 127 ? "x" : String.valueOf((char) c));
        });
        return s.append('"').toString();
    }

    /** {@code base} with {@code target} set to {@code value}: replaced where it is, else added to its section. */
    private static String mutate(String base, Target target, String value) {
        String header = "[" + target.section() + "]";
        int start = base.indexOf("\n" + header + "\n");
        if (start < 0) {
            return base + "\n" + header + "\n" + target.key() + " = " + value + "\n";
        }
        int bodyStart = start + header.length() + 2;
        int next = base.indexOf("\n[", bodyStart);
        int end = next < 0 ? base.length() : next;
        String body = base.substring(bodyStart, end);
        Matcher line = Pattern.compile("(?m)^" + Pattern.quote(target.key()) + " = .*$").matcher(body);
        String replaced = line.find() ? line.replaceFirst(Matcher.quoteReplacement(target.key() + " = " + value))
                : target.key() + " = " + value + "\n" + body;
        return base.substring(0, bodyStart) + replaced + base.substring(end);
    }
}
