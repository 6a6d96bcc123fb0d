/**
 * Lineage records of every cell ever born, the sink they stream to, and the ancestry (the mother of
 * every id).
 */
package org.fatefield.engine.lineage;
