package org.ventcase.audit;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.ventcase.common.PhysicalConstants;

/**
 * The audit's per-vessel CSV: one line per input row, in input order, with the status, the
 * problem (field and reason) where there is one, the volumes, masses (also per component), areas,
 * the screening fire load and the installed-valve check. Units are in the header.
 *
 * <p>Safe to open in a spreadsheet: every text cell (tags, areas, fluids, messages) that starts
 * with {@code =}, {@code +}, {@code -} or {@code @} (also after leading spaces), a tab or a carriage
 * return is prefixed with an apostrophe so it is shown as text, never evaluated as a formula.
 * Numbers are written unquoted in plain decimal notation (6 significant digits) and are not
 * touched, so a negative number (e.g. a negative margin) stays a number.
 */
public final class AuditCsv {

    /** Significant digits of the numbers written. */
    public static final int DIGITS = 6;

    private AuditCsv() {
    }

    private record Col(String header, Function<VesselAudit, String> cell) {
    }

    private static String num(double v) {
        return Csv.number(v, DIGITS);
    }

    private static String num(OptionalDouble v, double scale) {
        return v.isPresent() ? num(v.getAsDouble() * scale) : "";
    }

    private static String c(VesselAudit v, Function<VesselAudit.Contents, Double> f) {
        return v.inventory().map(x -> num(f.apply(x))).orElse("");
    }

    private static String f(VesselAudit v, Function<VesselAudit.FireLoad, String> f) {
        return v.fire().map(f).orElse("");
    }

    private static List<Col> columns(List<String> components) {
        List<Col> cols = new ArrayList<>(List.of(
                new Col("row", v -> Integer.toString(v.row())),
                new Col("source", v -> Csv.text(v.source())),
                new Col("tag", v -> Csv.text(v.tag())),
                new Col("area", v -> Csv.text(v.area())),
                new Col("fluid", v -> Csv.text(v.fluid())),
                new Col("status", v -> v.status().word()),
                new Col("problem field", v -> Csv.text(v.error().map(AuditError::field).orElse(""))),
                new Col("problem", v -> Csv.text(v.error().map(e -> (e.value().isEmpty() ? "" : "'" + e.value()
                        + "': ") + e.reason()).orElse(""))),
                new Col("mode", v -> v.inventory().map(x -> x.mode().name().toLowerCase(java.util.Locale.ROOT))
                        .orElse("")),
                new Col("storage temperature [C]", v -> c(v, x -> x.temperatureK() - PhysicalConstants.ZERO_CELSIUS_K)),
                new Col("storage pressure [kPa abs]", v -> c(v, x -> x.pressurePa() / 1e3)),
                new Col("total volume [m3]", v -> c(v, VesselAudit.Contents::totalVolumeM3)),
                new Col("liquid volume [m3]", v -> c(v, VesselAudit.Contents::liquidVolumeM3)),
                new Col("vapour volume [m3]", v -> c(v, VesselAudit.Contents::vapourVolumeM3)),
                new Col("level [% of volume]", v -> c(v, VesselAudit.Contents::levelPercentVolume)),
                new Col("wetted area [m2]", v -> c(v, VesselAudit.Contents::wettedAreaM2)),
                new Col("fire-exposed wetted area [m2]", v -> c(v, VesselAudit.Contents::fireWettedAreaM2)),
                new Col("liquid mass [kg]", v -> c(v, VesselAudit.Contents::liquidMassKg)),
                new Col("vapour mass [kg]", v -> c(v, VesselAudit.Contents::vapourMassKg)),
                new Col("total mass [kg]", v -> c(v, VesselAudit.Contents::totalMassKg)),
                new Col("fire method", v -> f(v, VesselAudit.FireLoad::method)),
                new Col("relieving pressure [kPa abs]", v -> f(v, x -> num(x.relievingPressurePa() / 1e3))),
                new Col("relieving temperature [C]", v -> f(v, x -> num(x.relievingTemperatureK()
                        - PhysicalConstants.ZERO_CELSIUS_K))),
                new Col("heat input [kW]", v -> f(v, x -> num(x.heatInputW(), 1e-3))),
                new Col("latent heat [kJ/kg]", v -> f(v, x -> num(x.latentHeatJPerKg(), 1e-3))),
                new Col("fire relief load [kg/h]", v -> f(v, x -> num(x.reliefLoadKgPerS() * 3600))),
                new Col("required area [mm2]", v -> f(v, x -> num(x.requiredAreaM2() * 1e6))),
                new Col("smallest API 526 orifice", v -> f(v, x -> Csv.text(x.selectedOrifice()))),
                new Col("installed orifice", v -> f(v, x -> x.installed().map(i -> Csv.text(i.designation()))
                        .orElse(""))),
                new Col("installed area [mm2]", v -> f(v, x -> x.installed().map(i -> num(i.areaM2() * 1e6))
                        .orElse(""))),
                new Col("installed margin [%]", v -> f(v, x -> x.installed().map(i -> num(i.marginPercent()))
                        .orElse(""))),
                new Col("installed covers", v -> f(v, x -> x.installed().map(i -> i.covers() ? "yes" : "no")
                        .orElse(""))),
                new Col("flags", v -> Csv.text(String.join("; ", v.flags().stream().map(VesselAudit.Flag::words)
                        .toList()))),
                new Col("warnings", v -> Csv.text(String.join(" | ", v.warnings())))));
        for (String comp : components) {
            cols.add(new Col("mass " + comp + " [kg]", v -> v.inventory().map(x -> {
                Double m = x.massPerComponentKg().get(comp);
                return num(m == null ? 0.0 : m);
            }).orElse("")));
        }
        return cols;
    }

