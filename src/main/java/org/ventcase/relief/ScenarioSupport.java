package org.ventcase.relief;

import java.util.Locale;
import java.util.OptionalDouble;

import org.ventcase.common.TraceStep;
import org.ventcase.device.GasSizing;
import org.ventcase.device.GasSizingInput;
import org.ventcase.device.GasSizingResult;

/** Small shared pieces of the scenario classes: gas sizing from a relieved fluid, and formatting. */
final class ScenarioSupport {

    private ScenarioSupport() {
    }

    /** API 520 gas sizing for the relieved fluid at rate w (kg/s), with the device's coefficients. */
    static GasSizingResult sizeGas(double w, RelievedFluid f, DeviceSpec d) {
        return GasSizing.size(new GasSizingInput(w, f.pressurePa(), d.backPressurePa(), f.temperatureK(), f.z(),
                f.molarMass(), OptionalDouble.of(f.kIdeal()), d.kd(), d.kb(), d.kc()));
    }

    static TraceStep sizingStep(GasSizingResult gs) {
        TraceStep.Builder sz = TraceStep.of("Required effective area").equation(gs.equation()).source(gs.source());
        for (org.ventcase.common.LazyText line : gs.lines()) {
            sz.note(line);
        }
        return sz.out("Flow regime", gs.regime().name().toLowerCase(Locale.ROOT))
                .out("Required area", "%.1f mm2 (%.4f in2)", gs.areaMm2(),
                        gs.areaMm2() / 645.16).build();
    }

    static TraceStep fluidStep(String title, RelievedFluid f) {
        TraceStep.Builder b = TraceStep.of(title)
                .equation("cubic EOS at relieving conditions; k = Cp_ig/Cv_ig per API 520")
                .source(f.provenanceText());
        for (RelievedFluid.Row r : f.rows()) {
            b.out(r.name(), r.value());
        }
        return b.build();
    }

    static TraceStep expansionStep(IsenthalpicExpansion.Result e) {
        TraceStep.Builder b = TraceStep.of("Temperature after expansion to the back pressure").equation(e.equation())
                .source("first law, steady adiabatic flow without work: isenthalpic (common practice)");
        if (e.minimumDesignMetalTemperatureK().isPresent()) {
            b.in("Minimum design metal temperature of the outlet",
                    kelvinC(e.minimumDesignMetalTemperatureK().getAsDouble()));
        }
        b.out("T2", kelvinC(e.downstreamTemperatureK()))
                .out("Vapour fraction after expansion", "%.4f", e.vapourFraction());
        if (e.minimumDesignMetalTemperatureK().isPresent()) {
            double mdmt = e.minimumDesignMetalTemperatureK().getAsDouble();
            b.out("Cold-relief check", e.belowMdmt()
                    ? "T2 = " + kelvinC(e.downstreamTemperatureK()) + " is below the MDMT " + kelvinC(mdmt)
                            + ": brittle-fracture caution (see the warnings)"
                    : "T2 = " + kelvinC(e.downstreamTemperatureK()) + " is above the MDMT " + kelvinC(mdmt)
                            + ": no cold-relief concern");
        } else {
            b.note("No minimum design metal temperature given for the outlet: the cold-relief check is not made.");
        }
        return b.build();
    }

    // trace texts, formatted when read (org.ventcase.common.LazyText)
    static org.ventcase.common.LazyText kpa(double pa) {
        return org.ventcase.common.LazyText.format("%.1f kPa", pa / 1e3);
    }

    static org.ventcase.common.LazyText kelvinC(double k) {
        return org.ventcase.common.LazyText.format("%.2f K (%.2f C)", k, k - 273.15);
    }

    static org.ventcase.common.LazyText fractions(double[] x) {
        double[] copy = x.clone();
        return org.ventcase.common.LazyText.of(() -> {
            StringBuilder sb = new StringBuilder();
            for (double v : copy) {
                sb.append(sb.length() == 0 ? "" : ", ").append(String.format(Locale.US, "%.4f", v));
            }
            return "[" + sb + "]";
        });
    }
}
