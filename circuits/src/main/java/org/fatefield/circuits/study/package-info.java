/**
 * The single-cell study a user asks for with the analyze command: a plan (parameter, range, second
 * parameter, what to compute) run into one result, independent of any tissue.
 */
package org.fatefield.circuits.study;
