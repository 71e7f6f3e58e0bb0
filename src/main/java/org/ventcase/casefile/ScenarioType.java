package org.ventcase.casefile;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.ventcase.calc.ScenarioKey;
import org.ventcase.relief.ScenarioKind;

/**
 * The scenario types a case file may list, with the fields each one uses. A field of
 * {@link Case.Scenario} that the type does not use is refused rather than ignored, so that a
 * value typed for the wrong scenario is never silently dropped. The types themselves and their keys
 * are the calculation's ({@link ScenarioKey}); this enum adds only what the file format needs.
 */
public enum ScenarioType {
    /** Wetted vessel in a pool fire; relief rate = heat input / latent heat. */
    FIRE_WETTED(ScenarioKey.FIRE_WETTED, ScenarioKind.FIRE, Set.of("fireFighting", "environmentFactor", "insulationCredit")),
    /** Wetted vessel in a pool fire with near-critical or supercritical contents (stepwise heat-up). */
    FIRE_NEAR_CRITICAL(ScenarioKey.FIRE_NEAR_CRITICAL, ScenarioKind.FIRE,
            Set.of("fireFighting", "environmentFactor", "insulationCredit", "steps")),
    /**
     * Wetted vessel in a pool fire, multicomponent boil-off simulated at constant relieving
     * pressure in the fixed vessel volume: heat from the API 521 wetted-vessel correlation,
     * equilibrium vapour out, the liquid's composition and temperature followed as it boils away.
     */
    FIRE_BOIL_OFF(ScenarioKey.FIRE_BOIL_OFF, ScenarioKind.FIRE,
            Set.of("fireFighting", "environmentFactor", "insulationCredit", "duration", "stopAtLiquidFraction")),
    /** Gas-filled (unwetted) vessel in a pool fire. */
    FIRE_GAS_FILLED(ScenarioKey.FIRE_GAS_FILLED, ScenarioKind.FIRE, Set.of("wallTemperature")),
    /** Inflow that cannot leave through a closed or blocked outlet. */
    BLOCKED_OUTLET(ScenarioKey.BLOCKED_OUTLET, ScenarioKind.NON_FIRE, Set.of("inflow", "inflowPhase")),
    /** Blocked-in liquid heated from outside (hydraulic expansion). */
    THERMAL_EXPANSION(ScenarioKey.THERMAL_EXPANSION, ScenarioKind.NON_FIRE, Set.of("heatInput", "blockedInVolume"));

    /** Fields every scenario may carry. */
    public static final Set<String> COMMON_FIELDS = Set.of("type", "label");

    private final ScenarioKey domain;
    private final String key;
    private final ScenarioKind kind;
    private final Set<String> fields;

    ScenarioType(ScenarioKey domain, ScenarioKind kind, Set<String> fields) {
        this.domain = domain;
        this.key = domain.key();
        this.kind = kind;
        this.fields = fields;
    }

    /** The calculation's scenario type (its key is the one case files use). */
    public ScenarioKey domain() {
        return domain;
    }

    /** The text used in case files, e.g. {@code fire-wetted}. */
    public String key() {
        return key;
    }

    /** Fire or non-fire, for the allowable accumulation. */
    public ScenarioKind kind() {
        return kind;
    }

    /** The fields of {@link Case.Scenario} this type uses besides {@code type} and {@code label}. */
    public Set<String> fields() {
        return fields;
    }

    /** Whether the vessel must hold liquid for this type. */
    public boolean needsLiquid() {
        return this == FIRE_WETTED || this == FIRE_NEAR_CRITICAL || this == FIRE_BOIL_OFF || this == THERMAL_EXPANSION;
    }

    /** The type with this key, if any. */
    public static Optional<ScenarioType> byKey(String key) {
        if (key == null) {
            return Optional.empty();
        }
        String k = key.trim().toLowerCase(Locale.ROOT);
        for (ScenarioType t : values()) {
            if (t.key.equals(k)) {
                return Optional.of(t);
            }
        }
        return Optional.empty();
    }

    /** All keys, for messages. */
    public static List<String> keys() {
        List<String> out = new ArrayList<>();
        for (ScenarioType t : values()) {
            out.add(t.key);
        }
        return out;
    }
}
