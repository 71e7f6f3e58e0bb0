package org.ventcase.thermo;

/**
 * The published correlations of the Soave slope m with the acentric factor omega. Kept in one
 * place so that no polynomial is written twice.
 */
public enum MCorrelation {
    /**
     * m = 0.480 + 1.574 omega - 0.176 omega^2.
     * Source: G. Soave, Chem. Eng. Sci. 27 (1972) 1197, eq. (13).
     */
    SOAVE_1972("Soave 1972") {
        @Override
        public double m(double w) {
            return 0.480 + w * (1.574 - 0.176 * w);
        }
    },
    /**
     * m = 0.37464 + 1.54226 omega - 0.26992 omega^2.
     * Source: D.-Y. Peng, D.B. Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59-64, eq. (18),
     * DOI 10.1021/i160057a011.
     */
    PENG_ROBINSON_1976("Peng-Robinson 1976") {
        @Override
        public double m(double w) {
            return 0.37464 + w * (1.54226 - 0.26992 * w);
        }
    },
    /**
     * The 1976 polynomial for omega <= 0.491, and
     * m = 0.379642 + 1.48503 omega - 0.164423 omega^2 + 0.016666 omega^3 above.
     * Source: D.B. Robinson, D.-Y. Peng, "The characterization of the heptanes and heavier
     * fractions for the GPA Peng-Robinson programs", GPA Research Report RR-28 (1978).
     */
    PENG_ROBINSON_1978("Peng-Robinson 1978 (GPA RR-28)") {
        @Override
        public double m(double w) {
            if (w <= 0.491) {
                return PENG_ROBINSON_1976.m(w);
            }
            return 0.379642 + w * (1.48503 + w * (-0.164423 + w * 0.016666));
        }
    };

    private final String citation;

    MCorrelation(String citation) {
        this.citation = citation;
    }

    /** m as a function of the acentric factor. */
    public abstract double m(double omega);

    public String citation() {
        return citation;
    }
}
