package org.ventcase.report;

import java.time.LocalDate;
import java.util.Objects;

/**
 * The title block of a sheet: what the calculation is about and who made it. Text fields may be
 * empty (printed as a blank field to fill in by hand) but never null.
 *
 * @param title       case title, e.g. "Propane bullet V-4101: pool fire"
 * @param tag         equipment tag
 * @param revision    revision letter or number of this issue
 * @param date        date of this issue
 * @param preparer    who prepared the calculation
 * @param checker     who checked it (empty until checked)
 * @param toolName    name of the program that computed it
 * @param toolVersion its version
 * @param inputHash   hash identifying the inputs (SHA-256 of the canonical case file, hex)
 */
public record SheetIdentity(String title, String tag, String revision, LocalDate date, String preparer,
                            String checker, String toolName, String toolVersion, String inputHash) {

    public SheetIdentity {
        title = text(title, "title");
        tag = text(tag, "tag");
        revision = text(revision, "revision");
        Objects.requireNonNull(date, "date");
        preparer = text(preparer, "preparer");
        checker = text(checker, "checker");
        toolName = text(toolName, "toolName");
        toolVersion = text(toolVersion, "toolVersion");
        inputHash = text(inputHash, "inputHash");
    }

    private static String text(String s, String what) {
        return Objects.requireNonNull(s, what).strip();
    }
}
