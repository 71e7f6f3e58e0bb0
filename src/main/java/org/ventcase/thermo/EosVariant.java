package org.ventcase.thermo;

import java.util.List;
import java.util.Locale;
import java.util.function.Function;

import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;

/**
 * The two-parameter cubic equations of state Ventcase offers, each as data: the denominator
 * constants, an alpha function and, where one is published, a volume-shift correlation.
 *
 * <p>Form and sign convention, for every variant:
 * <pre>
 *   P = R T / (v - b) - a(T) / ((v + sigma b)(v + epsilon b))
 *   a(T) = Omega_a alpha(Tr) R^2 Tc^2 / Pc,   b = Omega_b R Tc / Pc
 * </pre>
 * vdW: sigma = epsilon = 0; RK and SRK: sigma = 1, epsilon = 0; PR: sigma = 1 + sqrt 2,
 * epsilon = 1 - sqrt 2. Omega_a, Omega_b and Zc are not typed in: they are derived once from
 * sigma and epsilon by the critical-point conditions (the cubic in Z has a triple root at
 * Tr = Pr = 1), see {@link #deriveCriticalConstants}. The derived numbers are tested against the
 * published ones (e.g. 0.45724 and 0.07780 for PR).
 *
 * <p>The generic form follows J.M. Smith, H.C. Van Ness, M.M. Abbott, Introduction to Chemical
 * Engineering Thermodynamics, 7th ed., 2005, Table 3.1 and eq. (3.42).
 *
 * <p>Adding a variant: add one constant here with its sigma, epsilon, alpha factory, volume
 * shift (or {@code null}) and citation. Nothing else changes.
 */
public enum EosVariant {
    /** van der Waals (1873). */
    VDW("van der Waals", 0.0, 0.0, c -> new AlphaFunction.Constant(), null,
            "J.D. van der Waals, thesis, Leiden, 1873"),
    /** Redlich-Kwong (1949). */
    RK("Redlich-Kwong", 1.0, 0.0, c -> new AlphaFunction.RedlichKwong(), null,
            "O. Redlich, J.N.S. Kwong, Chem. Rev. 44 (1949) 233"),
    /** Soave-Redlich-Kwong (1972). */
    SRK("Soave-Redlich-Kwong", 1.0, 0.0,
            c -> new AlphaFunction.Soave(MCorrelation.SOAVE_1972.m(c.omega()), MCorrelation.SOAVE_1972),
            VolumeShift.PENELOUX_SRK, "G. Soave, Chem. Eng. Sci. 27 (1972) 1197"),
    /** Peng-Robinson (1976), with the original m(omega). */
    PR76("Peng-Robinson 1976", 1.0 + Math.sqrt(2.0), 1.0 - Math.sqrt(2.0),
            c -> new AlphaFunction.Soave(MCorrelation.PENG_ROBINSON_1976.m(c.omega()), MCorrelation.PENG_ROBINSON_1976),
            VolumeShift.PENELOUX_TYPE_PR, "D.-Y. Peng, D.B. Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59"),
    /** Peng-Robinson with the 1978 m(omega) for heavy components (omega > 0.491). */
    PR78("Peng-Robinson 1978", 1.0 + Math.sqrt(2.0), 1.0 - Math.sqrt(2.0),
            c -> new AlphaFunction.Soave(MCorrelation.PENG_ROBINSON_1978.m(c.omega()), MCorrelation.PENG_ROBINSON_1978),
            VolumeShift.PENELOUX_TYPE_PR, "D.B. Robinson, D.-Y. Peng, GPA Research Report RR-28 (1978)"),
    /**
     * Peng-Robinson with the Twu (1991) alpha function and the published tc-PR parameters
     * (Pina-Martinez, Privat and Jaubert 2022), each set with its own Tc, Pc and omega, and a
     * temperature-dependent volume translation anchored on a published saturated-liquid density
     * correlation ({@link VolumeTranslation.Anchored}). The default for new cases: against the
     * reference-equation saturation data in the tests it has the smallest deviations of the
     * variants offered (docs/accuracy.md). A component without published Twu parameters falls back
     * to the component's own constants and the PR78 Soave alpha; one without a density correlation
     * keeps the set's constant translation; each with a warning naming the component.
     */
    PRTWU("Peng-Robinson, Twu alpha (tc-PR parameters)", 1.0 + Math.sqrt(2.0), 1.0 - Math.sqrt(2.0), null, null,
            "D.-Y. Peng, D.B. Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59; alpha: C.H. Twu et al., Fluid Phase "
                    + "Equilib. 69 (1991) 33; parameters: M. Pina-Martinez, R. Privat, J.-N. Jaubert, AIChE J. 68 (2022) "
                    + "e17518");

