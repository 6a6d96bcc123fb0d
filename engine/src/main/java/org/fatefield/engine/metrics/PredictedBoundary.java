package org.fatefield.engine.metrics;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.fatefield.circuits.analysis.continuation.Branch;
import org.fatefield.circuits.analysis.continuation.ContinuationSettings;
import org.fatefield.circuits.analysis.continuation.EquilibriumContinuation;
import org.fatefield.circuits.analysis.continuation.NetworkSystem;
import org.fatefield.circuits.analysis.continuation.SpecialPoint;
import org.fatefield.circuits.analysis.continuation.SpecialPointType;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * The boundary the single-cell analysis predicts: the critical values of the control parameter
 * (folds and branch points of the circuit over the range the control parameter takes in the
 * tissue, by continuation) and the positions along x where the local control parameter, from the
 * row-averaged morphogen, crosses each of them.
 *
 * @param criticalValues control-parameter values of the circuit's folds and branch points
 * @param kinds          what each critical value is, e.g. "saddle-node (fold)" or "supercritical pitchfork (branch point)"
 * @param positions      positions along x (µm) where the local control parameter crosses them (NaN if it does not)
 * @param fateCalls      where a stable steady state enters each fate's rule ({@link FateCallBoundary})
 * @param fateCallPositions positions along x (µm) where the local control parameter crosses those (NaN if it does not)
 * @param positionErrors         predicted positional error (µm) of each of {@code positions} from the
 *                               control field's tissue-to-tissue amplitude variability ({@link PositionalError}),
 *                               NaN without variability
 * @param fateCallPositionErrors the same for each of {@code fateCallPositions}
 * @param undefined      why there is no prediction (no coupling, or no steady state to continue), or
 *                       empty when the lists above are the prediction
 */
public record PredictedBoundary(double[] criticalValues, String[] kinds, double[] positions,
        List<FateCallBoundary> fateCalls, double[] fateCallPositions, double[] positionErrors,
        double[] fateCallPositionErrors, String undefined) {

    /** Copies the arrays. */
    public PredictedBoundary {
        criticalValues = criticalValues.clone();
        kinds = kinds.clone();
        positions = positions.clone();
        fateCalls = List.copyOf(fateCalls);
        fateCallPositions = fateCallPositions.clone();
        positionErrors = positionErrors.clone();
        fateCallPositionErrors = fateCallPositionErrors.clone();
    }

    /** No prediction, for the reason given. */
    public static PredictedBoundary undefined(String reason) {
        return new PredictedBoundary(new double[0], new String[0], new double[0], List.of(), new double[0], new double[0],
                new double[0], reason);
    }

    /**
     * Computes the prediction for the tissue of {@code spec} with morphogen {@code field}; a
     * circuit whose steady states cannot be continued over the tissue's control range (a pure
     * integrator has none) gives an undefined prediction that says why, never an error.
     */
    public static PredictedBoundary of(TissueSpec spec, MorphogenField field) {
        if (spec.mapping().couplings().isEmpty()) {
            return undefined("the scenario couples no parameter to a field");
        }
        SignalCoupling coupling = spec.mapping().couplings().get(0);
        double[] control = new double[field.columns()];
        double[] level = new double[field.columns()];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < field.columns(); i++) {
            double sum = 0;
            for (int j = 0; j < field.rows(); j++) {
                sum += field.value(i, j);
            }
            level[i] = sum / field.rows();
            control[i] = spec.mapping().controlAt(level[i]);
            lo = Math.min(lo, control[i]);
            hi = Math.max(hi, control[i]);
        }
        double margin = 0.05 * Math.max(hi - lo, 1e-9);
        lo -= margin;
        hi += margin;
        NetworkSystem system = new NetworkSystem(spec.circuit().network(), spec.mapping().base(),
                coupling.parameterIndices());
        List<Branch> branches;
        try {
            branches = EquilibriumContinuation.of(system,
                    ContinuationSettings.defaults().withMaxStep(Math.max(1e-4, (hi - lo) / 400)))
                    .diagram(spec.circuit().initialState(), lo, lo, hi, true, 2);
        } catch (IllegalArgumentException | IllegalStateException e) {
            return undefined("the circuit's steady states could not be continued over the control range ["
                    + lo + ", " + hi + "]: " + e.getMessage());
        }
        List<SpecialPoint> critical = new ArrayList<>();
        for (Branch b : branches) {
            for (SpecialPoint s : b.specials()) {
                boolean relevant = s.type() == SpecialPointType.SADDLE_NODE || s.type().isBranchPoint();
                if (relevant && critical.stream().noneMatch(c -> Math.abs(c.parameter() - s.parameter()) < 1e-6)) {
                    critical.add(s);
                }
            }
        }
        critical.sort(Comparator.comparingDouble(SpecialPoint::parameter));
        double[] values = critical.stream().mapToDouble(SpecialPoint::parameter).toArray();
        String[] kinds = critical.stream().map(SpecialPoint::description).toArray(String[]::new);
        double cv = field.spec().amplitudeCv();
        double[] positions = new double[values.length];
        double[] errors = new double[values.length];
        for (int k = 0; k < values.length; k++) {
            positions[k] = position(control, values[k], field.spacing());
            errors[k] = PositionalError.predicted(level, field.spacing(), positions[k], cv);
        }
        List<FateCallBoundary> calls = FateCallBoundary.of(branches, spec.fates());
        double[] callPositions = new double[calls.size()];
        double[] callErrors = new double[calls.size()];
        for (int k = 0; k < calls.size(); k++) {
            callPositions[k] = position(control, calls.get(k).controlValue(), field.spacing());
            callErrors[k] = PositionalError.predicted(level, field.spacing(), callPositions[k], cv);
        }
        return new PredictedBoundary(values, kinds, positions, calls, callPositions, errors, callErrors, "");
    }

    /** Where along x the column-averaged control first crosses {@code value} (NaN if it does not). */
    private static double position(double[] control, double value, double spacing) {
        for (int i = 0; i + 1 < control.length; i++) {
            double a = control[i] - value;
            double b = control[i + 1] - value;
            if (a * b <= 0 && a != b) {
                return (i + 0.5 + a / (a - b)) * spacing;
            }
        }
        return Double.NaN;
    }
}
