package org.ventcase.cli;

import org.ventcase.report.CalculationSheet;
import org.ventcase.report.UnitSystem;

import picocli.CommandLine.Option;

/** The paper size and unit system of the commands that write a PDF (sheet, review, audit). */
final class PdfOptions {

    @Option(names = "--page", paramLabel = "SIZE", defaultValue = "a4",
            description = "Paper size of the PDF: a4 or letter. Default: ${DEFAULT-VALUE}.")
    String page;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Units of what is printed and of the PDF: si or us. JSON and CSV files always stay in SI "
                    + "(units in their names or headers). Default: ${DEFAULT-VALUE}.")
    String units;

    /** The paper size asked for; a refused name is reported with the option and the accepted sizes. */
    CalculationSheet.PageSize size() {
        return CalculationSheet.PageSize.parse("--page", page);
    }

    /** The unit system asked for; a refused name is reported with the option and the accepted systems. */
    UnitSystem system() {
        return UnitSystem.parse("--units", units);
    }
}
