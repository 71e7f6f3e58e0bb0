package org.ventcase.ui;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;
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
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;

import org.ventcase.audit.AuditResult;
import org.ventcase.audit.VesselAudit;
import org.ventcase.report.AuditSheet;
import org.ventcase.report.CalculationSheet;
import org.ventcase.app.AuditRunner;

/**
 * The audit screen: choose a register (and thresholds), progress with Cancel, then the counts,
 * totals by area and component, threshold checks (the verdict written, the colour repeats it),
 * the largest vessels, the rows not computed and the installed orifices short, export, and the
 * cautions. Bindings and layout only; the {@link AuditViewModel} does the rest.
 */
final class AuditView {

    private static final PseudoClass PROBLEM = PseudoClass.getPseudoClass("problem");
    private static final PseudoClass CURRENT = PseudoClass.getPseudoClass("current");

    private final AuditViewModel avm;
    private final Supplier<Window> window;
    private final Runnable close;
    private final List<Runnable> detach = new ArrayList<>();

    AuditView(AuditViewModel avm, Supplier<Window> window, Runnable close) {
        this.avm = avm;
        this.window = window;
        this.close = close;
    }

    void dispose() {
        detach.forEach(Runnable::run);
        detach.clear();
    }

    Node build() {
        VBox page = new VBox(12);
        page.setId("audit-page");
        page.getStyleClass().add("page");
        Label h = new Label(Messages.get("audit.title"));
        h.getStyleClass().add("page-title");
        Label intro = new Label(Messages.get("audit.intro"));
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");

        Button open = new Button(Messages.get("audit.open"));
        open.setId("audit-open");
        open.getStyleClass().add("primary");
        open.setOnAction(e -> choose("audit.open", "Vessel register (*.csv)", false).ifPresent(avm::open));
        Button demo = new Button(Messages.get("audit.demo"));
        demo.setId("audit-open-demo");
        demo.setOnAction(e -> avm.openDemo());
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        Button closeButton = new Button(Messages.get("audit.close"));
        closeButton.setId("audit-close");
        closeButton.setOnAction(e -> close.run());
        HBox chooser = new HBox(10, open, demo, gap, closeButton);
        chooser.setAlignment(Pos.CENTER_LEFT);

        Label thName = new Label();
        thName.setId("audit-thresholds-file");
        Button thChoose = new Button(Messages.get("audit.thresholds.choose"));
        thChoose.setId("audit-thresholds-choose");
        thChoose.setOnAction(e -> choose("audit.thresholds.choose", "Thresholds (*.csv)", true)
                .ifPresent(p -> avm.thresholds(Optional.of(p))));
        Button thClear = new Button(Messages.get("audit.thresholds.clear"));
        thClear.setId("audit-thresholds-clear");
        thClear.setOnAction(e -> avm.thresholds(Optional.empty()));
        HBox thRow = new HBox(10, new Label(Messages.get("audit.thresholds")), thName, thChoose, thClear);
        thRow.setAlignment(Pos.CENTER_LEFT);

        Button cancel = new Button(Messages.get("audit.cancel"));
        cancel.setId("audit-cancel");
        cancel.setOnAction(e -> avm.cancel());
        ProgressBar bar = new ProgressBar(0);
        bar.setId("audit-progress");
        bar.setPrefWidth(260);
        Label status = new Label();
        status.setId("audit-status");
        status.setWrapText(true);
        status.getStyleClass().add("results-status");
        HBox controls = new HBox(10, bar, cancel, status);
        controls.setAlignment(Pos.CENTER_LEFT);

        VBox body = new VBox(12);
        body.setId("audit-body");
        Runnable show = () -> {
            JobState st = avm.state().get();
            boolean busy = st == JobState.RUNNING;
            thName.setText(avm.thresholdsFile().get().map(AuditRunner.Input::name)
                    .orElse(Messages.get("audit.thresholds.none")));
            cancel.setDisable(!busy);
            for (Node x : new Node[] {cancel, bar}) {
                x.setVisible(busy);
                x.setManaged(busy);
            }
            int n = avm.total().get();
            bar.setProgress(n == 0 ? ProgressBar.INDETERMINATE_PROGRESS : (double) avm.done().get() / n);
            status.setText(switch (st) {
                case IDLE -> Messages.get("audit.none");
                case CURRENT -> Messages.get("audit.state.done");
                case RUNNING -> n == 0 ? avm.message().get()
                        : avm.message().get() + " " + Messages.get("audit.state.progress", avm.done().get(), n);
                default -> avm.message().get();
            });
            status.pseudoClassStateChanged(PROBLEM, st == JobState.FAILED);
            status.pseudoClassStateChanged(CURRENT, st == JobState.CURRENT);
        };
        Runnable refill = () -> {
            body.getChildren().clear();
            avm.outcome().get().ifPresent(o -> fill(body, o));
        };
        javafx.beans.InvalidationListener l = o -> show.run();
        javafx.beans.InvalidationListener lo = o -> refill.run();
        avm.state().addListener(l);
        avm.message().addListener(l);
        avm.done().addListener(l);
        avm.total().addListener(l);
        avm.thresholdsFile().addListener(l);
        avm.outcome().addListener(lo);
        detach.add(() -> {
            avm.state().removeListener(l);
            avm.message().removeListener(l);
            avm.done().removeListener(l);
            avm.total().removeListener(l);
            avm.thresholdsFile().removeListener(l);
            avm.outcome().removeListener(lo);
        });
        show.run();
        refill.run();

        page.getChildren().addAll(h, intro, chooser, thRow, controls, body, export(), cautions());
        ScrollPane sp = new ScrollPane(page);
        sp.setFitToWidth(true);
        sp.getStyleClass().add("page-scroll");
        return sp;
    }

