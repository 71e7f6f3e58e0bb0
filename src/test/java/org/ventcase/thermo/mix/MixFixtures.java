package org.ventcase.thermo.mix;

import java.util.ArrayList;
import java.util.List;

import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;

/** Models built from the built-in library with the built-in k_ij table. */
final class MixFixtures {
    private MixFixtures() {
    }

    static CubicModel model(EosVariant v, String... names) {
        List<Component> cs = new ArrayList<>();
        for (String n : names) {
            cs.add(ComponentLibrary.builtIn().get(n));
        }
        return new CubicModel(v, cs, KijTable.builtIn().matrix(cs, v).kij());
    }

    static CubicModel pr(String... names) {
        return model(EosVariant.PR78, names);
    }
}
