package org.ventcase.device;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;

/**
 * Required effective discharge area of a capacity-certified pressure-relief valve in liquid
 * service, with the viscosity correction.
 *
 * <p>Equation (SI form of the standard):
 * <pre>
 *   A  = 11.78 Q / (Kd Kw Kc Kv) sqrt( G / (P1 - P2) )
 *   Re = Q 18,800 G / (mu sqrt(A_o))
 * </pre>
 * A effective area, mm2; Q flow, L/min; G relative density; P1 - P2 pressure difference, kPa
 * (the standard writes gauge pressures; a difference is the same gauge or absolute); mu dynamic
 * viscosity, cP (mPa s); A_o effective area of the selected standard orifice, mm2. US form:
 * A = Q / (38 Kd Kw Kc Kv) sqrt(G / (P1 - P2)), in2, gpm, psi. The constant 18,800 is
 * 16,667 x sqrt(4/pi): Re is based on the diameter of a circle of area A_o (hand calculation).
 *
 * <p>Kv: {@link ViscosityCorrection#API520_7TH_TO_9TH} (0.9935 + 2.878/Re^0.5 +
 * 342.75/Re^1.5)^-1 capped at 1; {@link ViscosityCorrection#API520_10TH} (1 + 170/Re)^-0.5,
 * stated for Re &gt; 80 (a warning is given below that).
 *
 * <p>Procedure: size with Kv = 1; choose the smallest standard orifice at least that large;
 * compute Re and Kv for that orifice and the area A = A(Kv = 1) / Kv; if the orifice is at least
 * A it is kept, otherwise the next orifice that covers A is taken and Re, Kv, A are evaluated
 * again. A larger orifice has a lower Re, hence a lower Kv and a larger A, so the orifice only
 * grows and the loop ends at the smallest orifice that is adequate at its own Re (with several
 * equal valves, each passes Q/n and Re is per valve).
 *
 * <p>Source: API Std 520 Part I, 9th ed. 2014 / 10th ed. 2020, 5.8 liquid sizing for valves
 * requiring capacity certification (clause and equation numbers from memory);
 * REFERENCES.md section 4 [S]. Worked example: REFERENCES.md section 10 (10th ed.).
 */
public final class LiquidSizing {

    /** SI constant of the area equation. */
    public static final double C_SI = 11.78;
    /** US constant of the area equation. */
    public static final double C_US = 38.0;
    /** SI constant of the Reynolds number. */
    public static final double RE_SI = 18_800.0;
    /** Reynolds number with viscosity in SSU: Re = 85,220 Q / (U sqrt(A)), Q L/min, A mm2 [M]. */
    public static final double RE_SI_SSU = 85_220.0;

    private static final int MAX_ITERATIONS = 50;
    // Clause 5.8 (9th ed. 2014 / 10th ed. 2020) from memory, not verified; REFERENCES.md section 4 [S].
    static final String SOURCE = "API Std 520 Part I: sizing of pressure-relief valves for liquid service "
            + "(certified valves)";

    private LiquidSizing() {
    }

    /** Kv for a Reynolds number, in the chosen form. */
    public static double kv(double reynolds, ViscosityCorrection form) {
        InvalidInputException.requirePositive("device.reynolds", reynolds, "");
        if (form == null) {
            throw InvalidInputException.missing("device.kvForm", "expected API520_7TH_TO_9TH or API520_10TH");
        }
        if (form == ViscosityCorrection.API520_10TH) {
            return 1.0 / Math.sqrt(1.0 + 170.0 / reynolds);
        }
        double kv = 1.0 / (0.9935 + 2.878 / Math.sqrt(reynolds) + 342.75 / Math.pow(reynolds, 1.5));
        return Math.min(1.0, kv);
    }

    /** Re = Q 18,800 G / (mu sqrt(A)); Q L/min, mu cP, A mm2. */
    public static double reynolds(double flowLPerMin, double relativeDensity, double viscosityCp, double areaMm2) {
        InvalidInputException.requirePositive("device.volumetricFlow", flowLPerMin, "L/min");
        InvalidInputException.requirePositive("device.relativeDensity", relativeDensity, "");
        InvalidInputException.requirePositive("device.viscosity", viscosityCp, "cP");
        InvalidInputException.requirePositive("device.orificeArea", areaMm2, "mm2");
        return flowLPerMin * RE_SI * relativeDensity / (viscosityCp * Math.sqrt(areaMm2));
    }

    /**
     * Re from a viscosity in Saybolt Universal seconds: Re = 85,220 Q / (U sqrt(A)); Q L/min, A mm2.
     * Status [M]: from memory; it reproduces the published 10th-edition example's Re of about
     * 4525. Provided for worked examples that state SSU; the main procedure uses cP.
     */
    public static double reynoldsFromSsu(double flowLPerMin, double viscositySsu, double areaMm2) {
        InvalidInputException.requirePositive("device.volumetricFlow", flowLPerMin, "L/min");
        InvalidInputException.requirePositive("device.viscositySsu", viscositySsu, "SSU");
        InvalidInputException.requirePositive("device.orificeArea", areaMm2, "mm2");
        return RE_SI_SSU * flowLPerMin / (viscositySsu * Math.sqrt(areaMm2));
    }

