/**
 * The live window on MASON's 2D display: the tissue over its field, our own controls, live charts,
 * and the clicked cell followed by id.
 */
package org.fatefield.viz.live;
