package org.fatefield.scenarios.output;

import org.fatefield.engine.record.TimeSeries;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.engine.cell.Cell;
import org.fatefield.engine.lineage.LineageRecord;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.engine.tissue.TissueSpec;

/**
 * Writes a run's tidy tables: one row per observation, one column per variable, the unit in
 * the column name. Numbers carry ten significant digits, so equal runs give equal bytes. The
 * writer passed in is flushed, not closed. Every CSV file Fatefield writes or reads goes through
 * {@link #printer} and {@link #records} (Commons CSV: RFC 4180 quoting, so a fate name with a
 * comma or a quote survives the round trip).
 */
public final class RunTables {

    /** The CSV dialect of every table: RFC 4180 with Unix line ends. */
    public static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();
    private static final CSVFormat READ_FORMAT = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
            .get();
    private static final MathContext DIGITS = new MathContext(10);
    /** The one code for a missing or undefined value in every table: an empty cell. */
    public static final String MISSING = "";

    /** Columns of {@code lineage.csv}. */
    public static final List<String> LINEAGE_HEADER = List.of("id", "parent_id", "generation", "birth_time_h",
            "division_time_h", "birth_x_um", "birth_y_um", "fate_at_division", "fate_at_end", "commitment_time_h",
            "lineage_commitment_time_h", "death_time_h", "birth_volume", "final_volume", "first_entry_time_h");

    private RunTables() {
    }

    /**
     * A number as {@link #number} wrote it: an empty cell is NaN (missing).
     *
     * @throws NumberFormatException if the text is neither empty nor a number
     */
    public static double parseNumber(String text) {
        String t = text.trim();
        if (t.isEmpty()) {
            return Double.NaN;
        }
        if (t.equals("Inf")) {
            return Double.POSITIVE_INFINITY;
        }
        return t.equals("-Inf") ? Double.NEGATIVE_INFINITY : Double.parseDouble(t);
    }

    /** A cell id, or an empty cell for none (a founder's parent, written {@code -1} inside the engine). */
    public static String id(long id) {
        return id < 0 ? MISSING : Long.toString(id);
    }

    /** An id as {@link #id} wrote it: -1 for an empty cell. */
    public static long parseId(String text) {
        return text.isEmpty() ? -1 : Long.parseLong(text);
    }

    /** A printer of Fatefield's CSV dialect on {@code out} (flush it; closing it closes {@code out}). */
    public static CSVPrinter printer(Writer out) throws IOException {
        return new CSVPrinter(out, FORMAT);
    }

