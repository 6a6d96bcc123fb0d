/**
 * Circuits as reaction networks (species, parameters, reactions with propensities, analytic
 * Jacobian): the built-in self-activating switch, general Hill networks, and custom networks from
 * rate laws.
 */
package org.fatefield.circuits.model;
