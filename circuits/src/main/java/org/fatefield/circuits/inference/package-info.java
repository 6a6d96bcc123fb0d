/**
 * Likelihood-free inference: approximate Bayesian computation by sequential Monte Carlo, for any
 * simulator that maps parameter values and a seed to summary statistics, with the evidence of
 * each competing model at every tolerance. Pure numerics: the tissue comes in through
 * {@link org.fatefield.circuits.inference.BatchSimulator}.
 */
package org.fatefield.circuits.inference;
