package org.fatefield.engine.tissue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.field.MorphogenSpec;

/**
 * What a run will cost before it starts, from its specification alone: time steps, cells at the
 * end (exponential growth at rate ln 2 / mean cycle minus the death rate), cell-steps (the
 * integral of the population over the run, per step), field grid updates (grid squares times
 * explicit sub-steps times steps), heap at the end (about 256 bytes per cell), and how densely
 * the founders are packed. A scenario whose numbers are valid one by one can still ask for years
 * of work or more memory than the machine has; the command line refuses such a run before it
 * starts (or asks for {@code --yes}) instead of hanging.
 *
 * @param steps        time steps
 * @param finalCells   expected live cells at the end
 * @param cellSteps    expected cell-steps over the run
 * @param fieldUpdates expected grid-square updates of all fields over the run
 * @param packing      founders' total area over the domain's area, in 3-D volume over volume (above 1 they overlap)
 * @param reactionEvents with circuit.noise = "exact": reactions Gillespie's method will fire, at
 *                     the initial state's total rate (molecules per hour per cell) over the
 *                     cell-hours of the run; 0 for the other methods
 */
public record WorkEstimate(double steps, double finalCells, double cellSteps, double fieldUpdates, double packing,
        double reactionEvents) {

    /** Most time steps of one run. */
    public static final double MAX_STEPS = 1e9;
    /** Most live cells at the end (about 13 GB of heap). */
    public static final double MAX_CELLS = 5e7;
    /** Cell-steps above which a run needs confirming: about a day at 1e7 cell-steps per second. */
    public static final double LONG_CELL_STEPS = 1e12;
    /** Grid updates above which a run needs confirming. */
    public static final double LONG_FIELD_UPDATES = 1e13;
    /** Founders may cover at most this many times the domain's area. */
    public static final double MAX_PACKING = 4;
    /** Reaction events above which an exact-method run needs confirming: about a day at 1.4e7 per second. */
    public static final double LONG_EVENTS = 1e12;
    /** Reaction events above which an exact-method run is refused: years. */
    public static final double MAX_EVENTS = 1e15;
    /** Approximate heap per live cell (bytes), as the benchmark measures it. */
    private static final double BYTES_PER_CELL = 256;

    /** The estimate for {@code spec}. */
    public static WorkEstimate of(TissueSpec spec) {
        Timing timing = spec.timing();
        double steps = timing.duration() / timing.step();
        GrowthSpec growth = spec.growth();
        double rate = Math.log(2) / growth.cycle().mean() - growth.deathRate();
        double founders = growth.initialCells();
        double exponent = rate * timing.duration();
        double finalCells = founders * Math.exp(Math.min(exponent, 700));
        double cellSteps = Math.abs(exponent) < 1e-9 ? founders * steps
                : founders * Math.expm1(Math.min(exponent, 700)) / rate / timing.step();
        double fieldUpdates = 0;
        boolean threeD = spec.domain().threeD();
        for (MorphogenSpec field : spec.fields()) {
            if (field.profile() != null) {
                continue;
            }
            double squares = Math.ceil(spec.width() / field.gridSpacing()) * Math.ceil(spec.height() / field.gridSpacing())
                    * (threeD ? Math.ceil(spec.domain().depth() / field.gridSpacing()) : 1);
            double perStep = field.solver() == MorphogenSpec.Solver.ADI ? 1
                    : MorphogenField.subSteps(field, timing.step(), threeD ? 3 : 2);
            fieldUpdates += squares * perStep * steps;
        }
        double r = growth.cellRadius();
        // In 3-D the founders' share of the box's volume, as spheres.
        double packing = threeD ? founders * 4.0 / 3.0 * Math.PI * r * r * r
                / (spec.width() * spec.height() * spec.domain().depth())
                : founders * Math.PI * r * r / (spec.width() * spec.height());
        return new WorkEstimate(steps, finalCells, cellSteps, fieldUpdates, packing,
                events(spec, cellSteps * timing.step()));
    }

    /** Exact-method reaction events over {@code cellHours}, at the initial state's total rate. */
    private static double events(TissueSpec spec, double cellHours) {
        CircuitSetup circuit = spec.circuit();
        if (circuit.noise() != NoiseMode.EXACT) {
            return 0;
        }
        return circuit.systemSize() * circuit.network().totalRate(circuit.initialState(), spec.mapping().base())
                * cellHours;
    }

    /** What makes the run impossible here (each with the number and the limit); empty if nothing. */
    public List<String> impossible() {
        List<String> out = new ArrayList<>();
        if (!(steps <= MAX_STEPS)) {
            out.add(String.format(Locale.ROOT, "%.3g time steps (run.duration / run.step) is more than %.0e;"
                    + " raise run.step or shorten run.duration", steps, MAX_STEPS));
        }
        if (!(finalCells <= MAX_CELLS)) {
            out.add(String.format(Locale.ROOT, "about %.3g cells at the end (%s of heap) is more than %.0e;"
                    + " raise division.cycle_mean, add division.death_rate or shorten run.duration", finalCells,
                    bytes(finalCells * BYTES_PER_CELL), MAX_CELLS));
        }
        if (!(reactionEvents <= MAX_EVENTS)) {
            out.add(String.format(Locale.ROOT, "about %.3g reactions for Gillespie's exact method (circuit.noise ="
                    + " \"exact\"), more than %.0e; lower circuit.system_size or use circuit.noise = \"tau_leap\" or"
                    + " \"langevin\"", reactionEvents, MAX_EVENTS));
        }
        if (!(packing <= MAX_PACKING)) {
            out.add(String.format(Locale.ROOT, "the founders cover %.3g times the tissue's area (in 3-D its volume;"
                    + " at most %.0f);"
                    + " use fewer tissue.founders, a smaller tissue.cell_radius or a larger tissue", packing,
                    MAX_PACKING));
        }
        return out;
    }

    /** What makes the run long enough to need confirming; empty if nothing. */
    public List<String> lengthy() {
        List<String> out = new ArrayList<>();
        if (!(cellSteps <= LONG_CELL_STEPS)) {
            out.add(String.format(Locale.ROOT, "about %.3g cell-steps (hours to years at 1e7 per second)",
                    cellSteps));
        }
        if (reactionEvents > LONG_EVENTS && reactionEvents <= MAX_EVENTS) {
            out.add(String.format(Locale.ROOT, "about %.3g reactions for Gillespie's exact method (about %.0f h at"
                    + " 1.4e7 per second)", reactionEvents, reactionEvents / 1.4e7 / 3600));
        }
        if (!(fieldUpdates <= LONG_FIELD_UPDATES)) {
            out.add(String.format(Locale.ROOT, "about %.3g field grid updates (the explicit scheme sub-steps"
                    + " below its stability limit; morphogen.solver = \"adi\" takes one step per step)",
                    fieldUpdates));
        }
        return out;
    }

    /** One line for people: steps, cells at the end, cell-steps, grid updates, heap. */
    public String summary() {
        return String.format(Locale.ROOT, "%.3g steps, about %.3g cells at the end, %.3g cell-steps, %.3g field"
                + " updates, about %s of heap", steps, finalCells, cellSteps, fieldUpdates,
                bytes(finalCells * BYTES_PER_CELL))
                + (reactionEvents > 0 ? String.format(Locale.ROOT, ", about %.3g exact reactions (%.2g h at 1.4e7"
                        + " per second)", reactionEvents, reactionEvents / 1.4e7 / 3600) : "");
    }

    private static String bytes(double b) {
        return b >= 1e9 ? String.format(Locale.ROOT, "%.3g GB", b / 1e9) : String.format(Locale.ROOT, "%.3g MB", b / 1e6);
    }
}
