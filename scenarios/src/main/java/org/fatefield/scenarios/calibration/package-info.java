/**
 * Calibration of scenarios to measured patterns: the observation file, the calibration file,
 * the tissue simulator that evaluates ABC-SMC candidates through sweep folders (on local workers
 * or as SLURM array jobs), and the calibration folder's tables and figures.
 */
package org.fatefield.scenarios.calibration;
