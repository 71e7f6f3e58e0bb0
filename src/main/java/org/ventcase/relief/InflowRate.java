package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;

/**
 * The maximum inflow of a blocked-outlet case: a mass flow, or a standard volumetric gas flow at
 * stated reference conditions.
 *
 * @param value     kg/s for {@link Kind#MASS}, m3/s at the reference conditions for
 *                  {@link Kind#STANDARD_VOLUME}
 * @param kind      which
 * @param standard  the reference conditions of a standard volume (ignored for a mass flow;
 *                  default {@link StandardConditions#STANDARD_15C})
 */
public record InflowRate(double value, Kind kind, StandardConditions standard) {

    /** Mass or standard volume. */
    public enum Kind {
        MASS, STANDARD_VOLUME
    }

    public InflowRate {
        if (kind == null) {
            throw InvalidInputException.missing("blockedOutlet.inflow.kind", "expected MASS or STANDARD_VOLUME");
        }
        InvalidInputException.requirePositive("blockedOutlet.inflow.value", value,
                kind == Kind.MASS ? "kg/s" : "m3/s at reference conditions");
        if (standard == null) {
            standard = StandardConditions.STANDARD_15C;
        }
    }

    /** A mass flow, kg/s. */
    public static InflowRate mass(double kgPerS) {
        return new InflowRate(kgPerS, Kind.MASS, StandardConditions.STANDARD_15C);
    }

    /** A standard volumetric gas flow, m3/s at the given reference conditions. */
    public static InflowRate standardVolume(double m3PerS, StandardConditions standard) {
        return new InflowRate(m3PerS, Kind.STANDARD_VOLUME, standard);
    }

    /** Mass flow for a gas of molar mass M (kg/kmol), kg/s. */
    public double massFlowKgPerS(double molarMass) {
        return kind == Kind.MASS ? value : value / standard.molarVolume() * molarMass * 1e-3;
    }
}