    private Optional<Path> choose(String titleKey, String filter, boolean thresholds) {
        FileChooser fc = new FileChooser();
        fc.setTitle(Messages.plain(titleKey));
        fc.getExtensionFilters().addAll(new FileChooser.ExtensionFilter(filter, "*.csv"),
                new FileChooser.ExtensionFilter("All files", "*"));
        File f = fc.showOpenDialog(window.get());
        return Optional.ofNullable(f).map(File::toPath);
    }

    // ------------------------------------------------------------------------------ the audit

    private static String t(double kg) {
        return String.format(Locale.ROOT, "%,.1f t", kg / 1000.0);
    }

    private static String kgh(double kgPerS) {
        return String.format(Locale.ROOT, "%,.0f kg/h", kgPerS * 3600);
    }

    private static String mm2(double m2) {
        return String.format(Locale.ROOT, "%,.0f mm²", m2 * 1e6);
    }

    private void fill(VBox body, AuditRunner.Outcome o) {
        AuditResult r = o.result();
        Label counts = new Label(Messages.get("audit.counts", r.rowCount(), o.count(VesselAudit.Status.OK),
                o.count(VesselAudit.Status.PARTIAL), o.count(VesselAudit.Status.ERROR)));
        counts.setId("audit-counts");
        counts.getStyleClass().add("governing-line");
        Label site = new Label(Messages.get("audit.site", t(r.site().totalMassKg()), t(r.site().liquidMassKg()),
                t(r.site().vapourMassKg())));
        site.setId("audit-site");
        site.getStyleClass().add("governing-line");
        Label basis = new Label(Messages.get("audit.basis", o.registerName(),
                o.thresholdsName().orElse(Messages.get("audit.thresholds.none")), o.inputHash().substring(0, 12)));
        basis.getStyleClass().add("hint");
        Label firstPass = new Label(Messages.get("audit.firstPass"));
        firstPass.setId("audit-first-pass");
        firstPass.setWrapText(true);
        firstPass.getStyleClass().add("warning");
        body.getChildren().addAll(counts, site, basis, firstPass);

        GridPane areas = table("audit-by-area", List.of("area", "vessels", "liquid", "vapour", "total"), r.byArea(),
                g -> cells(g.name(), Integer.toString(g.vessels()), t(g.liquidMassKg()), t(g.vapourMassKg()),
                        t(g.totalMassKg())), 1, 4);
        GridPane comps = table("audit-by-component", List.of("component", "total"),
                new ArrayList<>(r.site().massPerComponentKg().entrySet()),
                e -> cells(e.getKey(), t(e.getValue())), 1, 1);
        HBox totals = new HBox(40, section("audit.byArea", areas), section("audit.byComponent", comps));
        body.getChildren().add(totals);

        if (!r.thresholds().isEmpty()) {
            GridPane th = table("audit-thresholds", List.of("component", "threshold", "site", "verdict", "areas",
                    "label"), r.thresholds(), c -> {
                        List<Label> cs = cells(c.entry().component().name(), t(c.entry().thresholdKg()),
                                t(c.siteKg()), "", c.areasExceeding().isEmpty() ? "" : String.join(", ",
                                        c.areasExceeding().keySet()), c.entry().label());
                        Label v = cs.get(3);
                        v.setText(c.siteExceeds() ? Messages.get("audit.thresholds.exceeded")
                                : Messages.get("audit.thresholds.below"));
                        v.getStyleClass().addAll("verdict", c.siteExceeds() ? "verdict-disagrees" : "verdict-agrees");
                        v.setId("audit-threshold-" + c.entry().component().name());
                        return cs;
                    }, 1, 2);
            body.getChildren().add(section("audit.thresholds.heading", th));
        }

        List<String> vesselCols = List.of("row", "tag", "area", "fluid", "total", "load", "required", "orifice");
        Function<VesselAudit, List<Label>> vessel = v -> cells(Integer.toString(v.row()), v.tag(), v.area(), v.fluid(),
                v.inventory().map(c -> t(c.totalMassKg())).orElse(""),
                v.fire().map(f -> kgh(f.reliefLoadKgPerS())).orElse(""),
                v.fire().map(f -> mm2(f.requiredAreaM2())).orElse(""),
                v.fire().map(VesselAudit.FireLoad::selectedOrifice).orElse(""));
        body.getChildren().addAll(
                section(Messages.get("audit.top.inventory", AuditRunner.TOP),
                        table("audit-top-inventory", vesselCols, o.result().topByInventory(), vessel, 4, 6)),
                section(Messages.get("audit.top.fire", AuditRunner.TOP),
                        table("audit-top-fire", vesselCols, o.result().topByFireLoad(), vessel, 4, 6)));

        List<VesselAudit> bad = o.result().notComputed();
        Node badNode = bad.isEmpty() ? new Label(Messages.get("audit.notComputed.none"))
                : table("audit-not-computed", List.of("row", "tag", "area", "status", "field", "reason"),
                        bad, v -> {
                            List<Label> cs = cells(Integer.toString(v.row()), v.tag(), v.area(), v.status().word(),
                                    v.error().map(e -> e.field() + (e.value().isEmpty() ? "" : " '" + e.value() + "'"))
                                            .orElse(""), v.error().map(org.ventcase.audit.AuditError::reason)
                                            .orElse(""));
                            cs.get(5).setWrapText(true);
                            cs.get(5).setMaxWidth(640);
                            return cs;
                        }, 0, 0);
        body.getChildren().add(section("audit.notComputed", badNode, more(o.result().digest().notComputedCount())));

        List<VesselAudit> shorts = o.result().installedShort();
        Node shortNode = shorts.isEmpty() ? new Label(Messages.get("audit.short.none"))
                : table("audit-installed-short", List.of("row", "tag", "area", "required", "installed", "margin"),
                        shorts, v -> {
                            VesselAudit.FireLoad f = v.fire().orElseThrow();
                            VesselAudit.InstalledCheck ic = f.installed().orElseThrow();
                            return cells(Integer.toString(v.row()), v.tag(), v.area(), mm2(f.requiredAreaM2()),
                                    ic.designation() + " (" + mm2(ic.areaM2()) + ")",
                                    String.format(Locale.ROOT, "%+.0f %%", ic.marginPercent()));
                        }, 3, 5);
        body.getChildren().add(section("audit.short", shortNode, more(o.result().digest().installedShortCount())));
    }

