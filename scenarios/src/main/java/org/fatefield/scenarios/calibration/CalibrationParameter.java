package org.fatefield.scenarios.calibration;

import org.fatefield.circuits.inference.Prior;

/**
 * A scenario value to calibrate and its prior.
 *
 * @param key   the scenario key path, as in validation messages ({@code morphogen.source[1].rate})
 * @param prior its prior
 */
public record CalibrationParameter(String key, Prior prior) {
}
