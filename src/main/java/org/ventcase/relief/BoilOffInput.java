package org.ventcase.relief;

import org.ventcase.common.InvalidInputException;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * Inputs of the boil-off simulation: a multicomponent liquid heated at a constant rate in a rigid
 * vessel held at the relieving pressure, equilibrium vapour leaving.
 *
 * @param fluid               the liquid: components, EOS, k_ij, initial liquid composition, density basis
 * @param vessel              vessel geometry (its total volume is the fixed volume)
 * @param level               liquid level when the device opens
 * @param heatW               heat input Q, W (constant)
 * @param relievingPressurePa P1, Pa absolute (held constant)
 * @param stopLiquidFraction  stop when the liquid moles fall to this fraction of the initial liquid
 *                            moles; 0 means run until the liquid is exhausted (taken as 0.1 % left,
 *                            {@link BoilOff#EXHAUSTED_FRACTION})
 * @param timeLimitS          stop at the first step at or past this time, s
 * @param steps               number of equal steps in boiled liquid moles between start and stop
 * @param device              back pressure and coefficients for the required area at each step
 */
public record BoilOffInput(MixtureSpec fluid, Vessel vessel, Level level, double heatW, double relievingPressurePa,
                           double stopLiquidFraction, double timeLimitS, int steps, DeviceSpec device,
                           java.util.Optional<double[]> storedMoles) {

    /**
     * Without the stored contents: the liquid at the level is taken at its bubble point at P1
     * (its volume, not its mass, is kept; use the stored moles where they are known).
     */
    public BoilOffInput(MixtureSpec fluid, Vessel vessel, Level level, double heatW, double relievingPressurePa,
                        double stopLiquidFraction, double timeLimitS, int steps, DeviceSpec device) {
        this(fluid, vessel, level, heatW, relievingPressurePa, stopLiquidFraction, timeLimitS, steps, device,
                java.util.Optional.empty());
    }

    /** The same input starting from the stored contents, moles per component (the inventory). */
    public BoilOffInput withStoredMoles(double[] moles) {
        return new BoilOffInput(fluid, vessel, level, heatW, relievingPressurePa, stopLiquidFraction, timeLimitS, steps,
                device, java.util.Optional.of(moles.clone()));
    }

    /** Default number of steps. */
    public static final int DEFAULT_STEPS = 100;

    public BoilOffInput {
        if (fluid == null) {
            throw InvalidInputException.missing("boilOff.fluid", "expected the liquid's components and composition");
        }
        if (vessel == null) {
            throw InvalidInputException.missing("boilOff.vessel", "expected the vessel geometry");
        }
        if (level == null) {
            throw InvalidInputException.missing("boilOff.level", "expected the liquid level when relief starts");
        }
        if (device == null) {
            throw InvalidInputException.missing("boilOff.device", "expected the back pressure and coefficients");
        }
        storedMoles = storedMoles == null ? java.util.Optional.empty() : storedMoles.map(double[]::clone);
        if (storedMoles.isPresent() && storedMoles.get().length != fluid.components().size()) {
            throw InvalidInputException.invalid("boilOff.storedMoles", storedMoles.get().length + " values",
                    "expected one mole amount per component (" + fluid.components().size() + ")");
        }
        InvalidInputException.requirePositive("boilOff.heat", heatW, "W");
        InvalidInputException.requirePositive("boilOff.relievingPressure", relievingPressurePa, "Pa abs");
        InvalidInputException.requireInRange("boilOff.stopLiquidFraction", stopLiquidFraction, 0, 0.999, "");
        InvalidInputException.requirePositive("boilOff.timeLimit", timeLimitS, "s");
        if (steps < 2 || steps > 100_000) {
            throw InvalidInputException.outOfRange("boilOff.steps", steps, 2, 100_000, "");
        }
    }
}
