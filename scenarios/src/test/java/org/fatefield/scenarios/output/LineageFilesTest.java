package org.fatefield.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.engine.lineage.LineageRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** lineage.csv round-trips fate names that need CSV quoting (RFC 4180), and the trees stay valid Newick. */
class LineageFilesTest {

    @Test
    void fateNamesWithCommasAndQuotesSurvive(@TempDir Path dir) throws Exception {
        List<String> fates = List.of("crest, anterior", "say \"hi\"", "plain");
        try (LineageFiles files = LineageFiles.start(dir, fates)) {
            files.accept(new LineageRecord(0, -1, 0, -2.5, 3.0, 10, 20, 0, 0, -1, Double.NaN, Double.NaN, 1, 2, Double.NaN));
            files.accept(new LineageRecord(1, 0, 1, 3.0, Double.NaN, 11, 21, 0, -1, 1, 4.5, Double.NaN, 1, 1.5, 4.0));
            files.accept(new LineageRecord(2, 0, 1, 3.0, Double.NaN, 9, 19, 0, -1, 2, 1.5, 6.0, 1, 1.2, Double.NaN));
        }
        List<CSVRecord> rows = RunTables.records(dir.resolve(RunLayout.LINEAGE));
        assertEquals(3, rows.size());
        assertEquals(RunTables.LINEAGE_HEADER, rows.get(0).getParser().getHeaderNames());
        assertEquals("crest, anterior", rows.get(0).get("fate_at_division"));
        assertEquals("", rows.get(0).get("fate_at_end"));
        assertEquals("say \"hi\"", rows.get(1).get("fate_at_end"));
        assertEquals("4.5", rows.get(1).get("commitment_time_h"));
        assertEquals("4.5", rows.get(1).get("lineage_commitment_time_h"));
        // Cell 2 was born at 3 h into the fate its lineage entered at 1.5 h: its own entry is its birth.
        assertEquals("3", rows.get(2).get("commitment_time_h"));
        assertEquals("1.5", rows.get(2).get("lineage_commitment_time_h"));
        assertEquals("6", rows.get(2).get("death_time_h"));
        StringWriter trees = new StringWriter();
        LineageFiles.writeTrees(dir.resolve(RunLayout.LINEAGE), 8.0, trees);
        // Founder 0 lived 5.5 h; daughter 1 to the end (5 h), daughter 2 died at 6 h (3 h).
        assertEquals("(c1_say__hi_:5,c2_plain:3)c0_crest__anterior:5.5;\n", trees.toString());
    }
}
