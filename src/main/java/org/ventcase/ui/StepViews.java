package org.ventcase.ui;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.ExecutorService;

import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.Label;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;

import org.ventcase.casefile.ScenarioType;
import org.ventcase.casefile.Templates;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.relief.EnvironmentFactor;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.QuantityText;
import org.ventcase.report.UnitSystem;
import org.ventcase.app.CaseSummary;
import org.ventcase.app.SheetOutcome;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;

/** The content of each step: forms bound to the view-model, the sketch, results and export. */
final class StepViews {

    private final WizardViewModel vm;
    private final ExecutorService worker;
    private final java.util.function.Supplier<Window> window;

    StepViews(WizardViewModel vm, ExecutorService worker, java.util.function.Supplier<Window> window) {
        this.vm = vm;
        this.worker = worker;
        this.window = window;
    }

    /** Where the PDF sheet is written, given a suggested file name: the save dialog (tests set a fixed file). */
    private java.util.function.Function<String, Optional<Path>> sheetTarget = this::chooseSheet;

    private Optional<Path> chooseSheet(String name) {
        FileChooser fc = new FileChooser();
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("PDF", "*.pdf"));
        fc.setInitialFileName(name);
        java.io.File target = fc.showSaveDialog(window.get());
        return Optional.ofNullable(target).map(java.io.File::toPath);
    }

    /** Replaces the save dialog of the Export step (window tests). */
    void sheetTarget(java.util.function.Function<String, Optional<Path>> chooser) {
        sheetTarget = chooser;
    }

    Node build(Step s) {
        leave.forEach(Runnable::run);
        leave.clear();
        return switch (s) {
            case IDENTITY -> identity();
            case FLUID -> fluid();
            case VESSEL -> vessel();
            case STORAGE -> storage();
            case SCENARIOS -> scenarios();
            case DEVICE -> device();
            case RESULTS -> results();
            case EXPORT -> export();
        };
    }

    private Node identity() {
        Forms f = new Forms(vm);
        for (String k : List.of("title", "tag", "revision", "preparer", "checker", "date", "notes")) {
            f.text(vm.text("$.identity." + k));
        }
        return f.grid();
    }

    private Node fluid() {
        Forms f = new Forms(vm);
        int n = vm.componentCount();
        for (int i = 0; i < n; i++) {
            String base = "$.fluid.components[" + i + "]";
            f.heading(Messages.get("label.fluid.components.name") + " " + (i + 1));
            TextField name = f.text(vm.text(base + ".name"));
            name.setPromptText(Messages.get("fluid.search.prompt"));
            Label info = new Label(vm.componentInfo(name.getText()));
            info.getStyleClass().add("hint");
            ContextMenu pop = new ContextMenu();
            name.textProperty().addListener((o, a, b) -> {
                info.setText(vm.componentInfo(b));
                pop.getItems().clear();
                if (name.isFocused() && b != null && b.length() >= 2) {
                    for (String sug : vm.componentSuggestions(b, 6)) {
                        if (!sug.equalsIgnoreCase(b)) {
                            MenuItem mi = new MenuItem(sug);
                            mi.setMnemonicParsing(false);
                            mi.setOnAction(e -> name.setText(sug));
                            pop.getItems().add(mi);
                        }
                    }
                    if (!pop.getItems().isEmpty() && !pop.isShowing()) {
                        pop.show(name, javafx.geometry.Side.BOTTOM, 0, 0);
                    }
                }
                if (pop.getItems().isEmpty()) {
                    pop.hide();
                }
            });
            f.span(info);
            f.text(vm.number(base + ".moleFraction"));
            int idx = i;
            Button rm = new Button(Messages.get("fluid.remove"));
            rm.setOnAction(e -> vm.removeComponent(idx));
            f.span(rm);
        }
        Button add = new Button(Messages.get("fluid.add"));
        add.setId("add-component");
        add.setOnAction(e -> vm.addComponent());
        Label sum = new Label();
        sum.setId("composition-sum");
        sum.textProperty().bind(vm.compositionSum());
        sum.getStyleClass().add("sum");
        vm.compositionOk().addListener((o, a, b) -> sum.pseudoClassStateChanged(
                javafx.css.PseudoClass.getPseudoClass("ok"), b));
        sum.pseudoClassStateChanged(javafx.css.PseudoClass.getPseudoClass("ok"), vm.compositionOk().get());
        HBox row = new HBox(16, add, sum);
        row.setAlignment(Pos.CENTER_LEFT);
        f.span(row);
        f.heading(Messages.plain("step.fluid"));
        f.choice(vm.choice("$.fluid.eos", org.ventcase.thermo.EosVariant.offeredIds()), false);
        f.choice(vm.choice("$.fluid.densityBasis", List.of("translated", "cubic")), false);
        return f.grid();
    }

    private Node vessel() {
        Forms f = new Forms(vm);
        String shape = vm.valueAt("$.vessel.shape");
        f.choice(vm.choice("$.vessel.shape", List.of("horizontal", "vertical", "sphere")), false);
        f.text(vm.quantity("$.vessel.insideDiameter", Dimension.LENGTH));
        if (!shape.equals("sphere")) {
            f.text(vm.quantity("$.vessel.tangentLength", Dimension.LENGTH));
            f.choice(vm.choice("$.vessel.heads", List.of("2:1", "hemispherical", "flanged-dished", "80/10", "flat")), true);
            f.choice(vm.choice("$.vessel.secondHead", List.of("", "2:1", "hemispherical", "flanged-dished", "80/10",
                    "flat")), true);
        }
        f.text(vm.quantity("$.vessel.bottomElevation", Dimension.LENGTH));
        f.text(vm.quantity("$.vessel.wallThickness", Dimension.LENGTH));
        if (shape.equals("vertical")) {
            f.check(vm.bool("$.vessel.skirtExcludesBottomHead"));
        }
        f.heading(Messages.get("label.vessel.insulation.thickness").replace(" thickness", ""));
        f.text(vm.quantity("$.vessel.insulation.thickness", Dimension.LENGTH));
        f.text(vm.quantity("$.vessel.insulation.conductivity", Dimension.THERMAL_CONDUCTIVITY));
        f.check(vm.bool("$.vessel.insulation.withstandsFireHoseStreams"));
        f.heading("Site");
        f.text(vm.quantity("$.site.fireHeight", Dimension.LENGTH));
        f.text(vm.quantity("$.site.atmosphericPressure", Dimension.PRESSURE));
        f.text(vm.quantity("$.site.minimumDesignMetalTemperature", Dimension.TEMPERATURE));
        VesselSketchView sketch = new VesselSketchView();
        sketch.setId("vessel-sketch");
        sketch.draw(vm.sketch());
        vm.problems().addListener((javafx.collections.ListChangeListener<Object>) c -> sketch.draw(vm.sketch()));
        HBox box = new HBox(24, f.grid(), sketch);
        HBox.setHgrow(sketch, Priority.ALWAYS);
        return box;
    }

    private Node storage() {
        Forms f = new Forms(vm);
        String mode = vm.valueAt("$.storage.mode");
        f.choice(vm.choice("$.storage.mode", List.of("saturated", "specified", "gas-filled")), false);
        f.text(vm.quantity("$.storage.temperature", Dimension.TEMPERATURE));
        if (!mode.equals("saturated")) {
            f.text(vm.quantity("$.storage.pressure", Dimension.PRESSURE));
        }
        if (!mode.equals("gas-filled")) {
            f.text(vm.text("$.storage.liquidLevel")).setPromptText("e.g. 85 %v, 65 % or 2.1 m");
        }
        VesselSketchView sketch = new VesselSketchView();
        sketch.draw(vm.sketch());
        vm.problems().addListener((javafx.collections.ListChangeListener<Object>) c -> sketch.draw(vm.sketch()));
        HBox box = new HBox(24, f.grid(), sketch);
        HBox.setHgrow(sketch, Priority.ALWAYS);
        return box;
    }

    private Node scenarios() {
        VBox list = new VBox(14);
        int n = vm.scenarioCount();
        if (n == 0) {
            Label none = new Label(Messages.get("scenarios.none"));
            none.getStyleClass().add("hint");
            list.getChildren().add(none);
        }
        List<String> factors = EnvironmentFactors.all().stream().map(EnvironmentFactor::key).toList();
        for (int i = 0; i < n; i++) {
            String base = "$.scenarios[" + i + "]";
            Forms f = new Forms(vm);
            f.heading(Messages.get("scenarios.heading", i + 1));
            f.choice(vm.choice(base + ".type", ScenarioType.keys()), false);
            f.text(vm.text(base + ".label"));
            Optional<ScenarioType> t = ScenarioType.byKey(vm.valueAt(base + ".type"));
            java.util.Set<String> uses = t.map(ScenarioType::fields).orElse(java.util.Set.of());
            if (uses.contains("fireFighting")) {
                f.choice(vm.choice(base + ".fireFighting", List.of("adequate", "inadequate")), false);
            }
            if (uses.contains("environmentFactor")) {
                f.choice(vm.choice(base + ".environmentFactor", factors), false);
            }
            if (uses.contains("insulationCredit")) {
                f.check(vm.bool(base + ".insulationCredit"));
            }
            if (uses.contains("wallTemperature")) {
                f.text(vm.quantity(base + ".wallTemperature", Dimension.TEMPERATURE));
            }
            if (uses.contains("inflow")) {
                f.text(vm.quantity(base + ".inflow", Dimension.MASS_FLOW));
            }
            if (uses.contains("inflowPhase")) {
                f.choice(vm.choice(base + ".inflowPhase", List.of("vapour", "liquid")), false);
            }
            if (uses.contains("heatInput")) {
                f.text(vm.quantity(base + ".heatInput", Dimension.POWER));
            }
            if (uses.contains("blockedInVolume")) {
                f.text(vm.quantity(base + ".blockedInVolume", Dimension.VOLUME));
            }
            int idx = i;
            Button rm = new Button(Messages.get("scenarios.remove"));
            rm.setOnAction(e -> vm.removeScenario(idx));
            f.span(rm);
            f.grid().getStyleClass().add("card");
            list.getChildren().add(f.grid());
        }
        ChoiceBox<ScenarioType> type = new ChoiceBox<>();
        type.getItems().setAll(ScenarioType.values());
        type.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(ScenarioType s) {
                return s == null ? "" : s.key();
            }

            @Override
            public ScenarioType fromString(String s) {
                return ScenarioType.byKey(s).orElse(null);
            }
        });
        type.setValue(ScenarioType.FIRE_WETTED);
        Button add = new Button(Messages.get("scenarios.add"));
        add.setId("add-scenario");
        add.setOnAction(e -> vm.addScenario(type.getValue()));
        HBox row = new HBox(8, type, add);
        row.setAlignment(Pos.CENTER_LEFT);
        list.getChildren().add(row);
        return list;
    }

    private Node device() {
        Forms f = new Forms(vm);
        f.text(vm.quantity("$.device.setPressure", Dimension.PRESSURE));
        f.text(vm.quantity("$.device.mawp", Dimension.PRESSURE));
        f.choice(vm.choice("$.device.deviceCount", List.of("single", "multiple")), false);
        f.check(vm.bool("$.device.supplementalFireValve"));
        f.text(vm.text("$.device.setAboveLimitReason"));
        f.heading("Back pressure");
        f.text(vm.quantity("$.device.backPressure.superimposed", Dimension.PRESSURE));
        f.text(vm.quantity("$.device.backPressure.builtUp", Dimension.PRESSURE_DIFFERENCE));
        f.heading("Valve");
        f.choice(vm.choice("$.device.valveType", List.of("conventional", "balanced-bellows", "pilot")), false);
        f.check(vm.bool("$.device.ruptureDiskUpstream"));
        f.text(vm.number("$.device.kd"));
        f.text(vm.number("$.device.kdLiquid"));
        f.text(vm.number("$.device.kb"));
        f.text(vm.number("$.device.kc"));
        f.choice(vm.choice("$.device.liquidViscosityCorrection", List.of("", "api520-10th", "api520-7th-to-9th")), false);
        return f.grid();
    }

    // ------------------------------------------------------------------------------ results

    private Node results() {
        LiveCalculation live = vm.live();
        VBox box = new VBox(12);
        Button run = new Button(Messages.get("results.run"));
        run.setId("run");
        run.setOnAction(e -> live.recalculate());
        Button cancel = new Button(Messages.get("results.cancel"));
        cancel.setId("cancel");
        cancel.setOnAction(e -> live.cancel());
        ProgressBar bar = new ProgressBar(0);
        bar.setId("results-progress");
        bar.setPrefWidth(200);
        bar.progressProperty().bind(live.progress());
        ChoiceBox<UnitSystem> units = new ChoiceBox<>();
        units.getItems().setAll(UnitSystem.values());
        units.setValue(UnitSystem.SI);
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox controls = new HBox(10, run, cancel, bar, gap, new Label(Messages.get("results.units")), units);
        controls.setAlignment(Pos.CENTER_LEFT);
        Label status = new Label();
        status.setId("results-status");
        status.setWrapText(true);
        status.getStyleClass().add("results-status");
        VBox out = new VBox(10);
        out.setId("results-body");
        Runnable show = () -> {
            JobState st = live.state().get();
            boolean busy = st == JobState.RUNNING || st == JobState.WAITING;
            run.setDisable(vm.validated().isEmpty());
            cancel.setDisable(!busy);
            bar.setVisible(st == JobState.RUNNING);
            bar.setManaged(st == JobState.RUNNING);
            boolean have = live.summary().get().isPresent();
            status.setText(statusLine(st, have, live.message().get()));
            status.pseudoClassStateChanged(PROBLEM, st == JobState.INVALID
                    || st == JobState.FAILED);
            status.pseudoClassStateChanged(CURRENT, st == JobState.CURRENT);
            out.pseudoClassStateChanged(STALE, have && !live.current());
            out.getChildren().clear();
            live.summary().get().ifPresent(sum -> showSummary(out, sum, units.getValue()));
        };
        units.valueProperty().addListener((o, a, b) -> show.run());
        javafx.beans.InvalidationListener l = o -> show.run();
        live.state().addListener(l);
        live.summary().addListener(l);
        javafx.beans.InvalidationListener msg = o -> status.setText(statusLine(live.state().get(),
                live.summary().get().isPresent(), live.message().get()));
        live.message().addListener(msg);
        onLeave(() -> {
            live.state().removeListener(l);
            live.summary().removeListener(l);
            live.message().removeListener(msg);
        });
        box.getChildren().addAll(controls, status, out, cautions());
        show.run();
        if (live.state().get() == JobState.IDLE) {
            live.recalculate();
        }
        return box;
    }

    private static final javafx.css.PseudoClass STALE = javafx.css.PseudoClass.getPseudoClass("stale");
    private static final javafx.css.PseudoClass PROBLEM = javafx.css.PseudoClass.getPseudoClass("problem");
    private static final javafx.css.PseudoClass CURRENT = javafx.css.PseudoClass.getPseudoClass("current");

    /** One line saying whether the numbers shown are those of the inputs as they are now. */
    static String statusLine(JobState st, boolean haveResult, String message) {
        String stale = haveResult ? " " + Messages.get("results.stale") : "";
        return switch (st) {
            case IDLE -> "";
            case WAITING -> Messages.get("results.state.waiting") + stale;
            case RUNNING -> (message.isBlank() ? Messages.get("results.running") : Messages.get("results.state.running",
                    message)) + stale;
            case CURRENT -> Messages.get("results.state.current");
            case INVALID -> Messages.get("results.state.invalid") + stale;
            case CANCELLED -> Messages.get("results.state.cancelled") + stale;
            case FAILED -> message + stale;
        };
    }

    /** Runs {@code r} when the step now shown is left (listeners on long-lived properties). */
    private void onLeave(Runnable r) {
        leave.add(r);
    }

    private final List<Runnable> leave = new java.util.ArrayList<>();

    private void showSummary(VBox out, CaseSummary s, UnitSystem u) {
        out.getChildren().clear();
        Label ih = new Label(Messages.get("results.inventory"));
        ih.getStyleClass().add("form-heading");
        out.getChildren().add(ih);
        if (s.inventory().isPresent()) {
            CaseSummary.InventoryRow r = s.inventory().get();
            GridPane g = new GridPane();
            g.setHgap(16);
            g.setVgap(2);
            g.addRow(0, new Label(Messages.get("results.inventory.liquid")), new Label(mass(r.liquidKg(), u)));
            g.addRow(1, new Label(Messages.get("results.inventory.vapour")), new Label(mass(r.vapourKg(), u)));
            g.addRow(2, new Label(Messages.get("results.inventory.total")), new Label(mass(r.totalKg(), u)));
            g.addRow(3, new Label(Messages.get("results.inventory.pressure")), new Label(pressure(r.pressurePa(), u)
                    + " at " + temperature(r.temperatureK(), u)));
            g.addRow(4, new Label(Messages.get("results.inventory.liquidVolume")), new Label(volume(r.liquidVolumeM3(), u)
                    + " / " + volume(r.vesselVolumeM3(), u)));
            out.getChildren().add(g);
        } else {
            out.getChildren().add(new Label(s.inventoryNote()));
        }
        Label sh = new Label(Messages.get("results.scenarios"));
        sh.getStyleClass().add("form-heading");
        out.getChildren().add(sh);
        GridPane t = new GridPane();
        t.setId("results-table");
        t.getStyleClass().add("results-table");
        t.setHgap(14);
        t.setVgap(4);
        headings(t, "scenario", "type", "p1", "t1", "heat", "load", "area", "orifice");
        for (int i = 0; i < s.scenarios().size(); i++) {
            CaseSummary.ScenarioRow r = s.scenarios().get(i);
            int row = i + 1;
            boolean gov = s.governing().isPresent() && s.governing().get() == i;
            Label name = new Label(r.label() + (gov ? " " + Messages.get("results.governingMark") : ""));
            if (gov) {
                name.getStyleClass().add("governing");
            }
            t.add(name, 0, row);
            t.add(new Label(r.type()), 1, row);
            if (r.computed()) {
                t.add(new Label(opt(r.relievingPressurePa(), v -> pressure(v, u))), 2, row);
                t.add(new Label(opt(r.relievingTemperatureK(), v -> temperature(v, u))), 3, row);
                t.add(new Label(opt(r.heatInputW(), v -> power(v, u))), 4, row);
                t.add(new Label(opt(r.loadKgPerS(), v -> flow(v, u))), 5, row);
                t.add(new Label(opt(r.requiredAreaM2(), v -> area(v, u))), 6, row);
                t.add(new Label(r.orifice().orElse("")), 7, row);
            } else {
                Label nc = new Label(r.note());
                nc.getStyleClass().add("not-computed");
                nc.setWrapText(true);
                nc.setMaxWidth(620);
                t.add(nc, 2, row, 6, 1);
            }
        }
        out.getChildren().add(t);
        relievedTable(out, s, u);
        Label gov = new Label();
        gov.setId("governing");
        gov.setWrapText(true);
        gov.getStyleClass().add("governing-line");
        if (s.governingRow().isPresent()) {
            CaseSummary.ScenarioRow g = s.governingRow().get();
            gov.setText(Messages.get("results.governing", g.label(), opt(g.requiredAreaM2(), v -> area(v, u)),
                    g.orifice().orElse("")) + (s.complete() ? "" : " " + Messages.get("results.governing.partial")));
        } else {
            gov.setText(Messages.get("results.governing.none"));
        }
        out.getChildren().add(gov);
        Label wh = new Label(Messages.get("results.warnings"));
        wh.getStyleClass().add("form-heading");
        out.getChildren().add(wh);
        if (s.warnings().isEmpty()) {
            out.getChildren().add(new Label(Messages.get("results.warnings.none")));
        }
        for (String w : s.warnings()) {
            // the calculation writes its warnings in SI; with US units chosen they lead with US units
            Label l = new Label("\u2022 " + (u == UnitSystem.US ? QuantityText.usFirst(w) : w));
            l.setWrapText(true);
            l.getStyleClass().add("warning");
            out.getChildren().add(l);
        }
    }

    /** The cautions and the code deferral, from the templates, always shown on the results step. */
    Node cautions() {
        VBox v = new VBox(6);
        v.setId("cautions");
        v.getStyleClass().add("cautions");
        Label h1 = new Label(Messages.get("results.cautions"));
        h1.getStyleClass().add("form-heading");
        Label c = new Label(Texts.cautions());
        c.setWrapText(true);
        Label h2 = new Label(Messages.get("results.deferral"));
        h2.getStyleClass().add("form-heading");
        Label d = new Label(deferralText());
        d.setId("deferral");
        d.setWrapText(true);
        // the tag and the input hash follow the case (an undo on this step changes them)
        javafx.beans.InvalidationListener l = o -> d.setText(deferralText());
        vm.problems().addListener(l);
        vm.live().state().addListener(l);
        onLeave(() -> {
            vm.problems().removeListener(l);
            vm.live().state().removeListener(l);
        });
        v.getChildren().addAll(h2, d, h1, c);
        return v;
    }

    private String deferralText() {
        return Texts.deferral(vm.valueAt("$.identity.tag"),
                vm.validated().map(ValidatedCase::inputHash).orElse("(computed when the case is complete)"));
    }

    /** The column headings of a results table (message keys results.col.NAME) in its first row. */
    private static void headings(GridPane t, String... cols) {
        for (int c = 0; c < cols.length; c++) {
            Label l = new Label(Messages.get("results.col." + cols[c]));
            l.getStyleClass().add("col-head");
            t.add(l, c, 0);
        }
    }

    /** The relieved fluid of each computed scenario: what a reviewer checks beside the load. */
    private static void relievedTable(javafx.scene.layout.VBox out, CaseSummary s, UnitSystem u) {
        if (s.scenarios().stream().noneMatch(r -> r.relieved().isPresent())) {
            return;
        }
        Label h = new Label(Messages.get("results.relieved"));
        h.getStyleClass().add("form-heading");
        out.getChildren().add(h);
        GridPane t = new GridPane();
        t.setId("relieved-table");
        t.getStyleClass().add("results-table");
        t.setHgap(14);
        t.setVgap(4);
        headings(t, "scenario", "phase", "molarMass", "z", "k", "density", "latent", "margin");
        int row = 1;
        for (CaseSummary.ScenarioRow r : s.scenarios()) {
            if (r.relieved().isEmpty()) {
                continue;
            }
            CaseSummary.ScenarioRow.Relieved f = r.relieved().get();
            t.add(new Label(r.label()), 0, row);
            t.add(new Label(Messages.get(f.liquid() ? "results.phase.liquid" : "results.phase.vapour")), 1, row);
            t.add(new Label(String.format(Locale.ROOT, "%.2f kg/kmol", f.molarMass())), 2, row);
            t.add(new Label(String.format(Locale.ROOT, "%.4f", f.z())), 3, row);
            t.add(new Label(f.kIdeal().isPresent() ? String.format(Locale.ROOT, "%.4f", f.kIdeal().getAsDouble())
                    : Messages.get("results.notApplicable")), 4, row);
            t.add(new Label(density(f.densityKgM3(), u)), 5, row);
            t.add(new Label(f.latentHeatJPerKg().isPresent() ? latent(f.latentHeatJPerKg().getAsDouble(), u)
                    : Messages.get("results.notApplicable")), 6, row);
            t.add(new Label(r.orificeMarginPercent().isPresent()
                    ? String.format(Locale.ROOT, "%+.0f %%", r.orificeMarginPercent().getAsDouble())
                    : Messages.get("results.notApplicable")), 7, row);
            row++;
        }
        out.getChildren().add(t);
    }

    static String density(double kgm3, UnitSystem u) {
        return u == UnitSystem.SI ? g(kgm3) + " kg/m3" : g(kgm3 * 0.0624279606) + " lb/ft3";
    }

    static String latent(double jkg, UnitSystem u) {
        return u == UnitSystem.SI ? g(jkg / 1e3) + " kJ/kg" : g(jkg / 2326.0) + " Btu/lb";
    }

    private static String opt(OptionalDouble v, java.util.function.DoubleFunction<String> f) {
        return v.isPresent() ? f.apply(v.getAsDouble()) : Messages.get("results.notComputed");
    }

    private static String g(double v) {
        return Math.abs(v) >= 1e4 ? String.format(Locale.ROOT, "%,.0f", v) : String.format(Locale.ROOT, "%.4g", v);
    }

    static String pressure(double pa, UnitSystem u) {
        return u == UnitSystem.SI ? g(pa / 1e5) + " bara" : g(pa / org.ventcase.units.CustomaryUnits.PA_PER_PSI) + " psia";
    }

    static String temperature(double k, UnitSystem u) {
        return u == UnitSystem.SI ? String.format(Locale.ROOT, "%.1f C", Units.fromSi(k, Dimension.TEMPERATURE, "c"))
                : String.format(Locale.ROOT, "%.1f F", Units.fromSi(k, Dimension.TEMPERATURE, "f"));
    }

    static String mass(double kg, UnitSystem u) {
        return u == UnitSystem.SI ? g(kg) + " kg" : g(Units.fromSi(kg, Dimension.MASS, "lb")) + " lb";
    }

    static String volume(double m3, UnitSystem u) {
        return u == UnitSystem.SI ? g(m3) + " m3" : g(Units.fromSi(m3, Dimension.VOLUME, "ft3")) + " ft3";
    }

    static String flow(double kgs, UnitSystem u) {
        return u == UnitSystem.SI ? g(kgs * 3600) + " kg/h" : g(Units.fromSi(kgs, Dimension.MASS_FLOW, "lb/h")) + " lb/h";
    }

    static String power(double w, UnitSystem u) {
        return u == UnitSystem.SI ? g(w / 1e3) + " kW" : g(Units.fromSi(w, Dimension.POWER, "btu/h")) + " Btu/h";
    }

    static String area(double m2, UnitSystem u) {
        return u == UnitSystem.SI ? g(m2 * 1e6) + " mm2" : g(Units.fromSi(m2, Dimension.AREA, "in2")) + " in2";
    }

    // ------------------------------------------------------------------------------ export

    private Node export() {
        Forms f = new Forms(vm);
        ChoiceBox<UnitSystem> units = new ChoiceBox<>();
        units.getItems().setAll(UnitSystem.values());
        units.setValue(UnitSystem.SI);
        ChoiceBox<CalculationSheet.PageSize> page = new ChoiceBox<>();
        page.getItems().setAll(CalculationSheet.PageSize.values());
        page.setValue(CalculationSheet.PageSize.A4);
        Button write = new Button(Messages.get("export.write"));
        write.setId("write-sheet");
        Label status = new Label();
        status.setId("export-status");
        status.setWrapText(true);
        HBox row1 = new HBox(10, new Label(Messages.get("export.units")), units, new Label(Messages.get("export.page")),
                page);
        row1.setAlignment(Pos.CENTER_LEFT);
        f.span(row1);
        f.span(write);
        f.span(status);
        Optional<ValidatedCase> kase = vm.validated();
        if (kase.isEmpty()) {
            write.setDisable(true);
            status.setText(Messages.get("results.blocked"));
        }
        write.setOnAction(e -> sheetTarget.apply(vm.valueAt("$.identity.tag").replaceAll("[^A-Za-z0-9_-]", "_")
                + "-relief-basis.pdf").ifPresent(target -> writeSheet(kase.get(), target, units.getValue(),
                page.getValue(), status)));
        VBox box = new VBox(16, f.grid(), cautions());
        box.setPadding(new Insets(0));
        return box;
    }

    /** Writes the sheet off the application thread; reports in {@code status}. */
    void writeSheet(ValidatedCase kase, Path target, UnitSystem u, CalculationSheet.PageSize size, Label status) {
        status.setText(Messages.get("results.running"));
        Task<SheetOutcome> task = new Task<>() {
            @Override
            protected SheetOutcome call() throws Exception {
                SheetOutcome o = vm.sheet(kase, u, Texts.version());
                if (o.model().isPresent()) {
                    CalculationSheet.write(o.model().get(), target, size);
                }
                return o;
            }
        };
        task.setOnSucceeded(x -> {
            SheetOutcome o = task.getValue();
            status.setText(o.model().isPresent() ? Messages.get("export.done", target)
                    : Messages.get("export.none", o.reason()));
        });
        task.setOnFailed(x -> status.setText(Messages.get("export.failed", String.valueOf(task.getException()))));
        worker.submit(task);
    }

    static List<String> templates() {
        return Templates.CASES;
    }
}
