package org.ventcase.report;

import java.util.List;
import java.util.Objects;

import org.ventcase.common.TraceStep;

/**
 * Everything a calculation sheet prints, as text already formatted with units, and the numbers a
 * figure draws. Built from a calculation result (see {@link SheetModels}); the writer
 * ({@link CalculationSheet}) only lays it out. Designed for a case with several scenarios: the
 * loads table has one row per scenario with the governing one marked, and the method has one
 * section per scenario, each with its own trace.
 *
 * @param identity  title block
 * @param units     unit system of the input and result tables
 * @param revisions revision history, oldest first (at least the current issue)
 * @param signOff   signature block
 * @param inputs    input tables (fluid, EOS, vessel, storage, site, scenarios, device), in print order
 * @param loads     relief load per scenario, one of them governing (none when no scenario could be sized)
 * @param results   result tables (relieving conditions, inventory, relieved fluid, device), in order
 * @param warnings  everything the reader must see, already worded
 * @param figures   drawings and charts
 * @param method    per scenario: the method statement and the calculation trace
 * @param cautions  caution paragraphs (from {@code templates/text/cautions.txt})
 * @param deferral  the note deferring to codes and to a qualified engineer, placeholders filled
 * @param unitNote  one sentence on the units used (e.g. that the method steps are in SI as computed)
 * @param banner    the line at the top left of every title block, e.g. "RELIEF BASIS · CALCULATION SHEET"
 */
