package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.ventcase.calc.CaseCalculation;
import org.ventcase.calc.CaseInput;
import org.ventcase.calc.CaseResult;
import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.ResultsJson;
import org.ventcase.casefile.Templates;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.DisplayUnits.Kind;

/**
 * Every demo case's sheet, written on A4 in SI and on Letter in US customary units, read back with
 * PDFBox: every value of the results JSON for the same case appears on the sheet with its unit, the
 * cautions and the code-deferral note are there, no "NaN", "null" or "Infinity", fonts embedded.
 *
 * <p><b>Comparison rule.</b> The results JSON rounds every number to 6 significant digits; the sheet
 * formats the unrounded value to a fixed number of decimals per quantity (DisplayUnits). A JSON
 * value x (converted to the sheet's unit) counts as present when some number v printed directly
 * before the unit satisfies |v - x| &lt;= 0.5 x 10^-d + 5e-6 |x|, where d is the number of decimals
 * v is printed with: half a unit in the sheet's last digit plus the JSON's own rounding (at most
 * half a unit in the 6th significant digit, below 5e-6 relative). Dimensionless numbers (Z, k, the
 * isentropic exponent) are matched the same way against every number on the sheet.
 */
class CaseSheetTest {

    @TempDir
    Path dir;

    private static final Pattern NUMBER = Pattern.compile("(?<![\\w.])(-?\\d+(?:\\.\\d+)?)");
    private static final Pattern FORBIDDEN = Pattern.compile("\\b(NaN|null|Infinity)\\b");

    /**
     * What a sheet a reviewer signs must not print: a source recalled rather than read, the project's
     * working notes, their status tags, or the component table's internal source keys (the verified
     * citation is printed instead, thermo.Citations).
     */
    private static final Pattern UNVERIFIED = Pattern.compile(
            "(?i)from memory|REFERENCES\\.md|\\[[SMD](, [^\\]]*)?\\]|Poling2001-|Perry8-T2|RPP1987-|YamadaGunn1973|SpencerDanner1972");

