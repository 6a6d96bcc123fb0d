/**
 * What a run measures: fate profiles along the gradient and boundaries, lineage statistics, the
 * boundary predicted from the single-cell bifurcation, and summaries of replicate measurements.
 */
package org.fatefield.engine.metrics;
