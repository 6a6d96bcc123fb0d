/**
 * The sealed domain type (rectangle, disc, strip): founder placement, confinement inside the walls
 * and the periodic seam, for every stage that places or moves cells.
 */
package org.fatefield.engine.domain;
