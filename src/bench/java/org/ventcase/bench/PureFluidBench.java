package org.ventcase.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.CubicModel;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.PhaseRequest;
import org.ventcase.thermo.PureSaturation;

/**
 * Pure-fluid EOS speed. Target (issue: EOS core): Z + fugacity at (T, P) <= 200 ns median.
 * Run: mvn -q -Pbench -DskipTests package && java -jar target/ventcase-bench.jar PureFluidBench
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class PureFluidBench {

    /** The equation of state: the default (PR-Twu) and the classic PR78. */
    @Param({"PRTWU", "PR78"})
    public String eos;

    private CubicModel model;
    private PureSaturation sat;
    private double t = 300.0;
    private double p = 1.0e6;

    @Setup
    public void setUp() {
        model = CubicModel.pure(org.ventcase.thermo.EosVariant.valueOf(eos), ComponentLibrary.builtIn().get("propane"));
        sat = new PureSaturation(model);
    }

    /** Z (stable root by Gibbs energy, three real roots here) and ln phi at 300 K, 10 bar. */
    @Benchmark
    public double zAndFugacity() {
        double[] r = model.pureZAndLnPhi(t, p, PhaseRequest.STABLE);
        return r[0] + r[1];
    }

    /** Saturation pressure and both phases at 300 K. */
    @Benchmark
    public Object saturationAtTemperature() {
        return sat.atTemperature(t, DensityBasis.TRANSLATED);
    }

    /** Saturation temperature at 18.2 bar abs (a relieving pressure). */
    @Benchmark
    public Object saturationAtPressure() {
        return sat.atPressure(1.82e6, DensityBasis.TRANSLATED);
    }
}
