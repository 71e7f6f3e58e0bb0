package org.ventcase.casefile;

import java.util.List;

import org.ventcase.units.Dimension;

/**
 * A case file as written by a person: the records mirror the JSON one to one (same field names,
 * same nesting), hold the text exactly as given and check nothing. {@link CaseValidator} turns a
 * {@code Case} into a {@link ValidatedCase} of domain objects, or reports every problem at once.
 *
 * <p>A {@code null} component means the field was left out of the file; it never crosses out of
 * this package except through these DTOs, which are the file's own text. Every quantity with a
 * dimension is text with its unit ("17.2 barg", "3.2 m", "45 C"); pressures say gauge or
 * absolute. Dimensionless numbers (mole fractions, coefficients of discharge) are JSON numbers.
 * The format is described by {@code case.schema.json} beside this class and in
 * {@code docs/case-files.md}.
 *
 * @param schemaVersion layout version of the file, {@link Migrations#CURRENT} when written by this build
 * @param identity      what the calculation is about and who made it
 * @param fluid         vessel contents: components, equation of state, interaction parameters
 * @param vessel        inside geometry and its placement relative to a pool fire
 * @param storage       the state the vessel is held in before the upset
 * @param scenarios     the overpressure causes to evaluate (at least one)
 * @param device        the pressure-relief device and the vessel's MAWP
 * @param site          site data (atmospheric pressure, fire height, minimum design metal temperature); optional
 */
