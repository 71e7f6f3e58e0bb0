package org.ventcase.casefile;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.ventcase.common.PhysicalConstants;

/**
 * Gas flows stated as volumes at standard reference conditions, converted to a molar flow by the
 * ideal-gas law, which is how a standard volume is defined: n = p_ref V / (R T_ref).
 *
 * <p>Reference conditions (common practice, no source beyond the definitions named):
 * <ul>
 *   <li>{@code Nm3/h}, {@code Nm3/s}, {@code Nm3/d}: 0 C and 101.325 kPa ("normal" conditions, DIN 1343);</li>
 *   <li>{@code Sm3/h}, {@code Sm3/s}, {@code Sm3/d}: 15 C and 101.325 kPa (ISO 13443 standard conditions);</li>
 *   <li>{@code scfm}, {@code scfh}, {@code scfd}, {@code MMSCFD}: 60 F and 14.696 psia (US gas-industry practice).</li>
 * </ul>
 */
public final class StandardFlow {

    /** One unit: cubic metres per second per unit, reference temperature K, reference pressure Pa. */
    private record Ref(double m3PerSPerUnit, double tK, double pPa, String basis) {
    }

    private static final double FT3 = 0.3048 * 0.3048 * 0.3048;
    private static final double PSI = 6894.757293168361;
    private static final Map<String, Ref> UNITS = new LinkedHashMap<>();

    static {
        String n = "0 C, 101.325 kPa";
        String s = "15 C, 101.325 kPa";
        String us = "60 F, 14.696 psia";
        double t0 = PhysicalConstants.ZERO_CELSIUS_K;
        double t15 = t0 + 15;
        double t60f = (60 + 459.67) * 5.0 / 9.0;
        double pUs = 14.696 * PSI;
        UNITS.put("nm3/h", new Ref(1.0 / 3600, t0, PhysicalConstants.ATM_PA, n));
        UNITS.put("nm3/s", new Ref(1.0, t0, PhysicalConstants.ATM_PA, n));
        UNITS.put("nm3/d", new Ref(1.0 / 86400, t0, PhysicalConstants.ATM_PA, n));
        UNITS.put("sm3/h", new Ref(1.0 / 3600, t15, PhysicalConstants.ATM_PA, s));
        UNITS.put("sm3/s", new Ref(1.0, t15, PhysicalConstants.ATM_PA, s));
        UNITS.put("sm3/d", new Ref(1.0 / 86400, t15, PhysicalConstants.ATM_PA, s));
        UNITS.put("scfm", new Ref(FT3 / 60, t60f, pUs, us));
        UNITS.put("scfh", new Ref(FT3 / 3600, t60f, pUs, us));
        UNITS.put("scfd", new Ref(FT3 / 86400, t60f, pUs, us));
        UNITS.put("mmscfd", new Ref(1e6 * FT3 / 86400, t60f, pUs, us));
    }

    private static final Pattern QUANTITY = Pattern.compile(
            "^\\s*([-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(\\S.*?)\\s*$");

    /**
     * A standard volumetric flow.
     *
     * @param molPerS      molar flow, mol/s
     * @param standardM3PerS the flow in cubic metres per second at its reference conditions
     * @param basis        the reference conditions in words
     */
    public record Flow(double molPerS, double standardM3PerS, String basis) {
    }

    private StandardFlow() {
    }

    /** The units accepted, for messages. */
    public static String units() {
        return "Nm3/h, Nm3/s, Nm3/d, Sm3/h, Sm3/s, Sm3/d, scfm, scfh, scfd, MMSCFD";
    }

    /** Parses "850 Nm3/h"; empty when the text is not a standard volumetric flow. */
    public static Optional<Flow> parse(String text) {
        if (text == null) {
            return Optional.empty();
        }
        Matcher m = QUANTITY.matcher(text);
        if (!m.matches()) {
            return Optional.empty();
        }
        Ref r = UNITS.get(m.group(2).toLowerCase(Locale.ROOT).replace(" ", ""));
        if (r == null) {
            return Optional.empty();
        }
        double v = Double.parseDouble(m.group(1));
        double m3s = v * r.m3PerSPerUnit();
        return Optional.of(new Flow(r.pPa() * m3s / (PhysicalConstants.R * r.tK()), m3s, r.basis()));
    }
}
