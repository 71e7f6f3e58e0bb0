package org.ventcase.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
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
import org.ventcase.audit.Audit;
import org.ventcase.audit.AuditCsv;
import org.ventcase.audit.AuditResult;
import org.ventcase.audit.Register;
import org.ventcase.audit.RegisterCases;
import org.ventcase.audit.Thresholds;

/**
 * Inventory audit speed. Target: a register of 10,000 vessels (the demo register's 210 computable
 * rows repeated) read, turned into cases, computed on all cores and written as CSV text in <= 5 s.
 * Run from the project folder (it reads demo-cases/register/):
 * mvn -q -Pbench -DskipTests package && java -jar target/ventcase-bench.jar AuditBench
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(1)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class AuditBench {

    /** Vessels in the benchmark register. */
    public static final int VESSELS = 10_000;

    private String register;

    @Setup
    public void setUp() throws IOException {
        List<String> lines = Files.readAllLines(Path.of("demo-cases/register/kestrel-point-register.csv"));
        List<String> data = new ArrayList<>();
        String header = null;
        for (String l : lines) {
            if (l.startsWith("#") || l.isBlank()) {
                continue;
            }
            if (header == null) {
                header = l;
            } else if (!l.contains("Area 90 test rows")) {
                data.add(l);
            }
        }
        StringBuilder sb = new StringBuilder(header).append('\n');
        for (int i = 0; i < VESSELS; i++) {
            sb.append(data.get(i % data.size())).append('\n');
        }
        register = sb.toString();
    }

    @Benchmark
    public String audit10000Vessels() {
        Register reg = Register.parse(register, "bench.csv");
        AuditResult r = Audit.run(RegisterCases.items(reg), Thresholds.none());
        if (r.rows().size() != VESSELS) {
            throw new IllegalStateException("expected every row once");
        }
        return AuditCsv.text(r);
    }
}
