/**
 * A tissue's circuit along its control parameter (the first coupling): branches over the range the
 * coupling reaches and landscapes at any value, for the live view and the report.
 */
package org.fatefield.engine.control;
