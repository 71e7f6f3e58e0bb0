package org.ventcase.app;

import java.util.Optional;

import org.ventcase.report.SheetModel;

/**
 * A calculation sheet ready to be written, or the reason there is none yet.
 *
 * @param model  the sheet, when one can be made
 * @param reason why there is none ("" when there is a sheet)
 */
public record SheetOutcome(Optional<SheetModel> model, String reason) {

    public SheetOutcome {
        model = model == null ? Optional.empty() : model;
        reason = reason == null ? "" : reason;
        if (model.isEmpty() && reason.isBlank()) {
            throw new IllegalArgumentException("a missing sheet needs its reason");
        }
    }

    public static SheetOutcome of(SheetModel m) {
        return new SheetOutcome(Optional.of(m), "");
    }

    public static SheetOutcome none(String reason) {
        return new SheetOutcome(Optional.empty(), reason);
    }
}
