package org.fatefield.scenarios.calibration;

import java.nio.file.Path;
import java.util.List;
import org.fatefield.circuits.inference.AbcModel;
import org.fatefield.circuits.inference.Prior;
import org.fatefield.scenarios.format.Scenario;

/**
 * One hypothesis of a calibration: a scenario and the values in it to calibrate.
 *
 * @param name          label in tables and figures
 * @param scenarioLabel the scenario as the calibration file names it
 * @param base          the parsed scenario (its text and includes are copied into every round)
 * @param folder        the folder its includes are read from, or null for a built-in
 * @param parameters    the calibrated values, in order
 */
public record CalibrationModel(String name, String scenarioLabel, Scenario base, Path folder,
        List<CalibrationParameter> parameters) {

    /** Copies. */
    public CalibrationModel {
        parameters = List.copyOf(parameters);
    }

    /** The model as the inference sees it: parameter keys and priors. */
    public AbcModel abc() {
        return new AbcModel(name, parameters.stream().map(CalibrationParameter::key).toList(),
                parameters.stream().map(p -> (Prior) p.prior()).toList());
    }
}
