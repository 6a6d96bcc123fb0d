/**
 * How local field levels set circuit parameters: the sealed coupling laws (linear, Hill, table) and
 * the mapping from a cell's signals to its parameter vector.
 */
package org.fatefield.engine.coupling;
