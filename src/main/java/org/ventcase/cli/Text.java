package org.ventcase.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;

/** Plain-text layout for the headless commands: aligned label/value lines. */
final class Text {
    private final PrintWriter out;

    Text(PrintWriter out) {
        this.out = out;
    }

    void title(String s) {
        out.println(s);
        out.println("-".repeat(Math.min(s.length(), 100)));
    }

    void row(String label, String value) {
        out.printf(Locale.ROOT, "  %-30s %s%n", label, value);
    }

    void row(String label, String format, Object... args) {
        row(label, String.format(Locale.ROOT, format, args));
    }

    void blank() {
        out.println();
    }

    private boolean us;

    /** Prints warnings (written in SI by the calculation) leading with US units from now on. */
    Text us(boolean on) {
        this.us = on;
        return this;
    }

    void warnings(List<String> warnings) {
        if (warnings.isEmpty()) {
            return;
        }
        out.println();
        out.println("WARNINGS");
        for (String w : warnings) {
            out.println("  ! " + (us ? org.ventcase.report.QuantityText.usFirst(w) : w));
        }
    }

    static String roots(double[] z) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < z.length; i++) {
            sb.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.6g", z[i]));
        }
        return sb.toString();
    }

    static String pressure(double pa, double atm) {
        return String.format(Locale.ROOT, "%.5g kPa abs (%.5g bar abs, %.5g barg)", pa / 1e3, pa / 1e5,
                (pa - atm) / 1e5);
    }

    /** The sheet's no-break spaces (DisplayUnits) as plain spaces on a console. */
    static String plain(String s) {
        return s.replace('\u00A0', ' ');
    }

    static String temperature(double k) {
        return String.format(Locale.ROOT, "%.2f K (%.2f C)", k, k - 273.15);
    }

    /** The constants, alpha function and volume translation the model uses for a component, with sources. */
    static void modelRows(Text tx, org.ventcase.thermo.EosVariant v, org.ventcase.thermo.Component c) {
        modelRows(tx, v, c, null);
    }

    /** As {@link #modelRows(Text, org.ventcase.thermo.EosVariant, org.ventcase.thermo.Component)}, with the
     *  constants in the units of {@code u} when it is given and not SI. */
    static void modelRows(Text tx, org.ventcase.thermo.EosVariant v, org.ventcase.thermo.Component c,
                          org.ventcase.report.DisplayUnits u) {
        org.ventcase.thermo.EosVariant.ComponentModel d = v.describe(c);
        if (u != null && u.system() == org.ventcase.report.UnitSystem.US) {
            // molar mass: kg/kmol and lb/lbmol are the same number
            tx.row("Constants used", String.format(java.util.Locale.ROOT, "Tc %s, Pc %s, omega %.4f, M %.3f lb/lbmol",
                    plain(u.plain(org.ventcase.report.DisplayUnits.Kind.TEMPERATURE, d.constants().tcK())),
                    plain(u.plain(org.ventcase.report.DisplayUnits.Kind.PRESSURE_ABS, d.constants().pcPa())),
                    d.constants().omega(), c.molarMass()));
        } else {
            tx.row("Constants used", String.format(java.util.Locale.ROOT,
                    "Tc %.2f K, Pc %.4g kPa, omega %.4f, M %.3f kg/kmol", d.constants().tcK(),
                    d.constants().pcPa() / 1e3, d.constants().omega(), c.molarMass()));
        }
        boolean own = d.constants().source().equals(org.ventcase.thermo.Citations.constants(c));
        tx.row("Source of constants", d.constants().source()
                + (own ? "" : "; molar mass " + org.ventcase.thermo.Citations.constants(c)));
        tx.row("Alpha function", d.alpha());
        tx.row("Volume translation", d.translation());
    }
}
