package org.ventcase.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.audit.VesselAudit;
import org.ventcase.cli.Main;
import org.ventcase.report.CalculationSheet;
import org.ventcase.app.AuditRunner;

/**
 * The audit mode's view-model without a window, on the invented demo register: the counts are
 * those of {@code ventcase audit} on the same files, an error row is listed with its field and
 * reason, progress reaches rows done = total, cancel drops the run, and both exports are written.
 * Background work is queued and run on demand so that the running state and cancel can be seen.
 */
class AuditViewModelTest {

    @TempDir
    Path tmp;

    private final List<Runnable> queued = new ArrayList<>();

    private final LiveCalculation.Env env = new LiveCalculation.Env() {
        @Override
        public LiveCalculation.Cancellable after(long delayMs, Runnable r) {
            throw new IllegalStateException("the audit mode sets no timers");
        }

        @Override
        public void background(Runnable r) {
            queued.add(r);
        }

        @Override
        public void ui(Runnable r) {
            r.run();
        }
    };

    private void drain() {
        while (!queued.isEmpty()) {
            queued.remove(0).run();
        }
    }

    private static final Path REGISTER = Path.of("demo-cases/register/kestrel-point-register.csv");
    private static final Path THRESHOLDS = Path.of("demo-cases/register/kestrel-point-thresholds.csv");

    @Test
    void theDemoRegisterGivesTheCommandsCountsAnErrorRowAndBothExports() throws Exception {
        StringWriter out = new StringWriter();
        Main.run(new PrintWriter(out), new PrintWriter(new StringWriter()), "audit", REGISTER.toString(),
                "--thresholds", THRESHOLDS.toString());
        Matcher m = Pattern.compile("Rows (\\d+): ok (\\d+), partial (\\d+), error (\\d+)").matcher(out.toString());
        assertTrue(m.find(), out.toString());

        AuditViewModel vm = new AuditViewModel(new AuditRunner(), env, 2);
        vm.openDemo();
        assertEquals(JobState.RUNNING, vm.state().get());
        assertTrue(vm.outcome().get().isEmpty());
        drain();
        assertEquals(JobState.CURRENT, vm.state().get(), vm.message().get());
        AuditRunner.Outcome o = vm.outcome().get().orElseThrow();
        assertEquals(Integer.parseInt(m.group(1)), o.result().rows().size());
        assertEquals(Long.parseLong(m.group(2)), o.count(VesselAudit.Status.OK));
        assertEquals(Long.parseLong(m.group(3)), o.count(VesselAudit.Status.PARTIAL));
        assertEquals(Long.parseLong(m.group(4)), o.count(VesselAudit.Status.ERROR));
        assertEquals(o.result().rows().size(), vm.total().get());
        assertEquals(vm.total().get(), vm.done().get());
        assertEquals(Optional.of(AuditRunner.DEMO_THRESHOLDS), o.thresholdsName());
        assertFalse(o.result().thresholds().isEmpty());

        VesselAudit err = o.result().notComputed().stream().filter(v -> v.status() == VesselAudit.Status.ERROR).findFirst()
                .orElseThrow();
        assertFalse(err.error().orElseThrow().field().isBlank());
        assertFalse(err.error().orElseThrow().reason().isBlank());
        assertTrue(err.row() > 0);
        assertTrue(o.result().topByInventory().size() <= AuditRunner.TOP && !o.result().topByInventory().isEmpty());
        double first = o.result().topByInventory().get(0).inventory().orElseThrow().totalMassKg();
        assertTrue(o.result().topByInventory().stream().allMatch(v -> v.inventory().get().totalMassKg() <= first));

        Path csv = tmp.resolve("audit.csv");
        Path pdf = tmp.resolve("audit.pdf");
        vm.writeCsv(csv);
        vm.writePdf(pdf, CalculationSheet.PageSize.A4);
        drain();
        assertTrue(vm.exportMessage().get().contains("audit.pdf"), vm.exportMessage().get());
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        assertEquals(o.result().rows().size() + 1, lines.size());
        byte[] head = new byte[4];
        System.arraycopy(Files.readAllBytes(pdf), 0, head, 0, 4);
        assertEquals("%PDF", new String(head, StandardCharsets.US_ASCII));
    }

    @Test
    void cancelDropsTheRunAndAMissingRegisterFailsWithItsName() {
        AuditViewModel vm = new AuditViewModel(new AuditRunner(), env, 1);
        vm.open(REGISTER);
        vm.cancel();
        assertEquals(JobState.CANCELLED, vm.state().get());
        drain();
        assertEquals(JobState.CANCELLED, vm.state().get());
        assertTrue(vm.outcome().get().isEmpty());
        vm.writeCsv(tmp.resolve("x.csv"));
        assertFalse(Files.exists(tmp.resolve("x.csv")));

        vm.open(tmp.resolve("no-such-register.csv"));
        drain();
        assertEquals(JobState.FAILED, vm.state().get());
        assertTrue(vm.message().get().contains("no-such-register.csv"), vm.message().get());
    }

    @Test
    void aCancelDuringTheRunStopsTheWorkersWithCancelled() {
        for (int threads : new int[] {1, 3}) {
            java.util.concurrent.atomic.AtomicInteger seen = new java.util.concurrent.atomic.AtomicInteger();
            org.junit.jupiter.api.Assertions.assertThrows(org.ventcase.app.CaseRunner.Cancelled.class,
                    () -> new AuditRunner().run(AuditRunner.Input.file(REGISTER), Optional.empty(), threads,
                            (d, n) -> seen.incrementAndGet(), () -> seen.get() > 5));
            assertTrue(seen.get() < 100, "stopped early, not after the whole register: " + seen.get());
        }
    }
}
