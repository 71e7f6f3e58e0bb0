package org.ventcase.ui;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import org.ventcase.casefile.Case;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.Problem;
import org.ventcase.casefile.ScenarioType;
import org.ventcase.casefile.Templates;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.casefile.ValidationReport;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.report.UnitSystem;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.app.CaseRunner;
import org.ventcase.app.CaseSummary;
import org.ventcase.app.SheetOutcome;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;

/**
 * State, validation and actions of the case wizard. Holds the case being edited as a
 * {@link DraftCase}; each input is a {@link FieldModel} addressed by its case-file path, and its
 * message is the case validator's problem at that path, so the wizard and {@code ventcase check}
 * say the same thing. Navigation is blocked only by problems on the current step; warnings never
 * block. Edits are undoable. Calculations are not done here: every change goes to the
 * {@link LiveCalculation}, which hands the validated case to the {@link CaseRunner} off the
 * application thread once the edits pause, and {@link #sheet} does the same for the PDF sheet.
 * Usable without a window (tests build one directly).
 */
public final class WizardViewModel {

    /** Time within which successive keystrokes in one field are one undo step, ms. */
    static final long COALESCE_MS = 1500;

    private final CaseRunner runner;
    private final UserFiles files;
    private DraftCase draft = DraftCase.empty();
    private final Map<String, FieldModel> fields = new LinkedHashMap<>();
    private final Deque<String> undo = new ArrayDeque<>();
    private final Deque<String> redo = new ArrayDeque<>();
    private String lastEditPath = "";
    private long lastEditMs;
    private boolean refreshing;
    private String savedJson = draft.json();
    private final String session = "autosave-" + LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss"))
            + ".json";
    private Optional<Path> autosavePath = Optional.empty();

    private final ObjectProperty<Step> step = new SimpleObjectProperty<>(this, "step", Step.IDENTITY);
    private final ObservableList<Problem> problems = FXCollections.observableArrayList();
    private final ObservableList<String> warnings = FXCollections.observableArrayList();
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>(this, "file");
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty");
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo");
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper(this, "canRedo");
    private final IntegerProperty structure = new SimpleIntegerProperty(this, "structure");
    private final StringProperty compositionSum = new SimpleStringProperty(this, "compositionSum", "");
    private final BooleanProperty compositionOk = new SimpleBooleanProperty(this, "compositionOk");
    private final LiveCalculation live;
    private final BooleanBinding canAdvance;

    /** A view-model whose results are not recalculated live (tests that do not look at results). */
    public WizardViewModel(CaseRunner runner, UserFiles files) {
        this(runner, files, LiveCalculation.Env.off(), LiveCalculation.DEBOUNCE_MS);
    }

    /**
     * A view-model whose results follow the case: recomputed by {@code runner} in {@code env}'s
     * background, {@code debounceMs} after the last edit.
     */
    public WizardViewModel(CaseRunner runner, UserFiles files, LiveCalculation.Env env, long debounceMs) {
        this.runner = runner;
        this.files = files;
        this.live = new LiveCalculation(runner, env, this::validated, debounceMs);
        canAdvance = Bindings.createBooleanBinding(() -> step.get() != Step.EXPORT
                && stepProblems(step.get()).isEmpty(), step, problems);
        revalidate();
    }

    // ------------------------------------------------------------------------------ documents

    /** Starts an empty case (today's date filled in). */
    public void newCase() {
        DraftCase d = DraftCase.empty();
        d.setText("$.identity.date", LocalDate.now().toString());
        d.setText("$.identity.revision", "A");
        d.setText("$.identity.checker", "");
        // the defaults a new case starts from (the ones a case file must name explicitly)
        d.setText("$.fluid.eos", org.ventcase.thermo.EosVariant.DEFAULT.id());
        d.setText("$.fluid.densityBasis", org.ventcase.thermo.DensityBasis.TRANSLATED.label());
        load(d, null);
    }

    /** Starts a case from a starter template, not yet saved. */
    public void newFromTemplate(String name) {
        String json = Templates.caseJson(name).orElseThrow(() -> new IllegalArgumentException("no template " + name));
        load(DraftCase.of(CaseFiles.read(json, name + ".json")), null);
    }

