package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.FluidProperties;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.mix.FlashResult;
import org.ventcase.thermo.mix.MixtureThermo;
import org.ventcase.thermo.mix.StateFlash;

/**
 * Temperature of the relieved fluid after an isenthalpic (throttling) expansion from relieving
 * conditions to the back pressure: H(T2, P2, x) = H(T1, P1, x), solved by a PH flash (which may
 * end two-phase), with a brittle-fracture caution where T2 is below the outlet's minimum design
 * metal temperature (MDMT).
 *
 * <p>Isenthalpic: steady flow through a valve and outlet with no heat or work and the kinetic
 * energy recovered (a first law statement; common practice, no source). The real outlet
 * temperature can be lower locally at the valve exit where the flow is fast; the caution says so.
 */
public final class IsenthalpicExpansion {

    /**
     * @param downstreamTemperatureK T2, K
     * @param downstreamPressurePa   P2, Pa abs
     * @param vapourFraction         vapour mole fraction after expansion (0..1)
     * @param enthalpyJmol           the conserved molar enthalpy (cubic basis, reference in MixtureThermo)
     * @param minimumDesignMetalTemperatureK the MDMT checked against, if given
     * @param belowMdmt              true when T2 is below the given MDMT
     * @param equation               what was solved
     * @param warnings               what the user must know
     */
    public record Result(double downstreamTemperatureK, double downstreamPressurePa, double vapourFraction,
                         double enthalpyJmol, OptionalDouble minimumDesignMetalTemperatureK, boolean belowMdmt,
                         String equation, List<String> warnings) {
        public Result {
            warnings = List.copyOf(warnings);
        }
    }

    private IsenthalpicExpansion() {
    }

    /**
     * Expands the relieved fluid to P2.
     *
     * @param spec   the fluid (for the model)
     * @param fluid  the relieved fluid at (T1, P1)
     * @param p2Pa   back pressure, Pa abs, below P1
     * @param mdmtK  minimum design metal temperature of the outlet, K; empty to skip the check
     */
    public static Result toBackPressure(MixtureSpec spec, RelievedFluid fluid, double p2Pa, OptionalDouble mdmtK) {
        if (!(p2Pa > 0 && p2Pa < fluid.pressurePa())) {
            throw InvalidInputException.outOfRange("device.backPressure", p2Pa, 0, fluid.pressurePa(),
                    "Pa abs (below the relieving pressure)");
        }
        CubicModel model = spec.model();
        double[] x = fluid.composition();
        PhaseRequest req = fluid.phase() == RelievedFluid.Phase.LIQUID ? PhaseRequest.LIQUID : PhaseRequest.VAPOR;
        FluidProperties fp = model.properties(fluid.temperatureK(), fluid.pressurePa(), x, req, DensityBasis.CUBIC);
        double h = MixtureThermo.idealGasEnthalpy(model, fluid.temperatureK(), x) + fp.residualEnthalpy();
        FlashResult r = new StateFlash(model).ph(p2Pa, h, x, fluid.temperatureK());
        List<String> w = new ArrayList<>(r.warnings());
        double t2 = r.temperatureK();
        boolean below = false;
        if (mdmtK == null) {
            mdmtK = OptionalDouble.empty();
        }
        if (mdmtK.isPresent() && t2 < mdmtK.getAsDouble()) {
            below = true;
            w.add(String.format(Locale.US, "Brittle-fracture caution: after expansion to %.1f kPa abs the relieved "
                    + "fluid is at %.1f C (vapour fraction %.3f), below the outlet's minimum design metal temperature of "
                    + "%.1f C. Check the outlet piping material (impact testing) or the design; locally, at the valve "
                    + "exit, the fast-flowing fluid is colder still.", p2Pa / 1e3, t2 - 273.15, r.vaporFraction(),
                    mdmtK.getAsDouble() - 273.15));
        }
        if (r.twoPhase() && fluid.phase() != RelievedFluid.Phase.LIQUID) {
            w.add(String.format(Locale.US, "The relieved vapour partly condenses on expansion to the back pressure "
                    + "(vapour fraction %.3f): liquid in the outlet.", r.vaporFraction()));
        }
        String eq = String.format(Locale.US, "H(T2, P2) = H(T1, P1) = %.1f J/mol; PH flash at P2 = %.1f kPa abs -> "
                + "T2 = %.2f K (%.2f C)", h, p2Pa / 1e3, t2, t2 - 273.15);
        return new Result(t2, p2Pa, r.vaporFraction(), h, mdmtK, below, eq, w);
    }
}
