package org.ventcase.report;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Map;
import java.util.TimeZone;
import java.util.regex.Pattern;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDMetadata;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.color.PDOutputIntent;
import org.ventcase.common.TraceStep;
import org.ventcase.report.SheetModel.Row;
import org.ventcase.report.SheetModel.Table;

/**
 * Writes a {@link SheetModel} as a PDF calculation sheet: title block with "page x of y" on every
 * page, summary and warnings first, then inputs, results, figures, the method step by step,
 * cautions, the code-deferral note and the sign-off block. Fonts (DejaVu Sans, regular and bold)
 * are embedded as subsets; text is real text, so it can be searched and extracted. The document
 * carries PDF/A-2b identification (XMP metadata matching the document information, sRGB output
 * intent from the JDK's ICC profile); it has not been checked with a PDF/A validator.
 *
 * <p>The file is written to a temporary file in the target's folder and then moved into place, so
 * a reader never sees half a sheet.
 */
public final class CalculationSheet {

    /** Paper sizes. */
    public enum PageSize {
        A4(PDRectangle.A4), LETTER(PDRectangle.LETTER);

        private final PDRectangle rect;

        PageSize(PDRectangle rect) {
            this.rect = rect;
        }

        /** Parses {@code a4} or {@code letter} (any case). */
        public static PageSize parse(String field, String text) {
            String t = text == null ? "" : text.trim().toLowerCase(java.util.Locale.ROOT);
            if (t.equals("a4")) {
                return A4;
            }
            if (t.equals("letter")) {
                return LETTER;
            }
            throw org.ventcase.common.InvalidInputException.invalid(field, text, "expected a4 or letter");
        }
    }

    private static final String FONT_DIR = "/org/ventcase/report/fonts/";
    static final byte[] REGULAR_TTF = resource(FONT_DIR + "DejaVuSans.ttf");
    private static final byte[] BOLD_TTF = resource(FONT_DIR + "DejaVuSans-Bold.ttf");
    private static final Pattern FORBIDDEN = Pattern.compile("\\b(NaN|null|Infinity)\\b");

    /**
     * Text in single quotes is the user's input echoed by a message ("'NaN': expected a number ..."), so
     * the guard above does not read it; the program never quotes a number it computed.
     */
    private static final Pattern QUOTED = Pattern.compile("'[^']*'");

    /** A method step's value as printed: as computed (SI), with US customary values bracketed on a US sheet. */
    static String stepText(SheetModel m, String value) {
        return m.units() == UnitSystem.US ? QuantityText.usBracketed(value) : value;
    }

    static final float MARGIN_X = 40f;
    static final float MARGIN_TOP = 30f;
    static final float MARGIN_BOTTOM = 34f;
    static final float BODY = 8.3f;
    static final float SMALL = 7.2f;
    static final float TABLE = 7.8f;

    private CalculationSheet() {
    }

    /**
     * Writes the sheet to {@code target} atomically.
     *
     * @throws IOException when the folder cannot be written
     * @throws IllegalArgumentException when the model holds text a sheet must never show ("NaN", "null")
     */
    public static void write(SheetModel model, Path target, PageSize size) throws IOException {
        checkText(model);
        org.ventcase.common.AtomicFiles.write(target, out -> render(model, size, out));
    }

