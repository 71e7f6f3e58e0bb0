package org.ventcase.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.GasSizingInput;
import org.ventcase.relief.BoilOff;
import org.ventcase.relief.BoilOffInput;
import org.ventcase.relief.BoilOffResult;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.DeviceSpec;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.MixtureSpec;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.ScenarioKind;
import org.ventcase.relief.WettedFire;
import org.ventcase.relief.WettedFireInput;
import org.ventcase.relief.WettedFireResult;
import org.ventcase.thermo.Component;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * Relief-scenario speed. Targets: full single-vessel fire case (geometry + saturation at P1 + load
 * + sizing, with the trace) <= 1 ms median; boil-off of 5 components (100 steps) <= 50 ms median.
 * Run: mvn -q -Pbench -DskipTests package && java -jar target/ventcase-bench.jar ScenarioBench
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ScenarioBench {

    private static final double ATM = PhysicalConstants.ATM_PA;
    private final Vessel bullet = Vessel.horizontal(2.5, 10, Head.ellipsoidal2to1(2.5), Head.ellipsoidal2to1(2.5));
    private final WettedFireInput fire = new WettedFireInput(ComponentLibrary.builtIn().get("propane"),
            EosVariant.PR78, DensityBasis.TRANSLATED, bullet, Level.ofPercentOfHeight(70), FireExposure.atElevation(0.8),
            288.15, new RelievingPressureInput(15e5, 15e5, ATM, DeviceCount.SINGLE, ScenarioKind.FIRE, false,
                    Optional.empty()), FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING, EnvironmentFactors.byKey("bare"),
            ATM, GasSizingInput.DEFAULT_KD, 1, 1, true);
    private final BoilOffInput boilOff = new BoilOffInput(five(),
            Vessel.horizontal(2.0, 6, Head.ellipsoidal2to1(2.0), Head.ellipsoidal2to1(2.0)), Level.ofPercentOfHeight(60),
            1.5e6, 15e5, 0.1, 1e7, BoilOffInput.DEFAULT_STEPS, DeviceSpec.gasValve(ATM));

    private static MixtureSpec five() {
        ComponentLibrary lib = ComponentLibrary.builtIn();
        List<Component> cs = new ArrayList<>();
        for (String n : new String[] {"ethane", "propane", "n-butane", "n-pentane", "n-hexane"}) {
            cs.add(lib.get(n));
        }
        return MixtureSpec.withBuiltInKij(EosVariant.PR78, cs, new double[] {0.05, 0.35, 0.3, 0.2, 0.1},
                DensityBasis.TRANSLATED);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MICROSECONDS)
    public WettedFireResult fullFireCase() {
        return WettedFire.run(fire);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public BoilOffResult boilOff5Components() {
        return BoilOff.run(boilOff);
    }
}
