/**
 * Figures of single-cell analyses: bifurcation diagrams, the bistable region, phase portraits with
 * nullclines, basin and landscape maps.
 */
package org.fatefield.viz.analysis;
