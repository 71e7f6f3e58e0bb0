package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;
import org.ventcase.device.OmegaMethod;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.mix.FlashResult;
import org.ventcase.thermo.mix.MixturePhase;
import org.ventcase.thermo.mix.PTFlash;
import org.ventcase.thermo.mix.StateFlash;

/**
 * The omega parameter of a relief inlet from the equation of state, by the two-point method: the
 * mixture's specific volume at the inlet (T0, P0) and after an isentropic flash to 0.9 P0, then
 * omega = 9 (v9 / v0 - 1) ({@link OmegaMethod#omega}). Works for a saturated liquid, a two-phase
 * inlet and a vapour alike, for one component or many, with the case's model (the volumes on the
 * model's density basis, translated by default).
 *
 * <p>Not yet used by a scenario (issue 17 wires it into the fire case's two-phase check).
 *
 * @param v0    inlet specific volume, m3/kg
 * @param v9    specific volume after the isentropic flash to 0.9 P0, m3/kg
 * @param t9    temperature after that flash, K
 * @param omega omega
 */
public record TwoPointOmega(double v0, double v9, double t9, double omega) {

    /** The two-point omega of the feed {@code z} at (t0, p0) with {@code model}. */
    public static TwoPointOmega of(CubicModel model, double t0, double p0, double[] z) {
        InvalidInputException.requirePositive("twoPhase.p0", p0, "Pa abs");
        FlashResult in = new PTFlash(model).flash(t0, p0, z);
        FlashResult out = new StateFlash(model).ps(0.9 * p0, in.entropyJmolK(), z, t0);
        double v0 = specificVolume(in);
        double v9 = specificVolume(out);
        return new TwoPointOmega(v0, v9, out.temperatureK(), OmegaMethod.omega(v0, v9));
    }

    /** m3/kg of the whole feed: sum over phases of amount x molar volume, over the feed's mass. */
    static double specificVolume(FlashResult r) {
        double v = 0;
        for (MixturePhase ph : r.phases()) {
            v += ph.amount() * ph.molarVolume();
        }
        return v / (r.molarMass() / 1e3);
    }
}
