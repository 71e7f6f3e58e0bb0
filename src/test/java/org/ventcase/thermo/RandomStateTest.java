package org.ventcase.thermo;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Property-based: every variant at random valid (T, P) for every built-in component and random
 * fixtures gives finite results, roots that satisfy their cubic, and no exception.
 */
class RandomStateTest {

    @Test
    void everyVariantGivesFiniteConsistentPropertiesAtRandomStates() {
        Random rnd = new Random(2026);
        List<Component> comps = ComponentLibrary.builtIn().all();
        int checked = 0;
        for (int k = 0; k < 20_000; k++) {
            Component c = rnd.nextInt(4) == 0 ? Fixtures.random(rnd) : comps.get(rnd.nextInt(comps.size()));
            EosVariant v = EosVariant.values()[rnd.nextInt(EosVariant.values().length)];
            double t = c.tcK() * (0.3 + rnd.nextDouble() * 2.7);
            double p = Math.exp(Math.log(1e3) + rnd.nextDouble() * (Math.log(5e7) - Math.log(1e3)));
            PhaseRequest req = PhaseRequest.values()[rnd.nextInt(3)];
            CubicModel model = CubicModel.pure(v, c);
            FluidProperties f = model.properties(t, p, new double[] {1}, req, DensityBasis.TRANSLATED);
            String where = v + " " + c.name() + " T=" + t + " P=" + p + " " + req;
            assertTrue(f.z() > 0 && Double.isFinite(f.z()), where);
            assertTrue(f.density() > 0 && Double.isFinite(f.density()), where);
            assertTrue(Double.isFinite(f.lnPhi()[0]) && Double.isFinite(f.residualEnthalpy()), where);
            assertTrue(Double.isFinite(f.cp()) && Double.isFinite(f.cv()) && Double.isFinite(f.kReal()), where);
            assertTrue(Double.isFinite(f.speedOfSound()) || !f.warnings().isEmpty(), "NaN only with a warning: " + where);
            MixParams m = model.mix(t, new double[] {1});
            double aa = m.a() * p / Math.pow(8.314462618 * t, 2);
            double bb = m.b() * p / (8.314462618 * t);
            double u = v.sigma() + v.epsilon();
            double w = v.sigma() * v.epsilon();
            for (double z : f.roots().physical()) {
                double res = z * z * z + ((u - 1) * bb - 1) * z * z + (aa + w * bb * bb - u * bb * bb - u * bb) * z
                        - (aa * bb + w * bb * bb + w * bb * bb * bb);
                double scale = 1 + aa + bb + aa * bb;
                assertTrue(Math.abs(res) < 1e-10 * scale, "root residual " + res + " " + where);
                assertTrue(z > bb, where);
            }
            checked++;
        }
        assertTrue(checked == 20_000);
    }
}
