package org.fatefield.scenarios.format;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.engine.fate.FateClassifier;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.field.MorphogenSpec;
import org.fatefield.engine.field.PiecewiseLinear;
import org.fatefield.engine.field.SourceRegion;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/**
 * Builds the fields of a scenario: {@code [morphogen]} with its {@code [[morphogen.source]]}
 * regions, and each {@code [[field]]}; with their wall conditions, exchange with cells and
 * measured profiles (read as data from CSV files in the scenario's folder).
 */
final class FieldCompiler {

    private static final int MAX_GRID = 4096;

    private final TomlTable toml;
    private final TomlValues values;
    private final Path folder;
    private final double width;
    private final double height;
    /** Depth of a 3-D tissue (µm), 0 when flat. */
    private final double depth;
    private final FateClassifier fates;

    FieldCompiler(TomlTable toml, TomlValues values, Path folder, double width, double height, double depth,
            FateClassifier fates) {
        this.depth = depth;
        this.toml = toml;
        this.values = values;
        this.folder = folder;
        this.width = width;
        this.height = height;
        this.fates = fates;
    }

    /** The primary field, or null after reporting problems. */
    MorphogenSpec primary() {
        return field(toml.getTable("morphogen"), "morphogen", "morphogen", sources());
    }

    /** The further fields (those that could be built). */
    List<MorphogenSpec> others() {
        List<MorphogenSpec> out = new ArrayList<>();
        TomlArray array = toml.getArrayOrEmpty("field");
        List<String> names = new ArrayList<>(List.of(primaryName()));
        for (int i = 0; i < array.size(); i++) {
            TomlTable table = array.getTable(i);
            String path = "field[" + (i + 1) + "]";
            MorphogenSpec spec = field(table, "field", path, List.of());
            if (spec == null) {
                continue;
            }
            if (names.contains(spec.name())) {
                values.problem(table, "name", path + ".name", "\"" + spec.name() + "\"",
                        "names a field twice; every field needs its own name");
                continue;
            }
            names.add(spec.name());
            out.add(spec);
        }
        return out;
    }

    private String primaryName() {
        TomlTable table = toml.getTable("morphogen");
        return table != null && table.contains("name") ? table.getString("name") : "morphogen";
    }

    private MorphogenSpec field(TomlTable table, String section, String path, List<SourceRegion> sources) {
        if (table == null) {
            return null;
        }
        double spacing = values.number(table, section, "grid_spacing");
        if (width / spacing > MAX_GRID || height / spacing > MAX_GRID) {
            values.fail(table, section, "grid_spacing", String.format(Locale.ROOT, "gives more than %d grid squares"
                    + " along a side of the %.6g x %.6g µm tissue (tissue.width x tissue.height); use a grid_spacing"
                    + " of at least %.6g µm or a smaller tissue", MAX_GRID, width, height,
                    Math.max(width, height) / MAX_GRID));
            return null;
        }
        double cubes = Math.ceil(width / spacing) * Math.ceil(height / spacing) * Math.ceil(depth / spacing);
        if (depth > 0 && (depth / spacing > MAX_GRID || cubes > MorphogenField.MAX_SQUARES)) {
            values.fail(table, section, "grid_spacing", String.format(Locale.ROOT, "gives %.3g grid cubes in the"
                    + " %.6g x %.6g x %.6g µm tissue (tissue.width x tissue.height x tissue.depth), at most %d;"
                    + " use a grid_spacing of at least %.6g µm or a smaller tissue", cubes, width, height, depth,
                    MorphogenField.MAX_SQUARES, Math.cbrt(width * height * depth / MorphogenField.MAX_SQUARES)));
            return null;
        }
        MorphogenSpec.WallKind kind = switch (values.text(table, section, "left_wall")) {
            case "fixed" -> MorphogenSpec.WallKind.FIXED_VALUE;
            case "flux" -> MorphogenSpec.WallKind.FLUX;
            default -> MorphogenSpec.WallKind.NO_FLUX;
        };
        int secreting = MorphogenSpec.CellExchange.NONE;
        if (table.contains("secreted_by")) {
            String fate = table.getString("secreted_by");
            secreting = fate.equals("all") ? MorphogenSpec.CellExchange.ALL
                    : fates == null ? MorphogenSpec.CellExchange.NONE : fates.fateNames().indexOf(fate);
            if (secreting == -1 && fates != null) {
                values.problem(table, "secreted_by", path + ".secreted_by", "\"" + fate + "\"",
                        "is not a fate; use one of " + String.join(", ", fates.fateNames()) + ", or \"all\"");
                return null;
            }
        }
        PiecewiseLinear profile = table.contains("profile") ? profile(table, path) : null;
        if (table.contains("profile") && profile == null) {
            return null;
        }
        if (profile != null && values.number(table, section, "amplitude_cv") > 0) {
            values.problem(table, "amplitude_cv", path + ".amplitude_cv", null,
                    "cannot vary a fixed profile (it is measured data); remove amplitude_cv or profile");
            return null;
        }
        String name = table.contains("name") ? table.getString("name") : section.equals("morphogen") ? "morphogen" : null;
        if (name == null) {
            values.problem(table, "diffusion", path + ".name", null, "every [[field]] needs a name");
            return null;
        }
        return new MorphogenSpec(name, values.number(table, section, "diffusion"), values.number(table, section, "decay"),
                spacing, values.number(table, section, "initial"), sources,
                MorphogenSpec.Solver.valueOf(values.text(table, section, "solver").toUpperCase(Locale.ROOT)),
                new MorphogenSpec.WallCondition(kind, values.number(table, section, "left_value")),
                new MorphogenSpec.CellExchange(secreting, values.number(table, section, "secretion_rate"),
                        values.number(table, section, "uptake")), profile,
                values.number(table, section, "amplitude_cv"));
    }

