/**
 * Charts of runs (JFreeChart): fate proportions over time, profiles along the gradient, replicate
 * profiles, sensitivities and sweep plots, and writing them as PNG or SVG.
 */
package org.fatefield.viz.chart;
