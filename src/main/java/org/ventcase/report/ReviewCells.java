package org.ventcase.report;

import java.util.Locale;

import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;

/**
 * The printed cells of one row of the deviation table, the same on the review screen and the
 * review sheet: claimed, computed, difference (claimed - computed), relative difference and
 * tolerance, each formatted by its quantity. A difference that rounds to zero is shown unsigned.
 *
 * @param claimed    the claimed value as formatted (or as written, when it could not be read)
 * @param computed   the computed value, or the caller's placeholder when there is none
 * @param difference claimed - computed, "" when not compared
 * @param relative   the difference relative to the computed value, "" when not compared
 * @param tolerance  the tolerance used
 */
public record ReviewCells(String claimed, String computed, String difference, String relative, String tolerance) {

    /** The cells of {@code row}; {@code missing} stands where nothing was computed. */
    public static ReviewCells of(ReviewResult.Row row, String missing) {
        return of(row, missing, false);
    }

    /** As {@link #of(ReviewResult.Row, String)} in SI or, with {@code us}, US customary units. */
    public static ReviewCells of(ReviewResult.Row row, String missing, boolean us) {
        ReviewQuantity q = row.quantity();
        String tol = ReviewDisplay.formatTolerance(q, row.tolerance(), us);
        if (q == ReviewQuantity.ORIFICE) {
            return new ReviewCells(row.claimedOrifice().orElse(""), row.computedOrifice().orElse(missing), "", "",
                    tol);
        }
        String claimed = row.claimed().isPresent() ? ReviewDisplay.format(q, row.claimed().getAsDouble(), us) : row.claimedText();
        String computed = row.computed().isPresent() ? ReviewDisplay.format(q, row.computed().getAsDouble(), us) : missing;
        String diff = row.difference().isPresent()
                ? unsignedZero(ReviewDisplay.formatDifference(q, row.difference().getAsDouble(), us)) : "";
        String rel = row.relativeDifference().isPresent()
                ? unsignedZero(String.format(Locale.ROOT, "%+.1f %%", row.relativeDifference().getAsDouble() * 100))
                : "";
        return new ReviewCells(claimed, computed, diff, rel, tol);
    }

    /** "-0.0 K" -> "0.0 K": a difference that rounds to zero has no direction to show. */
    public static String unsignedZero(String s) {
        return s.matches("[-+]0(\\.0+)?( .*)?") ? s.substring(1) : s;
    }
}
