package org.ventcase.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.Compositions;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.PureSaturation;
import org.ventcase.thermo.SaturationResult;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.LevelState;
import org.ventcase.vessel.Vessel;

/** Inventories: hand-calculation identities, a published LPG density, sums over vessels. */
class InventoryTest {

    /** Identities computed in double precision: only round-off separates the two sides. */
    static final double ROUND_OFF = 1e-12;

    /** An invented bullet at an invented site: 3.2 m inside diameter, 12 m shell, 2:1 heads. */
    static final Vessel BULLET = Vessel.horizontal(3.2, 12.0, Head.ellipsoidal2to1(3.2), Head.ellipsoidal2to1(3.2));
    static final FireExposure FIRE = FireExposure.atElevation(1.0);

    static Fluid fluid(String text, DensityBasis basis) {
        return Fluid.of(Compositions.parse("fluid.composition", text, false), EosVariant.PR78, basis);
    }

    static Fluid lpg() {
        return fluid("propane:0.95,n-butane:0.05", DensityBasis.TRANSLATED);
    }

    static Inventory blanketed() {
        Composition liquid = Compositions.parse("fluid.composition", "propane:0.95,n-butane:0.05", false);
        Composition vapour = Compositions.parse("storage.vapour", "nitrogen:0.9,propane:0.1", false);
        Fluid f = Fluid.withVapourSpace(liquid, vapour, EosVariant.PR78, DensityBasis.TRANSLATED);
        return Inventories.compute(f, new Storage.Specified(293.15, 10e5, vapour), BULLET,
                Level.ofPercentOfVolume(80), FIRE);
    }

    static Inventory gas() {
        return Inventories.compute(fluid("methane:0.9,ethane:0.1", DensityBasis.TRANSLATED),
                new Storage.GasFilled(293.15, 50e5), BULLET, Level.ofHeight(0), FIRE);
    }

    static Inventory saturatedLpg() {
        return Inventories.compute(lpg(), Storage.Saturated.at(288.15), BULLET, Level.ofPercentOfVolume(80), FIRE);
    }

    @Test
    void pureSaturatedStorageEqualsSaturationDensitiesTimesLevelVolumes() {
        Fluid f = fluid("propane", DensityBasis.TRANSLATED);
        Inventory inv = Inventories.compute(f, Storage.Saturated.at(298.15), BULLET, Level.ofPercentOfHeight(65), FIRE);
        SaturationResult s = new PureSaturation(CubicModel.pure(EosVariant.PR78,
                ComponentLibrary.builtIn().get("propane"))).atTemperature(298.15, DensityBasis.TRANSLATED);
        LevelState ls = LevelState.of(BULLET, Level.ofPercentOfHeight(65), FIRE);
        // Hand calculation: m_L = V_L rho_L,sat and m_V = V_V rho_V,sat, from the saturation and geometry
        // results computed independently here.
        assertEquals(ls.liquidVolume() * s.liquid().density(), inv.liquidMassKg(),
                ROUND_OFF * inv.liquidMassKg());
        assertEquals(ls.vapourVolume() * s.vapor().density(), inv.vapourMassKg(), ROUND_OFF * inv.vapourMassKg());
        assertEquals(s.pressurePa(), inv.pressurePa(), 0.0);
        assertEquals(DensityBasis.TRANSLATED, inv.liquid().orElseThrow().densityBasis());
        assertEquals(s.rackettLiquidDensity(), inv.rackettLiquidDensity().orElseThrow(), 0.0);
    }

    @Test
    void everyPhaseSatisfiesTheMassIdentitiesInEveryMode() {
        for (Inventory inv : List.of(saturatedLpg(), blanketed(), gas())) {
            List<PhaseInventory> phases = new java.util.ArrayList<>();
            inv.liquid().ifPresent(phases::add);
            phases.add(inv.vapour());
            double totalMass = 0;
            double totalMoles = 0;
            for (PhaseInventory p : phases) {
                // Hand calculation: m = V rho.
                assertEquals(p.volumeM3() * p.densityKgM3(), p.massKg(), ROUND_OFF * p.massKg(), inv.mode() + " " + p.phase());
                // Hand calculation: n M = m (M in kg/kmol, hence 1e-3).
                assertEquals(p.massKg(), p.moles() * p.molarMassKgKmol() * 1e-3, ROUND_OFF * p.massKg());
                // Hand calculation: sum of component masses = phase mass.
                double sum = p.massPerComponentKg().values().stream().mapToDouble(Double::doubleValue).sum();
                assertEquals(p.massKg(), sum, ROUND_OFF * p.massKg());
                // Hand calculation: M = sum x_i M_i.
                double mw = 0;
                for (int i = 0; i < p.composition().size(); i++) {
                    mw += p.composition().fraction(i) * p.composition().components().get(i).molarMass();
                }
                assertEquals(mw, p.molarMassKgKmol(), ROUND_OFF * mw);
                totalMass += p.massKg();
                totalMoles += p.moles();
            }
            // Hand calculation: totals are phase sums, per component too.
            assertEquals(totalMass, inv.totalMassKg(), ROUND_OFF * totalMass);
            assertEquals(totalMoles, inv.totalMoles(), ROUND_OFF * totalMoles);
            double perSum = inv.massPerComponentKg().values().stream().mapToDouble(Double::doubleValue).sum();
            assertEquals(inv.totalMassKg(), perSum, ROUND_OFF * perSum);
            // Hand calculation: the phase volumes fill the vessel.
            double v = phases.stream().mapToDouble(PhaseInventory::volumeM3).sum();
            assertEquals(BULLET.totalVolume(), v, ROUND_OFF * v);
            assertFalse(inv.trace().isEmpty());
        }
    }