    /** Renders the sheet to a stream (the caller closes it). */
    static void render(SheetModel model, PageSize size, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDFont regular = PDType0Font.load(doc, new ByteArrayInputStream(REGULAR_TTF), true);
            PDFont bold = PDType0Font.load(doc, new ByteArrayInputStream(BOLD_TTF), true);
            Layout lay = new Layout(doc, size.rect, regular, bold, model);
            lay.body();
            lay.finish();
            metadata(doc, model);
            doc.save(out);
        }
    }

    // ------------------------------------------------------------------------------ text guard

    private static void checkText(SheetModel m) {
        List<String> all = new ArrayList<>();
        SheetIdentity id = m.identity();
        // The user's own words (title, tag, revision, preparer, checker, scenario labels, bar labels and
        // the cells of echo columns) are printed as entered, also where the program's text quotes them
        // ("the relief basis for NaN-1"): the guard masks them. Only those holding a guarded word matter.
        List<String> echoes = new ArrayList<>();
        List<String> words = new ArrayList<>(List.of(id.title(), id.tag(), id.revision(), id.preparer(), id.checker()));
        m.loads().forEach(l -> words.add(l.label()));
        for (Figure f : m.figures()) {
            if (f instanceof Figure.BarChart b) {
                b.bars().forEach(x -> words.add(x.label()));
            }
        }
        for (Table t : concat(m.inputs(), m.results())) {
            for (Row r : t.rows()) {
                t.echoColumns().forEach(i -> words.add(r.cells().get(i)));
            }
        }
        for (String w : words) {
            if (w != null && !w.isEmpty() && FORBIDDEN.matcher(w).find()) {
                echoes.add(w);
            }
        }
        echoes.sort((a, b) -> b.length() - a.length());
        all.addAll(List.of(id.title(), id.tag(), id.revision(), id.preparer(), id.checker(), id.toolName(),
                id.toolVersion(), id.inputHash(), m.deferral(), m.unitNote(), m.banner()));
        for (SheetModel.RevisionRow r : m.revisions()) {
            all.addAll(List.of(r.revision(), r.date(), r.description(), r.preparedBy(), r.checkedBy()));
        }
        for (Table t : m.inputs()) {
            addTable(all, t);
        }
        for (Table t : m.results()) {
            addTable(all, t);
        }
        for (SheetModel.ScenarioLoad l : m.loads()) {
            all.addAll(List.of(l.label(), l.kind(), l.relievingPressure(), l.relievingTemperature(), l.reliefLoad(),
                    l.requiredArea()));
        }
        all.addAll(m.warnings());
        all.addAll(m.cautions());
        for (SheetModel.MethodSection s : m.method()) {
            all.add(s.scenario());
            all.add(s.statement());
            for (TraceStep st : s.steps()) {
                all.add(st.title());
                all.add(st.equation());
                all.add(st.source());
                st.inputs().forEach((k, v) -> {
                    all.add(k);
                    all.add(stepText(m, v));
                });
                st.outputs().forEach((k, v) -> {
                    all.add(k);
                    all.add(stepText(m, v));
                });
                st.notes().forEach(n -> all.add(stepText(m, n)));
            }
        }
        for (Figure f : m.figures()) {
            all.add(f.caption());
            if (f instanceof Figure.VesselSketch s) {
                Figure.SketchLabels l = s.labels();
                all.addAll(List.of(l.diameter(), l.length(), l.elevation(), l.level(), l.fireHeight(), l.fireArea()));
            } else if (f instanceof Figure.BarChart b) {
                all.add(b.valueLabel());
                all.addAll(b.segmentLabels());
                b.bars().forEach(x -> {
                    all.add(x.label());
                    all.add(x.note());
                });
            } else if (f instanceof Figure.LineChart c) {
                all.add(c.xLabel());
                all.add(c.yLabel());
                c.series().forEach(s -> all.add(s.label()));
                c.markers().forEach(k -> all.add(k.label()));
            }
        }
        for (String s : all) {
            String t = s;
            for (String e : echoes) {
                t = t == null ? null : t.replace(e, "");
            }
            if (t == null || FORBIDDEN.matcher(QUOTED.matcher(t).replaceAll("''")).find()) {
                throw new IllegalArgumentException("the sheet would print a missing or undefined value: '" + s + "'");
            }
        }
    }

    private static List<Table> concat(List<Table> a, List<Table> b) {
        List<Table> out = new ArrayList<>(a);
        out.addAll(b);
        return out;
    }

    private static void addTable(List<String> all, Table t) {
        all.add(t.title());
        all.add(t.note());
        all.addAll(t.columns());
        for (Row r : t.rows()) {
            all.addAll(r.cells());
        }
    }

    // ------------------------------------------------------------------------------ PDF/A metadata

    private static void metadata(PDDocument doc, SheetModel m) throws IOException {
        SheetIdentity id = m.identity();
        String title = PdfCanvas.clean(id.title());
        String creator = id.toolName() + " " + id.toolVersion();
        String subject = "First-pass relief basis calculation sheet for " + id.tag() + ", revision " + id.revision();
        String author = id.preparer().isEmpty() ? creator : id.preparer();
        String keywords = "relief basis; " + id.tag() + "; input hash " + id.inputHash();
        String producer = "Apache PDFBox";
        Calendar now = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
        now.set(Calendar.MILLISECOND, 0);
        PDDocumentInformation info = doc.getDocumentInformation();
        info.setTitle(title);
        info.setAuthor(author);
        info.setSubject(subject);
        info.setKeywords(keywords);
        info.setCreator(creator);
        info.setProducer(producer);
        info.setCreationDate(now);
        info.setModificationDate(now);
        String iso = ZonedDateTime.ofInstant(now.toInstant(), ZoneOffset.UTC)
                .format(DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss'+00:00'"));
        String xmp = "<?xpacket begin=\"\uFEFF\" id=\"W5M0MpCehiHzreSzNTczkc9d\"?>\n"
                + "<x:xmpmeta xmlns:x=\"adobe:ns:meta/\">\n"
                + "<rdf:RDF xmlns:rdf=\"http://www.w3.org/1999/02/22-rdf-syntax-ns#\">\n"
                + "<rdf:Description rdf:about=\"\" xmlns:pdfaid=\"http://www.aiim.org/pdfa/ns/id/\">"
                + "<pdfaid:part>2</pdfaid:part><pdfaid:conformance>B</pdfaid:conformance></rdf:Description>\n"
                + "<rdf:Description rdf:about=\"\" xmlns:dc=\"http://purl.org/dc/elements/1.1/\">"
                + "<dc:format>application/pdf</dc:format>"
                + "<dc:title><rdf:Alt><rdf:li xml:lang=\"x-default\">" + xml(title) + "</rdf:li></rdf:Alt></dc:title>"
                + "<dc:creator><rdf:Seq><rdf:li>" + xml(author) + "</rdf:li></rdf:Seq></dc:creator>"
                + "<dc:description><rdf:Alt><rdf:li xml:lang=\"x-default\">" + xml(subject)
                + "</rdf:li></rdf:Alt></dc:description></rdf:Description>\n"
                + "<rdf:Description rdf:about=\"\" xmlns:pdf=\"http://ns.adobe.com/pdf/1.3/\">"
                + "<pdf:Producer>" + xml(producer) + "</pdf:Producer><pdf:Keywords>" + xml(keywords)
                + "</pdf:Keywords></rdf:Description>\n"
                + "<rdf:Description rdf:about=\"\" xmlns:xmp=\"http://ns.adobe.com/xap/1.0/\">"
                + "<xmp:CreatorTool>" + xml(creator) + "</xmp:CreatorTool><xmp:CreateDate>" + iso
                + "</xmp:CreateDate><xmp:ModifyDate>" + iso + "</xmp:ModifyDate></rdf:Description>\n"
                + "</rdf:RDF>\n</x:xmpmeta>\n<?xpacket end=\"w\"?>";
        PDMetadata md = new PDMetadata(doc);
        try (OutputStream os = md.createOutputStream()) {
            os.write(xmp.getBytes(StandardCharsets.UTF_8));
        }
        doc.getDocumentCatalog().setMetadata(md);
        byte[] icc = java.awt.color.ICC_Profile.getInstance(java.awt.color.ColorSpace.CS_sRGB).getData();
        PDOutputIntent intent = new PDOutputIntent(doc, new ByteArrayInputStream(icc));
        intent.setInfo("sRGB IEC61966-2.1");
        intent.setOutputCondition("sRGB IEC61966-2.1");
        intent.setOutputConditionIdentifier("sRGB IEC61966-2.1");
        intent.setRegistryName("http://www.color.org");
        doc.getDocumentCatalog().addOutputIntent(intent);
        doc.getDocumentCatalog().setLanguage("en");
    }

    private static String xml(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    private static byte[] resource(String path) {
        try (InputStream in = CalculationSheet.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("missing packaged font " + path);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + path, e);
        }
    }

    // ------------------------------------------------------------------------------ layout

    /** Flows the sheet's content down the pages; title blocks are added once the page count is known. */
    private static final class Layout {
        private final PDDocument doc;
        private final PDRectangle size;
        private final PDFont regular;
        private final PDFont bold;
        private final SheetModel m;
        private final float left;
        private final float right;
        private final float width;
        private final float titleBlockHeight;
        private PDPageContentStream cs;
        private PdfCanvas c;
        private float y;
        private int section;

        Layout(PDDocument doc, PDRectangle size, PDFont regular, PDFont bold, SheetModel m) {
            this.doc = doc;
            this.size = size;
            this.regular = regular;
            this.bold = bold;
            this.m = m;
            this.left = MARGIN_X;
            this.right = size.getWidth() - MARGIN_X;
            this.width = right - left;
            this.titleBlockHeight = 44 + 12 * titleLines().size();
        }

        private List<String> titleLines() {
            return PdfCanvas.wrap(m.identity().title(), bold, 11f, width - 12);
        }

        private float top() {
            return size.getHeight() - MARGIN_TOP - titleBlockHeight - 14;
        }

        private float bottom() {
            return MARGIN_BOTTOM + 14;
        }

        void newPage() throws IOException {
            if (cs != null) {
                cs.close();
            }
            PDPage page = new PDPage(size);
            doc.addPage(page);
            cs = new PDPageContentStream(doc, page);
            c = new PdfCanvas(cs, regular, bold);
            y = top();
        }

        /** Starts a new page unless {@code h} points fit above the bottom margin. */
        void need(float h) throws IOException {
            if (y - h < bottom()) {
                newPage();
            }
        }

        void body() throws IOException {
            newPage();
            revisions();
            heading("Summary");
            paragraph(m.unitNote(), regular, SMALL, PdfCanvas.MUTED, 0);
            gap(4);
            if (!m.loads().isEmpty()) {
                loadsTable();
            }
            if (!m.results().isEmpty()) {
                table(m.results().get(0));
            }
            warnings();
            heading("Inputs");
            for (Table t : m.inputs()) {
                table(t);
            }
            heading("Results");
            for (int i = 1; i < m.results().size(); i++) {
                table(m.results().get(i));
            }
            if (!m.figures().isEmpty()) {
                heading("Figures", figureHeight(m.figures().get(0)) + 20);
                int n = 1;
                for (Figure f : m.figures()) {
                    figure(f, n++);
                }
            }
            heading("Method, step by step", 120);
            for (SheetModel.MethodSection s : m.method()) {
                method(s);
            }
            heading("Cautions");
            for (String p : m.cautions()) {
                bullet(p);
            }
            heading("Status of this sheet");
            paragraph(m.deferral(), regular, BODY, PdfCanvas.INK, 0);
            gap(8);
            signOff();
        }

        void finish() throws IOException {
            cs.close();
            int n = doc.getNumberOfPages();
            for (int i = 0; i < n; i++) {
                PDPage page = doc.getPage(i);
                try (PDPageContentStream s = new PDPageContentStream(doc, page, PDPageContentStream.AppendMode.APPEND,
                        true, true)) {
                    titleBlock(new PdfCanvas(s, regular, bold), i + 1, n);
                }
            }
        }

        // -------------------------------------------------------------- blocks

        private void titleBlock(PdfCanvas t, int page, int pages) throws IOException {
            float topY = size.getHeight() - MARGIN_TOP;
            float h = titleBlockHeight;
            float yb = topY - h;
            t.strokeRect(left, yb, width, h, 0.8f, PdfCanvas.INK);
            t.text(m.banner(), left + 6, topY - 10, bold, 6.5f, PdfCanvas.MUTED);
            SheetIdentity id = m.identity();
            t.textRight(id.toolName() + " " + id.toolVersion(), right - 6, topY - 10, regular, 6.5f, PdfCanvas.MUTED);
            float ty = topY - 23;
            for (String line : titleLines()) {
                t.text(line, left + 6, ty, bold, 11f, PdfCanvas.INK);
                ty -= 12;
            }
            float gridTop = yb + 26;
            t.line(left, gridTop, right, gridTop, 0.5f, PdfCanvas.RULE);
            String[][] cells = {{"Tag", id.tag()}, {"Revision", id.revision()}, {"Date", id.date().toString()},
                {"Prepared", id.preparer()}, {"Checked", id.checker()},
                {"Page", "page " + page + " of " + pages}};
            float[] w = {0.17f, 0.10f, 0.14f, 0.22f, 0.22f, 0.15f};
            float x = left;
            for (int i = 0; i < cells.length; i++) {
                float cw = w[i] * width;
                if (i > 0) {
                    t.line(x, yb, x, gridTop, 0.5f, PdfCanvas.RULE);
                }
                t.text(cells[i][0], x + 5, gridTop - 8, regular, 6f, PdfCanvas.MUTED);
                titleCell(t, cells[i][1], x + 5, cw - 10, yb);
                x += cw;
            }
            // footer
            float fy = MARGIN_BOTTOM - 4;
            t.line(left, fy + 10, right, fy + 10, 0.4f, PdfCanvas.RULE);
            t.text("Input hash (SHA-256): " + id.inputHash(), left, fy, regular, 6f, PdfCanvas.MUTED);
            t.textRight("First-pass estimate, not a relief design: see Status of this sheet.", right, fy, regular, 6f,
                    PdfCanvas.MUTED);
        }

        /**
         * One entry of the title block's grid. A long entry is set smaller to fit its cell (down to
         * 6.5 pt), then on two lines at 6 pt (a long file name as the audit's tag), and cut with an
         * ellipsis only beyond that. Each step is decided by measuring at the size it is drawn.
         */
        private void titleCell(PdfCanvas t, String v, float x, float max, float yb) throws IOException {
            float vw = PdfCanvas.width(bold, 8f, v);
            float sz = vw <= max ? 8f : Math.max(6.5f, 8f * max / vw);
            List<String> one = PdfCanvas.wrap(v, bold, sz, max);
            if (one.size() <= 1) {
                t.text(one.isEmpty() ? "" : one.get(0), x, yb + 5, bold, sz, PdfCanvas.INK);
                return;
            }
            List<String> two = PdfCanvas.wrap(v, bold, 6f, max);
            if (two.size() == 1) {
                t.text(two.get(0), x, yb + 5, bold, 6f, PdfCanvas.INK);
                return;
            }
            String second = two.get(1);
            if (two.size() > 2) {
                second = PdfCanvas.fitWithEllipsis(second, bold, 6f, max);
            }
            t.text(two.get(0), x, yb + 10.5f, bold, 6f, PdfCanvas.INK);
            t.text(second, x, yb + 3.5f, bold, 6f, PdfCanvas.INK);
        }

        private void revisions() throws IOException {
            List<Row> rows = new ArrayList<>();
            for (SheetModel.RevisionRow r : m.revisions()) {
                rows.add(Row.of(r.revision(), r.date(), r.description(), r.preparedBy(), r.checkedBy()));
            }
            table(new Table("Revisions", List.of("Rev.", "Date", "Description", "Prepared", "Checked"),
                    List.of(0.6, 1.0, 3.4, 1.5, 1.5), rows, ""));
        }

        private void heading(String text) throws IOException {
            heading(text, 60);
        }

        /** A numbered section heading kept on one page with the first {@code keep} points of what follows. */
        private void heading(String text, float keep) throws IOException {
            section++;
            need(28 + keep);
            gap(6);
            String t = section + "  " + text;
            c.text(t, left, y - 11, bold, 11f, PdfCanvas.INK);
            y -= 15;
            c.line(left, y, right, y, 0.6f, PdfCanvas.INK);
            y -= 7;
        }

        private void gap(float h) {
            y -= h;
        }

        private void paragraph(String text, PDFont font, float sz, float[] color, float indent) throws IOException {
            float lead = sz * 1.32f;
            for (String line : PdfCanvas.wrap(text, font, sz, width - indent)) {
                need(lead);
                c.text(line, left + indent, y - sz, font, sz, color);
                y -= lead;
            }
        }

        private void bullet(String text) throws IOException {
            float lead = BODY * 1.32f;
            List<String> lines = PdfCanvas.wrap(text, regular, BODY, width - 12);
            need(lead * Math.min(2, lines.size()));
            c.text("–", left + 2, y - BODY, regular, BODY, PdfCanvas.MUTED);
            for (String line : lines) {
                need(lead);
                c.text(line, left + 12, y - BODY, regular, BODY, PdfCanvas.INK);
                y -= lead;
            }
            gap(3);
        }

        private void warnings() throws IOException {
            List<String> w = m.warnings();
            float lead = BODY * 1.32f;
            String title = w.isEmpty() ? "Warnings: none raised by the calculation"
                    : "Warnings (" + w.size() + "): read each before relying on a number";
            need(22 + (w.isEmpty() ? 0 : lead * 2));
            gap(4);
            c.text(title, left, y - 9, bold, 9f, PdfCanvas.INK);
            y -= 14;
            for (String s : w) {
                List<String> lines = PdfCanvas.wrap(s, regular, BODY, width - 16);
                float h = lines.size() * lead + 5;
                if (h > y - bottom()) {
                    newPage();
                }
                c.fillRect(left, y - h, width, h, PdfCanvas.WARNING_FILL);
                c.line(left, y - h, left, y, 2f, PdfCanvas.WARNING_RULE);
                float ty = y - 2.5f;
                for (String line : lines) {
                    c.text(line, left + 9, ty - BODY, regular, BODY, PdfCanvas.INK);
                    ty -= lead;
                }
                y -= h + 3;
            }
            gap(6);
        }

        private void loadsTable() throws IOException {
            List<Row> rows = new ArrayList<>();
            for (SheetModel.ScenarioLoad l : m.loads()) {
                rows.add(new Row(List.of(l.label() + (l.governing() ? "\nGOVERNING" : ""), l.kind(),
                        l.relievingPressure(), l.relievingTemperature(), l.reliefLoad(), l.requiredArea()),
                        l.governing()));
            }
            table(new Table("Relief loads by scenario", List.of("Scenario", "Type", "Relieving pressure P1",
                    "Relieving temperature T1", "Relief load W", "Required area"), List.of(1.3, 1.5, 1.3, 1.2, 1.3,
                    1.3), rows, "The governing scenario (highlighted) sets the required area."));
        }

        // -------------------------------------------------------------- tables

        private static final float PAD_X = 3.5f;
        private static final float PAD_Y = 2.6f;

        private float[] columnWidths(Table t) {
            double sum = 0;
            for (double w : t.weights()) {
                sum += w;
            }
            float[] cw = new float[t.weights().size()];
            for (int i = 0; i < cw.length; i++) {
                cw[i] = (float) (t.weights().get(i) / sum * width);
            }
            return cw;
        }

        private List<List<String>> cellLines(List<String> cells, float[] cw, PDFont font, float sz) {
            List<List<String>> out = new ArrayList<>();
            for (int i = 0; i < cells.size(); i++) {
                out.add(PdfCanvas.wrap(cells.get(i), font, sz, cw[i] - 2 * PAD_X));
            }
            return out;
        }

        private static int maxLines(List<List<String>> lines) {
            int n = 1;
            for (List<String> l : lines) {
                n = Math.max(n, l.size());
            }
            return n;
        }

        void table(Table t) throws IOException {
            float lead = TABLE * 1.28f;
            float[] cw = columnWidths(t);
            List<List<String>> head = cellLines(t.columns(), cw, bold, TABLE - 0.6f);
            float headH = maxLines(head) * lead + 2 * PAD_Y;
            List<List<List<String>>> body = new ArrayList<>();
            for (Row r : t.rows()) {
                body.add(cellLines(r.cells(), cw, r.emphasis() ? bold : regular, TABLE));
            }
            float firstRow = body.isEmpty() ? 0 : Math.min(maxLines(body.get(0)), 4) * lead + 2 * PAD_Y;
            need(14 + headH + firstRow);
            caption(t.title(), false);
            header(head, cw, headH, lead);
            for (int i = 0; i < body.size(); i++) {
                List<List<String>> cells = body.get(i);
                boolean emph = t.rows().get(i).emphasis();
                int total = maxLines(cells);
                int from = 0;
                while (from < total) {
                    int fit = (int) Math.floor((y - bottom() - 2 * PAD_Y) / lead);
                    if (fit < 1 || fit < Math.min(total - from, 2)) {
                        c.line(left, y, right, y, 0.6f, PdfCanvas.INK);
                        newPage();
                        caption(t.title(), true);
                        header(head, cw, headH, lead);
                        continue;
                    }
                    int n = Math.min(fit, total - from);
                    float h = n * lead + 2 * PAD_Y;
                    if (emph) {
                        c.fillRect(left, y - h, width, h, PdfCanvas.EMPHASIS_FILL);
                    }
                    float x = left;
                    for (int k = 0; k < cells.size(); k++) {
                        List<String> lines = cells.get(k);
                        float ty = y - PAD_Y - TABLE;
                        for (int j = from; j < Math.min(lines.size(), from + n); j++) {
                            c.text(lines.get(j), x + PAD_X, ty, emph ? bold : regular, TABLE, PdfCanvas.INK);
                            ty -= lead;
                        }
                        x += cw[k];
                    }
                    y -= h;
                    from += n;
                    boolean last = i == body.size() - 1 && from >= total;
                    c.line(left, y, right, y, last ? 0.6f : 0.3f, last ? PdfCanvas.INK : PdfCanvas.HAIRLINE);
                }
            }
            if (!t.note().isEmpty()) {
                gap(2);
                paragraph(t.note(), regular, SMALL - 0.4f, PdfCanvas.MUTED, 0);
            }
            gap(8);
        }

        private void caption(String title, boolean continued) throws IOException {
            c.text(title + (continued ? " (continued)" : ""), left, y - 9, bold, 8.8f, PdfCanvas.ACCENT);
            y -= 13;
        }

        private void header(List<List<String>> head, float[] cw, float h, float lead) throws IOException {
            c.fillRect(left, y - h, width, h, PdfCanvas.HEADER_FILL);
            c.line(left, y, right, y, 0.6f, PdfCanvas.INK);
            float x = left;
            for (int k = 0; k < head.size(); k++) {
                float ty = y - PAD_Y - TABLE + 0.6f;
                for (String line : head.get(k)) {
                    c.text(line, x + PAD_X, ty, bold, TABLE - 0.6f, PdfCanvas.INK);
                    ty -= lead;
                }
                x += cw[k];
            }
            y -= h;
            c.line(left, y, right, y, 0.4f, PdfCanvas.RULE);
        }

        // -------------------------------------------------------------- figures and method

        private float figureHeight(Figure f) {
            if (f instanceof Figure.BarChart b) {
                return Math.min(ChartDrawing.barChartHeight(b), top() - bottom() - 40);
            }
            return f instanceof Figure.VesselSketch s ? VesselDrawing.preferredHeight(s, width) : 215f;
        }

        private void figure(Figure f, int n) throws IOException {
            float h = figureHeight(f);
            List<String> cap = PdfCanvas.wrap("Figure " + n + ". " + f.caption(), regular, SMALL, width);
            need(h + cap.size() * SMALL * 1.3f + 12);
            float by = y - h;
            if (f instanceof Figure.VesselSketch s) {
                VesselDrawing.draw(c, s, left, by, width, h);
            } else if (f instanceof Figure.LineChart ch) {
                ChartDrawing.draw(c, ch, left, by, width, h);
            } else if (f instanceof Figure.BarChart bc) {
                ChartDrawing.drawBars(c, bc, left, by, width, h);
            }
            y = by - 6;
            paragraph("Figure " + n + ". " + f.caption(), regular, SMALL, PdfCanvas.MUTED, 0);
            gap(10);
        }

        private void method(SheetModel.MethodSection s) throws IOException {
            need(40);
            c.text(s.scenario(), left, y - 9.5f, bold, 9.5f, PdfCanvas.INK);
            y -= 15;
            for (String p : s.statement().split("\n")) {
                paragraph(p, regular, BODY, PdfCanvas.INK, 0);
                gap(2);
            }
            gap(4);
            int i = 1;
            for (TraceStep st : s.steps()) {
                List<Row> rows = new ArrayList<>();
                rows.add(Row.of("", "Equation", st.equation()));
                rows.add(Row.of("", "Source", st.source()));
                for (Map.Entry<String, String> e : st.inputs().entrySet()) {
                    rows.add(Row.of("in", e.getKey(), stepText(m, e.getValue())));
                }
                for (Map.Entry<String, String> e : st.outputs().entrySet()) {
                    rows.add(new Row(List.of("out", e.getKey(), stepText(m, e.getValue())), false));
                }
                for (String note : st.notes()) {
                    rows.add(Row.of("note", "Rule applied", stepText(m, note)));
                }
                table(new Table("Step " + i++ + ". " + st.title(), List.of("", "Item", "Value"),
                        List.of(0.45, 2.1, 4.7), rows, ""));
            }
        }

        private void signOff() throws IOException {
            List<SheetModel.Signatory> roles = m.signOff().roles();
            float h = 46;
            need(h + 16);
            c.text("Sign-off", left, y - 9, bold, 8.8f, PdfCanvas.ACCENT);
            y -= 14;
            float cw = width / Math.max(1, roles.size());
            float x = left;
            for (SheetModel.Signatory r : roles) {
                c.strokeRect(x, y - h, cw, h, 0.5f, PdfCanvas.RULE);
                c.text(r.role(), x + 5, y - 9, regular, 6.5f, PdfCanvas.MUTED);
                c.text(r.name(), x + 5, y - 21, bold, 8.5f, PdfCanvas.INK);
                c.text("Signature", x + 5, y - h + 5, regular, 6f, PdfCanvas.MUTED);
                c.text("Date", x + cw * 0.62f, y - h + 5, regular, 6f, PdfCanvas.MUTED);
                x += cw;
            }
            y -= h + 6;
        }
    }
}
