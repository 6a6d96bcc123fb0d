/**
 * Run folders: every file name (RunLayout), writing them atomically and never over a folder's files
 * without --force, the one CSV dialect and JSON configuration, lineage streaming, checkpoints,
 * frames, provenance and the run folder reader.
 */
package org.fatefield.scenarios.output;
