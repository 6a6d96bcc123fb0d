package org.fatefield.scenarios.output;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.field.MorphogenField;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * Long-format tables of the tissue at every record time, for analysis in Python or R:
 * {@code snapshots/cells-<step>.csv} (one row per live cell, in order of id) and
 * {@code snapshots/fields-<step>.csv} (one row per grid square of each field). Every file has
 * the same columns and a {@code time_h} column, so the files of a run concatenate into one long
 * table. Each file is written whole under a temporary name and then renamed, so a killed run
 * leaves only complete files, and a resumed run writes the later ones again, identically. On
 * request each field is also written as VTK image data ({@link VtkImageData}).
 */
public final class Snapshots {

    /** Bytes per row used for the size estimate (a cell row with a few species, a field row). */
    private static final int CELL_ROW_BYTES = 120;
    private static final int FIELD_ROW_BYTES = 45;

    private final Path folder;
    private final boolean vtk;

    /** Snapshots into {@code runFolder/snapshots}, with VTK image data of each field if {@code vtk}. */
    Snapshots(Path runFolder, boolean vtk) {
        this.folder = runFolder.resolve(RunLayout.SNAPSHOTS);
        this.vtk = vtk;
    }

    /**
     * Rough size (bytes) of the snapshots of a run of {@code spec} ending with about
     * {@code finalCells} cells: cell rows at the mean of the initial and final counts (an
     * overestimate for exponential growth is fine), field rows at every record time.
     */
    public static double estimatedBytes(TissueSpec spec, double finalCells) {
        long records = spec.timing().totalSteps() / spec.timing().stepsPerRecord() + 1;
        double cells = 0.5 * (spec.growth().initialCells() + finalCells);
        double squares = 0;
        for (var field : spec.fields()) {
            squares += Math.ceil(spec.width() / field.gridSpacing()) * Math.ceil(spec.height() / field.gridSpacing());
        }
        return records * (cells * CELL_ROW_BYTES + squares * FIELD_ROW_BYTES);
    }

    /** Writes both tables of the tissue's current state. */
    void write(Tissue tissue) throws IOException {
        Files.createDirectories(folder);
        String step = String.format(Locale.ROOT, "%08d", tissue.steps());
        atomically(folder.resolve("cells-" + step + ".csv"), w -> cells(tissue, w));
        atomically(folder.resolve("fields-" + step + ".csv"), w -> fields(tissue, w));
        for (int f = 0; vtk && f < tissue.fields().size(); f++) {
            MorphogenField field = tissue.fields().get(f);
            atomically(folder.resolve(VtkImageData.fileName(f, field.spec().name(), step)),
                    w -> VtkImageData.write(field, tissue.time(), w));
        }
    }

    private static void cells(Tissue tissue, Writer out) throws IOException {
        TissueSpec spec = tissue.spec();
        boolean threeD = spec.domain().threeD();
        List<String> header = new ArrayList<>(List.of("time_h", "id", "parent_id", "x_um", "y_um"));
        if (threeD) {
            header.add("z_um");
        }
        header.add("volume");
        header.addAll(RunTables.cellStateHeader(spec));
        List<String> fates = spec.fates().fateNames();
        String time = RunTables.number(tissue.time());
        CSVPrinter printer = RunTables.printer(out);
        printer.printRecord(header);
        for (Cell cell : tissue.cellsById()) {
            List<String> row = new ArrayList<>(List.of(time, Long.toString(cell.id()), RunTables.id(cell.parentId()),
                    RunTables.number(cell.x()), RunTables.number(cell.y())));
            if (threeD) {
                row.add(RunTables.number(cell.z()));
            }
            row.add(RunTables.number(cell.volume()));
            // A cell born since the last classification takes its fate from its state now.
            RunTables.addCellState(tissue, cell, fates.get(spec.fates().classify(cell.liveState())), row);
            printer.printRecord(row);
        }
        printer.flush();
    }

    private static void fields(Tissue tissue, Writer out) throws IOException {
        String time = RunTables.number(tissue.time());
        CSVPrinter printer = RunTables.printer(out);
        boolean threeD = tissue.spec().domain().threeD();
        if (threeD) {
            printer.printRecord("time_h", "field", "x_um", "y_um", "z_um", "concentration");
        } else {
            printer.printRecord("time_h", "field", "x_um", "y_um", "concentration");
        }
        for (MorphogenField field : tissue.fields()) {
            String name = field.spec().name();
            double h = field.spacing();
            for (int l = 0; l < field.layers(); l++) {
                for (int j = 0; j < field.rows(); j++) {
                    for (int i = 0; i < field.columns(); i++) {
                        List<String> row = new ArrayList<>(List.of(time, name, RunTables.number((i + 0.5) * h),
                                RunTables.number((j + 0.5) * h)));
                        if (threeD) {
                            row.add(RunTables.number((l + 0.5) * h));
                        }
                        row.add(RunTables.number(field.value(i, j, l)));
                        printer.printRecord(row);
                    }
                }
            }
        }
        printer.flush();
    }

    private interface Body {
        void write(Writer out) throws IOException;
    }

    private static void atomically(Path target, Body body) throws IOException {
        Path temporary = RunLayout.partial(target);
        try (Writer w = Files.newBufferedWriter(temporary, StandardCharsets.UTF_8)) {
            body.write(w);
        }
        Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }
}
