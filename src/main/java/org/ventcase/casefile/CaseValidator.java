package org.ventcase.casefile;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Supplier;

import org.ventcase.calc.CaseInput;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.ViscosityCorrection;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.InflowRate;
import org.ventcase.relief.RelievingPressure;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.RelievingPressureResult;
import org.ventcase.relief.UnwettedVesselFire;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.IdealGasCp;
import org.ventcase.units.Dimension;
import org.ventcase.units.Units;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Specs;
import org.ventcase.vessel.Vessel;

/**
 * Turns a {@link Case} into a {@link ValidatedCase}, collecting every problem rather than stopping
 * at the first. The limits live in the domain: each value is checked by building the domain object
 * (units by {@link Units}, heads and levels by {@link Specs}, the vessel by its factories,
 * components by {@link ComponentLibrary}, set pressure against MAWP by {@link RelievingPressure}),
 * and the domain's field names are mapped to JSON paths. The case file's own checks are the
 * cross-field ones: composition sums, which fields each scenario type uses, level against
 * storage mode, valve type against Kb, back pressure against set pressure.
 */
public final class CaseValidator {

    /** Largest departure of a composition's sum from 1. */
    public static final double COMPOSITION_TOLERANCE = 1e-6;

    private final List<Problem> problems = new ArrayList<>();
    private final Set<String> warnings = new LinkedHashSet<>();
    private final Case kase;
    private double atmPa = PhysicalConstants.ATM_PA;

    private CaseValidator(Case kase) {
        this.kase = kase;
    }

    /** Checks a case; never throws for a problem of the input (see {@link ValidationReport#orThrow}). */
    public static ValidationReport check(Case kase, String origin) {
        CaseValidator v = new CaseValidator(kase);
        Optional<ValidatedCase> out = v.run();
        List<Problem> unique = new ArrayList<>(new LinkedHashSet<>(v.problems));
        return new ValidationReport(origin, unique, new ArrayList<>(v.warnings),
                unique.isEmpty() ? out : Optional.empty());
    }

    /**
     * Validates a case.
     *
     * @throws CaseValidationException with every problem found
     */
    public static ValidatedCase validate(Case kase, String origin) {
        return check(kase, origin).orThrow();
    }

    // ------------------------------------------------------------------------------ helpers

    private void problem(String path, String value, String accepted) {
        problems.add(Problem.of(path, value, accepted));
    }

    private void missing(String path, String accepted) {
        problems.add(Problem.missing(path, accepted));
    }

    /** Runs a domain check; a refusal becomes a problem at {@code path} (or a mapped path). */
    private <T> Optional<T> attempt(String path, Map<String, String> fieldPaths, Supplier<T> s) {
        try {
            return Optional.ofNullable(s.get());
        } catch (InvalidInputException e) {
            String p = path;
            String best = "";
            for (Map.Entry<String, String> m : fieldPaths.entrySet()) {
                if (e.field().startsWith(m.getKey()) && m.getKey().length() > best.length()) {
                    best = m.getKey();
                    p = m.getValue();
                }
            }
            Problem pr = Problem.from(p, e);
            // echo what the user wrote ("105 %v", "30 barg"), not the domain's restatement of it, and
            // name the case file's fields, not the domain's
            String typed = typed(p);
            pr = new Problem(pr.path(), typed != null ? typed : pr.value(),
                    pr.accepted().replace("give relief.setAboveLimitReason", "give device.setAboveLimitReason"),
                    pr.domainField());
            problems.add(pr);
            return Optional.empty();
        }
    }

    /** The text the user wrote at each path read so far (quantities and levels). */
    private final Map<String, String> typed = new java.util.HashMap<>();

    private String typed(String path) {
        return typed.get(path);
    }

    private <T> Optional<T> attempt(String path, Supplier<T> s) {
        return attempt(path, Map.of(), s);
    }

    private Optional<Double> quantity(String path, String text, Dimension d, boolean required) {
        if (text == null) {
            if (required) {
                missing(path, "expected a " + d.word() + " with its unit, e.g. " + Units.example(d));
            }
            return Optional.empty();
        }
        typed.put(path, text);
        return attempt(path, () -> Units.parse(path, text, d));
    }

    private Optional<Double> pressure(String path, String text, boolean required) {
        if (text == null) {
            if (required) {
                missing(path, "expected a pressure that says gauge or absolute, e.g. "
                        + Units.example(Dimension.PRESSURE));
            }
            return Optional.empty();
        }
        typed.put(path, text);
        return attempt(path, () -> Units.parsePressure(path, text, atmPa));
    }

    /**
     * Plausible sizes of a process or storage vessel (common practice, no source): a dimension
     * outside them is a typing error, refused with the range before anything is derived from it.
     */
    static final double[] DIAMETER_RANGE_M = Vessel.PLAUSIBLE_DIAMETER_M;
    static final double[] LENGTH_RANGE_M = Vessel.PLAUSIBLE_LENGTH_M;
    static final double[] WALL_RANGE_M = Vessel.PLAUSIBLE_WALL_M;
    static final double[] ELEVATION_RANGE_M = Vessel.PLAUSIBLE_ELEVATION_M;

    private Optional<Double> inRange(String path, Optional<Double> v, double[] range, String unit) {
        return v.flatMap(x -> attempt(path, () -> InvalidInputException.requireInRange(path, x, range[0], range[1],
                unit)));
    }

    /**
     * Saturated storage of one component needs a temperature below its critical temperature (the
     * model's): the check the calculation would make, made here, so that a case 'check' passes is
     * never refused by 'calc'.
     */
    private void saturatedBelowCritical(Optional<ValidatedCase.FluidModel> fluid,
                                        Optional<ValidatedCase.StorageState> storage) {
        if (fluid.isEmpty() || storage.isEmpty() || storage.get().mode() != ValidatedCase.StorageMode.SATURATED) {
            return;
        }
        ValidatedCase.Composition c = fluid.get().composition();
        int only = -1;
        int present = 0;
        for (int i = 0; i < c.fractions().length; i++) {
            if (c.fractions()[i] > 0) {
                present++;
                only = i;
            }
        }
        if (present != 1) {
            return;
        }
        double tc = fluid.get().model().tc(only);
        double t = storage.get().temperatureK();
        if (t >= tc) {
            problem("$.storage.temperature", kase.storage().temperature(), String.format(java.util.Locale.ROOT,
                    "saturated storage needs a temperature below the critical temperature of %s (%.2f K, %.2f C): "
                            + "above it there is no liquid; use mode 'gas-filled' or 'specified'",
                    c.components().get(only).name(), tc, tc - 273.15));
        }
    }

    private Optional<Double> positive(String path, Optional<Double> v, String unit) {
        return v.flatMap(x -> attempt(path, () -> InvalidInputException.requirePositive(path, x, unit)));
    }

