/**
 * Writing a single-cell study to its folder: the tables and figures of the analyze command.
 */
package org.fatefield.scenarios.analysis;
