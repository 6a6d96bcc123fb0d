package org.fatefield.scenarios.format;

import java.util.List;
import java.util.Optional;

/**
 * Every section and key of the scenario format, with units and defaults: the single source for
 * validation and for the reference page ({@code fatefield scenario-help}).
 *
 * <p>Units: length µm, time h, concentrations dimensionless (the circuit's own unit, which the
 * system size converts to molecules).
 */
public final class ScenarioSchema {

    /** Words of {@code circuit.type}. */
    public static final String SWITCH = "self-activating-switch";
    /** The pure mutual-repression toggle: the switch without self-activation. */
    public static final String TOGGLE = "toggle";
    /** The general n-gene Hill network. */
    public static final String HILL_NETWORK = "hill-network";
    /** A circuit written as reactions with rate laws. */
    public static final String CUSTOM = "custom";

    /** Kinetic keys shared by {@code [circuit.kinetics]} and its per-gene tables. */
    public static final List<Key> KINETICS = List.of(
            Key.nonNegative("basal", "1/h", "0.05", "constitutive production rate of each gene"),
            Key.nonNegative("self_activation", "1/h", "0.2", "maximal production added by a gene's activation of itself"),
            Key.positive("self_threshold", "", "0.5", "concentration of half-maximal self-activation"),
            Key.positive("self_hill", "", "4", "Hill coefficient of self-activation"),
            Key.nonNegative("repression", "1/h", "1.0",
                    "production the other gene can repress (maximal when the other gene is absent)"),
            Key.positive("repression_threshold", "", "0.5", "concentration of the other gene giving half repression"),
            Key.positive("repression_hill", "", "4", "Hill coefficient of the repression"),
            Key.positive("degradation", "1/h", "1.0", "first-order loss rate, dilution by growth included"));

    /** Keys of [morphogen] and of each [[field]]. */
    private static final List<Key> FIELD_KEYS = List.of(
            Key.of("name", KeyType.TEXT, "", "\"morphogen\"", "field name, used by couplings and in figures"),
            Key.nonNegative("diffusion", "µm²/h", "3600", "diffusion coefficient"),
            Key.nonNegative("decay", "1/h", "0.2", "first-order decay rate"),
            Key.positive("grid_spacing", "µm", "10", "side of a grid square of the field"),
            Key.nonNegative("initial", "", "0", "uniform concentration at time 0"),
            Key.choice("solver", "explicit", List.of("explicit", "adi"),
                    "time stepping: explicit (forward Euler, sub-stepped below its stability limit) or adi"
                            + " (Peaceman-Rachford alternating-direction implicit, stable at any step)"),
            Key.choice("left_wall", "no-flux", List.of("no-flux", "fixed", "flux"),
                    "condition at x = 0: no-flux, fixed (concentration held at left_value) or flux (inflow left_value)"),
            Key.nonNegative("left_value", "concentration, or concentration µm/h", "0",
                    "the fixed concentration or the inflow at x = 0"),
            Key.of("secreted_by", KeyType.TEXT, "", "none", "fate whose cells secrete this field, or \"all\""),
            Key.nonNegative("secretion_rate", "concentration µm²/h", "0", "amount each secreting cell adds per hour"
                    + " (concentration µm³/h in a 3-D tissue)"),
            Key.nonNegative("uptake", "1/h", "0", "first-order uptake by cells, over the area each cell covers"
                    + " (in a 3-D tissue, the space it fills)"),
            Key.of("profile", KeyType.TEXT, "", "none",
                    "a CSV file (columns x_um, value) in this scenario's folder: a measured profile along x, fixed in"
                            + " time, that replaces the dynamics"),
            new Key("amplitude_cv", KeyType.NUMBER, "", "0", 0.0, false, 5.0, List.of(),
                    "tissue-to-tissue (embryo-to-embryo) variability of production: each tissue multiplies its"
                            + " sources and left_value by one lognormal factor of mean 1 and this coefficient of"
                            + " variation, drawn from its seed (replicates differ); sets the boundary's positional"
                            + " error. Not with a fixed profile"));

