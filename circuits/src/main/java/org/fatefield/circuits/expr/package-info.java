/**
 * The rate-law language of custom circuits: a parser that builds expression trees from a fixed
 * grammar (nothing else is reachable, so a scenario can never execute code), symbolic
 * differentiation and compiled evaluation.
 */
package org.fatefield.circuits.expr;
