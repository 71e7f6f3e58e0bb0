package org.ventcase.app;

import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.SheetIdentity;

/** What every sheet of a case shares: its title block. */
public final class CaseSheets {

    /** The tool's name in every title block. */
    public static final String TOOL = "Ventcase";

    private CaseSheets() {
    }

    /**
     * The title block of a case's sheets (calculation sheet and review sheet): the case file's
     * identity, the tool and its version, and the hash of the case file's input.
     */
    public static SheetIdentity identity(ValidatedCase kase, String toolVersion) {
        ValidatedCase.Identity id = kase.identity();
        return new SheetIdentity(id.title(), id.tag(), id.revision(), id.date(), id.preparer(), id.checker(), TOOL,
                toolVersion, kase.inputHash());
    }
}
