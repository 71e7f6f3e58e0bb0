/**
 * Quantities typed by people, parsed into SI at the edges; absolute vs gauge pressure is always
 * explicit. Imports only {@code java.*} and {@code org.ventcase.common}.
 */
package org.ventcase.units;
