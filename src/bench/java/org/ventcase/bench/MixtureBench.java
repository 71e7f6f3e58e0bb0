package org.ventcase.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.EosVariant;
import org.ventcase.thermo.mix.FlashResult;
import org.ventcase.thermo.mix.KijTable;
import org.ventcase.thermo.mix.PTFlash;
import org.ventcase.thermo.mix.PhaseEnvelope;
import org.ventcase.thermo.mix.SaturationPoint;
import org.ventcase.thermo.mix.SaturationPoints;

/** Mixture benchmarks: targets PT flash (5 components, two-phase) <= 20 us, bubble point <= 20 us, 10-component envelope <= 50 ms. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
public class MixtureBench {

    private final CubicModel five = model("methane", "ethane", "propane", "n-butane", "n-pentane");
    private final double[] z5 = {0.5, 0.15, 0.15, 0.1, 0.1};
    private final CubicModel ten = model("nitrogen", "carbon dioxide", "methane", "ethane", "propane", "isobutane",
            "n-butane", "n-pentane", "n-hexane", "n-heptane");
    private final double[] z10 = {0.02, 0.03, 0.6, 0.1, 0.08, 0.04, 0.04, 0.03, 0.03, 0.03};
    private final PTFlash flash = new PTFlash(five);
    private final SaturationPoints sat = new SaturationPoints(five);
    private final PhaseEnvelope env = new PhaseEnvelope(ten);

    private static CubicModel model(String... names) {
        List<Component> cs = new ArrayList<>();
        for (String n : names) {
            cs.add(ComponentLibrary.builtIn().get(n));
        }
        return new CubicModel(EosVariant.DEFAULT, cs, KijTable.builtIn().matrix(cs, EosVariant.DEFAULT).kij());
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MICROSECONDS)
    public FlashResult ptFlash5TwoPhase() {
        return flash.flash(250, 3e6, z5);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MICROSECONDS)
    public SaturationPoint bubblePressure5() {
        return sat.bubblePressure(250, z5);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public PhaseEnvelope.Result envelope10() {
        return env.trace(z10);
    }
}
