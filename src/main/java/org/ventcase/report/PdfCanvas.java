package org.ventcase.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * Thin drawing helpers over one page's content stream: text in the sheet's fonts, wrapping,
 * lines, rectangles and circles, with the sheet's palette. Coordinates in PDF points, origin at
 * the bottom left of the page.
 */
final class PdfCanvas {

    /** Grey levels and tints of the sheet, one place. */
    static final float[] INK = {0.12f, 0.12f, 0.13f};
    static final float[] MUTED = {0.40f, 0.41f, 0.43f};
    static final float[] RULE = {0.62f, 0.63f, 0.65f};
    static final float[] HAIRLINE = {0.82f, 0.83f, 0.84f};
    static final float[] HEADER_FILL = {0.925f, 0.93f, 0.935f};
    static final float[] EMPHASIS_FILL = {0.88f, 0.915f, 0.95f};
    static final float[] ACCENT = {0.19f, 0.33f, 0.49f};
    static final float[] LIQUID = {0.80f, 0.86f, 0.92f};
    static final float[] FIRE = {0.78f, 0.36f, 0.20f};
    static final float[] FIRE_TINT = {0.97f, 0.88f, 0.83f};
    static final float[] WARNING_FILL = {0.985f, 0.955f, 0.90f};
    static final float[] WARNING_RULE = {0.80f, 0.55f, 0.20f};

    final PDPageContentStream cs;
    final PDFont regular;
    final PDFont bold;

    PdfCanvas(PDPageContentStream cs, PDFont regular, PDFont bold) {
        this.cs = cs;
        this.regular = regular;
        this.bold = bold;
    }

