package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Command lines a newcomer gets wrong: each ends within a minute with its documented exit code
 * (1 bad input, 2 bad command line, 3 output that cannot be written) and a message, never a
 * stack trace, and nothing is run.
 */
class BadCommandLinesTest {

    @TempDir
    Path tmp;

    private record Case(int code, String line, String mentions) {
    }

    @TestFactory
    Stream<DynamicTest> everyBadCommandLineGetsAMessage() {
        String out = tmp.resolve("out").toString();
        List<Case> cases = List.of(
                new Case(2, "analyze demo --system-size 0 --out " + out, "--system-size"),
                new Case(2, "analyze demo --at NaN --out " + out, "--at"),
                new Case(1, "analyze demo --at 1e308 --out " + out, "--at"),
                new Case(1, "analyze demo --switching-step -1 --out " + out, "--switching-step"),
                new Case(1, "analyze demo --switching-method warp --out " + out, "--switching-method"),
                new Case(1, "analyze demo --arrival 0 --out " + out, "--arrival"),
                new Case(2, "bench --cells 0", "--cells"),
                new Case(2, "bench --cells -5", "--cells"),
                new Case(2, "bench --steps 0", "--steps"),
                new Case(2, "bench --threads 0", "--threads"),
                new Case(2, "run demo --threads 0 --out " + out, "--threads"),
                new Case(2, "run demo --threads 1000 --out " + out, "--threads"),
                new Case(2, "run demo --seed -1 --out " + out, "--seed"),
                new Case(2, "run demo --seed 1e3 --out " + out, "--seed"),
                new Case(2, "run demo --seed 99999999999999999999 --out " + out, "--seed"),
                new Case(1, "run demo --checkpoint-every 0 --out " + out, "--checkpoint-every"),
                new Case(2, "run demo --checkpoint-every nan --out " + out, "--checkpoint-every"),
                new Case(1, "run demo --frames -1 --out " + out, "--frames"),
                new Case(1, "run demo --vtk --out " + out, "--snapshots"),
                new Case(1, "run nosuch.toml --out " + out, "no such scenario file"),
                new Case(2, "run", "SCENARIO"),
                new Case(1, "replicates demo --runs 1 --out " + out, "--runs"),
                new Case(1, "replicates demo --runs -3 --out " + out, "--runs"),
                new Case(2, "robustness demo --fraction 5 --out " + out, "--fraction"),
                new Case(2, "robustness demo --fraction -0.1 --out " + out, "--fraction"),
                new Case(3, "sweep run " + tmp.resolve("nosuch"), "manifest.csv"),
                new Case(2, "sweep run --workers 0 nosuch", "--workers"),
                new Case(3, "sweep collect " + tmp.resolve("nosuch"), "manifest.csv"),
                new Case(3, "report " + tmp.resolve("nosuch"), "run folder"),
                new Case(2, "validate", "FILE"),
                new Case(2, "frobnicate", "Did you mean"),
                new Case(3, "run demo --out /proc/fatefield-cannot-write-here", "/proc/fatefield-cannot-write-here:"),
                new Case(2, "scenario-help extra", "extra"),
                new Case(2, "run demo --dpi 5 --out " + out, "--dpi"),
                new Case(2, "analyze demo --figure-size 10x --out " + out, "WIDTHxHEIGHT"),
                new Case(2, "analyze demo --figure-size 100000x300 --out " + out, "--figure-size"),
                new Case(1, "calibrate " + tmp.resolve("nosuch.toml") + " --out " + out, "cannot read"),
                new Case(2, "calibrate nosuch.toml --workers 0 --out " + out, "--workers"),
                new Case(2, "calibrate nosuch.toml --slurm --slurm-time soon --out " + out, "--slurm-time"),
                new Case(2, "calibrate nosuch.toml", "--out"),
                new Case(2, "calibrate nosuch.toml --slurm-container fatefield:1 --out " + out, "need --slurm"),
                new Case(2, "calibrate nosuch.toml --slurm --slurm-container a;b --out " + out,
                        "--slurm-container must be an image reference"),
                new Case(2, "sweep slurm nosuch --container-runtime podman", "--container-runtime needs --container"),
                new Case(2, "sweep slurm nosuch --container x:1 --container-runtime lxc", "podman, docker, apptainer"),
                new Case(2, "sweep slurm nosuch --time soon", "--time must look like HH:MM:SS"),
                new Case(2, "run demo --set morphogen.decay --out " + out, "KEY=VALUE"),
                new Case(1, "run demo --set morphogen.decai=0.3 --out " + out, "did you mean 'decay'"),
                new Case(1, "analyze demo --set morphogen.decay=-1 --out " + out, "morphogen.decay"));
        return cases.stream().map(c -> DynamicTest.dynamicTest(c.line(), () -> assertTimeoutPreemptively(
                Duration.ofSeconds(60), () -> {
                    HostileInputTest.Outcome outcome = HostileInputTest.fatefield(c.line().split(" "));
                    HostileInputTest.assertNoTrace(outcome.text(), c.line());
                    assertEquals(c.code(), outcome.code(), c.line() + "\n" + outcome.text());
                    assertTrue(outcome.text().contains(c.mentions()), c.line() + " mentions " + c.mentions() + "\n"
                            + outcome.text());
                })));
    }
}
