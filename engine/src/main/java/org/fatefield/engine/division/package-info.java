/**
 * Cell cycle and division: cycle-time distributions, size control (timer, adder, sizer), volume
 * splitting, and how molecules are partitioned between daughters.
 */
package org.fatefield.engine.division;
