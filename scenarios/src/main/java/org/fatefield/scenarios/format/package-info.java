/**
 * The scenario format: the schema every key is checked against (the single source of keys, units,
 * defaults and ranges), the checker, the compilers into model objects, overrides laid over the
 * parsed tree, and the generated reference.
 */
package org.fatefield.scenarios.format;
