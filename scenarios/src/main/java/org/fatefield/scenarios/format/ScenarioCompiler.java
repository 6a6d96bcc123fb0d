package org.fatefield.scenarios.format;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.fatefield.circuits.model.ReactionNetwork;
import org.fatefield.circuits.model.SelfActivatingSwitch;
import org.fatefield.engine.coupling.CouplingLaw;
import org.fatefield.engine.coupling.ParameterMapping;
import org.fatefield.engine.coupling.SignalCoupling;
import org.fatefield.engine.division.CellSize;
import org.fatefield.engine.division.CycleTimeDistribution;
import org.fatefield.engine.division.PartitionMode;
import org.fatefield.engine.division.Partitioning;
import org.fatefield.engine.division.SizeControl;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.fate.FateRule;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.field.PiecewiseLinear;
import org.fatefield.engine.domain.Domain;
import org.fatefield.engine.tissue.CircuitSetup;
import org.fatefield.engine.tissue.GrowthSpec;
import org.fatefield.engine.tissue.NoiseMode;
import org.fatefield.engine.tissue.RateCheck;
import org.fatefield.engine.tissue.Timing;
import org.fatefield.engine.tissue.TissueSpec;
import org.fatefield.engine.variability.ExtrinsicNoise;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Second pass over a scenario that passed {@link ScenarioChecker}: checks that the values fit
 * together (genes named in rules exist, the step fits the duration, ...) and builds the engine's
 * model objects, filling in documented defaults.
 */
final class ScenarioCompiler {

    /** Most squares of one cell diameter a tissue may hold: the mechanics' neighbour grid. */
    private static final double MAX_DIAMETERS_SQUARED = 1.6e7;
    /** The 3-D counterpart: buckets of the mechanics' neighbour grid in a box or slab. */
    private static final double MAX_DIAMETERS_CUBED = 1.6e7;


    private final String file;
    private final TomlTable toml;
    private final ScenarioChecker locator;
    private final List<Problem> problems = new ArrayList<>();
    private final TomlValues values;

    private final CircuitDocument circuitDocument;
    private final Path folder;

    ScenarioCompiler(String file, TomlTable toml, ScenarioChecker locator, CircuitDocument circuitDocument,
            Path folder) {
        this.folder = folder;
        this.file = file;
        this.toml = toml;
        this.locator = locator;
        this.values = new TomlValues(file, locator, problems);
        this.circuitDocument = circuitDocument;
    }

    List<Problem> problems() {
        return problems;
    }

