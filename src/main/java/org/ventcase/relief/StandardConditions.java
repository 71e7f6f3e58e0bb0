package org.ventcase.relief;

import org.ventcase.common.PhysicalConstants;

/**
 * Reference conditions of a standard volumetric gas flow. The default in Ventcase is
 * {@link #STANDARD_15C} (15 C and 101.325 kPa, the ISO 13443 metric standard conditions);
 * {@link #NORMAL_0C} is the "normal" cubic metre (0 C, 101.325 kPa). The molar volume is the
 * ideal-gas one, R T / P (common practice for standard volumes: 23.645 and 22.414 m3/kmol).
 */
public enum StandardConditions {
    /** 15 C, 101.325 kPa (default). */
    STANDARD_15C(288.15, PhysicalConstants.ATM_PA, "standard: 15 C, 101.325 kPa"),
    /** 0 C, 101.325 kPa ("normal" conditions, Nm3). */
    NORMAL_0C(273.15, PhysicalConstants.ATM_PA, "normal: 0 C, 101.325 kPa");

    private final double temperatureK;
    private final double pressurePa;
    private final String label;

    StandardConditions(double temperatureK, double pressurePa, String label) {
        this.temperatureK = temperatureK;
        this.pressurePa = pressurePa;
        this.label = label;
    }

    public double temperatureK() {
        return temperatureK;
    }

    public double pressurePa() {
        return pressurePa;
    }

    public String label() {
        return label;
    }

    /** Ideal-gas molar volume at these conditions, m3/mol. */
    public double molarVolume() {
        return PhysicalConstants.R * temperatureK / pressurePa;
    }
}
