package org.ventcase.audit;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.inventory.StorageMode;

/**
 * The audit of one input row. Every input row gives exactly one of these, in input order.
 *
 * @param row       the row number (register line, or the case file's position in the folder)
 * @param source    register file name or case file path
 * @param tag       tag as given
 * @param area      area as given
 * @param fluid     fluid as given
 * @param status    ok, partial (inventory computed, fire load not) or error (nothing computed)
 * @param error     why (error: the row; partial: the fire load) it could not be computed
 * @param inventory volumes and masses (absent for an error row)
 * @param fire      the screening fire load (absent for error and partial rows)
 * @param flags     short flags a reviewer should look at (see {@link Flag})
 * @param warnings  the calculation's warnings and the audit's remarks, each once
 */
public record VesselAudit(int row, String source, String tag, String area, String fluid, Status status,
                          Optional<AuditError> error, Optional<Contents> inventory, Optional<FireLoad> fire,
                          List<Flag> flags, List<String> warnings) {

    public VesselAudit {
        flags = List.copyOf(flags);
        warnings = List.copyOf(warnings);
    }

    /** Outcome of a row. */
    public enum Status {
        OK("ok"), PARTIAL("partial"), ERROR("error");

        private final String word;

        Status(String word) {
            this.word = word;
        }

        /** As written in the CSV. */
        public String word() {
            return word;
        }
    }

    /** What a reviewer should look at. */
    public enum Flag {
        /** The installed valves' effective area is below the screening required area. */
        INSTALLED_SHORT("installed orifice short"),
        /** The liquid, heated along its saturation curve, fills the vessel before P1. */
        LIQUID_FULL("fills before relief"),
        /** Vapour space under 5 % of the volume. */
        LOW_OUTAGE("vapour space under 5 %"),
        /** A saturated row's stated pressure differs from the bubble pressure computed. */
        PRESSURE_MISMATCH("stated pressure differs"),
        /** The fire load could not be computed (partial row). */
        FIRE_NOT_COMPUTED("fire load not computed");

        private final String words;

        Flag(String words) {
            this.words = words;
        }

        /** As written in the CSV and on the sheet. */
        public String words() {
            return words;
        }
    }

    /**
     * Contents of the vessel at its level. SI.
     *
     * @param mode                storage mode
     * @param temperatureK        storage temperature, K
     * @param pressurePa          storage pressure (the bubble pressure for saturated storage), Pa absolute
     * @param totalVolumeM3       m3
     * @param liquidVolumeM3      m3
     * @param vapourVolumeM3      m3
     * @param levelPercentVolume  % of volume
     * @param wettedAreaM2        wetted inside area at the level, m2
     * @param fireWettedAreaM2    fire-exposed wetted area (within the fire height), m2
     * @param liquidMassKg        kg
     * @param vapourMassKg        kg
     * @param totalMassKg         kg
     * @param massPerComponentKg  component name -> kg, in the fluid's order
     */
    public record Contents(StorageMode mode, double temperatureK, double pressurePa, double totalVolumeM3,
                           double liquidVolumeM3, double vapourVolumeM3, double levelPercentVolume,
                           double wettedAreaM2, double fireWettedAreaM2, double liquidMassKg, double vapourMassKg,
                           double totalMassKg, Map<String, Double> massPerComponentKg) {
        public Contents {
            massPerComponentKg = Collections.unmodifiableMap(new LinkedHashMap<>(massPerComponentKg));
        }
    }

    /**
     * The screening fire load and its device check.
     *
     * @param method               which scenario type computed it (fire-wetted or fire-gas-filled)
     * @param relievingPressurePa  P1, Pa absolute
     * @param relievingTemperatureK T1, K
     * @param heatInputW           Q, W (absent for a gas-filled vessel)
     * @param latentHeatJPerKg     L used, J/kg (absent for a gas-filled vessel)
     * @param reliefLoadKgPerS     W, kg/s
     * @param requiredAreaM2       required effective area, m2 (API 520, Kd 0.975)
     * @param selectedOrifice      smallest API 526 designation covering it, e.g. "J" or "2 x T"
     * @param installed            the installed valves rated against it, when the register gives them
     */
    public record FireLoad(String method, double relievingPressurePa, double relievingTemperatureK,
                           OptionalDouble heatInputW, OptionalDouble latentHeatJPerKg, double reliefLoadKgPerS,
                           double requiredAreaM2, String selectedOrifice, Optional<InstalledCheck> installed) {
    }

    /**
     * Whether the installed valves cover the screening load.
     *
     * @param designation    e.g. "J" or "2 x J"
     * @param areaM2         installed effective area, m2
     * @param marginPercent  100 (installed / required - 1); negative when short
     * @param covers         installed area &gt;= required area
     */
    public record InstalledCheck(String designation, double areaM2, double marginPercent, boolean covers) {
    }
}
