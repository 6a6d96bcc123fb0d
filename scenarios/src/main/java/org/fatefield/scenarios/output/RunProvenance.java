package org.fatefield.scenarios.output;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.InputStream;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import org.fatefield.engine.record.TimeSeries;
import org.fatefield.engine.tissue.Tissue;
import org.fatefield.scenarios.format.Scenario;

/** Builds {@code run.json}: what was run, with which seed and versions, and what came out. */
public final class RunProvenance {

    private RunProvenance() {
    }

    /**
     * The commit the tool was built from (abbreviated, with "-dirty" if the working tree had
     * uncommitted changes), from the build.properties the build writes; "unknown" for a build
     * outside a git checkout.
     */
    public static String buildCommit() {
        try (InputStream in = RunProvenance.class.getResourceAsStream("/org/fatefield/scenarios/build.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            String id = p.getProperty("git.commit.id.abbrev", "");
            if (id.isEmpty() || id.startsWith("$")) {
                return "unknown";
            }
            return id + ("true".equals(p.getProperty("git.dirty")) ? "-dirty" : "");
        } catch (IOException e) {
            return "unknown";
        }
    }

    /** The tool's version from the jar manifest, or "development" when run from classes. */
    public static String toolVersion() {
        String version = RunProvenance.class.getPackage().getImplementationVersion();
        return version != null ? version : "development";
    }

    /**
     * The provenance record as pretty-printed JSON.
     *
     * @param started     when the run began
     * @param wallSeconds wall-clock time of the simulation and output
     * @param files       files written beside it
     */
    public static String json(Scenario scenario, long seed, Tissue tissue, Instant started, double wallSeconds,
            List<String> files) {
        JsonObject root = new JsonObject();
        root.addProperty("tool", "fatefield");
        root.addProperty("tool_version", toolVersion());
        root.addProperty("build_commit", buildCommit());
        root.addProperty("java_version", System.getProperty("java.version"));
        root.addProperty("java_vendor", System.getProperty("java.vendor"));
        root.addProperty("os", System.getProperty("os.name") + " " + System.getProperty("os.arch"));
        JsonObject source = new JsonObject();
        source.addProperty("name", scenario.name());
        source.addProperty("source", scenario.source());
        source.addProperty("sha256", scenario.sha256());
        JsonArray overrides = new JsonArray();
        scenario.overrides().forEach(overrides::add);
        source.add("overrides", overrides);
        root.add("scenario", source);
        root.addProperty("seed", seed);
        root.addProperty("started", started.toString());
        root.addProperty("wall_time_s", Math.round(wallSeconds * 1000) / 1000.0);
        root.addProperty("simulated_time_h", tissue.time());
        root.addProperty("steps", tissue.steps());
        TimeSeries.Row last = tissue.series().last();
        root.addProperty("final_population", last.population());
        JsonObject fates = new JsonObject();
        List<String> names = tissue.series().fateNames();
        for (int f = 0; f < names.size(); f++) {
            fates.addProperty(names.get(f), last.fateCounts()[f]);
        }
        root.add("final_fate_counts", fates);
        JsonArray written = new JsonArray();
        files.forEach(written::add);
        root.add("files", written);
        root.add("provenance", Provenance.of("run", tissue.threads(), Map.of(scenario.source(), scenario.sha256())));
        return JsonFiles.text(root);
    }
}
