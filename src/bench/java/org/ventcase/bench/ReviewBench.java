package org.ventcase.bench;

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
import org.openjdk.jmh.annotations.Warmup;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ClaimedFiles;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.review.Review;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Tolerances;

/**
 * A tolerance change in the review: judging a review already computed (target <= 20 ms in process).
 * Run from the project folder: java -jar target/ventcase-bench.jar ReviewBench
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ReviewBench {

    private Review.Prepared prepared;
    private Tolerances tighter;

    @Setup
    public void setUp() {
        ValidatedCase kase = CaseFiles.load(Path.of("demo-cases/propane-bullet-fire.json"));
        ClaimedFiles.Claimed claimed = ClaimedFiles.read(Path.of("demo-cases/review/propane-bullet-latent-at-storage.json"));
        prepared = Review.prepare(CaseInputs.from(kase), claimed.values(kase.site().atmosphericPa()));
        tighter = Tolerances.defaults().with("latentHeat=2%");
    }

    /** The verdicts, hints and model range for changed tolerances. */
    @Benchmark
    public ReviewResult toleranceChange() {
        return prepared.judge(tighter);
    }
}
