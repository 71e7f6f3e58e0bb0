package org.ventcase.audit;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.calc.CaseInput;

/**
 * One input row of an audit, ready to compute: the case the screening fire load is computed from
 * (one scenario, {@link ScreeningCase}), or the reason the row could not be turned into one.
 *
 * @param row               the row number in messages: the register's line number, or the case
 *                          file's position (1-based) in a folder
 * @param source            the register's file name or the case file's path
 * @param tag               equipment tag as given
 * @param area              area or unit as given
 * @param fluid             the fluid as given (name or composition)
 * @param input             the case, when the row could be read
 * @param installed         the installed valves, when the register states them
 * @param statedPressurePa  a pressure the register states for saturated storage (compared with the
 *                          bubble pressure computed; Pa absolute)
 * @param notes             remarks made while reading the row (kept with its result)
 * @param error             why the row could not be read
 */
public record AuditItem(int row, String source, String tag, String area, String fluid, Optional<CaseInput> input,
                        Optional<InstalledOrifice> installed, OptionalDouble statedPressurePa, List<String> notes,
                        Optional<AuditError> error) {

    public AuditItem {
        tag = tag == null ? "" : tag;
        area = area == null ? "" : area;
        fluid = fluid == null ? "" : fluid;
        source = source == null ? "" : source;
        notes = List.copyOf(notes);
        if (input.isPresent() == error.isPresent()) {
            throw new IllegalArgumentException("an audit item has either a case or an error");
        }
    }

    /** A row that could be read. */
    public static AuditItem of(int row, String source, String tag, String area, String fluid, CaseInput input,
                               Optional<InstalledOrifice> installed, OptionalDouble statedPressurePa,
                               List<String> notes) {
        return new AuditItem(row, source, tag, area, fluid, Optional.of(input), installed, statedPressurePa, notes,
                Optional.empty());
    }

    /** A row that could not be read. */
    public static AuditItem failed(int row, String source, String tag, String area, String fluid, AuditError error) {
        return new AuditItem(row, source, tag, area, fluid, Optional.empty(), Optional.empty(), OptionalDouble.empty(),
                List.of(), Optional.of(error));
    }
}
