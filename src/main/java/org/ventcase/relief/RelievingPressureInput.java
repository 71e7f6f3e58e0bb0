package org.ventcase.relief;

import java.util.Optional;

import org.ventcase.common.InvalidInputException;

/**
 * What decides the relieving pressure of one device.
 *
 * @param setPressureGaugePa   set pressure of the device, Pa gauge
 * @param mawpGaugePa          maximum allowable working pressure of the protected vessel, Pa gauge
 * @param atmosphericPa        site atmospheric pressure, Pa absolute
 * @param deviceCount          single device or several devices sharing the load
 * @param scenario             fire or non-fire
 * @param supplementalFireValve true when this device is a supplemental valve installed for the
 *                             fire case only (set up to 110 % of MAWP); allowed only with
 *                             {@link ScenarioKind#FIRE}
 * @param setAboveLimitReason  a person's reason for a set pressure above the allowed fraction of
 *                             MAWP; empty when none is given (then such a set pressure is refused)
 */
public record RelievingPressureInput(double setPressureGaugePa, double mawpGaugePa, double atmosphericPa,
                                     DeviceCount deviceCount, ScenarioKind scenario,
                                     boolean supplementalFireValve, Optional<String> setAboveLimitReason) {

    public RelievingPressureInput {
        InvalidInputException.requirePositive("relief.setPressure", setPressureGaugePa, "Pa gauge");
        InvalidInputException.requirePositive("relief.mawp", mawpGaugePa, "Pa gauge");
        InvalidInputException.requireInRange("relief.atmosphericPressure", atmosphericPa, 1.0e4, 1.2e5, "Pa abs");
        if (deviceCount == null) {
            throw InvalidInputException.missing("relief.deviceCount", "expected SINGLE or MULTIPLE");
        }
        if (scenario == null) {
            throw InvalidInputException.missing("relief.scenario", "expected FIRE or NON_FIRE");
        }
        if (supplementalFireValve && scenario != ScenarioKind.FIRE) {
            throw InvalidInputException.invalid("relief.supplementalFireValve", true,
                    "a supplemental fire valve applies only to the FIRE scenario");
        }
        setAboveLimitReason = setAboveLimitReason == null ? Optional.empty()
                : setAboveLimitReason.filter(s -> !s.isBlank());
    }

    /** Input without a supplemental fire valve and without an override reason. */
    public static RelievingPressureInput of(double setPressureGaugePa, double mawpGaugePa, double atmosphericPa,
                                            DeviceCount deviceCount, ScenarioKind scenario) {
        return new RelievingPressureInput(setPressureGaugePa, mawpGaugePa, atmosphericPa, deviceCount, scenario,
                false, Optional.empty());
    }
}
