package org.fatefield.scenarios.output;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.parquet.conf.PlainParquetConfiguration;
import org.apache.parquet.example.data.Group;
import org.apache.parquet.example.data.simple.SimpleGroupFactory;
import org.apache.parquet.hadoop.ParquetWriter;
import org.apache.parquet.hadoop.example.ExampleParquetWriter;
import org.apache.parquet.hadoop.metadata.CompressionCodecName;
import org.apache.parquet.io.LocalOutputFile;
import org.apache.parquet.schema.LogicalTypeAnnotation;
import org.apache.parquet.schema.MessageType;
import org.apache.parquet.schema.PrimitiveType.PrimitiveTypeName;
import org.apache.parquet.schema.Type;
import org.apache.parquet.schema.Types;

/**
 * Parquet copies of the large tables ({@code lineage.csv}, {@code cells.csv}, the cell
 * snapshots), with the same columns and values as the CSV: text columns (fate names, a field's
 * name) as UTF-8 strings, ids, generations and molecule counts as 64-bit integers, everything
 * else as doubles, an empty CSV cell as null. Written through Apache Parquet's own writer with
 * its dictionary and run-length encodings and no block codec (the codecs need much of Hadoop at
 * run time); readable by pandas, R's arrow, DuckDB and Spark. Each file is written under a
 * temporary name and renamed when complete.
 */
public final class ParquetTables {

    /** Columns holding text. */
    private static final Set<String> TEXT = Set.of("fate", "fate_at_division", "fate_at_end", "field");
    /** Columns holding whole numbers (besides {@code <species>_molecules}). */
    private static final Set<String> WHOLE = Set.of("id", "parent_id", "generation");

    private ParquetTables() {
    }

    /** The Parquet file beside {@code csv}: same name, {@code .parquet} instead of {@code .csv}. */
    public static Path besides(Path csv) {
        String name = csv.getFileName().toString();
        return csv.resolveSibling(name.substring(0, name.length() - ".csv".length()) + ".parquet");
    }

    /**
     * Writes the Parquet copy of {@code csv} beside it and returns its path.
     *
     * @throws IOException if the table cannot be read or a value is not what its column holds
     */
    public static Path copy(Path csv) throws IOException {
        Path target = besides(csv);
        Path partial = RunLayout.partial(target);
        Files.deleteIfExists(partial);
        try (Reader in = Files.newBufferedReader(csv, StandardCharsets.UTF_8); CSVParser parser = RunTables.parser(in)) {
            List<String> columns = parser.getHeaderNames();
            MessageType schema = schema(columns);
            SimpleGroupFactory groups = new SimpleGroupFactory(schema);
            try (ParquetWriter<Group> writer = ExampleParquetWriter.builder(new LocalOutputFile(partial))
                    .withConf(new PlainParquetConfiguration()).withType(schema)
                    .withCompressionCodec(CompressionCodecName.UNCOMPRESSED).build()) {
                for (CSVRecord record : parser) {
                    writer.write(row(groups.newGroup(), columns, record, csv));
                }
            }
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(partial);
            throw e instanceof IOException io ? io : new IOException("cannot write " + target + ": " + e.getMessage(), e);
        }
        Files.move(partial, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        return target;
    }

    /** The Parquet schema of a table with these columns: every column optional (nullable). */
    static MessageType schema(List<String> columns) {
        List<Type> fields = new ArrayList<>();
        for (String column : columns) {
            fields.add(switch (kind(column)) {
                case TEXT -> Types.optional(PrimitiveTypeName.BINARY).as(LogicalTypeAnnotation.stringType())
                        .named(column);
                case WHOLE -> Types.optional(PrimitiveTypeName.INT64).named(column);
                default -> Types.optional(PrimitiveTypeName.DOUBLE).named(column);
            });
        }
        return new MessageType("fatefield_table", fields);
    }

    private enum Kind {
        TEXT, WHOLE, NUMBER
    }

    private static Kind kind(String column) {
        if (TEXT.contains(column)) {
            return Kind.TEXT;
        }
        return WHOLE.contains(column) || column.endsWith("_molecules") ? Kind.WHOLE : Kind.NUMBER;
    }

    private static Group row(Group group, List<String> columns, CSVRecord record, Path csv) throws IOException {
        for (int c = 0; c < columns.size(); c++) {
            String text = record.get(c);
            if (text.isEmpty()) {
                continue;
            }
            String column = columns.get(c);
            try {
                switch (kind(column)) {
                    case TEXT -> group.append(column, text);
                    case WHOLE -> group.append(column, Long.parseLong(text));
                    default -> group.append(column, RunTables.parseNumber(text));
                }
            } catch (NumberFormatException e) {
                throw new IOException(csv + " line " + (record.getRecordNumber() + 1) + ", column " + column + ": \""
                        + text + "\" is not a number", e);
            }
        }
        return group;
    }
}
