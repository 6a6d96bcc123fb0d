package org.fatefield.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

/**
 * The rule of every test that needs an X display: skipped, saying why, where there is none, and
 * never skipped when FATEFIELD_REQUIRE_DISPLAY=1 (as .ci/run sets it, with Xvfb started).
 */
final class RequiredDisplay {

    private RequiredDisplay() {
    }

    /** Skips or fails {@code test} without a display, as the rule says. */
    static void check(String test) {
        boolean display = System.getenv("DISPLAY") != null;
        boolean required = "1".equals(System.getenv("FATEFIELD_REQUIRE_DISPLAY"));
        if (!display && !required) {
            System.err.println(test + " skipped: no DISPLAY (.ci/run starts Xvfb; set FATEFIELD_REQUIRE_DISPLAY=1 to"
                    + " make this a failure)");
        }
        assumeTrue(display || required, "no display");
        assertTrue(display, "FATEFIELD_REQUIRE_DISPLAY=1 but DISPLAY is not set");
    }
}
