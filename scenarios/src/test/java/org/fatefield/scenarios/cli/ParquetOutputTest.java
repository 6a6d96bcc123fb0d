package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.scenarios.output.RunTables;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code run --parquet} writes Parquet copies of the large tables that an independent reader
 * sees exactly as the CSV: DuckDB (an implementation of the Parquet format in C++, from Maven
 * Central, test scope only) reads every file, and every row, column name, type and value must
 * match the CSV beside it (numbers equal to the CSV's ten digits, text equal, an empty CSV cell
 * a null), for a flat run and a 3-D run with snapshots.
 */
class ParquetOutputTest {

    @TempDir
    Path tmp;

    @Test
    void everyParquetTableReadsBackAsItsCsvInAnIndependentReader() throws Exception {
        Path scenario = ShortDemo.write(tmp, "3.0");
        assertEquals(0, FatefieldCommandAccess.run("run", scenario.toString(), "--out", tmp.resolve("flat").toString(),
                "--parquet", "--quiet"));
        assertEquals(0, FatefieldCommandAccess.run("run", scenario.toString(), "--set", "tissue.shape=box", "--set",
                "tissue.depth=40", "--out", tmp.resolve("solid").toString(), "--snapshots", "--parquet", "--quiet"));
        List<Path> tables;
        try (Stream<Path> walk = Files.walk(tmp)) {
            tables = walk.filter(p -> p.toString().endsWith(".parquet")).sorted().toList();
        }
        // flat: lineage, cells; solid: lineage, cells and 7 snapshots (0 to 3 h every 0.5 h).
        assertEquals(2 + 2 + 7, tables.size(), tables.toString());
        try (Connection duck = DriverManager.getConnection("jdbc:duckdb:")) {
            for (Path parquet : tables) {
                String name = parquet.getFileName().toString();
                Path csv = parquet.resolveSibling(name.substring(0, name.length() - ".parquet".length()) + ".csv");
                compare(duck, parquet, csv);
            }
        }
    }

    private static void compare(Connection duck, Path parquet, Path csv) throws Exception {
        List<CSVRecord> rows = RunTables.records(csv);
        List<String> header;
        try (var reader = Files.newBufferedReader(csv)) {
            header = List.of(reader.readLine().split(","));
        }
        try (Statement s = duck.createStatement();
                ResultSet r = s.executeQuery("SELECT * FROM read_parquet('" + parquet + "')")) {
            ResultSetMetaData meta = r.getMetaData();
            List<String> columns = new ArrayList<>();
            for (int c = 1; c <= meta.getColumnCount(); c++) {
                columns.add(meta.getColumnName(c));
            }
            assertEquals(header, columns, parquet + ": columns");
            int row = 0;
            while (r.next()) {
                CSVRecord expected = rows.get(row);
                for (int c = 0; c < columns.size(); c++) {
                    String text = expected.get(c);
                    Object value = r.getObject(c + 1);
                    String where = parquet.getFileName() + " row " + (row + 1) + " " + columns.get(c);
                    if (text.isEmpty()) {
                        assertEquals(null, value, where);
                    } else if (value instanceof String got) {
                        assertEquals(text, got, where);
                    } else if (value instanceof Long got) {
                        assertEquals(Long.parseLong(text), got, where);
                    } else {
                        assertEquals(RunTables.parseNumber(text), (Double) value, 0.0, where);
                    }
                }
                row++;
            }
            assertEquals(rows.size(), row, parquet + ": rows");
            assertTrue(row > 0, parquet + " holds rows");
        }
    }
}
