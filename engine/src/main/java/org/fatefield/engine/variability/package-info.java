/**
 * Extrinsic (cell-to-cell) variability of circuit parameters: lognormal factors inherited at
 * division with a set mother-daughter correlation.
 */
package org.fatefield.engine.variability;
