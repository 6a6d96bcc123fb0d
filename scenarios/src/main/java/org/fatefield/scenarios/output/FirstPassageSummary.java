package org.fatefield.scenarios.output;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * How long cells born during a run take, from their birth, to first enter the timed fate
 * ({@code fates.first_passage}), read from the finished {@code lineage.csv}.
 *
 * <p>A cell that divides, dies or reaches the end of the run before entering is censored at that
 * time. The median is the Kaplan-Meier (product-limit) estimate, which accounts for censoring
 * (Kaplan, E. L. &amp; Meier, P. 1958, J. Am. Stat. Assoc. 53:457); the mean and standard deviation
 * are over the cells that entered only, and are biased low when many are censored. Founders
 * are left out: their lives began before the run.
 *
 * @param fate     the timed fate
 * @param cells    cells born during the run
 * @param entered  of those, cells that entered the fate
 * @param censored cells that did not (divided, died or still outside at the end)
 * @param mean     mean time from birth to entry over the cells that entered (h), NaN if none
 * @param sd       their standard deviation (h), NaN if fewer than two
 * @param median   Kaplan-Meier median time from birth to entry (h), NaN if the survival curve never falls to 1/2
 */
public record FirstPassageSummary(String fate, long cells, long entered, long censored, double mean, double sd,
        double median) {

    /** Reads {@code lineage} (a finished lineage table) for the timed fate {@code fate}. */
    public static FirstPassageSummary read(Path lineage, String fate, double endTime) throws IOException {
        List<double[]> times = new ArrayList<>();
        long entered = 0;
        double sum = 0;
        double sumSq = 0;
        try (Reader in = Files.newBufferedReader(lineage, StandardCharsets.UTF_8);
                CSVParser parser = RunTables.parser(in)) {
            for (CSVRecord r : parser) {
                if (Long.parseLong(r.get("parent_id")) < 0) {
                    continue;
                }
                double birth = RunTables.parseNumber(r.get("birth_time_h"));
                double entry = RunTables.parseNumber(r.get("first_entry_time_h"));
                if (Double.isFinite(entry)) {
                    double t = entry - birth;
                    times.add(new double[] {t, 1});
                    entered++;
                    sum += t;
                    sumSq += t * t;
                } else {
                    double division = RunTables.parseNumber(r.get("division_time_h"));
                    double death = RunTables.parseNumber(r.get("death_time_h"));
                    double end = Double.isFinite(division) ? division : Double.isFinite(death) ? death : endTime;
                    times.add(new double[] {end - birth, 0});
                }
            }
        }
        long cells = times.size();
        double mean = entered > 0 ? sum / entered : Double.NaN;
        double sd = entered > 1 ? Math.sqrt(Math.max(0, (sumSq - entered * mean * mean) / (entered - 1))) : Double.NaN;
        return new FirstPassageSummary(fate, cells, entered, cells - entered, mean, sd, kaplanMeierMedian(times));
    }

    /** Product-limit median of (time, 1 = event / 0 = censored) pairs; events come before censorings at ties. */
    static double kaplanMeierMedian(List<double[]> times) {
        double[][] sorted = times.toArray(new double[0][]);
        Arrays.sort(sorted, (a, b) -> a[0] != b[0] ? Double.compare(a[0], b[0]) : Double.compare(b[1], a[1]));
        double survival = 1.0;
        int atRisk = sorted.length;
        int i = 0;
        while (i < sorted.length) {
            double t = sorted[i][0];
            int events = 0;
            int leaving = 0;
            while (i < sorted.length && sorted[i][0] == t) {
                events += (int) sorted[i][1];
                leaving++;
                i++;
            }
            if (events > 0) {
                survival *= 1.0 - (double) events / atRisk;
                if (survival <= 0.5) {
                    return t;
                }
            }
            atRisk -= leaving;
        }
        return Double.NaN;
    }

    /** The summary as a JSON object for {@code metrics.json}. */
    public JsonObject json() {
        JsonObject o = new JsonObject();
        o.addProperty("fate", fate);
        o.addProperty("cells_born", cells);
        o.addProperty("entered", entered);
        o.addProperty("censored", censored);
        o.addProperty("mean_time_from_birth_h", JsonFiles.finite(mean));
        o.addProperty("sd_time_from_birth_h", JsonFiles.finite(sd));
        o.addProperty("median_time_from_birth_h", JsonFiles.finite(median));
        return o;
    }
}
