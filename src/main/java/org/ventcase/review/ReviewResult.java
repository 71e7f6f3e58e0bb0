package org.ventcase.review;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.calc.CaseResult;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;

/**
 * The outcome of a review: one row per claimed quantity, the model runs behind the sensitivity
 * ranges, and Ventcase's own result of the case. What the console table, the review JSON, the
 * review PDF and a user interface show; everything is already decided here (verdicts, hints).
 *
 * @param title          the case's title
 * @param tag            equipment tag
 * @param inputHash      SHA-256 of the normalised case
 * @param source         who made the claim, as the claimed file says
 * @param scenarioIndex  0-based position of the reviewed scenario in the case
 * @param scenarioLabel  its label
 * @param scenarioType   its type key, e.g. {@code fire-wetted}
 * @param scenarioChoice how it was chosen ("named in the claimed file" or "governing scenario")
 * @param rows           one per claimed quantity, in {@link ReviewQuantity} order
 * @param runs           the model runs of the sensitivity (the case's own model first)
 * @param tolerances     the tolerances used
 * @param computed       Ventcase's result of the case as stated (the first run)
 * @param warnings       what the reviewer must know about the comparison itself
 */
public record ReviewResult(String title, String tag, String inputHash, String source, int scenarioIndex,
                           String scenarioLabel, String scenarioType, String scenarioChoice, List<Row> rows,
                           List<ModelRun> runs, Tolerances tolerances, CaseResult computed, List<String> warnings) {

    public ReviewResult {
        rows = List.copyOf(rows);
        runs = List.copyOf(runs);
        warnings = List.copyOf(warnings);
    }

    /** The row of a quantity, if it was claimed. */
    public Optional<Row> row(ReviewQuantity q) {
        return rows.stream().filter(r -> r.quantity() == q).findFirst();
    }

    /** How many rows have the verdict. */
    public long count(Verdict v) {
        return rows.stream().filter(r -> r.verdict() == v).count();
    }

    /**
     * One compared quantity.
     *
     * @param quantity               what
     * @param claimedText            the claim as written
     * @param claimed                claimed value, SI (empty for the orifice)
     * @param computed               Ventcase's value, SI (empty for the orifice, or when not compared)
     * @param claimedOrifice         claimed designation (orifice row only)
     * @param computedOrifice        Ventcase's designation (orifice row only)
     * @param difference             claimed - computed, SI
     * @param relativeDifference     (claimed - computed) / computed
     * @param tolerance              the tolerance used (fraction, K, or 0 for exact)
     * @param verdict                agrees / check / disagrees / not compared
     * @param modelMin               smallest value over the model runs, SI
     * @param modelMax               largest value over the model runs, SI
     * @param modelOrifices          designations over the model runs (orifice row only)
     * @param withinModelUncertainty the verdict is check or disagrees, yet the claimed value lies
     *                               inside the range of the model runs
     * @param hints                  possible causes, each saying what to look at (every check and
     *                               disagreement has at least one; on an agreeing row a hint is
     *                               informational: a known mistake reproduces the claimed value
     *                               much more closely than Ventcase's value, within the tolerance)
     * @param note                   why the row was not compared, or empty
     */
    public record Row(ReviewQuantity quantity, String claimedText, OptionalDouble claimed, OptionalDouble computed,
                      Optional<String> claimedOrifice, Optional<String> computedOrifice, OptionalDouble difference,
                      OptionalDouble relativeDifference, double tolerance, Verdict verdict, OptionalDouble modelMin,
                      OptionalDouble modelMax, List<String> modelOrifices, boolean withinModelUncertainty,
                      List<Hint> hints, String note) {
        public Row {
            modelOrifices = List.copyOf(modelOrifices);
            hints = List.copyOf(hints);
            note = note == null ? "" : note;
        }

        /** Whether a hint with this code is present. */
        public boolean hasHint(String code) {
            return hints.stream().anyMatch(h -> h.code().equals(code));
        }
    }

    /**
     * A possible cause of a difference.
     *
     * @param code stable identifier (documented in docs/review.md), e.g. {@code gauge-as-absolute}
     * @param text what it means and what to look at
     */
    public record Hint(String code, String text) {
    }

    /**
     * One run of the whole case with another equation of state or density basis.
     *
     * @param label    e.g. "PR78, translated (case)"
     * @param eos      equation of state
     * @param basis    liquid density basis
     * @param ofCase   true for the case's own model
     * @param values   quantity -> value of the reviewed scenario, SI (missing where not available)
     * @param orifice  the orifice of the reviewed scenario, when it could be sized
     * @param failure  why the run or the scenario could not be computed, or empty
     */
    public record ModelRun(String label, EosVariant eos, DensityBasis basis, boolean ofCase,
                           Map<ReviewQuantity, Double> values, Optional<String> orifice, Optional<String> failure) {
        public ModelRun {
            values = Map.copyOf(values);
        }
    }
}
