/**
 * Morphogen fields on a grid: diffusion, decay and synthesis by an explicit or an ADI scheme, wall
 * conditions, exchange with cells, time courses and lookup tables.
 */
package org.fatefield.engine.field;
