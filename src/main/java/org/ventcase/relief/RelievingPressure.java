package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.InvalidInputException;

/**
 * Relieving pressure P1 of a pressure-relief device from the vessel's MAWP, the set pressure,
 * the number of devices and the kind of scenario.
 *
 * <p>Rule followed (accumulation is counted on MAWP, as ASME does):
 * <pre>
 *   accumulation  = max(0.10 MAWP, 20.7 kPa)   single device, non-fire
 *                 = max(0.16 MAWP, 27.6 kPa)   multiple devices, non-fire
 *                 = 0.21 MAWP                  fire (any number of devices, supplemental valves included),
 *                                              but never less than the non-fire accumulation of the same
 *                                              device count (reasoned here, no source: at MAWP below
 *                                              about 130 kPa gauge 21 % is less than 27.6 kPa)
 *   P1 (abs)      = MAWP + accumulation + Patm
 *   overpressure  = P1 - Patm - Pset = accumulation + (MAWP - Pset)
 * </pre>
 * So when the set pressure is below MAWP the overpressure above set is larger than the
 * percentage of MAWP; when set = MAWP the two coincide and P1 = set + overpressure + Patm.
 * Set pressure limits: 100 % of MAWP (single device, or the first of several), 105 % (additional
 * devices when several are used), 110 % (supplemental valves for fire only). A set pressure above
 * the limit is refused unless a reason is given; with a reason it is accepted with a warning, and
 * the overpressure is still the distance from set to MAWP + accumulation (it may be small).
 *
 * <p>Pressures: set and MAWP in Pa gauge; atmospheric in Pa absolute; P1 returned in Pa absolute.
 *
 * <p>Source: ASME Boiler and Pressure Vessel Code Section VIII Division 1 (overpressure
 * protection: UG-125 in editions before 2021; from the 2021 edition the rules moved to the UG-150
 * series and to Section XIII; paragraph numbers from memory, not checked here) and API Std 520 Part I (9th ed. 2014 / 10th ed. 2020), section on set
 * pressure and accumulation (Table 1 in the 9th edition, from memory). Summarised in the
 * project's REFERENCES.md section 6 [S]. The 20.7 kPa (3 psi) and 27.6 kPa (4 psi) minimums
 * are the published customary values rounded in SI.
 */
public final class RelievingPressure {

    /** Non-fire single device: fraction of MAWP. */
    public static final double SINGLE_FRACTION = 0.10;
    /** Non-fire single device minimum accumulation, Pa (3 psi, published as 20.7 kPa). */
    public static final double SINGLE_MIN_PA = 20_700.0;
    /** Non-fire multiple devices: fraction of MAWP. */
    public static final double MULTIPLE_FRACTION = 0.16;
    /** Non-fire multiple devices minimum accumulation, Pa (4 psi, published as 27.6 kPa). */
    public static final double MULTIPLE_MIN_PA = 27_600.0;
    /** Fire: fraction of MAWP. */
    public static final double FIRE_FRACTION = 0.21;

    // REFERENCES.md section 6 [S].
    static final String SOURCE = "ASME BPVC Section VIII Division 1 (overpressure limits) and API Std 520 Part I: "
            + "set pressure and allowable accumulation";

    private RelievingPressure() {
    }

