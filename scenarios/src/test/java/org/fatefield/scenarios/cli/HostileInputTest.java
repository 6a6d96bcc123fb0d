package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * The corpus of hostile inputs kept in {@code src/test/resources/hostile}: scenario files and
 * sweep files that each try one way to break a run (values of the wrong type, out of range, or
 * absurd; parser bombs; path escapes; devices that never end; rate laws that divide by zero).
 * Each file's second line says what must happen, and it must happen within a time limit with a
 * message, never a stack trace:
 * <ul>
 * <li>{@code invalid KEY [line N]}: {@code validate} (or {@code sweep plan}) exits 1 and names
 *     the key ({@code -} for a file that is not TOML) and, where given, the line;</li>
 * <li>{@code refused KEY}: {@code validate} refuses the work the scenario asks for, naming what
 *     to change;</li>
 * <li>{@code needs-yes}: valid, but {@code run} starts only with {@code --yes};</li>
 * <li>{@code runs}: valid, and {@code run} finishes with exit 0.</li>
 * </ul>
 * A summary of the counts is written to {@code target/hostile-summary.txt}.
 */
class HostileInputTest {

    private static final Path CORPUS = Path.of("src/test/resources/hostile");
    private static final Map<String, AtomicInteger> COUNTS = new TreeMap<>();

    @TempDir
    static Path tmp;

    record Outcome(int code, String text) {
    }

    static Outcome fatefield(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = FatefieldCommand.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out + "\n" + err);
    }

    /** Fails if {@code text} shows a Java stack trace or exception instead of a message. */
    static void assertNoTrace(String text, String what) {
        for (String sign : List.of("\tat ", "Exception", "StackOverflow", "OutOfMemory", "NullPointer")) {
            assertFalse(text.contains(sign), what + ": a stack trace or exception reached the user:\n" + text);
        }
    }

    @TestFactory
    Stream<DynamicTest> everyScenarioInTheCorpus() throws IOException {
        return cases("scenarios").map(file -> DynamicTest.dynamicTest(file.getFileName().toString(),
                () -> assertTimeoutPreemptively(Duration.ofSeconds(120), () -> scenario(file))));
    }

    @TestFactory
    Stream<DynamicTest> everySweepFileInTheCorpus() throws IOException {
        return cases("sweeps").filter(f -> !f.getFileName().toString().equals("base.toml"))
                .map(file -> DynamicTest.dynamicTest(file.getFileName().toString(),
                        () -> assertTimeoutPreemptively(Duration.ofSeconds(60), () -> sweep(file))));
    }

    private static Stream<Path> cases(String kind) throws IOException {
        try (Stream<Path> files = Files.list(CORPUS.resolve(kind))) {
            return files.filter(f -> f.toString().endsWith(".toml")).sorted().toList().stream();
        }
    }

    private static String[] expectation(Path file) throws IOException {
        String text = new String(Files.readAllBytes(file), StandardCharsets.ISO_8859_1);
        String second = text.split("\n", 3)[1];
        assertTrue(second.startsWith("# expect: "), file + " states what must happen on its second line");
        return second.substring("# expect: ".length()).trim().split(" ");
    }

    private static void scenario(Path file) throws IOException {
        String[] expect = expectation(file);
        String name = file.getFileName().toString();
        Outcome validated = fatefield("validate", file.toString());
        assertNoTrace(validated.text(), name);
        switch (expect[0]) {
            case "invalid" -> invalid(name, expect, validated);
            case "refused" -> {
                assertEquals(FatefieldCommand.INVALID_INPUT, validated.code(), validated.text());
                assertTrue(validated.text().contains("cannot run") && validated.text().contains(expect[1]),
                        name + " is refused, naming " + expect[1] + ":\n" + validated.text());
            }
            case "needs-yes" -> {
                assertEquals(0, validated.code(), validated.text());
                Outcome run = fatefield("run", file.toString(), "--out", tmp.resolve(name).toString(), "--quiet");
                assertNoTrace(run.text(), name);
                assertEquals(FatefieldCommand.INVALID_INPUT, run.code(), run.text());
                assertTrue(run.text().contains("--yes"), run.text());
                assertFalse(Files.exists(tmp.resolve(name).resolve("run.json")), "nothing was run");
            }
            case "runs" -> {
                assertEquals(0, validated.code(), validated.text());
                Path out = tmp.resolve(name);
                Outcome run = fatefield("run", file.toString(), "--out", out.toString(), "--quiet", "--threads", "1");
                assertNoTrace(run.text(), name);
                assertEquals(0, run.code(), run.text());
                assertTrue(Files.exists(out.resolve("run.json")), "a finished run");
            }
            default -> throw new AssertionError(name + ": unknown expectation " + String.join(" ", expect));
        }
        count("scenario: " + expect[0]);
    }

    private static void sweep(Path file) throws IOException {
        String[] expect = expectation(file);
        String name = file.getFileName().toString();
        Outcome planned = fatefield("sweep", "plan", file.toString(), "--out", tmp.resolve("plan-" + name).toString());
        assertNoTrace(planned.text(), name);
        assertEquals("invalid", expect[0], name + ": every hostile sweep file is refused");
        invalid(name, expect, planned);
        count("sweep: invalid");
    }

    private static void invalid(String name, String[] expect, Outcome outcome) {
        assertEquals(FatefieldCommand.INVALID_INPUT, outcome.code(), outcome.text());
        if (!expect[1].equals("-")) {
            assertTrue(outcome.text().contains(expect[1]), name + " names " + expect[1] + ":\n" + outcome.text());
        }
        if (expect.length > 3 && expect[2].equals("line")) {
            assertTrue(outcome.text().contains(name + ":" + expect[3] + ":")
                    || outcome.text().contains(name + ":" + expect[3] + " "),
                    name + " names line " + expect[3] + ":\n" + outcome.text());
        }
    }

    private static synchronized void count(String what) {
        COUNTS.computeIfAbsent(what, k -> new AtomicInteger()).incrementAndGet();
    }

    @AfterAll
    static void writeSummary() throws IOException {
        List<String> lines = new ArrayList<>();
        int total = 0;
        for (Map.Entry<String, AtomicInteger> e : COUNTS.entrySet()) {
            lines.add(e.getKey() + ": " + e.getValue().get());
            total += e.getValue().get();
        }
        lines.add("cases passed: " + total + " (crashes and hangs fail the test)");
        Files.createDirectories(Path.of("target"));
        Files.write(Path.of("target", "hostile-summary.txt"), lines);
    }
}
