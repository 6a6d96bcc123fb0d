/**
 * The tissue as a MASON SimState: its specification, the one tick (fields, cells, divisions in id
 * order, deaths, mechanics, memory layout, records, observers), checkpoints, and the observer
 * interface every driver uses.
 */
package org.fatefield.engine.tissue;