    private static String header(List<Col> cols) {
        StringBuilder sb = new StringBuilder(64 * cols.size());
        for (int i = 0; i < cols.size(); i++) {
            sb.append(i == 0 ? "" : ",").append(Csv.text(cols.get(i).header()));
        }
        return sb.append('\n').toString();
    }

    /** One row's cells; ends with a newline unless {@code newline} is 0. */
    private static String line(List<Col> cols, VesselAudit v, int newline) {
        StringBuilder line = new StringBuilder(512);
        for (int i = 0; i < cols.size(); i++) {
            line.append(i == 0 ? "" : ",").append(cols.get(i).cell().apply(v));
        }
        return newline == 0 ? line.toString() : line.append('\n').toString();
    }

    /** The CSV text of an audit that kept its rows. */
    public static String text(AuditResult r) {
        if (r.rows().size() != r.rowCount()) {
            throw new IllegalStateException("the audit did not keep its rows: write its CSV with a Spool");
        }
        List<Col> cols = columns(r.components());
        StringBuilder sb = new StringBuilder(256 * (r.rows().size() + 1));
        sb.append(header(cols));
        // lines are formatted in parallel and joined in row order: the text does not depend on scheduling
        List<VesselAudit> rows = r.rows();
        String[] lines = java.util.stream.IntStream.range(0, rows.size()).parallel()
                .mapToObj(k -> line(cols, rows.get(k), 1)).toArray(String[]::new);
        for (String l : lines) {
            sb.append(l);
        }
        return sb.toString();
    }

    /**
     * Writes the CSV of a streamed audit: each chunk's rows are formatted as they come and spilled
     * to a scratch file beside the target, with their per-component masses; {@link #finish} writes
     * the CSV atomically once the component columns are known (every component of a computed row,
     * in order of first appearance, as {@link #text}). Memory holds one chunk and the component
     * list, however long the register.
     */
    public static final class Spool implements java.util.function.Consumer<List<VesselAudit>>, AutoCloseable {
        private final Path target;
        private final Path scratch;
        private final java.io.DataOutputStream out;
        private final List<Col> base = columns(List.of());
        private final java.util.LinkedHashMap<String, Integer> components = new java.util.LinkedHashMap<>();
        private boolean closed;

        public Spool(Path target) throws IOException {
            this.target = target;
            this.scratch = org.ventcase.common.AtomicFiles.scratch(target);
            this.out = new java.io.DataOutputStream(new java.io.BufferedOutputStream(Files.newOutputStream(scratch),
                    1 << 16));
        }

        @Override
        public void accept(List<VesselAudit> chunk) {
            String[] lines = java.util.stream.IntStream.range(0, chunk.size()).parallel()
                    .mapToObj(k -> line(base, chunk.get(k), 0)).toArray(String[]::new);
            try {
                for (int k = 0; k < chunk.size(); k++) {
                    byte[] b = lines[k].getBytes(StandardCharsets.UTF_8);
                    out.writeInt(b.length);
                    out.write(b);
                    VesselAudit v = chunk.get(k);
                    if (v.inventory().isEmpty()) {
                        out.writeInt(-1);
                        continue;
                    }
                    java.util.Map<String, Double> m = v.inventory().get().massPerComponentKg();
                    out.writeInt(m.size());
                    for (java.util.Map.Entry<String, Double> e : m.entrySet()) {
                        out.writeInt(components.computeIfAbsent(e.getKey(), c -> components.size()));
                        out.writeDouble(e.getValue());
                    }
                }
            } catch (IOException e) {
                throw new java.io.UncheckedIOException("cannot write the scratch file beside " + target + ": "
                        + org.ventcase.common.FileErrors.reason(e), e);
            }
        }

        /** Writes the CSV to the target atomically. */
        public void finish() throws IOException {
            out.close();
            closed = true;
            List<String> comps = new ArrayList<>(components.keySet());
            org.ventcase.common.AtomicFiles.write(target, sink -> {
                java.io.Writer w = new java.io.BufferedWriter(new java.io.OutputStreamWriter(sink,
                        StandardCharsets.UTF_8), 1 << 16);
                w.write(header(columns(comps)));
                double[] mass = new double[comps.size()];
                try (java.io.DataInputStream in = new java.io.DataInputStream(new java.io.BufferedInputStream(
                        Files.newInputStream(scratch), 1 << 16))) {
                    while (true) {
                        int len;
                        try {
                            len = in.readInt();
                        } catch (java.io.EOFException end) {
                            break;
                        }
                        w.write(new String(in.readNBytes(len), StandardCharsets.UTF_8));
                        int n = in.readInt();
                        java.util.Arrays.fill(mass, 0.0);
                        for (int i = 0; i < n; i++) {
                            int idx = in.readInt();
                            mass[idx] = in.readDouble();
                        }
                        for (double m : mass) {
                            w.write(',');
                            if (n >= 0) {
                                w.write(num(m));
                            }
                        }
                        w.write('\n');
                    }
                }
                w.flush();
            });
        }

        /** Deletes the scratch file (the target is left as it was unless {@link #finish} ran). */
        @Override
        public void close() {
            if (!closed) {
                try {
                    out.close();
                } catch (IOException ignored) {
                    // the scratch file is deleted below
                }
                closed = true;
            }
            org.ventcase.common.AtomicFiles.discard(scratch);
        }
    }

    /** Writes the CSV atomically (a temporary file in the target's folder, then moved into place). */
    public static void write(AuditResult r, Path target) throws IOException {
        writeAtomically(text(r), target);
    }

    static void writeAtomically(String text, Path target) throws IOException {
        org.ventcase.common.AtomicFiles.writeText(text, target);
    }
}
