package org.ventcase.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.ventcase.inventory.InventoryTest.BULLET;
import static org.ventcase.inventory.InventoryTest.FIRE;
import static org.ventcase.inventory.InventoryTest.fluid;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;
import org.ventcase.thermo.Composition;
import org.ventcase.thermo.Compositions;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.Level;

/** Each warning provoked by a case; each bad input named by its field. */
class InventoryWarningsTest {

    static boolean has(Inventory inv, String text) {
        return inv.warnings().stream().anyMatch(w -> w.contains(text));
    }

    static Inventory specified(String liquid, String vapour, double t, double p) {
        Composition l = Compositions.parse("fluid.composition", liquid, false);
        Composition v = Compositions.parse("storage.vapour", vapour, false);
        Fluid f = Fluid.withVapourSpace(l, v, EosVariant.PR78, DensityBasis.TRANSLATED);
        return Inventories.compute(f, new Storage.Specified(t, p, v), BULLET, Level.ofPercentOfVolume(80), FIRE);
    }

    @Test
    void lessThanFivePercentVapourSpaceIsWarned() {
        Inventory full = Inventories.compute(InventoryTest.lpg(), Storage.Saturated.at(288.15), BULLET,
                Level.ofPercentOfVolume(96), FIRE);
        assertTrue(has(full, "vapour space (outage)"), full.warnings().toString());
        Inventory ok = Inventories.compute(InventoryTest.lpg(), Storage.Saturated.at(288.15), BULLET,
                Level.ofPercentOfVolume(94), FIRE);
        assertTrue(!has(ok, "outage"), ok.warnings().toString());
    }

    @Test
    void mixtureAbovePseudoCriticalTemperatureIsWarnedWhereABubblePointExists() {
        // Hand calculation: Kay's rule 0.3 x 190.56 + 0.7 x 469.7 = 385.96 K (component Tc from the table).
        Inventory inv = Inventories.compute(fluid("methane:0.3,n-pentane:0.7", DensityBasis.TRANSLATED),
                Storage.Saturated.at(400), BULLET, Level.ofPercentOfVolume(50), FIRE);
        assertTrue(has(inv, "pseudo-critical temperature"), inv.warnings().toString());
    }

    @Test
    void saturatedStorageWithoutABubblePointSaysSoInsteadOfANumber() {
        // Common practice, no source: a 50/50 ethane-propane liquid has no bubble point at 400 K, well above
        // both components' critical temperatures (305 K and 370 K).
        NoSolutionException e = assertThrows(NoSolutionException.class, () -> Inventories.compute(
                fluid("ethane:0.5,propane:0.5", DensityBasis.TRANSLATED), Storage.Saturated.at(400), BULLET,
                Level.ofPercentOfVolume(50), FIRE));
        assertEquals("storage.temperature", e.field());
        assertTrue(e.getMessage().contains("no bubble point"), e.getMessage());
        assertTrue(e.getMessage().contains("pseudo-critical"), e.getMessage());
    }

    @Test
    void pureSaturatedStorageAboveTheCriticalTemperatureIsNoSolution() {
        // Source (from memory): propane Tc = 369.8 K.
        NoSolutionException e = assertThrows(NoSolutionException.class, () -> Inventories.compute(
                fluid("propane", DensityBasis.TRANSLATED), Storage.Saturated.at(380), BULLET,
                Level.ofPercentOfVolume(50), FIRE));
        assertEquals("storage.temperature", e.field());
        assertTrue(e.getMessage().contains("critical temperature"), e.getMessage());
    }

    @Test
    void liquidBelowItsVapourPressureIsWarnedToFlash() {
        // Source (from memory): propane's vapour pressure at 20 C is about 836 kPa (NIST WebBook); 5 bar is below.
        Inventory inv = specified("propane", "nitrogen:0.9,propane:0.1", 293.15, 5e5);
        assertTrue(has(inv, "The liquid would flash"), inv.warnings().toString());
        Inventory ok = specified("propane", "nitrogen:0.9,propane:0.1", 293.15, 10e5);
        assertTrue(!has(ok, "flash"), ok.warnings().toString());
    }

    @Test
    void mixtureLiquidBelowItsBubblePressureIsWarnedToFlash() {
        Inventory inv = specified("propane:0.95,n-butane:0.05", "nitrogen", 293.15, 5e5);
        assertTrue(has(inv, "The liquid would flash"), inv.warnings().toString());
    }

