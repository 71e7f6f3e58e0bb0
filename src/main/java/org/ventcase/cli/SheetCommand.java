package org.ventcase.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.common.InvalidInputException;
import org.ventcase.relief.WettedFire;
import org.ventcase.relief.WettedFireResult;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.SheetIdentity;
import org.ventcase.report.SheetModel;
import org.ventcase.report.SheetModels;
import org.ventcase.report.UnitSystem;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ventcase sheet}: writes the PDF calculation sheet. For now the built-in demo case
 * ({@code --demo}); a case file will be one more branch in {@link #model()} once the case
 * calculation pipeline produces a result for it.
 */
@Command(name = "sheet", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Write the PDF calculation sheet of a relief basis.",
        description = {"Writes a PDF sheet with the title block, inputs, results, figures, every calculation step "
                + "with its equation and source, warnings, cautions and the note deferring to the applicable codes "
                + "and to a qualified engineer. For now only the built-in invented demo case (--demo) is available."},
        footer = ExitCode.HELP_LIST)
final class SheetCommand implements Callable<Integer> {

    /** The demo as a case file, for its title block and input hash. */
    static final String DEMO_CASE = "/org/ventcase/cli/demo-case.json";

    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..1", paramLabel = "CASE.json", description = "Case file (coming with the case pipeline).")
    Path caseFile;

    @Option(names = "--demo", description = "Use the built-in invented demo case (the one 'ventcase demo' prints).")
    boolean demo;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "SHEET.pdf",
            description = "PDF file to write (written to a temporary file first, then moved into place).")
    Path output;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "Unit system of the tables: si or us; the other is bracketed for key values. "
                    + "Default: ${DEFAULT-VALUE}.")
    String units;

    @Option(names = "--page", paramLabel = "SIZE", defaultValue = "a4",
            description = "Paper size: a4 or letter. Default: ${DEFAULT-VALUE}.")
    String page;

    @Override
    public Integer call() throws IOException {
        UnitSystem system = UnitSystem.parse("--units", units);
        CalculationSheet.PageSize size = CalculationSheet.PageSize.parse("--page", page);
        SheetModel model = model(system);
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
        throw InvalidInputException.invalid("CASE.json", caseFile,
                "sheets from case files come with the case calculation pipeline; for now use --demo");
    }

    /** The demo's sheet: the demo calculation with the title block and input hash of its case file. */
    static SheetModel demoModel(UnitSystem system) {
        ValidatedCase kase = CaseFiles.load(demoCaseJson(), "demo-case.json");
        ValidatedCase.Identity id = kase.identity();
        SheetIdentity identity = new SheetIdentity(id.title(), id.tag(), id.revision(), id.date(), id.preparer(),
                id.checker(), "Ventcase", Main.version(), kase.inputHash());
        WettedFireResult r = WettedFire.run(DemoCommand.demoInput());
        return SheetModels.from(r, identity, system);
    }

    static String demoCaseJson() {
        try (InputStream in = SheetCommand.class.getResourceAsStream(DEMO_CASE)) {
            if (in == null) {
                throw new IllegalStateException("missing packaged resource " + DEMO_CASE);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
