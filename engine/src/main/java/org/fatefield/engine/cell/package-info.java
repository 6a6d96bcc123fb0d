/**
 * Cells (position, size, circuit state, the words of their own random stream) and the population
 * that holds them in a deterministic order; only CellRandom draws from a cell's stream.
 */
package org.fatefield.engine.cell;
