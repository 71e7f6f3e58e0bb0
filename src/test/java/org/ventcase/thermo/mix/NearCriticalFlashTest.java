package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;

/**
 * The PT flash converges close to a mixture critical point, where the Gibbs-energy Hessian is
 * not positive definite away from the solution (the case that needed the restricted-step
 * safeguard). Checked by the exact conditions of a solution: material balance and equal
 * fugacities (common practice, no source).
 */
class NearCriticalFlashTest {

    @Test
    void flashConvergesNearTheCriticalPointOfAFiveComponentGas() {
        List<Component> cs = new ArrayList<>();
        for (String n : new String[] {"methane", "ethane", "propane", "n-butane", "n-pentane"}) {
            cs.add(ComponentLibrary.builtIn().get(n));
        }
        CubicModel model = new CubicModel(EosVariant.PR78, cs, KijTable.builtIn().matrix(cs, EosVariant.PR78).kij());
        double[] z = {0.5, 0.15, 0.15, 0.1, 0.1};
        PTFlash flash = new PTFlash(model);
        // This feed's PR78 critical point is near 342.8 K, 10.66 MPa (PhaseEnvelope of the same model).
        for (double t : new double[] {335, 338, 340, 341, 342}) {
            for (double p : new double[] {10.0e6, 10.5e6, 10.6e6}) {
                FlashResult f = flash.flash(t, p, z);
                assertTrue(f.twoPhase(), t + " K " + p + " Pa");
                double beta = f.vaporFraction();
                double[] x = f.phases().get(0).composition();
                double[] y = f.phases().get(1).composition();
                double[] lx = f.phases().get(0).lnPhi();
                double[] ly = f.phases().get(1).lnPhi();
                for (int i = 0; i < z.length; i++) {
                    assertEquals(z[i], (1 - beta) * x[i] + beta * y[i], 1e-10, "material balance " + i);
                    assertEquals(Math.log(x[i]) + lx[i], Math.log(y[i]) + ly[i], 1e-8, "equal fugacity " + i);
                }
            }
        }
    }
}