    /** Opens a case file (older layouts are migrated; structural problems throw). */
    public void open(Path p) {
        Case c = CaseFiles.read(p);
        load(DraftCase.of(c), p);
        files.addRecent(p);
    }

    /**
     * Opens case JSON that has no file yet (a demo, or a recovered autosave copy, which counts as
     * unsaved work: {@code unsaved} true).
     */
    public void openUnsaved(String json, String origin, boolean unsaved) {
        DraftCase d;
        try {
            d = DraftCase.of(CaseFiles.read(json, origin));
        } catch (RuntimeException e) {
            d = DraftCase.fromJson(json);
        }
        load(d, null);
        if (unsaved) {
            savedJson = "";
            dirty.set(true);
        }
    }

    private void load(DraftCase d, Path p) {
        draft = d;
        undo.clear();
        redo.clear();
        file.set(p);
        savedJson = d.json();
        fields.clear();
        step.set(Step.IDENTITY);
        afterChange(true, false);
        live.loaded();
    }

    /** Saves to the current file; false when there is none yet (ask for one and call {@link #saveAs}). */
    public boolean save() {
        if (file.get() == null) {
            return false;
        }
        saveAs(file.get());
        return true;
    }

    /**
     * Writes the case atomically to {@code p} and makes it the current file.
     *
     * @throws org.ventcase.casefile.CaseValidationException when the draft does not bind to a case
     */
    public void saveAs(Path p) {
        Case c = draft.toCase();
        CaseFiles.write(c, p);
        file.set(p);
        savedJson = draft.json();
        dirty.set(false);
        files.addRecent(p);
        discardAutosave();
    }

    /** Writes an autosave copy when there are unsaved changes; returns where, if written. */
    public Optional<Path> autosave() {
        if (!dirty.get()) {
            return Optional.empty();
        }
        autosavePath = Optional.of(files.autosave(session, draft.json()));
        return autosavePath;
    }

    /** Removes this session's autosave copy (after a save, or a close that saved or discarded). */
    public void discardAutosave() {
        autosavePath.ifPresent(files::deleteAutosave);
        autosavePath = Optional.empty();
    }

    public UserFiles files() {
        return files;
    }

    /** The case as it would be written now (JSON text), for tests and the autosave copy. */
    public String caseJson() {
        return CaseFiles.toJson(draft.toCase());
    }

    // ------------------------------------------------------------------------------ fields

    /** A text or quantity field. */
    public FieldModel text(String path) {
        return field(path, FieldModel.Kind.TEXT, null, List.of());
    }

    /** A quantity field with a unit chooser. */
    public FieldModel quantity(String path, Dimension d) {
        return field(path, FieldModel.Kind.TEXT, d, List.of());
    }

    /** A choice field (the choices are the case file's keys). */
    public FieldModel choice(String path, List<String> choices) {
        return field(path, FieldModel.Kind.TEXT, null, choices);
    }

    /** A number field. */
    public FieldModel number(String path) {
        return field(path, FieldModel.Kind.NUMBER, null, List.of());
    }

    /** A yes/no field ("true"/"false"; "" when left out). */
    public FieldModel bool(String path) {
        return field(path, FieldModel.Kind.BOOL, null, List.of());
    }

    private FieldModel field(String path, FieldModel.Kind kind, Dimension d, List<String> choices) {
        FieldModel f = fields.get(path);
        if (f != null) {
            return f;
        }
        FieldModel nf = new FieldModel(path, kind, d, choices);
        nf.text().set(draft.text(path));
        nf.text().addListener((o, a, b) -> {
            if (!refreshing) {
                edit(nf, b);
            }
        });
        fields.put(path, nf);
        updateMessage(nf);
        return nf;
    }

    private void edit(FieldModel f, String value) {
        long now = System.currentTimeMillis();
        if (!f.path().equals(lastEditPath) || now - lastEditMs > COALESCE_MS) {
            pushUndo();
        }
        lastEditPath = f.path();
        lastEditMs = now;
        String v = value == null ? "" : value;
        f.setLocalError("");
        boolean pruned = false;
        switch (f.kind()) {
            case NUMBER -> {
                if (v.isBlank()) {
                    draft.setNumber(f.path(), null);
                } else {
                    try {
                        draft.setNumber(f.path(), Double.parseDouble(v.trim()));
                    } catch (NumberFormatException e) {
                        draft.setNumber(f.path(), null);
                        f.setLocalError(Messages.get("field.number"));
                    }
                }
            }
            case BOOL -> draft.setBool(f.path(), v.isBlank() ? null : Boolean.valueOf(v.trim()));
            default -> {
                draft.setText(f.path(), v);
                pruned = prune(f.path()) || f.path().endsWith(".type") || f.path().equals("$.storage.mode")
                        || f.path().equals("$.vessel.shape");
            }
        }
        redo.clear();
        afterChange(pruned);
    }

