package org.ventcase.audit;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;

/**
 * One data row of a register, as read: its cells by column with the header unit already applied
 * to bare numbers.
 *
 * @param line          1-based line of the file where the row starts (the row number in messages)
 * @param cells         cell text per known column (absent: the row is shorter than the header)
 * @param fieldCount    number of fields the row has
 * @param headerCount   number of fields the header has
 * @param firstMissing  the first known column the row is too short to reach, if any
 */
public record RegisterRow(int line, Map<RegisterColumn, String> cells, int fieldCount, int headerCount,
                          Optional<RegisterColumn> firstMissing) {

    public RegisterRow {
        cells = Collections.unmodifiableMap(cells.isEmpty() ? new EnumMap<>(RegisterColumn.class)
                : new EnumMap<>(cells));
    }

    /** The cell's text, empty when the cell is blank or the column absent. */
    public String get(RegisterColumn c) {
        String v = cells.get(c);
        return v == null ? "" : v;
    }
}
