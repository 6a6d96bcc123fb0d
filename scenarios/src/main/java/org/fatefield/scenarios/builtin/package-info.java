/**
 * The built-in scenarios (invented tissues shipped as TOML resources).
 */
package org.fatefield.scenarios.builtin;
