package org.ventcase.casefile;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.ventcase.calc.CaseInput;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.DeviceSpec;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.mix.KijTable;

/**
 * Maps a {@link ValidatedCase} to the calculation's {@link CaseInput}: one-to-one, no numerics
 * beyond unit bookkeeping (a standard volumetric inflow is restated at 15 C and 101.325 kPa, the
 * same moles).
 *
 * <p>Interaction parameters: the pairs the case lists take its values and sources; the others the
 * built-in table's (zero with a warning where it has none). A specified storage's vapour space is
 * put over the union of the liquid's and the vapour's components.
 */
public final class CaseInputs {

    private CaseInputs() {
    }

    /** The calculation input of a validated case. */
    public static CaseInput from(ValidatedCase vc) {
        ValidatedCase.FluidModel fm = vc.fluid();
        ValidatedCase.StorageState st = vc.storage();
        Composition liquid = composition(fm.composition());
        List<Component> all = liquid.components();
        Composition vapour = null;
        if (st.vapourComposition().isPresent()) {
            vapour = composition(st.vapourComposition().get());
            all = Composition.union(liquid, vapour);
        }
        Fluid fluid = new Fluid(liquid.over("fluid.components", all), fm.eos(), kij(fm, all), fm.densityBasis());
        Storage storage = switch (st.mode()) {
            case SATURATED -> Storage.Saturated.at(st.temperatureK());
            case SPECIFIED -> new Storage.Specified(st.temperatureK(), st.pressurePa().orElseThrow(),
                    vapour == null ? fluid.composition() : vapour.over("storage.vapourComposition", all));
            case GAS_FILLED -> new Storage.GasFilled(st.temperatureK(), st.pressurePa().orElseThrow());
        };
        List<String> warnings = new ArrayList<>(vc.warnings());
        if (st.mode() == ValidatedCase.StorageMode.SPECIFIED && vapour == null) {
            warnings.add("Specified storage without a vapour composition: the vapour space is taken to hold the "
                    + "liquid's composition.");
        }
        ValidatedCase.DeviceSpec d = vc.device();
        OptionalDouble mdmt = vc.site().minimumDesignMetalTemperatureK();
        DeviceSpec gas = new DeviceSpec(d.totalBackPressurePa(), d.kd(), d.kb(), d.kc(), mdmt);
        DeviceSpec liq = new DeviceSpec(d.totalBackPressurePa(), d.kdLiquid(), 1.0, d.kc(), mdmt);
        CaseInput.Device device = new CaseInput.Device(gas, liq, d.viscosityCorrection(),
                d.valveType() == ValidatedCase.ValveType.BALANCED_BELLOWS);
        List<CaseInput.Scenario> scenarios = vc.scenarios();
        return new CaseInput(vc.identity().title(), vc.identity().tag(), vc.inputHash(), fluid, storage,
                vc.vessel().vessel(), st.level(), vc.vessel().exposure(), scenarios, device, warnings);
    }

    private static Composition composition(ValidatedCase.Composition c) {
        return new Composition(c.components(), c.fractions());
    }

    private static KijTable.Matrix kij(ValidatedCase.FluidModel fm, List<Component> all) {
        Map<KijTable.Pair, Double> overrides = new HashMap<>();
        Map<KijTable.Pair, String> sources = new HashMap<>();
        List<Component> cs = fm.composition().components();
        for (ValidatedCase.KijEntry e : fm.kij()) {
            KijTable.Pair p = KijTable.Pair.of(cs.get(e.i()).name(), cs.get(e.j()).name());
            overrides.put(p, e.value());
            sources.put(p, e.source());
        }
        KijTable.Matrix m = KijTable.builtIn().matrix(all, fm.eos(), overrides);
        String[][] src = m.sources();
        for (int i = 0; i < all.size(); i++) {
            for (int j = 0; j < all.size(); j++) {
                String s = sources.get(KijTable.Pair.of(all.get(i).name(), all.get(j).name()));
                if (i != j && s != null) {
                    src[i][j] = "case file: " + s;
                }
            }
        }
        List<String> warnings = new ArrayList<>();
        for (String w : m.warnings()) {
            if (!w.endsWith("set by the case (override)")) {
                warnings.add(w);
            }
        }
        return new KijTable.Matrix(m.kij(), src, warnings);
    }
}
