/** Figures of a calibration: the posterior's pairs plot and the posterior predictive check. */
package org.fatefield.viz.calibration;
