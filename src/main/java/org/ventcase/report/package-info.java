/**
 * The calculation sheet: a report-side model ({@link org.ventcase.report.SheetModel}) filled from a
 * calculation result by {@link org.ventcase.report.SheetModels}, and a PDF writer
 * ({@link org.ventcase.report.CalculationSheet}) with vector figures (vessel elevation sketch, line
 * charts). The sheet never computes: every number on it is a value of the result or of its trace,
 * converted to the sheet's unit system in one place ({@link org.ventcase.report.DisplayUnits}).
 * Only this package imports PDFBox. Cautions and the code-deferral note come from the text blocks
 * in {@code templates/text/} through {@link org.ventcase.casefile.Templates}.
 */
package org.ventcase.report;