public record Case(Integer schemaVersion, Identity identity, Fluid fluid, VesselData vessel, Storage storage,
                   List<Scenario> scenarios, Device device, Site site) {

    public Case {
        scenarios = scenarios == null ? null : List.copyOf(scenarios);
    }

    /**
     * Title block of the calculation sheet.
     *
     * @param title    one line naming the vessel and the purpose
     * @param tag      equipment tag, e.g. V-2101
     * @param revision revision mark, e.g. A, 0, 1
     * @param preparer who prepared the case
     * @param checker  who checked it ("" while unchecked)
     * @param date     ISO date yyyy-mm-dd
     * @param notes    free text; optional
     */
    public record Identity(String title, String tag, String revision, String preparer, String checker, String date,
                           String notes) {
    }

    /**
     * @param components   the mixture; mole fractions sum to 1
     * @param eos          equation of state: PR-Twu, vdW, RK, SRK, PR76, PR78 (PR = PR78)
     * @param kij          binary interaction parameters other than 0; optional
     * @param densityBasis liquid density from the translated (the model's volume translation) or the cubic volume
     */
    public record Fluid(List<ComponentEntry> components, String eos, List<Kij> kij, String densityBasis) {
        public Fluid {
            components = components == null ? null : List.copyOf(components);
            kij = kij == null ? null : List.copyOf(kij);
        }
    }

    /**
     * One component of the mixture: a built-in component by name, alias, formula or CAS number,
     * or a component defined here ({@code custom}, whose name is then {@code name}).
     *
     * @param name         component name (built-in lookup, or the name of the custom component)
     * @param moleFraction mole fraction, 0 &lt; x &lt;= 1
     * @param custom       the data of a component that is not built in; optional
     */
    public record ComponentEntry(String name, Double moleFraction, CustomComponent custom) {
    }

    /**
     * Data of a component that is not in the built-in library; every group with its source.
     *
     * @param formula            molecular formula, optional
     * @param criticalTemperature Tc, e.g. "369.83 K"
     * @param criticalPressure   Pc, absolute, e.g. "42.48 bara"
     * @param acentricFactor     Pitzer acentric factor
     * @param molarMass          e.g. "44.1 kg/kmol"
     * @param normalBoilingPoint Tb at 101.325 kPa, e.g. "-42.1 C"
     * @param criticalSource     where Tc, Pc, omega, M and Tb come from
     * @param idealGasCp         ideal-gas Cp/R polynomial with its range and source
     * @param rackettZ           Rackett compressibility Z_RA
     * @param rackettSource      where Z_RA comes from
     */
    public record CustomComponent(String formula,
                                  @Quantity(Dimension.TEMPERATURE) String criticalTemperature,
                                  @Quantity(Dimension.PRESSURE) String criticalPressure,
                                  Double acentricFactor,
                                  @Quantity(Dimension.MOLAR_MASS) String molarMass,
                                  @Quantity(Dimension.TEMPERATURE) String normalBoilingPoint,
                                  String criticalSource, IdealGasCpData idealGasCp, Double rackettZ,
                                  String rackettSource) {
    }

    /**
     * Ideal-gas heat capacity Cp/R = a0 + a1 T + a2 T^2 + a3 T^3 + a4 T^4 with T in K.
     *
     * @param coefficients   a0..a4 (five numbers)
     * @param minTemperature lower end of the fitted range
     * @param maxTemperature upper end of the fitted range
     * @param source         where the coefficients come from
     */
    public record IdealGasCpData(List<Double> coefficients,
                                 @Quantity(Dimension.TEMPERATURE) String minTemperature,
                                 @Quantity(Dimension.TEMPERATURE) String maxTemperature, String source) {
        public IdealGasCpData {
            coefficients = coefficients == null ? null : java.util.Collections.unmodifiableList(
                    new java.util.ArrayList<>(coefficients));
        }
    }

    /**
     * One binary interaction parameter k_ab = k_ba.
     *
     * @param a      name of the first component, as written in {@code components}
     * @param b      name of the second component
     * @param value  k_ab, |k| &lt; 1
     * @param source where the value comes from
     */
    public record Kij(String a, String b, Double value, String source) {
    }

    /**
     * Inside geometry of the vessel.
     *
     * @param shape                   horizontal, vertical or sphere
     * @param insideDiameter          e.g. "3.2 m"
     * @param tangentLength           tangent-to-tangent length (cylinders only)
     * @param heads                   both heads, in the text forms of {@code Specs.head} (cylinders only)
     * @param secondHead              a different right-hand (horizontal) or top (vertical) head; optional
     * @param bottomElevation         height of the lowest inside point above grade (the fire base)
     * @param wallThickness           optional, used for the outside area only
     * @param skirtExcludesBottomHead vertical vessels: the bottom head sits in a skirt with limited ventilation
     * @param insulation              insulation data; optional
     */
    public record VesselData(String shape,
                             @Quantity(Dimension.LENGTH) String insideDiameter,
                             @Quantity(Dimension.LENGTH) String tangentLength,
                             String heads, String secondHead,
                             @Quantity(Dimension.LENGTH) String bottomElevation,
                             @Quantity(Dimension.LENGTH) String wallThickness,
                             Boolean skirtExcludesBottomHead, Insulation insulation) {
    }

    /**
     * Thermal insulation on the vessel.
     *
     * @param thickness                 e.g. "75 mm"
     * @param conductivity              thermal conductivity at the mean temperature, e.g. "0.05 W/mK"
     * @param withstandsFireHoseStreams the insulation stays in place under fire-hose streams (needed
     *                                  for any fire credit)
     */
    public record Insulation(@Quantity(Dimension.LENGTH) String thickness,
                             @Quantity(Dimension.THERMAL_CONDUCTIVITY) String conductivity,
                             Boolean withstandsFireHoseStreams) {
    }

    /**
     * The state the vessel is held in.
     *
     * @param mode              saturated (liquid and vapour at the bubble point of the contents),
     *                          specified (temperature and pressure given, e.g. with a nitrogen
     *                          blanket) or gas-filled (no liquid)
     * @param temperature       storage temperature
     * @param pressure          storage pressure (specified and gas-filled only)
     * @param liquidLevel       a height ("2.1 m"), % of height ("65 %") or % of volume ("70 %v");
     *                          not for gas-filled storage (or 0)
     * @param vapourComposition specified mode only: the vapour space when it differs from the
     *                          contents, e.g. a nitrogen blanket; optional
     */
    public record Storage(String mode,
                          @Quantity(Dimension.TEMPERATURE) String temperature,
                          @Quantity(Dimension.PRESSURE) String pressure,
                          @Quantity(value = Dimension.LENGTH, alsoAccepts = "a percentage of height ('65 %') or of volume ('70 %v')")
                          String liquidLevel,
                          List<ComponentEntry> vapourComposition) {
        public Storage {
            vapourComposition = vapourComposition == null ? null : List.copyOf(vapourComposition);
        }
    }

    /**
     * One overpressure cause. {@code type} decides which other fields belong; a field that the
     * type does not use is refused (see {@link ScenarioType#fields()}).
     *
     * @param type                fire-wetted, fire-near-critical, fire-boil-off, fire-gas-filled,
     *                            blocked-outlet or thermal-expansion
     * @param label               a short name for the sheet; optional
     * @param fireFighting        fire-wetted and fire-near-critical: adequate (drainage and prompt
     *                            fire-fighting) or inadequate
     * @param environmentFactor   fire cases with liquid: a key of the environment-factor table
     *                            (bare, insulated_5.68, earth_covered ...)
     * @param insulationCredit    fire cases with liquid: take the factor from the vessel's
     *                            insulation by the general formula instead of a table key
     * @param wallTemperature     fire-gas-filled: the wall temperature the vessel may reach; optional,
     *                            593 C (carbon steel) when left out
     * @param inflow              blocked-outlet: the inflow that cannot leave, a mass flow
     *                            ("12000 kg/h") or a standard volumetric flow ("850 Nm3/h")
     * @param inflowPhase         blocked-outlet: vapour or liquid
     * @param heatInput           thermal-expansion: heat transfer rate to the blocked-in liquid
     * @param blockedInVolume     thermal-expansion: volume of the blocked-in liquid
     * @param duration            fire-boil-off: how long the fire lasts ("2 h"); optional, the run
     *                            goes on until the stop condition when left out
     * @param stopAtLiquidFraction fire-boil-off: end the run when the liquid (moles) has fallen to
     *                            this fraction of the liquid at opening, 0 to 0.999; optional, 0
     *                            (run until the liquid is exhausted)
     * @param steps               fire-near-critical: number of temperature steps of the heat-up;
     *                            optional, 100
     */
    public record Scenario(String type, String label, String fireFighting, String environmentFactor,
                           Boolean insulationCredit,
                           @Quantity(Dimension.TEMPERATURE) String wallTemperature,
                           @Quantity(value = Dimension.MASS_FLOW,
                                   alsoAccepts = "a standard volumetric flow ('850 Nm3/h', '1200 Sm3/h', '500 scfm')")
                           String inflow,
                           String inflowPhase,
                           @Quantity(Dimension.POWER) String heatInput,
                           @Quantity(Dimension.VOLUME) String blockedInVolume,
                           @Quantity(Dimension.TIME) String duration,
                           Double stopAtLiquidFraction,
                           Integer steps) {
    }

    /**
     * The pressure-relief device and what it protects.
     *
     * @param setPressure                set pressure, gauge or absolute
     * @param mawp                       MAWP of the vessel
     * @param deviceCount                single or multiple
     * @param supplementalFireValve      the device is a supplemental valve for fire only
     * @param setAboveLimitReason        why a set pressure above the allowed fraction of MAWP is
     *                                   acceptable; optional
     * @param backPressure               superimposed and built-up back pressure
     * @param kd                         coefficient of discharge for gas and vapour; optional (0.975)
     * @param kdLiquid                   coefficient of discharge for liquid; optional (0.65)
     * @param kb                         back-pressure correction (balanced-bellows valves only); optional (1)
     * @param kc                         combination correction; optional (0.9 with a rupture disk upstream, else 1)
     * @param valveType                  conventional, balanced-bellows or pilot
     * @param ruptureDiskUpstream        a rupture disk is installed ahead of the valve
     * @param liquidViscosityCorrection  api520-10th or api520-7th-to-9th; optional (api520-10th)
     */
    public record Device(@Quantity(Dimension.PRESSURE) String setPressure,
                         @Quantity(Dimension.PRESSURE) String mawp,
                         String deviceCount, Boolean supplementalFireValve, String setAboveLimitReason,
                         BackPressure backPressure, Double kd, Double kdLiquid, Double kb, Double kc,
                         String valveType, Boolean ruptureDiskUpstream, String liquidViscosityCorrection) {
    }

    /**
     * Back pressure at the device outlet.
     *
     * @param superimposed pressure at the outlet before the device opens, gauge or absolute
     * @param builtUp      increase while the device flows, a pressure difference, e.g. "0.8 bar"
     */
    public record BackPressure(@Quantity(Dimension.PRESSURE) String superimposed,
                               @Quantity(Dimension.PRESSURE_DIFFERENCE) String builtUp) {
    }

    /**
     * Site data; every field optional.
     *
     * @param atmosphericPressure           absolute; 101.325 kPaa when left out
     * @param fireHeight                    height above grade within which wetted area counts; 7.6 m when left out
     * @param minimumDesignMetalTemperature MDMT of the vessel, for the low-temperature caution; optional
     */
    public record Site(@Quantity(Dimension.PRESSURE) String atmosphericPressure,
                       @Quantity(Dimension.LENGTH) String fireHeight,
                       @Quantity(Dimension.TEMPERATURE) String minimumDesignMetalTemperature) {
    }
}