    /** Removes fields that the new value of a type or mode makes meaningless; true when any went. */
    private boolean prune(String path) {
        boolean any = false;
        if (path.matches("\\$\\.scenarios\\[\\d+]\\.type")) {
            String base = path.substring(0, path.length() - ".type".length());
            Optional<ScenarioType> t = ScenarioType.byKey(draft.text(path));
            for (String k : List.of("fireFighting", "environmentFactor", "insulationCredit", "wallTemperature", "inflow",
                    "inflowPhase", "heatInput", "blockedInVolume")) {
                if (t.isEmpty() || !t.get().fields().contains(k)) {
                    any |= draft.node(base + "." + k).isPresent();
                    draft.remove(base + "." + k);
                }
            }
        } else if (path.equals("$.storage.mode")) {
            String m = draft.text(path);
            if (m.equals("saturated")) {
                any |= draft.node("$.storage.pressure").isPresent();
                draft.remove("$.storage.pressure");
            }
            if (!m.equals("specified")) {
                any |= draft.node("$.storage.vapourComposition").isPresent();
                draft.remove("$.storage.vapourComposition");
            }
        } else if (path.equals("$.vessel.shape") && draft.text(path).equals("sphere")) {
            for (String k : List.of("tangentLength", "heads", "secondHead")) {
                any |= draft.node("$.vessel." + k).isPresent();
                draft.remove("$.vessel." + k);
            }
        }
        return any;
    }

    /** Sets a field's text as a person typing would (for actions such as the unit chooser). */
    public void set(String path, String value) {
        FieldModel f = fields.get(path);
        if (f != null) {
            f.text().set(value);
        } else {
            pushUndo();
            draft.setText(path, value);
            redo.clear();
            afterChange(prune(path));
        }
    }

    // ------------------------------------------------------------------------------ lists

    /** Number of components in the composition. */
    public int componentCount() {
        return draft.size("$.fluid.components");
    }

    public void addComponent() {
        structural(() -> draft.append("$.fluid.components"));
    }

    public void removeComponent(int i) {
        structural(() -> draft.removeAt("$.fluid.components", i));
    }

    public int scenarioCount() {
        return draft.size("$.scenarios");
    }

    /** Adds a scenario of the given type; returns its index. */
    public int addScenario(ScenarioType type) {
        int[] idx = new int[1];
        structural(() -> {
            idx[0] = draft.append("$.scenarios");
            draft.setText("$.scenarios[" + idx[0] + "].type", type.key());
        });
        return idx[0];
    }

    public void removeScenario(int i) {
        structural(() -> draft.removeAt("$.scenarios", i));
    }

    private void structural(Runnable r) {
        pushUndo();
        lastEditPath = "";
        r.run();
        redo.clear();
        afterChange(true);
    }

    // ------------------------------------------------------------------------------ undo

    private void pushUndo() {
        undo.push(draft.json());
        canUndo.set(true);
    }

    public void undo() {
        if (undo.isEmpty()) {
            return;
        }
        redo.push(draft.json());
        draft.restore(undo.pop());
        lastEditPath = "";
        afterChange(true);
    }

    public void redo() {
        if (redo.isEmpty()) {
            return;
        }
        undo.push(draft.json());
        draft.restore(redo.pop());
        lastEditPath = "";
        afterChange(true);
    }

    private void afterChange(boolean structural) {
        afterChange(structural, true);
    }

