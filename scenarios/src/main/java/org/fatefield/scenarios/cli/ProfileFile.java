package org.fatefield.scenarios.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.engine.metrics.FateProfile;

/** Reads a finished run's {@code profile.csv} back into a {@link FateProfile}. */
final class ProfileFile {

    private ProfileFile() {
    }

    static FateProfile read(Path file, int fates, double width) throws IOException {
        try (Reader in = Files.newBufferedReader(file)) {
            List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)
                    .getRecords();
            int[] counts = new int[rows.size()];
            int[][] byFate = new int[fates][rows.size()];
            for (int b = 0; b < rows.size(); b++) {
                CSVRecord row = rows.get(b);
                counts[b] = Integer.parseInt(row.get(1));
                for (int f = 0; f < fates; f++) {
                    double fraction = Double.parseDouble(row.get(2 + f));
                    byFate[f][b] = Double.isNaN(fraction) ? 0 : (int) Math.round(fraction * counts[b]);
                }
            }
            return FateProfile.fromCounts(width, counts, byFate);
        }
    }
}
