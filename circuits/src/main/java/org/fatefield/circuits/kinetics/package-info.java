/**
 * Building blocks of rate laws shared by the built-in circuits and the rate-law language: Hill
 * activation and repression and their slopes.
 */
package org.fatefield.circuits.kinetics;