    /** The variant used where a case or command names none. */
    public static final EosVariant DEFAULT = PRTWU;

    /** The variants in the order they are offered: the default first (UI choices, messages). */
    public static final List<EosVariant> OFFERED = List.of(PRTWU, PR78, PR76, SRK, RK, VDW);

    /** The names accepted on input, for messages: every variant once, default first, read from {@link #OFFERED}. */
    public static final String ACCEPTED = OFFERED.stream()
            .map(v -> v.id() + (v == DEFAULT ? " (default)" : v == PR78 ? " (= PR)" : ""))
            .collect(java.util.stream.Collectors.joining(", "));

    /** The names of {@link #OFFERED}, as typed in a case file or on the command line. */
    public static List<String> offeredIds() {
        return OFFERED.stream().map(EosVariant::id).toList();
    }

    /** The names of the offered variants with a published volume shift (translated densities), in offered order. */
    public static List<String> translatedIds() {
        return OFFERED.stream().filter(EosVariant::hasVolumeShift).map(EosVariant::id).toList();
    }

    private final String displayName;
    private final double sigma;
    private final double epsilon;
    private final Function<Component, AlphaFunction> alphaFactory;
    private final VolumeShift volumeShift;
    private final String citation;
    private final double omegaA;
    private final double omegaB;
    private final double zc;

    EosVariant(String displayName, double sigma, double epsilon, Function<Component, AlphaFunction> alphaFactory,
               VolumeShift volumeShift, String citation) {
        this.displayName = displayName;
        this.sigma = sigma;
        this.epsilon = epsilon;
        this.alphaFactory = alphaFactory;
        this.volumeShift = volumeShift;
        this.citation = citation;
        double[] k = deriveCriticalConstants(sigma, epsilon);
        this.omegaA = k[0];
        this.omegaB = k[1];
        this.zc = k[2];
    }

