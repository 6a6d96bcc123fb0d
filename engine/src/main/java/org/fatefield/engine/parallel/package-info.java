/**
 * Index-split parallel loops on a fixed pool whose results do not depend on the number of threads.
 */
package org.fatefield.engine.parallel;
