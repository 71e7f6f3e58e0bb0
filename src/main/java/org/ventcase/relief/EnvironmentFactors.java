package org.ventcase.relief;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.common.CsvTable;
import org.ventcase.common.InvalidInputException;

/**
 * The environment factors F for the wetted-vessel fire heat input, read from the resource
 * {@code environment_factors.csv} (each row with its source), and the general insulation formula.
 *
 * <p>General insulation credit (SI): F = (k / t) (904 - Tf) / 66,570, with k the thermal
 * conductivity of the insulation at the mean temperature, W/(m K); t its thickness, m; Tf the
 * temperature of the vessel contents at relieving conditions, C. US form: F = (k/t)(1660 - Tf)/21,000
 * with the conductance k/t in Btu/(h ft2 F) and Tf in F.
 *
 * <p>Source: API Std 521 5th ed. 2007 / ISO 23251:2006, environment factor clause (5.15.2.2.2,
 * number from memory). Status [M]: from memory, confirm against the standard. Note: 21,000
 * Btu/(h ft2) converts exactly to 66,246 W/m2, not 66,570, and 1660 F is 904.4 C; the SI and US
 * forms therefore differ by about 0.5 % (noticed here by exact conversion; which constant the
 * standard prints is not confirmed).
 */
public final class EnvironmentFactors {

    /** SI numerator temperature of the insulation formula, C [M]. */
    public static final double FIRE_TEMPERATURE_C = 904.0;
    /** SI denominator of the insulation formula, W/m2 [M]. */
    public static final double HEAT_FLUX_W_PER_M2 = 66_570.0;
    // The formula is from memory [M] (REFERENCES.md section 1): the warning says it is unverified.
    static final String FORMULA_WARNING = "The insulation environment factor F = (k/t)(904 - Tf)/66,570 has not been "
            + "verified against the current edition of API Std 521: confirm it against the standard before relying on "
            + "it. Insulation must resist fire-hose streams to take credit.";

    private static final String RESOURCE = "environment_factors.csv";
    private static final Map<String, EnvironmentFactor> TABLE = load();

    private EnvironmentFactors() {
    }

    /** All rows of the table, in file order. */
    public static List<EnvironmentFactor> all() {
        return List.copyOf(TABLE.values());
    }

    /** The row with {@code key}, e.g. {@code bare}, {@code insulated_5.68}, {@code earth_covered}. */
    public static EnvironmentFactor byKey(String key) {
        EnvironmentFactor f = TABLE.get(key == null ? "" : key.trim().toLowerCase(Locale.ROOT));
        if (f == null) {
            throw InvalidInputException.invalid("fire.environment", key, "expected one of " + TABLE.keySet());
        }
        return f;
    }

    /**
     * Insulation factor from the general formula F = (k/t)(904 - Tf)/66,570 [M]; carries a warning.
     *
     * @param conductivityWPerMK insulation thermal conductivity k, W/(m K)
     * @param thicknessM         insulation thickness t, m
     * @param contentsTempC      temperature of the contents at relieving conditions Tf, C
     */
    public static EnvironmentFactor insulation(double conductivityWPerMK, double thicknessM, double contentsTempC) {
        InvalidInputException.requirePositive("fire.insulation.conductivity", conductivityWPerMK, "W/(m K)");
        InvalidInputException.requirePositive("fire.insulation.thickness", thicknessM, "m");
        InvalidInputException.requireInRange("fire.insulation.contentsTemperature", contentsTempC, -273.15,
                FIRE_TEMPERATURE_C - 1e-9, "C");
        double conductance = conductivityWPerMK / thicknessM;
        double f = conductance * (FIRE_TEMPERATURE_C - contentsTempC) / HEAT_FLUX_W_PER_M2;
        if (!(f <= 1.0)) {
            throw InvalidInputException.invalid("fire.insulation", String.format(Locale.US,
                    "k/t = %.4g W/(m2 K)", conductance), "gives F > 1: no insulation credit; use the bare factor 1.0");
        }
        return new EnvironmentFactor("insulation_formula", String.format(Locale.US,
                "Insulated; F = (k/t)(904 - Tf)/66,570 with k/t = %.4g W/(m2 K), Tf = %.4g C", conductance,
                contentsTempC), OptionalDouble.of(conductance), f, "M",
                "API Std 521 / ISO 23251: environment factor of an insulated vessel (formula not verified, see the warning)",
                Optional.of(FORMULA_WARNING));
    }

    /** The same formula in US units: F = (k/t)(1660 - Tf)/21,000, k/t in Btu/(h ft2 F), Tf in F [M]. */
    public static double insulationUs(double conductanceBtuPerHFt2F, double contentsTempF) {
        InvalidInputException.requirePositive("fire.insulation.conductance", conductanceBtuPerHFt2F,
                "Btu/(h ft2 F)");
        InvalidInputException.requireInRange("fire.insulation.contentsTemperature", contentsTempF, -459.67,
                1660 - 1e-9, "F");
        return conductanceBtuPerHFt2F * (1660 - contentsTempF) / 21_000;
    }

    private static Map<String, EnvironmentFactor> load() {
        Map<String, EnvironmentFactor> map = new LinkedHashMap<>();
        for (CsvTable.Row row : CsvTable.resource(EnvironmentFactors.class, RESOURCE,
                CsvTable.LastColumn.REST_OF_LINE).rows()) {
            EnvironmentFactor f;
            try {
                f = new EnvironmentFactor(row.required("key"), row.required("description"),
                        row.optionalNumber("conductance_w_per_m2k"), row.number("f"), row.required("status"),
                        row.required("source"), Optional.empty());
            } catch (InvalidInputException e) {
                throw new IllegalStateException(RESOURCE + ": " + e.getMessage(), e);
            }
            if (map.put(f.key(), f) != null) {
                throw new IllegalStateException(row.where() + ": duplicate key " + f.key());
            }
        }
        return Collections.unmodifiableMap(map);
    }
}
