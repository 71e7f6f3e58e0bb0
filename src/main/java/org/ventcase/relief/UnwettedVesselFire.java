package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.InvalidInputException;
import org.ventcase.common.PhysicalConstants;

/**
 * Relief load of a vessel holding only gas (no liquid to absorb heat) exposed to fire.
 *
 * <p>Equation (SI): W = 0.2772 sqrt(M P1) A' (Tw - T1)^1.25 / T1^1.1506, with W the relief rate
 * (kg/h), M the molar mass (kg/kmol), P1 the relieving pressure (kPa absolute), A' the exposed
 * surface area (m2), Tw the vessel wall temperature (K) and T1 the gas temperature at relieving
 * conditions (K), T1 = (P1 / Pn) Tn from the normal operating pressure Pn (absolute) and
 * temperature Tn (K), ideal gas at constant volume. US form: the constant is 0.1406 with W lb/h,
 * P1 psia, A' ft2, T in R.
 *
 * <p>Area form (for sizing directly): A = F' A' / sqrt(P1) with
 * F' = 0.2772 (Tw - T1)^1.25 / (C Kd T1^0.6506) in SI (A mm2, A' m2, P1 kPa abs, C the SI gas
 * coefficient). Derived here by substituting W into the API 520 critical-flow equation with Z = 1
 * and Kb = Kc = 1 (REFERENCES.md section 2 [D]).
 *
 * <p>Assumptions: air-like gas, ideal gas, no heat capacity of the wall, uninsulated vessel.
 * Caution: a gas-filled vessel's wall heats quickly; the wall can weaken and rupture before the
 * relief device can protect it. Relief alone may not be enough (consider depressuring, water
 * application or insulation).
 *
 * <p>Source: API Std 521 5th ed. 2007 / ISO 23251:2006, 5.15.2.2.3 (gas-filled vessels),
 * Equations (5) to (7) (numbers from memory). US constant [S]; SI constant [D] as in
 * REFERENCES.md section 2. Tw = 593 C (1100 F) for carbon steel: [S, weak].
 */
public final class UnwettedVesselFire {

    /** SI constant, kg/h for M kg/kmol, P1 kPa abs, A' m2, T K. */
    public static final double C_SI = 0.2772;
    /** US constant, lb/h for M lb/lbmol, P1 psia, A' ft2, T R. */
    public static final double C_US = 0.1406;
    /** Recommended maximum wall temperature for carbon steel, 593 C (1100 F), in K. */
    public static final double CARBON_STEEL_WALL_K = 593.0 + PhysicalConstants.ZERO_CELSIUS_K;
    /** The caution printed with every result. */
    public static final String RUPTURE_CAUTION = "Gas-filled vessel in fire: the unwetted wall heats quickly and "
            + "may weaken and rupture before the relief device prevents it; relief alone may not protect the "
            + "vessel (consider depressuring, water application or fire-resistant insulation). The method "
            + "assumes an ideal gas, air-like properties and no wall heat capacity.";

    // Clause 5.15.2.2.3 of the 5th ed. 2007 / ISO 23251:2006 from memory, not verified against the
    // current edition; constants: REFERENCES.md section 2 [D]/[S].
    static final String SOURCE = "API Std 521 / ISO 23251: relief of a gas-filled (unwetted) vessel exposed to an "
            + "open pool fire";

    private UnwettedVesselFire() {
    }

    /** T1 = (P1 / Pn) Tn, K (ideal gas heated at constant volume). */
    public static double relievingTemperatureK(double relievingPressurePa, double normalPressurePa,
                                               double normalTemperatureK) {
        InvalidInputException.requirePositive("relief.relievingPressure", relievingPressurePa, "Pa abs");
        InvalidInputException.requirePositive("process.normalPressure", normalPressurePa, "Pa abs");
        InvalidInputException.requirePositive("process.normalTemperature", normalTemperatureK, "K");
        return relievingPressurePa / normalPressurePa * normalTemperatureK;
    }

