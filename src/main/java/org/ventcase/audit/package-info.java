/**
 * Inventory audit of a vessel register: one vessel a row (CSV) or a folder of case files in, per
 * vessel the inventory and a screening fire load computed through the same case path as
 * {@code ventcase calc} ({@link org.ventcase.calc.CaseCalculation#run}), totals by area, fluid and
 * component, user-set substance thresholds, and a spreadsheet-safe CSV out. Rows that cannot be
 * computed are reported with their row number, field and reason; the others are still computed.
 *
 * <p>Domain-level: imports java.*, common, units, thermo, vessel, inventory, relief, device and
 * calc only (no casefile, report, cli or JavaFX; see {@code LayeringTest}). The CSV reading and
 * writing here is plain Java.
 */
package org.ventcase.audit;
