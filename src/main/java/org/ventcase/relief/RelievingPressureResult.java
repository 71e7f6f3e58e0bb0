package org.ventcase.relief;

import java.util.List;

/**
 * The relieving pressure of one device and how it was reached.
 *
 * @param relievingPressurePa      P1, Pa absolute: set pressure + overpressure + atmospheric
 * @param overpressurePa           pressure rise above the set pressure allowed while relieving, Pa
 * @param overpressurePercentOfSet the same as a percentage of the gauge set pressure
 * @param accumulationPa           allowable accumulation above MAWP, Pa
 * @param maxAccumulatedGaugePa    MAWP + accumulation, Pa gauge
 * @param maxSetFractionOfMawp     largest set pressure allowed, as a fraction of MAWP (1.00, 1.05, 1.10)
 * @param rule                     the rule, in words, with the numbers used (made when read)
 * @param source                   where the rule comes from
 * @param warnings                 things a reviewer must see (e.g. set pressure above the limit with a reason)
 */
public record RelievingPressureResult(double relievingPressurePa, double overpressurePa, double overpressurePercentOfSet,
                                      double accumulationPa,
                                      double maxAccumulatedGaugePa, double maxSetFractionOfMawp,
                                      org.ventcase.common.LazyText rule, String source, List<String> warnings) {
    public RelievingPressureResult {
        warnings = List.copyOf(warnings);
    }

    /** The rule, in words, with the numbers used. */
    public String ruleApplied() {
        return rule.get();
    }

}
