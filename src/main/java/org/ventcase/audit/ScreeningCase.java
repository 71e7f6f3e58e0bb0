package org.ventcase.audit;

import java.util.List;

import org.ventcase.calc.CaseInput;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.DeviceSpec;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.ScenarioKind;
import org.ventcase.relief.UnwettedVesselFire;
import org.ventcase.device.ViscosityCorrection;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * The one-scenario case an audit computes per vessel, so that every number comes from
 * {@link org.ventcase.calc.CaseCalculation#run} like {@code ventcase calc}:
 * <ul>
 * <li>a vessel holding liquid: API Std 521 pool fire on the wetted vessel, bare (F = 1), adequate
 *     drainage and fire-fighting, W = Q / L at the bubble point of the liquid at P1 (scenario type
 *     {@code fire-wetted});</li>
 * <li>a gas-filled vessel: the API 521 unwetted-vessel method with the default wall temperature
 *     (scenario type {@code fire-gas-filled}), since a gas-filled vessel has no wetted area;</li>
 * <li>one device (fire overpressure 21 % of set), conventional valve, Kd 0.975, Kb = Kc = 1, back
 *     pressure atmospheric (superimposed 0, built-up 0): the screening assumptions, stated in the
 *     output.</li>
 * </ul>
 */
public final class ScreeningCase {

    /** Atmospheric pressure taken for every register row, Pa (101.325 kPa). */
    public static final double ATMOSPHERIC_PA = 101_325.0;

    /** Label of the screening scenario. */
    public static final String WETTED_LABEL = "Screening pool fire (bare, adequate drainage)";

    /** Label of the screening scenario of a gas-filled vessel. */
    public static final String GAS_LABEL = "Screening pool fire, gas-filled vessel";

    private ScreeningCase() {
    }

    /** The relieving-pressure input of the screening fire: one device, fire overpressure. */
    public static RelievingPressureInput relieving(double setGaugePa, double mawpGaugePa, double atmosphericPa) {
        return RelievingPressureInput.of(setGaugePa, mawpGaugePa, atmosphericPa, DeviceCount.SINGLE, ScenarioKind.FIRE);
    }

    /** The screening device: conventional, Kd 0.975, Kb = Kc = 1, back pressure atmospheric. */
    public static CaseInput.Device device(double atmosphericPa) {
        return new CaseInput.Device(DeviceSpec.gasValve(atmosphericPa), DeviceSpec.liquidValve(atmosphericPa),
                ViscosityCorrection.API520_10TH, false);
    }

    /** The one-scenario case for a vessel. */
    public static CaseInput of(String title, String tag, Fluid fluid, Storage storage, Vessel vessel, Level level,
                               FireExposure exposure, RelievingPressureInput relieving, double atmosphericPa) {
        CaseInput.Scenario s = storage instanceof Storage.GasFilled
                ? new CaseInput.GasFilledFire(0, GAS_LABEL, UnwettedVesselFire.CARBON_STEEL_WALL_K, relieving)
                : new CaseInput.WettedFire(0, WETTED_LABEL, FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING,
                        new CaseInput.TableFactor(EnvironmentFactors.byKey("bare")), relieving);
        return new CaseInput(title, tag, "", fluid, storage, vessel, level, exposure, List.of(s),
                device(atmosphericPa), List.of());
    }

    /**
     * The screening case of an existing case (a case file in a folder audit): its fluid, storage,
     * vessel, level and exposure, and the relieving pressure of its device restated for fire.
     */
    public static CaseInput of(CaseInput c) {
        RelievingPressureInput r = c.scenarios().get(0).relieving();
        RelievingPressureInput fire = new RelievingPressureInput(r.setPressureGaugePa(), r.mawpGaugePa(),
                r.atmosphericPa(), r.deviceCount(), ScenarioKind.FIRE, r.supplementalFireValve(),
                r.setAboveLimitReason());
        CaseInput base = of(c.title(), c.tag(), c.fluid(), c.storage(), c.vessel(), c.level(), c.exposure(), fire,
                r.atmosphericPa());
        return new CaseInput(base.title(), base.tag(), c.inputHash(), base.fluid(), base.storage(), base.vessel(),
                base.level(), base.exposure(), base.scenarios(), c.device(), c.warnings());
    }
}
