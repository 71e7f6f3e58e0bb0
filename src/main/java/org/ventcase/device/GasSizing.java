package org.ventcase.device;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;

/**
 * Required effective discharge area of a pressure-relief valve in gas or vapour service.
 *
 * <p>Critical flow (P2 &lt;= r_c P1), SI form of the standard:
 * <pre>
 *   A = W / (C Kd P1 Kb Kc) sqrt(T Z / M)
 *   C = 0.03948 sqrt( k (2/(k+1))^((k+1)/(k-1)) )
 * </pre>
 * A effective area, mm2; W relief rate, kg/h; P1 relieving pressure, kPa absolute; T relieving
 * temperature, K; Z compressibility; M molar mass, kg/kmol; k ideal-gas heat capacity ratio;
 * Kd, Kb, Kc coefficients (dimensionless). US form: C = 520 x the same root, A in2, W lb/h,
 * P1 psia, T R. When k is unknown C = 0.0239 (SI) / 315 (US), the k -&gt; 1 limit and the smallest
 * C, which gives the largest area. At k = 1 exactly the limit C = 0.03948 e^(-1/2) is used.
 *
 * <p>Critical pressure ratio r_c = (2/(k+1))^(k/(k-1)) (e^(-1/2) at k = 1).
 *
 * <p>Subcritical flow (P2 &gt; r_c P1), conventional and pilot valves:
 * <pre>
 *   A  = 17.9 W / (F2 Kd Kc) sqrt( Z T / (M P1 (P1 - P2)) )
 *   F2 = sqrt( (k/(k-1)) r^(2/k) (1 - r^((k-1)/k)) / (1 - r) ),  r = P2/P1
 * </pre>
 * same units (P2 kPa absolute); US constant 735. At k = 1 the limit F2 = sqrt(r^2 (-ln r)/(1 - r))
 * is used (derived here).
 *
 * <p>Choices of this program, stated: (1) when k is unknown, the flow is taken as critical only if
 * P2/P1 &lt;= 0.4871, the critical ratio at k = 5/3 (critical for every ideal gas); above that a
 * k is required and an {@link InvalidInputException} on {@code device.k} is thrown. (2) A Kb below
 * 1 marks a balanced-bellows valve; such a valve is sized with the critical-flow equation and Kb
 * in both regimes (API 520 Part I, as remembered [M]: confirm against the standard).
 *
 * <p>Source: API Std 520 Part I, 9th ed. 2014 / 10th ed. 2020, 5.6.3 critical flow (Eq. 9 in the
 * 10th ed. SI, from memory) and 5.6.4 subcritical flow (clause and equation numbers from memory);
 * REFERENCES.md section 3 [S]. Worked example: REFERENCES.md section 10.
 */
public final class GasSizing {

    /** SI constant of C, for A mm2, W kg/h, P kPa, T K. */
    public static final double C_SI_FACTOR = 0.03948;
    /** US constant of C, for A in2, W lb/h, P psia, T R. */
    public static final double C_US_FACTOR = 520.0;
    /** C when k is unknown, SI. */
    public static final double C_SI_UNKNOWN_K = 0.0239;
    /** C when k is unknown, US. */
    public static final double C_US_UNKNOWN_K = 315.0;
    /** Subcritical constant, SI. */
    public static final double SUBCRITICAL_SI = 17.9;
    /** Subcritical constant, US. */
    public static final double SUBCRITICAL_US = 735.0;
    /** Critical ratio at k = 5/3, used as the critical-flow limit when k is unknown (program's rule). */
    public static final double UNKNOWN_K_CRITICAL_RATIO = Math.pow(0.75, 2.5);

    // Clauses 5.6.3 (critical) and 5.6.4 (subcritical), 9th ed. 2014 / 10th ed. 2020, from memory,
    // not verified; REFERENCES.md section 3 [S].
    static final String SOURCE = "API Std 520 Part I: sizing of pressure-relief valves for gas or vapour, critical "
            + "and subcritical flow";

    /** Below this distance from 1, k is treated as 1 and the limit forms are used. */
    private static final double K_ONE = 1e-7;

    private GasSizing() {
    }

