package org.fatefield.scenarios.sweep;

import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.fatefield.circuits.random.RandomStreams;
import org.fatefield.scenarios.output.RunTables;

/**
 * The runs of a planned sweep, in {@code manifest.csv}: a stable id, the point and replicate, the
 * seed (derived from the master seed and the point and replicate only, so re-planning gives the
 * same seeds) and the varied values.
 *
 * @param keys the varied scenario keys, in column order
 * @param runs the runs in plan order
 */
public record Manifest(List<String> keys, List<Run> runs) {

    /** File name in a sweep folder. */
    public static final String NAME = "manifest.csv";

    /**
     * One run.
     *
     * @param id        stable id, {@code p<point>-r<replicate>}
     * @param point     point index (0-based)
     * @param replicate replicate index (0-based)
     * @param seed      the run's seed
     * @param values    values of the varied keys
     */
    public record Run(String id, int point, int replicate, long seed, double[] values) {
    }

    /** Plans every run of {@code sweep}. */
    public static Manifest plan(SweepDefinition sweep) {
        List<String> keys = sweep.parameters().stream().map(SweepParameter::key).toList();
        List<Run> runs = new ArrayList<>();
        List<double[]> points = sweep.pointValues();
        RandomStreams streams = RandomStreams.of(sweep.seed());
        for (int p = 0; p < points.size(); p++) {
            for (int r = 0; r < sweep.replicates(); r++) {
                // 53 bits: from 0 to RandomStreams.MAX_SEED, like every seed Fatefield takes.
                long seed = streams.stream(p * 100_003L + r).nextLong() >>> 11;
                runs.add(new Run(String.format(Locale.ROOT, "p%04d-r%03d", p, r), p, r, seed, points.get(p)));
            }
        }
        return new Manifest(keys, runs);
    }

    /** The runs of shard {@code index} (1-based) of {@code count}: every count-th run. */
    public List<Run> shard(int index, int count) {
        if (count < 1 || index < 1 || index > count) {
            throw new IllegalArgumentException("shard must be I/N with 1 <= I <= N, got " + index + "/" + count);
        }
        List<Run> out = new ArrayList<>();
        for (int i = index - 1; i < runs.size(); i += count) {
            out.add(runs.get(i));
        }
        return out;
    }

    /** Writes {@code manifest.csv}. */
    public void write(Writer out) throws IOException {
        CSVPrinter printer = RunTables.printer(out);
        List<String> header = new ArrayList<>(List.of("run_id", "point", "replicate", "seed"));
        header.addAll(keys);
        printer.printRecord(header);
        for (Run run : runs) {
            List<String> row = new ArrayList<>(List.of(run.id(), Integer.toString(run.point()),
                    Integer.toString(run.replicate()), Long.toString(run.seed())));
            for (double v : run.values()) {
                row.add(Double.toString(v));
            }
            printer.printRecord(row);
        }
        printer.flush();
    }

    /** Reads {@code manifest.csv} from a sweep folder. */
    public static Manifest read(Path folder) throws IOException {
        Path file = folder.resolve(NAME);
        if (!Files.exists(file)) {
            throw new IOException(folder + " holds no " + NAME + "; plan it first with: fatefield sweep plan FILE --out "
                    + folder);
        }
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
                CSVParser parser = RunTables.parser(in)) {
            List<String> header = parser.getHeaderNames();
            List<CSVRecord> records = parser.getRecords();
            List<String> keys = header.subList(4, header.size());
            List<Run> runs = new ArrayList<>();
            for (CSVRecord r : records) {
                double[] values = new double[keys.size()];
                for (int k = 0; k < values.length; k++) {
                    values[k] = Double.parseDouble(r.get(4 + k));
                }
                runs.add(new Run(r.get(0), Integer.parseInt(r.get(1)), Integer.parseInt(r.get(2)),
                        Long.parseLong(r.get(3)), values));
            }
            return new Manifest(List.copyOf(keys), runs);
        }
    }
}
