package org.ventcase.ui;

import java.io.File;
import java.util.List;
import java.util.function.Supplier;

import javafx.css.PseudoClass;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;

import org.ventcase.report.CalculationSheet;
import org.ventcase.review.ReviewQuantity;
import org.ventcase.review.ReviewResult;
import org.ventcase.app.ReviewRunner;
import org.ventcase.app.ReviewTable;

/**
 * The review screen: choose claimed values, the deviation table with verdicts (coloured and
 * written), the possible causes under it, the model range, the tolerances (editable, with their
 * reasons), export, and the cautions. Bindings and layout only; the {@link ReviewViewModel} does
 * the rest.
 */
final class ReviewView {

    private static final PseudoClass STALE = PseudoClass.getPseudoClass("stale");
    private static final PseudoClass PROBLEM = PseudoClass.getPseudoClass("problem");
    private static final PseudoClass CURRENT = PseudoClass.getPseudoClass("current");
    private static final PseudoClass ERROR = PseudoClass.getPseudoClass("error");

    private final ReviewViewModel rvm;
    private final Supplier<Window> window;
    private final Runnable close;
    private final List<Runnable> detach = new java.util.ArrayList<>();

    ReviewView(ReviewViewModel rvm, Supplier<Window> window, Runnable close) {
        this.rvm = rvm;
        this.window = window;
        this.close = close;
    }

    /** Removes the listeners this view put on the view-model (when the screen is left). */
    void dispose() {
        detach.forEach(Runnable::run);
        detach.clear();
    }

    Node build() {
        VBox page = new VBox(12);
        page.setId("review-page");
        page.getStyleClass().add("page");
        Label h = new Label(Messages.get("review.title"));
        h.getStyleClass().add("page-title");
        Label intro = new Label(Messages.get("review.intro"));
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");

        Button open = new Button(Messages.get("review.open"));
        open.setId("review-open");
        open.getStyleClass().add("primary");
        open.setOnAction(e -> chooseFile());
        ChoiceBox<String> examples = new ChoiceBox<>();
        examples.setId("review-examples");
        examples.getItems().setAll(ReviewRunner.DEMOS);
        examples.setValue(ReviewRunner.DEMOS.get(0));
        Button openExample = new Button(Messages.get("review.examples.open"));
        openExample.setId("review-open-example");
        openExample.setOnAction(e -> rvm.openDemo(examples.getValue()));
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        Button closeButton = new Button(Messages.get("review.close"));
        closeButton.setId("review-close");
        closeButton.setOnAction(e -> close.run());
        HBox chooser = new HBox(10, open, new Label(Messages.get("review.examples")), examples, openExample, gap,
                closeButton);
        chooser.setAlignment(Pos.CENTER_LEFT);

        Button rerun = new Button(Messages.get("review.rerun"));
        rerun.setId("review-rerun");
        rerun.setOnAction(e -> rvm.rerun());
        Button cancel = new Button(Messages.get("review.cancel"));
        cancel.setId("review-cancel");
        cancel.setOnAction(e -> rvm.cancel());
        ProgressBar bar = new ProgressBar(0);
        bar.setId("review-progress");
        bar.setPrefWidth(200);
        Label status = new Label();
        status.setId("review-status");
        status.setWrapText(true);
        status.getStyleClass().add("results-status");
        HBox controls = new HBox(10, rerun, cancel, bar);
        controls.setAlignment(Pos.CENTER_LEFT);

        VBox body = new VBox(12);
        body.setId("review-body");
        Runnable show = () -> {
            JobState st = rvm.state().get();
            boolean busy = st == JobState.RUNNING || st == JobState.WAITING;
            rerun.setDisable(rvm.source().get().isEmpty() || busy);
            cancel.setDisable(!busy);
            bar.setVisible(st == JobState.RUNNING);
            bar.setManaged(st == JobState.RUNNING);
            // Review.run reports no progress of its own: past the reading steps the bar only says it is working
            bar.setProgress(rvm.progress().get() >= 0.2 && rvm.progress().get() < 1 ? ProgressBar.INDETERMINATE_PROGRESS
                    : rvm.progress().get());
            status.setText(switch (st) {
                case IDLE -> Messages.get("review.none");
                case CURRENT -> Messages.get("review.state.current");
                default -> rvm.message().get();
            });
            status.pseudoClassStateChanged(PROBLEM, st == JobState.FAILED);
            status.pseudoClassStateChanged(CURRENT, st == JobState.CURRENT);
            boolean have = rvm.outcome().get().isPresent();
            body.pseudoClassStateChanged(STALE, have && !rvm.current());
            body.getChildren().clear();
            rvm.outcome().get().ifPresent(o -> fill(body, o));
        };
        javafx.beans.InvalidationListener l = o -> show.run();
        rvm.state().addListener(l);
        rvm.outcome().addListener(l);
        rvm.message().addListener(l);
        rvm.progress().addListener(l);
        detach.add(() -> {
            rvm.state().removeListener(l);
            rvm.outcome().removeListener(l);
            rvm.message().removeListener(l);
            rvm.progress().removeListener(l);
        });
        show.run();

        page.getChildren().addAll(h, intro, chooser, controls, status, body, tolerances(), export(), cautions());
        ScrollPane sp = new ScrollPane(page);
        sp.setFitToWidth(true);
        sp.getStyleClass().add("page-scroll");
        return sp;
    }