    private static Label more(long n) {
        Label l = new Label(n > AuditSheet.MAX_LISTED ? "First " + AuditSheet.MAX_LISTED + " of " + n
                + " listed; the per-vessel CSV has them all." : "");
        l.getStyleClass().add("hint");
        l.setManaged(n > AuditSheet.MAX_LISTED);
        return l;
    }

    private static List<Label> cells(String... texts) {
        List<Label> out = new ArrayList<>();
        for (String s : texts) {
            out.add(new Label(s));
        }
        return out;
    }

    /** A table of labels; columns {@code firstNumber} to {@code lastNumber} hold numbers. */
    private static <T> GridPane table(String id, List<String> cols, List<T> rows, Function<T, List<Label>> cells,
                                      int firstNumber, int lastNumber) {
        GridPane g = new GridPane();
        g.setId(id);
        g.getStyleClass().add("results-table");
        g.setHgap(14);
        g.setVgap(3);
        for (int c = 0; c < cols.size(); c++) {
            Label l = new Label(Messages.get("audit.col." + cols.get(c)));
            l.getStyleClass().add("col-head");
            l.setMinWidth(Region.USE_PREF_SIZE);
            g.add(l, c, 0);
        }
        int row = 1;
        for (T t : rows) {
            List<Label> cs = cells.apply(t);
            for (int c = 0; c < cs.size(); c++) {
                Label l = cs.get(c);
                if (!l.isWrapText()) {
                    l.setMinWidth(Region.USE_PREF_SIZE);
                }
                if (c >= firstNumber && c <= lastNumber && !l.getStyleClass().contains("verdict")) {
                    l.getStyleClass().add("number");
                }
                g.add(l, c, row);
            }
            row++;
        }
        return g;
    }