    Scenario compile(String fallbackName, String sha256, String text, List<String> overrides) {
        TomlTable scenario = toml.getTableOrEmpty("scenario");
        TomlTable run = toml.getTableOrEmpty("run");
        TomlTable tissue = toml.getTableOrEmpty("tissue");
        double duration = values.number(run, "run", "duration");
        double step = values.number(run, "run", "step");
        double recordEvery = values.number(run, "run", "record_every");
        if (step > duration) {
            values.fail(run, "run", "step", "must not exceed run.duration (" + duration + " h)");
        }
        if (recordEvery < step) {
            values.fail(run, "run", "record_every", "must be at least one step (" + step + " h)");
        }
        double mechanicsStep = values.number(run, "run", "mechanics_step");
        if (mechanicsStep > 0 && (mechanicsStep < step * (1 - 1e-9)
                || Math.abs(mechanicsStep / step - Math.round(mechanicsStep / step)) > 1e-6
                || mechanicsStep > recordEvery * (1 + 1e-9))) {
            values.fail(run, "run", "mechanics_step", "must be 0 (automatic) or a whole number of run.step ("
                    + step + " h) up to run.record_every (" + recordEvery + " h)");
        }
        double width = values.number(tissue, "tissue", "width");
        double height = values.number(tissue, "tissue", "height");
        double depth = values.number(tissue, "tissue", "depth");
        String shape = values.text(tissue, "tissue", "shape");
        boolean solid = Domain.threeDimensional(shape);
        if (solid && !(depth > 0)) {
            values.fail(tissue, "tissue", "depth", "a " + shape + " is three-dimensional: give tissue.depth, the size"
                    + " along z in µm (greater than 0), or use a flat shape (rectangle, disc or strip)");
        } else if (!solid && depth > 0) {
            values.fail(tissue, "tissue", "depth", "is set, but a " + shape + " is flat; for a three-dimensional"
                    + " tissue use shape = \"box\" or \"slab\", or remove tissue.depth");
        }
        double radius = values.number(tissue, "tissue", "cell_radius");
        double repulsion = values.number(tissue, "tissue", "repulsion");
        if (solid && depth > 0 && 2 * radius > depth) {
            values.fail(tissue, "tissue", "cell_radius", "a cell this size does not fit in a tissue " + depth
                    + " µm deep (tissue.depth): use a smaller radius or a deeper tissue");
        } else if (solid && depth > 0 && (width / (2 * radius)) * (height / (2 * radius)) * (depth / (2 * radius))
                > MAX_DIAMETERS_CUBED) {
            values.fail(tissue, "tissue", "cell_radius", String.format(Locale.ROOT, "is too small for a %.6g x %.6g x"
                    + " %.6g µm tissue: it would hold %.3g cell diameters cubed, at most %.3g (the neighbour grid"
                    + " of the mechanics); use cell_radius of at least %.3g µm or a smaller tissue", width, height,
                    depth, width * height * depth / Math.pow(2 * radius, 3), MAX_DIAMETERS_CUBED,
                    0.5 * Math.cbrt(width * height * depth / MAX_DIAMETERS_CUBED)));
        }
        if (2 * radius > Math.min(width, height)) {
            values.fail(tissue, "tissue", "cell_radius", "a cell this size does not fit in a " + width + " x " + height
                    + " µm domain (tissue.width x tissue.height): use a smaller radius or a larger tissue");
        } else if ((width / (2 * radius)) * (height / (2 * radius)) > MAX_DIAMETERS_SQUARED) {
            values.fail(tissue, "tissue", "cell_radius", String.format(Locale.ROOT, "is too small for a %.6g x %.6g µm"
                    + " tissue: it would hold %.3g cell diameters squared, at most %.3g (the neighbour grid"
                    + " of the mechanics); use cell_radius of at least %.3g µm or a smaller tissue", width, height,
                    width * height / (4 * radius * radius), MAX_DIAMETERS_SQUARED,
                    0.5 * Math.sqrt(width * height / MAX_DIAMETERS_SQUARED)));
        }
        double mechanics = mechanicsStep > 0 ? mechanicsStep : step;
        if (repulsion * mechanics > 0.5) {
            values.fail(tissue, "tissue", "repulsion", "repulsion * " + (mechanicsStep > 0 ? "run.mechanics_step"
                    : "run.step") + " = " + repulsion * mechanics + " makes the mechanics unstable; keep it below 0.5"
                    + " (lower repulsion or the step)");
        }
        CircuitSetup circuit = new CircuitCompiler(circuitDocument.toml(),
                new TomlValues(circuitDocument.label(), circuitDocument.locator(), problems)).compile();
        FateClassifier fates = fates(circuit);
        FieldCompiler fieldCompiler = new FieldCompiler(toml, values, folder, width, height, solid ? depth : 0.0, fates);
        MorphogenSpec morphogen = fieldCompiler.primary();
        List<MorphogenSpec> others = fieldCompiler.others();
        List<String> fieldNames = new ArrayList<>();
        fieldNames.add(morphogen == null ? "morphogen" : morphogen.name());
        others.forEach(o -> fieldNames.add(o.name()));
        ParameterMapping mapping = mapping(circuit, fieldNames);
        GrowthSpec growth = growth(tissue, circuit, step);
        if (!problems.isEmpty()) {
            return null;
        }
        try {
            TissueSpec spec = new TissueSpec(circuit, mapping, morphogen,
                    Domain.of(shape, width, height, solid ? depth : 0.0), growth, fates,
                    new Timing(duration, step, recordEvery, Math.max(0, mechanicsStep)), extrinsic(circuit), others);
            for (String rate : RateCheck.problems(spec)) {
                problems.add(new Problem(circuitDocument.label(), 0, 0, "circuit", null, rate));
            }
            if (!problems.isEmpty()) {
                return null;
            }
            String name = scenario.contains("name") ? scenario.getString("name") : fallbackName;
            String description = scenario.contains("description") ? scenario.getString("description") : "";
            long seed = run.contains("seed") ? run.getLong("seed") : 1L;
            return new Scenario(name, description, file, sha256, seed, spec, text, overrides, Map.of());
        } catch (IllegalArgumentException e) {
            problems.add(new Problem(file, 0, 0, "", null, e.getMessage()));
            return null;
        }
    }

