package org.ventcase.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.PDFTextStripperByArea;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ventcase.casefile.Templates;
import org.ventcase.calc.CaseResult;
import org.ventcase.relief.RelievedFluid;

/** The written PDF, read back with PDFBox: content, title blocks, fonts, sizes, metadata. */
class CalculationSheetTest {

    @TempDir
    Path dir;

    /** Top of the body below a one-line title block, in points from the top of the page. */
    private static final float BODY_TOP = CalculationSheet.MARGIN_TOP + 56 + 4;

    private record Sheet(List<String> titleBlocks, String body, String all, int pages, PDRectangle size) {
    }

    private static String norm(String s) {
        return s.replaceAll("[\\s\\u00A0]+", " ");
    }

    private Sheet write(SheetModel m, CalculationSheet.PageSize size, String name) throws IOException {
        Path pdf = dir.resolve(name);
        CalculationSheet.write(m, pdf, size);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            List<String> blocks = new ArrayList<>();
            StringBuilder body = new StringBuilder();
            for (PDPage page : doc.getPages()) {
                PDRectangle box = page.getMediaBox();
                PDFTextStripperByArea area = new PDFTextStripperByArea();
                area.addRegion("title", new Rectangle2D.Float(0, 0, box.getWidth(), BODY_TOP));
                area.addRegion("body", new Rectangle2D.Float(0, BODY_TOP, box.getWidth(),
                        box.getHeight() - BODY_TOP - CalculationSheet.MARGIN_BOTTOM - 8));
                area.extractRegions(page);
                blocks.add(norm(area.getTextForRegion("title")));
                body.append(area.getTextForRegion("body")).append('\n');
            }
            String all = new PDFTextStripper().getText(doc);
            return new Sheet(blocks, norm(body.toString()), norm(all), doc.getNumberOfPages(),
                    doc.getPage(0).getMediaBox());
        }
    }

    private static String f(String fmt, double v) {
        return String.format(Locale.ROOT, fmt, v);
    }

    @Test
    void everyResultNumberAppearsWithItsUnit() throws IOException {
        SheetFixtures.Computed c = SheetFixtures.bullet();
        CaseResult.ScenarioResult g = c.governing();
        RelievedFluid rf = g.relievedFluid().orElseThrow();
        Sheet s = write(c.model(), CalculationSheet.PageSize.A4, "si.pdf");
        double areaMm2 = g.requiredAreaM2().getAsDouble() * 1e6;
        List<String> expected = List.of(
                f("%.1f mm2", areaMm2),
                f("%.4f in2", areaMm2 / 645.16),
                g.orifice().orElseThrow().designation(),
                f("%.1f mm2", g.orifice().orElseThrow().selectedAreaMm2()),
                f("%.1f kg/h", g.reliefLoadKgPerS().getAsDouble() * 3600),
                f("%.1f kPa abs", g.relievingPressurePa().getAsDouble() / 1e3),
                f("%.2f °C", g.relievingTemperatureK().getAsDouble() - 273.15),
                f("%.2f kJ/kg", g.latentHeatJPerKg().getAsDouble() / 1e3),
                f("%.4f", rf.z()),
                f("%.4f", rf.kIdeal()),
                f("%.3f kg/kmol", rf.molarMass()),
                f("%.1f kg", c.result().inventory().liquidMassKg()),
                f("%.1f kg", c.result().inventory().vapourMassKg()),
                f("%.3f m2", c.result().vessel().wettedArea()));
        for (String e : expected) {
            assertTrue(s.body().contains(e), "missing on the sheet: " + e);
        }
        // every scenario's trace is printed as computed
        for (CaseResult.ScenarioResult sc : c.result().scenarios()) {
            for (var step : sc.trace()) {
                assertTrue(s.body().contains(norm(step.title())), step.title());
                for (String v : step.outputs().values()) {
                    assertTrue(s.body().contains(norm(v)), "trace output " + v);
                }
            }
        }
    }

    @Test
    void usSheetLeadsWithCustomaryUnits() throws IOException {
        SheetFixtures.Computed c = SheetFixtures.bullet();
        CaseResult.ScenarioResult g = c.governing();
        Sheet s = write(c.model(UnitSystem.US), CalculationSheet.PageSize.LETTER, "us.pdf");
        double areaMm2 = g.requiredAreaM2().getAsDouble() * 1e6;
        double w = g.reliefLoadKgPerS().getAsDouble();
        // Definitions: in2 = mm2 / 645.16; lb/h = kg/s x 3600 / 0.45359237; psi = Pa / 6894.757
        assertTrue(s.body().contains(f("%.4f in2", areaMm2 / 645.16) + " [" + f("%.1f mm2", areaMm2) + "]"),
                "required area in2 [mm2]");
        // the loads table wraps "lb/h [kg/h]" in its narrow column, so the two parts are looked for apart
        assertTrue(s.body().contains(f("%.0f lb/h", w * 3600 / 0.45359237)));
        assertTrue(s.body().contains("[" + f("%.1f kg/h", w * 3600) + "]"));
        assertTrue(s.body().contains(f("%.2f psia", g.relievingPressurePa().getAsDouble() / 6894.757293168361)));
        assertTrue(s.body().contains("largest: "), "chart marker key");
        // issue 18 item 4: warnings lead with US units, method steps bracket them, amounts in lbmol
        SheetModel us = c.model(UnitSystem.US);
        for (String warning : us.warnings()) {
            assertFalse(warning.matches(".*\\d kPa abs(?! ?\\]).*"), "SI pressure leads a US warning: " + warning);
        }
        assertTrue(s.body().contains(" psia]"), "a method step brackets its pressure in psia");
        assertTrue(s.body().contains("lbmol"), "amounts in lbmol");
        assertFalse(s.body().contains(" kmol "), "no kmol column on a US sheet");
    }

    /**
     * A character the sheet's fonts do not have (CJK in the title and preparer, a box-drawing mix in a
     * warning) is drawn as U+FFFD instead of failing the sheet (it used to end in "No glyph for
     * U+6F22"). Invariant, no external values.
     */
    @Test
    void charactersTheFontsLackAreReplacedNotFatal() throws IOException {
        SheetModel m = SheetFixtures.bullet().model();
        SheetIdentity id = m.identity();
        SheetIdentity odd = new SheetIdentity("Bullet \u6f22\u5b57 check", id.tag(), id.revision(), id.date(),
                "\u738b \u8fb2", id.checker(), id.toolName(), id.toolVersion(), id.inputHash());
        java.util.List<String> warnings = new java.util.ArrayList<>(m.warnings());
        warnings.add("A remark with \u6f22 inside");
        SheetModel m2 = new SheetModel(odd, m.units(), m.revisions(), m.signOff(), m.inputs(), m.loads(), m.results(),
                warnings, m.figures(), m.method(), m.cautions(), m.deferral(), m.unitNote(), m.banner());
        Sheet s = write(m2, CalculationSheet.PageSize.A4, "odd.pdf");
        assertTrue(s.all().contains("Bullet \uFFFD\uFFFD check"), "title with the replacement character");
        assertTrue(s.all().contains("A remark with \uFFFD inside"), "warning with the replacement character");
    }

    /**
     * Sweep finding (issue 19): the guard against printing undefined values refused the user's own words:
     * a tag "NaN", a title "null" (an internal error, no sheet). They are printed as entered; a computed
     * "NaN" in the program's own text is still refused. Invariant, no external values.
     */
    @Test
    void theUsersOwnWordsPassTheGuardAComputedNaNDoesNot() throws IOException {
        SheetModel m = SheetFixtures.bullet().model();
        SheetIdentity id = m.identity();
        SheetIdentity odd = new SheetIdentity("null", "NaN", id.revision(), id.date(), "Infinity", id.checker(),
                id.toolName(), id.toolVersion(), id.inputHash());
        SheetModel m2 = new SheetModel(odd, m.units(), m.revisions(), m.signOff(), m.inputs(), m.loads(), m.results(),
                m.warnings(), m.figures(), m.method(), m.cautions(), m.deferral().replace(id.tag(), "NaN"),
                m.unitNote(), m.banner());
        Sheet s = write(m2, CalculationSheet.PageSize.A4, "words.pdf");
        assertTrue(s.titleBlocks().get(0).contains("NaN"), s.titleBlocks().get(0));
        java.util.List<String> warnings = new java.util.ArrayList<>(m.warnings());
        warnings.add("a computed value of NaN kg");
        // (with the user's words above, a bare "NaN" anywhere would be taken as their tag: the guard
        // masks the user's text wherever it appears, so the computed case is checked with a plain tag)
        SheetModel bad = new SheetModel(id, m.units(), m.revisions(), m.signOff(), m.inputs(), m.loads(),
                m.results(), warnings, m.figures(), m.method(), m.cautions(), m.deferral(), m.unitNote(), m.banner());
        assertThrows(IllegalArgumentException.class, () -> CalculationSheet.write(bad, dir.resolve("bad.pdf"),
                CalculationSheet.PageSize.A4));
    }

    @Test
    void cautionsAndCodeDeferralAreOnTheSheet() throws IOException {
        SheetModel m = SheetFixtures.bullet().model();
        Sheet s = write(m, CalculationSheet.PageSize.A4, "text.pdf");
        for (String p : SheetModels.paragraphs(Templates.text("cautions").orElseThrow())) {
            assertTrue(s.body().contains(norm(p)), "caution: " + p);
        }
        assertTrue(s.body().contains(norm(m.deferral())), "deferral");
        assertTrue(s.body().contains("ASME BPVC Section VIII"));
        assertTrue(s.body().contains("qualified engineer"));
        for (String w : m.warnings()) {
            assertTrue(s.body().contains(norm(w)), "warning: " + w);
        }
    }

    @Test
    void titleBlockOnEveryPageWithPageCount() throws IOException {
        Sheet s = write(SheetFixtures.bullet().modelWithTestIdentity(), CalculationSheet.PageSize.A4, "pages.pdf");
        assertTrue(s.pages() >= 4, "pages: " + s.pages());
        for (int i = 0; i < s.pages(); i++) {
            String t = s.titleBlocks().get(i);
            assertTrue(t.contains("Test bullet T-0001 (invented): fire relief basis"), t);
            assertTrue(t.contains("T-0001") && t.contains("2026-02-03") && t.contains("A. Tester (invented)"), t);
            assertTrue(t.contains("page " + (i + 1) + " of " + s.pages()), t);
        }
        assertTrue(s.all().contains("0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef"), "input hash");
    }

    /**
     * Sweep finding (issue 19): a tag that needs a smaller size but fits on one line at 6 pt (an audit
     * register named "site-register-2024.csv") ended in IndexOutOfBoundsException in the title block.
     * Every tag length from 1 to 120 characters, with and without spaces, must give a sheet whose title
     * block shows the tag's start. Invariant, no external values.
     */
    @Test
    void titleBlockTakesTagsOfEveryLength() throws IOException {
        SheetModel m = SheetFixtures.bullet().modelWithTestIdentity();
        SheetIdentity id = m.identity();
        String letters = "site-register-2024.csv plant-b-vessel-list.csv a18b-formula-fluid.csv ".repeat(3);
        for (int n = 1; n <= 120; n += 1) {
            for (String base : List.of(letters, letters.replace(' ', '_'))) {
                String tag = base.substring(0, n);
                SheetIdentity t = new SheetIdentity(id.title(), tag, id.revision(), id.date(), id.preparer(),
                        id.checker(), id.toolName(), id.toolVersion(), id.inputHash());
                SheetModel m2 = new SheetModel(t, m.units(), m.revisions(), m.signOff(), m.inputs(), m.loads(),
                        m.results(), m.warnings(), m.figures(), m.method(), m.cautions(), m.deferral(), m.unitNote(),
                        m.banner());
                Path pdf = dir.resolve("tag.pdf");
                CalculationSheet.write(m2, pdf, CalculationSheet.PageSize.A4);
                assertTrue(Files.size(pdf) > 0, tag);
            }
        }
        Sheet s = write(m, CalculationSheet.PageSize.A4, "tag-last.pdf");
        assertTrue(s.titleBlocks().get(0).contains("T-0001"));
    }

    /**
     * Line breaking: every line fits, nothing is lost, and a 100,000-character word (a register cell
     * of that length used to stall the audit sheet for minutes) is cut into full lines. Invariant.
     */
    @Test
    void wrapKeepsEveryCharacterAndFitsTheWidth() throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDFont font = org.apache.pdfbox.pdmodel.font.PDType0Font.load(doc,
                    new java.io.ByteArrayInputStream(CalculationSheet.REGULAR_TTF), true);
            String big = "x".repeat(100_000);
            List<String> lines = PdfCanvas.wrap("a few words then " + big + " and the end", font, 8f, 100f);
            StringBuilder joined = new StringBuilder();
            for (String l : lines) {
                assertTrue(PdfCanvas.width(font, 8f, l) <= 100f + 1e-3, "line too wide: " + l.length());
                joined.append(l);
            }
            assertEquals(("a few words then " + big + " and the end").replace(" ", ""),
                    joined.toString().replace(" ", ""));
            assertTrue(lines.size() > 100_000 / 40, "cut into many lines: " + lines.size());
            assertEquals(List.of("one two", "three"), PdfCanvas.wrap("one two three", font, 8f,
                    PdfCanvas.width(font, 8f, "one two") + 0.01f));
        }
    }

    @Test
    void noUndefinedValuesOnAnySheet() throws IOException {
        for (SheetFixtures.Computed r : List.of(SheetFixtures.bullet(), SheetFixtures.drum(), SheetFixtures.sphere())) {
            for (UnitSystem u : UnitSystem.values()) {
                Sheet s = write(r.model(u), CalculationSheet.PageSize.A4,
                        "nan-" + u + ".pdf");
                assertFalse(s.all().contains("NaN"), "NaN on the sheet");
                assertFalse(s.all().toLowerCase(Locale.ROOT).contains("null"), "null on the sheet");
                assertFalse(s.all().contains("Infinity"));
            }
        }
    }

    @Test
    void writerRefusesAModelThatWouldPrintNaNAndLeavesNoFile() {
        SheetModel m = SheetFixtures.bullet().model();
        SheetModel bad = new SheetModel(m.identity(), m.units(), m.revisions(), m.signOff(), m.inputs(), m.loads(),
                m.results(), List.of("density NaN kg/m3"), m.figures(), m.method(), m.cautions(), m.deferral(),
                m.unitNote());
        Path pdf = dir.resolve("bad.pdf");
        assertThrows(IllegalArgumentException.class, () -> CalculationSheet.write(bad, pdf, CalculationSheet.PageSize.A4));
        assertFalse(Files.exists(pdf));
    }

    @Test
    void fontsAreEmbeddedOnEveryPage() throws IOException {
        Path pdf = dir.resolve("fonts.pdf");
        CalculationSheet.write(SheetFixtures.bullet().model(), pdf,
                CalculationSheet.PageSize.A4);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            int fonts = 0;
            for (PDPage page : doc.getPages()) {
                PDResources res = page.getResources();
                for (COSName n : res.getFontNames()) {
                    PDFont font = res.getFont(n);
                    assertTrue(font.isEmbedded(), font.getName() + " not embedded");
                    assertTrue(font.getName().contains("DejaVuSans"), font.getName());
                    fonts++;
                }
            }
            assertTrue(fonts >= 2 * doc.getNumberOfPages(), "regular and bold on every page");
        }
    }

    @Test
    void a4AndLetterSizesAndPdfAIdentification() throws IOException {
        SheetModel m = SheetFixtures.bullet().model();
        // ISO 216: A4 = 210 x 297 mm = 595.28 x 841.89 pt; US Letter 8.5 x 11 in = 612 x 792 pt
        Sheet a4 = write(m, CalculationSheet.PageSize.A4, "a4.pdf");
        assertEquals(595.28, a4.size().getWidth(), 0.01);
        assertEquals(841.89, a4.size().getHeight(), 0.01);
        Sheet letter = write(m, CalculationSheet.PageSize.LETTER, "letter.pdf");
        assertEquals(612, letter.size().getWidth(), 0.01);
        assertEquals(792, letter.size().getHeight(), 0.01);
        try (PDDocument doc = Loader.loadPDF(dir.resolve("a4.pdf").toFile())) {
            String xmp = new String(doc.getDocumentCatalog().getMetadata().toByteArray(),
                    java.nio.charset.StandardCharsets.UTF_8);
            assertTrue(xmp.contains("<pdfaid:part>2</pdfaid:part>") && xmp.contains("<pdfaid:conformance>B<"));
            assertTrue(xmp.contains(doc.getDocumentInformation().getTitle()));
            assertEquals(1, doc.getDocumentCatalog().getOutputIntents().size());
        }
    }

    @Test
    void writeIsAtomicAndLeavesNoTemporaryFiles() throws IOException {
        Path pdf = dir.resolve("atomic.pdf");
        Files.writeString(pdf, "old");
        CalculationSheet.write(SheetFixtures.bullet().model(), pdf,
                CalculationSheet.PageSize.A4);
        assertTrue(new String(Files.readAllBytes(pdf), 0, 5, java.nio.charset.StandardCharsets.US_ASCII)
                .startsWith("%PDF-"));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(pdf), files.toList());
        }
    }

    /**
     * Renders every page of the three vessel shapes to PNG under target/sheet-png (kept out of the
     * repository) for a person to look at, and checks each page has ink on it.
     */
    @Test
    void pagesRenderForEveryVesselShape() throws IOException {
        Path out = Path.of("target", "sheet-png");
        Files.createDirectories(out);
        String[] names = {"bullet", "drum", "sphere"};
        List<SheetFixtures.Computed> cases = List.of(SheetFixtures.bullet(), SheetFixtures.drum(),
                SheetFixtures.sphere());
        for (int c = 0; c < cases.size(); c++) {
            Path pdf = dir.resolve(names[c] + ".pdf");
            CalculationSheet.write(cases.get(c).model(c == 1 ? UnitSystem.US : UnitSystem.SI), pdf, c == 1 ? CalculationSheet.PageSize.LETTER
                    : CalculationSheet.PageSize.A4);
            Files.copy(pdf, out.resolve(names[c] + ".pdf"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                PDFRenderer renderer = new PDFRenderer(doc);
                for (int i = 0; i < doc.getNumberOfPages(); i++) {
                    BufferedImage img = renderer.renderImageWithDPI(i, 60);
                    int dark = 0;
                    for (int y = 0; y < img.getHeight(); y += 2) {
                        for (int x = 0; x < img.getWidth(); x += 2) {
                            if ((img.getRGB(x, y) & 0xff) < 128) {
                                dark++;
                            }
                        }
                    }
                    assertTrue(dark > 100, names[c] + " page " + (i + 1) + " is blank");
                    ImageIO.write(img, "png", out.resolve(names[c] + "-" + (i + 1) + ".png").toFile());
                }
            }
        }
    }
}