    private void afterChange(boolean structural, boolean recalculate) {
        canUndo.set(!undo.isEmpty());
        canRedo.set(!redo.isEmpty());
        if (structural) {
            // array paths may now name other elements: drop their models, refresh the rest
            fields.keySet().removeIf(p -> p.contains("["));
            refreshing = true;
            try {
                for (FieldModel f : fields.values()) {
                    f.setLocalError("");
                    f.text().set(draft.text(f.path()));
                }
            } finally {
                refreshing = false;
            }
            structure.set(structure.get() + 1);
        }
        dirty.set(!draft.json().equals(savedJson));
        revalidate();
        if (recalculate) {
            live.changed();
        }
    }

    // ------------------------------------------------------------------------------ validation

    private void revalidate() {
        ValidationReport r = draft.check("wizard");
        problems.setAll(r.problems());
        warnings.setAll(r.warnings());
        for (FieldModel f : fields.values()) {
            updateMessage(f);
        }
        double sum = 0;
        int n = componentCount();
        for (int i = 0; i < n; i++) {
            String t = draft.text("$.fluid.components[" + i + "].moleFraction");
            try {
                sum += t.isBlank() ? 0 : Double.parseDouble(t);
            } catch (NumberFormatException e) {
                // the field shows its own message
            }
        }
        String s = String.format(Locale.ROOT, "%.6f", sum);
        boolean ok = n > 0 && Math.abs(sum - 1) <= 1e-6;
        compositionOk.set(ok);
        compositionSum.set(ok ? Messages.get("fluid.sum.ok", s) : Messages.get("fluid.sum", s));
    }

    private void updateMessage(FieldModel f) {
        if (!f.localError().isEmpty()) {
            f.setMessage(f.localError());
            return;
        }
        for (Problem p : problems) {
            if (p.path().equals(f.path())) {
                f.setMessage(describe(p));
                return;
            }
        }
        f.setMessage("");
    }

    /** A problem as one line for a person: what was wrong and what is accepted. */
    public static String describe(Problem p) {
        String accepted = onScreen(p.path(), p.accepted());
        return p.value() == null ? Messages.get("field.missing", accepted)
                : Messages.get("field.notAccepted", p.value(), accepted);
    }

    private static final java.util.regex.Pattern MEMBER = java.util.regex.Pattern.compile("\\b[a-z][A-Za-z]*\\b");

    /**
     * The validator names a section's members as the case file spells them ("expected the vessel:
     * shape, insideDiameter, ..."); on screen the fields carry labels ("Inside diameter"), so each
     * member name after the colon that has a field label under this path is replaced by the label.
     */
    static String onScreen(String path, String accepted) {
        int colon = accepted.indexOf(": ");
        if (colon < 0) {
            return accepted;
        }
        java.util.regex.Matcher m = MEMBER.matcher(accepted.substring(colon + 2));
        StringBuilder out = new StringBuilder(accepted.substring(0, colon + 2));
        while (m.find()) {
            String label = Messages.orElse("label." + Messages.fieldKey(path + "." + m.group()), m.group());
            m.appendReplacement(out, java.util.regex.Matcher.quoteReplacement(label));
        }
        m.appendTail(out);
        return out.toString();
    }

    /** Problems that stop the engineer leaving {@code s}. */
    public List<Problem> stepProblems(Step s) {
        List<Problem> out = new ArrayList<>();
        for (Problem p : problems) {
            if (s.owns(p.path())) {
                out.add(p);
            }
        }
        return out;
    }

    /** Problems of {@code s} that no field on screen shows (shown in a list at the head of the step). */
    public List<Problem> unplacedProblems(Step s) {
        List<Problem> out = new ArrayList<>();
        for (Problem p : stepProblems(s)) {
            if (!fields.containsKey(p.path())) {
                out.add(p);
            }
        }
        return out;
    }

    // ------------------------------------------------------------------------------ navigation

    public ObjectProperty<Step> step() {
        return step;
    }

    public BooleanBinding canAdvance() {
        return canAdvance;
    }

    /** Goes to the next step when the current one has no problems; returns whether it moved. */
    public boolean next() {
        if (!canAdvance.get()) {
            return false;
        }
        step.set(Step.values()[step.get().ordinal() + 1]);
        return true;
    }

    public boolean back() {
        if (step.get().ordinal() == 0) {
            return false;
        }
        step.set(Step.values()[step.get().ordinal() - 1]);
        return true;
    }

