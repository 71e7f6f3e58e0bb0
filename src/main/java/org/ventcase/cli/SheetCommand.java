package org.ventcase.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseInput;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.Problem;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.common.InvalidInputException;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.SheetModel;
import org.ventcase.report.SheetModels;
import org.ventcase.report.UnitSystem;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ventcase sheet}: writes the PDF calculation sheet of a case file (every scenario, through
 * the case pipeline) or of the built-in demo case ({@code --demo}).
 */
@Command(name = "sheet", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Write the PDF calculation sheet of a relief basis.",
        description = {"Writes a PDF sheet with the title block, inputs, results, figures, every calculation step "
                + "with its equation and source, warnings, cautions and the note deferring to the applicable codes "
                + "and to a qualified engineer, for a case file (every scenario) or the built-in invented demo case "
                + "(--demo). Exit codes: 0 written, 2 invalid case or option, 3 no convergence, 4 file error."},
        footer = ExitCode.HELP_LIST)
final class SheetCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..1", paramLabel = "CASE.json", description = "The case file (format: docs/case-files.md); it is only read.")
    Path caseFile;

    @Option(names = "--demo", description = "Use the built-in invented demo case demo-cases/propane-bullet-fire.json (the one "
            + "'ventcase demo' opens and prints).")
    boolean demo;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "SHEET.pdf",
            description = "PDF file to write (written to a temporary file first, then moved into place).")
    Path output;

    @Mixin
    PdfOptions pdfOptions;

    @Override
    public Integer call() throws IOException {
        UnitSystem system = pdfOptions.system();
        CalculationSheet.PageSize size = pdfOptions.size();
        SheetModel model;
        try {
            model = model(system);
        } catch (CaseValidationException e) {
            var err = spec.commandLine().getErr();
            err.println(e.origin() + ": " + e.problems().size() + (e.problems().size() == 1 ? " problem" : " problems"));
            for (Problem p : e.problems()) {
                err.println("  " + p.message());
            }
            return ExitCode.INVALID_INPUT;
        }
        CalculationSheet.write(model, output, size);
        spec.commandLine().getOut().println("ventcase: wrote " + output + " (" + model.identity().tag() + ", "
                + system.name() + " units, " + size.name() + ")");
        return ExitCode.OK;
    }

    private SheetModel model(UnitSystem system) {
        if (demo && caseFile != null) {
            throw InvalidInputException.invalid("CASE.json", caseFile, "give either --demo or a case file, not both");
        }
        if (demo) {
            return demoModel(system);
        }
        if (caseFile == null) {
            throw InvalidInputException.missing("CASE.json", "give a case file or --demo");
        }
        if (output.toAbsolutePath().normalize().equals(caseFile.toAbsolutePath().normalize())) {
            throw InvalidInputException.invalid("--output", output, "a file other than the case file (the case file "
                    + "is never overwritten)");
        }
        return caseModel(CaseFiles.load(caseFile), system, Main.version());
    }

    /** The sheet of a validated case: the case pipeline, then the case mapper. */
    static SheetModel caseModel(ValidatedCase kase, UnitSystem system, String version) {
        CaseInput in = CaseInputs.from(kase);
        CaseResult r = CaseCalculation.run(in);
        return SheetModels.from(r, in, org.ventcase.app.CaseSheets.identity(kase, version), system);
    }


    /** The demo's sheet: the packaged demo case (the one 'ventcase demo' runs) through the case pipeline. */
    static SheetModel demoModel(UnitSystem system) {
        return caseModel(DemoCommand.demoCase(), system, Main.version());
    }
}