    @Test
    void gasAboveItsVapourPressureIsWarnedToCondense() {
        // Source (from memory): propane's vapour pressure at 20 C is about 836 kPa; 10 bar is above it.
        Inventory pure = Inventories.compute(fluid("propane", DensityBasis.TRANSLATED),
                new Storage.GasFilled(293.15, 10e5), BULLET, Level.ofHeight(0), FIRE);
        assertTrue(has(pure, "would condense"), pure.warnings().toString());
        // Common practice, no source: a 50/50 propane/n-butane gas at 20 C condenses at 5 bar (its dew
        // pressure lies between the n-butane and propane vapour pressures, about 2 and 8.4 bar).
        Inventory mix = Inventories.compute(fluid("propane:0.5,n-butane:0.5", DensityBasis.TRANSLATED),
                new Storage.GasFilled(293.15, 5e5), BULLET, Level.ofHeight(0), FIRE);
        assertTrue(has(mix, "would condense"), mix.warnings().toString());
        Inventory dry = InventoryTest.gas();
        assertTrue(!has(dry, "condense"), dry.warnings().toString());
        assertTrue(dry.liquid().isEmpty());
    }

    @Test
    void rackettCrossCheckWarnsOnTheCubicBasisForAPureLiquid() {
        // Measured: the raw PR78 liquid density of propane at 20 C is about 5 % above the Rackett value.
        Composition l = Compositions.parse("fluid.composition", "propane", false);
        Composition v = Compositions.parse("storage.vapour", "nitrogen", false);
        Fluid f = Fluid.withVapourSpace(l, v, EosVariant.PR78, DensityBasis.CUBIC);
        Inventory inv = Inventories.compute(f, new Storage.Specified(293.15, 10e5, v), BULLET,
                Level.ofPercentOfVolume(80), FIRE);
        assertTrue(has(inv, "Rackett"), inv.warnings().toString());
        assertEquals(DensityBasis.CUBIC, inv.liquid().orElseThrow().densityBasis());
        assertTrue(inv.rackettLiquidDensity().isPresent());
    }

    @Test
    void liquidFullCheckThatCannotBeMadeIsWarnedNotHidden() {
        // Source (from memory): propane Pc = 4.248 MPa; 45 bar abs is above it, so there is no bubble point.
        Inventory inv = Inventories.compute(fluid("propane", DensityBasis.TRANSLATED),
                new Storage.Saturated(293.15, OptionalDouble.of(45e5)), BULLET, Level.ofPercentOfVolume(50), FIRE);
        assertTrue(inv.liquidFull().isEmpty());
        assertTrue(has(inv, "liquid-full check against the relieving pressure could not be made"),
                inv.warnings().toString());
    }

    @Test
    void defaultedInteractionParametersAreWarned() {
        Inventory inv = Inventories.compute(fluid("propane:0.95,n-butane:0.05", DensityBasis.TRANSLATED),
                Storage.Saturated.at(288.15), BULLET, Level.ofPercentOfVolume(50), FIRE);
        boolean tabled = inv.fluid().kij().sources()[0][1].startsWith("Knapp");
        assertEquals(!tabled, has(inv, "k_ij(propane, n-butane) = 0 assumed"), inv.warnings().toString());
    }

    // ------------------------------------------------------------------ bad input

    @Test
    void badInputNamesTheField() {
        record Case(String field, Runnable r) {
        }
        Fluid lpg = InventoryTest.lpg();
        List<Case> cases = List.of(
                new Case("storage.temperature", () -> Storage.Saturated.at(Double.NaN)),
                new Case("storage.temperature", () -> new Storage.GasFilled(-5, 1e5)),
                new Case("storage.pressure", () -> new Storage.GasFilled(300, 0)),
                new Case("storage.pressure", () -> new Storage.Specified(300, Double.NaN,
                        Composition.pure(lpg.components().get(0)))),
                new Case("storage.vapour", () -> new Storage.Specified(300, 1e5, null)),
                new Case("storage.relievingPressure", () -> new Storage.Saturated(300, OptionalDouble.of(-1))),
                new Case("storage.relievingPressure", () -> Inventories.compute(lpg,
                        new Storage.Saturated(288.15, OptionalDouble.of(2e5)), BULLET, Level.ofPercentOfVolume(50), FIRE)),
                new Case("vessel.level", () -> Inventories.compute(lpg, new Storage.GasFilled(300, 1e5), BULLET,
                        Level.ofPercentOfVolume(50), FIRE)),
                new Case("storage.vapour[0]", () -> Inventories.compute(lpg, new Storage.Specified(293.15, 10e5,
                        Compositions.parse("storage.vapour", "nitrogen", false)), BULLET, Level.ofPercentOfVolume(50), FIRE)),
                new Case("fluid", () -> Inventories.compute(null, Storage.Saturated.at(300), BULLET,
                        Level.ofPercentOfVolume(50), FIRE)),
                new Case("fluid.composition[1]", () -> Compositions.parse("fluid.composition",
                        "propane:0.5,unobtainium:0.5", false)));
        for (Case c : cases) {
            InvalidInputException e = assertThrows(InvalidInputException.class, c.r()::run, c.field());
            assertEquals(c.field(), e.field(), e.getMessage());
            assertTrue(e.getMessage().startsWith(c.field() + ": "), e.getMessage());
        }
    }
}
