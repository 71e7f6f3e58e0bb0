package org.ventcase.audit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;

import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseResult;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.VentcaseException;
import org.ventcase.device.OrificeSelection;
import org.ventcase.inventory.Inventories;
import org.ventcase.inventory.Inventory;
import org.ventcase.vessel.LevelState;

/**
 * Runs an audit: every item through {@link CaseCalculation#run} with the screening options (the same
 * code as the full case, without the load-against-level curve and the phase envelope, which the
 * audit does not report; in parallel, one row a task,
 * results kept in input order), then the totals and threshold checks ({@link AuditResult#of}).
 * A row whose calculation throws is reported as an error row; it never stops the run.
 */
public final class Audit {

    /** Receives progress from worker threads; must be thread-safe. */
    @FunctionalInterface
    public interface Progress {
        /** {@code done} of {@code total} rows are computed. */
        void update(int done, int total);

        /** No progress reports. */
        Progress NONE = (d, t) -> {
        };
    }

    private Audit() {
    }

    /** Runs the audit on all available processors. */
    public static AuditResult run(List<AuditItem> items, Thresholds thresholds) {
        return run(items, thresholds, Runtime.getRuntime().availableProcessors(), Progress.NONE);
    }

    /**
     * Runs the audit.
     *
     * @param threads  worker threads, at least 1 (1 computes in the calling thread)
     * @param progress progress listener, called from the worker threads
     */
    public static AuditResult run(List<AuditItem> items, Thresholds thresholds, int threads, Progress progress) {
        return run(items.size(), items::get, thresholds, threads, progress);
    }

    /**
     * Runs the audit of a register, each row read into its case by the worker that computes it,
     * so that no more than one case a thread is held at a time.
     */
    public static AuditResult run(Register register, Thresholds thresholds, int threads, Progress progress) {
        RegisterCases rc = new RegisterCases(register.origin());
        List<RegisterRow> rows = register.rows();
        return run(rows.size(), i -> rc.item(rows.get(i)), thresholds, threads, progress);
    }

    /** Rows read, computed and handed on at a time by the streamed {@code run}. */
    public static final int CHUNK_ROWS = 2048;

    /**
     * Runs the audit of a register read in chunks of {@link #CHUNK_ROWS}, keeping every row (the
     * screen shows them). Memory grows with the register: a command-line run uses
     * {@link #run(Register.Stream, int, Thresholds, int, Progress, Consumer)}.
     */
    public static AuditResult run(Register.Stream register, int total, Thresholds thresholds, int threads,
                                  Progress progress) {
        List<VesselAudit> all = new ArrayList<>();
        AuditResult r = run(register, total, thresholds, threads, progress, all::addAll);
        return new AuditResult(all, r.digest(), r.site(), r.byArea(), r.byFluid(), r.thresholds(),
                r.thresholdsOrigin());
    }

    /**
     * Runs the audit of a register read in chunks of {@link #CHUNK_ROWS}: read a chunk, compute it in
     * parallel, hand its rows in input order to {@code sink}, add them to the totals and summaries,
     * read on. Only the register text, one chunk and the summaries stay in memory; the result holds
     * no rows ({@link AuditResult#rows()} is empty).
     *
     * @param total the number of rows, for progress (the count of the register's records after the header)
     * @param sink  receives each chunk's rows, in input order, on the calling thread
     */
    public static AuditResult run(Register.Stream register, int total, Thresholds thresholds, int threads,
                                  Progress progress, Consumer<List<VesselAudit>> sink) {
        RegisterCases rc = new RegisterCases(register.origin());
        java.util.Iterator<Chunk> chunks = new java.util.Iterator<>() {
            private List<RegisterRow> next = register.next(CHUNK_ROWS);

            @Override
            public boolean hasNext() {
                return !next.isEmpty();
            }

            @Override
            public Chunk next() {
                List<RegisterRow> rows = next;
                next = register.next(CHUNK_ROWS);
                // each row is read into its case by the worker that computes it
                return new Chunk(rows.size(), i -> rc.item(rows.get(i)));
            }
        };
        return stream(chunks, total, thresholds, threads, progress, sink);
    }

    /** One chunk of a streamed audit: its size and how item i is made (on the worker that computes it). */
    private record Chunk(int size, java.util.function.IntFunction<AuditItem> item) {
    }