    private static VBox section(String titleOrKey, Node... content) {
        Label h = new Label(Messages.has(titleOrKey) ? Messages.get(titleOrKey) : titleOrKey);
        h.getStyleClass().add("form-heading");
        VBox v = new VBox(6, h);
        v.getChildren().addAll(content);
        return v;
    }

    // ------------------------------------------------------------------------------ export, cautions

    private Node export() {
        ChoiceBox<CalculationSheet.PageSize> page = new ChoiceBox<>();
        page.getItems().setAll(CalculationSheet.PageSize.values());
        page.setValue(CalculationSheet.PageSize.A4);
        ChoiceBox<org.ventcase.report.UnitSystem> units = new ChoiceBox<>();
        units.setId("audit-export-units");
        units.getItems().setAll(org.ventcase.report.UnitSystem.values());
        units.setValue(org.ventcase.report.UnitSystem.SI);
        Button csv = new Button(Messages.get("audit.export.csv"));
        csv.setId("audit-write-csv");
        Button pdf = new Button(Messages.get("audit.export.pdf"));
        pdf.setId("audit-write-pdf");
        Label status = new Label();
        status.setId("audit-export-status");
        status.setWrapText(true);
        status.textProperty().bind(avm.exportMessage());
        Runnable enable = () -> {
            boolean ok = avm.state().get() == JobState.CURRENT && avm.outcome().get().isPresent();
            csv.setDisable(!ok);
            pdf.setDisable(!ok);
        };
        javafx.beans.InvalidationListener l = o -> enable.run();
        avm.state().addListener(l);
        detach.add(() -> avm.state().removeListener(l));
        enable.run();
        csv.setOnAction(e -> save("csv", "audit.csv").ifPresent(avm::writeCsv));
        pdf.setOnAction(e -> save("pdf", "audit.pdf").ifPresent(p -> avm.writePdf(p, page.getValue(), units.getValue())));
        Label h = new Label(Messages.get("review.export"));
        h.getStyleClass().add("form-heading");
        HBox row = new HBox(10, csv, pdf, new Label(Messages.get("review.export.page")), page,
                new Label(Messages.get("results.units")), units);
        row.setAlignment(Pos.CENTER_LEFT);
        return new VBox(6, h, row, status);
    }

    private Optional<Path> save(String ext, String suffix) {
        FileChooser fc = new FileChooser();
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(ext.toUpperCase(Locale.ROOT), "*." + ext));
        String name = avm.outcome().get().map(AuditRunner.Outcome::registerName).orElse("register")
                .replaceFirst("\\.csv$", "");
        fc.setInitialFileName(name.replaceAll("[^A-Za-z0-9_-]", "_") + "-" + suffix);
        File f = fc.showSaveDialog(window.get());
        return Optional.ofNullable(f).map(File::toPath);
    }

    private Node cautions() {
        VBox v = new VBox(6);
        v.setId("audit-cautions");
        v.getStyleClass().add("cautions");
        Label h1 = new Label(Messages.get("results.cautions"));
        h1.getStyleClass().add("form-heading");
        Label c = new Label(Texts.cautions());
        c.setWrapText(true);
        Label h2 = new Label(Messages.get("results.deferral"));
        h2.getStyleClass().add("form-heading");
        Label d = new Label(Texts.deferral("each vessel of the register", "(on the summary PDF)"));
        d.setId("audit-deferral");
        d.setWrapText(true);
        v.getChildren().addAll(h1, c, h2, d);
        VBox.setMargin(v, new Insets(4, 0, 4, 0));
        return v;
    }
}
