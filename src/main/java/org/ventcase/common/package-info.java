/**
 * What every other package shares: the exception family (invalid input with its field path,
 * convergence failure, no solution) and physical constants. Imports only {@code java.*}.
 */
package org.ventcase.common;
