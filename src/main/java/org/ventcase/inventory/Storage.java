package org.ventcase.inventory;

import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.Composition;

/**
 * The storage conditions of one vessel, in one of three modes. Temperatures in K, pressures
 * absolute in Pa. Field paths: {@code storage.temperature}, {@code storage.pressure},
 * {@code storage.vapour}, {@code storage.relievingPressure}.
 */
public sealed interface Storage permits Storage.Saturated, Storage.Specified, Storage.GasFilled {

    /** Lowest accepted temperature, K. */
    double MIN_T_K = 1.0;
    /** Highest accepted temperature, K. */
    double MAX_T_K = 2000.0;
    /** Lowest accepted pressure, Pa absolute. */
    double MIN_P_PA = 1.0;
    /** Highest accepted pressure, Pa absolute. */
    double MAX_P_PA = 1e9;

    /** Storage temperature, K. */
    double temperatureK();

    /** Which mode. */
    StorageMode mode();

    /**
     * Saturated storage: the liquid (the fluid's composition) at its bubble point at T; pressure
     * and vapour composition follow.
     *
     * @param temperatureK        storage temperature, K
     * @param relievingPressurePa optional relieving pressure (absolute, Pa) for the check whether
     *                            the liquid, heated along its saturation curve, fills the vessel
     *                            before that pressure is reached
     */
    record Saturated(double temperatureK, OptionalDouble relievingPressurePa) implements Storage {
        public Saturated {
            InvalidInputException.requireInRange("storage.temperature", temperatureK, MIN_T_K, MAX_T_K, "K");
            if (relievingPressurePa == null) {
                relievingPressurePa = OptionalDouble.empty();
            }
            if (relievingPressurePa.isPresent()) {
                InvalidInputException.requireInRange("storage.relievingPressure", relievingPressurePa.getAsDouble(),
                        MIN_P_PA, MAX_P_PA, "Pa");
            }
        }

        /** Saturated storage without the liquid-full check. */
        public static Saturated at(double temperatureK) {
            return new Saturated(temperatureK, OptionalDouble.empty());
        }

        @Override
        public StorageMode mode() {
            return StorageMode.SATURATED;
        }
    }

    /**
     * Stated temperature and pressure with the liquid (the fluid's composition) and the vapour
     * space given separately, e.g. a nitrogen-blanketed vessel. Nothing is equilibrated: the
     * vapour composition is the user's statement.
     *
     * @param temperatureK K
     * @param pressurePa   Pa absolute
     * @param vapour       vapour-space composition; its components must be among the fluid's
     *                     (build the fluid with {@link Fluid#withVapourSpace})
     */
    record Specified(double temperatureK, double pressurePa, Composition vapour) implements Storage {
        public Specified {
            InvalidInputException.requireInRange("storage.temperature", temperatureK, MIN_T_K, MAX_T_K, "K");
            InvalidInputException.requireInRange("storage.pressure", pressurePa, MIN_P_PA, MAX_P_PA, "Pa");
            if (vapour == null) {
                throw InvalidInputException.missing("storage.vapour", "expected the vapour-space composition");
            }
        }

        @Override
        public StorageMode mode() {
            return StorageMode.SPECIFIED;
        }
    }

    /**
     * A gas-filled vessel: no liquid; the fluid's composition is the gas.
     *
     * @param temperatureK K
     * @param pressurePa   Pa absolute
     */
    record GasFilled(double temperatureK, double pressurePa) implements Storage {
        public GasFilled {
            InvalidInputException.requireInRange("storage.temperature", temperatureK, MIN_T_K, MAX_T_K, "K");
            InvalidInputException.requireInRange("storage.pressure", pressurePa, MIN_P_PA, MAX_P_PA, "Pa");
        }

        @Override
        public StorageMode mode() {
            return StorageMode.GAS;
        }
    }
}
