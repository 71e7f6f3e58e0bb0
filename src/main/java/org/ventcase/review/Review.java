package org.ventcase.review;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Supplier;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseInput;
import org.ventcase.calc.CaseResult;
import org.ventcase.calc.ScenarioKey;
import org.ventcase.common.NoSolutionException;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.common.VentcaseException;
import org.ventcase.device.GasSizing;
import org.ventcase.device.OrificeSelection;
import org.ventcase.device.OrificeTable;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.BoilingState;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.FireHeatInput;
import org.ventcase.relief.MixtureSpec;
import org.ventcase.relief.RelievedFluid;
import org.ventcase.relief.RelievingPressure;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.ScenarioKind;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.mix.KijTable;
import org.ventcase.thermo.mix.SaturationPoints;

/**
 * Compares claimed values with Ventcase's own calculation of the same case.
 *
 * <ol>
 * <li>The case runs through the whole pipeline ({@link CaseCalculation#run}); the reviewed scenario
 *     is the one the claim names (label or 1-based position), else the governing one.</li>
 * <li>Each claimed quantity gets its computed value, difference, relative difference, tolerance
 *     and verdict ({@link Verdict#of}).</li>
 * <li>The case is run again with PR78 and SRK, each on the translated and the cubic density basis
 *     (k_ij the case sets are kept, the others taken from the built-in table for the variant); the
 *     range of each quantity over these runs is the model range, and a check or disagreement whose
 *     claimed value lies inside it is flagged as within model uncertainty.</li>
 * <li>Every check and disagreement gets cause hints: alternative values of the same quantity under
 *     a known mistake (gauge pressure read as absolute, latent heat at storage temperature, ...)
 *     that the claimed value matches within the quantity's tolerance while Ventcase's value does
 *     not; and consistency checks (the load is the claimed Q / L, the area follows from the claimed
 *     load and properties). Where nothing matches, a hint says where the quantity comes from.</li>
 * </ol>
 */
public final class Review {

    /** The equations of state of the sensitivity runs. */
    public static final List<EosVariant> SENSITIVITY_EOS = List.of(EosVariant.PR78, EosVariant.SRK);

    /** The density bases of the sensitivity runs. */
    public static final List<DensityBasis> SENSITIVITY_BASES = List.of(DensityBasis.TRANSLATED, DensityBasis.CUBIC);

    /** Ideal-gas reference temperature of tabulated k values, 15 C. */
    static final double STANDARD_T_K = 288.15;

    /** Rounding allowance on the model range for a claimed value (4 significant digits). */
    static final double ROUNDING_RELATIVE = 0.001;
    /** Rounding allowance on the model range of a temperature, K. */
    static final double ROUNDING_K = 0.05;

    private static final String CRITICAL_EQUATION_START = "A = W / (C Kd P1";

    private Review() {
    }

    /** Runs the review with the default tolerances. */
    public static ReviewResult run(CaseInput in, ClaimedValues claimed) {
        return run(in, claimed, Tolerances.defaults());
    }

    /** Runs the review. */
    public static ReviewResult run(CaseInput in, ClaimedValues claimed, Tolerances tol) {
        return prepare(in, claimed).judge(tol);
    }

    /**
     * Computes everything a review needs that does not depend on the tolerances: the case, the
     * reviewed scenario, Ventcase's values and the model runs. {@link Prepared#judge} then gives
     * the verdicts and hints for any tolerances without computing the case again.
     */
    public static Prepared prepare(CaseInput in, ClaimedValues claimed) {
        CaseResult base = CaseCalculation.run(in);
        String choice;
        int idx;
        if (claimed.scenario().isPresent()) {
            idx = scenarioIndex(base, claimed.scenario().get());
            choice = "named in the claimed values";
        } else {
            idx = base.governingIndex().orElseThrow(() -> new NoSolutionException("claimed.scenario",
                    "no scenario of the case could be sized, so there is no governing scenario to review: name the "
                            + "scenario in the claimed values"));
            choice = "governing scenario (the claimed values name none)";
        }
        CaseResult.ScenarioResult s = base.scenarios().get(idx);
        if (s.failure().isPresent()) {
            throw new NoSolutionException("claimed.scenario", s.failure().get());
        }
        List<String> warnings = new ArrayList<>();
        Computed mine = computed(in, base, idx);
        List<ReviewResult.ModelRun> runs = sensitivity(in, base, idx, mine, warnings);
        return new Prepared(in, claimed, base, idx, choice, mine, runs, List.copyOf(warnings));
    }

    /**
     * A review computed once (see {@link #prepare}). Judging is cheap: the hints' alternative
     * states (e.g. the bubble point at P1 read as gauge) are computed on first use and kept, so
     * a second judgement with other tolerances computes nothing again. Thread-safe.
     */
    public static final class Prepared {
        private final CaseInput in;
        private final ClaimedValues claimed;
        private final CaseResult base;
        private final int idx;
        private final String choice;
        private final Computed mine;
        private final List<ReviewResult.ModelRun> runs;
        private final List<String> warnings;
        private final Map<String, Optional<BoilingState>> states = new java.util.concurrent.ConcurrentHashMap<>();

        Prepared(CaseInput in, ClaimedValues claimed, CaseResult base, int idx, String choice, Computed mine,
                 List<ReviewResult.ModelRun> runs, List<String> warnings) {
            this.in = in;
            this.claimed = claimed;
            this.base = base;
            this.idx = idx;
            this.choice = choice;
            this.mine = mine;
            this.runs = runs;
            this.warnings = warnings;
        }

        /** The verdicts, hints and model range for these tolerances. */
        public ReviewResult judge(Tolerances tol) {
            CaseResult.ScenarioResult s = base.scenarios().get(idx);
            Hints hints = new Hints(in, base, s, mine, claimed, tol, states);
            List<ReviewResult.Row> rows = new ArrayList<>();
            for (ReviewQuantity q : ReviewQuantity.values()) {
                if (claimed.has(q)) {
                    rows.add(row(q, claimed, mine, runs, tol, hints));
                }
            }
            return new ReviewResult(base.title(), base.tag(), base.inputHash(), claimed.source(), idx, s.label(),
                    s.type().key(), choice, rows, runs, tol, base, new ArrayList<>(warnings));
        }
    }