    /** Replaces characters the fonts cannot show as text (controls, tabs) with spaces. */
    static String clean(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            sb.append(Character.isISOControl(c) ? ' ' : c);
        }
        return sb.toString();
    }

    /** Shown for a character the font cannot draw (or a broken UTF-16 surrogate). */
    static final String MISSING = "\uFFFD";

    /** Per font: code points found drawable (true) or not (false). */
    private static final java.util.Map<PDFont, java.util.Map<Integer, Boolean>> DRAWABLE =
            java.util.Collections.synchronizedMap(new java.util.WeakHashMap<>());

    /**
     * {@link #clean}, and every character the font cannot draw replaced by U+FFFD (or '?' where the
     * font lacks that too): a sheet never fails on a character its fonts do not have, and the reader
     * sees that one was there.
     */
    static String printable(PDFont font, String s) {
        String c = clean(s);
        StringBuilder sb = null;
        for (int i = 0; i < c.length(); ) {
            int cp = c.codePointAt(i);
            int len = Character.charCount(cp);
            boolean ok = !(Character.isSurrogate(c.charAt(i)) && len == 1) && drawable(font, cp);
            if (!ok && sb == null) {
                sb = new StringBuilder(c.length()).append(c, 0, i);
            }
            if (sb != null) {
                if (ok) {
                    sb.appendCodePoint(cp);
                } else {
                    sb.append(drawable(font, 0xFFFD) ? MISSING : "?");
                }
            }
            i += len;
        }
        return sb == null ? c : sb.toString();
    }

    private static boolean drawable(PDFont font, int cp) {
        if (cp < 0x80 && cp >= 0x20) {
            return true;
        }
        java.util.Map<Integer, Boolean> m = DRAWABLE.computeIfAbsent(font,
                f -> new java.util.concurrent.ConcurrentHashMap<>());
        return m.computeIfAbsent(cp, k -> {
            try {
                font.encode(new String(Character.toChars(k)));
                return true;
            } catch (IOException | IllegalArgumentException e) {
                return false;
            }
        });
    }

    static float width(PDFont font, float size, String s) {
        try {
            return font.getStringWidth(printable(font, s)) / 1000f * size;
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /**
     * Breaks text into lines no wider than {@code max}: at spaces where possible, inside a word
     * only when the word alone is too wide. Line breaks in the text are kept. Widths add up
     * character by character (no kerning), so each word is measured once and a word too wide for
     * a line is cut in one pass over its characters: the time grows with the text's length, not
     * with its square (a 100,000-character register cell must not stall the audit sheet).
     */
    static List<String> wrap(String text, PDFont font, float size, float max) {
        List<String> lines = new ArrayList<>();
        float space = width(font, size, " ");
        for (String para : clean(text.replace("\r", "")).split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            float lineWidth = 0;
            for (String w : para.split(" ")) {
                if (w.isEmpty()) {
                    continue;
                }
                float ww = width(font, size, w);
                float trial = line.length() == 0 ? ww : lineWidth + space + ww;
                if (trial <= max) {
                    if (line.length() > 0) {
                        line.append(' ');
                    }
                    line.append(w);
                    lineWidth = trial;
                    continue;
                }
                if (line.length() > 0) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                // too wide alone: cut it, filling each line character by character (one pass)
                int from = 0;
                float acc = 0;
                for (int i = 0; i < w.length(); ) {
                    int cp = w.codePointAt(i);
                    int len = Character.charCount(cp);
                    float cw = width(font, size, w.substring(i, i + len));
                    if (acc + cw > max && i > from) {
                        lines.add(w.substring(from, i));
                        from = i;
                        acc = 0;
                    }
                    acc += cw;
                    i += len;
                }
                line.append(w, from, w.length());
                lineWidth = acc;
            }
            lines.add(line.toString());
        }
        return lines;
    }

    /** {@code s} followed by an ellipsis, shortened from the end until both fit in {@code max}. */
    static String fitWithEllipsis(String s, PDFont font, float size, float max) {
        String t = s;
        while (!t.isEmpty() && width(font, size, t + "…") > max) {
            int cut = t.length() - 1;
            if (cut > 0 && Character.isLowSurrogate(t.charAt(cut))) {
                cut--;
            }
            t = t.substring(0, cut);
        }
        return t + "…";
    }

    void text(String s, float x, float y, PDFont font, float size, float[] color) throws IOException {
        String t = printable(font, s);
        if (t.isEmpty()) {
            return;
        }
        cs.beginText();
        cs.setFont(font, size);
        cs.setNonStrokingColor(color[0], color[1], color[2]);
        cs.newLineAtOffset(x, y);
        cs.showText(t);
        cs.endText();
    }

    void textRight(String s, float xRight, float y, PDFont font, float size, float[] color) throws IOException {
        text(s, xRight - width(font, size, s), y, font, size, color);
    }

    void textCentre(String s, float xCentre, float y, PDFont font, float size, float[] color) throws IOException {
        text(s, xCentre - width(font, size, s) / 2, y, font, size, color);
    }

    void line(float x0, float y0, float x1, float y1, float w, float[] color) throws IOException {
        cs.setStrokingColor(color[0], color[1], color[2]);
        cs.setLineWidth(w);
        cs.moveTo(x0, y0);
        cs.lineTo(x1, y1);
        cs.stroke();
    }

    void dashed(float x0, float y0, float x1, float y1, float w, float[] color, float on, float off)
            throws IOException {
        cs.setLineDashPattern(new float[] {on, off}, 0);
        line(x0, y0, x1, y1, w, color);
        cs.setLineDashPattern(new float[0], 0);
    }

    void fillRect(float x, float y, float w, float h, float[] color) throws IOException {
        cs.setNonStrokingColor(color[0], color[1], color[2]);
        cs.addRect(x, y, w, h);
        cs.fill();
    }

    void strokeRect(float x, float y, float w, float h, float lw, float[] color) throws IOException {
        cs.setStrokingColor(color[0], color[1], color[2]);
        cs.setLineWidth(lw);
        cs.addRect(x, y, w, h);
        cs.stroke();
    }

    /** Adds a circle to the current path (four Bezier arcs). */
    void circlePath(float cx, float cy, float r) throws IOException {
        float k = 0.5523f * r;
        cs.moveTo(cx + r, cy);
        cs.curveTo(cx + r, cy + k, cx + k, cy + r, cx, cy + r);
        cs.curveTo(cx - k, cy + r, cx - r, cy + k, cx - r, cy);
        cs.curveTo(cx - r, cy - k, cx - k, cy - r, cx, cy - r);
        cs.curveTo(cx + k, cy - r, cx + r, cy - k, cx + r, cy);
        cs.closePath();
    }
}
