package org.fatefield.scenarios.calibration;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVPrinter;
import org.fatefield.circuits.inference.AbcSmc;
import org.fatefield.circuits.inference.Generation;
import org.fatefield.circuits.inference.Population;
import org.fatefield.scenarios.output.JsonFiles;
import org.fatefield.scenarios.output.RunFolder;
import org.fatefield.scenarios.output.RunTables;

/**
 * The tables of a calibration folder: {@code generations.csv} (tolerance, acceptance, effective
 * sample size and evidence per generation and model), {@code populations/g<t>.csv} and
 * {@code posterior.csv} (weighted particles), and {@code summary.json} (posterior summaries,
 * model probabilities, why it stopped). Missing values are empty cells.
 */
final class CalibrationTables {

    private CalibrationTables() {
    }

    /** Header of a population table: model, particle, weight, distance, then every model's keys. */
    static List<String> populationHeader(List<CalibrationModel> models) {
        List<String> header = new ArrayList<>(List.of("model", "particle", "weight", "distance"));
        for (CalibrationModel m : models) {
            for (CalibrationParameter p : m.parameters()) {
                if (!header.contains(p.key())) {
                    header.add(p.key());
                }
            }
        }
        return header;
    }

    static void writePopulation(RunFolder folder, String name, Generation g, List<CalibrationModel> models)
            throws IOException {
        List<String> header = populationHeader(models);
        folder.writeText(name, w -> {
            CSVPrinter csv = RunTables.printer(w);
            csv.printRecord(header);
            for (Population p : g.populations()) {
                CalibrationModel model = models.get(p.model());
                for (int j = 0; j < p.size(); j++) {
                    List<String> row = new ArrayList<>(List.of(model.name(), Integer.toString(j + 1),
                            RunTables.number(p.weights()[j]), RunTables.number(p.distances()[j])));
                    for (int c = 4; c < header.size(); c++) {
                        int a = model.abc().parameters().indexOf(header.get(c));
                        row.add(a < 0 ? "" : RunTables.number(p.theta()[j][a]));
                    }
                    csv.printRecord(row);
                }
            }
            csv.flush();
        });
    }

    static void writeGenerations(RunFolder folder, List<Generation> generations, List<CalibrationModel> models)
            throws IOException {
        folder.writeText("generations.csv", w -> {
            CSVPrinter csv = RunTables.printer(w);
            csv.printRecord("generation", "model", "tolerance", "proposals", "simulated", "accepted",
                    "acceptance_rate", "particles", "effective_sample_size", "evidence", "evidence_se",
                    "model_probability", "model_probability_se");
            for (Generation g : generations) {
                for (Population p : g.populations()) {
                    double rate = p.proposals() > 0 ? (double) p.accepted() / p.proposals() : Double.NaN;
                    csv.printRecord(g.index(), models.get(p.model()).name(), finite(g.tolerance()), p.proposals(),
                            p.simulated(), p.accepted(), finite(rate), p.size(), finite(p.effectiveSampleSize()),
                            finite(p.evidence()), finite(p.evidenceSe()), finite(g.models().probabilities()[p.model()]),
                            finite(g.models().errors()[p.model()]));
                }
            }
            csv.flush();
        });
    }

    static JsonObject summary(AbcSmc.Result result, List<CalibrationModel> models, long failedTissues) {
        Generation last = result.last();
        JsonObject out = new JsonObject();
        out.addProperty("stop_reason", result.stopReason());
        out.addProperty("generations", result.generations().size());
        out.addProperty("final_tolerance", JsonFiles.finite(last.tolerance()));
        out.addProperty("failed_tissues", failedTissues);
        JsonArray list = new JsonArray();
        for (Population p : last.populations()) {
            CalibrationModel model = models.get(p.model());
            JsonObject m = new JsonObject();
            m.addProperty("name", model.name());
            m.addProperty("scenario", model.scenarioLabel());
            m.addProperty("particles", p.size());
            m.addProperty("effective_sample_size", JsonFiles.finite(p.effectiveSampleSize()));
            m.addProperty("probability", JsonFiles.finite(last.models().probabilities()[p.model()]));
            m.addProperty("probability_se", JsonFiles.finite(last.models().errors()[p.model()]));
            JsonArray parameters = new JsonArray();
            for (int a = 0; a < model.parameters().size() && p.size() > 0; a++) {
                JsonObject q = new JsonObject();
                q.addProperty("key", model.parameters().get(a).key());
                q.addProperty("prior", model.parameters().get(a).prior().describe());
                q.addProperty("mean", p.mean(a));
                q.addProperty("sd", Math.sqrt(p.variance(a)));
                q.addProperty("median", p.quantile(a, 0.5));
                q.addProperty("ci95_low", p.quantile(a, 0.025));
                q.addProperty("ci95_high", p.quantile(a, 0.975));
                parameters.add(q);
            }
            m.add("parameters", parameters);
            list.add(m);
        }
        out.add("models", list);
        return out;
    }

    private static String finite(double v) {
        return Double.isFinite(v) ? RunTables.number(v) : "";
    }

    /** A population file name for generation {@code t}. */
    static String populationFile(int t) {
        return String.format(Locale.ROOT, "populations/g%02d.csv", t);
    }
}
