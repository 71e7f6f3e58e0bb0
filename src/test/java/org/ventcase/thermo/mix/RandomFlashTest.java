package org.ventcase.thermo.mix;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;

/**
 * PT flashes of random mixtures of 2-4 built-in components (all of them, polar ones included) at
 * random states from 200 to 500 K and 1 to 100 bar, with the default model, PR78 and SRK and the
 * built-in k_ij (fixed seed): none may fail to converge. A flash that has no answer by its method
 * (NoSolutionException, e.g. a state outside a component's range) is counted apart and must stay
 * rare. Invariant, no external values. The same generator runs longer in tools/fuzz_flash.sh.
 */
class RandomFlashTest {

    /** Flashes in the suite; the tool runs as many as asked (-Dventcase.fuzz.flashes). */
    static final int N = Integer.getInteger("ventcase.fuzz.flashes", 3000);

    @Test
    void randomFlashesNeverFailToConverge() {
        List<Component> all = ComponentLibrary.builtIn().all();
        Random rnd = new Random(Long.getLong("ventcase.fuzz.seed", 20261203L));
        EosVariant[] variants = {EosVariant.PRTWU, EosVariant.PR78, EosVariant.SRK};
        List<String> failures = new ArrayList<>();
        int noAnswer = 0;
        for (int k = 0; k < N; k++) {
            int n = 2 + rnd.nextInt(3);
            List<Component> cs = new ArrayList<>();
            while (cs.size() < n) {
                Component c = all.get(rnd.nextInt(all.size()));
                if (!cs.contains(c)) {
                    cs.add(c);
                }
            }
            double[] z = new double[n];
            double sum = 0;
            for (int i = 0; i < n; i++) {
                z[i] = 0.02 + rnd.nextDouble();
                sum += z[i];
            }
            for (int i = 0; i < n; i++) {
                z[i] /= sum;
            }
            EosVariant v = variants[rnd.nextInt(variants.length)];
            double t = 200 + 300 * rnd.nextDouble();
            double p = Math.exp(Math.log(1e5) + Math.log(100) * rnd.nextDouble());
            CubicModel m = new CubicModel(v, cs, KijTable.builtIn().matrix(cs, v).kij());
            try {
                new PTFlash(m).flash(t, p, z);
            } catch (NoSolutionException e) {
                noAnswer++;
            } catch (RuntimeException e) {
                StringBuilder f = new StringBuilder(v + " T=" + t + " P=" + p + " ");
                for (int i = 0; i < n; i++) {
                    f.append(cs.get(i).name()).append(':').append(z[i]).append(' ');
                }
                failures.add(f + e.getMessage());
            }
        }
        assertTrue(failures.isEmpty(), failures.size() + " of " + N + " failed:\n  "
                + String.join("\n  ", failures.subList(0, Math.min(10, failures.size()))));
        assertTrue(noAnswer < N / 100, noAnswer + " of " + N + " had no answer");
    }
}
