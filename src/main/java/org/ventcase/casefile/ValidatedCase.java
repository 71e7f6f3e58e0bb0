package org.ventcase.casefile;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.calc.CaseInput;
import org.ventcase.device.ViscosityCorrection;
import org.ventcase.relief.DeviceCount;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * A case that passed every check, as domain objects in SI (Pa absolute unless a name says gauge,
 * K, m, kg/s, W). Built only by {@link CaseValidator}; what a calculation takes.
 *
 * @param source     the case as read (current layout)
 * @param inputHash  SHA-256 of the case's canonical JSON ({@link CaseFiles#inputHash})
 * @param identity   title block
 * @param fluid      components, composition and equation-of-state model
 * @param vessel     geometry, fire exposure and insulation
 * @param storage    the held state
 * @param scenarios  one entry per scenario in file order
 * @param device     the relief device
 * @param site       site conditions
 * @param warnings   cautions found while checking (none stops a calculation)
 */
public record ValidatedCase(Case source, String inputHash, Identity identity, FluidModel fluid, VesselModel vessel,
                            StorageState storage, List<CaseInput.Scenario> scenarios, DeviceSpec device,
                            SiteConditions site, List<String> warnings) {

    public ValidatedCase {
        scenarios = List.copyOf(scenarios);
        warnings = List.copyOf(warnings);
    }

    /** Title block with a parsed date. */
    public record Identity(String title, String tag, String revision, String preparer, String checker,
                           LocalDate date, Optional<String> notes) {
    }

    /**
     * Components with their mole fractions.
     *
     * @param components the components, in file order
     * @param fractions  mole fractions, same order, summing to 1 within 1e-6 (as written, not rescaled)
     */
    public record Composition(List<Component> components, double[] fractions) {
        public Composition {
            components = List.copyOf(components);
            fractions = fractions.clone();
        }

        @Override
        public double[] fractions() {
            return fractions.clone();
        }
    }

    /**
     * The fluid model.
     *
     * @param composition  the mixture
     * @param eos          equation of state
     * @param kij          interaction parameters as given, with their sources (pairs not listed are 0)
     * @param densityBasis liquid-density basis
     * @param model        the cubic model built from the above (checks k_ij symmetry and range)
     */
    public record FluidModel(Composition composition, EosVariant eos, List<KijEntry> kij, DensityBasis densityBasis,
                             CubicModel model) {
        public FluidModel {
            kij = List.copyOf(kij);
        }
    }

    /** One interaction parameter between components {@code i} and {@code j} (indices into the composition). */
    public record KijEntry(int i, int j, double value, String source) {
    }

    /**
     * @param vessel      geometry (with wall thickness when given)
     * @param exposure    elevation, fire height and skirt rule
     * @param insulation  insulation data, when given
     */
    public record VesselModel(Vessel vessel, FireExposure exposure, Optional<InsulationSpec> insulation) {
    }

    /** Insulation: thickness m, conductivity W/(m K), whether it stays on under fire-hose streams. */
    public record InsulationSpec(double thicknessM, double conductivityWPerMK, boolean withstandsFireHoseStreams) {
    }

    /** How the vessel is held. */
    public enum StorageMode {
        /** Liquid and vapour at the bubble point of the contents. */
        SATURATED("saturated"),
        /** Temperature and pressure given (e.g. blanketed). */
        SPECIFIED("specified"),
        /** No liquid. */
        GAS_FILLED("gas-filled");

        private final String key;

        StorageMode(String key) {
            this.key = key;
        }

        /** The text used in case files. */
        public String key() {
            return key;
        }
    }

    /**
     * @param mode              how the vessel is held
     * @param temperatureK      storage temperature, K
     * @param pressurePa        storage pressure, Pa absolute (specified and gas-filled)
     * @param level             liquid level as given (height 0 for gas-filled)
     * @param levelHeightM      the level in m above the lowest inside point
     * @param vapourComposition specified mode: the vapour space when given
     */
    public record StorageState(StorageMode mode, double temperatureK, OptionalDouble pressurePa, Level level,
                               double levelHeightM, Optional<Composition> vapourComposition) {
    }

    /** Valve construction. */
    public enum ValveType {
        CONVENTIONAL("conventional"), BALANCED_BELLOWS("balanced-bellows"), PILOT("pilot");

        private final String key;

        ValveType(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    /**
     * @param setPressureGaugePa          set pressure, Pa gauge
     * @param mawpGaugePa                 MAWP, Pa gauge
     * @param count                       single or multiple devices
     * @param supplementalFireValve       a supplemental fire-only valve
     * @param setAboveLimitReason         reason for a set pressure above the limit, when given
     * @param superimposedBackPressurePa  Pa absolute
     * @param builtUpBackPressurePa       Pa (difference)
     * @param kd                          gas and vapour coefficient of discharge
     * @param kdLiquid                    liquid coefficient of discharge
     * @param kb                          back-pressure correction (1 unless balanced bellows)
     * @param kc                          combination correction
     * @param valveType                   construction
     * @param ruptureDiskUpstream         rupture disk ahead of the valve
     * @param viscosityCorrection         Kv form for liquid sizing
     */
    public record DeviceSpec(double setPressureGaugePa, double mawpGaugePa, DeviceCount count,
                             boolean supplementalFireValve, Optional<String> setAboveLimitReason,
                             double superimposedBackPressurePa, double builtUpBackPressurePa, double kd, double kdLiquid,
                             double kb, double kc, ValveType valveType, boolean ruptureDiskUpstream,
                             ViscosityCorrection viscosityCorrection) {
        /** Total back pressure while relieving, Pa absolute. */
        public double totalBackPressurePa() {
            return superimposedBackPressurePa + builtUpBackPressurePa;
        }
    }

    /** Site: atmospheric pressure Pa absolute, fire height m, MDMT K when given. */
    public record SiteConditions(double atmosphericPa, double fireHeightM, OptionalDouble minimumDesignMetalTemperatureK) {
    }
}
