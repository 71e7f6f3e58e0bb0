package org.ventcase.units;

/** Physical dimensions that appear in Ventcase inputs, each with its SI unit inside the program. */
public enum Dimension {
    TEMPERATURE("K"),
    /** Absolute pressure; a person must always say gauge or absolute. */
    PRESSURE("Pa"),
    /** A pressure difference (no gauge/absolute meaning), e.g. an inlet loss. */
    PRESSURE_DIFFERENCE("Pa"),
    LENGTH("m"),
    AREA("m2"),
    VOLUME("m3"),
    MASS("kg"),
    MASS_FLOW("kg/s"),
    VOLUME_FLOW("m3/s"),
    POWER("W"),
    DENSITY("kg/m3"),
    SPECIFIC_ENERGY("J/kg"),
    VISCOSITY("Pa s"),
    THERMAL_CONDUCTIVITY("W/(m K)"),
    HEAT_TRANSFER_COEFFICIENT("W/(m2 K)"),
    MOLAR_MASS("kg/kmol"),
    ANGLE("deg"),
    /** A duration. */
    TIME("s");

    private final String siUnit;

    Dimension(String siUnit) {
        this.siUnit = siUnit;
    }

    /** The unit Ventcase uses internally for this dimension. */
    public String siUnit() {
        return siUnit;
    }

    /** A lower-case word for messages, e.g. "mass flow". */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
    }
}