    /** The root sqrt(k (2/(k+1))^((k+1)/(k-1))), with its k -&gt; 1 limit e^(-1/2). */
    static double root(double k) {
        InvalidInputException.requireInRange("device.k", k, 1.0, 3.0, "");
        if (k - 1 < K_ONE) {
            return Math.exp(-0.5);
        }
        return Math.sqrt(k * Math.pow(2 / (k + 1), (k + 1) / (k - 1)));
    }

    /** C of the critical equation, SI units of the standard: 0.03948 x root. */
    public static double coefficientC(double k) {
        return C_SI_FACTOR * root(k);
    }

    /** C of the critical equation, US units of the standard: 520 x root. */
    public static double coefficientCUs(double k) {
        return C_US_FACTOR * root(k);
    }

    /** Critical pressure ratio (2/(k+1))^(k/(k-1)), e^(-1/2) at k = 1. */
    public static double criticalPressureRatio(double k) {
        InvalidInputException.requireInRange("device.k", k, 1.0, 3.0, "");
        if (k - 1 < K_ONE) {
            return Math.exp(-0.5);
        }
        return Math.pow(2 / (k + 1), k / (k - 1));
    }

    /** F2 of the subcritical equation for r = P2/P1 in (0, 1). */
    public static double f2(double k, double r) {
        InvalidInputException.requireInRange("device.k", k, 1.0, 3.0, "");
        if (!(r > 0 && r < 1)) {
            throw InvalidInputException.outOfRange("device.backPressureRatio", r, 0, 1, "(exclusive)");
        }
        if (k - 1 < K_ONE) {
            return Math.sqrt(r * r * -Math.log(r) / (1 - r));
        }
        return Math.sqrt(k / (k - 1) * Math.pow(r, 2 / k) * (1 - Math.pow(r, (k - 1) / k)) / (1 - r));
    }

    /** Required area with the regime chosen from P2/P1. */
    public static GasSizingResult size(GasSizingInput in) {
        List<org.ventcase.common.LazyText> trace = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double wKgH = in.massFlowKgPerS() * 3600.0;
        double p1 = in.p1Pa() / 1000.0;
        double p2 = in.p2Pa() / 1000.0;
        double r = in.p2Pa() / in.p1Pa();
        trace.add(org.ventcase.common.LazyText.format("Units of the standard: W = %.6g kg/s x 3600 = %.6g kg/h; P1 = %.6g kPa abs; P2 = %.6g kPa abs",
                in.massFlowKgPerS(), wKgH, p1, p2));

        double c;
        double rc;
        if (in.k().isPresent()) {
            double k = in.k().getAsDouble();
            c = coefficientC(k);
            rc = criticalPressureRatio(k);
            trace.add(org.ventcase.common.LazyText.format("C = 0.03948 sqrt(k (2/(k+1))^((k+1)/(k-1))) = %.6g (k = %.6g)", c, k));
            trace.add(org.ventcase.common.LazyText.format("Critical pressure ratio (2/(k+1))^(k/(k-1)) = %.6g; P2/P1 = %.6g", rc, r));
        } else {
            c = C_SI_UNKNOWN_K;
            rc = UNKNOWN_K_CRITICAL_RATIO;
            trace.add(org.ventcase.common.LazyText.format("k unknown: C = %.4g (smallest C, largest area)", c));
            warnings.add("k unknown: C = 0.0239 used (conservative).");
            if (r > rc) {
                throw InvalidInputException.missing("device.k", fmt("k is needed: P2/P1 = %.4g is above %.4g, the "
                        + "critical ratio at k = 5/3, so the flow may be subcritical", r, rc));
            }
            trace.add(org.ventcase.common.LazyText.format("P2/P1 = %.6g <= %.6g (critical ratio at k = 5/3): critical for any ideal gas", r, rc));
        }

        boolean bellows = in.kb() < 1.0;
        FlowRegime regime = r <= rc ? FlowRegime.CRITICAL : FlowRegime.SUBCRITICAL;
        double zt = in.z() * in.temperatureK();
        double aMm2;
        OptionalDouble f2 = OptionalDouble.empty();
        String equation;
        if (regime == FlowRegime.CRITICAL || bellows) {
            if (regime == FlowRegime.SUBCRITICAL) {
                warnings.add("Balanced-bellows valve (Kb < 1) in subcritical flow: sized with the critical-flow "
                        + "equation and Kb, as remembered from API 520 Part I [M]; confirm against the standard.");
            }
            aMm2 = wKgH / (c * in.kd() * p1 * in.kb() * in.kc()) * Math.sqrt(zt / in.molarMass());
            equation = "A = W / (C Kd P1 Kb Kc) sqrt(T Z / M)";
            trace.add(org.ventcase.common.LazyText.format("A = W / (C Kd P1 Kb Kc) sqrt(T Z / M) = %.6g / (%.6g x %.6g x %.6g x %.6g x %.6g) "
                            + "x sqrt(%.6g x %.6g / %.6g) = %.6g mm2", wKgH, c, in.kd(), p1, in.kb(), in.kc(),
                    in.temperatureK(), in.z(), in.molarMass(), aMm2));
        } else {
            double k = in.k().getAsDouble();
            double f = f2(k, r);
            f2 = OptionalDouble.of(f);
            trace.add(org.ventcase.common.LazyText.format("F2 = sqrt((k/(k-1)) r^(2/k) (1 - r^((k-1)/k)) / (1 - r)) = %.6g (r = %.6g)", f, r));
            aMm2 = SUBCRITICAL_SI * wKgH / (f * in.kd() * in.kc())
                    * Math.sqrt(zt / (in.molarMass() * p1 * (p1 - p2)));
            equation = "A = 17.9 W / (F2 Kd Kc) sqrt(Z T / (M P1 (P1 - P2)))";
            trace.add(org.ventcase.common.LazyText.format("A = 17.9 W / (F2 Kd Kc) sqrt(Z T / (M P1 (P1 - P2))) = 17.9 x %.6g / (%.6g x %.6g x %.6g) "
                            + "x sqrt(%.6g x %.6g / (%.6g x %.6g x %.6g)) = %.6g mm2", wKgH, f, in.kd(), in.kc(),
                    in.z(), in.temperatureK(), in.molarMass(), p1, p1 - p2, aMm2));
        }
        trace.add(org.ventcase.common.LazyText.format("Regime: %s", regime));
        return new GasSizingResult(aMm2 * 1e-6, regime, rc, c, f2, equation, trace, warnings, SOURCE);
    }

