package org.fatefield.scenarios.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.fatefield.scenarios.calibration.CalibrationDefinition;
import org.fatefield.scenarios.calibration.CalibrationModel;
import org.fatefield.scenarios.calibration.CalibrationParameter;
import org.fatefield.scenarios.calibration.Observation;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.output.RunTables;
import org.fatefield.scenarios.sweep.Manifest;
import org.fatefield.scenarios.sweep.SweepRunner;

/**
 * What {@code --verbose} prints before a batch of tissues runs: for {@code sweep run}, the shard
 * and the first run still to do, resolved as {@link RunPlan} resolves a single run; for
 * {@code calibrate}, the inference settings, each model's priors, the data and the base
 * scenario's plan.
 */
final class BatchPlan {

    private BatchPlan() {
    }

    /** The plan of a sweep shard: {@code runs} of the manifest, {@code workers} at once. */
    static void printSweep(SweepRunner runner, List<Manifest.Run> runs, int[] shard, int workers, PrintWriter out) {
        List<Manifest.Run> todo = runs.stream().filter(r -> !runner.valid(r)).toList();
        out.printf(Locale.ROOT, "sweep: shard %d/%d holds %d of the manifest's %d runs, %d already done; %d at once,"
                + " one thread each%n", shard[0], shard[1], runs.size(), runner.manifest().runs().size(),
                runs.size() - todo.size(), workers);
        out.printf(Locale.ROOT, "varied keys: %s%n", String.join(", ", runner.manifest().keys()));
        if (todo.isEmpty()) {
            out.println("nothing to run: every run of this shard has a valid result");
            out.flush();
            return;
        }
        Manifest.Run first = todo.get(0);
        out.printf(Locale.ROOT, "first run to do: %s (point %d, replicate %d)%n", first.id(), first.point(),
                first.replicate());
        try {
            RunPlan.print(runner.scenarioOf(first), first.seed(), 1, out);
        } catch (ScenarioException e) {
            out.println("its scenario does not validate (the run will fail and say why): " + e.getMessage());
        }
        out.flush();
    }

    /** The plan of a calibration: settings, models and priors, data, and the first model's scenario. */
    static void printCalibration(CalibrationDefinition definition, PrintWriter out) {
        var settings = definition.settings();
        out.printf(Locale.ROOT, "calibration: %d particles, batches of %d, at most %d generations, tolerance quantile"
                + " %s, stop below acceptance %s%s; %d tissue%s per particle, %d predictive tissues per model; seed"
                + " %d%n", settings.particles(), settings.batch(), settings.maxGenerations(), n(settings.quantile()),
                n(settings.minAcceptance()), settings.targetTolerance() > 0 ? " or at tolerance "
                        + n(settings.targetTolerance()) : "", definition.replicates(),
                definition.replicates() == 1 ? "" : "s", definition.predictive(), settings.seed());
        for (CalibrationModel model : definition.models()) {
            out.printf(Locale.ROOT, "model %s (scenario %s):%n", model.name(), model.scenarioLabel());
            for (CalibrationParameter p : model.parameters()) {
                out.printf(Locale.ROOT, "  %s ~ %s%n", p.key(), p.prior().describe());
            }
        }
        out.printf(Locale.ROOT, "data %s: %d statistics%n", definition.data().label(),
                definition.data().observations().size());
        for (Observation o : definition.data().observations()) {
            out.printf(Locale.ROOT, "  %s = %s +- %s %s%n", o.name(), n(o.value()), n(o.sd()),
                    o.unit() == null ? "" : o.unit());
        }
        CalibrationModel first = definition.models().get(0);
        out.printf(Locale.ROOT, "base scenario of model %s, before its parameters are drawn:%n", first.name());
        RunPlan.print(first.base(), settings.seed(), 1, out);
    }

    private static String n(double v) {
        return RunTables.number(v);
    }
}
