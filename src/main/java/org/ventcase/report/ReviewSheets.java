package org.ventcase.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.calc.CaseResult;
import org.ventcase.report.ReviewCells;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Verdict;

/**
 * The review PDF's model: the case's title block, cautions and code-deferral note as on the
 * calculation sheet, with the deviation table in the summary, the possible causes, the model range
 * and the reviewed scenario's calculation steps. Only formatting: every number and verdict comes
 * from the {@link ReviewResult}.
 */
public final class ReviewSheets {

    /** The banner of a review sheet. */
    public static final String BANNER = "RELIEF BASIS  \u00b7  REVIEW OF CLAIMED VALUES";

    private static final char NBSP = '\u00a0';

    private ReviewSheets() {
    }

    /**
     * The review sheet model.
     *
     * @param r           the review
     * @param id          the case's title block
     * @param caseName    the case file's name, as printed
     * @param claimedName the claimed-value file's name, as printed
     */
    public static SheetModel from(ReviewResult r, SheetIdentity id, String caseName, String claimedName) {
        return from(r, id, caseName, claimedName, UnitSystem.SI);
    }

    /**
     * As {@link #from(ReviewResult, SheetIdentity, String, String)} with the values in the unit
     * system given; in US units the hints and warnings (written in SI) lead with US values and the
     * method steps bracket them.
     */
    public static SheetModel from(ReviewResult r, SheetIdentity id, String caseName, String claimedName,
                                  UnitSystem units) {
        boolean us = units == UnitSystem.US;
        List<SheetModel.RevisionRow> revisions = List.of(new SheetModel.RevisionRow(id.revision(), id.date().toString(),
                "Review of the claimed values in " + claimedName, id.preparer(), id.checker()));
        SheetModel.SignOff signOff = new SheetModel.SignOff(List.of(new SheetModel.Signatory("Reviewed", ""),
                new SheetModel.Signatory("Checked", "")));
        List<SheetModel.Table> inputs = new ArrayList<>();
        inputs.add(SheetModel.Table.keyValue("Review basis", List.of(
                SheetModel.Row.of("Case file", caseName),
                SheetModel.Row.of("Claimed values", claimedName),
                SheetModel.Row.of("Source of the claim", r.source().isEmpty() ? "not stated" : r.source()),
                SheetModel.Row.of("Scenario reviewed", (r.scenarioIndex() + 1) + ". " + r.scenarioLabel() + " ("
                        + r.scenarioType() + "); " + r.scenarioChoice())),
                "Ventcase ran the whole case with its own model; the claimed values were not used in its calculation."));
        List<SheetModel.Row> tol = new ArrayList<>();
        for (ReviewQuantity q : ReviewQuantity.values()) {
            tol.add(SheetModel.Row.of(q.label(), ReviewDisplay.formatTolerance(q, r.tolerances().of(q), us)
                    + (r.tolerances().changed(q) ? " (changed for this review)" : ""), said(q.reason(), us)));
        }
        inputs.add(new SheetModel.Table("Tolerances", List.of("Quantity", "Tolerance", "Why"),
                List.of(0.28, 0.14, 0.58), tol, "Verdict: within the tolerance agrees; up to twice the tolerance "
                + "check; beyond that disagrees. The orifice must be the same designation."));
        List<SheetModel.Table> results = new ArrayList<>();
        results.add(deviationTable(r, us));
        results.add(causes(r, us));
        results.add(modelRange(r, us));
        List<String> warnings = new ArrayList<>();
        for (String w : r.warnings()) {
            warnings.add(said(w, us));
        }
        for (CaseResult.CaseWarning w : r.computed().warnings()) {
            if (w.scenarios().isEmpty() || w.scenarios().contains(r.scenarioLabel())) {
                warnings.add(said(w.message(), us));
            }
        }
        CaseResult.ScenarioResult s = r.computed().scenarios().get(r.scenarioIndex());
        String statement = org.ventcase.casefile.Templates.text("method-" + r.scenarioType())
                .map(t -> String.join(" ", SheetModels.paragraphs(t))).orElse("");
        List<SheetModel.MethodSection> method = List.of(new SheetModel.MethodSection(s.label(), statement, s.trace()));
        return new SheetModel(id, units, revisions, signOff, inputs, List.of(), results, warnings, List.of(),
                method, SheetModels.paragraphs(SheetModels.block("cautions")),
                SheetModels.fill(SheetModels.block("code-deferral"), id),
                (us ? "Claimed and computed values in psia, \u00b0F, lb/lbmol, Btu/lb, lb/ft3, Btu/h, ft2, lb/h and in2; "
                        + "temperature differences in \u00b0F. The method steps are Ventcase's calculation of the "
                        + "scenario, in SI as computed, with US customary values in brackets."
                        : "Claimed and computed values in bar abs, C, kg/kmol, kJ/kg, kg/m3, kW, m2, kg/h and mm2; "
                        + "temperature differences in K. The method steps are Ventcase's calculation of the scenario, "
                        + "in SI as computed."), BANNER);
    }

