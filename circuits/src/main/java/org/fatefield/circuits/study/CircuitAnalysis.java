package org.fatefield.circuits.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import org.fatefield.circuits.analysis.BasinMap;
import org.fatefield.circuits.analysis.QuasiPotential;
import org.fatefield.circuits.analysis.StationaryFokkerPlanck;
import org.fatefield.circuits.analysis.SteadyState;
import org.fatefield.circuits.analysis.SteadyStateFinder;
import org.fatefield.circuits.analysis.Switching;
import org.fatefield.circuits.analysis.SwitchingSettings;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.BranchPoint;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.EquilibriumContinuation;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldCurve;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation.FoldPoint;
import org.fatefield.circuits.analysis.continuation.FoldCurveContinuation;
import org.fatefield.circuits.analysis.continuation.NetworkSystem;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPointType;
import org.fatefield.circuits.analysis.continuation.TwoParameterSystem;
import org.fatefield.circuits.model.ReactionNetwork;

/** Runs the single-cell analyses of {@code fatefield analyze} on one circuit. */
public final class CircuitAnalysis {

    private static final int GRID = 41;
    private static final int COMMITMENT_GRID = 11;
    private static final int LANDSCAPE_SLICES = 16;
    /** Points closer than this to a traced branch's polyline lie on it (chords of curved branches stray a little). */
    private static final double SAME_BRANCH = 5e-3;

    private final ReactionNetwork network;
    private final double[] base;
    private final AnalysisPlan plan;
    private final double[] lower;
    private final double[] upper;

    /**
     * @param network the circuit
     * @param base    its parameters (the plan's parameter is overwritten as needed)
     */
    public CircuitAnalysis(ReactionNetwork network, double[] base, AnalysisPlan plan) {
        this.network = network;
        this.base = base.clone();
        this.plan = plan;
        this.lower = new double[network.speciesCount()];
        this.upper = boxUpper();
    }

    /** The box of concentrations every analysis searches. */
    public double[] upperCorner() {
        return upper.clone();
    }

    /** The parameters with the plan's parameter at {@code value}. */
    public double[] parametersAt(double value) {
        double[] p = base.clone();
        for (int i : plan.indices()) {
            p[i] = value;
        }
        return p;
    }

    /** Runs everything. */
    public AnalysisResult run() {
        return run(stage -> { });
    }

    /**
     * Runs everything, telling {@code progress} the name of each stage as it begins (steady
     * states, continuation, ..., commitment), so a long analysis is not silent.
     */
    public AnalysisResult run(Consumer<String> progress) {
        progress.accept("steady states");
        double[] p = parametersAt(plan.at());
        List<SteadyState> states = SteadyStateFinder.of(network).find(p, lower, upper);
        List<SteadyState> stable = states.stream().filter(SteadyState::isStable).toList();
        double[] sizes = {plan.systemSize() / 8, plan.systemSize() / 4, plan.systemSize() / 2, plan.systemSize()};
        if (stable.size() >= 2) {
            // Refuse bad switching settings before any long computation.
            int from = plan.switching().fromIndex(stable.size());
            plan.switching().toIndex(stable.size());
            requireAffordable(p, stable.get(from).state(), sizes);
        }
        progress.accept("continuation along " + plan.parameter());
        List<Branch> branches = diagram();
        if (plan.hasSecond()) {
            progress.accept("fold curves in the plane of " + plan.parameter() + " and " + plan.second());
        }
        List<FoldCurve> folds = plan.hasSecond() ? foldCurves(branches) : List.of();
        List<Switching.FirstPassage> passages = new ArrayList<>();
        if (!plan.hasPlane()) {
            // One species: no state plane for basins, landscapes and commitment maps.
            if (stable.size() >= 2) {
                progress.accept(switchingStage());
                passages = passages(p, stable, sizes);
            }
            return new AnalysisResult(states, branches, folds, null, null, List.of(), new double[0], passages, sizes,
                    new double[0][0]);
        }
        double[] corner = {upper[plan.xSpecies()], upper[plan.ySpecies()]};
        progress.accept("basins of attraction");
        BasinMap basins = BasinMap.compute(network, p, new double[network.speciesCount()], stable, plan.xSpecies(),
                plan.ySpecies(), new double[2], corner, GRID);
        double[] start = stable.isEmpty() ? states.get(0).state() : stable.get(0).state();
        progress.accept("landscape, and along " + plan.parameter() + " (" + LANDSCAPE_SLICES + " values)");
        QuasiPotential landscape = landscape(p, stable.isEmpty() ? List.of(start)
                : stable.stream().map(SteadyState::state).toList(), corner, plan.seed());
        double[] values = new double[LANDSCAPE_SLICES];
        List<QuasiPotential> slices = new ArrayList<>();
        for (int k = 0; k < LANDSCAPE_SLICES; k++) {
            values[k] = plan.min() + (plan.max() - plan.min()) * k / (LANDSCAPE_SLICES - 1);
            double[] pk = parametersAt(values[k]);
            List<double[]> wells = SteadyStateFinder.of(network).withStartsPerAxis(12).find(pk, lower, upper).stream()
                    .filter(SteadyState::isStable).map(SteadyState::state).toList();
            slices.add(landscape(pk, wells.isEmpty() ? List.of(start) : wells, corner, plan.seed() + k).marginalX());
        }
        double[][] commitment = new double[0][0];
        if (stable.size() >= 2) {
            SwitchingSettings switching = plan.switching();
            double[] a = stable.get(switching.fromIndex(stable.size())).state();
            double[] b = stable.get(switching.toIndex(stable.size())).state();
            double radius = switching.arrivalFraction() * distance(a, b);
            progress.accept(switchingStage());
            passages = passages(p, stable, sizes);
            progress.accept("commitment probabilities (" + COMMITMENT_GRID * COMMITMENT_GRID + " starts)");
            commitment = new double[COMMITMENT_GRID][COMMITMENT_GRID];
            for (int j = 0; j < COMMITMENT_GRID; j++) {
                for (int i = 0; i < COMMITMENT_GRID; i++) {
                    double[] x = new double[network.speciesCount()];
                    x[plan.xSpecies()] = corner[0] * i / (COMMITMENT_GRID - 1);
                    x[plan.ySpecies()] = corner[1] * j / (COMMITMENT_GRID - 1);
                    commitment[j][i] = Switching.commitment(network, p, plan.systemSize(), x, b, a, radius,
                            plan.trajectories(), switching, plan.seed() + j * COMMITMENT_GRID + i);
                }
            }
        }
        return new AnalysisResult(states, branches, folds, basins, landscape, slices, values, passages, sizes,
                commitment);
    }

