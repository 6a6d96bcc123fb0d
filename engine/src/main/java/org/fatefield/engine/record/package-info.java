/**
 * Records a run keeps in memory while it runs: the fate counts over time.
 */
package org.fatefield.engine.record;
