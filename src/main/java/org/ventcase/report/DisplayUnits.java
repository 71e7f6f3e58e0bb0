package org.ventcase.report;

import java.util.Locale;

import org.ventcase.common.PhysicalConstants;
import org.ventcase.units.CustomaryUnits;

/**
 * The one place where the sheet turns SI values of a result into display text: the unit system
 * chosen for the sheet first, the other in brackets where engineers expect both (pressures,
 * temperatures, relief loads, orifice areas, latent heat). Factors come from
 * {@link CustomaryUnits} (exact, NIST SP 811).
 */
public final class DisplayUnits {

    /** The kinds of quantity the sheet prints. */
    public enum Kind {
        PRESSURE_ABS, PRESSURE_GAUGE, PRESSURE_DIFFERENCE, TEMPERATURE, LENGTH, AREA, ORIFICE_AREA, VOLUME, MASS,
        MASS_FLOW, DENSITY, SPECIFIC_ENERGY, POWER, MOLAR_MASS, AMOUNT
    }

    private final UnitSystem system;

    public DisplayUnits(UnitSystem system) {
        this.system = java.util.Objects.requireNonNull(system, "system");
    }

    public UnitSystem system() {
        return system;
    }

    /** The value in this sheet's unit for the kind, e.g. kg/s to kg/h or lb/h. */
    public double value(Kind k, double si) {
        return convert(k, si, system);
    }

    /** The unit text in this sheet's system. */
    public String unit(Kind k) {
        return unit(k, system);
    }

    /** Value and unit in the sheet's system, with the other system in brackets where useful. */
    public String format(Kind k, double si) {
        String main = single(k, si, system);
        if (!bracketed(k)) {
            return main;
        }
        UnitSystem other = system == UnitSystem.SI ? UnitSystem.US : UnitSystem.SI;
        return main + " [" + single(k, si, other) + "]";
    }

    /**
     * How the vessel's descriptions and rule texts write lengths and areas in this system: SI as the
     * domain writes them ("3.2 m"); US customary in ft and ft2 with four significant digits.
     */
    public org.ventcase.vessel.Words words() {
        if (system == UnitSystem.SI) {
            return org.ventcase.vessel.Words.SI;
        }
        return new org.ventcase.vessel.Words(
                m -> String.format(Locale.ROOT, "%.4g ft", convert(Kind.LENGTH, m, UnitSystem.US)),
                a -> String.format(Locale.ROOT, "%.4g ft2", convert(Kind.AREA, a, UnitSystem.US)));
    }

    /** Value and unit in the sheet's system only. */
    public String plain(Kind k, double si) {
        return single(k, si, system);
    }

    private static boolean bracketed(Kind k) {
        switch (k) {
            case PRESSURE_ABS:
            case PRESSURE_GAUGE:
            case PRESSURE_DIFFERENCE:
            case TEMPERATURE:
            case ORIFICE_AREA:
            case MASS_FLOW:
            case SPECIFIC_ENERGY:
                return true;
            default:
                return false;
        }
    }

    private static String single(Kind k, double si, UnitSystem s) {
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException("not a finite " + k + " value: " + si);
        }
        // a no-break space keeps a number and its unit on one line
        return String.format(Locale.ROOT, "%." + decimals(k, s) + "f\u00A0%s", convert(k, si, s), unit(k, s));
    }

    /** An SI value of the kind in the system's display unit (package use: QuantityText). */
    static double convert(Kind k, double si, UnitSystem s) {
        boolean us = s == UnitSystem.US;
        switch (k) {
            case PRESSURE_ABS:
            case PRESSURE_GAUGE:
            case PRESSURE_DIFFERENCE:
                return us ? CustomaryUnits.paToPsi(si) : si / 1e3;
            case TEMPERATURE:
                return us ? CustomaryUnits.kToRankine(si) - 459.67 : si - PhysicalConstants.ZERO_CELSIUS_K;
            case LENGTH:
                return us ? si / CustomaryUnits.M_PER_FT : si;
            case AREA:
                return us ? si / CustomaryUnits.M2_PER_FT2 : si;
            case ORIFICE_AREA:
                return us ? si * 1e6 / CustomaryUnits.MM2_PER_IN2 : si * 1e6;
            case VOLUME:
                return us ? si / Math.pow(CustomaryUnits.M_PER_FT, 3) : si;
            case MASS:
                return us ? si / CustomaryUnits.KG_PER_LB : si;
            case MASS_FLOW:
                return us ? si * 3600 / CustomaryUnits.KG_PER_LB : si * 3600;
            case DENSITY:
                return us ? si * Math.pow(CustomaryUnits.M_PER_FT, 3) / CustomaryUnits.KG_PER_LB : si;
            case SPECIFIC_ENERGY:
                return us ? si / CustomaryUnits.J_PER_KG_PER_BTU_PER_LB : si / 1e3;
            case POWER:
                return us ? si / CustomaryUnits.W_PER_BTU_PER_H : si / 1e3;
            case MOLAR_MASS:
                return si; // kg/kmol and lb/lbmol are the same number
            case AMOUNT:
                return us ? si / CustomaryUnits.MOL_PER_LBMOL : si / 1e3;
            default:
                throw new IllegalStateException(k.name());
        }
    }

    private static String unit(Kind k, UnitSystem s) {
        boolean us = s == UnitSystem.US;
        switch (k) {
            case PRESSURE_ABS:
                return us ? "psia" : "kPa abs";
            case PRESSURE_GAUGE:
                return us ? "psig" : "kPa gauge";
            case PRESSURE_DIFFERENCE:
                return us ? "psi" : "kPa";
            case TEMPERATURE:
                return us ? "°F" : "°C";
            case LENGTH:
                return us ? "ft" : "m";
            case AREA:
                return us ? "ft2" : "m2";
            case ORIFICE_AREA:
                return us ? "in2" : "mm2";
            case VOLUME:
                return us ? "ft3" : "m3";
            case MASS:
                return us ? "lb" : "kg";
            case MASS_FLOW:
                return us ? "lb/h" : "kg/h";
            case DENSITY:
                return us ? "lb/ft3" : "kg/m3";
            case SPECIFIC_ENERGY:
                return us ? "Btu/lb" : "kJ/kg";
            case POWER:
                return us ? "Btu/h" : "kW";
            case MOLAR_MASS:
                return us ? "lb/lbmol" : "kg/kmol";
            case AMOUNT:
                return us ? "lbmol" : "kmol";
            default:
                throw new IllegalStateException(k.name());
        }
    }

    private static int decimals(Kind k, UnitSystem s) {
        boolean us = s == UnitSystem.US;
        switch (k) {
            case PRESSURE_ABS:
            case PRESSURE_GAUGE:
            case PRESSURE_DIFFERENCE:
                return us ? 2 : 1;
            case TEMPERATURE:
                return 2;
            case LENGTH:
                return 3;
            case AREA:
                return us ? 2 : 3;
            case ORIFICE_AREA:
                return us ? 4 : 1;
            case VOLUME:
                return us ? 1 : 3;
            case MASS:
            case MASS_FLOW:
            case POWER:
                return us ? 0 : 1;
            case DENSITY:
                return us ? 4 : 3;
            case SPECIFIC_ENERGY:
            case AMOUNT:
                return 2;
            default:
                return 3;
        }
    }
}
