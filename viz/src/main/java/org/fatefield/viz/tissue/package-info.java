/**
 * Headless drawing of the tissue (PNG frames, animated GIF).
 */
package org.fatefield.viz.tissue;
