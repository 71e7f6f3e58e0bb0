package org.ventcase.calc;

import java.util.List;
import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;
import org.ventcase.device.ViscosityCorrection;
import org.ventcase.inventory.Fluid;
import org.ventcase.inventory.Storage;
import org.ventcase.relief.DeviceSpec;
import org.ventcase.relief.EnvironmentFactor;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.InflowRate;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * One vessel's case as domain objects (SI, Pa absolute): what {@link CaseCalculation#run} takes.
 * Built from a validated case file by {@code casefile.CaseInputs}; nothing here refers to JSON.
 * The scenario records and fire factors here are the only ones: the case-file validator produces
 * them ({@code casefile.ValidatedCase#scenarios}) and the calculation consumes them.
 *
 * @param title      one line naming the vessel and the purpose
 * @param tag        equipment tag
 * @param inputHash  SHA-256 of the normalised case, carried into the result
 * @param fluid      the fluid: components (for a blanketed vessel the union of liquid and vapour
 *                   components), liquid (or gas) composition, EOS, k_ij with sources, density basis
 * @param storage    storage state; a saturated state's relieving pressure for the liquid-full check
 *                   is set by the calculation (the highest P1 of the scenarios)
 * @param vessel     geometry
 * @param level      liquid level (height 0 for a gas-filled vessel)
 * @param exposure   elevation above grade and fire height
 * @param scenarios  in the case's order, at least one
 * @param device     the relief device
 * @param warnings   cautions found while validating the case (printed with the results)
 */
public record CaseInput(String title, String tag, String inputHash, Fluid fluid, Storage storage, Vessel vessel,
                        Level level, FireExposure exposure, List<Scenario> scenarios, Device device,
                        List<String> warnings) {

    public CaseInput {
        if (fluid == null || storage == null || vessel == null || level == null || exposure == null || device == null) {
            throw InvalidInputException.missing("case", "expected fluid, storage, vessel, level, exposure and device");
        }
        if (scenarios == null || scenarios.isEmpty()) {
            throw InvalidInputException.missing("scenarios", "expected at least one scenario");
        }
        title = title == null ? "" : title;
        tag = tag == null ? "" : tag;
        inputHash = inputHash == null ? "" : inputHash;
        scenarios = List.copyOf(scenarios);
        warnings = warnings == null ? List.of() : List.copyOf(warnings);
    }

    /**
     * The relief device as the scenarios use it.
     *
     * @param gas             gas and vapour service: back pressure, Kd, Kb, Kc, outlet MDMT
     * @param liquid          liquid service: back pressure, Kd (liquid), Kw, Kc, outlet MDMT
     * @param kvForm          Kv form for liquid sizing
     * @param balancedBellows true for a balanced-bellows valve (Kw is then taken as 1 with a warning)
     */
    public record Device(DeviceSpec gas, DeviceSpec liquid, ViscosityCorrection kvForm, boolean balancedBellows) {
        public Device {
            if (gas == null || liquid == null || kvForm == null) {
                throw InvalidInputException.missing("device", "expected gas and liquid coefficients and the Kv form");
            }
        }
    }

    /** Environment factor of a fire scenario: a table row, or insulation evaluated by the calculation. */
    public sealed interface FireFactor permits TableFactor, InsulationFactor {
    }

    /** A row of the environment-factor table. */
    public record TableFactor(EnvironmentFactor row) implements FireFactor {
    }

    /** The general insulation formula F = (k/t)(904 - T)/66,570 with the temperature the scenario states. */
    public record InsulationFactor(double conductivityWPerMK, double thicknessM) implements FireFactor {
    }

    /** One scenario. */
    public sealed interface Scenario permits WettedFire, NearCriticalFire, BoilOffFire, GasFilledFire, BlockedOutlet,
            ThermalExpansion {
        /** Position in the case's list. */
        int index();

        /** Label, unique within the case. */
        String label();

        /** Type. */
        ScenarioKey key();

        /** What decides the relieving pressure. */
        RelievingPressureInput relieving();
    }

    /** Pool fire on the liquid-wetted vessel; W = Q / L at the bubble point of the liquid at P1. */
    public record WettedFire(int index, String label, FireFighting fireFighting, FireFactor factor,
                             RelievingPressureInput relieving) implements Scenario {
        @Override
        public ScenarioKey key() {
            return ScenarioKey.FIRE_WETTED;
        }
    }

    /** Pool fire, near-critical or supercritical contents: stepwise heat-up at P1, {@code steps} steps. */
    public record NearCriticalFire(int index, String label, FireFighting fireFighting, FireFactor factor,
                                   RelievingPressureInput relieving, int steps) implements Scenario {
        /** Default number of temperature steps of the heat-up. */
        public static final int DEFAULT_STEPS = 100;

        @Override
        public ScenarioKey key() {
            return ScenarioKey.FIRE_NEAR_CRITICAL;
        }
    }

    /** Pool fire, multicomponent boil-off at constant P1 with an optional duration and stop fraction. */
    public record BoilOffFire(int index, String label, FireFighting fireFighting, FireFactor factor,
                              RelievingPressureInput relieving, OptionalDouble durationS, double stopAtLiquidFraction)
            implements Scenario {
        @Override
        public ScenarioKey key() {
            return ScenarioKey.FIRE_BOIL_OFF;
        }
    }

    /** Pool fire on a gas-filled (unwetted) vessel with the wall temperature Tw, K. */
    public record GasFilledFire(int index, String label, double wallTemperatureK, RelievingPressureInput relieving)
            implements Scenario {
        @Override
        public ScenarioKey key() {
            return ScenarioKey.FIRE_GAS_FILLED;
        }
    }

    /** Blocked outlet: the inflow, relieved as liquid or as gas/vapour. */
    public record BlockedOutlet(int index, String label, InflowRate inflow, boolean liquid,
                                RelievingPressureInput relieving) implements Scenario {
        @Override
        public ScenarioKey key() {
            return ScenarioKey.BLOCKED_OUTLET;
        }
    }

    /** Thermal expansion of blocked-in liquid: heat input W, blocked-in volume m3. */
    public record ThermalExpansion(int index, String label, double heatW, double blockedInVolumeM3,
                                   RelievingPressureInput relieving) implements Scenario {
        @Override
        public ScenarioKey key() {
            return ScenarioKey.THERMAL_EXPANSION;
        }
    }
}
