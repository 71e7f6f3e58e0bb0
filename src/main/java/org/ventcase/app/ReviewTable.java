package org.ventcase.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.report.ReviewCells;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Verdict;

/**
 * The review screen's text, cell by cell, as {@code ventcase review} prints it: the deviation
 * table, the possible causes and the model range. Formatting only; every number, verdict and hint
 * comes from the {@link ReviewResult}. Free of JavaFX.
 */
public final class ReviewTable {

    private ReviewTable() {
    }

    /**
     * One row of the deviation table.
     *
     * @param quantity   the quantity
     * @param label      its printed name
     * @param claimed    the claimed value in the display unit
     * @param computed   Ventcase's value in the display unit, or "-" when there is none
     * @param difference claimed - computed, with its sign and unit ("" when not compared)
     * @param relative   the difference relative to Ventcase's value ("" when not compared)
     * @param tolerance  the tolerance used, e.g. "5 %", "1 K", "exact"
     * @param verdict    the verdict
     * @param within     the claim lies inside the model range (only for check and disagrees)
     * @param toleranceChanged the tolerance differs from its default
     */
    public record Line(ReviewQuantity quantity, String label, String claimed, String computed, String difference,
                       String relative, String tolerance, Verdict verdict, boolean within, boolean toleranceChanged) {

        /** The verdict in words, e.g. "check (within model uncertainty)". */
        public String verdictText() {
            return verdict.label() + (within ? " (within model uncertainty)" : "");
        }
    }

    /**
     * A possible cause, or the reason a row was not compared.
     *
     * @param quantity the row's printed name
     * @param code     the hint code ({@code docs/review.md}), or "not compared"
     * @param text     what it means and what to look at
     * @param informational on a row that agrees (the hint is a remark, not a finding)
     */
    public record Cause(String quantity, String code, String text, boolean informational) {
    }

    /**
     * One row of the model range.
     *
     * @param label  the quantity's printed name
     * @param range  "min to max" in the display unit, or the orifices of the runs
     * @param perRun the value of each run, in {@link ReviewResult#runs()} order ("not computed" where none)
     * @param within the claimed value lies inside the range (for a check or a disagreement)
     */
    public record RangeLine(String label, String range, List<String> perRun, boolean within) {
        public RangeLine {
            perRun = List.copyOf(perRun);
        }
    }

    /** The deviation table, in the result's order. */
    public static List<Line> lines(ReviewResult r) {
        List<Line> out = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            ReviewQuantity q = row.quantity();
            ReviewCells c = ReviewCells.of(row, "-");
            out.add(new Line(q, q.label(), c.claimed(), c.computed(), c.difference(), c.relative(), c.tolerance(),
                    row.verdict(), row.withinModelUncertainty(), r.tolerances().changed(q)));
        }
        return out;
    }

    /** The possible causes under the table: every hint of every row, and why a row was not compared. */
    public static List<Cause> causes(ReviewResult r) {
        List<Cause> out = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            for (ReviewResult.Hint h : row.hints()) {
                out.add(new Cause(row.quantity().label(), h.code(), h.text(), row.verdict() == Verdict.AGREES));
            }
            if (!row.note().isEmpty()) {
                out.add(new Cause(row.quantity().label(), "not compared", row.note(), false));
            }
        }
        return out;
    }

    /** The model range of every claimed quantity, with each run's value. */
    public static List<RangeLine> range(ReviewResult r) {
        List<RangeLine> out = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            ReviewQuantity q = row.quantity();
            List<String> perRun = new ArrayList<>();
            for (ReviewResult.ModelRun m : r.runs()) {
                if (q == ReviewQuantity.ORIFICE) {
                    perRun.add(m.orifice().orElse("not computed"));
                } else {
                    Double v = m.values().get(q);
                    perRun.add(v == null ? "not computed" : q.format(v));
                }
            }
            String range;
            if (q == ReviewQuantity.ORIFICE) {
                range = row.modelOrifices().isEmpty() ? "not computed" : String.join(", ", row.modelOrifices());
            } else if (row.modelMin().isPresent()) {
                String lo = q.format(row.modelMin().getAsDouble());
                String hi = q.format(row.modelMax().getAsDouble());
                range = lo.equals(hi) ? lo + " (every run)" : lo + " to " + hi;
            } else {
                range = "not computed";
            }
            out.add(new RangeLine(q.label(), range, perRun, row.withinModelUncertainty()));
        }
        return out;
    }

    /** "9 agree, 1 to check, 2 disagree, 0 not compared", as the console prints it. */
    public static String counts(ReviewResult r) {
        return String.format(Locale.ROOT, "%d agree, %d to check, %d disagree, %d not compared", r.count(Verdict.AGREES),
                r.count(Verdict.CHECK), r.count(Verdict.DISAGREES), r.count(Verdict.NOT_COMPARED));
    }
}
