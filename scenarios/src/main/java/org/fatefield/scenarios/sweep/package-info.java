/**
 * Parameter sweeps: sweep files, designs (grid, Latin hypercube, Sobol), manifests with stable run
 * ids and seeds, resumable runs on local workers or SLURM array tasks, and collection of the
 * results.
 */
package org.fatefield.scenarios.sweep;
