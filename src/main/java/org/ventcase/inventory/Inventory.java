package org.ventcase.inventory;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.common.TraceStep;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.LevelState;

/**
 * What one vessel holds: per phase and in total, by component, with the trace of how it was
 * computed and the warnings where the mode's assumptions are strained. Built by
 * {@link Inventories#compute}.
 *
 * @param mode                  storage mode
 * @param fluid                 the fluid model used
 * @param vessel                the vessel at its level (volumes, areas)
 * @param exposure              the fire exposure the level state was evaluated with
 * @param temperatureK          storage temperature, K
 * @param pressurePa            storage pressure, Pa absolute (the bubble pressure in saturated mode)
 * @param liquid                the liquid phase; empty for a gas-filled vessel
 * @param vapour                the vapour (gas) phase
 * @param totalMassKg           kg
 * @param totalMoles            mol
 * @param massPerComponentKg    component name -> kg over both phases
 * @param rackettLiquidDensity  Rackett (Spencer-Danner) saturated-liquid density at T where the
 *                              liquid is a pure component, kg/m3 (a cross-check, not used)
 * @param liquidFull            the liquid-full check, where a relieving pressure was given and it
 *                              could be computed
 * @param trace                 calculation steps
 * @param warnings              what the user must know
 */
public record Inventory(StorageMode mode, Fluid fluid, LevelState vessel, FireExposure exposure, double temperatureK,
                        double pressurePa, Optional<PhaseInventory> liquid, PhaseInventory vapour, double totalMassKg,
                        double totalMoles, Map<String, Double> massPerComponentKg, OptionalDouble rackettLiquidDensity,
                        Optional<LiquidFullCheck> liquidFull, List<TraceStep> trace, List<String> warnings) {

    public Inventory {
        massPerComponentKg = Collections.unmodifiableMap(new LinkedHashMap<>(massPerComponentKg));
        trace = List.copyOf(trace);
        warnings = List.copyOf(warnings);
    }

    /** Liquid mass, kg (0 for a gas-filled vessel). */
    public double liquidMassKg() {
        return liquid.map(PhaseInventory::massKg).orElse(0.0);
    }

    /** Vapour mass, kg. */
    public double vapourMassKg() {
        return vapour.massKg();
    }
}
