package org.ventcase.audit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * An audit's results: totals per area, per fluid and per component over the rows whose inventory
 * was computed (status ok or partial), the threshold checks, and what the summaries list (counts
 * per status, the {@link #TOP} largest vessels by inventory and by fire load, the first
 * {@link #LISTED} rows not computed, flagged or short of their installed orifice). Totals are sums in
 * input order, so the same input gives the same bits whatever the number of threads.
 *
 * <p>The rows themselves are kept only when the caller asked for them ({@link #of}: the screen
 * shows them); a streamed audit ({@link Audit#run(Register.Stream, int, Thresholds, int, Audit.Progress,
 * java.util.function.Consumer)}) hands each row to its sink and keeps only the summaries, so its
 * memory does not grow with the register.
 *
 * @param rows        every input row in input order, or empty when the rows were not kept
 * @param digest      counts and the listed rows
 * @param site        the whole register
 * @param byArea      per area, areas in alphabetical order
 * @param byFluid     per fluid as written, in alphabetical order
 * @param thresholds  one check per threshold entry, in the thresholds file's order
 * @param thresholdsOrigin the thresholds file's name ("" when none was given)
 */
public record AuditResult(List<VesselAudit> rows, Digest digest, Group site, List<Group> byArea, List<Group> byFluid,
                          List<ThresholdCheck> thresholds, String thresholdsOrigin) {

    /** Vessels listed in each "largest" table. */
    public static final int TOP = 15;

    /** Rows listed (at most) in each list of rows not computed, flagged or short. */
    public static final int LISTED = 150;

    public AuditResult {
        rows = List.copyOf(rows);
        byArea = List.copyOf(byArea);
        byFluid = List.copyOf(byFluid);
        thresholds = List.copyOf(thresholds);
    }

    /**
     * Counts and listed rows of an audit.
     *
     * @param rowCount        input rows
     * @param statusCounts    rows per status (ok, partial, error)
     * @param withInstalled   rows whose installed orifice was checked
     * @param topByInventory  the computed vessels, largest inventory first (ties: input order), at most TOP
     * @param topByFireLoad   the vessels with a fire load, largest first (ties: input order), at most TOP
     * @param notComputed     the first LISTED error and partial rows, in input order
     * @param notComputedCount all error and partial rows
     * @param flagged         the first LISTED rows with a flag other than "fire load not computed"
     * @param flaggedCount    all such rows
     * @param installedShort  the first LISTED rows whose installed orifice is short
     * @param installedShortCount all such rows
     */
    public record Digest(int rowCount, Map<VesselAudit.Status, Long> statusCounts, long withInstalled,
                         List<VesselAudit> topByInventory, List<VesselAudit> topByFireLoad,
                         List<VesselAudit> notComputed, long notComputedCount, List<VesselAudit> flagged,
                         long flaggedCount, List<VesselAudit> installedShort, long installedShortCount) {
        public Digest {
            statusCounts = Collections.unmodifiableMap(new java.util.EnumMap<>(statusCounts));
            topByInventory = List.copyOf(topByInventory);
            topByFireLoad = List.copyOf(topByFireLoad);
            notComputed = List.copyOf(notComputed);
            flagged = List.copyOf(flagged);
            installedShort = List.copyOf(installedShort);
        }
    }

    /**
     * Totals over a set of vessels.
     *
     * @param name               the area, the fluid, or "site"
     * @param vessels            vessels whose inventory was computed
     * @param liquidMassKg       kg
     * @param vapourMassKg       kg
     * @param totalMassKg        kg
     * @param massPerComponentKg component -> kg, components in order of first appearance
     * @param largestFire        the vessel with the largest screening fire load, when any has one
     */
    public record Group(String name, int vessels, double liquidMassKg, double vapourMassKg, double totalMassKg,
                        Map<String, Double> massPerComponentKg, Optional<VesselAudit> largestFire) {
        public Group {
            massPerComponentKg = Collections.unmodifiableMap(new LinkedHashMap<>(massPerComponentKg));
        }
    }

    /**
     * One threshold against the totals.
     *
     * @param entry         the user's threshold
     * @param siteKg        the site total of that component, kg
     * @param siteExceeds   site total &gt; threshold
     * @param areasExceeding areas whose total of that component exceeds the threshold, with their totals
     */
    public record ThresholdCheck(Thresholds.Entry entry, double siteKg, boolean siteExceeds,
                                 Map<String, Double> areasExceeding) {
        public ThresholdCheck {
            areasExceeding = Collections.unmodifiableMap(new LinkedHashMap<>(areasExceeding));
        }

        /** Site total / threshold. */
        public double siteRatio() {
            return siteKg / entry.thresholdKg();
        }
    }

    /** Count of rows with a status. */
    public long count(VesselAudit.Status s) {
        return digest.statusCounts().getOrDefault(s, 0L);
    }

    /** Input rows (whether or not the rows were kept). */
    public int rowCount() {
        return digest.rowCount();
    }

    /** The computed vessels, largest inventory first, at most {@link #TOP}. */
    public List<VesselAudit> topByInventory() {
        return digest.topByInventory();
    }

    /** The vessels with a screening fire load, largest first, at most {@link #TOP}. */
    public List<VesselAudit> topByFireLoad() {
        return digest.topByFireLoad();
    }

    /** The first {@link #LISTED} rows not (fully) computed, in input order. */
    public List<VesselAudit> notComputed() {
        return digest.notComputed();
    }

    /** The first {@link #LISTED} rows whose installed orifice is short, in input order. */
    public List<VesselAudit> installedShort() {
        return digest.installedShort();
    }

    /** Every component that appears in a computed row, in order of first appearance. */
    public List<String> components() {
        return new ArrayList<>(site.massPerComponentKg().keySet());
    }

    private static final class Acc {
        final String name;
        int n;
        double liquid;
        double vapour;
        double total;
        final Map<String, Double> per = new LinkedHashMap<>();
        VesselAudit largest;

        Acc(String name) {
            this.name = name;
        }

        void add(VesselAudit v) {
            VesselAudit.Contents c = v.inventory().orElseThrow();
            n++;
            liquid += c.liquidMassKg();
            vapour += c.vapourMassKg();
            total += c.totalMassKg();
            c.massPerComponentKg().forEach((k, m) -> per.merge(k, m, Double::sum));
            if (v.fire().isPresent() && (largest == null
                    || v.fire().get().reliefLoadKgPerS() > largest.fire().get().reliefLoadKgPerS())) {
                largest = v;
            }
        }

        Group group() {
            return new Group(name, n, liquid, vapour, total, per, Optional.ofNullable(largest));
        }
    }

    /** Totals, checks and summaries of all rows (in input order), the rows kept. */
    public static AuditResult of(List<VesselAudit> rows, Thresholds thresholds) {
        Builder b = new Builder();
        rows.forEach(b::add);
        return b.build(thresholds, rows);
    }

    /**
     * Accumulates the totals and summaries row by row, in input order; holds no more than the
     * groups, the {@link #TOP} lists and the first {@link #LISTED} rows of each list, however many
     * rows are added. Not thread-safe.
     */
    public static final class Builder {
        private final Acc site = new Acc("site");
        private final Map<String, Acc> areas = new TreeMap<>();
        private final Map<String, Acc> fluids = new TreeMap<>();
        private final Map<VesselAudit.Status, Long> counts = new java.util.EnumMap<>(VesselAudit.Status.class);
        private final List<VesselAudit> topInventory = new ArrayList<>();
        private final List<VesselAudit> topFire = new ArrayList<>();
        private final List<VesselAudit> notComputed = new ArrayList<>();
        private final List<VesselAudit> flagged = new ArrayList<>();
        private final List<VesselAudit> installedShort = new ArrayList<>();
        private int rowCount;
        private long withInstalled;
        private long notComputedCount;
        private long flaggedCount;
        private long installedShortCount;

        /** Adds the next row (rows must come in input order). */
        public void add(VesselAudit v) {
            rowCount++;
            counts.merge(v.status(), 1L, Long::sum);
            if (v.status() != VesselAudit.Status.OK) {
                notComputedCount++;
                listed(notComputed, v);
            }
            if (v.flags().stream().anyMatch(f -> f != VesselAudit.Flag.FIRE_NOT_COMPUTED)) {
                flaggedCount++;
                listed(flagged, v);
            }
            if (v.flags().contains(VesselAudit.Flag.INSTALLED_SHORT)) {
                installedShortCount++;
                listed(installedShort, v);
            }
            if (v.fire().flatMap(VesselAudit.FireLoad::installed).isPresent()) {
                withInstalled++;
            }
            if (v.fire().isPresent()) {
                top(topFire, v, v.fire().get().reliefLoadKgPerS(), x -> x.fire().get().reliefLoadKgPerS());
            }
            if (v.inventory().isEmpty()) {
                return;
            }
            top(topInventory, v, v.inventory().get().totalMassKg(), x -> x.inventory().get().totalMassKg());
            site.add(v);
            areas.computeIfAbsent(v.area(), Acc::new).add(v);
            fluids.computeIfAbsent(v.fluid(), Acc::new).add(v);
        }

        private static void listed(List<VesselAudit> list, VesselAudit v) {
            if (list.size() < LISTED) {
                list.add(v);
            }
        }

        /** Keeps the TOP largest by key, largest first; a later row never displaces an equal earlier one. */
        private static void top(List<VesselAudit> list, VesselAudit v, double key,
                                java.util.function.ToDoubleFunction<VesselAudit> keyOf) {
            int at = list.size();
            while (at > 0 && keyOf.applyAsDouble(list.get(at - 1)) < key) {
                at--;
            }
            if (at < TOP) {
                list.add(at, v);
                if (list.size() > TOP) {
                    list.remove(TOP);
                }
            }
        }

        /** The result; {@code rows} are the rows to keep (empty when they were not kept). */
        public AuditResult build(Thresholds thresholds, List<VesselAudit> rows) {
            List<Group> byArea = new ArrayList<>();
            areas.values().forEach(a -> byArea.add(a.group()));
            List<Group> byFluid = new ArrayList<>();
            fluids.values().forEach(a -> byFluid.add(a.group()));
            List<ThresholdCheck> checks = new ArrayList<>();
            for (Thresholds.Entry e : thresholds.entries()) {
                String comp = e.component().name();
                double siteKg = site.per.getOrDefault(comp, 0.0);
                Map<String, Double> over = new LinkedHashMap<>();
                for (Group g : byArea) {
                    double m = g.massPerComponentKg().getOrDefault(comp, 0.0);
                    if (m > e.thresholdKg()) {
                        over.put(g.name(), m);
                    }
                }
                checks.add(new ThresholdCheck(e, siteKg, siteKg > e.thresholdKg(), over));
            }
            Digest d = new Digest(rowCount, counts, withInstalled, topInventory, topFire, notComputed,
                    notComputedCount, flagged, flaggedCount, installedShort, installedShortCount);
            return new AuditResult(rows, d, site.group(), byArea, byFluid, checks, thresholds.origin());
        }
    }
}