public record SheetModel(SheetIdentity identity, UnitSystem units, List<RevisionRow> revisions, SignOff signOff,
                         List<Table> inputs, List<ScenarioLoad> loads, List<Table> results, List<String> warnings,
                         List<Figure> figures, List<MethodSection> method, List<String> cautions, String deferral,
                         String unitNote, String banner) {

    /** The banner of a calculation sheet. */
    public static final String CALCULATION_BANNER = "RELIEF BASIS  \u00b7  CALCULATION SHEET";

    /** A calculation sheet (the banner {@link #CALCULATION_BANNER}). */
    public SheetModel(SheetIdentity identity, UnitSystem units, List<RevisionRow> revisions, SignOff signOff,
                      List<Table> inputs, List<ScenarioLoad> loads, List<Table> results, List<String> warnings,
                      List<Figure> figures, List<MethodSection> method, List<String> cautions, String deferral,
                      String unitNote) {
        this(identity, units, revisions, signOff, inputs, loads, results, warnings, figures, method, cautions,
                deferral, unitNote, CALCULATION_BANNER);
    }

    public SheetModel {
        banner = banner == null || banner.isBlank() ? CALCULATION_BANNER : banner;
        Objects.requireNonNull(identity, "identity");
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(signOff, "signOff");
        revisions = List.copyOf(revisions);
        inputs = List.copyOf(inputs);
        loads = List.copyOf(loads);
        results = List.copyOf(results);
        warnings = List.copyOf(warnings);
        figures = List.copyOf(figures);
        method = List.copyOf(method);
        cautions = List.copyOf(cautions);
        Objects.requireNonNull(deferral, "deferral");
        Objects.requireNonNull(unitNote, "unitNote");
        if (revisions.isEmpty()) {
            throw new IllegalArgumentException("a sheet needs at least its own revision row");
        }
        if (cautions.isEmpty() || deferral.isBlank()) {
            throw new IllegalArgumentException("a sheet must carry the cautions and the code-deferral note");
        }
        long governing = loads.stream().filter(ScenarioLoad::governing).count();
        if (governing > 1) {
            throw new IllegalArgumentException("at most one scenario may be marked governing, found " + governing);
        }
    }

    /**
     * One issue of the sheet.
     *
     * @param revision    letter or number
     * @param date        ISO date as text
     * @param description what changed
     * @param preparedBy  initials or name
     * @param checkedBy   initials or name, may be empty
     */
    public record RevisionRow(String revision, String date, String description, String preparedBy, String checkedBy) {
        public RevisionRow {
            revision = Objects.requireNonNull(revision, "revision");
            date = Objects.requireNonNull(date, "date");
            description = Objects.requireNonNull(description, "description");
            preparedBy = Objects.requireNonNull(preparedBy, "preparedBy");
            checkedBy = Objects.requireNonNull(checkedBy, "checkedBy");
        }
    }

    /**
     * The signature block: one line per role, with the name printed when known.
     *
     * @param roles e.g. Prepared / Checked / Approved, in order
     */
    public record SignOff(List<Signatory> roles) {
        public SignOff {
            roles = List.copyOf(roles);
        }
    }

    /**
     * One signature line.
     *
     * @param role "Prepared", "Checked", "Approved"
     * @param name printed name, may be empty (to be written by hand)
     */
    public record Signatory(String role, String name) {
        public Signatory {
            role = Objects.requireNonNull(role, "role");
            name = Objects.requireNonNull(name, "name");
        }
    }

    /**
     * A table of text cells. Column widths are relative weights; every row has one cell per column.
     *
     * @param title   caption printed above the table
     * @param columns header cells
     * @param weights relative column widths, one per column, each &gt; 0
     * @param rows    body rows
     * @param note    a line printed under the table, may be empty
     * @param echoColumns the columns (0-based) that print the user's own text as entered (a register's
     *                tag and area): the sheet's guard against undefined values ("NaN", "null") takes
     *                their text as the user's words wherever it appears, so an area named "null" is
     *                printed, not refused
     */
    public record Table(String title, List<String> columns, List<Double> weights, List<Row> rows, String note,
                        java.util.Set<Integer> echoColumns) {
        public Table {
            Objects.requireNonNull(title, "title");
            columns = List.copyOf(columns);
            weights = List.copyOf(weights);
            rows = List.copyOf(rows);
            note = note == null ? "" : note;
            echoColumns = java.util.Set.copyOf(echoColumns);
            if (columns.isEmpty() || weights.size() != columns.size()) {
                throw new IllegalArgumentException(title + ": one weight per column is needed");
            }
            for (double w : weights) {
                if (!(w > 0)) {
                    throw new IllegalArgumentException(title + ": column weights must be positive");
                }
            }
            for (Row r : rows) {
                if (r.cells().size() != columns.size()) {
                    throw new IllegalArgumentException(title + ": row " + r.cells() + " has "
                            + r.cells().size() + " cells, expected " + columns.size());
                }
            }
        }

        /** A table none of whose columns echoes the user's text verbatim. */
        public Table(String title, List<String> columns, List<Double> weights, List<Row> rows, String note) {
            this(title, columns, weights, rows, note, java.util.Set.of());
        }

        /** This table with the given columns marked as the user's own text (see {@code echoColumns}). */
        public Table echoing(Integer... cols) {
            return new Table(title, columns, weights, rows, note, java.util.Set.of(cols));
        }

        /** A two-column quantity/value table. */
        public static Table keyValue(String title, List<Row> rows, String note) {
            return new Table(title, List.of("Quantity", "Value"), List.of(0.42, 0.58), rows, note);
        }
    }

    /**
     * A table row.
     *
     * @param cells     text per column
     * @param emphasis  printed highlighted (e.g. the governing scenario)
     */
    public record Row(List<String> cells, boolean emphasis) {
        public Row {
            cells = List.copyOf(cells);
        }

        /** A plain row. */
        public static Row of(String... cells) {
            return new Row(List.of(cells), false);
        }
    }

    /**
     * The relief requirement of one scenario.
     *
     * @param label                scenario label as the case names it
     * @param kind                 scenario type in words, e.g. "Pool fire, wetted vessel"
     * @param relievingPressure    P1 with unit
     * @param relievingTemperature T1 with unit
     * @param reliefLoad           W with unit
     * @param requiredArea         required effective area with unit
     * @param governing            true for the scenario that sets the device
     */
    public record ScenarioLoad(String label, String kind, String relievingPressure, String relievingTemperature,
                               String reliefLoad, String requiredArea, boolean governing) {
        public ScenarioLoad {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(kind, "kind");
            Objects.requireNonNull(relievingPressure, "relievingPressure");
            Objects.requireNonNull(relievingTemperature, "relievingTemperature");
            Objects.requireNonNull(reliefLoad, "reliefLoad");
            Objects.requireNonNull(requiredArea, "requiredArea");
        }
    }

    /**
     * The method of one scenario: its statement (from {@code templates/text/method-*.txt}) and the
     * calculation trace as the domain produced it.
     *
     * @param scenario  scenario label
     * @param statement short statement of method
     * @param steps     the trace, in order
     */
    public record MethodSection(String scenario, String statement, List<TraceStep> steps) {
        public MethodSection {
            Objects.requireNonNull(scenario, "scenario");
            Objects.requireNonNull(statement, "statement");
            steps = List.copyOf(steps);
        }
    }
}