    /** True when {@code s} may be opened: a step already passed, or every step before it is free of problems. */
    public boolean reachable(Step s) {
        if (s.ordinal() <= step.get().ordinal()) {
            return true;
        }
        for (Step before : Step.values()) {
            if (before.ordinal() < s.ordinal() && !stepProblems(before).isEmpty()) {
                return false;
            }
        }
        return true;
    }

    public boolean goTo(Step s) {
        if (!reachable(s)) {
            return false;
        }
        step.set(s);
        return true;
    }

    // ------------------------------------------------------------------------------ helpers

    /** What the library says about a component query: the match, or suggestions. */
    public String componentInfo(String query) {
        if (query == null || query.isBlank()) {
            return "";
        }
        ComponentLibrary lib = ComponentLibrary.builtIn();
        Optional<Component> c = lib.find(query);
        if (c.isPresent()) {
            return Messages.get("fluid.found", c.get().name(), c.get().formula(), c.get().cas());
        }
        List<String> s = lib.suggestions(query, 5);
        return s.isEmpty() ? Messages.get("fluid.unknown.none") : Messages.get("fluid.unknown", String.join(", ", s));
    }

    /** Component names for the search box's suggestions. */
    public List<String> componentSuggestions(String query, int max) {
        return ComponentLibrary.builtIn().suggestions(query, max);
    }

    /** Units offered by the chooser of a quantity field (SI first, then US customary). */
    public static List<String> unitsFor(Dimension d) {
        List<String> want = switch (d) {
            case LENGTH -> List.of("m", "mm", "ft", "in");
            case TEMPERATURE -> List.of("C", "K", "F");
            case PRESSURE -> List.of("barg", "bara", "kPag", "kPaa", "MPag", "MPaa", "psig", "psia");
            case PRESSURE_DIFFERENCE -> List.of("bar", "kPa", "psi");
            case MASS_FLOW -> List.of("kg/h", "kg/s", "t/h", "lb/h");
            case POWER -> List.of("kW", "W", "MW", "Btu/h");
            case VOLUME -> List.of("m3", "l", "ft3", "gal");
            case THERMAL_CONDUCTIVITY -> List.of("W/mK", "Btu/h/ft/F");
            default -> List.of(Units.acceptedUnits(d).get(0));
        };
        return want;
    }

    /**
     * Rewrites a quantity field in another unit: the value converted when the text can be read,
     * otherwise the number kept and the unit replaced (or added).
     */
    public void convert(FieldModel f, String unit) {
        Dimension d = f.dimension().orElseThrow(() -> new IllegalArgumentException(f.path() + " has no unit"));
        String t = f.text().get() == null ? "" : f.text().get().trim();
        String out;
        try {
            if (d == Dimension.PRESSURE) {
                double pa = Units.parsePressure(f.path(), t, atmosphericPa());
                boolean gauge = unit.endsWith("g");
                String base = unit.substring(0, unit.length() - 1);
                out = fmt(Units.pressureFromPa(pa, base, gauge, atmosphericPa())) + " " + unit;
            } else {
                out = fmt(Units.fromSi(Units.parse(f.path(), t, d), d, unit)) + " " + unit;
            }
        } catch (InvalidInputException | IllegalArgumentException e) {
            java.util.regex.Matcher m = java.util.regex.Pattern.compile("^([-+]?[0-9.]+(?:[eE][-+]?\\d+)?)").matcher(t);
            out = m.find() ? m.group(1) + " " + unit : t;
        }
        f.text().set(out);
    }

    private double atmosphericPa() {
        try {
            String a = draft.text("$.site.atmosphericPressure");
            return a.isBlank() ? PhysicalConstants.ATM_PA : Units.parsePressure("atm", a, PhysicalConstants.ATM_PA);
        } catch (InvalidInputException e) {
            return PhysicalConstants.ATM_PA;
        }
    }