    /** The streamed audit: chunk by chunk, computed in parallel, rows handed on in input order. */
    private static AuditResult stream(java.util.Iterator<Chunk> chunks, int total, Thresholds thresholds, int threads,
                                      Progress progress, Consumer<List<VesselAudit>> sink) {
        if (threads < 1) {
            throw InvalidInputException.invalid("threads", threads, "expected at least 1");
        }
        AuditResult.Builder acc = new AuditResult.Builder();
        AtomicInteger done = new AtomicInteger();
        int seen = 0;
        ExecutorService pool = threads > 1 ? pool(threads) : null;
        try {
            while (chunks.hasNext()) {
                Chunk c = chunks.next();
                seen += c.size();
                List<VesselAudit> out = Arrays.asList(compute(c.size(), c.item(), pool, threads, done,
                        Math.max(total, seen), progress));
                sink.accept(out);
                out.forEach(acc::add);
            }
        } finally {
            if (pool != null) {
                pool.shutdownNow();
            }
        }
        return acc.build(thresholds, List.of());
    }

    /**
     * Runs the audit of items made a chunk at a time (a folder of case files: each chunk's files
     * read when it is reached), computing each chunk in parallel and handing its rows to
     * {@code sink} in input order, as the streamed register audit does; the result holds no rows.
     *
     * @param total the number of items, for progress
     */
    public static AuditResult run(java.util.Iterator<List<AuditItem>> chunks, int total, Thresholds thresholds,
                                  int threads, Progress progress, Consumer<List<VesselAudit>> sink) {
        java.util.Iterator<Chunk> c = new java.util.Iterator<>() {
            @Override
            public boolean hasNext() {
                return chunks.hasNext();
            }

            @Override
            public Chunk next() {
                List<AuditItem> items = chunks.next();
                return new Chunk(items.size(), items::get);
            }
        };
        return stream(c, total, thresholds, threads, progress, sink);
    }

    /**
     * Runs the audit of n items, item i made by {@code item} on the worker thread that computes it.
     *
     * @param threads  worker threads, at least 1 (1 computes in the calling thread)
     * @param progress progress listener, called from the worker threads
     */
    public static AuditResult run(int n, java.util.function.IntFunction<AuditItem> item, Thresholds thresholds,
                                  int threads, Progress progress) {
        if (threads < 1) {
            throw InvalidInputException.invalid("threads", threads, "expected at least 1");
        }
        ExecutorService pool = threads > 1 && n > 1 ? pool(Math.min(threads, n)) : null;
        try {
            VesselAudit[] out = compute(n, item, pool, threads, new AtomicInteger(), n, progress);
            return AuditResult.of(Arrays.asList(out), thresholds);
        } finally {
            if (pool != null) {
                pool.shutdownNow();
            }
        }
    }

    private static ExecutorService pool(int threads) {
        return Executors.newFixedThreadPool(threads, r -> {
            Thread th = new Thread(r, "ventcase-audit");
            th.setDaemon(true);
            return th;
        });
    }