    @Test
    void saturatedLpgMixtureDensityAgreesWithThePublishedComponentDensities() {
        // Source (from memory): GPA Standard 2145 relative densities of the liquids at 60 F / 60 F,
        // propane 0.5070 and n-butane 0.5840; water at 60 F 999.0 kg/m3. LPG density by ideal mixing of
        // the component liquid volumes, the calculation of ASTM D2598 (from memory).
        double t60F = (60 - 32) / 1.8 + 273.15;
        double rhoPropane = 0.5070 * 999.0;
        double rhoButane = 0.5840 * 999.0;
        double mP = 0.95 * 44.097;
        double mB = 0.05 * 58.123;
        // Hand calculation: rho = (m_P + m_B) / (m_P/rho_P + m_B/rho_B) = 511.0 kg/m3.
        double published = (mP + mB) / (mP / rhoPropane + mB / rhoButane);
        Inventory inv = Inventories.compute(lpg(), Storage.Saturated.at(t60F), BULLET, Level.ofPercentOfVolume(50), FIRE);
        double rho = inv.liquid().orElseThrow().densityKgM3();
        // Tolerance 4 %: the Peneloux-type PR shift puts light-hydrocarbon saturated liquids 2-4 % low at
        // Tr 0.6-0.85 (DEVELOPERS.md, saturation data test); the ideal-mixing reference adds well under 1 %.
        assertEquals(published, rho, 0.04 * published, "PR78 translated " + rho + " vs " + published);
        // Measured: 498.9 kg/m3, 2.4 % low. The deviation must be on the low side, as for pure propane.
        assertTrue(rho < published);
    }

    @Test
    void sumOfVesselsEqualsTheSumOfTheSingleResults() {
        List<Inventory> all = List.of(saturatedLpg(), blanketed(), gas());
        InventoryTotals t = InventoryTotals.sum(all);
        double m = 0;
        double ml = 0;
        double n = 0;
        Map<String, Double> per = new java.util.LinkedHashMap<>();
        for (Inventory inv : all) {
            m += inv.totalMassKg();
            ml += inv.liquidMassKg();
            n += inv.totalMoles();
            inv.massPerComponentKg().forEach((k, v) -> per.merge(k, v, Double::sum));
        }
        // Hand calculation: plain sums of the single results.
        assertEquals(m, t.totalMassKg(), ROUND_OFF * m);
        assertEquals(ml, t.liquidMassKg(), ROUND_OFF * ml);
        assertEquals(n, t.totalMoles(), ROUND_OFF * n);
        assertEquals(per.keySet(), t.massPerComponentKg().keySet());
        per.forEach((k, v) -> assertEquals(v, t.massPerComponentKg().get(k), ROUND_OFF * v, k));
        assertEquals(3, t.rows().size());
        assertEquals("vessel 2", t.rows().get(1).label());
        assertEquals(all.get(1).totalMassKg(), t.rows().get(1).totalMassKg(), 0.0);
        assertEquals(StorageMode.GAS, t.rows().get(2).mode());
        // Hand calculation: the methane in the sum comes from the gas vessel only.
        assertEquals(all.get(2).massPerComponentKg().get("methane"), t.massPerComponentKg().get("methane"), 0.0);
    }

