/**
 * Offline HTML reports of a run folder or a replicate set.
 */
package org.fatefield.scenarios.report;
