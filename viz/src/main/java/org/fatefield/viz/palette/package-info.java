/**
 * The colours of fates, species and fields, shared by every figure and the live window.
 */
package org.fatefield.viz.palette;
