package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.ventcase.common.PhysicalConstants.R;

import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Thermodynamic identities that every variant must satisfy (exact relations of classical
 * thermodynamics; common practice, no source needed): residual enthalpy from the temperature
 * derivative of G^R/RT, Cv^R from dU^R/dT at constant volume, Cp - Cv from the P(T, v)
 * derivatives, Cp from dH/dT at constant P, fugacity coefficients as partial molar G^R/RT and
 * the summation identity, and the ideal-gas limit of the speed of sound.
 */
class CubicModelConsistencyTest {

    private static final double[] ONE = {1.0};

    /** (T, P, phase) states on both sides of saturation for the propane-like fixture. */
    private static final double[][] STATES = {
        {300, 1e5, 1}, {300, 3e6, 0}, {250, 2e6, 0}, {400, 2e6, 1}, {450, 1e7, 1}, {340, 5e5, 1},
    };

    private static PhaseRequest req(double flag) {
        return flag > 0.5 ? PhaseRequest.VAPOR : PhaseRequest.LIQUID;
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void residualEnthalpyIsMinusRT2TimesDerivativeOfGibbs(EosVariant v) {
        CubicModel model = CubicModel.pure(v, Fixtures.propaneLike());
        for (double[] s : STATES) {
            double t = s[0];
            double p = s[1];
            double h = 1e-4 * t;
            double gp = gr(model, t + h, p, req(s[2]));
            double gm = gr(model, t - h, p, req(s[2]));
            double expected = -R * t * t * (gp - gm) / (2 * h);
            MixParams m = model.mix(t, ONE);
            double z = model.select(m, p, req(s[2])).z();
            assertEquals(expected, model.residualEnthalpy(m, p, z), 1e-5 * (1 + Math.abs(expected)),
                    v + " at " + t + " K, " + p + " Pa");
        }
    }

    private static double gr(CubicModel model, double t, double p, PhaseRequest r) {
        MixParams m = model.mix(t, ONE);
        return model.reducedResidualGibbs(m, p, model.select(m, p, r).z());
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void heatCapacitiesAgreeWithFiniteDifferences(EosVariant v) {
        CubicModel model = CubicModel.pure(v, Fixtures.propaneLike());
        for (double[] s : STATES) {
            double t = s[0];
            double p = s[1];
            FluidProperties f = model.properties(t, p, ONE, req(s[2]), DensityBasis.CUBIC);
            double vol = f.molarVolumeCubic();
            double h = 1e-4 * t;
            // Cp = dH/dT at constant P, H = H_ig + H^R
            double hp = enthalpy(model, t + h, p, req(s[2]));
            double hm = enthalpy(model, t - h, p, req(s[2]));
            assertEquals((hp - hm) / (2 * h), f.cp(), 1e-5 * f.cp(), v + " Cp at " + t + ", " + p);
            // Cv = Cv_ig + dU^R/dT at constant v
            double up = internalEnergyResidual(model, t + h, vol);
            double um = internalEnergyResidual(model, t - h, vol);
            double cvIg = f.cpIdeal() - R;
            assertEquals(cvIg + (up - um) / (2 * h), f.cv(), 1e-5 * f.cv(), v + " Cv at " + t + ", " + p);
            // Cp - Cv = -T (dP/dT)_v^2 / (dP/dv)_T from P(T, v) itself
            double dv = 1e-6 * vol;
            double dPdT = (model.pressure(model.mix(t + h, ONE), vol) - model.pressure(model.mix(t - h, ONE), vol))
                    / (2 * h);
            MixParams m = model.mix(t, ONE);
            double dPdv = (model.pressure(m, vol + dv) - model.pressure(m, vol - dv)) / (2 * dv);
            assertEquals(-t * dPdT * dPdT / dPdv, f.cp() - f.cv(), 1e-5 * (f.cp() - f.cv()), v + " Cp-Cv");
        }
    }

    private static double enthalpy(CubicModel model, double t, double p, PhaseRequest r) {
        MixParams m = model.mix(t, ONE);
        double z = model.select(m, p, r).z();
        return Fixtures.CP.enthalpyChange(298.15, t) + model.residualEnthalpy(m, p, z);
    }

    private static double internalEnergyResidual(CubicModel model, double t, double vol) {
        MixParams m = model.mix(t, ONE);
        double p = model.pressure(m, vol);
        double z = p * vol / (R * t);
        return model.residualEnthalpy(m, p, z) - (p * vol - R * t);
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void speedOfSoundTendsToIdealGasAtLowPressure(EosVariant v) {
        Component c = Fixtures.propaneLike();
        CubicModel model = CubicModel.pure(v, c);
        double t = 400;
        FluidProperties f = model.properties(t, 10.0, ONE, PhaseRequest.VAPOR, DensityBasis.CUBIC);
        double cp = Fixtures.CP.cp(t);
        double k = cp / (cp - R);
        // Ideal gas: w = sqrt(k R T / M) (common practice, no source)
        assertEquals(Math.sqrt(k * R * t / (c.molarMass() * 1e-3)), f.speedOfSound(), 1e-4 * f.speedOfSound());
        assertEquals(k, f.isentropicExponent(), 1e-4);
        assertEquals(1.0, f.z(), 1e-5);
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void mixtureFugacityIsPartialMolarResidualGibbs(EosVariant v) {
        Component a = Fixtures.propaneLike();
        Component b = new Component("fixture-b", "", "", List.of(), 425.1, 3.8e6, 0.2, 58.1, 272.7,
                "test fixture, not data", Fixtures.CP, 0.2730, "test fixture, not data");
        Component c = new Component("fixture-c", "", "", List.of(), 190.6, 4.6e6, 0.011, 16.0, 111.7,
                "test fixture, not data", Fixtures.CP, 0.2892, "test fixture, not data");
        double[][] kij = {{0, 0.01, 0.03}, {0.01, 0, 0.02}, {0.03, 0.02, 0}};
        CubicModel model = new CubicModel(v, List.of(a, b, c), kij);
        double t = 320;
        double p = 3e6;
        double[] n = {0.5, 0.3, 0.2};
        for (PhaseRequest r : new PhaseRequest[] {PhaseRequest.LIQUID, PhaseRequest.VAPOR}) {
            MixParams m = model.mix(t, n);
            double z = model.select(m, p, r).z();
            double[] lnPhi = new double[3];
            model.lnPhi(m, p, z, lnPhi);
            double sum = 0;
            for (int i = 0; i < 3; i++) {
                sum += n[i] * lnPhi[i];
            }
            assertEquals(model.reducedResidualGibbs(m, p, z), sum, 1e-12, "summation identity");
            for (int i = 0; i < 3; i++) {
                double h = 1e-6;
                double[] np = n.clone();
                double[] nm = n.clone();
                np[i] += h;
                nm[i] -= h;
                double d = (totalGr(model, t, p, np, z) - totalGr(model, t, p, nm, z)) / (2 * h);
                assertEquals(d, lnPhi[i], 1e-6, v + " " + r + " component " + i);
            }
        }
    }

    /** n G^R/RT at a composition given as mole numbers, on the root nearest zNear. */
    private static double totalGr(CubicModel model, double t, double p, double[] moles, double zNear) {
        double nt = moles[0] + moles[1] + moles[2];
        double[] x = {moles[0] / nt, moles[1] / nt, moles[2] / nt};
        MixParams m = model.mix(t, x);
        double[] roots = model.roots(m, p).physical();
        double best = roots[0];
        for (double r : roots) {
            if (Math.abs(r - zNear) < Math.abs(best - zNear)) {
                best = r;
            }
        }
        return nt * model.reducedResidualGibbs(m, p, best);
    }

    @ParameterizedTest
    @EnumSource(EosVariant.class)
    void stableRootHasLowerGibbsEnergy(EosVariant v) {
        CubicModel model = CubicModel.pure(v, Fixtures.propaneLike());
        MixParams m = model.mix(300, ONE);
        for (double p : new double[] {2e5, 5e5, 1e6, 2e6, 4e6}) {
            CubicRoots r = model.roots(m, p);
            RootSelection s = model.select(m, p, PhaseRequest.STABLE);
            double gMin = Double.MAX_VALUE;
            for (double z : r.physical()) {
                gMin = Math.min(gMin, model.reducedResidualGibbs(m, p, z));
            }
            assertEquals(gMin, model.reducedResidualGibbs(m, p, s.z()), 1e-14, s.reason());
            assertTrue(s.reason().length() > 10);
        }
    }
}
