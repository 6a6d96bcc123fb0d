package org.fatefield.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The Kaplan-Meier median against a published worked example. */
class FirstPassageSummaryTest {

    /**
     * Remission times (weeks) of the 6-MP group of Freireich et al. (1963, Blood 21:699), the
     * standard worked example of Kleinbaum &amp; Klein (2012, Survival Analysis, 3rd ed., Springer,
     * ch. 2): 9 relapses and 12 censored times; the product-limit survival is 0.538 at 22 weeks
     * and 0.448 at 23, so the median is 23 weeks.
     */
    @Test
    void productLimitMedianOfTheWorkedExample() {
        List<double[]> times = new ArrayList<>();
        for (double t : new double[] {6, 6, 6, 7, 10, 13, 16, 22, 23}) {
            times.add(new double[] {t, 1});
        }
        for (double t : new double[] {6, 9, 10, 11, 17, 19, 20, 25, 32, 32, 34, 35}) {
            times.add(new double[] {t, 0});
        }
        assertEquals(23.0, FirstPassageSummary.kaplanMeierMedian(times), 0.0);
    }

    /** Without censoring the product-limit median is the ordinary sample median (common practice). */
    @Test
    void withoutCensoringItIsTheSampleMedian() {
        List<double[]> times = new ArrayList<>();
        for (double t : new double[] {5, 1, 4, 2, 3}) {
            times.add(new double[] {t, 1});
        }
        assertEquals(3.0, FirstPassageSummary.kaplanMeierMedian(times), 0.0);
    }
}