    private ParameterMapping mapping(CircuitSetup circuit, List<String> fieldNames) {
        if (circuit == null) {
            return null;
        }
        ReactionNetwork network = circuit.network();
        List<String> parameterNames = network.parameterNames();
        List<SignalCoupling> couplings = new ArrayList<>();
        TomlArray array = toml.getArrayOrEmpty("coupling");
        for (int i = 0; i < array.size(); i++) {
            TomlTable table = array.getTable(i);
            String parameter = table.getString("parameter");
            int[] indices = network.parameterGroup(parameter);
            if (indices.length == 0) {
                // The switch's shared kinetic keys name parameters only for the switch and the toggle.
                List<String> options = new ArrayList<>(network instanceof SelfActivatingSwitch
                        ? ScenarioSchema.KINETICS.stream().map(Key::name).toList() : List.of());
                options.addAll(parameterNames);
                problems.add(locator.at(table, "parameter", "coupling[" + (i + 1) + "].parameter",
                        "\"" + parameter + "\"",
                        "is not a parameter of this circuit" + ScenarioChecker.suggestion(parameter, options)
                                + "; use one of " + String.join(", ", parameterNames)
                                + (network instanceof SelfActivatingSwitch ? ", or a kinetic key without the gene"
                                        + " prefix for both genes" : "")));
                continue;
            }
            String form = values.text(table, "coupling", "form");
            PiecewiseLinear lookup = null;
            if (form.equals("table")) {
                if (!table.contains("table")) {
                    values.problem(table, "form", "coupling[" + (i + 1) + "].table", null,
                            "form = \"table\" needs table = [[c, value], ...]");
                    continue;
                }
                lookup = values.pairs(table, "table", "coupling[" + (i + 1) + "].table",
                        "[[c, value], ...] with c increasing");
                if (lookup == null) {
                    continue;
                }
            }
            int field = 0;
            if (table.contains("field")) {
                field = fieldNames.indexOf(table.getString("field"));
                if (field < 0) {
                    problems.add(locator.at(table, "field", "coupling[" + (i + 1) + "].field",
                            ScenarioChecker.render(table.get("field")), "is not a field; fields are "
                                    + String.join(", ", fieldNames)));
                    continue;
                }
            }
            double base = values.number(table, "coupling", "base");
            double gain = values.number(table, "coupling", "gain");
            CouplingLaw law = switch (form) {
                case "table" -> new CouplingLaw.Table(lookup);
                case "hill" -> new CouplingLaw.Hill(base, gain, values.number(table, "coupling", "half_max"),
                        values.number(table, "coupling", "hill"));
                case "linear" -> new CouplingLaw.Linear(base, gain);
                default -> throw new IllegalStateException("coupling.form \"" + form + "\" passed the checker, which"
                        + " allows only hill, linear and table");
            };
            couplings.add(new SignalCoupling(parameter, indices, law, field));
        }
        return new ParameterMapping(network.defaultParameters(), couplings);
    }

    private List<ExtrinsicNoise> extrinsic(CircuitSetup circuit) {
        List<ExtrinsicNoise> out = new ArrayList<>();
        TomlArray array = toml.getArrayOrEmpty("extrinsic");
        for (int i = 0; i < array.size(); i++) {
            TomlTable table = array.getTable(i);
            String parameter = table.getString("parameter");
            int[] indices = circuit.network().parameterGroup(parameter);
            if (indices.length == 0) {
                problems.add(locator.at(table, "parameter", "extrinsic[" + (i + 1) + "].parameter", "\"" + parameter
                        + "\"", "is not a parameter of this circuit; use one of "
                        + String.join(", ", circuit.network().parameterNames())));
                continue;
            }
            out.add(new ExtrinsicNoise(parameter, indices, values.number(table, "extrinsic", "cv"),
                    values.number(table, "extrinsic", "inheritance")));
        }
        return out;
    }

    private FateClassifier fates(CircuitSetup circuit) {
        TomlTable table = toml.getTable("fates");
        String defaultName = values.text(table, "fates", "default");
        TomlArray rules = toml.getArrayOrEmpty("fates.rule");
        if (rules.isEmpty()) {
            problems.add(new Problem(file, 0, 0, "fates.rule", null, "at least one [[fates.rule]] is needed"));
            return null;
        }
        List<FateRule> list = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        seen.add(defaultName);
        for (int i = 0; i < rules.size(); i++) {
            TomlTable rule = rules.getTable(i);
            String path = "fates.rule[" + (i + 1) + "]";
            String name = rule.getString("name");
            if (!seen.add(name)) {
                problems.add(locator.at(rule, "name", path + ".name", "\"" + name + "\"",
                        "names a fate twice (fates.default counts too); fate names must differ"));
            }
            if (circuit == null) {
                continue;
            }
            double[] min = bounds(rule, "above", path, circuit.network().speciesNames());
            double[] max = bounds(rule, "below", path, circuit.network().speciesNames());
            if (min != null && max != null) {
                try {
                    list.add(new FateRule(name, min, max));
                } catch (IllegalArgumentException e) {
                    problems.add(locator.at(rule, "below", path + ".below", ScenarioChecker.render(rule.get("below")),
                            e.getMessage()));
                }
            }
        }
        if (!problems.isEmpty()) {
            return null;
        }
        FateClassifier classifier = new FateClassifier(list, defaultName)
                .withPredictionCells((int) values.number(table, "fates", "predicted_cells"));
        String timed = values.text(table, "fates", "first_passage");
        if (timed.isEmpty()) {
            return classifier;
        }
        if (!classifier.fateNames().contains(timed)) {
            values.fail(table, "fates", "first_passage", "names no fate; fates are "
                    + String.join(", ", classifier.fateNames()));
            return null;
        }
        return classifier.withFirstPassage(timed);
    }