    /**
     * Omega_a, Omega_b and Zc from the critical-point conditions. With u = sigma + epsilon and
     * w = sigma epsilon the cubic in Z reads
     * Z^3 + ((u - 1) B - 1) Z^2 + (A + w B^2 - u B^2 - u B) Z - (A B + w B^2 + w B^3) = 0.
     * A triple root Zc at the critical point gives, coefficient by coefficient,
     * Zc = (1 - (u - 1) B)/3, A = 3 Zc^2 - w B^2 + u B^2 + u B, and Zc^3 = A B + w B^2 + w B^3,
     * a single equation in B = Omega_b solved here by bisection to machine precision.
     *
     * @return {Omega_a, Omega_b, Zc}
     */
    static double[] deriveCriticalConstants(double sigma, double epsilon) {
        double u = sigma + epsilon;
        double w = sigma * epsilon;
        double lo = 1e-6;
        double hi = 0.3;
        for (int it = 0; it < 200 && hi - lo > 1e-17; it++) {
            double mid = 0.5 * (lo + hi);
            if (criticalResidual(mid, u, w) < 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double b = 0.5 * (lo + hi);
        double z = (1.0 - (u - 1.0) * b) / 3.0;
        double a = 3.0 * z * z - w * b * b + u * b * b + u * b;
        return new double[] {a, b, z};
    }

    private static double criticalResidual(double b, double u, double w) {
        double z = (1.0 - (u - 1.0) * b) / 3.0;
        double a = 3.0 * z * z - w * b * b + u * b * b + u * b;
        return a * b + w * b * b + w * b * b * b - z * z * z;
    }

    public String displayName() {
        return displayName;
    }

    public double sigma() {
        return sigma;
    }

    public double epsilon() {
        return epsilon;
    }

    public double omegaA() {
        return omegaA;
    }

    public double omegaB() {
        return omegaB;
    }

    /** Critical compressibility the cubic predicts for every fluid. */
    public double zc() {
        return zc;
    }

    public String citation() {
        return citation;
    }

    /** The alpha function of this variant for one component. */
    public AlphaFunction alphaFor(Component c) {
        return constants(c).alpha();
    }

    /**
     * The constants this variant uses for one component: Tc, Pc and omega (the component's own,
     * except where a published parameter set brings its own), the alpha function, where they come
     * from, and a note when a published set was expected but is missing.
     *
     * @param note empty, or a warning naming the component (a fallback in use)
     */
    public record Constants(double tcK, double pcPa, double omega, AlphaFunction alpha, String source, String note) {
    }

    /** The constants of one component under this variant (see {@link Constants}). */
    public Constants constants(Component c) {
        if (this != PRTWU) {
            return new Constants(c.tcK(), c.pcPa(), c.omega(), alphaFactory.apply(c), Citations.constants(c), "");
        }
        java.util.Optional<TwuParameters.Set> set = TwuParameters.find(c);
        if (set.isPresent()) {
            TwuParameters.Set s = set.get();
            return new Constants(s.tcK(), s.pcPa(), s.omega(), s.alpha(), TwuParameters.CITATION, "");
        }
        return new Constants(c.tcK(), c.pcPa(), c.omega(),
                new AlphaFunction.Soave(MCorrelation.PENG_ROBINSON_1978.m(c.omega()), MCorrelation.PENG_ROBINSON_1978),
                Citations.constants(c), c.name() + ": no published Twu parameters; the " + displayName
                        + " model uses its own Tc, Pc and the Soave alpha of PR78 (vapour pressure and density less accurate)");
    }

    /**
     * The volume translation of one component, or {@code null} where the variant has none.
     * For {@link #PRTWU} a translation anchored on the component's saturated-liquid density
     * correlation (computed once per component and kept: a pure function of published constants),
     * else the tc-PR set's constant c, else the PR78 Peneloux-type shift.
     */
    public VolumeTranslation translation(Component c) {
        if (this != PRTWU) {
            return volumeShift == null ? null : new VolumeTranslation.Constant(volumeShift.shift(c), volumeShift.citation);
        }
        return AnchorCache.get(this, c);
    }

    /**
     * What this variant does with one component, in words, for the sheet and the JSON outputs.
     *
     * @param constants   Tc, Pc, omega and alpha in use, with their source
     * @param alpha       the alpha function with its parameters and source
     * @param translation the volume translation with its source, or "none"
     * @param notes       warnings about fallbacks for this component (may be empty)
     */
    public record ComponentModel(Constants constants, String alpha, String translation, List<String> notes) {
    }

    /** The description of one component under this variant (see {@link ComponentModel}). */
    public ComponentModel describe(Component c) {
        Constants k = constants(c);
        VolumeTranslation t = hasVolumeShift() ? translation(c) : null;
        List<String> notes = new java.util.ArrayList<>();
        if (!k.note().isEmpty()) {
            notes.add(k.note());
        }
        String tn = translationNote(c);
        if (!tn.isEmpty()) {
            notes.add(tn);
        }
        return new ComponentModel(k, k.alpha().describe(), t == null ? "none" : t.describe(), List.copyOf(notes));
    }

    /** A note on a component's translation (fallback in use), or "". */
    public String translationNote(Component c) {
        if (this != PRTWU) {
            return "";
        }
        VolumeTranslation t = translation(c);
        if (t.temperatureDependent()) {
            return "";
        }
        return c.name() + (SaturatedLiquidDensity.find(c).isPresent()
                ? ": the saturated-liquid density correlation could not be anchored (a saturation point failed); the "
                : ": no published saturated-liquid density correlation; the ") + displayName
                + " model translates its volumes by a constant (" + t.describe() + ")";
    }

    /** Anchored translations, built once per (variant, component) on first use. */
    private static final class AnchorCache {
        private static final java.util.concurrent.ConcurrentHashMap<Component, VolumeTranslation> MAP =
                new java.util.concurrent.ConcurrentHashMap<>();

        static VolumeTranslation get(EosVariant v, Component c) {
            VolumeTranslation t = MAP.get(c);
            if (t == null) {
                t = build(v, c);
                VolumeTranslation prev = MAP.putIfAbsent(c, t);
                if (prev != null) {
                    t = prev;
                }
            }
            return t;
        }

        private static VolumeTranslation build(EosVariant v, Component c) {
            java.util.Optional<SaturatedLiquidDensity.Correlation> corr = SaturatedLiquidDensity.find(c);
            if (corr.isPresent()) {
                try {
                    return VolumeTranslation.Anchored.build(CubicModel.untranslated(v, c), corr.get());
                } catch (org.ventcase.common.VentcaseException e) {
                    // a saturation anchor could not be computed: a constant translation (the note says so)
                }
            }
            java.util.Optional<TwuParameters.Set> set = TwuParameters.find(c);
            if (set.isPresent()) {
                return new VolumeTranslation.Constant(set.get().c(), TwuParameters.CITATION);
            }
            return new VolumeTranslation.Constant(VolumeShift.PENELOUX_TYPE_PR.shift(c), VolumeShift.PENELOUX_TYPE_PR.citation);
        }
    }

    /** Whether a published volume-shift correlation exists for this variant. */
    public boolean hasVolumeShift() {
        return volumeShift != null || this == PRTWU;
    }

    /** Citation of the volume-shift correlation, or "" where there is none. */
    public String volumeShiftCitation() {
        if (this == PRTWU) {
            return "temperature-dependent, anchored on published saturated-liquid densities (DIPPR eq. 105, Perry's "
                    + "Handbook 8th ed. Table 2-32; water: IAPWS 1992 auxiliary equation)";
        }
        return volumeShift == null ? "" : volumeShift.citation;
    }

    /** b of one component, m3/mol. */
    public double b(Component c) {
        Constants k = constants(c);
        return omegaB * PhysicalConstants.R * k.tcK() / k.pcPa();
    }

    /** a_c = a(Tc) of one component, Pa m6/mol2. */
    public double ac(Component c) {
        Constants k = constants(c);
        double rt = PhysicalConstants.R * k.tcK();
        return omegaA * rt * rt / k.pcPa();
    }

    /**
     * Parses a variant name as typed on the command line or in a case file: PR-Twu (also PRTWU),
     * vdW, RK, SRK, PR76, PR78, and PR (taken as PR78, which equals PR76 for omega <= 0.491; the
     * output always names the variant used).
     */
    public static EosVariant parse(String field, String text) {
        if (text == null) {
            throw InvalidInputException.missing(field, "expected one of " + ACCEPTED);
        }
        String t = text.trim().toUpperCase(Locale.ROOT).replace("-", "").replace(" ", "");
        switch (t) {
            case "VDW":
            case "VANDERWAALS":
                return VDW;
            case "RK":
            case "REDLICHKWONG":
                return RK;
            case "SRK":
            case "SOAVEREDLICHKWONG":
                return SRK;
            case "PR76":
            case "PR1976":
                return PR76;
            case "PR":
            case "PR78":
            case "PR1978":
            case "PENGROBINSON":
                return PR78;
            case "PRTWU":
            case "TWU":
            case "TCPR":
                return PRTWU;
            default:
                throw InvalidInputException.invalid(field, text, "expected one of " + ACCEPTED);
        }
    }

    /** The name printed for the variant (JSON "eos" values stay {@link #name()}). */
    public String id() {
        return this == PRTWU ? "PR-Twu" : this == VDW ? "vdW" : name();
    }

    /** Published volume-shift correlations in terms of the Rackett compressibility Z_RA. */
    enum VolumeShift {
        /**
         * c = 0.40768 (0.29441 - Z_RA) R Tc / Pc.
         * Source: A. Peneloux, E. Rauzy, R. Freze, Fluid Phase Equilib. 8 (1982) 7-23,
         * DOI 10.1016/0378-3812(82)80002-2.
         */
        PENELOUX_SRK(0.40768, 0.29441, "Peneloux, Rauzy, Freze, Fluid Phase Equilib. 8 (1982) 7"),
        /**
         * c = 0.50033 (0.25969 - Z_RA) R Tc / Pc: the Peneloux-type shift fitted for PR, as given
         * in K.S. Pedersen, P.L. Christensen, Phase Behavior of Petroleum Reservoir Fluids, CRC,
         * 2007, ch. 4 (cited from memory; confirm against the book). Measured here: saturated
         * liquid densities of light hydrocarbons 2-4 % low at Tr 0.6-0.85 (see the saturation
         * data test), against 5-10 % high for the untranslated PR.
         */
        PENELOUX_TYPE_PR(0.50033, 0.25969, "Peneloux-type shift for PR (K.S. Pedersen, P.L. Christensen, Phase Behavior of Petroleum Reservoir Fluids, 2007)");

        private final double k1;
        private final double k2;
        private final String citation;

        VolumeShift(double k1, double k2, String citation) {
            this.k1 = k1;
            this.k2 = k2;
            this.citation = citation;
        }

        double shift(Component c) {
            return k1 * (k2 - c.rackettZ()) * PhysicalConstants.R * c.tcK() / c.pcPa();
        }
    }
}
