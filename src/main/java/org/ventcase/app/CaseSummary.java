package org.ventcase.app;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What the results step shows: the inventory, one row per scenario, the governing scenario and
 * its device, and every warning. All values SI (Pa absolute, K, kg, kg/s, m2). A scenario that
 * could not be computed says why; it never carries a number.
 *
 * @param inventory  contents of the vessel at storage conditions, when computed
 * @param inventoryNote why there is no inventory ("" when there is one)
 * @param scenarios  one row per scenario, in case order
 * @param governing  index into {@code scenarios} of the governing row (largest required area
 *                   among the computed rows), when any row was computed
 * @param complete   true when every scenario was computed (otherwise the governing row is only
 *                   the governing one among those computed)
 * @param warnings   every warning of the validation and the calculation, without repeats
 */
public record CaseSummary(Optional<InventoryRow> inventory, String inventoryNote, List<ScenarioRow> scenarios,
                          Optional<Integer> governing, boolean complete, List<String> warnings) {

    public CaseSummary {
        inventory = inventory == null ? Optional.empty() : inventory;
        inventoryNote = inventoryNote == null ? "" : inventoryNote;
        scenarios = List.copyOf(scenarios);
        governing = governing == null ? Optional.empty() : governing;
        warnings = List.copyOf(warnings);
    }

    /** The governing row, when there is one. */
    public Optional<ScenarioRow> governingRow() {
        return governing.map(scenarios::get);
    }

    /**
     * Contents at storage conditions.
     *
     * @param liquidKg   liquid mass (0 for a gas-filled vessel)
     * @param vapourKg   vapour mass
     * @param totalKg    total mass
     * @param pressurePa storage pressure (the bubble pressure when saturated), Pa absolute
     * @param temperatureK storage temperature
     * @param liquidVolumeM3 liquid volume
     * @param vesselVolumeM3 vessel volume
     */
    public record InventoryRow(double liquidKg, double vapourKg, double totalKg, double pressurePa, double temperatureK,
                               double liquidVolumeM3, double vesselVolumeM3) {
    }

    /**
     * One scenario.
     *
     * @param label          the scenario's label
     * @param type           its type key (fire-wetted, blocked-outlet, ...)
     * @param computed       true when the numbers below are present
     * @param note           why it was not computed, or a one-line method note
     * @param relievingPressurePa    P1, Pa absolute
     * @param relievingTemperatureK  T1
     * @param loadKgPerS     required relieving rate
     * @param heatInputW     heat input, fire cases
     * @param wettedAreaM2   fire-exposed wetted area, fire cases
     * @param requiredAreaM2 required effective discharge area
     * @param orifice        selected standard orifice(s), e.g. "1 x J", when computed
     */
    public record ScenarioRow(String label, String type, boolean computed, String note,
                              OptionalDouble relievingPressurePa, OptionalDouble relievingTemperatureK,
                              OptionalDouble loadKgPerS, OptionalDouble heatInputW, OptionalDouble wettedAreaM2,
                              OptionalDouble requiredAreaM2, Optional<String> orifice, Optional<Relieved> relieved,
                              OptionalDouble orificeMarginPercent) {

        /** Without the relieved fluid and the margin (a row that was not computed). */
        public ScenarioRow(String label, String type, boolean computed, String note,
                           OptionalDouble relievingPressurePa, OptionalDouble relievingTemperatureK,
                           OptionalDouble loadKgPerS, OptionalDouble heatInputW, OptionalDouble wettedAreaM2,
                           OptionalDouble requiredAreaM2, Optional<String> orifice) {
            this(label, type, computed, note, relievingPressurePa, relievingTemperatureK, loadKgPerS, heatInputW,
                    wettedAreaM2, requiredAreaM2, orifice, Optional.empty(), OptionalDouble.empty());
        }

        /**
         * The relieved fluid at relieving conditions, as the sheet lists it.
         *
         * @param liquid        a liquid is relieved (then k means nothing and is empty)
         * @param kIdeal        ideal-gas Cp/Cv, the k of the API 520 gas equation
         * @param latentHeatJPerKg latent heat where the scenario has one
         */
        public record Relieved(boolean liquid, double molarMass, double z, OptionalDouble kIdeal, double densityKgM3,
                               OptionalDouble latentHeatJPerKg) {
        }

        /** A row that was not computed, with the reason. */
        public static ScenarioRow notComputed(String label, String type, String reason) {
            return new ScenarioRow(label, type, false, reason, OptionalDouble.empty(), OptionalDouble.empty(),
                    OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                    Optional.empty());
        }
    }
}