    /**
     * Computes P1 and the allowable overpressure.
     *
     * @throws InvalidInputException with field {@code relief.setPressure} when the set pressure is
     *         above the allowed fraction of MAWP and no reason is given
     */
    public static RelievingPressureResult compute(RelievingPressureInput in) {
        List<String> warnings = new ArrayList<>();
        double mawp = in.mawpGaugePa();
        double set = in.setPressureGaugePa();

        double maxSetFraction;
        String setRule;
        if (in.supplementalFireValve()) {
            maxSetFraction = 1.10;
            setRule = "supplemental fire valve: set at most 110 % of MAWP";
        } else if (in.deviceCount() == DeviceCount.MULTIPLE) {
            maxSetFraction = 1.05;
            setRule = "multiple devices: first at most 100 %, additional at most 105 % of MAWP";
        } else {
            maxSetFraction = 1.00;
            setRule = "single device: set at most 100 % of MAWP";
        }
        // Relative tolerance so that a set pressure typed equal to the limit is not refused by round-off.
        double maxSet = maxSetFraction * mawp;
        if (set > maxSet * (1 + 1e-12)) {
            if (in.setAboveLimitReason().isEmpty()) {
                throw InvalidInputException.invalid("relief.setPressure", fmt(set) + " kPa gauge",
                        "expected at most " + fmt(maxSet) + " kPa gauge (" + pct(maxSetFraction) + " of MAWP "
                                + fmt(mawp) + " kPa gauge; " + setRule
                                + "), or give relief.setAboveLimitReason");
            }
            warnings.add("Set pressure " + fmt(set) + " kPa gauge is " + pct(set / mawp) + " of MAWP, above the "
                    + pct(maxSetFraction) + " limit (" + setRule + "); accepted because: "
                    + in.setAboveLimitReason().get());
        }

        double nonFireAccumulation;
        String nonFireText;
        if (in.deviceCount() == DeviceCount.SINGLE) {
            nonFireAccumulation = Math.max(SINGLE_FRACTION * mawp, SINGLE_MIN_PA);
            nonFireText = "max(10 % of MAWP, 20.7 kPa)";
        } else {
            nonFireAccumulation = Math.max(MULTIPLE_FRACTION * mawp, MULTIPLE_MIN_PA);
            nonFireText = "max(16 % of MAWP, 27.6 kPa)";
        }
        double accumulation;
        String accText;
        if (in.scenario() == ScenarioKind.FIRE) {
            double fire = FIRE_FRACTION * mawp;
            if (fire >= nonFireAccumulation) {
                accumulation = fire;
                accText = "fire: 21 % of MAWP";
            } else {
                accumulation = nonFireAccumulation;
                accText = "fire: 21 % of MAWP is below the non-fire allowance " + nonFireText
                        + ", the larger is used (reasoned, no source)";
                warnings.add("Fire accumulation of 21 % of MAWP is less than the non-fire allowance at this low "
                        + "MAWP; the non-fire allowance " + nonFireText + " was used (reasoned, no source).");
            }
        } else {
            accumulation = nonFireAccumulation;
            accText = (in.deviceCount() == DeviceCount.SINGLE ? "single device, non-fire: " : "multiple devices, "
                    + "non-fire: ") + nonFireText;
        }
        double maxAccumulated = mawp + accumulation;
        double overpressure = maxAccumulated - set;
        if (!(overpressure > 0)) {
            throw InvalidInputException.invalid("relief.setPressure", fmt(set) + " kPa gauge",
                    "expected below MAWP + accumulation = " + fmt(maxAccumulated) + " kPa gauge, so the device can "
                            + "open before the vessel exceeds its allowable accumulated pressure");
        }
        double p1 = maxAccumulated + in.atmosphericPa();
        String acc = accText;
        String setText = setRule;
        double atm = in.atmosphericPa();
        double acc1 = accumulation;
        // made when read: a screening run never prints it
        org.ventcase.common.LazyText rule = org.ventcase.common.LazyText.of(() -> String.format(Locale.US,
                "Accumulation on MAWP (%s) = %s kPa; P1 = MAWP + accumulation + Patm = %s + %s + %s = %s kPa abs; "
                        + "overpressure above set = %s kPa (%.2f %% of set); %s",
                acc, fmt(acc1), fmt(mawp), fmt(acc1), fmt(atm), fmt(p1),
                fmt(overpressure), 100 * overpressure / set, setText));
        return new RelievingPressureResult(p1, overpressure, 100 * overpressure / set, accumulation, maxAccumulated,
                maxSetFraction, rule, SOURCE, warnings);
    }

    /** A pressure in Pa as kPa with up to 6 significant digits, without trailing zeros: 1720000 -> "1720". */
    private static String fmt(double v) {
        return new java.math.BigDecimal(String.format(Locale.US, "%.6g", v / 1e3)).stripTrailingZeros().toPlainString();
    }

    private static String pct(double f) {
        return String.format(Locale.US, "%.1f %%", 100 * f);
    }

    /**
     * The calculation step of the relieving pressure, as every scenario prints it (one text for
     * all): P1 = MAWP + allowable accumulation + P_atm, with the overpressure above the set pressure.
     */
    public static org.ventcase.common.TraceStep step(RelievingPressureInput in, RelievingPressureResult rp) {
        return org.ventcase.common.TraceStep.of("Relieving pressure")
                .equation("P1 = MAWP + allowable accumulation + P_atm")
                .source(rp.source())
                .in("Set pressure", "%.1f kPa gauge", in.setPressureGaugePa() / 1e3)
                .in("MAWP", "%.1f kPa gauge", in.mawpGaugePa() / 1e3)
                .in("Atmospheric pressure", "%.3f kPa abs", in.atmosphericPa() / 1e3)
                .out("Accumulation", "%.1f kPa", rp.accumulationPa() / 1e3)
                .out("Overpressure above set", "%.1f kPa (%.1f %% of set)", rp.overpressurePa() / 1e3,
                        rp.overpressurePercentOfSet())
                .out("P1", "%.1f kPa abs", rp.relievingPressurePa() / 1e3)
                .note(rp.rule()).build();
    }
}
