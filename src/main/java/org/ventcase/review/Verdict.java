package org.ventcase.review;

/**
 * The verdict on one claimed value. With m the measure of the difference (|relative difference|,
 * or |difference| in K for temperatures) and t the tolerance: m &lt;= t agrees; t &lt; m &lt;= 2 t
 * check; m &gt; 2 t disagrees. An orifice agrees only when it is the same designation.
 */
public enum Verdict {
    /** Within the tolerance. */
    AGREES("agrees"),
    /** Between one and two tolerances: look at it. */
    CHECK("check"),
    /** More than two tolerances, or a different orifice. */
    DISAGREES("disagrees"),
    /** Ventcase has no value for this quantity in this scenario (the row says why). */
    NOT_COMPARED("not compared");

    private final String label;

    Verdict(String label) {
        this.label = label;
    }

    /** The word printed and written in the JSON. */
    public String label() {
        return label;
    }

    /** The verdict for a measure m and a tolerance t (same units), as stated in the class comment. */
    public static Verdict of(double measure, double tolerance) {
        if (!(measure >= 0) || !(tolerance >= 0)) {
            throw new IllegalArgumentException("measure and tolerance must be numbers >= 0: " + measure + ", "
                    + tolerance);
        }
        if (measure <= tolerance) {
            return AGREES;
        }
        return measure <= 2 * tolerance ? CHECK : DISAGREES;
    }
}
