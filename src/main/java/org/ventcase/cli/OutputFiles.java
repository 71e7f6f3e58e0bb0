package org.ventcase.cli;

import java.nio.file.Files;
import java.nio.file.Path;

import org.ventcase.common.InvalidInputException;

/** Checks on the output files a command is asked to write, before any work is done. */
final class OutputFiles {

    private OutputFiles() {
    }

    /**
     * Refuses an output that is a folder or that names one of the command's inputs (inputs are never
     * overwritten). A null output (not asked for) passes.
     *
     * @param option the option that named the output, for the message ("--pdf")
     */
    static void refuseFolderOrInput(String option, Path output, Path... inputs) {
        if (output == null) {
            return;
        }
        if (Files.isDirectory(output)) {
            throw InvalidInputException.invalid(option, output, "expected a file name, not a folder");
        }
        for (Path in : inputs) {
            if (in != null && same(output, in)) {
                throw InvalidInputException.invalid(option, output,
                        "names an input file (" + in + "); inputs are never overwritten: choose another output file");
            }
        }
    }

    private static boolean same(Path a, Path b) {
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }
}
