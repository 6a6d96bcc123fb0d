/**
 * The command line (picocli): one class per command, and the options several commands share with
 * their range checks.
 */
package org.fatefield.scenarios.cli;