    private static String fmt(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        if (s.contains("e") || s.contains("E")) {
            return s;
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    // ------------------------------------------------------------------------------ sketch

    /**
     * What the vessel sketch draws, in m above grade.
     *
     * @param vessel          the geometry
     * @param bottomElevation lowest inside point above grade
     * @param fireHeight      fire height above grade
     * @param levelM          liquid level above the lowest inside point (0 when none)
     */
    public record Sketch(org.ventcase.vessel.Vessel vessel, double bottomElevation, double fireHeight, double levelM) {
    }

    /**
     * The vessel as far as its fields can be read now, for the live sketch (the same geometry
     * classes as the calculation); empty while shape or dimensions are not valid.
     */
    public Optional<Sketch> sketch() {
        try {
            String shape = draft.text("$.vessel.shape");
            double d = Units.parse("$.vessel.insideDiameter", draft.text("$.vessel.insideDiameter"), Dimension.LENGTH);
            org.ventcase.vessel.Vessel v;
            if (shape.equals("sphere")) {
                v = org.ventcase.vessel.Vessel.sphere(d);
            } else {
                double l = Units.parse("$.vessel.tangentLength", draft.text("$.vessel.tangentLength"), Dimension.LENGTH);
                org.ventcase.vessel.Head h1 = org.ventcase.vessel.Specs.head("$.vessel.heads", draft.text("$.vessel.heads"), d);
                String second = draft.text("$.vessel.secondHead");
                org.ventcase.vessel.Head h2 = second.isBlank() ? h1
                        : org.ventcase.vessel.Specs.head("$.vessel.secondHead", second, d);
                if (shape.equals("horizontal")) {
                    v = org.ventcase.vessel.Vessel.horizontal(d, l, h1, h2);
                } else if (shape.equals("vertical")) {
                    v = org.ventcase.vessel.Vessel.vertical(d, l, h1, h2);
                } else {
                    return Optional.empty();
                }
            }
            String e = draft.text("$.vessel.bottomElevation");
            double z = e.isBlank() ? 0 : Units.parse("$.vessel.bottomElevation", e, Dimension.LENGTH);
            String fh = draft.text("$.site.fireHeight");
            double fire = fh.isBlank() ? org.ventcase.vessel.FireExposure.DEFAULT_FIRE_HEIGHT_M
                    : Units.parse("$.site.fireHeight", fh, Dimension.LENGTH);
            double level = 0;
            String lv = draft.text("$.storage.liquidLevel");
            if (!lv.isBlank() && !draft.text("$.storage.mode").equals("gas-filled")) {
                try {
                    level = Math.min(v.totalHeight(),
                            org.ventcase.vessel.Specs.level("$.storage.liquidLevel", lv).heightIn(v));
                } catch (InvalidInputException ex) {
                    level = 0;
                }
            }
            return Optional.of(new Sketch(v, z, fire, level));
        } catch (InvalidInputException | IllegalArgumentException ex) {
            return Optional.empty();
        }
    }

    // ------------------------------------------------------------------------------ results

    /** The validated case, when the draft has no problems. */
    public Optional<ValidatedCase> validated() {
        return draft.check(file.get() == null ? "wizard" : file.get().toString()).validated();
    }

    /** The results, recomputed as the case changes. */
    public LiveCalculation live() {
        return live;
    }

    /** The sheet of the case (call off the application thread). */
    public SheetOutcome sheet(ValidatedCase kase, UnitSystem units, String version) {
        return runner.sheet(kase, units, version);
    }

    /** The last good result (see {@link LiveCalculation#current()} for whether it is today's). */
    public javafx.beans.property.ReadOnlyObjectProperty<Optional<CaseSummary>> summary() {
        return live.summary();
    }

    // ------------------------------------------------------------------------------ properties

    public ObservableList<Problem> problems() {
        return problems;
    }

    public ObservableList<String> warnings() {
        return warnings;
    }

    public ObjectProperty<Path> file() {
        return file;
    }

    public ReadOnlyBooleanProperty dirty() {
        return dirty.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canUndo() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedo() {
        return canRedo.getReadOnlyProperty();
    }

    /** Increments whenever components or scenarios are added, removed or restored (views rebuild lists). */
    public IntegerProperty structure() {
        return structure;
    }

    public StringProperty compositionSum() {
        return compositionSum;
    }

    public BooleanProperty compositionOk() {
        return compositionOk;
    }

    /** The draft's raw text at a path (for views that show derived state, e.g. the scenario type). */
    public String valueAt(String path) {
        return draft.text(path);
    }

    /** The current title for the window: file name or "untitled", with a mark when unsaved. */
    public String title() {
        String name = file.get() == null ? "untitled" : file.get().getFileName().toString();
        return (dirty.get() ? "* " : "") + name + " - " + Messages.get("app.title");
    }
}