    @Test
    void blanketVapourIsTheStatedCompositionAndTheLiquidHoldsNoNitrogen() {
        Inventory inv = blanketed();
        // Hand calculation: the liquid's nitrogen fraction is zero, so its nitrogen mass is zero.
        assertEquals(0.0, inv.liquid().orElseThrow().massPerComponentKg().get("nitrogen"), 0.0);
        // Hand calculation: vapour nitrogen mass fraction = 0.9 x 28.014 / (0.9 x 28.014 + 0.1 x 44.097) = 0.8511
        // (molar masses from the component table).
        PhaseInventory v = inv.vapour();
        double w = v.massPerComponentKg().get("nitrogen") / v.massKg();
        double mwN2 = ComponentLibrary.builtIn().get("nitrogen").molarMass();
        double mwC3 = ComponentLibrary.builtIn().get("propane").molarMass();
        assertEquals(0.9 * mwN2 / (0.9 * mwN2 + 0.1 * mwC3), w, 1e-12);
        assertTrue(inv.warnings().stream().noneMatch(s -> s.contains("flash")), inv.warnings().toString());
    }

    @Test
    void saturatedMixtureVapourIsRicherInTheLighterComponent() {
        Inventory inv = saturatedLpg();
        // Common practice, no source: the equilibrium vapour of a propane/n-butane liquid is richer in propane.
        assertTrue(inv.vapour().composition().fraction(0) > 0.95);
        // Hand calculation bounds: the bubble pressure lies between the components' vapour pressures at 15 C,
        // n-butane about 176 kPa and propane about 730 kPa (NIST WebBook, from memory).
        assertTrue(inv.pressurePa() > 176e3 && inv.pressurePa() < 732e3, "P = " + inv.pressurePa());
    }

    @Test
    void liquidFullCheckFindsTheTemperatureAtWhichTheLiquidFillsTheVessel() {
        Inventory inv = Inventories.compute(lpg(), new Storage.Saturated(288.15, OptionalDouble.of(18.25e5)), BULLET,
                Level.ofPercentOfVolume(93), FIRE);
        LiquidFullCheck c = inv.liquidFull().orElseThrow();
        assertTrue(c.fillsBeforeRelief());
        double tf = c.liquidFullTemperatureK().orElseThrow();
        assertTrue(tf > 288.15 && tf < c.relievingTemperatureK());
        // Hand calculation: at T_full the liquid mass at the bubble-point density fills V exactly.
        CubicModel model = inv.fluid().model();
        double[] x = inv.fluid().composition().fractions();
        double pb = new org.ventcase.thermo.mix.SaturationPoints(model).bubblePressure(tf, x).pressurePa();
        double rho = model.properties(tf, pb, x, org.ventcase.thermo.PhaseRequest.LIQUID, DensityBasis.TRANSLATED)
                .density();
        // Tolerance: bisection to 1e-4 K; d(ln rho)/dT of the liquid is about 3e-3 /K here, so 1e-6 relative.
        assertEquals(BULLET.totalVolume(), inv.liquidMassKg() / rho, 1e-5 * BULLET.totalVolume());
        assertTrue(inv.warnings().stream().anyMatch(w -> w.contains("expand to fill the vessel")), inv.warnings().toString());
        // Hand calculation: the vapour-neglected volume at T1 is m_L / rho_L(T1).
        assertEquals(inv.liquidMassKg() / c.liquidDensityAtReliefKgM3(), c.liquidVolumeAtReliefM3(), 1e-9);
    }

    @Test
    void liquidFullCheckPassesAtAModestFill() {
        Inventory inv = Inventories.compute(lpg(), new Storage.Saturated(288.15, OptionalDouble.of(18.25e5)), BULLET,
                Level.ofPercentOfVolume(50), FIRE);
        LiquidFullCheck c = inv.liquidFull().orElseThrow();
        assertFalse(c.fillsBeforeRelief());
        assertTrue(c.liquidFullTemperatureK().isEmpty());
        assertTrue(c.liquidVolumeAtReliefM3() < c.vesselVolumeM3());
        assertTrue(inv.warnings().stream().noneMatch(w -> w.contains("expand to fill")));
    }

    @Test
    void pureLiquidFullCheckUsesThePureSaturationCurve() {
        Fluid f = fluid("propane", DensityBasis.TRANSLATED);
        Inventory inv = Inventories.compute(f, new Storage.Saturated(288.15, OptionalDouble.of(18.25e5)), BULLET,
                Level.ofPercentOfVolume(93), FIRE);
        LiquidFullCheck c = inv.liquidFull().orElseThrow();
        PureSaturation sat = new PureSaturation(CubicModel.pure(EosVariant.PR78, ComponentLibrary.builtIn().get("propane")));
        // Hand calculation: T1 = Tsat(P1) from PureSaturation directly.
        assertEquals(sat.atPressure(18.25e5, DensityBasis.TRANSLATED).temperatureK(), c.relievingTemperatureK(), 1e-9);
        double tf = c.liquidFullTemperatureK().orElseThrow();
        double rho = sat.atTemperature(tf, DensityBasis.TRANSLATED).liquid().density();
        assertEquals(BULLET.totalVolume(), inv.liquidMassKg() / rho, 1e-5 * BULLET.totalVolume());
    }
}