    /**
     * The records of a CSV file with a header row.
     *
     * @throws IOException naming the file if it is missing or malformed
     */
    public static List<CSVRecord> records(Path file) throws IOException {
        RunLayout.requireFile(file);
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8); CSVParser parser = parser(in)) {
            return parser.getRecords();
        } catch (UncheckedIOException | IllegalArgumentException | IllegalStateException e) {
            throw new IOException(file + " is not a CSV table as Fatefield writes it (" + e.getMessage() + ")", e);
        }
    }

    /** A streaming parser of a Fatefield table whose first row is its header. */
    public static CSVParser parser(Reader in) throws IOException {
        return READ_FORMAT.parse(in);
    }

    /** Columns of {@code lineage.csv}: {@link #LINEAGE_HEADER}, with {@code birth_z_um} after {@code birth_y_um} in 3-D. */
    public static List<String> lineageHeader(boolean threeD) {
        if (!threeD) {
            return LINEAGE_HEADER;
        }
        List<String> header = new ArrayList<>(LINEAGE_HEADER);
        header.add(header.indexOf("birth_y_um") + 1, "birth_z_um");
        return List.copyOf(header);
    }

    /** One row of {@code lineage.csv} of a flat tissue; fate indices are named from {@code fates} (empty for none). */
    public static List<String> lineageRow(LineageRecord r, List<String> fates) {
        return lineageRow(r, fates, false);
    }

    /** One row of {@code lineage.csv}, with {@code birth_z_um} in a 3-D tissue. */
    public static List<String> lineageRow(LineageRecord r, List<String> fates, boolean threeD) {
        List<String> row = new ArrayList<>(List.of(Long.toString(r.id()), id(r.parentId()),
                Integer.toString(r.generation()), number(r.birthTime()), number(r.divisionTime()), number(r.birthX()),
                number(r.birthY())));
        if (threeD) {
            row.add(number(r.birthZ()));
        }
        row.addAll(List.of(fateName(r.fateAtDivision(), fates), fateName(r.fateAtEnd(), fates),
                number(ownCommitment(r)), number(r.commitmentTime()), number(r.deathTime()), number(r.birthVolume()),
                number(r.finalVolume()), number(r.firstEntryTime())));
        return row;
    }

    /**
     * When this cell itself entered its final fate: the lineage's entry if that came during the
     * cell's life, else its birth (it was born into the fate its mother had).
     */
    private static double ownCommitment(LineageRecord r) {
        return Double.isNaN(r.commitmentTime()) ? Double.NaN : Math.max(r.commitmentTime(), r.birthTime());
    }

    private static String fateName(int fate, List<String> fates) {
        return fate < 0 ? "" : fates.get(fate);
    }

    /**
     * {@code timeseries.csv}, long: one row per record time and fate, {@code time_h, fate, cells,
     * fraction} (fraction of the live cells; empty when there are none).
     */
    public static void writeTimeSeries(TimeSeries series, Writer out) throws IOException {
        CSVPrinter printer = printer(out);
        printer.printRecord("time_h", "fate", "cells", "fraction");
        List<String> fates = series.fateNames();
        for (TimeSeries.Row row : series.rows()) {
            for (int f = 0; f < fates.size(); f++) {
                printer.printRecord(number(row.time()), fates.get(f), Integer.toString(row.fateCounts()[f]),
                        number(row.population() == 0 ? Double.NaN : row.fraction(f)));
            }
        }
        printer.flush();
    }

    /**
     * {@code population.csv}: one row per record time, {@code time_h, cells} (live cells) and
     * {@code mean_morphogen} (the control field's mean over the tissue, its own units).
     */
    public static void writePopulation(TimeSeries series, Writer out) throws IOException {
        CSVPrinter printer = printer(out);
        printer.printRecord("time_h", "cells", "mean_morphogen");
        for (TimeSeries.Row row : series.rows()) {
            printer.printRecord(number(row.time()), Integer.toString(row.population()), number(row.meanMorphogen()));
        }
        printer.flush();
    }

    /**
     * {@code cells.csv}: the live cells at the end: {@code id, parent_id, generation, x_um, y_um}
     * (and {@code z_um} in a 3-D tissue),
     * one {@code <species>_molecules} column per species (concentration times system size, rounded),
     * one {@code <species>_concentration} column per species (at full precision),
     * {@code morphogen}, {@code control_<parameter>} (the first coupled parameter's local value)
     * and {@code fate}.
     */
    public static void writeCells(Tissue tissue, Writer out) throws IOException {
        TissueSpec spec = tissue.spec();
        boolean threeD = spec.domain().threeD();
        List<String> header = new ArrayList<>(List.of("id", "parent_id", "generation", "x_um", "y_um"));
        if (threeD) {
            header.add("z_um");
        }
        header.addAll(cellStateHeader(spec));
        List<String> fateNames = spec.fates().fateNames();
        CSVPrinter printer = printer(out);
        printer.printRecord(header);
        for (Cell cell : tissue.cellsById()) {
            List<String> values = new ArrayList<>();
            values.add(Long.toString(cell.id()));
            values.add(id(cell.parentId()));
            values.add(Integer.toString(cell.generation()));
            values.add(number(cell.x()));
            values.add(number(cell.y()));
            if (threeD) {
                values.add(number(cell.z()));
            }
            addCellState(tissue, cell, fateNames.get(cell.fate()), values);
            printer.printRecord(values);
        }
        printer.flush();
    }

    /**
     * Columns of a cell's state shared by {@code cells.csv} and the snapshots: each species'
     * molecules, then concentrations, the morphogen at the cell, the control parameter, the fate.
     */
    static List<String> cellStateHeader(TissueSpec spec) {
        List<String> species = spec.circuit().network().speciesNames();
        List<String> header = new ArrayList<>();
        species.forEach(s -> header.add(s + "_molecules"));
        species.forEach(s -> header.add(s + "_concentration"));
        header.addAll(List.of("morphogen", "control_" + controlName(spec), "fate"));
        return header;
    }

    /** Appends the {@link #cellStateHeader} values of {@code cell}, with fate named {@code fate}. */
    static void addCellState(Tissue tissue, Cell cell, String fate, List<String> values) {
        TissueSpec spec = tissue.spec();
        int species = spec.circuit().network().speciesCount();
        double omega = spec.circuit().systemSize();
        for (int i = 0; i < species; i++) {
            values.add(Long.toString(Math.round(cell.concentration(i) * omega)));
        }
        for (int i = 0; i < species; i++) {
            // Full precision: the shortest decimal that reads back as the same double.
            values.add(Double.toString(cell.concentration(i)));
        }
        double signal = tissue.signalAt(cell);
        values.add(number(signal));
        values.add(number(spec.mapping().controlAt(signal)));
        values.add(fate);
    }

    /** Name of the control parameter (the first coupled one), or "none". */
    public static String controlName(TissueSpec spec) {
        if (spec.mapping().couplings().isEmpty()) {
            return "none";
        }
        return spec.mapping().couplings().get(0).label();
    }

    /**
     * A number with ten significant digits and no trailing zeros; an undefined value (NaN) as an
     * empty cell, the table convention for missing; infinities as {@code Inf} and {@code -Inf},
     * which R and pandas both read.
     */
    public static String number(double value) {
        if (Double.isNaN(value)) {
            return MISSING;
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "Inf" : "-Inf";
        }
        if (value == 0.0) {
            return "0";
        }
        return new BigDecimal(value).round(DIGITS).stripTrailingZeros().toPlainString();
    }
}