    private Optional<String> text(String path, String value, boolean required, String accepted) {
        if (value == null || value.isBlank()) {
            if (required) {
                if (value == null) {
                    missing(path, accepted);
                } else {
                    problem(path, value, accepted);
                }
            }
            return Optional.empty();
        }
        int limit = TEXT_LIMITS.getOrDefault(path, MAX_TEXT);
        if (value.length() > limit) {
            problem(path, value.substring(0, 40) + "... (" + value.length() + " characters)",
                    "expected at most " + limit + " characters");
            return Optional.empty();
        }
        int bad = malformedAt(value);
        if (bad >= 0) {
            problem(path, "text with an unpaired surrogate at character " + (bad + 1),
                    "expected well-formed text (the file holds a broken character there; retype it)");
            return Optional.empty();
        }
        return Optional.of(value);
    }

    /** Longest text accepted in a field, characters (common practice, no source). */
    static final int MAX_TEXT = 1000;

    /** Shorter limits where a field is printed in a title block or a table cell. */
    static final Map<String, Integer> TEXT_LIMITS = Map.of("$.identity.title", 200, "$.identity.tag", 60,
            "$.identity.revision", 20, "$.identity.preparer", 100, "$.identity.checker", 100);

    /** Index of the first unpaired UTF-16 surrogate, or -1. */
    static int malformedAt(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isHighSurrogate(c)) {
                if (i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                    i++;
                    continue;
                }
                return i;
            }
            if (Character.isLowSurrogate(c)) {
                return i;
            }
        }
        return -1;
    }

    private <E> Optional<E> choice(String path, String value, Map<String, E> options, boolean required) {
        String accepted = "expected one of " + String.join(", ", options.keySet());
        if (value == null) {
            if (required) {
                missing(path, accepted);
            }
            return Optional.empty();
        }
        E e = options.get(value.trim().toLowerCase(Locale.ROOT));
        if (e == null) {
            String near = Names.nearest(value.trim(), options.keySet()).map(n -> "; did you mean '" + n + "'?").orElse("");
            problem(path, value, accepted + near);
            return Optional.empty();
        }
        return Optional.of(e);
    }

    private static <E> Map<String, E> options(Object... keysAndValues) {
        Map<String, E> m = new java.util.LinkedHashMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            @SuppressWarnings("unchecked")
            E e = (E) keysAndValues[i + 1];
            m.put((String) keysAndValues[i], e);
        }
        return m;
    }

    // ------------------------------------------------------------------------------ the run

    private Optional<ValidatedCase> run() {
        if (kase == null) {
            missing("$", "expected a case");
            return Optional.empty();
        }
        if (kase.schemaVersion() == null || kase.schemaVersion() != Migrations.CURRENT) {
            problem("$.schemaVersion", String.valueOf(kase.schemaVersion()), "expected " + Migrations.CURRENT
                    + " after migration");
        }
        Optional<ValidatedCase.SiteConditions> site = site();
        Optional<ValidatedCase.Identity> identity = identity();
        Optional<ValidatedCase.FluidModel> fluid = fluid();
        Optional<ValidatedCase.VesselModel> vessel = vessel(site);
        Optional<ValidatedCase.StorageState> storage = storage(vessel, site);
        saturatedBelowCritical(fluid, storage);
        Optional<ValidatedCase.DeviceSpec> device = device();
        List<CaseInput.Scenario> scenarios = scenarios(vessel, storage, device);
        if (!problems.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase(kase, CaseFiles.inputHash(kase), identity.orElseThrow(),
                fluid.orElseThrow(), vessel.orElseThrow(), storage.orElseThrow(), scenarios, device.orElseThrow(),
                site.orElseThrow(), new ArrayList<>(warnings)));
    }

    // ------------------------------------------------------------------------------ site

    private Optional<ValidatedCase.SiteConditions> site() {
        Case.Site s = kase.site() == null ? new Case.Site(null, null, null) : kase.site();
        String atmPath = "$.site.atmosphericPressure";
        Optional<Double> atm = Optional.of(PhysicalConstants.ATM_PA);
        if (s.atmosphericPressure() != null) {
            atm = attempt(atmPath, () -> {
                double a = Units.parsePressure(atmPath, s.atmosphericPressure(), 0.0);
                double b = Units.parsePressure(atmPath, s.atmosphericPressure(), 1.0e5);
                if (a != b) {
                    throw InvalidInputException.invalid(atmPath, s.atmosphericPressure(),
                            "the atmospheric pressure itself must be absolute, e.g. '101.325 kPaa' or '0.95 bara'");
                }
                return InvalidInputException.requireInRange(atmPath, a, 50e3, 110e3, "Pa abs");
            });
        }
        atm.ifPresent(a -> atmPa = a);
        Optional<Double> fire = s.fireHeight() == null ? Optional.of(FireExposure.DEFAULT_FIRE_HEIGHT_M)
                : positive("$.site.fireHeight", quantity("$.site.fireHeight", s.fireHeight(), Dimension.LENGTH, true), "m");
        Optional<Double> mdmt = quantity("$.site.minimumDesignMetalTemperature", s.minimumDesignMetalTemperature(),
                Dimension.TEMPERATURE, false);
        if (atm.isEmpty() || fire.isEmpty() || s.minimumDesignMetalTemperature() != null && mdmt.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase.SiteConditions(atm.get(), fire.get(),
                mdmt.map(OptionalDouble::of).orElse(OptionalDouble.empty())));
    }

    // ------------------------------------------------------------------------------ identity

    private Optional<ValidatedCase.Identity> identity() {
        Case.Identity id = kase.identity();
        if (id == null) {
            missing("$.identity", "expected the title block: title, tag, revision, preparer, checker, date");
            return Optional.empty();
        }
        Optional<String> title = text("$.identity.title", id.title(), true, "expected a non-empty title");
        Optional<String> tag = text("$.identity.tag", id.tag(), true, "expected the equipment tag, e.g. V-2101");
        Optional<String> rev = text("$.identity.revision", id.revision(), true, "expected a revision mark, e.g. A");
        Optional<String> prep = text("$.identity.preparer", id.preparer(), true, "expected who prepared the case");
        // An unchecked case is the normal state of a first-pass basis: a missing or empty checker
        // means unchecked, and the sheet's sign-off block shows it so.
        String checker = id.checker() == null ? "" : id.checker().strip();
        if (!checker.isEmpty() && text("$.identity.checker", checker, false, "").isEmpty()) {
            checker = "";
        }
        Optional<LocalDate> date = Optional.empty();
        if (id.date() == null) {
            missing("$.identity.date", "expected an ISO date yyyy-mm-dd");
        } else {
            try {
                if (!id.date().matches("\\d{4}-\\d{2}-\\d{2}")) {
                    throw new DateTimeParseException("not yyyy-mm-dd", id.date(), 0);
                }
                date = Optional.of(LocalDate.parse(id.date()));
            } catch (DateTimeParseException e) {
                problem("$.identity.date", id.date(), "expected an ISO date yyyy-mm-dd, e.g. 2026-03-14");
            }
        }
        if (title.isEmpty() || tag.isEmpty() || rev.isEmpty() || prep.isEmpty() || date.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase.Identity(title.get(), tag.get(), rev.get(), prep.get(), checker,
                date.get(), Optional.ofNullable(id.notes()).filter(n -> !n.isBlank())));
    }

    // ------------------------------------------------------------------------------ fluid

    private Optional<ValidatedCase.FluidModel> fluid() {
        Case.Fluid f = kase.fluid();
        if (f == null) {
            missing("$.fluid", "expected the fluid: components, eos, densityBasis");
            return Optional.empty();
        }
        Optional<ValidatedCase.Composition> comp = composition("$.fluid.components", f.components(), true);
        Optional<EosVariant> eos = f.eos() == null ? Optional.empty() : attempt("$.fluid.eos",
                () -> EosVariant.parse("$.fluid.eos", f.eos()));
        if (f.eos() == null) {
            missing("$.fluid.eos", "expected one of " + EosVariant.ACCEPTED);
        }
        Optional<DensityBasis> basis = choice("$.fluid.densityBasis", f.densityBasis(),
                options("translated", DensityBasis.TRANSLATED, "cubic", DensityBasis.CUBIC), true);
        if (eos.isPresent() && basis.orElse(null) == DensityBasis.TRANSLATED && !eos.get().hasVolumeShift()) {
            problem("$.fluid.densityBasis", f.densityBasis(), "translated densities need a variant with a published "
                    + "volume shift (" + String.join(", ", EosVariant.translatedIds()) + "); " + eos.get().displayName() + " has none: use cubic");
        }
        List<ValidatedCase.KijEntry> kij = new ArrayList<>();
        double[][] matrix = null;
        if (comp.isPresent()) {
            List<Component> cs = comp.get().components();
            matrix = new double[cs.size()][cs.size()];
            List<Case.Kij> given = f.kij() == null ? List.of() : f.kij();
            Set<String> pairs = new HashSet<>();
            for (int n = 0; n < given.size(); n++) {
                String p = Names.index("$.fluid.kij", n);
                Case.Kij k = given.get(n);
                int i = indexOf(p + ".a", k.a(), cs, f.components());
                int j = indexOf(p + ".b", k.b(), cs, f.components());
                text(p + ".source", k.source(), true, "every interaction parameter needs its source");
                if (k.value() == null) {
                    missing(p + ".value", "expected k_ab, a number with |k| < 1");
                } else if (!(Math.abs(k.value()) < 1)) {
                    problem(p + ".value", String.valueOf(k.value()), "expected |k| < 1");
                }
                if (i < 0 || j < 0 || k.value() == null || !(Math.abs(k.value()) < 1)) {
                    continue;
                }
                if (i == j) {
                    problem(p + ".b", k.b(), "k_ab joins two different components; '" + k.a() + "' and '" + k.b()
                            + "' are the same");
                    continue;
                }
                if (!pairs.add(Math.min(i, j) + "/" + Math.max(i, j))) {
                    problem(p, k.a() + "/" + k.b(), "this pair is already given; give each pair once (k_ab = k_ba)");
                    continue;
                }
                matrix[i][j] = k.value();
                matrix[j][i] = k.value();
                kij.add(new ValidatedCase.KijEntry(i, j, k.value(), k.source() == null ? "" : k.source()));
            }
        }
        if (comp.isEmpty() || eos.isEmpty() || basis.isEmpty()) {
            return Optional.empty();
        }
        double[][] m = matrix;
        Optional<CubicModel> model = attempt("$.fluid.kij", () -> new CubicModel(eos.get(), comp.get().components(), m));
        if (model.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase.FluidModel(comp.get(), eos.get(), kij, basis.get(), model.get()));
    }

    /** Index of the component that {@code name} names among the resolved components, or -1 (problem added). */
    private int indexOf(String path, String name, List<Component> cs, List<Case.ComponentEntry> entries) {
        if (name == null || name.isBlank()) {
            missing(path, "expected the name of a component of this fluid");
            return -1;
        }
        for (int i = 0; i < cs.size(); i++) {
            if (cs.get(i).name().equalsIgnoreCase(name.trim())
                    || entries.get(i).name() != null && entries.get(i).name().trim().equalsIgnoreCase(name.trim())) {
                return i;
            }
        }
        Optional<Component> lib = ComponentLibrary.builtIn().find(name);
        if (lib.isPresent()) {
            for (int i = 0; i < cs.size(); i++) {
                if (cs.get(i).equals(lib.get())) {
                    return i;
                }
            }
        }
        List<String> names = cs.stream().map(Component::name).toList();
        problem(path, name, "expected a component of this fluid: " + String.join(", ", names));
        return -1;
    }

    private Optional<ValidatedCase.Composition> composition(String path, List<Case.ComponentEntry> entries,
                                                            boolean required) {
        if (entries == null || entries.isEmpty()) {
            if (required || entries != null) {
                missing(path, "expected at least one component: {\"name\": \"propane\", \"moleFraction\": 1}");
            }
            return Optional.empty();
        }
        List<Component> cs = new ArrayList<>();
        double[] x = new double[entries.size()];
        boolean ok = true;
        double sum = 0;
        Map<String, Integer> seen = new HashMap<>();
        for (int i = 0; i < entries.size(); i++) {
            String p = Names.index(path, i);
            Case.ComponentEntry e = entries.get(i);
            Optional<Component> c = component(p, e);
            if (e.moleFraction() == null) {
                missing(p + ".moleFraction", "expected a mole fraction, 0 < x <= 1");
                ok = false;
            } else if (!(e.moleFraction() > 0 && e.moleFraction() <= 1)) {
                problem(p + ".moleFraction", String.valueOf(e.moleFraction()), "expected a mole fraction, 0 < x <= 1");
                ok = false;
            } else {
                x[i] = e.moleFraction();
                sum += x[i];
            }
            if (c.isPresent()) {
                Integer before = seen.putIfAbsent(c.get().name(), i);
                if (before != null) {
                    problem(p + ".name", e.name(), "'" + c.get().name() + "' is already listed at "
                            + Names.index(path, before) + "; list each component once");
                    ok = false;
                }
                cs.add(c.get());
            } else {
                ok = false;
            }
        }
        if (ok && !(Math.abs(sum - 1.0) <= COMPOSITION_TOLERANCE)) {
            problem(path, String.format(Locale.ROOT, "mole fractions summing to %.9g", sum),
                    "expected mole fractions summing to 1 within " + COMPOSITION_TOLERANCE);
            ok = false;
        }
        return ok ? Optional.of(new ValidatedCase.Composition(cs, x)) : Optional.empty();
    }

    private Optional<Component> component(String p, Case.ComponentEntry e) {
        if (e.name() == null || e.name().isBlank()) {
            missing(p + ".name", "expected a component name, formula or CAS number (or a custom component's name)");
            return Optional.empty();
        }
        if (e.custom() == null) {
            return attempt(p + ".name", () -> ComponentLibrary.builtIn().get(p + ".name", e.name()));
        }
        String cp = p + ".custom";
        Optional<Component> clash = ComponentLibrary.builtIn().find(e.name());
        if (clash.isPresent()) {
            problem(p + ".name", e.name(), "this name is the built-in component '" + clash.get().name()
                    + "'; give a custom component a name of its own, or leave out 'custom'");
            return Optional.empty();
        }
        Case.CustomComponent c = e.custom();
        Optional<Double> tc = quantity(cp + ".criticalTemperature", c.criticalTemperature(), Dimension.TEMPERATURE, true);
        Optional<Double> pc = pressure(cp + ".criticalPressure", c.criticalPressure(), true);
        Optional<Double> mm = quantity(cp + ".molarMass", c.molarMass(), Dimension.MOLAR_MASS, true);
        Optional<Double> tb = quantity(cp + ".normalBoilingPoint", c.normalBoilingPoint(), Dimension.TEMPERATURE, true);
        if (c.acentricFactor() == null) {
            missing(cp + ".acentricFactor", "expected the acentric factor, a number");
        }
        if (c.rackettZ() == null) {
            missing(cp + ".rackettZ", "expected the Rackett compressibility Z_RA, a number from 0.1 to 0.4");
        }
        Optional<String> cs = text(cp + ".criticalSource", c.criticalSource(), true, "every datum needs a source");
        Optional<String> rs = text(cp + ".rackettSource", c.rackettSource(), true, "every datum needs a source");
        Optional<IdealGasCp> cpData = idealGasCp(cp + ".idealGasCp", c.idealGasCp());
        if (tc.isEmpty() || pc.isEmpty() || mm.isEmpty() || tb.isEmpty() || c.acentricFactor() == null
                || c.rackettZ() == null || cs.isEmpty() || rs.isEmpty() || cpData.isEmpty()) {
            return Optional.empty();
        }
        String where = "component '" + e.name() + "'";
        return attempt(cp, Map.of(where + ".Tc", cp + ".criticalTemperature", where + ".Pc", cp + ".criticalPressure",
                where + ".omega", cp + ".acentricFactor", where + ".molarMass", cp + ".molarMass",
                where + ".Tb", cp + ".normalBoilingPoint", where + ".Z_RA", cp + ".rackettZ"),
                () -> new Component(e.name().trim(), c.formula(), "", List.of(), tc.get(), pc.get(),
                        c.acentricFactor(), mm.get(), tb.get(), cs.get(), cpData.get(), c.rackettZ(), rs.get()));
    }

    private Optional<IdealGasCp> idealGasCp(String path, Case.IdealGasCpData d) {
        if (d == null) {
            missing(path, "expected {coefficients: [a0, a1, a2, a3, a4], minTemperature, maxTemperature, source} "
                    + "for Cp/R = a0 + a1 T + ... + a4 T^4, T in K");
            return Optional.empty();
        }
        boolean ok = true;
        if (d.coefficients() == null || d.coefficients().size() != 5) {
            problem(path + ".coefficients", d.coefficients() == null ? null : String.valueOf(d.coefficients()),
                    "expected five numbers a0..a4 of Cp/R = a0 + a1 T + a2 T^2 + a3 T^3 + a4 T^4, T in K");
            ok = false;
        }
        Optional<Double> lo = quantity(path + ".minTemperature", d.minTemperature(), Dimension.TEMPERATURE, true);
        Optional<Double> hi = quantity(path + ".maxTemperature", d.maxTemperature(), Dimension.TEMPERATURE, true);
        Optional<String> src = text(path + ".source", d.source(), true, "every datum needs a source");
        if (lo.isPresent() && hi.isPresent() && !(hi.get() > lo.get())) {
            problem(path + ".maxTemperature", d.maxTemperature(), "expected above minTemperature " + d.minTemperature());
            ok = false;
        }
        if (!ok || lo.isEmpty() || hi.isEmpty() || src.isEmpty()) {
            return Optional.empty();
        }
        double[] a = d.coefficients().stream().mapToDouble(Double::doubleValue).toArray();
        try {
            return Optional.of(new IdealGasCp(a, lo.get(), hi.get(), src.get()));
        } catch (IllegalArgumentException e) {
            problem(path, String.valueOf(d.coefficients()), e.getMessage());
            return Optional.empty();
        }
    }

    // ------------------------------------------------------------------------------ vessel

    private Optional<ValidatedCase.VesselModel> vessel(Optional<ValidatedCase.SiteConditions> site) {
        Case.VesselData v = kase.vessel();
        if (v == null) {
            missing("$.vessel", "expected the vessel: shape, insideDiameter, tangentLength, heads, bottomElevation");
            return Optional.empty();
        }
        Optional<Vessel.Shape> shape = choice("$.vessel.shape", v.shape(), options("horizontal",
                Vessel.Shape.HORIZONTAL_CYLINDER, "vertical", Vessel.Shape.VERTICAL_CYLINDER, "sphere",
                Vessel.Shape.SPHERE), true);
        Optional<Double> d = inRange("$.vessel.insideDiameter",
                quantity("$.vessel.insideDiameter", v.insideDiameter(), Dimension.LENGTH, true), DIAMETER_RANGE_M, "m");
        Optional<Double> wall = inRange("$.vessel.wallThickness",
                quantity("$.vessel.wallThickness", v.wallThickness(), Dimension.LENGTH, false), WALL_RANGE_M, "m");
        Optional<Double> z = inRange("$.vessel.bottomElevation",
                quantity("$.vessel.bottomElevation", v.bottomElevation(), Dimension.LENGTH, true), ELEVATION_RANGE_M,
                "m");
        boolean skirt = Boolean.TRUE.equals(v.skirtExcludesBottomHead());
        Optional<ValidatedCase.InsulationSpec> insulation = insulation(v.insulation());
        Optional<Vessel> vessel = Optional.empty();
        if (shape.isPresent()) {
            boolean sphere = shape.get() == Vessel.Shape.SPHERE;
            if (sphere) {
                for (String[] f : new String[][] {{"tangentLength", v.tangentLength()}, {"heads", v.heads()},
                        {"secondHead", v.secondHead()}}) {
                    if (f[1] != null) {
                        problem("$.vessel." + f[0], f[1], "a sphere has no " + f[0] + "; leave it out");
                    }
                }
                if (d.isPresent()) {
                    vessel = attempt("$.vessel.insideDiameter", () -> Vessel.sphere(d.get()));
                }
            } else {
                Optional<Double> l = inRange("$.vessel.tangentLength",
                        quantity("$.vessel.tangentLength", v.tangentLength(), Dimension.LENGTH, true), LENGTH_RANGE_M,
                        "m");
                if (v.heads() == null) {
                    missing("$.vessel.heads", "expected one of " + Specs.HEAD_FORMS);
                }
                if (d.isPresent() && l.isPresent() && v.heads() != null) {
                    Optional<Head> h1 = attempt("$.vessel.heads", () -> Specs.head("$.vessel.heads", v.heads(), d.get()));
                    Optional<Head> h2 = v.secondHead() == null ? h1 : attempt("$.vessel.secondHead",
                            () -> Specs.head("$.vessel.secondHead", v.secondHead(), d.get()));
                    if (h1.isPresent() && h2.isPresent()) {
                        String second = v.secondHead() == null ? "$.vessel.heads" : "$.vessel.secondHead";
                        Map<String, String> paths = Map.of("vessel.diameter", "$.vessel.insideDiameter",
                                "vessel.tangentLength", "$.vessel.tangentLength",
                                "vessel.leftHead", "$.vessel.heads", "vessel.bottomHead", "$.vessel.heads",
                                "vessel.rightHead", second, "vessel.topHead", second);
                        vessel = attempt("$.vessel", paths, () -> shape.get() == Vessel.Shape.HORIZONTAL_CYLINDER
                                ? Vessel.horizontal(d.get(), l.get(), h1.get(), h2.get())
                                : Vessel.vertical(d.get(), l.get(), h1.get(), h2.get()));
                    }
                }
            }
            if (skirt && shape.get() != Vessel.Shape.VERTICAL_CYLINDER) {
                problem("$.vessel.skirtExcludesBottomHead", "true",
                        "expected false: only a vertical vessel's bottom head can sit inside a skirt");
            }
        }
        if (vessel.isPresent() && wall.isPresent()) {
            Vessel base = vessel.get();
            vessel = attempt("$.vessel.wallThickness", () -> base.withWallThickness(wall.get()));
        }
        Optional<FireExposure> exposure = Optional.empty();
        if (z.isPresent() && site.isPresent()) {
            exposure = attempt("$.vessel.bottomElevation", Map.of("fire.fireHeight", "$.site.fireHeight"),
                    () -> new FireExposure(z.get(), site.get().fireHeightM(), skirt));
        }
        if (vessel.isEmpty() || exposure.isEmpty() || v.insulation() != null && insulation.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase.VesselModel(vessel.get(), exposure.get(), insulation));
    }

    private Optional<ValidatedCase.InsulationSpec> insulation(Case.Insulation ins) {
        if (ins == null) {
            return Optional.empty();
        }
        String p = "$.vessel.insulation";
        Optional<Double> t = positive(p + ".thickness", quantity(p + ".thickness", ins.thickness(), Dimension.LENGTH,
                true), "m");
        Optional<Double> k = positive(p + ".conductivity", quantity(p + ".conductivity", ins.conductivity(),
                Dimension.THERMAL_CONDUCTIVITY, true), "W/(m K)");
        if (ins.withstandsFireHoseStreams() == null) {
            missing(p + ".withstandsFireHoseStreams", "expected true or false: does the insulation stay in place "
                    + "under fire-hose streams?");
        }
        if (t.isEmpty() || k.isEmpty() || ins.withstandsFireHoseStreams() == null) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase.InsulationSpec(t.get(), k.get(), ins.withstandsFireHoseStreams()));
    }

    // ------------------------------------------------------------------------------ storage

    private Optional<ValidatedCase.StorageState> storage(Optional<ValidatedCase.VesselModel> vessel,
                                                         Optional<ValidatedCase.SiteConditions> site) {
        Case.Storage s = kase.storage();
        if (s == null) {
            missing("$.storage", "expected the storage state: mode, temperature, liquidLevel (and pressure)");
            return Optional.empty();
        }
        Map<String, ValidatedCase.StorageMode> modes = new java.util.LinkedHashMap<>();
        for (ValidatedCase.StorageMode m : ValidatedCase.StorageMode.values()) {
            modes.put(m.key(), m);
        }
        Optional<ValidatedCase.StorageMode> mode = choice("$.storage.mode", s.mode(), modes, true);
        Optional<Double> t = quantity("$.storage.temperature", s.temperature(), Dimension.TEMPERATURE, true);
        if (t.isPresent() && site.isPresent() && site.get().minimumDesignMetalTemperatureK().isPresent()
                && t.get() < site.get().minimumDesignMetalTemperatureK().getAsDouble()) {
            warnings.add("Storage temperature " + s.temperature() + " is below the minimum design metal temperature "
                    + kase.site().minimumDesignMetalTemperature() + ".");
        }
        if (mode.isEmpty()) {
            return Optional.empty();
        }
        ValidatedCase.StorageMode m = mode.get();
        OptionalDouble p = OptionalDouble.empty();
        if (m == ValidatedCase.StorageMode.SATURATED) {
            if (s.pressure() != null) {
                problem("$.storage.pressure", s.pressure(), "saturated storage is at the bubble point of the contents "
                        + "at the storage temperature; leave pressure out, or use mode 'specified'");
            }
        } else {
            Optional<Double> pp = pressure("$.storage.pressure", s.pressure(), true);
            if (pp.isEmpty()) {
                return Optional.empty();
            }
            p = OptionalDouble.of(pp.get());
        }
        Optional<ValidatedCase.Composition> vapour = Optional.empty();
        if (s.vapourComposition() != null) {
            if (m != ValidatedCase.StorageMode.SPECIFIED) {
                problem("$.storage.vapourComposition", "present", "a separate vapour composition belongs to mode "
                        + "'specified' only; leave it out for '" + m.key() + "'");
            } else {
                vapour = composition("$.storage.vapourComposition", s.vapourComposition(), true);
                if (vapour.isEmpty()) {
                    return Optional.empty();
                }
            }
        }
        Level level;
        double h;
        if (m == ValidatedCase.StorageMode.GAS_FILLED) {
            level = Level.ofHeight(0.0);
            h = 0.0;
            if (s.liquidLevel() != null) {
                typed.put("$.storage.liquidLevel", s.liquidLevel());
                Optional<Level> given = attempt("$.storage.liquidLevel",
                        () -> Specs.level("$.storage.liquidLevel", s.liquidLevel()));
                if (given.isEmpty()) {
                    return Optional.empty();
                }
                if (given.get().value() > 0) {
                    problem("$.storage.liquidLevel", s.liquidLevel(), "a gas-filled vessel holds no liquid: expected "
                            + "0 or no liquidLevel; use mode 'saturated' or 'specified' for a vessel with liquid");
                    return Optional.empty();
                }
            }
        } else {
            if (s.liquidLevel() == null) {
                missing("$.storage.liquidLevel", "expected a height ('2.1 m'), % of height ('65 %') or % of volume "
                        + "('70 %v')");
                return Optional.empty();
            }
            typed.put("$.storage.liquidLevel", s.liquidLevel());
            Optional<Level> given = attempt("$.storage.liquidLevel",
                    () -> Specs.level("$.storage.liquidLevel", s.liquidLevel()));
            if (given.isEmpty() || vessel.isEmpty()) {
                return Optional.empty();
            }
            Vessel ves = vessel.get().vessel();
            Optional<Double> hh = attempt("$.storage.liquidLevel", () -> given.get().heightIn(ves));
            if (hh.isEmpty()) {
                return Optional.empty();
            }
            if (!(hh.get() > 0)) {
                problem("$.storage.liquidLevel", s.liquidLevel(), "a vessel held '" + m.key() + "' needs liquid: "
                        + "expected a level above 0; use mode 'gas-filled' for an empty vessel");
                return Optional.empty();
            }
            level = given.get();
            h = hh.get();
        }
        if (t.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ValidatedCase.StorageState(m, t.get(), p, level, h, vapour));
    }

    // ------------------------------------------------------------------------------ device

    private Optional<ValidatedCase.DeviceSpec> device() {
        Case.Device d = kase.device();
        if (d == null) {
            missing("$.device", "expected the device: setPressure, mawp, deviceCount, backPressure, valveType");
            return Optional.empty();
        }
        Optional<Double> set = pressure("$.device.setPressure", d.setPressure(), true);
        Optional<Double> mawp = pressure("$.device.mawp", d.mawp(), true);
        Optional<DeviceCount> count = choice("$.device.deviceCount", d.deviceCount(),
                options("single", DeviceCount.SINGLE, "multiple", DeviceCount.MULTIPLE), true);
        Map<String, ValidatedCase.ValveType> types = new java.util.LinkedHashMap<>();
        for (ValidatedCase.ValveType t : ValidatedCase.ValveType.values()) {
            types.put(t.key(), t);
        }
        Optional<ValidatedCase.ValveType> valve = choice("$.device.valveType", d.valveType(), types, true);
        Optional<ViscosityCorrection> kv = d.liquidViscosityCorrection() == null
                ? Optional.of(ViscosityCorrection.API520_10TH)
                : choice("$.device.liquidViscosityCorrection", d.liquidViscosityCorrection(), options(
                        "api520-10th", ViscosityCorrection.API520_10TH,
                        "api520-7th-to-9th", ViscosityCorrection.API520_7TH_TO_9TH), true);
        boolean disk = Boolean.TRUE.equals(d.ruptureDiskUpstream());
        double kd = coefficient("$.device.kd", d.kd(), 0.975);
        double kdl = coefficient("$.device.kdLiquid", d.kdLiquid(), 0.65);
        double kb = coefficient("$.device.kb", d.kb(), 1.0);
        double kc = coefficient("$.device.kc", d.kc(), disk ? 0.9 : 1.0);
        if (valve.isPresent() && valve.get() != ValidatedCase.ValveType.BALANCED_BELLOWS && d.kb() != null
                && d.kb() != 1.0) {
            problem("$.device.kb", String.valueOf(d.kb()), "Kb applies to balanced-bellows valves only; a "
                    + valve.get().key() + " valve takes Kb = 1 (leave it out)");
        }
        if (!disk && d.kc() != null && d.kc() != 1.0) {
            problem("$.device.kc", String.valueOf(d.kc()), "Kc below 1 applies to a rupture disk ahead of the valve; "
                    + "set ruptureDiskUpstream to true, or leave kc out");
        }
        Optional<Double> superimposed = Optional.empty();
        Optional<Double> builtUp = Optional.empty();
        if (d.backPressure() == null) {
            missing("$.device.backPressure", "expected {\"superimposed\": \"0 barg\", \"builtUp\": \"0.5 bar\"}");
        } else {
            superimposed = pressure("$.device.backPressure.superimposed", d.backPressure().superimposed(), true);
            builtUp = quantity("$.device.backPressure.builtUp", d.backPressure().builtUp(),
                    Dimension.PRESSURE_DIFFERENCE, true);
            builtUp.ifPresent(b -> {
                if (!(b >= 0)) {
                    problem("$.device.backPressure.builtUp", d.backPressure().builtUp(), "expected 0 or more");
                }
            });
        }
        Optional<String> reason = Optional.ofNullable(d.setAboveLimitReason()).filter(r -> !r.isBlank());
        if (set.isEmpty() || mawp.isEmpty() || count.isEmpty() || valve.isEmpty() || kv.isEmpty()
                || superimposed.isEmpty() || builtUp.isEmpty() || !(builtUp.get() >= 0)) {
            return Optional.empty();
        }
        double total = superimposed.get() + builtUp.get();
        if (!(total < set.get())) {
            problem("$.device.backPressure", String.format(Locale.ROOT, "%.6g Pa abs in total", total),
                    "expected the total back pressure below the set pressure (" + d.setPressure() + ")");
        }
        double setGauge = set.get() - atmPa;
        double builtUpFraction = builtUp.get() / setGauge;
        if (valve.get() == ValidatedCase.ValveType.CONVENTIONAL && setGauge > 0 && builtUpFraction > 0.10) {
            warnings.add(String.format(Locale.ROOT, "Built-up back pressure is %.1f %% of the gauge set pressure; a "
                    + "conventional valve is normally limited to about 10 %% (common practice); consider a "
                    + "balanced-bellows or pilot valve.", 100 * builtUpFraction));
        }
        return Optional.of(new ValidatedCase.DeviceSpec(setGauge, mawp.get() - atmPa, count.get(),
                Boolean.TRUE.equals(d.supplementalFireValve()), reason, superimposed.get(), builtUp.get(), kd, kdl, kb,
                kc, valve.get(), disk, kv.get()));
    }

    private double coefficient(String path, Double given, double dflt) {
        if (given == null) {
            return dflt;
        }
        if (!(given > 0 && given <= 1)) {
            problem(path, String.valueOf(given), "expected a coefficient with 0 < value <= 1");
            return dflt;
        }
        return given;
    }

    // ------------------------------------------------------------------------------ scenarios

    private List<CaseInput.Scenario> scenarios(Optional<ValidatedCase.VesselModel> vessel,
                                                       Optional<ValidatedCase.StorageState> storage,
                                                       Optional<ValidatedCase.DeviceSpec> device) {
        List<Case.Scenario> list = kase.scenarios();
        List<CaseInput.Scenario> out = new ArrayList<>();
        if (list == null || list.isEmpty()) {
            missing("$.scenarios", "expected at least one scenario; types: " + String.join(", ", ScenarioType.keys()));
            return out;
        }
        Map<String, Integer> labels = new HashMap<>();
        for (int i = 0; i < list.size(); i++) {
            String p = Names.index("$.scenarios", i);
            Case.Scenario s = list.get(i);
            if (s.type() == null) {
                missing(p + ".type", "expected one of " + String.join(", ", ScenarioType.keys()));
                continue;
            }
            Optional<ScenarioType> type = ScenarioType.byKey(s.type());
            if (type.isEmpty()) {
                String near = Names.nearest(s.type().trim(), ScenarioType.keys()).map(n -> "; did you mean '" + n + "'?")
                        .orElse("");
                problem(p + ".type", s.type(), "expected one of " + String.join(", ", ScenarioType.keys()) + near);
                continue;
            }
            ScenarioType t = type.get();
            Map<String, Object> present = presentFields(s);
            boolean foreign = false;
            for (Map.Entry<String, Object> e : present.entrySet()) {
                if (!ScenarioType.COMMON_FIELDS.contains(e.getKey()) && !t.fields().contains(e.getKey())) {
                    problem(p + "." + e.getKey(), String.valueOf(e.getValue()), "not used by a " + t.key()
                            + " scenario; its fields are " + String.join(", ", new java.util.TreeSet<>(t.fields()))
                            + " (besides type and label)");
                    foreign = true;
                }
            }
            String label = s.label() == null || s.label().isBlank() ? t.key() : s.label().trim();
            if (s.label() != null) {
                Integer before = labels.putIfAbsent(label, i);
                if (before != null) {
                    problem(p + ".label", s.label(), "already used by $.scenarios[" + before + "]; labels must differ");
                }
            }
            if (storage.isPresent()) {
                boolean gas = storage.get().mode() == ValidatedCase.StorageMode.GAS_FILLED;
                if (t.needsLiquid() && gas) {
                    problem(p + ".type", s.type(), "a " + t.key() + " scenario needs liquid in the vessel, but storage "
                            + "mode is gas-filled; use fire-gas-filled or change the storage");
                } else if (t == ScenarioType.FIRE_GAS_FILLED && !gas) {
                    problem(p + ".type", s.type(), "fire-gas-filled applies to a vessel without liquid, but storage "
                            + "mode is '" + storage.get().mode().key() + "'; use fire-wetted, or storage mode gas-filled");
                }
            }
            Optional<RelievingPressureInput> relieving = relieving(t, device);
            Optional<? extends CaseInput.Scenario> spec = switch (t) {
                case FIRE_WETTED -> {
                    Optional<FireFighting> ff = fireFighting(p, s);
                    Optional<CaseInput.FireFactor> f = fireFactor(p, s, vessel);
                    yield ff.isPresent() && f.isPresent() && relieving.isPresent()
                            ? Optional.of(new CaseInput.WettedFire(i, label, ff.get(), f.get(), relieving.get()))
                            : Optional.empty();
                }
                case FIRE_NEAR_CRITICAL -> {
                    Optional<FireFighting> ff = fireFighting(p, s);
                    Optional<CaseInput.FireFactor> f = fireFactor(p, s, vessel);
                    int steps = CaseInput.NearCriticalFire.DEFAULT_STEPS;
                    boolean stepsOk = true;
                    if (s.steps() != null) {
                        if (s.steps() < 2 || s.steps() > 2000) {
                            problem(p + ".steps", String.valueOf(s.steps()), "expected a whole number of temperature "
                                    + "steps from 2 to 2000");
                            stepsOk = false;
                        } else {
                            steps = s.steps();
                        }
                    }
                    int st = steps;
                    yield ff.isPresent() && f.isPresent() && relieving.isPresent() && stepsOk
                            ? Optional.of(new CaseInput.NearCriticalFire(i, label, ff.get(), f.get(),
                            relieving.get(), st))
                            : Optional.empty();
                }
                case FIRE_BOIL_OFF -> {
                    Optional<FireFighting> ff = fireFighting(p, s);
                    Optional<CaseInput.FireFactor> f = fireFactor(p, s, vessel);
                    OptionalDouble duration = OptionalDouble.empty();
                    boolean ok = true;
                    if (s.duration() != null) {
                        Optional<Double> d = positive(p + ".duration",
                                quantity(p + ".duration", s.duration(), Dimension.TIME, true), "s");
                        if (d.isPresent()) {
                            duration = OptionalDouble.of(d.get());
                        } else {
                            ok = false;
                        }
                    }
                    double stop = 0;
                    if (s.stopAtLiquidFraction() != null) {
                        if (!(s.stopAtLiquidFraction() >= 0 && s.stopAtLiquidFraction() <= 0.999)) {
                            problem(p + ".stopAtLiquidFraction", String.valueOf(s.stopAtLiquidFraction()),
                                    "expected a fraction of the liquid at opening from 0 (run until the liquid is "
                                            + "exhausted) to 0.999");
                            ok = false;
                        } else {
                            stop = s.stopAtLiquidFraction();
                        }
                    }
                    OptionalDouble dur = duration;
                    double stp = stop;
                    yield ff.isPresent() && f.isPresent() && relieving.isPresent() && ok
                            ? Optional.of(new CaseInput.BoilOffFire(i, label, ff.get(), f.get(), relieving.get(),
                            dur, stp))
                            : Optional.empty();
                }
                case FIRE_GAS_FILLED -> {
                    Optional<Double> tw = s.wallTemperature() == null
                            ? Optional.of(UnwettedVesselFire.CARBON_STEEL_WALL_K)
                            : quantity(p + ".wallTemperature", s.wallTemperature(), Dimension.TEMPERATURE, true);
                    if (tw.isPresent() && storage.isPresent() && !(tw.get() > storage.get().temperatureK())) {
                        problem(p + ".wallTemperature", s.wallTemperature(), "expected a wall temperature above the "
                                + "storage temperature " + kase.storage().temperature());
                        tw = Optional.empty();
                    }
                    Optional<Double> twf = tw;
                    yield twf.isPresent() && relieving.isPresent()
                            ? Optional.of(new CaseInput.GasFilledFire(i, label, twf.get(), relieving.get()))
                            : Optional.empty();
                }
                case BLOCKED_OUTLET -> {
                    Optional<Boolean> liquid = choice(p + ".inflowPhase", s.inflowPhase(),
                            options("vapour", Boolean.FALSE, "vapor", Boolean.FALSE, "liquid", Boolean.TRUE), true);
                    Optional<InflowRate> inflow = inflow(p + ".inflow", s.inflow());
                    if (inflow.isPresent() && liquid.isPresent()
                            && inflow.get().kind() == InflowRate.Kind.STANDARD_VOLUME && liquid.get()) {
                        problem(p + ".inflow", s.inflow(), "a standard volumetric flow describes a gas; give a liquid "
                                + "inflow as a mass flow, e.g. '12000 kg/h'");
                        inflow = Optional.empty();
                    }
                    Optional<InflowRate> in = inflow;
                    yield in.isPresent() && liquid.isPresent() && relieving.isPresent()
                            ? Optional.of(new CaseInput.BlockedOutlet(i, label, in.get(), liquid.get(),
                            relieving.get()))
                            : Optional.empty();
                }
                case THERMAL_EXPANSION -> {
                    Optional<Double> q = positive(p + ".heatInput",
                            quantity(p + ".heatInput", s.heatInput(), Dimension.POWER, true), "W");
                    Optional<Double> vol = positive(p + ".blockedInVolume",
                            quantity(p + ".blockedInVolume", s.blockedInVolume(), Dimension.VOLUME, true), "m3");
                    yield q.isPresent() && vol.isPresent() && relieving.isPresent()
                            ? Optional.of(new CaseInput.ThermalExpansion(i, label, q.get(), vol.get(),
                            relieving.get()))
                            : Optional.empty();
                }
            };
            if (!foreign) {
                spec.ifPresent(out::add);
            }
        }
        return out;
    }

    private static Map<String, Object> presentFields(Case.Scenario s) {
        Map<String, Object> m = new java.util.LinkedHashMap<>();
        for (java.lang.reflect.RecordComponent rc : Case.Scenario.class.getRecordComponents()) {
            try {
                Object v = rc.getAccessor().invoke(s);
                if (v != null) {
                    m.put(rc.getName(), v);
                }
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException("cannot read scenario field " + rc.getName(), e);
            }
        }
        return m;
    }

    private Optional<FireFighting> fireFighting(String p, Case.Scenario s) {
        return choice(p + ".fireFighting", s.fireFighting(), options(
                "adequate", FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING,
                "inadequate", FireFighting.INADEQUATE), true);
    }

    private Optional<CaseInput.FireFactor> fireFactor(String p, Case.Scenario s,
                                                          Optional<ValidatedCase.VesselModel> vessel) {
        boolean credit = Boolean.TRUE.equals(s.insulationCredit());
        if (s.environmentFactor() != null && credit) {
            problem(p + ".insulationCredit", "true", "give either environmentFactor or insulationCredit, not both");
            return Optional.empty();
        }
        if (s.environmentFactor() == null && !credit) {
            missing(p + ".environmentFactor", "expected an environment-factor key ("
                    + String.join(", ", EnvironmentFactors.all().stream().map(f -> f.key()).toList())
                    + ") or insulationCredit: true with vessel.insulation");
            return Optional.empty();
        }
        if (!credit) {
            return attempt(p + ".environmentFactor", () -> new CaseInput.TableFactor(
                    EnvironmentFactors.byKey(s.environmentFactor())));
        }
        if (kase.vessel() == null || kase.vessel().insulation() == null) {
            problem(p + ".insulationCredit", "true", "insulation credit needs vessel.insulation (thickness, "
                    + "conductivity, withstandsFireHoseStreams)");
            return Optional.empty();
        }
        Optional<ValidatedCase.InsulationSpec> ins = vessel.flatMap(ValidatedCase.VesselModel::insulation);
        if (ins.isEmpty()) {
            return Optional.empty();
        }
        if (!ins.get().withstandsFireHoseStreams()) {
            problem(p + ".insulationCredit", "true", "no fire credit for insulation that does not stay in place under "
                    + "fire-hose streams (vessel.insulation.withstandsFireHoseStreams is false); use environmentFactor "
                    + "'bare'");
            return Optional.empty();
        }
        return Optional.of(new CaseInput.InsulationFactor(ins.get().conductivityWPerMK(), ins.get().thicknessM()));
    }

    private Optional<InflowRate> inflow(String path, String text) {
        if (text == null) {
            missing(path, "expected a mass flow ('12000 kg/h') or a standard volumetric flow ('850 Nm3/h'; units "
                    + StandardFlow.units() + ")");
            return Optional.empty();
        }
        Optional<StandardFlow.Flow> std = StandardFlow.parse(text);
        if (std.isPresent()) {
            if (!(std.get().molPerS() > 0)) {
                problem(path, text, "expected a flow greater than 0");
                return Optional.empty();
            }
            // the same moles, restated at 15 C and 101.325 kPa (ideal-gas molar volume)
            org.ventcase.relief.StandardConditions sc = org.ventcase.relief.StandardConditions.STANDARD_15C;
            return Optional.of(InflowRate.standardVolume(std.get().molPerS() * sc.molarVolume(), sc));
        }
        try {
            double w = Units.parse(path, text, Dimension.MASS_FLOW);
            if (!(w > 0)) {
                problem(path, text, "expected a flow greater than 0");
                return Optional.empty();
            }
            return Optional.of(InflowRate.mass(w));
        } catch (InvalidInputException e) {
            problem(path, text, "expected a mass flow (" + String.join(", ", Units.acceptedUnits(Dimension.MASS_FLOW))
                    + ") or a standard volumetric flow (" + StandardFlow.units() + ")");
            return Optional.empty();
        }
    }

    private Optional<RelievingPressureInput> relieving(ScenarioType t, Optional<ValidatedCase.DeviceSpec> device) {
        if (device.isEmpty()) {
            return Optional.empty();
        }
        ValidatedCase.DeviceSpec d = device.get();
        Map<String, String> paths = Map.of("relief.setPressure", "$.device.setPressure", "relief.mawp", "$.device.mawp",
                "relief.atmosphericPressure", "$.site.atmosphericPressure",
                "relief.supplementalFireValve", "$.device.supplementalFireValve",
                "relief.deviceCount", "$.device.deviceCount");
        Optional<RelievingPressureInput> in = attempt("$.device", paths, () -> new RelievingPressureInput(
                d.setPressureGaugePa(), d.mawpGaugePa(), atmPa, d.count(), t.kind(), d.supplementalFireValve(),
                d.setAboveLimitReason()));
        if (in.isEmpty()) {
            return Optional.empty();
        }
        Optional<RelievingPressureResult> r = attempt("$.device", paths, () -> RelievingPressure.compute(in.get()));
        if (r.isEmpty()) {
            return Optional.empty();
        }
        warnings.addAll(r.get().warnings());
        return in;
    }
}
