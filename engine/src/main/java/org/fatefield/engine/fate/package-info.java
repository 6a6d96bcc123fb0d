/**
 * Fate rules (thresholds on species levels) and the classifier that reads a cell's state as a fate.
 */
package org.fatefield.engine.fate;
