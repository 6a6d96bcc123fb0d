/**
 * Robustness of a tissue's pattern: paired runs with one quantity scaled up and down, and the
 * sensitivity of boundaries, widths and proportions with confidence intervals.
 */
package org.fatefield.engine.robustness;