    private static String said(String text, boolean us) {
        return us ? QuantityText.usFirst(text) : text;
    }

    private static String nb(String s) {
        int i = s.indexOf(' ');
        return i < 0 ? s : s.substring(0, i) + NBSP + s.substring(i + 1);
    }

    private static final String NOT_COMPUTED = "not computed";

    static SheetModel.Table deviationTable(ReviewResult r) {
        return deviationTable(r, false);
    }

    static SheetModel.Table deviationTable(ReviewResult r, boolean us) {
        List<SheetModel.Row> rows = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            ReviewQuantity q = row.quantity();
            ReviewCells c = ReviewCells.of(row, NOT_COMPUTED, us);
            // a value and its unit stay on one line; the placeholder may wrap
            String computed = c.computed().equals(NOT_COMPUTED) ? c.computed() : nb(c.computed());
            String verdict = row.verdict().label() + (row.withinModelUncertainty() ? ", within model uncertainty" : "");
            rows.add(new SheetModel.Row(List.of(q.label(), nb(c.claimed()), computed, nb(c.difference()),
                    nb(c.relative()), nb(c.tolerance()), verdict), row.verdict() == Verdict.DISAGREES));
        }
        String note = String.format(Locale.ROOT, "%d agree, %d to check, %d disagree, %d not compared. Difference = "
                + "claimed - computed; relative to the computed value.", r.count(Verdict.AGREES),
                r.count(Verdict.CHECK), r.count(Verdict.DISAGREES), r.count(Verdict.NOT_COMPARED));
        return new SheetModel.Table("Claimed against computed: " + r.scenarioLabel(), List.of("Quantity", "Claimed",
                "Computed", "Difference", "Relative", "Tol.", "Verdict"),
                List.of(0.23, 0.13, 0.13, 0.13, 0.09, 0.08, 0.21), rows, note);
    }

    static SheetModel.Table causes(ReviewResult r) {
        return causes(r, false);
    }

    static SheetModel.Table causes(ReviewResult r, boolean us) {
        List<SheetModel.Row> rows = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            for (ReviewResult.Hint h : row.hints()) {
                rows.add(SheetModel.Row.of(row.quantity().label(), h.code(), said(h.text(), us)));
            }
            if (!row.note().isEmpty()) {
                rows.add(SheetModel.Row.of(row.quantity().label(), "not compared", said(row.note(), us)));
            }
        }
        if (rows.isEmpty()) {
            rows.add(SheetModel.Row.of("All claimed values", "agree", "Every claimed value is within its tolerance."));
        }
        return new SheetModel.Table("Possible causes of the differences", List.of("Quantity", "Cause", "What to look at"),
                List.of(0.22, 0.18, 0.60), rows, "Each cause names an alternative calculation that the claimed value "
                + "matches within its tolerance while Ventcase's value does not; it is a lead, not a finding.");
    }

    static SheetModel.Table modelRange(ReviewResult r) {
        return modelRange(r, false);
    }

    static SheetModel.Table modelRange(ReviewResult r, boolean us) {
        List<String> cols = new ArrayList<>();
        List<Double> weights = new ArrayList<>();
        cols.add("Quantity");
        weights.add(0.24);
        for (ReviewResult.ModelRun m : r.runs()) {
            cols.add(m.label());
            weights.add(0.76 / r.runs().size());
        }
        List<SheetModel.Row> rows = new ArrayList<>();
        for (ReviewResult.Row row : r.rows()) {
            ReviewQuantity q = row.quantity();
            List<String> cells = new ArrayList<>();
            cells.add(q.label());
            for (ReviewResult.ModelRun m : r.runs()) {
                if (q == ReviewQuantity.ORIFICE) {
                    cells.add(m.orifice().orElse("not computed"));
                } else {
                    Double v = m.values().get(q);
                    cells.add(v == null ? "not computed" : nb(ReviewDisplay.format(q, v, us)));
                }
            }
            rows.add(new SheetModel.Row(cells, row.withinModelUncertainty()));
        }
        StringBuilder failures = new StringBuilder();
        for (ReviewResult.ModelRun m : r.runs()) {
            m.failure().ifPresent(f -> failures.append(' ').append(m.label()).append(": ").append(f));
        }
        return new SheetModel.Table("Model range: the case again with PR78 and SRK, translated and cubic density",
                cols, weights, rows, "Highlighted rows: the claimed value lies inside this range, so its difference "
                + "is within model uncertainty." + failures);
    }
}
