package org.ventcase.calc;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import org.ventcase.common.TraceStep;
import org.ventcase.device.OrificeSelection;
import org.ventcase.inventory.Inventory;
import org.ventcase.relief.FireLoadCurve;
import org.ventcase.relief.RelievedFluid;
import org.ventcase.thermo.mix.PhaseEnvelope;
import org.ventcase.vessel.LevelState;

/**
 * The results of one case: what the results JSON, the printed summary and the calculation sheet
 * are made from. SI throughout (Pa absolute, K, kg/s, m2, W, J/kg).
 *
 * @param title          the case's title
 * @param tag            equipment tag
 * @param inputHash      SHA-256 of the normalised case
 * @param vessel         the vessel at the storage level (volumes, wetted and fire-exposed areas)
 * @param inventory      contents by phase and component, with its trace and warnings
 * @param scenarios      one result per scenario, in the case's order
 * @param governingIndex index into {@code scenarios} of the governing scenario; empty when no
 *                       scenario could be sized
 * @param governingRule  the rule that picked it, in words
 * @param warnings       every warning once, with the scenarios it came from
 * @param envelope       the phase envelope of the stored liquid's composition (mixtures), or why
 *                       there is none
 */
public record CaseResult(String title, String tag, String inputHash, LevelState vessel, Inventory inventory,
                         List<ScenarioResult> scenarios, OptionalInt governingIndex, String governingRule,
                         List<CaseWarning> warnings, Envelope envelope) {

    /** The governing rule as stated in every result. */
    public static final String GOVERNING_RULE = "The governing scenario is the one needing the largest required "
            + "effective area among the scenarios that relieve gas or vapour (their areas come from the same API 520 "
            + "gas equation and the same Kd); a liquid-relief scenario governs only when no scenario relieves gas or "
            + "vapour. Liquid-relief areas (API 520 liquid equation, liquid Kd) are listed with their own orifices.";

    public CaseResult {
        scenarios = List.copyOf(scenarios);
        warnings = List.copyOf(warnings);
        java.util.Objects.requireNonNull(envelope, "envelope");
    }

    /**
     * The phase envelope (bubble and dew curves) of the stored liquid's composition, traced by
     * {@link PhaseEnvelope} with the case's EOS and k_ij: present for a mixture when tracing
     * succeeded; otherwise empty, and {@code note} says why (a pure fluid has no envelope, only its
     * saturation curve; a trace that failed gives its reason).
     *
     * @param result the traced envelope
     * @param note   why there is none ("" when there is one)
     */
    public record Envelope(Optional<PhaseEnvelope.Result> result, String note) {
        public Envelope {
            java.util.Objects.requireNonNull(result, "result");
            note = note == null ? "" : note;
        }
    }

    /** The governing scenario, if any. */
    public Optional<ScenarioResult> governing() {
        return governingIndex.isPresent() ? Optional.of(scenarios.get(governingIndex.getAsInt())) : Optional.empty();
    }

    /**
     * One scenario's result. A quantity the scenario type does not have is empty (e.g. a latent
     * heat for a gas-filled vessel); when a scenario could not be computed, every quantity is empty
     * and {@code failure} says why (also among the warnings).
     *
     * @param index                position in the case's list
     * @param label                label
     * @param type                 scenario type
     * @param governing            whether this is the governing scenario
     * @param relievingPressurePa  P1, Pa absolute
     * @param relievingTemperatureK T1 at the sizing point, K
     * @param heatInputW           heat input Q, W (fire scenarios with a wetted area; thermal expansion)
     * @param latentHeatJPerKg     latent heat used, J/kg (boiling scenarios)
     * @param reliefLoadKgPerS     W at the sizing point, kg/s
     * @param requiredAreaM2       required effective area, m2
     * @param relievedFluid        the relieved fluid at the sizing point
     * @param orifice              API 526 orifice selection
     * @param sizingEquation       which API 520 equation sized it (gas critical/subcritical, liquid)
     * @param loadCurve            boil-off and near-critical: the load curve (empty otherwise)
     * @param trace                every calculation step, in order
     * @param warnings             this scenario's warnings
     * @param failure              why the scenario could not be computed, when it could not
     * @param levelCurve           wetted fire: the same scenario re-run over fill levels
     *                             ({@link CaseCalculation#LEVEL_CURVE_FROM_PERCENT} to
     *                             {@link CaseCalculation#LEVEL_CURVE_TO_PERCENT} % of volume, plus the
     *                             case's level), everything else as in the case; empty for other types
     *                             or when it could not be computed ({@code levelCurveNote} says why)
     * @param levelCurveNote       why a wetted fire has no level curve ("" otherwise)
     */
    public record ScenarioResult(int index, String label, ScenarioKey type, boolean governing,
                                 OptionalDouble relievingPressurePa, OptionalDouble relievingTemperatureK,
                                 OptionalDouble heatInputW, OptionalDouble latentHeatJPerKg,
                                 OptionalDouble reliefLoadKgPerS, OptionalDouble requiredAreaM2,
                                 Optional<RelievedFluid> relievedFluid, Optional<OrificeSelection> orifice,
                                 String sizingEquation, List<LoadPoint> loadCurve, List<TraceStep> trace,
                                 List<String> warnings, Optional<String> failure, Optional<FireLoadCurve> levelCurve,
                                 String levelCurveNote) {
        public ScenarioResult {
            loadCurve = List.copyOf(loadCurve);
            trace = List.copyOf(trace);
            warnings = List.copyOf(warnings);
            levelCurve = levelCurve == null ? Optional.empty() : levelCurve;
            levelCurveNote = levelCurveNote == null ? "" : levelCurveNote;
        }

        /** Whether the relieved fluid is a liquid (sized by the liquid equation). */
        public boolean relievesLiquid() {
            return relievedFluid.map(f -> f.phase() == RelievedFluid.Phase.LIQUID).orElse(false);
        }

        ScenarioResult withGoverning(boolean g) {
            return new ScenarioResult(index, label, type, g, relievingPressurePa, relievingTemperatureK, heatInputW,
                    latentHeatJPerKg, reliefLoadKgPerS, requiredAreaM2, relievedFluid, orifice, sizingEquation,
                    loadCurve, trace, warnings, failure, levelCurve, levelCurveNote);
        }
    }

    /**
     * One point of a load curve.
     *
     * @param timeS            time since the device opened, s
     * @param temperatureK     temperature of the contents (boil-off: the liquid), K
     * @param massFlowKgPerS   relief rate, kg/s
     * @param requiredAreaM2   API 520 required area at the point, m2
     */
    public record LoadPoint(double timeS, double temperatureK, double massFlowKgPerS, double requiredAreaM2) {
    }

    /**
     * A warning, once, with the labels of the scenarios that gave it (empty: it concerns the case's
     * input or inventory).
     */
    public record CaseWarning(String message, List<String> scenarios) {
        public CaseWarning {
            scenarios = List.copyOf(scenarios);
        }
    }
}
