package org.ventcase.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
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
import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseInput;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.SheetIdentity;
import org.ventcase.report.SheetModel;
import org.ventcase.report.SheetModels;
import org.ventcase.report.UnitSystem;

/**
 * One PDF calculation sheet in-process after warm-up. Target (DESIGN.md): <= 1 s. Both use the
 * path of {@code ventcase sheet}, run from the project folder (the invented demo cases):
 * {@code writeSheet}: the propane bullet demo's prepared SheetModel to a PDF file (layout, fonts,
 * figures, save, atomic move).
 * {@code caseSheet}: the LPG sphere demo case: case calculation with both scenarios, level curve
 * and phase envelope, the model and the PDF.
 * Run: mvn -q -Pbench -DskipTests package && java -jar target/ventcase-bench.jar SheetBench
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 3)
@Measurement(iterations = 5, time = 3)
@Fork(1)
public class SheetBench {

    private SheetModel model;
    private Path dir;
    private Path target;
    private CaseInput caseInput;
    private SheetIdentity caseIdentity;

    private static SheetIdentity identity(ValidatedCase vc) {
        return org.ventcase.app.CaseSheets.identity(vc, "bench");
    }

    @Setup
    public void setUp() throws IOException {
        ValidatedCase bullet = CaseFiles.load(Path.of("demo-cases", "propane-bullet-fire.json"));
        CaseInput bulletInput = CaseInputs.from(bullet);
        model = SheetModels.from(CaseCalculation.run(bulletInput), bulletInput, identity(bullet), UnitSystem.SI);
        ValidatedCase vc = CaseFiles.load(Path.of("demo-cases", "lpg-sphere-mixture.json"));
        caseInput = CaseInputs.from(vc);
        caseIdentity = identity(vc);
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
        org.ventcase.calc.CaseResult r = CaseCalculation.run(caseInput);
        CalculationSheet.write(SheetModels.from(r, caseInput, caseIdentity, UnitSystem.SI), target,
                CalculationSheet.PageSize.A4);
        return Files.size(target);
    }
}
