package org.ventcase.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.Problem;
import org.ventcase.casefile.ValidationReport;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ventcase check}: validates a case file and prints every problem. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Check a case file and list every problem in it.",
        description = {"Each problem is printed with its JSON path, the value found and what is accepted.",
                "Exit code 0 when the case is ready for calculation, 2 when it has problems."},
        footer = ExitCode.HELP_LIST)
final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file to check.")
    Path file;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ValidationReport report;
        try {
            report = CaseFiles.check(file);
        } catch (CaseValidationException e) {
            printProblems(err, e.origin(), e.problems());
            return ExitCode.INVALID_INPUT;
        }
        for (String w : report.warnings()) {
            out.println("  ! " + w);
        }
        if (!report.ok()) {
            printProblems(err, report.origin(), report.problems());
            return ExitCode.INVALID_INPUT;
        }
        out.println(file + ": OK, ready for calculation (input hash " + report.validated().orElseThrow().inputHash()
                + ")");
        return ExitCode.OK;
    }

    private static void printProblems(PrintWriter err, String origin, java.util.List<Problem> problems) {
        err.println(origin + ": " + problems.size() + (problems.size() == 1 ? " problem" : " problems"));
        for (Problem p : problems) {
            err.println("  " + p.message());
        }
    }
}
