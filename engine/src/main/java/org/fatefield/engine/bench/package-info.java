/**
 * Speed and memory measurement of the tissue and of single-cell stepping against bare-loop
 * baselines measured in the same run (the benchmark command; never a timed test).
 */
package org.fatefield.engine.bench;
