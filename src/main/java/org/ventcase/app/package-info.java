/**
 * The application layer: the work that the command line and the wizard both drive (a case's sheet,
 * the reviewer's cross-check, the inventory audit), on top of the domain packages, the case files
 * and the report. No JavaFX, no picocli and no printing, so that the CLI, the wizard and the tests
 * call the same code (checked by {@code LayeringTest} and {@code CompiledLayeringTest}).
 */
package org.ventcase.app;
