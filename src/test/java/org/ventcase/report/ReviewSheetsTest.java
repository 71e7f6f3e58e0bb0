package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.ventcase.app.CaseRunner;
import org.ventcase.app.ReviewRunner;
import org.ventcase.app.ReviewTable;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Tolerances;

/** The review sheet's deviation table shows the same cells as the review screen. */
class ReviewSheetsTest {

    @Test
    void sheetCellsAreTheScreenCellsWithoutSignedZeros() {
        // invented demo: the claimed P1 was written as absolute although it is gauge; the fire heat input
        // agrees to within rounding, so its relative difference rounds to zero
        ReviewRunner.Outcome o = new ReviewRunner().run(new ReviewRunner.FileSource(
                Path.of("demo-cases/review/propane-bullet-gauge-as-absolute.json")),
                new ReviewRunner.OpenCase(Optional.empty(), ""), Tolerances.defaults(), CaseRunner.Progress.none(),
                () -> false);
        ReviewResult r = o.result();
        SheetModel.Table sheet = ReviewSheets.deviationTable(r);
        List<ReviewTable.Line> screen = ReviewTable.lines(r);
        assertEquals(screen.size(), sheet.rows().size());
        for (int i = 0; i < screen.size(); i++) {
            ReviewTable.Line l = screen.get(i);
            List<String> cells = sheet.rows().get(i).cells().stream().map(c -> c.replace('\u00A0', ' ')).toList();
            assertEquals(List.of(l.label(), l.claimed(), l.difference(), l.relative(), l.tolerance()),
                    List.of(cells.get(0), cells.get(1), cells.get(3), cells.get(4), cells.get(5)), l.label());
            for (String c : cells) {
                assertFalse(c.matches("[-+]0(\\.0+)?( .*)?"), l.label() + ": signed zero " + c);
            }
        }
    }
}
