package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.fatefield.engine.metrics.FateReach;
import org.fatefield.engine.tissue.WorkEstimate;
import org.fatefield.scenarios.calibration.CalibrationDefinition;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.TextLimits;
import org.fatefield.scenarios.sweep.SweepDefinition;
import org.tomlj.TomlParseResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code fatefield validate}: check scenario files and report every problem at once. */
@Command(name = "validate", mixinStandardHelpOptions = true,
        description = {"Check scenario, sweep and calibration files without running them.",
            "Every problem is reported at once with file, line, key, the value found and what is allowed."
                    + " Sweep files (with [sweep]) and calibration files (with [calibration], their data file"
                    + " included) are read and checked too. Exit code 1 if any file has problems."})
final class ValidateCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "scenario files, or built-in names")
    private List<String> files;

    @Mixin
    private SharedOptions.Settings settings;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        int status = 0;
        for (String file : files) {
            try {
                String kind = kind(file);
                if (kind.equals("sweep")) {
                    SweepDefinition sweep = SweepDefinition.read(Path.of(file));
                    out.printf("%s: valid sweep file (%d points x %d replicates of %s, varying %s)%n", file,
                            sweep.pointValues().size(), sweep.replicates(), sweep.scenarioLabel(), String.join(", ",
                                    sweep.parameters().stream().map(p -> p.key()).toList()));
                    continue;
                }
                if (kind.equals("calibration")) {
                    CalibrationDefinition c = CalibrationDefinition.read(Path.of(file));
                    out.printf("%s: valid calibration file (%d model%s, %d statistic%s, %d particles, at most %d"
                            + " generations)%n", file, c.models().size(), c.models().size() == 1 ? "" : "s",
                            c.data().observations().size(), c.data().observations().size() == 1 ? "" : "s",
                            c.settings().particles(), c.settings().maxGenerations());
                    continue;
                }
                Scenario scenario = ScenarioArgument.load(file, settings.overrides());
                out.printf("%s: valid (%s: %d founders, %.4g h in steps of %.4g h, %d fates)%n", file, scenario.name(),
                        scenario.tissue().growth().initialCells(), scenario.tissue().timing().duration(),
                        scenario.tissue().timing().step(), scenario.tissue().fates().fateCount());
                WorkEstimate estimate = WorkEstimate.of(scenario.tissue());
                out.printf("  expected work: %s%n", estimate.summary());
                for (String m : estimate.impossible()) {
                    out.println("  cannot run: " + m);
                    status = FatefieldCommand.INVALID_INPUT;
                }
                for (String m : estimate.lengthy()) {
                    out.println("  very long (run needs --yes): " + m);
                }
                for (String m : FateReach.unmet(scenario.tissue())) {
                    out.println("  note: " + m);
                }
            } catch (ScenarioException e) {
                err.println(e.getMessage());
                status = FatefieldCommand.INVALID_INPUT;
            }
        }
        out.flush();
        return status;
    }

    /** "sweep" or "calibration" for a readable TOML file with that section, else "scenario". */
    private static String kind(String file) {
        Path path = Path.of(file);
        if (!Files.isRegularFile(path)) {
            return "scenario";
        }
        try {
            String text = new String(TextLimits.read(path, TextLimits.MAX_TOML_BYTES, "a short text"),
                    StandardCharsets.UTF_8);
            // Unreadable or too deeply nested: the scenario reader reports why.
            TomlParseResult toml = TextLimits.parseToml(file, text, new ArrayList<>());
            if (toml == null) {
                return "scenario";
            }
            if (toml.contains("sweep") && !toml.contains("tissue")) {
                return "sweep";
            }
            return toml.contains("calibration") && !toml.contains("tissue") ? "calibration" : "scenario";
        } catch (IOException | RuntimeException e) {
            return "scenario";
        }
    }
}
