package org.ventcase.thermo;

/**
 * The printable citation of a data row's source. The component table keeps its provenance as
 * written (source keys, and where a value was recalled rather than read, "from memory"); a sheet a
 * reviewer signs prints only what was verified: the source read, or the published table the value
 * was checked against, or says plainly that it is not verified. The keys are explained in the
 * header of components.csv.
 */
public final class Citations {

    private Citations() {
    }

    /** The citation of Tc, Pc, omega and M as printed. */
    public static String constants(Component c) {
        String s = c.criticalSource();
        if (s.startsWith("Poling2001-AppA-SecA (from memory; Tc/Pc/omega/M checked against Perry8-T2-141")) {
            return "checked against Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-141 (DIPPR)";
        }
        if (s.startsWith("Perry8-T2-141")) {
            return "Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-141 (DIPPR)";
        }
        if (s.startsWith("Poling2001-AppA-SecA")) {
            return "not checked against a published table (molar mass from the formula)";
        }
        return s; // a case's own component: the case's own words
    }

    /** The citation of the ideal-gas Cp polynomial as printed. */
    public static String cp(Component c) {
        String s = c.cp().source();
        if (s.startsWith("Poling2001-AppA-SecC")) {
            return "Poling, Prausnitz, O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), App. A Section C";
        }
        if (s.startsWith("Cp/R=5/2")) {
            return "Cp/R = 5/2, exact for a monatomic ideal gas";
        }
        if (s.startsWith("RPP1987-AppA")) {
            return "Reid, Prausnitz, Poling, The Properties of Gases and Liquids, 4th ed. (1987), App. A (coefficients "
                    + "not verified against the book)";
        }
        return s;
    }

    /** The citation of the Rackett compressibility as printed. */
    public static String rackett(Component c) {
        String s = c.rackettSource();
        if (s.startsWith("YamadaGunn1973")) {
            return "Yamada-Gunn correlation Z_RA = 0.29056 - 0.08775 omega (J. Chem. Eng. Data 18 (1973) 234)";
        }
        if (s.startsWith("SpencerDanner1972")) {
            return "Spencer and Danner (1972) Z_RA as tabulated by Reid, Prausnitz and Poling (1987), not verified "
                    + "against the table";
        }
        return s;
    }
}