    /**
     * Critical-flow area in the standard's US units (for cross-checks and US sheets).
     *
     * @return A in in2, for W lb/h, P1 psia, T R, M lb/lbmol
     */
    public static double criticalAreaUsIn2(double wLbPerH, double p1Psia, double tR, double z, double molarMass,
                                           double k, double kd, double kb, double kc) {
        InvalidInputException.requirePositive("device.massFlow", wLbPerH, "lb/h");
        InvalidInputException.requirePositive("relief.relievingPressure", p1Psia, "psia");
        InvalidInputException.requirePositive("device.temperature", tR, "R");
        InvalidInputException.requireInRange("device.kd", kd, Double.MIN_NORMAL, 1.0, "(0 < Kd <= 1)");
        return wLbPerH / (coefficientCUs(k) * kd * p1Psia * kb * kc) * Math.sqrt(tR * z / molarMass);
    }

    /**
     * Subcritical area in the standard's US units.
     *
     * @return A in in2, for W lb/h, P1 and P2 psia, T R, M lb/lbmol
     */
    public static double subcriticalAreaUsIn2(double wLbPerH, double p1Psia, double p2Psia, double tR, double z,
                                              double molarMass, double k, double kd, double kc) {
        InvalidInputException.requirePositive("device.massFlow", wLbPerH, "lb/h");
        InvalidInputException.requirePositive("relief.relievingPressure", p1Psia, "psia");
        InvalidInputException.requireInRange("device.kd", kd, Double.MIN_NORMAL, 1.0, "(0 < Kd <= 1)");
        double f = f2(k, p2Psia / p1Psia);
        return wLbPerH / (SUBCRITICAL_US * f * kd * kc) * Math.sqrt(z * tR / (molarMass * p1Psia * (p1Psia - p2Psia)));
    }

    private static String fmt(String f, Object... args) {
        return String.format(Locale.US, f, args);
    }
}