    /** Relief rate from the SI equation. */
    public static UnwettedVesselFireResult reliefRate(UnwettedVesselFireInput in) {
        double t1 = relievingTemperatureK(in.relievingPressurePa(), in.normalPressurePa(), in.normalTemperatureK());
        requireWallHotter(in.wallTemperatureK(), t1);
        double p1kPa = in.relievingPressurePa() / 1000.0;
        double wKgH = C_SI * Math.sqrt(in.molarMass() * p1kPa) * in.exposedAreaM2()
                * Math.pow(in.wallTemperatureK() - t1, 1.25) / Math.pow(t1, 1.1506);
        String eq = String.format(Locale.US,
                "T1 = (P1/Pn) Tn = (%.6g/%.6g) x %.6g = %.6g K; W = 0.2772 sqrt(M P1) A' (Tw - T1)^1.25 / T1^1.1506 "
                        + "= 0.2772 sqrt(%.6g x %.6g) x %.6g x (%.6g - %.6g)^1.25 / %.6g^1.1506 = %.6g kg/h",
                in.relievingPressurePa(), in.normalPressurePa(), in.normalTemperatureK(), t1, in.molarMass(), p1kPa,
                in.exposedAreaM2(), in.wallTemperatureK(), t1, t1, wKgH);
        List<String> w = new ArrayList<>();
        w.add(RUPTURE_CAUTION);
        return new UnwettedVesselFireResult(wKgH / 3600.0, t1, eq, SOURCE, w);
    }

    /**
     * The US customary equation, in US units (for cross-checks).
     *
     * @return W in lb/h for M lb/lbmol, P1 psia, A' ft2, Tw and T1 in R
     */
    public static double reliefRateUsLbPerH(double molarMass, double p1Psia, double exposedAreaFt2, double wallR,
                                            double t1R) {
        InvalidInputException.requireInRange("fluid.molarMass", molarMass, 1, 2000, "lb/lbmol");
        InvalidInputException.requirePositive("relief.relievingPressure", p1Psia, "psia");
        InvalidInputException.requirePositive("fire.exposedArea", exposedAreaFt2, "ft2");
        InvalidInputException.requirePositive("relief.relievingTemperature", t1R, "R");
        requireWallHotter(wallR, t1R);
        return C_US * Math.sqrt(molarMass * p1Psia) * exposedAreaFt2 * Math.pow(wallR - t1R, 1.25)
                / Math.pow(t1R, 1.1506);
    }

    /**
     * F' of the area form, SI: F' = 0.2772 (Tw - T1)^1.25 / (C Kd T1^0.6506), such that
     * A (mm2) = F' A' (m2) / sqrt(P1 (kPa abs)).
     *
     * @param coefficientC  C of the API 520 critical-flow equation, SI form (0.03948 x root)
     * @param kd            effective coefficient of discharge
     * @param wallTemperatureK Tw, K
     * @param relievingTemperatureK T1, K
     */
    public static double fPrimeSi(double coefficientC, double kd, double wallTemperatureK,
                                  double relievingTemperatureK) {
        InvalidInputException.requireInRange("device.C", coefficientC, 0.01, 0.04, "(SI units)");
        InvalidInputException.requireInRange("device.kd", kd, 1e-6, 1, "");
        InvalidInputException.requirePositive("relief.relievingTemperature", relievingTemperatureK, "K");
        requireWallHotter(wallTemperatureK, relievingTemperatureK);
        return C_SI * Math.pow(wallTemperatureK - relievingTemperatureK, 1.25)
                / (coefficientC * kd * Math.pow(relievingTemperatureK, 0.6506));
    }

    private static void requireWallHotter(double wall, double t1) {
        InvalidInputException.requirePositive("fire.wallTemperature", wall, "");
        if (!(wall > t1)) {
            throw InvalidInputException.invalid("fire.wallTemperature", String.format(Locale.US, "%.6g", wall),
                    "expected above the relieving temperature T1 = " + String.format(Locale.US, "%.6g", t1)
                            + " (same unit); the method needs Tw > T1");
        }
    }
}