    private String switchingStage() {
        return "switching times (" + plan.switching().method().word() + ", " + plan.trajectories()
                + " trajectories at 4 system sizes)";
    }

    /** Mean first-passage times between the plan's two stable states, at each system size. */
    private List<Switching.FirstPassage> passages(double[] p, List<SteadyState> stable, double[] sizes) {
        SwitchingSettings switching = plan.switching();
        double[] a = stable.get(switching.fromIndex(stable.size())).state();
        double[] b = stable.get(switching.toIndex(stable.size())).state();
        double radius = switching.arrivalFraction() * distance(a, b);
        List<Switching.FirstPassage> passages = new ArrayList<>();
        for (double omega : sizes) {
            passages.add(Switching.meanFirstPassage(network, p, omega, a, b, radius, plan.trajectories(), switching,
                    plan.seed()));
        }
        return passages;
    }

    /** Most reactions the exact method may fire for the first-passage estimates before it is refused. */
    static final double EXACT_EVENT_LIMIT = 2e9;

    /**
     * Refuses an exact-method switching estimate that would not finish: the reactions it could
     * fire (total propensity at the start state times the time limit, every trajectory, every
     * system size) must stay under {@link #EXACT_EVENT_LIMIT}.
     */
    private void requireAffordable(double[] p, double[] from, double[] sizes) {
        if (plan.switching().method() != SwitchingSettings.Method.EXACT) {
            return;
        }
        double total = network.totalRate(from, p);
        double events = 0;
        for (double omega : sizes) {
            events += omega * total * plan.switching().passageLimit() * plan.trajectories();
        }
        if (events > EXACT_EVENT_LIMIT) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the exact switching method"
                    + " could fire about %.2g reactions (%.3g per hour at system size %.3g, %s h per trajectory,"
                    + " %d trajectories, 4 system sizes), more than %.0g; lower --system-size, --trajectories or"
                    + " --switching-limit, or use --switching-method langevin", events,
                    plan.systemSize() * total, plan.systemSize(), plan.switching().passageLimit(),
                    plan.trajectories(), EXACT_EVENT_LIMIT));
        }
    }

    /**
     * The landscape over the state plane: solved on a grid when the circuit has exactly the two
     * plotted species (exact relative well depths), else sampled from trajectories started in
     * each well.
     */
    private QuasiPotential landscape(double[] p, List<double[]> wells, double[] corner, long seed) {
        if (network.speciesCount() == 2) {
            return StationaryFokkerPlanck.solve(network, p, plan.systemSize(), plan.xSpecies(), plan.ySpecies(),
                    new double[2], corner, plan.grid());
        }
        return QuasiPotential.estimateFrom(network, p, plan.systemSize(), wells, plan.xSpecies(), plan.ySpecies(),
                new double[2], corner, GRID, new QuasiPotential.Sampling(plan.trajectories(), 20, 200, 0.01, seed));
    }

    /**
     * The bifurcation diagram: branches through every steady state at both ends of the range and
     * at the plan's value, each stretch traced once, each special point listed once.
     */
    public List<Branch> diagram() {
        NetworkSystem system = new NetworkSystem(network, base, plan.indices());
        double span = plan.max() - plan.min();
        ContinuationSettings settings = ContinuationSettings.defaults().withMaxStep(Math.max(1e-3, span / 40));
        EquilibriumContinuation continuation = EquilibriumContinuation.of(system, settings);
        List<Branch> branches = new ArrayList<>();
        for (double value : new double[] {plan.min(), plan.max(), plan.at()}) {
            for (SteadyState s : SteadyStateFinder.of(network).find(parametersAt(value), lower, upper)) {
                if (onKnownBranch(s.state(), value, branches)) {
                    continue;
                }
                for (Branch b : continuation.diagram(s.state(), value, plan.min(), plan.max(), true, 2, branches)) {
                    if (b.points().size() > 1 && !duplicate(b, branches)) {
                        branches.add(new Branch(branches.size(), b.points(), b.specials()));
                    }
                }
            }
        }
        return EquilibriumContinuation.withoutRepeatedSpecials(branches);
    }

    /**
     * Fold curves through the folds of the one-parameter diagram. A symmetric circuit has a
     * pitchfork and no fold; then the diagram is recomputed with the second parameter nudged by
     * 5% of its range, which unfolds the pitchfork into a fold to start from.
     */
    private List<FoldCurve> foldCurves(List<Branch> branches) {
        TwoParameterSystem plane = new TwoParameterSystem(network, base, plan.indices(), plan.secondIndices());
        double secondValue = base[plan.secondIndices()[0]];
        boolean anyFold = branches.stream().flatMap(b -> b.specials().stream())
                .anyMatch(s -> s.type() == SpecialPointType.SADDLE_NODE);
        if (!anyFold) {
            double nudge = 0.05 * (plan.secondMax() - plan.secondMin());
            secondValue = secondValue + nudge <= plan.secondMax() ? secondValue + nudge : secondValue - nudge;
            double[] nudged = base.clone();
            for (int i : plan.secondIndices()) {
                nudged[i] = secondValue;
            }
            branches = new CircuitAnalysis(network, nudged, plan).diagram();
        }
        List<FoldCurve> curves = new ArrayList<>();
        for (Branch branch : branches) {
            for (SpecialPoint s : branch.specials()) {
                if (s.type() != SpecialPointType.SADDLE_NODE || onKnownCurve(s, curves)) {
                    continue;
                }
                try {
                    curves.add(FoldCurveContinuation.of(plane, ContinuationSettings.defaults()
                            .withMaxStep(Math.max(1e-3, (plan.secondMax() - plan.secondMin()) / 40)))
                            .trace(s.state(), s.parameter(), secondValue, plan.min(), plan.max(), plan.secondMin(),
                                    plan.secondMax()));
                } catch (IllegalArgumentException | IllegalStateException e) {
                    // A fold the curve tracer cannot start from (degenerate there): skip it.
                    continue;
                }
            }
        }
        return curves;
    }

    private static boolean onKnownCurve(SpecialPoint fold, List<FoldCurve> curves) {
        for (FoldCurve curve : curves) {
            for (FoldPoint p : curve.points()) {
                if (Math.abs(p.mu() - fold.parameter()) < 1e-4 && distance(p.state(), fold.state()) < 1e-3) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean onKnownBranch(double[] state, double value, List<Branch> branches) {
        return branches.stream().anyMatch(b -> b.distanceTo(value, state) < SAME_BRANCH);
    }

    /** A branch is a repeat if three of its points (at a quarter, half, three quarters) lie on one known branch. */
    private static boolean duplicate(Branch candidate, List<Branch> branches) {
        List<BranchPoint> points = candidate.points();
        for (Branch b : branches) {
            boolean all = true;
            for (int q = 1; q <= 3 && all; q++) {
                BranchPoint p = points.get(q * (points.size() - 1) / 4);
                all = b.distanceTo(p.parameter(), p.state()) < SAME_BRANCH;
            }
            if (all) {
                return true;
            }
        }
        return false;
    }

    /**
     * A box holding every steady state over the range: searched in [0, L]^n with L doubled from 4
     * until the largest steady-state concentration is well inside, then 1.3 times that (at least 1).
     */
    private double[] boxUpper() {
        int n = network.speciesCount();
        double side = 4.0;
        double largest = 0.0;
        for (int attempt = 0; attempt < 6; attempt++) {
            double[] box = new double[n];
            Arrays.fill(box, side);
            largest = 0.0;
            for (double value : new double[] {plan.min(), plan.at(), plan.max()}) {
                for (SteadyState s : SteadyStateFinder.of(network).withStartsPerAxis(12)
                        .find(parametersAt(value), new double[n], box)) {
                    for (double c : s.state()) {
                        largest = Math.max(largest, c);
                    }
                }
            }
            if (largest < 0.6 * side) {
                break;
            }
            side *= 2;
        }
        double[] out = new double[n];
        Arrays.fill(out, Math.max(1.0, 1.3 * largest));
        return out;
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(s);
    }
}
