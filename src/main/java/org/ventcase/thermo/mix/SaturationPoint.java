package org.ventcase.thermo.mix;

import java.util.List;

/**
 * A bubble or dew point of a mixture.
 *
 * @param kind                 BUBBLE (feed is the liquid, incipient vapour) or DEW (feed is the
 *                             vapour, incipient liquid)
 * @param temperatureK         K
 * @param pressurePa           Pa absolute
 * @param feed                 feed mole fractions (copied)
 * @param incipientComposition mole fractions of the incipient phase (copied)
 * @param kValues              K_i = y_i/x_i (copied)
 * @param iterations           Newton iterations
 * @param warnings             what the user must know
 */
public record SaturationPoint(Kind kind, double temperatureK, double pressurePa, double[] feed,
                              double[] incipientComposition, double[] kValues, int iterations, List<String> warnings) {

    /** Which saturation point. */
    public enum Kind {
        BUBBLE("bubble"), DEW("dew");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    public SaturationPoint {
        feed = feed.clone();
        incipientComposition = incipientComposition.clone();
        kValues = kValues.clone();
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] feed() {
        return feed.clone();
    }

    @Override
    public double[] incipientComposition() {
        return incipientComposition.clone();
    }

    @Override
    public double[] kValues() {
        return kValues.clone();
    }
}
