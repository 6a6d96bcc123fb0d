/**
 * Numerical continuation: pseudo-arclength tracing of steady-state branches, location of folds,
 * branch points and Hopf points, branch switching, and two-parameter fold curves with cusps.
 */
package org.fatefield.circuits.analysis.continuation;
