package org.ventcase.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.ventcase.app.ReviewRunner;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.ClaimedFiles;
import org.ventcase.casefile.Problem;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.common.InvalidInputException;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.QuantityText;
import org.ventcase.report.UnitSystem;
import org.ventcase.report.ReviewCells;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Tolerances;
import org.ventcase.review.Verdict;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ventcase review}: compares claimed relieving-fluid properties and results with Ventcase's own. */
@Command(name = "review", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Cross-check claimed relief-basis values against Ventcase's calculation of the same case.",
        description = {"Runs the case (every scenario), picks the scenario the claimed values name (else the "
                + "governing one) and prints a deviation table: quantity, claimed, computed, difference, relative "
                + "difference, tolerance and verdict (agrees / check / disagrees), with possible causes for every "
                + "difference and the range each quantity takes with PR78 and SRK on the translated and cubic "
                + "density bases. Formats and tolerances: docs/review.md.",
                Main.FIRST_PASS_HELP},
        footer = ExitCode.HELP_LIST)
final class ReviewCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "CASE.json",
            description = "The case file; may be left out when the claimed file names its case.")
    Path caseFile;

    @Option(names = "--claimed", required = true, paramLabel = "CLAIMED.json",
            description = "Claimed values: JSON (with \"claimed\") or CSV rows quantity,value (docs/review.md).")
    Path claimedFile;

    @Option(names = "--json", paramLabel = "OUT.json",
            description = "Write the review JSON here (atomically).")
    Path json;

    @Option(names = {"-o", "--output"}, paramLabel = "REVIEW.pdf",
            description = "Write the review PDF here (atomically).")
    Path pdf;

    @Option(names = "--tolerance", paramLabel = "NAME=VALUE",
            description = "Change a tolerance, e.g. k=0.05, latentHeat=8%%, relievingTemperature=2K (repeatable).")
    List<String> tolerances = new ArrayList<>();

    @Mixin
    PdfOptions pdfOptions;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Tolerances tol = Tolerances.defaults();
        for (String t : tolerances) {
            tol = tol.with(t);
        }
        ClaimedFiles.Claimed claimed = ClaimedFiles.read(claimedFile);
        Path kase = caseFile != null ? caseFile : claimed.casePath().orElseThrow(() -> InvalidInputException.missing(
                "CASE.json", "give the case file as the first argument, or name it as \"case\" in " + claimedFile));
        OutputFiles.refuseFolderOrInput("--json", json, kase, claimedFile);
        OutputFiles.refuseFolderOrInput("--output", pdf, kase, claimedFile);
        CalculationSheet.PageSize size = pdfOptions.size();
        UnitSystem system = pdfOptions.system();
        ValidatedCase vc;
        try {
            vc = CaseFiles.load(kase);
        } catch (CaseValidationException e) {
            err.println(e.origin() + ": " + e.problems().size() + (e.problems().size() == 1 ? " problem" : " problems"));
            for (Problem p : e.problems()) {
                err.println("  " + p.message());
            }
            return ExitCode.INVALID_INPUT;
        }
        ReviewRunner.Outcome o = ReviewRunner.review(vc, kase.getFileName().toString(),
                caseFile != null ? "given on the command line" : "named in " + claimedFile, claimed,
                claimedFile.getFileName().toString(), tol);
        print(out, o.result(), kase, claimedFile, system == UnitSystem.US);
        if (json != null) {
            ReviewRunner.writeJson(o, json, Main.version());
            out.println("Review JSON written to " + json);
        }
        if (pdf != null) {
            ReviewRunner.writePdf(o, pdf, size, Main.version(), system);
            out.println("Review PDF written to " + pdf);
        }
        return ExitCode.OK;
    }

    static void print(PrintWriter out, ReviewResult r, Path kase, Path claimed, boolean us) {
        out.println("VENTCASE REVIEW: " + r.title() + " (" + r.tag() + ")");
        DemoCommand.CAUTIONS.forEach(out::println);
        out.println("Case " + kase + ", input hash " + r.inputHash());
        out.println("Claimed values " + claimed + (r.source().isEmpty() ? "" : " (" + r.source() + ")"));
        out.printf(Locale.ROOT, "Scenario %d. %s [%s], %s%n", r.scenarioIndex() + 1, r.scenarioLabel(),
                r.scenarioType(), r.scenarioChoice());
        out.println();
        String fmt = "%-32s %-16s %-16s %-17s %-8s %-9s %s%n";
        out.printf(Locale.ROOT, fmt, "Quantity", "Claimed", "Computed", "Difference", "Relative", "Tolerance",
                "Verdict");
        List<String> notes = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            ReviewCells c = ReviewCells.of(row, "-", us);
            String verdict = row.verdict().label() + (row.withinModelUncertainty() ? " (within model uncertainty)" : "");
            out.printf(Locale.ROOT, fmt, row.quantity().label(), c.claimed(), c.computed(), c.difference(),
                    c.relative(), c.tolerance(), verdict);
            for (ReviewResult.Hint h : row.hints()) {
                notes.add(row.quantity().label() + " [" + h.code() + "] " + said(h.text(), us));
            }
            if (!row.note().isEmpty()) {
                notes.add(row.quantity().label() + ": not compared: " + said(row.note(), us));
            }
        }
        out.println();
        out.printf(Locale.ROOT, "%d agree, %d to check, %d disagree, %d not compared%n", r.count(Verdict.AGREES),
                r.count(Verdict.CHECK), r.count(Verdict.DISAGREES), r.count(Verdict.NOT_COMPARED));
        if (!notes.isEmpty()) {
            out.println();
            out.println("POSSIBLE CAUSES");
            for (String s : notes) {
                out.println("  - " + s);
            }
        }
        out.println();
        out.println("MODEL RANGE (the case again with PR78 and SRK, translated and cubic density basis)");
        for (ReviewResult.Row row : r.rows()) {
            if (row.quantity() == ReviewQuantity.ORIFICE) {
                out.printf(Locale.ROOT, "   %-34s %s%n", row.quantity().label(), String.join(", ", row.modelOrifices()));
            } else if (row.modelMin().isPresent()) {
                out.printf(Locale.ROOT, "   %-34s %s to %s%n", row.quantity().label(),
                        org.ventcase.report.ReviewDisplay.format(row.quantity(), row.modelMin().getAsDouble(), us),
                        org.ventcase.report.ReviewDisplay.format(row.quantity(), row.modelMax().getAsDouble(), us));
            }
        }
        for (ReviewResult.ModelRun m : r.runs()) {
            m.failure().ifPresent(f -> out.println("   " + m.label() + ": not computed: " + f));
        }
        if (!r.warnings().isEmpty()) {
            out.println();
            out.println("WARNINGS");
            for (String w : r.warnings()) {
                out.println("  ! " + said(w, us));
            }
        }
    }

    private static String said(String text, boolean us) {
        return us ? QuantityText.usFirst(text) : text;
    }
}
