package org.ventcase.cli;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Runs a batch command (the register audit) in a child JVM with the serial collector, when the
 * user started Ventcase without choosing a collector or heap size.
 *
 * <p>Why: the audit allocates fast and keeps little (its per-vessel rows). On this kind of
 * machine the JVM picks G1 by default, which answers a high allocation rate by growing the heap:
 * a 100,000-row register peaked at 2.0-2.5 GB resident with G1 against 0.54 GB with the serial
 * collector, which was also faster (20.8 s against 24.2 s; whole-process runs,
 * tools/bench_whole_process.py). The child also runs with the client (C1) compiler only
 * ({@code -XX:TieredStopAtLevel=1}): on the 2-core machine the optimising compiler's work competed
 * with the two workers, and a 10,000-row audit took 5.7-6.6 s with it against 2.9-3.7 s without it
 * (100,000 rows: 25.1 s against 24.8 s; 2026-12-03, three runs each). A jar cannot name JVM options, so the command starts itself once
 * more with them; the child inherits the standard streams and its exit code is returned. Set
 * {@code VENTCASE_FORK=0} (or start java with your own -Xmx or -XX:+Use...GC) to run in the first
 * JVM instead.
 */
final class BatchJvm {

    /** Set in the child so that it does not fork again. */
    static final String CHILD_PROPERTY = "ventcase.batchChild";

    private BatchJvm() {
    }

    /** Whether this command line should run in a child JVM. */
    static boolean wanted(String[] args, List<String> jvmArgs, String env) {
        if (args.length == 0 || !"audit".equals(args[0]) || "0".equals(env) || Boolean.getBoolean(CHILD_PROPERTY)) {
            return false;
        }
        for (String a : args) {
            if (a.equals("--help") || a.equals("-h") || a.equals("--version") || a.equals("-V")) {
                return false;
            }
        }
        for (String a : jvmArgs) {
            if (a.startsWith("-Xmx") || a.startsWith("-XX:MaxHeapSize") || a.startsWith("-XX:MaxRAM")
                    || a.matches("-XX:\\+Use\\w*GC")) {
                return false;
            }
        }
        return true;
    }

    /**
     * Runs the command line in a child JVM and returns its exit code, or empty when the child
     * could not be started (the caller then runs the command itself).
     */
    static Optional<Integer> run(String[] args) {
        Optional<String> java = ProcessHandle.current().info().command();
        String cp = System.getProperty("java.class.path");
        if (java.isEmpty() || cp == null || cp.isBlank()) {
            return Optional.empty();
        }
        List<String> cmd = new ArrayList<>();
        cmd.add(java.get());
        // the user's own JVM options (system properties, agents) go to the child as well
        List<String> jvmArgs = ManagementFactory.getRuntimeMXBean().getInputArguments();
        for (String a : jvmArgs) {
            if (!a.startsWith("-D" + CHILD_PROPERTY)) {
                cmd.add(a);
            }
        }
        cmd.add("-XX:+UseSerialGC");
        if (jvmArgs.stream().noneMatch(a -> a.startsWith("-XX:TieredStopAtLevel")
                || a.startsWith("-XX:-TieredCompilation"))) {
            // the client compiler only: the optimising compiler's work competes with the workers on a
            // small machine and does not pay back within an audit's run (measured, see the class comment)
            cmd.add("-XX:TieredStopAtLevel=1");
        }
        cmd.add("-D" + CHILD_PROPERTY + "=true");
        cmd.add("-cp");
        cmd.add(cp);
        cmd.add(Main.class.getName());
        cmd.addAll(List.of(args));
        try {
            Process p = new ProcessBuilder(cmd).inheritIO().start();
            return Optional.of(p.waitFor());
        } catch (IOException e) {
            return Optional.empty();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Optional.of(ExitCode.INTERNAL);
        }
    }
}