    /** Computes n items on the pool (or in this thread without one), results in input order. */
    private static VesselAudit[] compute(int n, java.util.function.IntFunction<AuditItem> item, ExecutorService pool,
                                         int threads, AtomicInteger done, int total, Progress progress) {
        VesselAudit[] out = new VesselAudit[n];
        AtomicInteger next = new AtomicInteger();
        Runnable worker = () -> {
            for (int i = next.getAndIncrement(); i < n; i = next.getAndIncrement()) {
                out[i] = audit(item.apply(i));
                progress.update(done.incrementAndGet(), total);
            }
        };
        if (pool == null) {
            worker.run();
            return out;
        }
        try {
            List<Future<?>> fs = new ArrayList<>();
            for (int k = 0; k < Math.min(threads, Math.max(1, n)); k++) {
                fs.add(pool.submit(worker));
            }
            for (Future<?> f : fs) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("audit interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("audit worker failed", e.getCause());
        }
        return out;
    }

    /** The audit of one item (the case path, then the checks). Never throws for a bad row. */
    public static VesselAudit audit(AuditItem it) {
        if (it.error().isPresent()) {
            return error(it, it.error().get());
        }
        CaseResult r;
        try {
            r = CaseCalculation.run(it.input().get(), CaseCalculation.Options.SCREENING);
        } catch (InvalidInputException e) {
            String field = it.source().endsWith(".json") ? e.field() : RegisterCases.column(e.field());
            return error(it, new AuditError(field, e.value(), e.accepted()));
        } catch (VentcaseException e) {
            return error(it, new AuditError("calculation", "", e.getMessage()));
        } catch (RuntimeException e) {
            return error(it, new AuditError("calculation", "", "internal error, please report: " + e));
        }
        return from(it, r);
    }

    private static VesselAudit error(AuditItem it, AuditError e) {
        return new VesselAudit(it.row(), it.source(), it.tag(), it.area(), it.fluid(), VesselAudit.Status.ERROR,
                Optional.of(e), Optional.empty(), Optional.empty(), List.of(), List.of());
    }

    /** Maps a case result to the audit row. */
    static VesselAudit from(AuditItem it, CaseResult r) {
        Inventory inv = r.inventory();
        LevelState v = r.vessel();
        VesselAudit.Contents contents = new VesselAudit.Contents(inv.mode(), inv.temperatureK(), inv.pressurePa(),
                v.totalVolume(), v.liquidVolume(), v.vapourVolume(), v.levelPercentVolume(), v.wettedArea(),
                v.fire().area(), inv.liquidMassKg(), inv.vapourMassKg(), inv.totalMassKg(), inv.massPerComponentKg());
        LinkedHashSet<String> warnings = new LinkedHashSet<>(it.notes());
        for (CaseResult.CaseWarning w : r.warnings()) {
            warnings.add(w.message());
        }
        List<VesselAudit.Flag> flags = new ArrayList<>();
        if (inv.liquidFull().map(c -> c.fillsBeforeRelief()).orElse(false)) {
            flags.add(VesselAudit.Flag.LIQUID_FULL);
        }
        if (inv.liquid().isPresent() && v.levelPercentVolume() > 100 - Inventories.MIN_OUTAGE_PERCENT) {
            flags.add(VesselAudit.Flag.LOW_OUTAGE);
        }
        if (it.statedPressurePa().isPresent()) {
            double stated = it.statedPressurePa().getAsDouble();
            double rel = Math.abs(stated - inv.pressurePa()) / inv.pressurePa();
            if (rel > RegisterCases.STATED_PRESSURE_TOLERANCE) {
                flags.add(VesselAudit.Flag.PRESSURE_MISMATCH);
                warnings.add(String.format(Locale.ROOT, "The register states %.1f kPa abs for saturated storage; the "
                        + "bubble pressure at the storage temperature is %.1f kPa abs (%.0f %% apart). The inventory "
                        + "uses the bubble pressure: check the temperature, the fluid or the storage mode.",
                        stated / 1e3, inv.pressurePa() / 1e3, 100 * rel));
            }
        }
        CaseResult.ScenarioResult s = r.scenarios().get(0);
        if (s.failure().isPresent() || s.requiredAreaM2().isEmpty()) {
            flags.add(VesselAudit.Flag.FIRE_NOT_COMPUTED);
            String why = s.failure().orElse("the scenario gave no required area");
            return new VesselAudit(it.row(), it.source(), it.tag(), it.area(), it.fluid(), VesselAudit.Status.PARTIAL,
                    Optional.of(new AuditError("fire load", "", why)), Optional.of(contents), Optional.empty(), flags,
                    new ArrayList<>(warnings));
        }
        double area = s.requiredAreaM2().getAsDouble();
        double w = s.reliefLoadKgPerS().getAsDouble();
        Optional<VesselAudit.InstalledCheck> check = Optional.empty();
        if (it.installed().isPresent()) {
            InstalledOrifice io = it.installed().get();
            double a = io.areaM2();
            boolean covers = a >= area;
            check = Optional.of(new VesselAudit.InstalledCheck(io.designation(), a, 100 * (a / area - 1), covers));
            if (!covers) {
                flags.add(VesselAudit.Flag.INSTALLED_SHORT);
            }
        }
        String selected = s.orifice().map(OrificeSelection::designation).orElse("");
        VesselAudit.FireLoad fire = new VesselAudit.FireLoad(s.type().key(), s.relievingPressurePa().getAsDouble(),
                s.relievingTemperatureK().getAsDouble(), s.heatInputW(), s.latentHeatJPerKg(), w, area, selected,
                check);
        return new VesselAudit(it.row(), it.source(), it.tag(), it.area(), it.fluid(), VesselAudit.Status.OK,
                Optional.empty(), Optional.of(contents), Optional.of(fire), flags, new ArrayList<>(warnings));
    }
}
