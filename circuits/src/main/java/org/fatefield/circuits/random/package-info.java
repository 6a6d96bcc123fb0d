/**
 * Random streams: one xoroshiro128++ stream per key (cell id) seeded from the master seed, streams
 * embedded in their owners' state words, and a source switchable between streams for samplers built
 * once.
 */
package org.fatefield.circuits.random;