    private void chooseFile() {
        FileChooser fc = new FileChooser();
        fc.setTitle(Messages.plain("review.open"));
        fc.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("Claimed values (*.json, *.csv)", "*.json",
                "*.csv"), new FileChooser.ExtensionFilter("All files", "*"));
        File f = fc.showOpenDialog(window.get());
        if (f != null) {
            rvm.open(f.toPath());
        }
    }

    // ------------------------------------------------------------------------------ the review

    private void fill(VBox body, ReviewRunner.Outcome o) {
        ReviewResult r = o.result();
        body.getChildren().add(basis(o));

        Label th = new Label(Messages.get("review.table") + ": " + (r.scenarioIndex() + 1) + ". " + r.scenarioLabel());
        th.getStyleClass().add("form-heading");
        Label counts = new Label(ReviewTable.counts(r));
        counts.setId("review-counts");
        counts.getStyleClass().add("governing-line");
        body.getChildren().addAll(th, table(r), counts);
        Label note = new Label(Messages.get("review.table.note"));
        note.setWrapText(true);
        note.getStyleClass().add("hint");
        body.getChildren().add(note);

        Label ch = new Label(Messages.get("review.causes"));
        ch.getStyleClass().add("form-heading");
        body.getChildren().add(ch);
        VBox causes = new VBox(6);
        causes.setId("review-causes");
        List<ReviewTable.Cause> cs = ReviewTable.causes(r);
        if (cs.isEmpty()) {
            causes.getChildren().add(new Label(Messages.get("review.causes.none")));
        }
        for (ReviewTable.Cause c : cs) {
            Label q = new Label(c.quantity());
            q.getStyleClass().add("cause-quantity");
            Label code = new Label(c.informational() ? c.code() + " (" + Messages.get("review.causes.informational")
                    + ")" : c.code());
            code.getStyleClass().add("cause-code");
            Label t = new Label(c.text());
            t.setWrapText(true);
            t.getStyleClass().add("cause-text");
            VBox one = new VBox(2, new HBox(8, q, code), t);
            one.getStyleClass().add("cause");
            causes.getChildren().add(one);
        }
        Label cn = new Label(Messages.get("review.causes.note"));
        cn.setWrapText(true);
        cn.getStyleClass().add("hint");
        body.getChildren().addAll(causes, cn);

        body.getChildren().add(range(r));

        if (!r.warnings().isEmpty()) {
            Label wh = new Label(Messages.get("review.warnings"));
            wh.getStyleClass().add("form-heading");
            body.getChildren().add(wh);
            for (String w : r.warnings()) {
                Label wl = new Label("\u2022 " + w);
                wl.setWrapText(true);
                wl.getStyleClass().add("warning");
                body.getChildren().add(wl);
            }
        }
    }

    private Node basis(ReviewRunner.Outcome o) {
        ReviewResult r = o.result();
        GridPane g = new GridPane();
        g.setId("review-basis");
        g.setHgap(16);
        g.setVgap(3);
        String[][] rows = {
            {"review.basis.claimed", o.claimedName()},
            {"review.basis.source", r.source().isEmpty() ? Messages.get("review.basis.source.none") : r.source()},
            {"review.basis.case", o.caseName() + " \u2014 " + r.title() + " (" + r.tag() + "), " + o.caseOrigin()},
            {"review.basis.scenario", (r.scenarioIndex() + 1) + ". " + r.scenarioLabel() + " [" + r.scenarioType()
                    + "], " + r.scenarioChoice()},
        };
        for (int i = 0; i < rows.length; i++) {
            Label k = new Label(Messages.get(rows[i][0]));
            k.getStyleClass().add("field-label");
            k.setMinWidth(Region.USE_PREF_SIZE);
            Label v = new Label(rows[i][1]);
            v.setWrapText(true);
            g.addRow(i, k, v);
        }
        Label bh = new Label(Messages.get("review.basis"));
        bh.getStyleClass().add("form-heading");
        VBox box = new VBox(4, bh, g);
        box.getStyleClass().add("card");
        return box;
    }

    private static GridPane table(ReviewResult r) {
        GridPane t = new GridPane();
        t.setId("review-table");
        t.getStyleClass().add("results-table");
        t.setHgap(14);
        t.setVgap(3);
        String[] cols = {"quantity", "claimed", "computed", "difference", "relative", "tolerance", "verdict"};
        for (int c = 0; c < cols.length; c++) {
            Label l = new Label(Messages.get("review.col." + cols[c]));
            l.getStyleClass().add("col-head");
            t.add(l, c, 0);
        }
        int row = 1;
        for (ReviewTable.Line line : ReviewTable.lines(r)) {
            String tol = line.tolerance() + (line.toleranceChanged() ? " (" + Messages.get("review.changed") + ")" : "");
            Label[] cells = {new Label(line.label()), new Label(line.claimed()), new Label(line.computed()),
                new Label(line.difference()), new Label(line.relative()), new Label(tol), verdict(line)};
            for (int c = 0; c < cells.length; c++) {
                cells[c].setMinWidth(Region.USE_PREF_SIZE);
                if (c >= 1 && c <= 4) {
                    cells[c].getStyleClass().add("number");
                }
                t.add(cells[c], c, row);
            }
            cells[0].setId("review-row-" + line.quantity().key());
            row++;
        }
        return t;
    }

    /** The verdict as a word on a coloured tag: the colour repeats the word, never replaces it. */
    private static Label verdict(ReviewTable.Line line) {
        Label v = new Label(line.verdictText());
        v.setId("review-verdict-" + line.quantity().key());
        v.getStyleClass().addAll("verdict", "verdict-" + line.verdict().name().toLowerCase(java.util.Locale.ROOT)
                .replace('_', '-'));
        return v;
    }

    private static Node range(ReviewResult r) {
        Label h = new Label(Messages.get("review.range"));
        h.getStyleClass().add("form-heading");
        Label intro = new Label(Messages.get("review.range.intro"));
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");
        GridPane g = new GridPane();
        g.setId("review-range");
        g.getStyleClass().add("results-table");
        g.setHgap(14);
        g.setVgap(3);
        g.add(head(Messages.get("review.col.quantity")), 0, 0);
        g.add(head(Messages.get("review.range.col.range")), 1, 0);
        for (int i = 0; i < r.runs().size(); i++) {
            g.add(head(r.runs().get(i).label()), 2 + i, 0);
        }
        int row = 1;
        for (ReviewTable.RangeLine line : ReviewTable.range(r)) {
            Label q = new Label(line.label());
            Label range = new Label(line.range() + (line.within() ? "  (" + Messages.get("review.range.within") + ")" : ""));
            if (line.within()) {
                range.getStyleClass().add("within");
            }
            g.add(q, 0, row);
            g.add(range, 1, row);
            for (int i = 0; i < line.perRun().size(); i++) {
                Label v = new Label(line.perRun().get(i));
                v.getStyleClass().add("number");
                g.add(v, 2 + i, row);
            }
            row++;
        }
        VBox box = new VBox(6, h, intro, g);
        for (ReviewResult.ModelRun m : r.runs()) {
            m.failure().ifPresent(f -> {
                Label fl = new Label(Messages.get("review.range.failed", m.label(), f));
                fl.setWrapText(true);
                fl.getStyleClass().add("warning");
                box.getChildren().add(fl);
            });
        }
        return box;
    }

    private static Label head(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("col-head");
        l.setMinWidth(Region.USE_PREF_SIZE);
        return l;
    }

    // ------------------------------------------------------------------------------ tolerances

    private Node tolerances() {
        GridPane g = new GridPane();
        g.setId("review-tolerances");
        g.setHgap(10);
        g.setVgap(4);
        int row = 0;
        for (ReviewQuantity q : ReviewQuantity.values()) {
            Label name = new Label(q.label());
            name.setMinWidth(Region.USE_PREF_SIZE);
            g.add(name, 0, row);
            Label reason = new Label(q.reason());
            reason.setWrapText(true);
            reason.getStyleClass().add("hint");
            GridPane.setHgrow(reason, Priority.ALWAYS);
            if (q.kind() == ReviewQuantity.Kind.EXACT) {
                g.add(new Label(Messages.get("review.tolerance.orifice")), 1, row, 3, 1);
                g.add(reason, 4, row);
                row++;
                continue;
            }
            ReviewViewModel.ToleranceField f = rvm.tolerance(q);
            TextField tf = new TextField();
            tf.setId("review-tol-" + q.key());
            tf.setPrefColumnCount(5);
            tf.setMinWidth(72);
            tf.textProperty().bindBidirectional(f.text());
            Label unit = new Label(f.unit());
            Label dflt = new Label(Messages.get("review.tolerances.default", f.defaultText()));
            dflt.getStyleClass().add("hint");
            dflt.setMinWidth(Region.USE_PREF_SIZE);
            Label msg = new Label();
            msg.setId("review-tol-" + q.key() + "-message");
            msg.getStyleClass().add("field-message");
            msg.setWrapText(true);
            Runnable m = () -> {
                msg.setText(f.message().get());
                boolean bad = !f.message().get().isEmpty();
                msg.setVisible(bad);
                msg.setManaged(bad);
                tf.pseudoClassStateChanged(ERROR, bad);
            };
            f.message().addListener(o -> m.run());
            m.run();
            tf.setTooltip(new Tooltip(q.reason()));
            g.add(tf, 1, row);
            g.add(unit, 2, row);
            g.add(dflt, 3, row);
            g.add(new VBox(2, reason, msg), 4, row);
            row++;
        }
        Label intro = new Label(Messages.get("review.tolerances.intro"));
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");
        Button reset = new Button(Messages.get("review.tolerances.reset"));
        reset.setId("review-tol-reset");
        reset.setOnAction(e -> rvm.resetTolerances());
        VBox box = new VBox(8, intro, g, reset);
        TitledPane tp = new TitledPane(Messages.get("review.tolerances"), box);
        tp.setId("review-tolerances-pane");
        tp.setExpanded(true);
        return tp;
    }

    // ------------------------------------------------------------------------------ export

    private Node export() {
        ChoiceBox<CalculationSheet.PageSize> page = new ChoiceBox<>();
        page.getItems().setAll(CalculationSheet.PageSize.values());
        page.setValue(CalculationSheet.PageSize.A4);
        ChoiceBox<org.ventcase.report.UnitSystem> units = new ChoiceBox<>();
        units.setId("review-export-units");
        units.getItems().setAll(org.ventcase.report.UnitSystem.values());
        units.setValue(org.ventcase.report.UnitSystem.SI);
        Button pdf = new Button(Messages.get("review.export.pdf"));
        pdf.setId("review-write-pdf");
        Button json = new Button(Messages.get("review.export.json"));
        json.setId("review-write-json");
        Label status = new Label();
        status.setId("review-export-status");
        status.setWrapText(true);
        status.textProperty().bind(rvm.exportMessage());
        Runnable enable = () -> {
            boolean ok = rvm.current() && rvm.outcome().get().isPresent();
            pdf.setDisable(!ok);
            json.setDisable(!ok);
        };
        javafx.beans.InvalidationListener l = o -> enable.run();
        rvm.state().addListener(l);
        detach.add(() -> rvm.state().removeListener(l));
        enable.run();
        pdf.setOnAction(e -> save("pdf", "review.pdf").ifPresent(p -> rvm.writePdf(p, page.getValue(), units.getValue())));
        json.setOnAction(e -> save("json", "review.json").ifPresent(rvm::writeJson));
        Label h = new Label(Messages.get("review.export"));
        h.getStyleClass().add("form-heading");
        HBox row = new HBox(10, pdf, new Label(Messages.get("review.export.page")), page,
                new Label(Messages.get("results.units")), units, json);
        row.setAlignment(Pos.CENTER_LEFT);
        return new VBox(6, h, row, status);
    }

    private java.util.Optional<java.nio.file.Path> save(String ext, String suffix) {
        FileChooser fc = new FileChooser();
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(ext.toUpperCase(java.util.Locale.ROOT), "*." + ext));
        String tag = rvm.outcome().get().map(o -> o.result().tag()).orElse("case");
        fc.setInitialFileName(tag.replaceAll("[^A-Za-z0-9_-]", "_") + "-" + suffix);
        File f = fc.showSaveDialog(window.get());
        return java.util.Optional.ofNullable(f).map(File::toPath);
    }

    // ------------------------------------------------------------------------------ cautions

    private Node cautions() {
        VBox v = new VBox(6);
        v.setId("review-cautions");
        v.getStyleClass().add("cautions");
        Label h2 = new Label(Messages.get("results.deferral"));
        h2.getStyleClass().add("form-heading");
        Label d = new Label();
        d.setId("review-deferral");
        d.setWrapText(true);
        Runnable fill = () -> d.setText(rvm.outcome().get().map(o -> Texts.deferral(o.result().tag(),
                o.result().inputHash())).orElse(Texts.deferral("each vessel", "(shown with each review)")));
        javafx.beans.InvalidationListener l = o -> fill.run();
        rvm.outcome().addListener(l);
        detach.add(() -> rvm.outcome().removeListener(l));
        fill.run();
        Label h1 = new Label(Messages.get("results.cautions"));
        h1.getStyleClass().add("form-heading");
        Label c = new Label(Texts.cautions());
        c.setWrapText(true);
        v.getChildren().addAll(h2, d, h1, c);
        VBox.setMargin(v, new Insets(8, 0, 0, 0));
        return v;
    }
}
