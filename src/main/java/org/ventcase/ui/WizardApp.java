package org.ventcase.ui;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ChoiceDialog;
import javafx.scene.control.Hyperlink;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextArea;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import javafx.util.Duration;

import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.Problem;
import org.ventcase.casefile.Templates;
import org.ventcase.app.CaseRunner;

/**
 * The wizard's window: start screen, step list, the current step, navigation, menus, the
 * unsaved-changes guard, the autosave timer and the About box. Bindings and wiring only.
 */
public final class WizardApp extends Application {

    /** Seconds between autosave copies. */
    static final int AUTOSAVE_SECONDS = 30;

    /** Launch argument that opens the built-in demo case ({@link WizardLauncher#launchDemo}). */
    static final String DEMO_ARG = "--demo";

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "ventcase-calc");
        t.setDaemon(true);
        return t;
    });
    private final WizardViewModel vm = new WizardViewModel(CaseRunner.standard(), UserFiles.standard(),
            LiveCalculation.Env.fx(worker), LiveCalculation.DEBOUNCE_MS);
    private Stage stage;
    private final BorderPane root = new BorderPane();
    private final BorderPane body = new BorderPane();
    private final VBox stepList = new VBox(2);
    private final Label statusLabel = new Label();
    private StepViews steps;
    private boolean started;
    /** True while the review or audit screen is shown (the wizard's keys are off). */
    private boolean reviewing;
    private final ReviewViewModel review = new ReviewViewModel(new org.ventcase.app.ReviewRunner(),
            LiveCalculation.Env.fx(worker), this::openCase, LiveCalculation.DEBOUNCE_MS);
    private ReviewView reviewView;
    private final AuditViewModel audit = new AuditViewModel(new org.ventcase.app.AuditRunner(),
            LiveCalculation.Env.fx(worker), Math.max(1, Runtime.getRuntime().availableProcessors() - 1));
    private AuditView auditView;

    /** The view-model (for tests driving the window). */
    public WizardViewModel viewModel() {
        return vm;
    }

    /** The step views (for tests driving the window). */
    StepViews steps() {
        return steps;
    }

    /** The audit mode's view-model (for tests driving the window). */
    public AuditViewModel auditModel() {
        return audit;
    }

    /** The review mode's view-model (for tests driving the window). */
    public ReviewViewModel reviewModel() {
        return review;
    }

    private static volatile WizardApp current;

    /** The window (for tests). */
    Stage stage() {
        return stage;
    }

    /** The running app, for tests. */
    public static WizardApp current() {
        return current;
    }

    @Override
    public void start(Stage s) {
        current = this;
        stage = s;
        steps = new StepViews(vm, worker, () -> stage);
        root.setTop(menus());
        root.setCenter(startScreen());
        Scene scene = new Scene(root, 1180, 800);
        scene.getStylesheets().add(WizardApp.class.getResource("wizard.css").toExternalForm());
        scene.addEventFilter(KeyEvent.KEY_PRESSED, this::keys);
        s.setScene(scene);
        s.setTitle(Messages.get("app.title"));
        s.setOnCloseRequest(e -> {
            if (!confirmDiscard()) {
                e.consume();
            } else {
                vm.discardAutosave();
            }
        });
        vm.step().addListener((o, a, b) -> showStep());
        vm.structure().addListener((o, a, b) -> Platform.runLater(this::showStep));
        vm.dirty().addListener((o, a, b) -> updateStatus());
        vm.file().addListener((o, a, b) -> updateStatus());
        vm.problems().addListener((javafx.collections.ListChangeListener<Problem>) c -> updateStepList());
        Timeline autosave = new Timeline(new KeyFrame(Duration.seconds(AUTOSAVE_SECONDS), e -> {
            try {
                vm.autosave().ifPresent(p -> statusLabel.setText(statusText() + "  (" + Messages.get("status.autosaved",
                        java.time.LocalTime.now().withNano(0)) + ")"));
            } catch (RuntimeException ex) {
                statusLabel.setText(statusText() + "  (autosave failed: " + ex.getMessage() + ")");
            }
        }));
        autosave.setCycleCount(Timeline.INDEFINITE);
        autosave.play();
        s.show();
        if (getParameters() != null && getParameters().getRaw().contains(DEMO_ARG)) {
            openBuiltInDemo();
        }
    }

    @Override
    public void stop() {
        worker.shutdownNow();
    }

    // ------------------------------------------------------------------------------ start screen

    private Node startScreen() {
        started = false;
        VBox box = new VBox(14);
        box.getStyleClass().add("start");
        box.setPadding(new Insets(40, 60, 40, 60));
        Label title = new Label(Messages.get("app.title"));
        title.getStyleClass().add("start-title");
        Label tag = new Label(Messages.get("app.tagline"));
        tag.getStyleClass().add("hint");
        Label h = new Label(Messages.get("start.heading"));
        h.getStyleClass().add("form-heading");
        Button blank = startButton("start.new", "start-new", () -> {
            vm.newCase();
            enterWizard();
        });
        Button template = startButton("start.template", "start-template", () -> {
            ChoiceDialog<String> d = new ChoiceDialog<>(Templates.CASES.get(0), Templates.CASES);
            d.initOwner(stage);
            d.setHeaderText(Messages.get("start.template.prompt"));
            d.showAndWait().ifPresent(n -> {
                vm.newFromTemplate(n);
                enterWizard();
            });
        });
        Button open = startButton("start.open", "start-open", this::openDialog);
        Button demo = startButton("start.demo", "start-demo", this::openDemo);
        Button rev = startButton("start.review", "start-review", this::showReview);
        Button aud = startButton("start.audit", "start-audit", this::showAudit);
        VBox actions = new VBox(8, blank, template, open, demo, rev, aud);
        VBox recent = new VBox(4);
        Label rh = new Label(Messages.get("start.recent"));
        rh.getStyleClass().add("form-heading");
        recent.getChildren().add(rh);
        List<Path> rec = vm.files().recent();
        if (rec.isEmpty()) {
            recent.getChildren().add(new Label(Messages.get("start.recent.none")));
        }
        for (Path p : rec) {
            Hyperlink l = new Hyperlink(p.getFileName() + "   " + p.getParent());
            l.setOnAction(e -> open(p));
            recent.getChildren().add(l);
        }
        List<Path> auto = vm.files().autosaves();
        if (!auto.isEmpty()) {
            Label ah = new Label(Messages.get("start.recover"));
            ah.getStyleClass().add("form-heading");
            recent.getChildren().addAll(ah, new Label(Messages.get("start.recover.hint")));
            for (Path p : auto) {
                Hyperlink l = new Hyperlink(p.getFileName().toString());
                l.setOnAction(e -> {
                    try {
                        vm.openUnsaved(Files.readString(p), p.getFileName().toString(), true);
                        vm.files().deleteAutosave(p);
                        enterWizard();
                    } catch (IOException | RuntimeException ex) {
                        error(Messages.get("dialog.open.failed"), ex.getMessage());
                    }
                });
                recent.getChildren().add(l);
            }
        }
        HBox columns = new HBox(60, actions, recent);
        Label deferral = new Label(Texts.deferral("each vessel", "(shown on each sheet)"));
        deferral.setWrapText(true);
        deferral.getStyleClass().add("start-deferral");
        deferral.setMaxWidth(820);
        box.getChildren().addAll(title, tag, h, columns, deferral);
        return box;
    }

    private Button startButton(String key, String id, Runnable r) {
        Button b = new Button(Messages.get(key));
        b.setId(id);
        b.getStyleClass().add("start-button");
        b.setMaxWidth(Double.MAX_VALUE);
        b.setPrefWidth(260);
        b.setOnAction(e -> r.run());
        return b;
    }

    private void openDemo() {
        ChoiceDialog<String> d = new ChoiceDialog<>(Demos.BUILT_IN, Demos.ALL);
        d.initOwner(stage);
        d.setHeaderText(Messages.plain("start.demo"));
        d.showAndWait().ifPresent(n -> {
            try {
                vm.openUnsaved(Demos.json(n), n, false);
                enterWizard();
            } catch (RuntimeException ex) {
                error(Messages.get("dialog.open.failed"), ex.getMessage());
            }
        });
    }

    /**
     * Opens the built-in demo case on its results step, computing them ({@code ventcase demo}; also
     * used by tests).
     */
    public void openBuiltInDemo() {
        vm.openUnsaved(Demos.json(Demos.BUILT_IN), Demos.BUILT_IN, false);
        enterWizard();
        vm.goTo(Step.RESULTS);
    }

    // ------------------------------------------------------------------------------ review mode

    /** The case open in the wizard, for claimed values that name none (none from the start screen). */
    private org.ventcase.app.ReviewRunner.OpenCase openCase() {
        Path f = vm.file().get();
        String name = f == null ? vm.title() : f.getFileName().toString();
        return new org.ventcase.app.ReviewRunner.OpenCase(started ? vm.validated() : Optional.empty(), name);
    }

    /** Shows the review screen (start screen button, File menu; also used by tests). */
    public void showReview() {
        disposeModes();
        reviewing = true;
        reviewView = new ReviewView(review, () -> stage, this::closeReview);
        root.setLeft(null);
        root.setCenter(reviewView.build());
        stage.setTitle(Messages.get("review.title") + " - " + Messages.get("app.title"));
    }

    /** Shows the audit screen (start screen button, File menu; also used by tests). */
    public void showAudit() {
        disposeModes();
        reviewing = true;
        auditView = new AuditView(audit, () -> stage, this::closeReview);
        root.setLeft(null);
        root.setCenter(auditView.build());
        stage.setTitle(Messages.get("audit.title") + " - " + Messages.get("app.title"));
    }

    /** Removes the review and audit screens' listeners. */
    private void disposeModes() {
        if (reviewView != null) {
            reviewView.dispose();
            reviewView = null;
        }
        if (auditView != null) {
            auditView.dispose();
            auditView = null;
        }
    }

    /** Leaves the review or audit screen for the case (when one is open) or the start screen. */
    void closeReview() {
        disposeModes();
        reviewing = false;
        if (started) {
            enterWizard();
        } else {
            root.setCenter(startScreen());
            stage.setTitle(Messages.get("app.title"));
        }
    }

    // ------------------------------------------------------------------------------ wizard shell

    /** Shows the steps after a case was opened or created. */
    void enterWizard() {
        disposeModes();
        reviewing = false;
        started = true;
        stepList.getStyleClass().setAll("step-list");
        stepList.setPrefWidth(210);
        root.setLeft(stepList);
        root.setCenter(body);
        body.setBottom(navBar());
        showStep();
        updateStatus();
    }

    private Node navBar() {
        Button back = new Button(Messages.get("nav.back"));
        back.setId("back");
        back.setOnAction(e -> vm.back());
        back.disableProperty().bind(vm.step().isEqualTo(Step.IDENTITY));
        Button next = new Button(Messages.get("nav.next"));
        next.setId("next");
        next.getStyleClass().add("primary");
        next.setDefaultButton(false);
        next.setOnAction(e -> vm.next());
        next.disableProperty().bind(vm.canAdvance().not());
        statusLabel.setId("status");
        Label liveLabel = new Label();
        liveLabel.setId("live-result");
        liveLabel.getStyleClass().add("live-result");
        Runnable live = () -> liveLabel.setText(liveText());
        vm.live().state().addListener(o -> live.run());
        vm.live().progress().addListener(o -> live.run());
        live.run();
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox bar = new HBox(10, statusLabel, gap, liveLabel, back, next);
        bar.getStyleClass().add("nav-bar");
        bar.setAlignment(Pos.CENTER_LEFT);
        return bar;
    }

    private void showStep() {
        if (!started) {
            return;
        }
        Step s = vm.step().get();
        VBox page = new VBox(10);
        page.getStyleClass().add("page");
        Label h = new Label((s.ordinal() + 1) + ". " + Messages.plain(s.key()));
        h.getStyleClass().add("page-title");
        Label intro = new Label(Messages.get(s.key() + ".intro"));
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");
        page.getChildren().addAll(h, intro);
        Node content = steps.build(s);
        VBox banner = new VBox(3);
        banner.setId("step-problems");
        banner.getStyleClass().add("banner");
        Runnable fill = () -> fillBanner(banner, s);
        fill.run();
        vm.problems().addListener((javafx.collections.ListChangeListener<Problem>) c -> {
            if (vm.step().get() == s) {
                fill.run();
            }
        });
        page.getChildren().addAll(banner, content);
        ScrollPane sp = new ScrollPane(page);
        sp.setFitToWidth(true);
        sp.getStyleClass().add("page-scroll");
        body.setCenter(sp);
        updateStepList();
        updateStatus();
        Platform.runLater(() -> {
            Node first = page.lookup(".text-field, .combo-box, .button");
            if (first != null) {
                first.requestFocus();
            }
        });
    }

    private void fillBanner(VBox banner, Step s) {
        banner.getChildren().clear();
        if (!s.editing()) {
            banner.setVisible(false);
            banner.setManaged(false);
            return;
        }
        List<Problem> all = vm.stepProblems(s);
        List<Problem> unplaced = vm.unplacedProblems(s);
        if (!all.isEmpty()) {
            Label l = new Label(Messages.get("nav.blocked", all.size() == 1 ? Messages.get("nav.problem.one")
                    : Messages.get("nav.problem.many", all.size())));
            l.getStyleClass().add("banner-error");
            banner.getChildren().add(l);
            for (Problem p : unplaced) {
                Label pl = new Label(p.path().replaceFirst("^\\$\\.", "") + ": " + WizardViewModel.describe(p));
                pl.setWrapText(true);
                pl.getStyleClass().add("field-message");
                banner.getChildren().add(pl);
            }
        }
        banner.setVisible(!banner.getChildren().isEmpty());
        banner.setManaged(!banner.getChildren().isEmpty());
    }

    private void updateStepList() {
        if (!started) {
            return;
        }
        stepList.getChildren().clear();
        for (Step s : Step.values()) {
            boolean problems = s.editing() && !vm.stepProblems(s).isEmpty();
            Button b = new Button((s.ordinal() + 1) + "  " + Messages.plain(s.key()) + (problems ? "  \u2022" : ""));
            b.getStyleClass().add("step-item");
            if (s == vm.step().get()) {
                b.getStyleClass().add("current");
            }
            if (problems) {
                b.getStyleClass().add("has-problems");
            }
            b.setMaxWidth(Double.MAX_VALUE);
            b.setAlignment(Pos.CENTER_LEFT);
            b.setFocusTraversable(false);
            b.setDisable(!vm.reachable(s));
            b.setOnAction(e -> vm.goTo(s));
            stepList.getChildren().add(b);
        }
    }

    /** The live result in one line for the navigation bar, so that edits on any step show their effect. */
    private String liveText() {
        LiveCalculation l = vm.live();
        return switch (l.state().get()) {
            case IDLE -> "";
            case WAITING -> Messages.get("live.waiting");
            case RUNNING -> Messages.get("live.running", Math.round(100 * Math.max(0, l.progress().get())));
            case INVALID -> Messages.get("live.invalid");
            case CANCELLED, FAILED -> Messages.get("live.stopped");
            case CURRENT -> l.summary().get().flatMap(s -> s.governingRow()).map(g -> Messages.get("live.current",
                    g.orifice().orElse(Messages.get("results.notComputed")), g.label()))
                    .orElse(Messages.get("live.none"));
        };
    }

    private String statusText() {
        Path f = vm.file().get();
        String name = f == null ? "untitled" : f.toString();
        return name + "  -  " + (vm.dirty().get() ? Messages.get("status.unsaved")
                : f == null ? Messages.get("status.new") : Messages.get("status.saved"));
    }

    private void updateStatus() {
        statusLabel.setText(statusText());
        if (stage != null) {
            stage.setTitle(vm.title());
        }
    }

    private void keys(KeyEvent e) {
        if (!started || reviewing) {
            return;
        }
        if (new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN).match(e)) {
            vm.undo();
            e.consume();
        } else if (new KeyCodeCombination(KeyCode.Y, KeyCombination.SHORTCUT_DOWN).match(e)
                || new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN).match(e)) {
            vm.redo();
            e.consume();
        } else if (e.getCode() == KeyCode.ENTER && !e.isShortcutDown()
                && !(e.getTarget() instanceof Button) && !(e.getTarget() instanceof TextArea)
                && !(e.getTarget() instanceof javafx.scene.control.ComboBox<?> c && c.isShowing())) {
            if (vm.next()) {
                e.consume();
            }
        }
    }

    // ------------------------------------------------------------------------------ menus and files

    private MenuBar menus() {
        MenuItem nw = item("menu.file.new", new KeyCodeCombination(KeyCode.N, KeyCombination.SHORTCUT_DOWN), () -> {
            if (confirmDiscard()) {
                vm.newCase();
                enterWizard();
            }
        });
        MenuItem op = item("menu.file.open", new KeyCodeCombination(KeyCode.O, KeyCombination.SHORTCUT_DOWN),
                this::openDialog);
        MenuItem sv = item("menu.file.save", new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN),
                this::save);
        MenuItem sa = item("menu.file.saveAs", new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN,
                KeyCombination.SHIFT_DOWN), this::saveAs);
        MenuItem rv = item("menu.file.review", null, this::showReview);
        MenuItem au = item("menu.file.audit", null, this::showAudit);
        MenuItem st = item("menu.file.start", null, () -> {
            if (confirmDiscard()) {
                vm.discardAutosave();
                disposeModes();
                reviewing = false;
                root.setLeft(null);
                root.setCenter(startScreen());
            }
        });
        MenuItem ex = item("menu.file.exit", null, () -> {
            if (confirmDiscard()) {
                vm.discardAutosave();
                Platform.exit();
            }
        });
        Menu file = new Menu(Messages.get("menu.file"), null, nw, op, sv, sa, rv, au, st, ex);
        MenuItem un = item("menu.edit.undo", null, vm::undo);
        un.disableProperty().bind(vm.canUndo().not());
        MenuItem re = item("menu.edit.redo", null, vm::redo);
        re.disableProperty().bind(vm.canRedo().not());
        Menu edit = new Menu(Messages.get("menu.edit"), null, un, re);
        Menu help = new Menu(Messages.get("menu.help"), null, item("menu.help.about", null, this::about));
        return new MenuBar(file, edit, help);
    }

    private static MenuItem item(String key, KeyCombination acc, Runnable r) {
        MenuItem i = new MenuItem(Messages.get(key));
        if (acc != null) {
            i.setAccelerator(acc);
        }
        i.setOnAction(e -> r.run());
        return i;
    }

    private void openDialog() {
        if (!confirmDiscard()) {
            return;
        }
        FileChooser fc = new FileChooser();
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Ventcase case (*.json)", "*.json"));
        File f = fc.showOpenDialog(stage);
        if (f != null) {
            open(f.toPath());
        }
    }

    /** Opens a case file and shows its first step (also used by tests). */
    public void open(Path p) {
        try {
            vm.open(p);
            enterWizard();
        } catch (CaseValidationException e) {
            error(Messages.get("dialog.open.failed"), e.getMessage());
        } catch (RuntimeException e) {
            error(Messages.get("dialog.open.failed"), String.valueOf(e.getMessage()));
        }
    }

    private boolean save() {
        if (vm.file().get() == null) {
            return saveAs();
        }
        return saveTo(vm.file().get());
    }

    private boolean saveAs() {
        FileChooser fc = new FileChooser();
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Ventcase case (*.json)", "*.json"));
        String tag = vm.valueAt("$.identity.tag");
        fc.setInitialFileName((tag.isBlank() ? "case" : tag.replaceAll("[^A-Za-z0-9_-]", "_")) + ".json");
        File f = fc.showSaveDialog(stage);
        return f != null && saveTo(f.toPath());
    }

    /** Saves to {@code p}; shows an error and returns false when it cannot (also used by tests). */
    public boolean saveTo(Path p) {
        try {
            vm.saveAs(p);
            updateStatus();
            return true;
        } catch (CaseValidationException e) {
            error(Messages.get("dialog.save.failed"), Messages.get("dialog.save.structure", e.getMessage()));
        } catch (RuntimeException e) {
            error(Messages.get("dialog.save.failed"), String.valueOf(e.getMessage()));
        }
        return false;
    }

    /** True when there is nothing unsaved, or the person saved or chose to discard it. */
    private boolean confirmDiscard() {
        if (!vm.dirty().get()) {
            return true;
        }
        ButtonType save = new ButtonType(Messages.get("dialog.unsaved.save"), ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType(Messages.get("dialog.unsaved.discard"), ButtonBar.ButtonData.NO);
        ButtonType cancel = new ButtonType(Messages.get("dialog.unsaved.cancel"), ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, Messages.get("dialog.unsaved.text"), save, discard, cancel);
        a.initOwner(stage);
        a.setTitle(Messages.get("dialog.unsaved.title"));
        a.setHeaderText(null);
        Optional<ButtonType> r = a.showAndWait();
        if (r.isEmpty() || r.get() == cancel) {
            return false;
        }
        return r.get() != save || save();
    }

    private void error(String header, String text) {
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.initOwner(stage);
        a.setTitle(Messages.get("dialog.error.title"));
        a.setHeaderText(header);
        TextArea t = new TextArea(text);
        t.setEditable(false);
        t.setWrapText(true);
        a.getDialogPane().setContent(t);
        a.show();
    }

    private void about() {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(stage);
        a.setTitle(Messages.get("about.title"));
        a.setHeaderText("Ventcase " + Messages.get("about.version", Texts.version()) + "\n" + Messages.get("app.tagline"));
        Label d = new Label(Texts.deferral("each vessel", "(printed on each sheet)"));
        d.setWrapText(true);
        Label c = new Label(Texts.cautions());
        c.setWrapText(true);
        Label h = new Label(Messages.get("results.cautions"));
        h.getStyleClass().add("form-heading");
        VBox v = new VBox(10, d, h, c);
        v.setId("about-text");
        v.setPrefWidth(620);
        ScrollPane sp = new ScrollPane(v);
        sp.setFitToWidth(true);
        sp.setPrefHeight(420);
        a.getDialogPane().setContent(sp);
        a.getDialogPane().getStylesheets().add(WizardApp.class.getResource("wizard.css").toExternalForm());
        a.show();
    }
}