    // ------------------------------------------------------------------------------ scenario

    static int scenarioIndex(CaseResult r, String wanted) {
        String w = wanted.strip();
        if (w.matches("\\d{1,4}")) {
            int i = Integer.parseInt(w) - 1;
            if (i >= 0 && i < r.scenarios().size()) {
                return i;
            }
        }
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            if (s.label().equals(w)) {
                return s.index();
            }
        }
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            if (s.label().equalsIgnoreCase(w)) {
                return s.index();
            }
        }
        StringBuilder labels = new StringBuilder();
        for (CaseResult.ScenarioResult s : r.scenarios()) {
            labels.append(labels.length() == 0 ? "" : ", ").append(s.index() + 1).append(" '").append(s.label())
                    .append('\'');
        }
        throw org.ventcase.common.InvalidInputException.invalid("claimed.scenario", wanted,
                "expected a scenario label or its position (1 to " + r.scenarios().size() + "): " + labels);
    }

    // ------------------------------------------------------------------------------ computed values

    /** Ventcase's values of one scenario: SI numbers and the orifice. */
    record Computed(Map<ReviewQuantity, Double> values, Optional<String> orifice) {
        OptionalDouble get(ReviewQuantity q) {
            Double v = values.get(q);
            return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
        }
    }

    static Computed computed(CaseInput in, CaseResult r, int idx) {
        CaseResult.ScenarioResult s = r.scenarios().get(idx);
        Map<ReviewQuantity, Double> v = new EnumMap<>(ReviewQuantity.class);
        put(v, ReviewQuantity.RELIEVING_PRESSURE, s.relievingPressurePa());
        put(v, ReviewQuantity.RELIEVING_TEMPERATURE, s.relievingTemperatureK());
        put(v, ReviewQuantity.HEAT_INPUT, s.heatInputW());
        put(v, ReviewQuantity.LATENT_HEAT, s.latentHeatJPerKg());
        put(v, ReviewQuantity.RELIEF_LOAD, s.reliefLoadKgPerS());
        put(v, ReviewQuantity.REQUIRED_AREA, s.requiredAreaM2());
        if (s.relievedFluid().isPresent()) {
            RelievedFluid f = s.relievedFluid().get();
            v.put(ReviewQuantity.MOLAR_MASS, f.molarMass());
            if (f.phase() == RelievedFluid.Phase.LIQUID) {
                v.put(ReviewQuantity.LIQUID_DENSITY, f.density());
            } else {
                v.put(ReviewQuantity.Z, f.z());
                v.put(ReviewQuantity.K, f.kIdeal());
                v.put(ReviewQuantity.VAPOUR_DENSITY, f.density());
            }
        }
        if (s.type() == ScenarioKey.FIRE_WETTED && s.relievingTemperatureK().isPresent()) {
            Fluid fl = in.fluid();
            FluidProperties lp = fl.model().properties(s.relievingTemperatureK().getAsDouble(),
                    s.relievingPressurePa().getAsDouble(), fl.composition().fractions(), PhaseRequest.LIQUID,
                    fl.densityBasis());
            v.put(ReviewQuantity.LIQUID_DENSITY, lp.density());
        }
        if (s.type() == ScenarioKey.FIRE_WETTED || s.type() == ScenarioKey.FIRE_BOIL_OFF
                || s.type() == ScenarioKey.FIRE_NEAR_CRITICAL) {
            v.put(ReviewQuantity.WETTED_AREA, r.vessel().fire().area());
        }
        v.values().removeIf(x -> !Double.isFinite(x));
        return new Computed(v, s.orifice().map(OrificeSelection::designation));
    }

    private static void put(Map<ReviewQuantity, Double> m, ReviewQuantity q, OptionalDouble v) {
        if (v.isPresent()) {
            m.put(q, v.getAsDouble());
        }
    }

    /** Why Ventcase has no value for q in a scenario of this type. */
    static String notComputedReason(ReviewQuantity q, String type) {
        return switch (q) {
            case LIQUID_DENSITY -> "Ventcase compares the liquid density at relieving conditions for the fire-wetted "
                    + "scenario and for liquid relief; this scenario is " + type + ".";
            case WETTED_AREA -> "a " + type + " scenario has no fire-exposed wetted area.";
            case HEAT_INPUT -> "a " + type + " scenario has no heat input.";
            case LATENT_HEAT -> "a " + type + " scenario has no latent heat.";
            case Z, K, VAPOUR_DENSITY -> "this scenario relieves liquid.";
            default -> "Ventcase has no value of this quantity for a " + type + " scenario.";
        };
    }

    // ------------------------------------------------------------------------------ sensitivity

    static List<ReviewResult.ModelRun> sensitivity(CaseInput in, CaseResult base, int idx, Computed mine,
                                                   List<String> warnings) {
        List<ReviewResult.ModelRun> runs = new ArrayList<>();
        EosVariant v0 = in.fluid().variant();
        DensityBasis b0 = in.fluid().densityBasis();
        runs.add(new ReviewResult.ModelRun(label(v0, b0) + " (case)", v0, b0, true, mine.values(), mine.orifice(),
                Optional.empty()));
        for (EosVariant v : SENSITIVITY_EOS) {
            for (DensityBasis b : SENSITIVITY_BASES) {
                if (v == v0 && b == b0) {
                    continue;
                }
                try {
                    CaseInput alt = withModel(in, v, b);
                    // only the reviewed scenario's numbers are compared: no level curve, no envelope
                    CaseResult r = CaseCalculation.run(alt, CaseCalculation.Options.SCREENING);
                    CaseResult.ScenarioResult s = r.scenarios().get(idx);
                    if (s.failure().isPresent()) {
                        runs.add(new ReviewResult.ModelRun(label(v, b), v, b, false, Map.of(), Optional.empty(),
                                s.failure()));
                        warnings.add("Model run " + label(v, b) + ": " + s.failure().get());
                        continue;
                    }
                    Computed c = computed(alt, r, idx);
                    runs.add(new ReviewResult.ModelRun(label(v, b), v, b, false, c.values(), c.orifice(),
                            Optional.empty()));
                } catch (VentcaseException e) {
                    runs.add(new ReviewResult.ModelRun(label(v, b), v, b, false, Map.of(), Optional.empty(),
                            Optional.of(e.getMessage())));
                    warnings.add("Model run " + label(v, b) + " could not be computed: " + e.getMessage());
                }
            }
        }
        return runs;
    }

    static String label(EosVariant v, DensityBasis b) {
        return v.name() + ", " + b.label();
    }

    /**
     * The case with another equation of state and density basis. The k_ij the case set (sources
     * starting "case file:") are kept; the others come from the built-in table for the variant.
     */
    static CaseInput withModel(CaseInput in, EosVariant v, DensityBasis b) {
        Fluid f = in.fluid();
        List<Component> cs = f.components();
        double[][] k = f.kij().kij();
        String[][] src = f.kij().sources();
        Map<KijTable.Pair, Double> overrides = new HashMap<>();
        for (int i = 0; i < cs.size(); i++) {
            for (int j = i + 1; j < cs.size(); j++) {
                if (src[i][j] != null && src[i][j].startsWith("case file:")) {
                    overrides.put(KijTable.Pair.of(cs.get(i).name(), cs.get(j).name()), k[i][j]);
                }
            }
        }
        KijTable.Matrix m = KijTable.builtIn().matrix(cs, v, overrides);
        Fluid g = new Fluid(f.composition(), v, m, b);
        return new CaseInput(in.title(), in.tag(), in.inputHash(), g, in.storage(), in.vessel(), in.level(),
                in.exposure(), in.scenarios(), in.device(), in.warnings());
    }

    // ------------------------------------------------------------------------------ rows

    static double measure(ReviewQuantity q, double claimed, double reference) {
        double d = Math.abs(claimed - reference);
        return q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN ? d : d / Math.abs(reference);
    }

    private static ReviewResult.Row row(ReviewQuantity q, ClaimedValues claimed, Computed mine,
                                        List<ReviewResult.ModelRun> runs, Tolerances tol, Hints hints) {
        String text = q == ReviewQuantity.ORIFICE ? claimed.orifice().orElseThrow()
                : claimed.written().getOrDefault(q, q.format(claimed.values().get(q)));
        double t = tol.of(q);
        if (q == ReviewQuantity.ORIFICE) {
            List<String> letters = new ArrayList<>();
            for (ReviewResult.ModelRun r : runs) {
                r.orifice().filter(o -> !letters.contains(o)).ifPresent(letters::add);
            }
            if (mine.orifice().isEmpty()) {
                return new ReviewResult.Row(q, text, OptionalDouble.empty(), OptionalDouble.empty(), claimed.orifice(),
                        Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), t, Verdict.NOT_COMPARED,
                        OptionalDouble.empty(), OptionalDouble.empty(), letters, false, List.of(),
                        "the scenario was not sized, so it has no orifice.");
            }
            String c = claimed.orifice().get();
            Verdict v = c.equals(mine.orifice().get()) ? Verdict.AGREES : Verdict.DISAGREES;
            boolean within = v != Verdict.AGREES && letters.contains(c);
            List<ReviewResult.Hint> hs = v == Verdict.AGREES ? List.of() : hints.orifice(c, within, letters);
            return new ReviewResult.Row(q, text, OptionalDouble.empty(), OptionalDouble.empty(), claimed.orifice(),
                    mine.orifice(), OptionalDouble.empty(), OptionalDouble.empty(), t, v, OptionalDouble.empty(),
                    OptionalDouble.empty(), letters, within, hs, "");
        }
        double c = claimed.values().get(q);
        OptionalDouble x = mine.get(q);
        if (x.isEmpty() || !(Math.abs(x.getAsDouble()) > 0)) {
            return new ReviewResult.Row(q, text, OptionalDouble.of(c), OptionalDouble.empty(), Optional.empty(),
                    Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), t, Verdict.NOT_COMPARED,
                    OptionalDouble.empty(), OptionalDouble.empty(), List.of(), false, List.of(),
                    notComputedReason(q, hints.type()));
        }
        double xv = x.getAsDouble();
        double diff = c - xv;
        double rel = diff / Math.abs(xv);
        Verdict v = Verdict.of(measure(q, c, xv), t);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (ReviewResult.ModelRun r : runs) {
            Double rv = r.values().get(q);
            if (rv != null) {
                lo = Math.min(lo, rv);
                hi = Math.max(hi, rv);
            }
        }
        OptionalDouble min = lo <= hi ? OptionalDouble.of(lo) : OptionalDouble.empty();
        OptionalDouble max = lo <= hi ? OptionalDouble.of(hi) : OptionalDouble.empty();
        // a claimed value is written with 3 or 4 digits: the range is widened by that rounding
        double margin = q.kind() == ReviewQuantity.Kind.ABSOLUTE_KELVIN ? ROUNDING_K : ROUNDING_RELATIVE * Math.abs(hi);
        boolean within = v != Verdict.AGREES && lo <= hi && hi > lo && c >= lo - margin && c <= hi + margin;
        List<ReviewResult.Hint> hs = new ArrayList<>();
        if (v == Verdict.AGREES) {
            hs.addAll(hints.informational(q, c));
        } else {
            hs.addAll(hints.of(q, c));
            if (within) {
                hs.add(new ReviewResult.Hint("within-model-uncertainty", String.format(Locale.US,
                        "The claimed value lies inside the range Ventcase gets with PR78 and SRK on the translated "
                                + "and cubic density bases (%s to %s): the difference is within model uncertainty. "
                                + "Look at which equation of state and density basis the claim used.",
                        q.format(lo), q.format(hi))));
            }
            if (hs.isEmpty()) {
                hs.add(new ReviewResult.Hint("no-known-cause", Hints.whereToLook(q)));
            }
        }
        return new ReviewResult.Row(q, text, OptionalDouble.of(c), x, Optional.empty(), Optional.empty(),
                OptionalDouble.of(diff), OptionalDouble.of(rel), t, v, min, max, List.of(), within, hs, "");
    }

    // ------------------------------------------------------------------------------ hints

    /** Alternative values under known mistakes, and consistency checks, for one scenario. */
    static final class Hints {
        private final CaseInput in;
        private final CaseResult result;
        private final CaseResult.ScenarioResult s;
        private final Computed mine;
        private final ClaimedValues claimed;
        private final Tolerances tol;
        private final MixtureSpec spec;
        private final double patm;
        private final Map<String, Optional<BoilingState>> states;

        Hints(CaseInput in, CaseResult result, CaseResult.ScenarioResult s, Computed mine, ClaimedValues claimed,
              Tolerances tol, Map<String, Optional<BoilingState>> states) {
            this.states = states;
            this.in = in;
            this.result = result;
            this.s = s;
            this.mine = mine;
            this.claimed = claimed;
            this.tol = tol;
            Fluid f = in.fluid();
            this.spec = new MixtureSpec(f.variant(), f.components(), f.kij().kij(), f.kij().warnings(),
                    f.composition().fractions(), f.densityBasis());
            this.patm = in.scenarios().get(s.index()).relieving().atmosphericPa();
        }

        String type() {
            return s.type().key();
        }

        private boolean boiling() {
            return s.type() == ScenarioKey.FIRE_WETTED;
        }

        private double p1() {
            return mine.get(ReviewQuantity.RELIEVING_PRESSURE).getAsDouble();
        }

        /** True while hints are sought for an agreeing row (see {@link #informational}). */
        private boolean agreeing;

        /**
         * The claimed value matches the alternative, and Ventcase's own value does not. On an
         * agreeing row (informational hints): the claimed value is within a quarter of the tolerance
         * of the alternative and at least four times closer to it than to Ventcase's value.
         */
        private boolean explains(ReviewQuantity q, double c, double alt) {
            if (!Double.isFinite(alt) || !(alt > 0)) {
                return false;
            }
            double t = tol.of(q);
            OptionalDouble x = mine.get(q);
            if (agreeing) {
                return x.isPresent() && measure(q, c, alt) <= t / 4
                        && 4 * measure(q, c, alt) < measure(q, c, x.getAsDouble());
            }
            return measure(q, c, alt) <= t && (x.isEmpty() || measure(q, x.getAsDouble(), alt) > t);
        }

        /**
         * Hints on an agreeing row: a known mistake that reproduces the claimed value much more
         * closely than Ventcase's value does, although the difference is within the tolerance
         * (e.g. a liquid density without volume translation, 5 to 6 % off, under an 8 % tolerance).
         * Only the hints that name a mistake are kept, each prefixed to say the verdict stands.
         */
        List<ReviewResult.Hint> informational(ReviewQuantity q, double c) {
            agreeing = true;
            try {
                List<ReviewResult.Hint> out = new ArrayList<>();
                for (ReviewResult.Hint h : of(q, c)) {
                    if (!h.code().startsWith("follows-") && !h.code().endsWith("-follows")) {
                        out.add(new ReviewResult.Hint(h.code(), "Within the tolerance, but: " + h.text()));
                    }
                }
                return out;
            } finally {
                agreeing = false;
            }
        }

        private Optional<BoilingState> state(String key, Supplier<Double> pressure) {
            return states.computeIfAbsent(key, k -> {
                try {
                    double p = pressure.get();
                    return p > 0 ? Optional.of(BoilingState.bubblePoint(spec, p)) : Optional.empty();
                } catch (VentcaseException e) {
                    return Optional.empty();
                }
            });
        }

        /** The boiling state at P1 - P_atm: a gauge P1 read as absolute. */
        private Optional<BoilingState> gaugeState() {
            return boiling() ? state("gauge", () -> p1() - patm) : Optional.empty();
        }

        /** The boiling state at the storage temperature (its bubble pressure). */
        private Optional<BoilingState> storageState() {
            return boiling() ? state("storage", this::storageBubblePressure) : Optional.empty();
        }

        /** The boiling state at the claimed P1. */
        private Optional<BoilingState> claimedPressureState() {
            Optional<Double> p = claimed.value(ReviewQuantity.RELIEVING_PRESSURE);
            return boiling() && p.isPresent() ? state("claimedP", p::get) : Optional.empty();
        }

        private double storageBubblePressure() {
            if (in.storage() instanceof Storage.Saturated) {
                return result.inventory().pressurePa();
            }
            double t = in.storage().temperatureK();
            double[] x = spec.composition();
            int present = 0;
            int only = -1;
            for (int i = 0; i < x.length; i++) {
                if (x[i] > 0) {
                    present++;
                    only = i;
                }
            }
            if (present == 1) {
                return new PureSaturation(CubicModel.pure(spec.eos(), spec.components().get(only))).pressure(t);
            }
            return new SaturationPoints(spec.model()).bubblePressure(t, x).pressurePa();
        }

        private Optional<FluidProperties> relievedAt(DensityBasis basis, PhaseRequest phase) {
            if (s.relievedFluid().isEmpty() || s.relievingTemperatureK().isEmpty()) {
                return Optional.empty();
            }
            RelievedFluid f = s.relievedFluid().get();
            double[] comp = phase == PhaseRequest.LIQUID && boiling() ? spec.composition() : f.composition();
            try {
                return Optional.of(spec.model().properties(s.relievingTemperatureK().getAsDouble(), f.pressurePa(),
                        comp, phase, basis));
            } catch (VentcaseException e) {
                return Optional.empty();
            }
        }

        private static String f(ReviewQuantity q, double si) {
            return q.format(si);
        }

        List<ReviewResult.Hint> of(ReviewQuantity q, double c) {
            List<ReviewResult.Hint> out = new ArrayList<>();
            switch (q) {
                case RELIEVING_PRESSURE -> pressure(c, out);
                case RELIEVING_TEMPERATURE -> temperature(c, out);
                case MOLAR_MASS -> molarMass(c, out);
                case Z -> z(c, out);
                case K -> k(c, out);
                case LATENT_HEAT -> latent(c, out);
                case LIQUID_DENSITY -> liquidDensity(c, out);
                case VAPOUR_DENSITY -> vapourDensity(c, out);
                case HEAT_INPUT -> heat(c, out);
                case WETTED_AREA -> area(c, out);
                case RELIEF_LOAD -> load(c, out);
                case REQUIRED_AREA -> requiredArea(c, out);
                default -> {
                }
            }
            return out;
        }

        private static void add(List<ReviewResult.Hint> out, String code, String text) {
            out.add(new ReviewResult.Hint(code, text));
        }

        private static final String GAUGE_LOOK = " Look at the pressure basis: P1 = set pressure + accumulation + "
                + "atmospheric pressure, absolute; T1, L, Z and the densities all follow from it.";

        private void pressure(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.RELIEVING_PRESSURE;
            double p1 = p1();
            if (explains(q, c, p1 - patm)) {
                add(out, "gauge-as-absolute", String.format(Locale.US, "The claimed P1 is one atmosphere below "
                        + "Ventcase's absolute P1 (P1 - P_atm = %s): a gauge pressure was probably used as "
                        + "absolute.", f(q, p1 - patm)) + GAUGE_LOOK);
            }
            if (explains(q, c, p1 + patm)) {
                add(out, "atmosphere-added-twice", String.format(Locale.US, "The claimed P1 is one atmosphere "
                        + "above Ventcase's (P1 + P_atm = %s): the atmospheric pressure was probably added to a "
                        + "pressure that was already absolute. Look at the pressure basis of the set pressure and "
                        + "the MAWP.", f(q, p1 + patm)));
            }
            RelievingPressureInput r = in.scenarios().get(s.index()).relieving();
            ScenarioKind other = r.scenario() == ScenarioKind.FIRE ? ScenarioKind.NON_FIRE : ScenarioKind.FIRE;
            try {
                double alt = RelievingPressure.compute(new RelievingPressureInput(r.setPressureGaugePa(),
                        r.mawpGaugePa(), r.atmosphericPa(), r.deviceCount(), other, false,
                        r.setAboveLimitReason())).relievingPressurePa();
                if (explains(q, c, alt)) {
                    add(out, "accumulation", String.format(Locale.US, "The claimed P1 is the relieving pressure "
                            + "with the %s accumulation (%s): look at the allowable overpressure used: 21 %% of MAWP "
                            + "for a fire case; 10 %% (16 %% with several devices) otherwise.",
                            other == ScenarioKind.FIRE ? "fire" : "non-fire", f(q, alt)));
                }
            } catch (VentcaseException e) {
                // the other rule does not apply to this device; no hint from it
            }
        }

        private void temperature(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.RELIEVING_TEMPERATURE;
            gaugeState().ifPresent(g -> {
                if (explains(q, c, g.temperatureK())) {
                    add(out, "gauge-as-absolute", String.format(Locale.US, "The claimed T1 is the saturation "
                            + "(bubble) temperature at P1 - P_atm = %s (%s): the relieving temperature was found at "
                            + "a gauge pressure read as absolute.", ReviewQuantity.RELIEVING_PRESSURE.format(
                                    g.pressurePa()), f(q, g.temperatureK())) + GAUGE_LOOK);
                }
            });
            double ts = in.storage().temperatureK();
            if (explains(q, c, ts)) {
                add(out, "storage-temperature", String.format(Locale.US, "The claimed T1 is the storage "
                        + "temperature (%s): the relieving temperature of a boiling liquid is its saturation "
                        + "(bubble) temperature at P1. Look at where T1 was taken.", f(q, ts)));
            }
            claimedPressureState().ifPresent(g -> {
                if (explains(q, c, g.temperatureK()) && out.stream().noneMatch(h -> h.code().equals(
                        "gauge-as-absolute"))) {
                    add(out, "follows-claimed-pressure", String.format(Locale.US, "The claimed T1 is the "
                            + "saturation temperature at the claimed P1 (%s): T1 follows from the difference in P1; "
                            + "look at the P1 row first.", f(q, g.temperatureK())));
                }
            });
        }

        private void molarMass(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.MOLAR_MASS;
            double ml = spec.model().molarMass(spec.composition());
            if (explains(q, c, ml)) {
                add(out, "liquid-composition", String.format(Locale.US, "The claimed M is the molar mass of the "
                        + "stored liquid (%s): the relieved vapour is the incipient vapour, richer in the light "
                        + "components. Look at the composition used for the relieved fluid.", f(q, ml)));
            }
        }

        private void z(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.Z;
            if (explains(q, c, 1.0)) {
                add(out, "ideal-gas-z", "The claimed Z is 1 (ideal gas): at relieving conditions the vapour is far "
                        + "from ideal. Look at the compressibility used in the sizing equation.");
            }
            gaugeState().ifPresent(g -> {
                if (explains(q, c, g.vapourProps().z())) {
                    add(out, "gauge-as-absolute", String.format(Locale.US, "The claimed Z is the vapour's Z at "
                            + "P1 - P_atm (%s).", f(q, g.vapourProps().z())) + GAUGE_LOOK);
                }
            });
            double zs = result.inventory().vapour().z();
            if (explains(q, c, zs)) {
                add(out, "storage-conditions", String.format(Locale.US, "The claimed Z is the vapour's Z at "
                        + "storage conditions (%s), not at relieving conditions. Look at where Z was taken.",
                        f(q, zs)));
            }
        }

        private void k(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.K;
            if (s.relievedFluid().isEmpty()) {
                return;
            }
            RelievedFluid rf = s.relievedFluid().get();
            String ideal = f(q, rf.kIdeal());
            if (explains(q, c, rf.isentropicExponent())) {
                add(out, "k-real-isentropic", String.format(Locale.US, "The claimed k matches the real-gas "
                        + "isentropic exponent at relieving conditions (%s), not the ideal-gas Cp/Cv at T1 (%s) that "
                        + "Ventcase uses in the API 520 gas equation. Look at which k the sizing used: the "
                        + "coefficient C is defined with the ideal-gas ratio; a real-gas exponent needs the "
                        + "general nozzle equation.", f(q, rf.isentropicExponent()), ideal));
            }
            relievedAt(rf.densityBasis(), PhaseRequest.VAPOR).ifPresent(fp -> {
                if (explains(q, c, fp.kReal())) {
                    add(out, "k-real-cp-cv", String.format(Locale.US, "The claimed k matches the real-fluid "
                            + "Cp/Cv at T1 and P1 (%s), not the ideal-gas Cp/Cv (%s) of the API 520 gas equation. "
                            + "Look at whether k was read at real-gas conditions (a simulator's Cp/Cv at pressure) "
                            + "rather than for the ideal gas at T1.", f(q, fp.kReal()), ideal));
                }
            });
            double[] y = rf.composition();
            double cp = spec.model().idealGasCp(STANDARD_T_K, y);
            double k15 = cp / (cp - PhysicalConstants.R);
            if (explains(q, c, k15)) {
                add(out, "k-at-standard-temperature", String.format(Locale.US, "The claimed k is the ideal-gas "
                        + "Cp/Cv at 15 C (%s), not at the relieving temperature (%s). Look at the temperature at "
                        + "which k was read (a table at 15 C or 60 F).", f(q, k15), ideal));
            }
        }

        private void latent(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.LATENT_HEAT;
            storageState().ifPresent(g -> {
                if (explains(q, c, g.latentHeatJPerKg())) {
                    add(out, "latent-heat-at-storage", String.format(Locale.US, "The claimed L is the latent heat "
                            + "at the storage temperature (%s at %s), not at relieving conditions (T1 = %s). L falls "
                            + "as the temperature rises toward the critical point, so a storage value understates "
                            + "the load. Look at the temperature at which L was taken: it must be T1 at P1.",
                            f(q, g.latentHeatJPerKg()), ReviewQuantity.RELIEVING_TEMPERATURE.format(g.temperatureK()),
                            ReviewQuantity.RELIEVING_TEMPERATURE.format(s.relievingTemperatureK().getAsDouble())));
                }
            });
            gaugeState().ifPresent(g -> {
                if (explains(q, c, g.latentHeatJPerKg())) {
                    add(out, "gauge-as-absolute", String.format(Locale.US, "The claimed L is the latent heat at "
                            + "P1 - P_atm (%s).", f(q, g.latentHeatJPerKg())) + GAUGE_LOOK);
                }
            });
        }

        private void liquidDensity(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.LIQUID_DENSITY;
            DensityBasis b = in.fluid().densityBasis();
            DensityBasis other = b == DensityBasis.TRANSLATED ? DensityBasis.CUBIC : DensityBasis.TRANSLATED;
            relievedAt(other, PhaseRequest.LIQUID).ifPresent(fp -> {
                if (boiling() && explains(q, c, fp.density())) {
                    add(out, "density-basis", basisText("liquid", other, fp.density(), q));
                }
            });
            result.inventory().liquid().ifPresent(l -> {
                if (explains(q, c, l.densityKgM3())) {
                    add(out, "storage-conditions", String.format(Locale.US, "The claimed liquid density is the "
                            + "liquid's at the storage temperature (%s), not at relieving conditions. Look at where "
                            + "the density was taken: the liquid expands as it heats to T1.", f(q, l.densityKgM3())));
                }
            });
        }

        private String basisText(String phase, DensityBasis other, double alt, ReviewQuantity q) {
            if (other == DensityBasis.CUBIC) {
                return String.format(Locale.US, "The claimed %s density matches the raw cubic equation without "
                        + "volume translation (%s); Ventcase's value is on the translated basis (the "
                        + "model's volume translation). Look at whether the density was corrected: raw cubic liquid densities are "
                        + "several percent off.", phase, f(q, alt));
            }
            return String.format(Locale.US, "The claimed %s density matches the volume-translated basis (%s); "
                    + "the case asks for the raw cubic density. Look at which density basis the claim used.", phase,
                    f(q, alt));
        }

        private void vapourDensity(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.VAPOUR_DENSITY;
            DensityBasis b = in.fluid().densityBasis();
            DensityBasis other = b == DensityBasis.TRANSLATED ? DensityBasis.CUBIC : DensityBasis.TRANSLATED;
            relievedAt(other, PhaseRequest.VAPOR).ifPresent(fp -> {
                if (explains(q, c, fp.density())) {
                    add(out, "density-basis", basisText("vapour", other, fp.density(), q));
                }
            });
            if (s.relievedFluid().isPresent() && s.relievingTemperatureK().isPresent()) {
                RelievedFluid rf = s.relievedFluid().get();
                double ideal = rf.pressurePa() * rf.molarMass() * 1e-3 / (PhysicalConstants.R * rf.temperatureK());
                if (explains(q, c, ideal)) {
                    add(out, "ideal-gas-density", String.format(Locale.US, "The claimed vapour density is the "
                            + "ideal-gas density P M / (R T) (%s), i.e. Z = 1. Look at the compressibility used.",
                            f(q, ideal)));
                }
            }
            gaugeState().ifPresent(g -> {
                if (explains(q, c, g.vapourDensity())) {
                    add(out, "gauge-as-absolute", String.format(Locale.US, "The claimed vapour density is the "
                            + "vapour's at P1 - P_atm (%s).", f(q, g.vapourDensity())) + GAUGE_LOOK);
                }
            });
        }

        private void heat(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.HEAT_INPUT;
            OptionalDouble qx = mine.get(q);
            OptionalDouble ax = mine.get(ReviewQuantity.WETTED_AREA);
            if (qx.isEmpty() || ax.isEmpty()) {
                return;
            }
            double a = ax.getAsDouble();
            double wet = result.vessel().wettedArea();
            double whole = result.vessel().totalInsideArea();
            // Q = C F A^0.82 with the same C and F: Q(A') = Q (A'/A)^0.82 exactly
            double e = FireHeatInput.AREA_EXPONENT;
            double atWet = qx.getAsDouble() * Math.pow(wet / a, e);
            double atWhole = qx.getAsDouble() * Math.pow(whole / a, e);
            if (explains(q, c, atWet)) {
                add(out, "wetted-area-fire-height", String.format(Locale.US, "The claimed Q is C F A^0.82 on the "
                        + "wetted area at the liquid level without the fire-height limit (%s on %s): look at the "
                        + "wetted area: only the surface within the fire height above grade counts.", f(q, atWet),
                        ReviewQuantity.WETTED_AREA.format(wet)));
            }
            if (explains(q, c, atWhole)) {
                add(out, "wetted-area-whole-surface", String.format(Locale.US, "The claimed Q is C F A^0.82 on "
                        + "the whole inside surface of the vessel (%s on %s): look at the wetted area: only the "
                        + "liquid-wetted surface within the fire height counts.", f(q, atWhole),
                        ReviewQuantity.WETTED_AREA.format(whole)));
            }
            Optional<Double> ac = claimed.value(ReviewQuantity.WETTED_AREA);
            if (ac.isPresent()) {
                double atClaimed = qx.getAsDouble() * Math.pow(ac.get() / a, e);
                if (explains(q, c, atClaimed)) {
                    add(out, "follows-claimed-area", String.format(Locale.US, "The claimed Q is C F A^0.82 on the "
                            + "claimed wetted area (%s): Q follows from the difference in the wetted area; look at "
                            + "that row first.", f(q, atClaimed)));
                }
            }
            CaseInput.Scenario sc = in.scenarios().get(s.index());
            FireFighting ff = fireFighting(sc);
            if (ff != null) {
                boolean adequate = ff == FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING;
                double ratio = adequate ? FireHeatInput.C_SI_INADEQUATE / FireHeatInput.C_SI_ADEQUATE
                        : FireHeatInput.C_SI_ADEQUATE / FireHeatInput.C_SI_INADEQUATE;
                double alt = qx.getAsDouble() * ratio;
                if (explains(q, c, alt)) {
                    add(out, "fire-fighting", String.format(Locale.US, "The claimed Q is Ventcase's with C for %s "
                            + "drainage and fire-fighting (%s): look at the drainage and fire-fighting assumption.",
                            adequate ? "inadequate" : "adequate", f(q, alt)));
                }
            }
        }

        private static FireFighting fireFighting(CaseInput.Scenario sc) {
            if (sc instanceof CaseInput.WettedFire w) {
                return w.fireFighting();
            }
            if (sc instanceof CaseInput.BoilOffFire w) {
                return w.fireFighting();
            }
            if (sc instanceof CaseInput.NearCriticalFire w) {
                return w.fireFighting();
            }
            return null;
        }

        private void area(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.WETTED_AREA;
            double wet = result.vessel().wettedArea();
            double whole = result.vessel().totalInsideArea();
            if (explains(q, c, wet)) {
                add(out, "wetted-area-fire-height", String.format(Locale.US, "The claimed area is the wetted area "
                        + "at the liquid level (%s) without the fire-height limit: only the wetted surface up to "
                        + "%.1f m above grade (the fire height; the vessel bottom is %.1f m above grade) is exposed. "
                        + "Look at the level, the elevation and the fire height used.", f(q, wet),
                        in.exposure().fireHeight(), in.exposure().bottomElevation()));
            }
            if (explains(q, c, whole)) {
                add(out, "wetted-area-whole-surface", String.format(Locale.US, "The claimed area is the whole "
                        + "inside surface of the vessel (%s): only the liquid-wetted surface within the fire height "
                        + "counts. Look at the level and the fire height used.", f(q, whole)));
            }
        }

        private void load(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.RELIEF_LOAD;
            OptionalDouble qx = mine.get(ReviewQuantity.HEAT_INPUT);
            OptionalDouble lx = mine.get(ReviewQuantity.LATENT_HEAT);
            if (qx.isEmpty() || lx.isEmpty()) {
                return;
            }
            boolean qClaimed = claimed.has(ReviewQuantity.HEAT_INPUT);
            boolean lClaimed = claimed.has(ReviewQuantity.LATENT_HEAT);
            if (qClaimed || lClaimed) {
                double qc = claimed.value(ReviewQuantity.HEAT_INPUT).orElse(qx.getAsDouble());
                double lc = claimed.value(ReviewQuantity.LATENT_HEAT).orElse(lx.getAsDouble());
                double alt = qc / lc;
                if (explains(q, c, alt)) {
                    List<String> from = new ArrayList<>();
                    if (qClaimed && measure(ReviewQuantity.HEAT_INPUT, qc, qx.getAsDouble())
                            > tol.of(ReviewQuantity.HEAT_INPUT)) {
                        from.add("Q");
                    }
                    if (lClaimed && measure(ReviewQuantity.LATENT_HEAT, lc, lx.getAsDouble())
                            > tol.of(ReviewQuantity.LATENT_HEAT)) {
                        from.add("L");
                    }
                    add(out, "load-follows", String.format(Locale.US, "The claimed load is the claimed Q / L (%s): "
                            + "the load is consistent; its difference follows from %s. Look at %s first.", f(q, alt),
                            from.isEmpty() ? "the rounding of Q and L" : "the difference in " + String.join(" and ",
                                    from), from.isEmpty() ? "Q and L" : "the " + String.join(" and ", from)
                                    + (from.size() == 1 ? " row" : " rows")));
                }
            }
            OptionalDouble rv = mine.get(ReviewQuantity.VAPOUR_DENSITY);
            OptionalDouble rl = mine.get(ReviewQuantity.LIQUID_DENSITY);
            if (boiling() && rv.isPresent() && rl.isPresent()) {
                double alt = qx.getAsDouble() / lx.getAsDouble() * (1 - rv.getAsDouble() / rl.getAsDouble());
                if (explains(q, c, alt)) {
                    add(out, "displacement", String.format(Locale.US, "The claimed load is W = Q / L (1 - "
                            + "rho_V/rho_L) (%s): the vapour-displacement refinement was applied, while this case "
                            + "uses W = Q / L. Look at which form the basis intends.", f(q, alt)));
                }
            }
        }

        private void requiredArea(double c, List<ReviewResult.Hint> out) {
            ReviewQuantity q = ReviewQuantity.REQUIRED_AREA;
            if (!s.sizingEquation().startsWith(CRITICAL_EQUATION_START)) {
                return;
            }
            ReviewQuantity[] inputs = {ReviewQuantity.RELIEF_LOAD, ReviewQuantity.RELIEVING_PRESSURE,
                ReviewQuantity.RELIEVING_TEMPERATURE, ReviewQuantity.Z, ReviewQuantity.MOLAR_MASS, ReviewQuantity.K};
            Map<ReviewQuantity, Double> x = new EnumMap<>(ReviewQuantity.class);
            Map<ReviewQuantity, Double> y = new EnumMap<>(ReviewQuantity.class);
            List<String> differing = new ArrayList<>();
            boolean any = false;
            for (ReviewQuantity i : inputs) {
                OptionalDouble v = mine.get(i);
                if (v.isEmpty()) {
                    return;
                }
                x.put(i, v.getAsDouble());
                y.put(i, claimed.value(i).orElse(v.getAsDouble()));
                if (claimed.has(i)) {
                    any = true;
                    if (measure(i, y.get(i), x.get(i)) > tol.of(i)) {
                        differing.add(i.key());
                    }
                }
            }
            if (!any || mine.get(q).isEmpty()) {
                return;
            }
            double alt;
            try {
                // API 520 critical flow, A = W / (C(k) Kd P1 Kb Kc) sqrt(T Z / M): the same Kd, Kb, Kc
                alt = mine.get(q).getAsDouble()
                        * (y.get(ReviewQuantity.RELIEF_LOAD) / x.get(ReviewQuantity.RELIEF_LOAD))
                        * (x.get(ReviewQuantity.RELIEVING_PRESSURE) / y.get(ReviewQuantity.RELIEVING_PRESSURE))
                        * (GasSizing.coefficientC(x.get(ReviewQuantity.K)) / GasSizing.coefficientC(y.get(
                                ReviewQuantity.K)))
                        * Math.sqrt(y.get(ReviewQuantity.RELIEVING_TEMPERATURE) * y.get(ReviewQuantity.Z)
                                * x.get(ReviewQuantity.MOLAR_MASS) / (x.get(ReviewQuantity.RELIEVING_TEMPERATURE)
                                * x.get(ReviewQuantity.Z) * y.get(ReviewQuantity.MOLAR_MASS)));
            } catch (VentcaseException e) {
                return;
            }
            if (explains(q, c, alt)) {
                add(out, "area-follows", String.format(Locale.US, "The claimed area is what the API 520 critical-flow "
                        + "equation gives with the claimed W, P1, T1, Z, M and k (%s; Ventcase's values where none "
                        + "is claimed): the sizing is consistent; its difference follows from %s. Look at %s first.",
                        f(q, alt), differing.isEmpty() ? "rounding" : "the claimed " + String.join(", ", differing),
                        differing.isEmpty() ? "the inputs" : "those rows"));
            }
        }

        List<ReviewResult.Hint> orifice(String c, boolean within, List<String> letters) {
            List<ReviewResult.Hint> out = new ArrayList<>();
            Optional<Double> ac = claimed.value(ReviewQuantity.REQUIRED_AREA);
            OptionalDouble ax = mine.get(ReviewQuantity.REQUIRED_AREA);
            if (ac.isPresent()) {
                String forClaimed = OrificeTable.select(ac.get(), 0).designation();
                if (forClaimed.equals(c)) {
                    add(out, "orifice-follows", "The claimed orifice is the standard orifice for the claimed required "
                            + "area: the selection is consistent; look at the required-area row first.");
                }
            }
            if (ax.isPresent()) {
                double have = claimedOrificeArea(c);
                if (have > 0 && have < ax.getAsDouble()) {
                    add(out, "orifice-too-small", String.format(Locale.US, "The claimed orifice has %s effective "
                            + "area, less than Ventcase's required area (%s): it would not pass the relief load as "
                            + "computed here. Look at the required area and the orifice selection.",
                            ReviewQuantity.REQUIRED_AREA.format(have), ReviewQuantity.REQUIRED_AREA.format(
                                    ax.getAsDouble())));
                } else if (have > 0 && out.isEmpty()) {
                    add(out, "orifice-larger", String.format(Locale.US, "The claimed orifice (%s) is larger than "
                            + "the smallest standard orifice for Ventcase's required area (%s): it passes the load; "
                            + "look at whether a larger orifice was chosen on purpose (check the inlet pressure loss "
                            + "and chatter).", ReviewQuantity.REQUIRED_AREA.format(have),
                            ReviewQuantity.REQUIRED_AREA.format(ax.getAsDouble())));
                }
            }
            if (within) {
                add(out, "within-model-uncertainty", "The claimed orifice is the one Ventcase selects with another "
                        + "of the models run (" + String.join(", ", letters) + "): the difference is within model "
                        + "uncertainty. Look at which equation of state and density basis the claim used.");
            }
            if (out.isEmpty()) {
                add(out, "no-known-cause", whereToLook(ReviewQuantity.ORIFICE));
            }
            return out;
        }

        private static double claimedOrificeArea(String designation) {
            String[] parts = designation.split(" x ");
            int count = parts.length == 2 ? Integer.parseInt(parts[0]) : 1;
            String letter = parts[parts.length - 1];
            try {
                return count * OrificeTable.byLetter(letter).areaM2();
            } catch (VentcaseException e) {
                return -1;
            }
        }

        /** Where a quantity comes from, for a difference no known cause explains. */
        static String whereToLook(ReviewQuantity q) {
            String base = "No single known mistake reproduces the claimed value. ";
            return base + switch (q) {
                case RELIEVING_PRESSURE -> "Look at the set pressure, the MAWP, the accumulation rule and the "
                        + "atmospheric pressure used.";
                case RELIEVING_TEMPERATURE -> "Look at the pressure at which the saturation (bubble) temperature was "
                        + "found and at the fluid's composition and vapour-pressure data.";
                case MOLAR_MASS -> "Look at the composition of the relieved fluid.";
                case Z -> "Look at the equation of state or chart used for Z and the T1, P1 at which it was read.";
                case K -> "Look at the Cp data and the temperature at which k was taken.";
                case LATENT_HEAT -> "Look at the temperature and pressure at which L was taken and at its source "
                        + "(a mixture's L depends on its definition; Ventcase's is stated in the trace).";
                case LIQUID_DENSITY -> "Look at the temperature of the liquid density and at its source (equation of "
                        + "state with or without volume translation, correlation, table).";
                case VAPOUR_DENSITY -> "Look at Z, T1 and P1 used for the vapour density.";
                case HEAT_INPUT -> "Look at the wetted area, the environment factor and the constant C "
                        + "(drainage and fire-fighting) used in Q = C F A^0.82.";
                case WETTED_AREA -> "Look at the vessel dimensions, heads, liquid level, elevation and fire height "
                        + "used.";
                case RELIEF_LOAD -> "Look at Q and L and at the form of the load equation.";
                case REQUIRED_AREA -> "Look at W, P1, T1, Z, M, k and the coefficients Kd, Kb, Kc used.";
                case ORIFICE -> "Look at the required area and at the orifice table used.";
            };
        }
    }
}
