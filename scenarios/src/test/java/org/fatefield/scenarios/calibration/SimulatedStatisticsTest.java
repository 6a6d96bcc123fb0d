package org.fatefield.scenarios.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The statistics a particle's replicate tissues give, against values worked by hand: the mean
 * over replicates, the sample standard deviation (n - 1 denominator) for a positional error,
 * linear interpolation of the profile between bin centres, and NaN where a statistic is
 * undefined in any replicate.
 */
class SimulatedStatisticsTest {

    private static JsonObject result(double boundary, String profile) {
        return JsonParser.parseString("{\"complete\": true, \"metrics\": {\"boundary_progenitor_um\": " + boundary
                + ", \"fraction_photocyte\": 0.25}, \"profile\": " + profile + "}").getAsJsonObject();
    }

    @Test
    void meansStandardDeviationsAndInterpolatedProfilePoints() {
        String profile = "{\"x_um\": [10, 30, 50], \"fraction_photocyte\": [0.8, 0.4, null]}";
        List<JsonObject> tissues = List.of(result(200, profile), result(210, profile), result(230, profile));
        List<Observation> observations = List.of(Observation.summary("boundary_progenitor_um", 0, 1, "um"),
                Observation.summary("positional_error_progenitor_um", 0, 1, "um"),
                new Observation("profile_photocyte_at_15um", 0, 1, "1", "photocyte", 15),
                new Observation("profile_photocyte_at_40um", 0, 1, "1", "photocyte", 40),
                Observation.summary("fraction_photocyte", 0, 1, "1"),
                Observation.summary("width_progenitor_um", 0, 1, "um"));
        double[] s = SimulatedStatistics.of(tissues, observations);
        assertEquals(640.0 / 3, s[0], 1e-12);
        // Sample sd of 200, 210, 230: deviations -13.33, -3.33, 16.67; sum of squares 466.67; / 2 = 233.33.
        assertEquals(Math.sqrt(1400.0 / 6), s[1], 1e-12);
        // Between (10, 0.8) and (30, 0.4) at x = 15: 0.8 - 0.4 * 5 / 20 = 0.7.
        assertEquals(0.7, s[2], 1e-12);
        assertTrue(Double.isNaN(s[3]), "next to an empty bin the profile is undefined");
        assertEquals(0.25, s[4], 1e-12);
        assertTrue(Double.isNaN(s[5]), "a metric no replicate reports is undefined");
    }
}