    /** A (mm2) = 11.78 Q / (Kd Kw Kc Kv) sqrt(G / dP); Q L/min, dP kPa. */
    public static double areaMm2(double flowLPerMin, double relativeDensity, double dpKPa, double kd, double kw,
                                 double kc, double kv) {
        InvalidInputException.requirePositive("device.volumetricFlow", flowLPerMin, "L/min");
        InvalidInputException.requirePositive("device.pressureDifference", dpKPa, "kPa");
        InvalidInputException.requireInRange("device.kv", kv, Double.MIN_NORMAL, 1.0, "(0 < Kv <= 1)");
        return C_SI * flowLPerMin / (kd * kw * kc * kv) * Math.sqrt(relativeDensity / dpKPa);
    }

    /** US form: A (in2) = Q / (38 Kd Kw Kc Kv) sqrt(G / dP); Q gpm, dP psi. */
    public static double areaUsIn2(double flowGpm, double relativeDensity, double dpPsi, double kd, double kw,
                                   double kc, double kv) {
        InvalidInputException.requirePositive("device.volumetricFlow", flowGpm, "gpm");
        InvalidInputException.requirePositive("device.pressureDifference", dpPsi, "psi");
        InvalidInputException.requireInRange("device.kv", kv, Double.MIN_NORMAL, 1.0, "(0 < Kv <= 1)");
        return flowGpm / (C_US * kd * kw * kc * kv) * Math.sqrt(relativeDensity / dpPsi);
    }

    /** Sizes the valve, iterating the viscosity correction over standard orifices. */
    public static LiquidSizingResult size(LiquidSizingInput in) {
        List<String> trace = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double qLmin = in.volumetricFlowM3PerS() * 60_000.0;
        double dp = (in.p1Pa() - in.p2Pa()) / 1000.0;
        double massFlowKgPerS = in.volumetricFlowM3PerS() * 1000.0 * in.relativeDensity();
        double a0 = areaMm2(qLmin, in.relativeDensity(), dp, in.kd(), in.kw(), in.kc(), 1.0);
        trace.add(fmt("Q = %.6g m3/s x 60000 = %.6g L/min; P1 - P2 = %.6g kPa", in.volumetricFlowM3PerS(), qLmin, dp));
        trace.add(fmt("A(Kv = 1) = 11.78 Q / (Kd Kw Kc) sqrt(G / (P1 - P2)) = 11.78 x %.6g / (%.6g x %.6g x %.6g) "
                + "x sqrt(%.6g / %.6g) = %.6g mm2", qLmin, in.kd(), in.kw(), in.kc(), in.relativeDensity(), dp, a0));
        OrificeSelection sel = OrificeTable.select(a0 * 1e-6, massFlowKgPerS);
        if (in.viscosityPaS().isEmpty()) {
            trace.add("No viscosity given: Kv = 1; orifice " + sel.designation());
            warnings.add("No liquid viscosity given: the viscosity correction Kv = 1 was assumed; give the viscosity at "
                    + "flowing temperature for a viscous liquid.");
            return new LiquidSizingResult(a0 * 1e-6, a0 * 1e-6, 1.0, OptionalDouble.empty(), in.kvForm(), sel, 0,
                    trace, warnings, SOURCE);
        }
        double muCp = in.viscosityPaS().getAsDouble() * 1000.0;
        double shortfallMm2 = 0;
        for (int i = 1; i <= MAX_ITERATIONS; i++) {
            double qPerValve = qLmin / sel.count();
            double re = reynolds(qPerValve, in.relativeDensity(), muCp, sel.orifice().areaMm2());
            double kv = kv(re, in.kvForm());
            double a = a0 / kv;
            trace.add(fmt("Iteration %d: orifice %s; Re = Q 18800 G / (mu sqrt(A_o)) = %.6g x 18800 x %.6g / (%.6g x "
                            + "sqrt(%.6g)) = %.6g; Kv (%s) = %.6g; A = %.6g / %.6g = %.6g mm2", i, sel.designation(),
                    qPerValve, in.relativeDensity(), muCp, sel.orifice().areaMm2(), re, in.kvForm(), kv, a0, kv, a));
            if (sel.selectedAreaMm2() >= a * (1 - 1e-12)) {
                if (in.kvForm() == ViscosityCorrection.API520_10TH && !(re > 80)) {
                    warnings.add(fmt("Re = %.4g is not above 80, the stated range of the 10th-edition Kv form; "
                            + "consult the valve manufacturer.", re));
                }
                // The kept orifice is rated against the final area. Re falls as the orifice grows, so Kv
                // falls and A grows: no smaller orifice can cover A, and the first adequate one is the answer.
                OrificeSelection fin = OrificeTable.rate(a * 1e-6, massFlowKgPerS, sel.orifice(), sel.count(),
                        sel.ruleApplied() + "; kept after the viscosity iteration (adequate at its own Re)");
                trace.add("Orifice " + sel.designation() + " is at least the required area at its own Re: kept");
                return new LiquidSizingResult(a * 1e-6, a0 * 1e-6, kv, OptionalDouble.of(re), in.kvForm(), fin, i,
                        trace, warnings, SOURCE);
            }
            shortfallMm2 = a - sel.selectedAreaMm2();
            sel = OrificeTable.select(a * 1e-6, massFlowKgPerS);
        }
        throw new ConvergenceException("liquid Kv orifice iteration", MAX_ITERATIONS, shortfallMm2,
                "orifice still changing after " + MAX_ITERATIONS + " steps, last " + sel.designation());
    }

    private static String fmt(String f, Object... args) {
        return String.format(Locale.US, f, args);
    }
}
