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

    /** The CSV text. */
    public static String text(AuditResult r) {
        List<Col> cols = columns(r.components());
        StringBuilder sb = new StringBuilder(256 * (r.rows().size() + 1));
        for (int i = 0; i < cols.size(); i++) {
            sb.append(i == 0 ? "" : ",").append(Csv.text(cols.get(i).header()));
        }
        sb.append('\n');
        // lines are formatted in parallel and joined in row order: the text does not depend on scheduling
        List<VesselAudit> rows = r.rows();
        String[] lines = java.util.stream.IntStream.range(0, rows.size()).parallel().mapToObj(k -> {
            StringBuilder line = new StringBuilder(512);
            for (int i = 0; i < cols.size(); i++) {
                line.append(i == 0 ? "" : ",").append(cols.get(i).cell().apply(rows.get(k)));
            }
            return line.append('\n').toString();
        }).toArray(String[]::new);
        for (String l : lines) {
            sb.append(l);
        }
        return sb.toString();
    }

    /** Writes the CSV atomically (a temporary file in the target's folder, then moved into place). */
    public static void write(AuditResult r, Path target) throws IOException {
        writeAtomically(text(r), target);
    }

    static void writeAtomically(String text, Path target) throws IOException {
        org.ventcase.common.AtomicFiles.writeText(text, target);
    }
}
