/**
 * Single-cell analyses of any circuit: steady states and their stability, basins, the
 * quasi-potential landscape (sampled or solved on a grid), switching times and commitment, the
 * linear noise approximation.
 */
package org.fatefield.circuits.analysis;