    private static final List<Section> SECTIONS = List.of(
            new Section("scenario", false, false, List.of(
                    Key.of("name", KeyType.TEXT, "", "file name", "short name shown in outputs"),
                    Key.of("description", KeyType.TEXT, "", "\"\"", "what the scenario models, one or two sentences")),
                    "what the scenario is"),
            new Section("run", false, false, List.of(
                    Key.positive("duration", "h", "48", "simulated time"),
                    Key.positive("step", "h", "0.01", "time step of circuits (the field sub-steps as it needs)"),
                    Key.positive("record_every", "h", "0.5", "time between record times of timeseries.csv and"
                            + " population.csv (at least one step)"),
                    Key.nonNegative("mechanics_step", "h", "0", "time step of the mechanics, a whole number of steps"
                            + " up to record_every; 0: set from the repulsion time scale, the longest with"
                            + " max(repulsion, adhesion) * mechanics_step <= 0.1 (so every step while"
                            + " repulsion * step > 0.05)"),
                    Key.integer("seed", "1", 0, 9.007199254740991E15,
                            "master random seed; --seed on the command line overrides it")),
                    "how long to simulate and how often to record"),
            new Section("tissue", false, true, List.of(
                    Key.positive("width", "µm", "600", "domain size along x, the gradient axis"),
                    Key.positive("height", "µm", "300", "domain size along y"),
                    Key.nonNegative("depth", "µm", "0", "domain size along z, for the three-dimensional shapes box and"
                            + " slab only (0 for the flat ones)"),
                    Key.integer("founders", "200", 1, 2_000_000, "cells at time 0, placed uniformly at random"),
                    Key.positive("cell_radius", "µm", "5", "radius of a newborn cell; a cell's area (in 3-D its volume)"
                            + " doubles over its cycle"),
                    Key.nonNegative("repulsion", "1/h", "20",
                            "overlap relaxation rate: speed (µm/h) per µm of overlap; keep repulsion * step below 0.2"),
                    Key.nonNegative("adhesion", "1/h", "0",
                            "attraction between neighbours up to 20% beyond contact: speed (µm/h) per µm of gap"),
                    Key.choice("shape", "rectangle", List.of("rectangle", "disc", "strip", "box", "slab"),
                            "where cells live: the width x height rectangle; the disc inscribed in it (the fields"
                                    + " cover the whole rectangle); or a strip, the rectangle made periodic along y (cells"
                                    + " and fields leaving at the top re-enter at the bottom: a tissue without lateral"
                                    + " edges; walls at x = 0 and x = width only). In three dimensions (with depth):"
                                    + " box, the width x height x depth box with walls on all six faces; or slab, the"
                                    + " box made periodic along y (walls at x = 0, x = width, z = 0 and z = depth);"
                                    + " cells are spheres and the fields fill the box")),
                    "the domain (a rectangle, disc or strip; in 3-D a box or slab) and its founder cells"),
            new Section("division", false, false, List.of(
                    Key.choice("cycle", "gamma", List.of("fixed", "gamma", "lognormal", "none"),
                            "cycle-time distribution; none: cells never divide (cycle_mean and cycle_cv are ignored)"),
                    Key.positive("cycle_mean", "h", "12", "mean time from birth to division"),
                    new Key("cycle_cv", KeyType.NUMBER, "", "0.15", 0.0, false, 2.0, List.of(),
                            "coefficient of variation of the cycle time (ignored when fixed); at most 2: beyond,"
                                    + " most cycles are a tiny fraction of the mean while a few last many means"),
                    Key.choice("partition", "binomial", List.of("binomial", "equal", "asymmetric", "volume"),
                            "how molecules are shared at division: binomial (each molecule to either daughter with"
                                    + " probability 1/2), equal (both daughters keep the mother's concentrations: no"
                                    + " partitioning noise), asymmetric (a share p drawn per division from a Beta law,"
                                    + " then binomial with p) or volume (each molecule to a daughter with probability"
                                    + " her share of the mother's volume; see volume_split_cv)"),
                    new Key("asymmetry_mean", KeyType.NUMBER, "", "0.5", 0.0, true, 1.0, List.of(),
                            "asymmetric only: mean share of the first daughter (below 1)"),
                    Key.positive("asymmetry_concentration", "", "20",
                            "asymmetric only: Beta concentration alpha + beta; smaller means more variable shares"),
                    Key.choice("size_control", "timer", List.of("timer", "adder", "sizer"),
                            "when a cell divides: timer (at its drawn cycle time; volume grows linearly to twice the"
                                    + " birth volume), adder (after adding one newborn volume) or sizer (on reaching two"
                                    + " newborn volumes); adder and sizer grow exponentially, doubling in the drawn"
                                    + " cycle time. Other than timer needs circuit.noise = langevin or none"),
                    new Key("volume_split_cv", KeyType.NUMBER, "", "0", 0.0, false, 0.9, List.of(),
                            "coefficient of variation of a daughter's share of her mother's volume (a Beta law"
                                    + " around 1/2); 0 splits exactly in half. Above 0 needs circuit.noise = langevin"
                                    + " or none"),
                    Key.choice("axis", "random", List.of("random", "x", "y"),
                            "direction along which the daughters are placed: random, x (the gradient axis) or y"),
                    Key.nonNegative("death_rate", "1/h", "0", "rate per hour at which a cell dies and is removed (a"
                            + " hazard: its chance of dying in one step is death_rate * run.step, at most 1)"),
                    Key.of("dilution", KeyType.BOOLEAN, "", "false",
                            "true: concentrations dilute as cells grow (then degradation is the chemical loss only;"
                                    + " langevin and none only); false: degradation includes dilution")),
                    "growth and division"),
            new Section("circuit", false, true, List.of(
                    Key.of("file", KeyType.TEXT, "", "none",
                            "a circuit file in this scenario's folder: TOML holding [circuit] and its sub-sections,"
                                    + " or an SBML Level 3 core model (.xml or .sbml; read as a custom circuit, see"
                                    + " the README); when given, [circuit] holds nothing else but, beside an SBML"
                                    + " file, noise and system_size"),
                    Key.choice("type", null, List.of(SWITCH, TOGGLE, HILL_NETWORK, CUSTOM),
                            "the circuit family: the two-gene self-activating switch, the toggle (the same without"
                                    + " self-activation; [circuit.kinetics] without the self_ keys), a general n-gene"
                                    + " Hill network, or a custom circuit of reactions with rate laws"),
                    Key.of("genes", KeyType.NAMES, "", "[\"A\", \"B\"]",
                            "names of the genes (two for the switch, any number for a Hill network)"),
                    Key.of("species", KeyType.NAMES, "", "*required for custom*", "names of the species of a custom circuit"),
                    Key.choice("noise", "langevin", List.of("langevin", "none", "exact", "tau-leap"),
                            "langevin: chemical Langevin equation (Euler-Maruyama); none: deterministic rate equations"
                                    + " (RK4); exact: Gillespie's direct method in molecule counts; tau-leap:"
                                    + " tau-leaping with Cao-Gillespie-Petzold step selection"),
                    new Key("system_size", KeyType.NUMBER, "molecules per unit concentration", "100", 1.0, false, 1e9,
                            List.of(), "converts concentrations to molecule numbers in a newborn cell; sets the noise"
                                    + " level. Below 1 a unit of concentration is less than one molecule (counts round"
                                    + " to nothing); above 1e9 intrinsic noise is negligible: use noise = \"none\""),
                    Key.of("initial", KeyType.NUMBERS, "", "0.3 for each species",
                            "concentrations of every founder cell, one per gene or species")),
                    "the circuit every cell carries"),
            new Section("circuit.kinetics", false, false, KINETICS,
                    "kinetics shared by both genes; a sub-table [circuit.kinetics.<gene>] with the same keys"
                            + " overrides them for one gene"),
            new Section("circuit.network", false, false, List.of(
                    Key.choice("combine", "additive", List.of("additive", "multiplicative"),
                            "how a gene's inputs combine: additive (production = basal + max_rate * mean of the input"
                                    + " Hill terms: OR-like) or multiplicative (basal + max_rate * product: AND-like)"),
                    Key.of("interaction", KeyType.MATRIX, "", null,
                            "row i, column j: +1 if gene j activates gene i, -1 if it represses it, 0 if neither"),
                    Key.of("basal", KeyType.NUMBERS, "1/h", "0.05 for each gene", "basal production per gene"),
                    Key.of("max_rate", KeyType.NUMBERS, "1/h", "1 for each gene", "regulated production per gene"),
                    Key.of("degradation", KeyType.NUMBERS, "1/h", "1 for each gene", "loss rate per gene"),
                    Key.of("threshold", KeyType.MATRIX, "", "0.5 for every interaction",
                            "half-effect concentration of gene j acting on gene i"),
                    Key.of("hill", KeyType.MATRIX, "", "4 for every interaction", "Hill coefficient of gene j acting on gene i")),
                    "a general Hill network (circuit.type = \"hill-network\"); parameters are then named"
                            + " <gene>.basal, <gene>.max_rate, <gene>.degradation, <target>.<source>.threshold and"
                            + " <target>.<source>.hill"),
            new Section("circuit.parameters", false, false, List.of(),
                    "parameters of a custom circuit (circuit.type = \"custom\"): name = value, any names", true),
            new Section("circuit.reaction", true, false, List.of(
                    Key.of("name", KeyType.TEXT, "", null, "reaction name used in messages"),
                    Key.of("change", KeyType.SPECIES_NUMBERS, "", null,
                            "species = whole number: net change when the reaction fires once, like { A = 1 }"),
                    Key.of("rate", KeyType.TEXT, "concentration/h", null,
                            "rate law in ordinary math notation: numbers, species and parameter names, + - * / ^,"
                                    + " parentheses, exp, log, sqrt, abs, min, max, hill_act(x, K, n) = x^n/(K^n+x^n),"
                                    + " hill_rep(x, K, n) = K^n/(K^n+x^n)")),
                    "a reaction of a custom circuit; repeat for each"),
            new Section("morphogen", false, true, FIELD_KEYS, "the primary diffusing morphogen (no-flux walls unless"
                    + " left_wall says otherwise)"),
            new Section("morphogen.source", true, false, List.of(
                    Key.of("region", KeyType.NUMBERS, "µm", null, "rectangle [x0, y0, x1, y1] where morphogen is made"),
                    Key.nonNegative("rate", "1/h", null, "synthesis rate (concentration per hour) inside the region"),
                    Key.of("amplitude", KeyType.MATRIX, "h, –", "constant 1",
                            "factor on the rate over time: [[time, factor], ...], linear between the points and"
                                    + " constant before the first and after the last")),
                    "a region that synthesises morphogen; repeat for several"),
            new Section("field", true, false, FIELD_KEYS,
                    "a further field besides [morphogen] (same keys; fed by its left wall or by cells, since"
                            + " [[morphogen.source]] regions belong to the primary field); couplings pick it by name"),
            new Section("coupling", true, false, List.of(
                    Key.of("field", KeyType.TEXT, "", "the primary morphogen", "name of the field the coupling reads"),
                    Key.of("parameter", KeyType.TEXT, "", null,
                            "kinetic key set by the morphogen: a key of [circuit.kinetics] for both genes, or"
                                    + " <gene>.<key> for one; the first coupling is the tissue's control parameter"),
                    Key.choice("form", "hill", List.of("hill", "linear", "table"),
                            "hill: base + gain * c^n / (half_max^n + c^n); linear: base + gain * c; table: the"
                                    + " lookup table below"),
                    Key.anyNumber("base", "parameter's unit", "0", "value where there is no morphogen (hill, linear)"),
                    Key.anyNumber("gain", "parameter's unit", "1",
                            "maximal increase (hill) or slope per unit morphogen (linear)"),
                    Key.of("table", KeyType.MATRIX, "–, parameter's unit", "none",
                            "table form: [[c, value], ...] with c increasing; linear between points, constant beyond"),
                    Key.positive("half_max", "", "1", "morphogen level of half-maximal effect (hill)"),
                    Key.positive("hill", "", "2", "Hill coefficient of the coupling (hill)")),
                    "how the local morphogen level c sets a circuit parameter in each cell"),
            new Section("extrinsic", true, false, List.of(
                    Key.of("parameter", KeyType.TEXT, "", null,
                            "parameter that varies from cell to cell (a kinetic key for every gene, or <gene>.<key>)"),
                    new Key("cv", KeyType.NUMBER, "", null, 0.0, false, 5.0, List.of(), "coefficient of variation of"
                            + " the lognormal factor (mean 1); at 5 the factor's median is already 0.2 and one cell in"
                            + " twenty gets more than 4 times the mean"),
                    new Key("inheritance", KeyType.NUMBER, "", "0.9", 0.0, false, 1.0, List.of(),
                            "mother-daughter correlation of the factor's log-score (sisters correlate as its square)")),
                    "cell-to-cell (extrinsic) variability of a circuit parameter, inherited at division; repeat for"
                            + " several parameters"),
            new Section("fates", false, true, List.of(
                    Key.of("default", KeyType.TEXT, "", "\"progenitor\"", "fate of a cell that matches no rule"),
                    Key.of("first_passage", KeyType.TEXT, "", "\"\"", "a fate whose first entry by each cell, in"
                            + " its own life, is timed at every step (first_entry_time_h in lineage.csv, first_passage"
                            + " in metrics.json); empty for none"),
                    Key.integer("predicted_cells", "200", 0, 100000, "single cells simulated at each position along"
                            + " the gradient for the noise-based predicted fate profile (predicted_fraction in"
                            + " profile.csv, predicted_profile in metrics.json); 0 for none")),
                    "how a cell's state is read as a fate"),
            new Section("fates.rule", true, true, List.of(
                    Key.of("name", KeyType.TEXT, "", null, "fate name used in outputs"),
                    Key.of("above", KeyType.SPECIES_NUMBERS, "", "{}", "gene = level: the gene must be at or above the level"),
                    Key.of("below", KeyType.SPECIES_NUMBERS, "", "{}", "gene = level: the gene must be below the level")),
                    "a fate and the box of states that defines it; the first matching rule wins"));

    private ScenarioSchema() {
    }

    /** All sections, in reference order. */
    public static List<Section> sections() {
        return SECTIONS;
    }

    /** The section at {@code path}. */
    public static Optional<Section> section(String path) {
        return SECTIONS.stream().filter(s -> s.path().equals(path)).findFirst();
    }
}
