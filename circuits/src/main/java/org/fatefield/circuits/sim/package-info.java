/**
 * Steppers that advance one cell's circuit state in place over a time step: deterministic (RK4,
 * Dormand-Prince), chemical Langevin (Euler-Maruyama), and exact or approximate discrete methods
 * (Gillespie's direct method, tau-leaping).
 */
package org.fatefield.circuits.sim;
