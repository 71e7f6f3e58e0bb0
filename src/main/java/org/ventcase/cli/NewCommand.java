package org.ventcase.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.Templates;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ventcase new}: writes a starter case file from a template. */
@Command(name = "new", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Write a starter case file from a template.",
        description = {"The templates are listed under --template below.",
                "The file is written atomically; an existing file is kept unless --force is given.",
                "Example: ventcase new --template horizontal-bullet v2101.json"},
        footer = ExitCode.HELP_LIST)
final class NewCommand implements Callable<Integer> {

    /** The template names, for picocli's completion candidates in the help text. */
    static final class Names implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return Templates.CASES.iterator();
        }
    }

    @Spec
    CommandSpec spec;

    @Option(names = "--template", required = true, paramLabel = "NAME", completionCandidates = Names.class,
            description = "Starter case: ${COMPLETION-CANDIDATES}.")
    String template;

    @Option(names = "--force", description = "Replace OUT if it exists.")
    boolean force;

    @Parameters(index = "0", paramLabel = "OUT.json", description = "The case file to write.")
    Path out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Optional<String> json = Templates.caseJson(template);
        if (json.isEmpty()) {
            err.println("ventcase: --template: '" + template + "' is not a template; expected one of "
                    + String.join(", ", Templates.CASES));
            return ExitCode.INVALID_INPUT;
        }
        if (Files.exists(out) && !force) {
            err.println("ventcase: " + out + " exists; choose another name or give --force to replace it");
            return ExitCode.IO;
        }
        CaseFiles.writeText(json.get(), out);
        spec.commandLine().getOut().println("Wrote " + out + " from template " + template
                + ". Edit it, then run: ventcase check " + out);
        return ExitCode.OK;
    }
}
