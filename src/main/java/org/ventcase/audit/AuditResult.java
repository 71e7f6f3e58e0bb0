package org.ventcase.audit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * An audit's results: one row per input row in input order, totals per area, per fluid and per
 * component over the rows whose inventory was computed (status ok or partial), and the threshold
 * checks. Totals are sums in input order, so the same input gives the same bits whatever the
 * number of threads.
 *
 * @param rows        one per input row, in input order
 * @param site        the whole register
 * @param byArea      per area, areas in alphabetical order
 * @param byFluid     per fluid as written, in alphabetical order
 * @param thresholds  one check per threshold entry, in the thresholds file's order
 * @param thresholdsOrigin the thresholds file's name ("" when none was given)
 */
public record AuditResult(List<VesselAudit> rows, Group site, List<Group> byArea, List<Group> byFluid,
                          List<ThresholdCheck> thresholds, String thresholdsOrigin) {

    public AuditResult {
        rows = List.copyOf(rows);
        byArea = List.copyOf(byArea);
        byFluid = List.copyOf(byFluid);
        thresholds = List.copyOf(thresholds);
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
        return rows.stream().filter(r -> r.status() == s).count();
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

    /** Totals and threshold checks of computed rows (in input order). */
    public static AuditResult of(List<VesselAudit> rows, Thresholds thresholds) {
        Acc site = new Acc("site");
        Map<String, Acc> areas = new TreeMap<>();
        Map<String, Acc> fluids = new TreeMap<>();
        for (VesselAudit v : rows) {
            if (v.inventory().isEmpty()) {
                continue;
            }
            site.add(v);
            areas.computeIfAbsent(v.area(), Acc::new).add(v);
            fluids.computeIfAbsent(v.fluid(), Acc::new).add(v);
        }
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
        return new AuditResult(rows, site.group(), byArea, byFluid, checks, thresholds.origin());
    }
}