    /** A measured profile: CSV with columns x_um and value, x increasing; null after reporting. */
    private PiecewiseLinear profile(TomlTable table, String path) {
        String name = table.getString("profile");
        if (folder == null) {
            values.problem(table, "profile", path + ".profile", "\"" + name + "\"",
                    "a built-in scenario cannot read profile files");
            return null;
        }
        Path target = folder.resolve(name).normalize();
        if (Path.of(name).isAbsolute() || !target.startsWith(folder.normalize()) || !name.endsWith(".csv")) {
            values.problem(table, "profile", path + ".profile", "\"" + name + "\"",
                    "must name a .csv file in this scenario's folder or below it");
            return null;
        }
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        try (Reader in = new StringReader(new String(TextLimits.read(target, TextLimits.MAX_TABLE_BYTES,
                "a measured profile is a table of a few thousand rows at most"), StandardCharsets.UTF_8))) {
            for (CSVRecord row : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
                try {
                    xs.add(Double.parseDouble(row.get("x_um")));
                    ys.add(Double.parseDouble(row.get("value")));
                } catch (IllegalArgumentException e) {
                    values.problem(table, "profile", path + ".profile", "\"" + name + "\"", target + " line "
                            + (row.getRecordNumber() + 1) + ": needs numbers in columns x_um and value (" + e.getMessage() + ")");
                    return null;
                }
            }
        } catch (IOException | IllegalStateException e) {
            values.problem(table, "profile", path + ".profile", "\"" + name + "\"", "cannot read " + target + ": "
                    + (e instanceof IOException io ? TextLimits.describe(io) : e.getMessage()));
            return null;
        }
        try {
            PiecewiseLinear f = PiecewiseLinear.of(xs.stream().mapToDouble(Double::doubleValue).toArray(),
                    ys.stream().mapToDouble(Double::doubleValue).toArray());
            if (f.minimum() < 0) {
                throw new IllegalArgumentException("values must be at least 0");
            }
            return f;
        } catch (IllegalArgumentException e) {
            values.problem(table, "profile", path + ".profile", "\"" + name + "\"", target + ": " + e.getMessage());
            return null;
        }
    }

    private List<SourceRegion> sources() {
        List<SourceRegion> sources = new ArrayList<>();
        TomlArray array = toml.getArrayOrEmpty("morphogen.source");
        for (int i = 0; i < array.size(); i++) {
            TomlTable source = array.getTable(i);
            String path = "morphogen.source[" + (i + 1) + "]";
            double[] r = TomlValues.numbers(source, "region", new double[0]);
            if (r.length != 4 || !(r[2] > r[0]) || !(r[3] > r[1])) {
                values.problem(source, "region", path + ".region", ScenarioChecker.render(source.get("region")),
                        "must be [x0, y0, x1, y1] in µm with x1 > x0 and y1 > y0");
                continue;
            }
            if (r[2] <= 0 || r[0] >= width || r[3] <= 0 || r[1] >= height) {
                values.problem(source, "region", path + ".region", ScenarioChecker.render(source.get("region")),
                        "lies outside the " + width + " x " + height + " µm domain");
                continue;
            }
            PiecewiseLinear amplitude = PiecewiseLinear.CONSTANT;
            if (source.contains("amplitude")) {
                amplitude = values.pairs(source, "amplitude", path + ".amplitude",
                        "[[time, factor], ...] with times increasing and factors of at least 0");
                if (amplitude == null) {
                    continue;
                }
                if (amplitude.minimum() < 0) {
                    values.problem(source, "amplitude", path + ".amplitude", null, "factors must be at least 0");
                    continue;
                }
            }
            sources.add(new SourceRegion(r[0], r[1], r[2], r[3], values.number(source, "morphogen.source", "rate"),
                    amplitude));
        }
        return sources;
    }
}
