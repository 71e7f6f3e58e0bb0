package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.MixParams;
import org.ventcase.thermo.PhaseRequest;

/**
 * Regression guards for the speed-ups in the mixture solvers (per-temperature parameters, root
 * choice without RootSelection, analytic Jacobians): the solutions they return must satisfy the
 * equilibrium conditions when those are re-evaluated by the straightforward path,
 * {@link CubicModel#mix(double, double[])} and {@link CubicModel#select}, which the solvers no
 * longer call. Equal fugacities are exact conditions of phase equilibrium (common practice, no
 * source); the tolerances follow from the solvers' own 1e-10 convergence criteria.
 */
class FastPathSolutionsTest {

    private final CubicModel five = MixFixtures.pr("methane", "ethane", "propane", "n-butane", "n-pentane");
    private final double[] z5 = {0.5, 0.15, 0.15, 0.1, 0.1};

    /** ln phi by the straightforward path: full mixing rule at T, root by select(). */
    private static double[] lnPhiSlow(CubicModel model, double t, double p, double[] x, PhaseRequest r) {
        MixParams m = model.mix(t, x);
        double z = model.select(m, p, r).z();
        double[] out = new double[x.length];
        model.lnPhi(m, p, z, out);
        return out;
    }

    private static void assertEqualFugacities(CubicModel model, double t, double p, double[] x, double[] y,
                                              PhaseRequest liq, PhaseRequest vap, double tol, String where) {
        double[] fl = lnPhiSlow(model, t, p, x, liq);
        double[] fv = lnPhiSlow(model, t, p, y, vap);
        for (int i = 0; i < x.length; i++) {
            double diff = Math.log(x[i]) + fl[i] - Math.log(y[i]) - fv[i];
            assertEquals(0.0, diff, tol, "ln f_L - ln f_V of component " + i + " " + where);
        }
    }

    @Test
    void flashSplitHasEqualFugacitiesByTheStraightforwardPath() {
        PTFlash flash = new PTFlash(five);
        for (double[] tp : new double[][] {{250, 3e6}, {300, 1e6}, {200, 1e5}, {330, 10.8e6}}) {
            FlashResult r = flash.flash(tp[0], tp[1], z5);
            assertTrue(r.twoPhase(), "two phases expected at " + tp[0] + " K, " + tp[1] + " Pa");
            double[] x = r.phases().get(0).composition();
            double[] y = r.phases().get(1).composition();
            assertEqualFugacities(five, tp[0], tp[1], x, y, PhaseRequest.STABLE, PhaseRequest.STABLE, 1e-8,
                    tp[0] + " K, " + tp[1] + " Pa");
        }
    }

    @Test
    void bubbleAndDewPointsHaveEqualFugacitiesByTheStraightforwardPath() {
        SaturationPoints sp = new SaturationPoints(five);
        SaturationPoint[] pts = {sp.bubblePressure(250, z5), sp.dewPressure(250, z5), sp.bubbleTemperature(3e6, z5),
            sp.dewTemperature(3e6, z5)};
        for (SaturationPoint s : pts) {
            boolean bubble = s.kind() == SaturationPoint.Kind.BUBBLE;
            double[] liq = bubble ? z5 : s.incipientComposition();
            double[] vap = bubble ? s.incipientComposition() : z5;
            assertEqualFugacities(five, s.temperatureK(), s.pressurePa(), liq, vap, PhaseRequest.LIQUID,
                    PhaseRequest.VAPOR, 1e-8, s.kind() + " at " + s.temperatureK() + " K, " + s.pressurePa() + " Pa");
        }
    }

    @Test
    void envelopePointsAreSaturationPointsByTheStraightforwardPath() {
        CubicModel ten = MixFixtures.pr("nitrogen", "carbon dioxide", "methane", "ethane", "propane", "isobutane",
                "n-butane", "n-pentane", "n-hexane", "n-heptane");
        double[] z = {0.02, 0.03, 0.6, 0.1, 0.08, 0.04, 0.04, 0.03, 0.03, 0.03};
        PhaseEnvelope.Result env = new PhaseEnvelope(ten).trace(z);
        SaturationPoints sp = new SaturationPoints(ten);
        int checked = 0;
        for (int k = 0; k < env.points().size(); k += 25) {
            PhaseEnvelope.Point pt = env.points().get(k);
            if (pt.pressurePa() > 5e6) {
                continue; // away from the critical region, where bubble/dew pressure at T is well defined
            }
            SaturationPoint s = pt.branch() == PhaseEnvelope.Branch.BUBBLE ? sp.bubblePressure(pt.temperatureK(), z)
                    : sp.dewPressure(pt.temperatureK(), z);
            // The envelope converges max |Delta X| < 1e-9 in ln P: 1e-7 relative covers both solvers.
            assertEquals(s.pressurePa(), pt.pressurePa(), 1e-7 * s.pressurePa(),
                    pt.branch() + " at " + pt.temperatureK() + " K");
            checked++;
        }
        assertTrue(checked >= 5, "points checked: " + checked);
    }
}
