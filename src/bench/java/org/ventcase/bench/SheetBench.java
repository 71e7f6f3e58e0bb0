package org.ventcase.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.ventcase.common.PhysicalConstants;
import org.ventcase.device.GasSizingInput;
import org.ventcase.relief.DeviceCount;
import org.ventcase.relief.EnvironmentFactors;
import org.ventcase.relief.FireFighting;
import org.ventcase.relief.RelievingPressureInput;
import org.ventcase.relief.ScenarioKind;
import org.ventcase.relief.WettedFire;
import org.ventcase.relief.WettedFireInput;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.SheetIdentity;
import org.ventcase.report.SheetModel;
import org.ventcase.report.SheetModels;
import org.ventcase.report.UnitSystem;
import org.ventcase.thermo.ComponentLibrary;
import org.ventcase.thermo.DensityBasis;
import org.ventcase.thermo.EosVariant;
import org.ventcase.vessel.FireExposure;
import org.ventcase.vessel.Head;
import org.ventcase.vessel.Level;
import org.ventcase.vessel.Vessel;

/**
 * One PDF calculation sheet in-process after warm-up. Target (DESIGN.md): <= 1 s.
 * {@code writeSheet}: a prepared SheetModel to a PDF file (layout, fonts, figures, save, atomic move).
 * {@code calculateAndWriteSheet}: the fire case, its 20-level load curve, the model and the PDF.
 * {@code caseSheet}: the LPG sphere demo case (run from demo-cases/, the project folder): case
 * calculation with both scenarios, level curve and phase envelope, the model and the PDF.
 * Run: mvn -q -Pbench -DskipTests package && java -jar target/ventcase-bench.jar SheetBench
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 3)
@Measurement(iterations = 5, time = 3)
@Fork(1)
public class SheetBench {

    private WettedFireInput input;
    private SheetIdentity identity;
    private SheetModel model;
    private Path dir;
    private Path target;
    private org.ventcase.calc.CaseInput caseInput;
    private SheetIdentity caseIdentity;

    @Setup
    public void setUp() throws IOException {
        double atm = PhysicalConstants.ATM_PA;
        // invented case: propane bullet, 3.2 m x 16 m, 2:1 heads, 85 % of volume
        input = new WettedFireInput(ComponentLibrary.builtIn().get("propane"), EosVariant.PR78,
                DensityBasis.TRANSLATED, Vessel.horizontal(3.2, 16.0, Head.ellipsoidal2to1(3.2),
                Head.ellipsoidal2to1(3.2)), Level.ofPercentOfVolume(85), FireExposure.atElevation(1.0), 288.15,
                RelievingPressureInput.of(17.2e5, 17.2e5, atm, DeviceCount.SINGLE, ScenarioKind.FIRE),
                FireFighting.ADEQUATE_DRAINAGE_AND_FIREFIGHTING, EnvironmentFactors.byKey("bare"), atm,
                GasSizingInput.DEFAULT_KD, 1.0, 1.0, false);
        identity = new SheetIdentity("Bench bullet B-0001 (invented): fire relief basis", "B-0001", "A",
                LocalDate.of(2026, 1, 1), "bench", "", "Ventcase", "bench",
                "0000000000000000000000000000000000000000000000000000000000000000");
        model = SheetModels.from(WettedFire.run(input), identity, UnitSystem.SI);
        // the invented LPG sphere demo case: wetted fire (with its load against level) and a 2 h boil-off
        org.ventcase.casefile.ValidatedCase vc = org.ventcase.casefile.CaseFiles.load(
                Path.of("demo-cases", "lpg-sphere-mixture.json"));
        caseInput = org.ventcase.casefile.CaseInputs.from(vc);
        caseIdentity = new SheetIdentity(vc.identity().title(), vc.identity().tag(), vc.identity().revision(),
                vc.identity().date(), vc.identity().preparer(), vc.identity().checker(), "Ventcase", "bench",
                vc.inputHash());
        dir = Files.createTempDirectory("sheetbench");
        target = dir.resolve("sheet.pdf");
    }

    @TearDown
    public void tearDown() throws IOException {
        Files.deleteIfExists(target);
        Files.deleteIfExists(dir);
    }

    @Benchmark
    public long writeSheet() throws IOException {
        CalculationSheet.write(model, target, CalculationSheet.PageSize.A4);
        return Files.size(target);
    }

    /** A whole case from its input: the case pipeline (every scenario, curves, envelope), the model, the PDF. */
    @Benchmark
    public long caseSheet() throws IOException {
        org.ventcase.calc.CaseResult r = org.ventcase.calc.CaseCalculation.run(caseInput);
        CalculationSheet.write(SheetModels.from(r, caseInput, caseIdentity, UnitSystem.SI), target,
                CalculationSheet.PageSize.A4);
        return Files.size(target);
    }

    @Benchmark
    public long calculateAndWriteSheet() throws IOException {
        SheetModel m = SheetModels.from(WettedFire.run(input), identity, UnitSystem.SI);
        CalculationSheet.write(m, target, CalculationSheet.PageSize.A4);
        return Files.size(target);
    }
}
