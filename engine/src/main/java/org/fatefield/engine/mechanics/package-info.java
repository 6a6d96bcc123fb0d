/**
 * Overdamped mechanics: repulsion of overlapping cells and adhesion of near neighbours on a bucket
 * grid, summed in an order fixed by position and id.
 */
package org.fatefield.engine.mechanics;
