package org.fatefield.scenarios.cli;

import java.awt.GraphicsEnvironment;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.DoubleFunction;
import javax.swing.SwingUtilities;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.StationaryFokkerPlanck;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.EquilibriumContinuation;
import org.fatefield.circuits.analysis.continuation.NetworkSystem;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;
import org.fatefield.scenarios.format.ScenarioException;
import org.fatefield.scenarios.format.ScenarioReader;
import org.fatefield.scenarios.sweep.ScenarioOverrides;
import org.fatefield.viz.live.TissueWindow;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code fatefield view}: watch a scenario's tissue live. */
@Command(name = "view", mixinStandardHelpOptions = true,
        description = {"Open a window that runs a scenario live: the tissue over its morphogen, fate proportions,"
                + " and every cell on the circuit's bifurcation branches. Colour cells by fate, by the first"
                + " species, by clone or by commitment (pale: fate only just entered). Click a cell to see its"
                + " state, its circuit trace back through its ancestors, and the circuit's landscape at its"
                + " local control parameter. Change settings (key = value; ...) and press Reset to run again."})
final class ViewCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "a scenario file, or a built-in name (demo)")
    private String scenario;

    @Option(names = "--seed", paramLabel = "N", description = "random seed (default: the scenario's)")
    private Long seed;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        if (GraphicsEnvironment.isHeadless()) {
            spec.commandLine().getErr().println("view needs a display; on a cluster use: fatefield run SCENARIO --frames"
                    + " HOURS (PNG frames and an animated GIF)");
            return FatefieldCommand.INVALID_INPUT;
        }
        Scenario loaded = ScenarioArgument.loadOrReport(scenario, spec.commandLine().getErr());
        if (loaded == null) {
            return FatefieldCommand.INVALID_INPUT;
        }
        TissueWindow window = open(loaded, seed != null ? seed : loaded.seed());
        SwingUtilities.invokeLater(() -> window.setVisible(true));
        return 0;
    }

    private static final int LANDSCAPE_BINS = 60;

    /** A window for {@code loaded} (not yet visible). */
    static TissueWindow open(Scenario loaded, long runSeed) {
        int threads = Runtime.getRuntime().availableProcessors();
        List<Branch> branches = branches(loaded);
        String parameter = loaded.tissue().mapping().couplings().isEmpty() ? "control"
                : loaded.tissue().mapping().couplings().get(0).label();
        return new TissueWindow("Fatefield: " + loaded.name(), settings -> new Tissue(variant(loaded, settings).tissue(),
                runSeed, threads), branches, parameter, landscape(loaded, branches));
    }

    /**
     * The circuit's stationary landscape at a value of the control parameter, solved on a grid
     * (exact relative well depths), for two-species circuits with a coupling; null otherwise.
     */
    private static DoubleFunction<QuasiPotential> landscape(Scenario loaded, List<Branch> branches) {
        var circuit = loaded.tissue().circuit();
        if (circuit.network().speciesCount() != 2 || loaded.tissue().mapping().couplings().isEmpty()) {
            return null;
        }
        double[] upper = {0, 0};
        for (Branch b : branches) {
            for (var p : b.points()) {
                upper[0] = Math.max(upper[0], 1.3 * p.state()[0]);
                upper[1] = Math.max(upper[1], 1.3 * p.state()[1]);
            }
        }
        for (int i = 0; i < 2; i++) {
            upper[i] = Math.max(upper[i], 2 * circuit.initialState()[i] + 1e-3);
        }
        int[] indices = loaded.tissue().mapping().couplings().get(0).parameterIndices();
        double[] base = loaded.tissue().mapping().base();
        return value -> {
            double[] params = base.clone();
            for (int index : indices) {
                params[index] = value;
            }
            return StationaryFokkerPlanck.solve(circuit.network(), params, circuit.systemSize(), 0, 1,
                    new double[2], upper, LANDSCAPE_BINS);
        };
    }

    private static Scenario variant(Scenario base, String settings) {
        if (settings == null || settings.isBlank()) {
            return base;
        }
        ScenarioOverrides variant = ScenarioOverrides.of(base.text());
        for (String item : settings.split(";")) {
            if (item.isBlank()) {
                continue;
            }
            String[] kv = item.split("=");
            if (kv.length != 2) {
                throw new IllegalArgumentException("write settings as key = value; key = value, got '" + item.trim() + "'");
            }
            try {
                variant = variant.with(kv[0].trim(), Double.parseDouble(kv[1].trim()));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("'" + kv[1].trim() + "' is not a number", e);
            }
        }
        try {
            return ScenarioReader.parse("settings", base.name(), variant.toToml().getBytes(StandardCharsets.UTF_8));
        } catch (ScenarioException e) {
            throw new IllegalArgumentException(e.problems().get(0).keyPath() + ": " + e.problems().get(0).message(), e);
        }
    }

    private static List<Branch> branches(Scenario loaded) {
        if (loaded.tissue().mapping().couplings().isEmpty()) {
            return List.of();
        }
        SignalCoupling c = loaded.tissue().mapping().couplings().get(0);
        double lo = c.table() != null ? c.table().minimum() : Math.min(c.base(), c.base() + c.gain());
        double hi = c.table() != null ? c.table().maximum() : Math.max(c.base(), c.base() + c.gain());
        if (!(hi > lo)) {
            return List.of();
        }
        NetworkSystem system = new NetworkSystem(loaded.tissue().circuit().network(), loaded.tissue().mapping().base(),
                c.parameterIndices());
        return EquilibriumContinuation.of(system, ContinuationSettings.defaults().withMaxStep((hi - lo) / 60))
                .diagram(loaded.tissue().circuit().initialState(), lo, lo, hi, true, 2);
    }
}