    private double[] bounds(TomlTable rule, String key, String path, List<String> genes) {
        double[] out = new double[genes.size()];
        Arrays.fill(out, Double.NaN);
        if (!rule.contains(key)) {
            return out;
        }
        TomlTable levels = rule.getTable(key);
        boolean ok = true;
        for (Map.Entry<String, Object> entry : levels.entrySet()) {
            int g = genes.indexOf(entry.getKey());
            double level = ScenarioChecker.asNumber(entry.getValue());
            if (g < 0) {
                problems.add(locator.at(rule, key, path + "." + key + "." + entry.getKey(),
                        ScenarioChecker.render(level),
                        "is not a gene of this circuit; genes are " + String.join(", ", genes)));
                ok = false;
            } else if (level < 0) {
                problems.add(locator.at(rule, key, path + "." + key + "." + entry.getKey(),
                        ScenarioChecker.render(level),
                        "must be a concentration of at least 0"));
                ok = false;
            } else {
                out[g] = level;
            }
        }
        return ok ? out : null;
    }

    private GrowthSpec growth(TomlTable tissue, CircuitSetup circuit, double step) {
        TomlTable division = toml.getTableOrEmpty("division");
        double deathRate = values.number(division, "division", "death_rate");
        if (deathRate * step > 1) {
            values.fail(division, "division", "death_rate", String.format(Locale.ROOT, "is a rate per hour; times"
                    + " run.step (%.6g h) it gives a cell's chance of dying in one step, here %.3g, more than 1; keep"
                    + " death_rate below 1 / run.step = %.6g per hour", step, deathRate * step, 1 / step));
            return null;
        }
        CycleTimeDistribution.Kind kind = CycleTimeDistribution.Kind.valueOf(
                values.text(division, "division", "cycle").toUpperCase(Locale.ROOT));
        double cv = values.number(division, "division", "cycle_cv");
        if (kind != CycleTimeDistribution.Kind.FIXED && kind != CycleTimeDistribution.Kind.NONE && !(cv > 0)) {
            values.fail(division, "division", "cycle_cv", "must be greater than 0 for a " + kind.name()
                    .toLowerCase(Locale.ROOT)
                    + " cycle (or set cycle = \"fixed\")");
            return null;
        }
        PartitionMode mode = PartitionMode.valueOf(values.text(division, "division", "partition")
                .toUpperCase(Locale.ROOT));
        Partitioning partition = new Partitioning(mode, values.number(division, "division", "asymmetry_mean"),
                values.number(division, "division", "asymmetry_concentration"));
        boolean dilution = Boolean.TRUE.equals(division.getBoolean("dilution"));
        if (dilution && circuit != null && circuit.noise() != NoiseMode.LANGEVIN && circuit.noise() != NoiseMode.NONE) {
            values.fail(division, "division", "dilution", "needs circuit.noise = \"langevin\" or \"none\": the"
                    + " molecule-count methods keep whole numbers of molecules between divisions");
            return null;
        }
        CellSize size = new CellSize(SizeControl.valueOf(values.text(division, "division", "size_control")
                .toUpperCase(Locale.ROOT)), values.number(division, "division", "volume_split_cv"));
        if (size.variable() && circuit != null && circuit.noise() != NoiseMode.LANGEVIN
                && circuit.noise() != NoiseMode.NONE) {
            values.fail(division, "division", size.splitCv() > 0 ? "volume_split_cv" : "size_control",
                    "cells of unequal volume need circuit.noise = \"langevin\" or \"none\": the molecule-count"
                            + " methods assume every newborn has the same volume (use size_control = \"timer\" and"
                            + " volume_split_cv = 0 with them)");
            return null;
        }
        return new GrowthSpec((int) tissue.getLong("founders", () -> 200L), values.number(tissue, "tissue",
                "cell_radius"),
                values.number(tissue, "tissue", "repulsion"),
                kind == CycleTimeDistribution.Kind.NONE ? CycleTimeDistribution.none()
                        : new CycleTimeDistribution(kind, values.number(division, "division", "cycle_mean"), cv),
                partition,
                GrowthSpec.DivisionAxis.valueOf(values.text(division, "division", "axis").toUpperCase(Locale.ROOT)),
                values.number(division, "division", "death_rate"), dilution, values.number(tissue, "tissue",
                        "adhesion"),
                size);
    }

}