    static Stream<Path> demoCases() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("demo-cases"))) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    private record Written(String text, PDDocument doc) {
    }

    private static String norm(String s) {
        return s.replaceAll("[\\s\\u00A0]+", " ");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("demoCases")
    void everyResultsJsonValueIsOnTheSheetWithItsUnit(Path caseFile) throws IOException {
        ValidatedCase vc = CaseFiles.load(caseFile);
        CaseInput in = CaseInputs.from(vc);
        CaseResult r = CaseCalculation.run(in);
        JsonNode json = ResultsJson.tree(r, "test");
        SheetIdentity id = org.ventcase.app.CaseSheets.identity(vc, "test");
        for (UnitSystem system : UnitSystem.values()) {
            CalculationSheet.PageSize size = system == UnitSystem.SI ? CalculationSheet.PageSize.A4
                    : CalculationSheet.PageSize.LETTER;
            SheetModel m = SheetModels.from(r, in, id, system);
            assertEquals(r.scenarios().size(), m.loads().size());
            assertEquals(r.scenarios().size(), m.method().size());
            Path pdf = dir.resolve(system + ".pdf");
            CalculationSheet.write(m, pdf, size);
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                String text = norm(new PDFTextStripper().getText(doc));
                String where = caseFile.getFileName() + " " + system;
                checkValues(json, text, new DisplayUnits(system), where);
                checkText(text, vc, where);
                checkPages(doc, size, where);
                java.util.regex.Matcher um = UNVERIFIED.matcher(text);
                assertFalse(um.find(), where + ": prints an unverified source marker: ..."
                        + (um.hitEnd() ? "" : text.substring(Math.max(0, um.start() - 80), Math.min(text.length(), um.end() + 40))));
            }
        }
    }

    private static void checkText(String text, ValidatedCase vc, String where) {
        Matcher bad = FORBIDDEN.matcher(text);
        assertFalse(bad.find(), where + ": the sheet prints " + (bad.find(0) ? bad.group() : ""));
        for (String p : SheetModels.paragraphs(Templates.text("cautions").orElseThrow())) {
            String head = String.join(" ", List.of(p.split(" ")).subList(0, 6));
            assertTrue(text.contains(head), where + ": caution missing: " + head);
        }
        assertTrue(text.contains("It is not a relief design."), where + ": deferral note missing");
        assertTrue(text.contains("Where this sheet and an applicable code disagree, the code governs."), where);
        assertTrue(text.contains(vc.inputHash()), where + ": input hash missing");
        assertTrue(text.contains(vc.identity().tag()), where);
    }

    private static void checkPages(PDDocument doc, CalculationSheet.PageSize size, String where) throws IOException {
        PDRectangle expected = size == CalculationSheet.PageSize.A4 ? PDRectangle.A4 : PDRectangle.LETTER;
        for (PDPage page : doc.getPages()) {
            assertEquals(expected.getWidth(), page.getMediaBox().getWidth(), 0.01, where);
            assertEquals(expected.getHeight(), page.getMediaBox().getHeight(), 0.01, where);
            PDResources res = page.getResources();
            for (COSName n : res.getFontNames()) {
                PDFont font = res.getFont(n);
                assertTrue(font.isEmbedded(), where + ": font " + font.getName() + " not embedded");
            }
        }
    }

    // ------------------------------------------------------------------------------ values

    private static void checkValues(JsonNode j, String text, DisplayUnits u, String where) {
        List<String> missing = new ArrayList<>();
        JsonNode v = j.get("vessel");
        quantity(missing, text, u, Kind.VOLUME, v.get("totalVolume_m3"), 1, "vessel.totalVolume");
        quantity(missing, text, u, Kind.VOLUME, v.get("liquidVolume_m3"), 1, "vessel.liquidVolume");
        quantity(missing, text, u, Kind.VOLUME, v.get("vaporVolume_m3"), 1, "vessel.vaporVolume");
        quantity(missing, text, u, Kind.LENGTH, v.get("level_m"), 1, "vessel.level");
        quantity(missing, text, u, Kind.AREA, v.get("totalInsideArea_m2"), 1, "vessel.totalInsideArea");
        quantity(missing, text, u, Kind.AREA, v.get("wettedArea_m2"), 1, "vessel.wettedArea");
        quantity(missing, text, u, Kind.AREA, v.get("fireWettedArea_m2"), 1, "vessel.fireWettedArea");
        JsonNode inv = j.get("inventory");
        quantity(missing, text, u, Kind.TEMPERATURE, inv.get("temperature_K"), 1, "inventory.temperature");
        quantity(missing, text, u, Kind.PRESSURE_ABS, inv.get("pressure_Pa"), 1, "inventory.pressure");
        quantity(missing, text, u, Kind.MASS, inv.get("liquidMass_kg"), 1, "inventory.liquidMass");
        quantity(missing, text, u, Kind.MASS, inv.get("vaporMass_kg"), 1, "inventory.vaporMass");
        quantity(missing, text, u, Kind.MASS, inv.get("totalMass_kg"), 1, "inventory.totalMass");
        quantity(missing, text, u, Kind.DENSITY, inv.get("liquidDensity_kg_m3"), 1, "inventory.liquidDensity");
        quantity(missing, text, u, Kind.DENSITY, inv.get("vaporDensity_kg_m3"), 1, "inventory.vaporDensity");
        for (Iterator<Map.Entry<String, JsonNode>> it = inv.get("massPerComponent_kg").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            quantity(missing, text, u, Kind.MASS, e.getValue(), 1, "inventory.massPerComponent." + e.getKey());
        }
        for (JsonNode s : j.get("scenarios")) {
            String sc = "scenario " + s.get("scenario").asInt() + ".";
            quantity(missing, text, u, Kind.PRESSURE_ABS, s.get("relievingPressure_Pa"), 1, sc + "relievingPressure");
            quantity(missing, text, u, Kind.TEMPERATURE, s.get("relievingTemperature_K"), 1,
                    sc + "relievingTemperature");
            quantity(missing, text, u, Kind.POWER, s.get("heatInput_W"), 1, sc + "heatInput");
            quantity(missing, text, u, Kind.SPECIFIC_ENERGY, s.get("latentHeat_J_kg"), 1, sc + "latentHeat");
            quantity(missing, text, u, Kind.MASS_FLOW, s.get("reliefLoad_kg_h"), 1 / 3600.0, sc + "reliefLoad");
            quantity(missing, text, u, Kind.ORIFICE_AREA, s.get("requiredArea_mm2"), 1e-6, sc + "requiredArea");
            JsonNode o = s.get("orifice");
            if (!o.isNull()) {
                String designation = o.get("count").asInt() + " x " + o.get("letter").asText();
                if (!text.contains(designation)) {
                    missing.add(sc + "orifice " + designation);
                }
                quantity(missing, text, u, Kind.ORIFICE_AREA, o.get("area_mm2"), 1e-6, sc + "orifice.area");
                quantity(missing, text, u, Kind.ORIFICE_AREA, o.get("totalArea_mm2"), 1e-6, sc + "orifice.totalArea");
                number(missing, text, "%", o.get("margin_percent"), sc + "orifice.margin");
            }
            JsonNode f = s.get("relievedFluid");
            if (!f.isNull()) {
                number(missing, text, "kg/kmol", f.get("molarMass_kg_kmol"), sc + "M");
                number(missing, text, null, f.get("Z"), sc + "Z");
                number(missing, text, null, f.get("k"), sc + "k");
                number(missing, text, null, f.get("isentropicExponent"), sc + "isentropicExponent");
                quantity(missing, text, u, Kind.DENSITY, f.get("density_kg_m3"), 1, sc + "density");
                quantity(missing, text, u, Kind.TEMPERATURE, f.get("temperature_K"), 1, sc + "fluid.temperature");
                quantity(missing, text, u, Kind.PRESSURE_ABS, f.get("pressure_Pa"), 1, sc + "fluid.pressure");
            }
        }
        assertTrue(missing.isEmpty(), where + ": not on the sheet: " + missing);
    }

    /** A JSON value in SI (times {@code scale} to the SI base unit) in the sheet's unit for {@code kind}. */
    private static void quantity(List<String> missing, String text, DisplayUnits u, Kind kind, JsonNode n,
                                 double scale, String what) {
        if (n == null || n.isNull()) {
            return;
        }
        double si = n.asDouble() * scale;
        double expected = u.value(kind, si);
        // the JSON's relative rounding carries over to the converted value (temperatures: of the kelvin value)
        double jsonRounding = 5e-6 * (kind == Kind.TEMPERATURE ? Math.abs(n.asDouble()) * (u.system() == UnitSystem.US
                ? 1.8 : 1) : Math.abs(expected));
        if (!present(text, u.unit(kind), expected, jsonRounding)) {
            missing.add(what + " = " + expected + " " + u.unit(kind));
        }
    }

    /** A number in the JSON's own unit, before {@code unit} (null: anywhere). */
    private static void number(List<String> missing, String text, String unit, JsonNode n, String what) {
        if (n == null || n.isNull()) {
            return;
        }
        double x = n.asDouble();
        if (!present(text, unit, x, 5e-6 * Math.abs(x))) {
            missing.add(what + " = " + x + (unit == null ? "" : " " + unit));
        }
    }

    private static boolean present(String text, String unit, double expected, double jsonRounding) {
        Pattern p = unit == null ? NUMBER : Pattern.compile(NUMBER.pattern() + " " + Pattern.quote(unit) + "(?!\\w)");
        Matcher m = p.matcher(text);
        while (m.find()) {
            String tok = m.group(1);
            int dot = tok.indexOf('.');
            int d = dot < 0 ? 0 : tok.length() - dot - 1;
            double v = Double.parseDouble(tok);
            if (Math.abs(v - expected) <= 0.5 * Math.pow(10, -d) * (1 + 1e-9) + jsonRounding) {
                return true;
            }
        }
        return false;
    }
}
