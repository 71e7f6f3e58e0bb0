package org.ventcase.report;

import java.io.IOException;
import java.util.List;
import java.util.Locale;

/**
 * Draws a {@link Figure.LineChart}: axes with round ticks, grid, series, labelled markers and a
 * legend. Tick positions are layout, not results; every plotted value comes from the chart.
 */
final class ChartDrawing {

    private static final float TICK_SIZE = 7f;
    private static final float[][] SERIES_COLOURS = {PdfCanvas.ACCENT, {0.55f, 0.35f, 0.18f}, {0.30f, 0.45f, 0.30f},
            {0.45f, 0.45f, 0.47f}};

    private ChartDrawing() {
    }

    /** Axis range and tick step chosen as 1, 2 or 5 times a power of ten. */
    record Axis(double lo, double hi, double step) {

        static Axis nice(double min, double max, int targetTicks) {
            if (!(max > min)) {
                double pad = min == 0 ? 1 : Math.abs(min) * 0.1;
                min -= pad;
                max += pad;
            }
            double raw = (max - min) / Math.max(1, targetTicks);
            double mag = Math.pow(10, Math.floor(Math.log10(raw)));
            double norm = raw / mag;
            double step = (norm <= 1 ? 1 : norm <= 2 ? 2 : norm <= 5 ? 5 : 10) * mag;
            double lo = Math.floor(min / step + 1e-9) * step;
            double hi = Math.ceil(max / step - 1e-9) * step;
            return new Axis(lo, hi, step);
        }

        int decimals() {
            return Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
        }

        String label(double v) {
            return String.format(Locale.ROOT, "%." + decimals() + "f", Math.abs(v) < step * 1e-9 ? 0.0 : v);
        }
    }

    static void draw(PdfCanvas c, Figure.LineChart ch, float bx, float by, float bw, float bh) throws IOException {
        double xmin = Double.POSITIVE_INFINITY;
        double xmax = Double.NEGATIVE_INFINITY;
        double ymin = Double.POSITIVE_INFINITY;
        double ymax = Double.NEGATIVE_INFINITY;
        for (Figure.Series s : ch.series()) {
            for (double v : s.x()) {
                xmin = Math.min(xmin, v);
                xmax = Math.max(xmax, v);
            }
            for (double v : s.y()) {
                ymin = Math.min(ymin, v);
                ymax = Math.max(ymax, v);
            }
        }
        for (Figure.Marker mk : ch.markers()) {
            xmin = Math.min(xmin, mk.x());
            xmax = Math.max(xmax, mk.x());
            ymin = Math.min(ymin, mk.y());
            ymax = Math.max(ymax, mk.y());
        }
        if (ymin > 0 && ymin < 0.4 * ymax) {
            ymin = 0;
        }
        Axis xa = Axis.nice(xmin, xmax, 8);
        Axis ya = Axis.nice(ymin, ymax * 1.04, 6);
        float yTickWidth = 0;
        for (double v = ya.lo(); v <= ya.hi() + ya.step() * 1e-6; v += ya.step()) {
            yTickWidth = Math.max(yTickWidth, PdfCanvas.width(c.regular, TICK_SIZE, ya.label(v)));
        }
        float px = bx + yTickWidth + 22;
        float py = by + 26;
        float pw = bw - (px - bx) - 8;
        float ph = bh - 26 - 8;
        // grid and ticks
        for (double v = xa.lo(); v <= xa.hi() + xa.step() * 1e-6; v += xa.step()) {
            float x = (float) (px + (v - xa.lo()) / (xa.hi() - xa.lo()) * pw);
            c.line(x, py, x, py + ph, 0.25f, PdfCanvas.HAIRLINE);
            c.line(x, py, x, py - 3, 0.5f, PdfCanvas.INK);
            c.textCentre(xa.label(v), x, py - 11, c.regular, TICK_SIZE, PdfCanvas.INK);
        }
        for (double v = ya.lo(); v <= ya.hi() + ya.step() * 1e-6; v += ya.step()) {
            float y = (float) (py + (v - ya.lo()) / (ya.hi() - ya.lo()) * ph);
            c.line(px, y, px + pw, y, 0.25f, PdfCanvas.HAIRLINE);
            c.line(px - 3, y, px, y, 0.5f, PdfCanvas.INK);
            c.textRight(ya.label(v), px - 5, y - 2.5f, c.regular, TICK_SIZE, PdfCanvas.INK);
        }
        c.strokeRect(px, py, pw, ph, 0.6f, PdfCanvas.INK);
        c.textCentre(ch.xLabel(), px + pw / 2, by + 2, c.regular, 7.5f, PdfCanvas.INK);
        // y-axis title, rotated
        c.cs.beginText();
        c.cs.setFont(c.regular, 7.5f);
        c.cs.setNonStrokingColor(PdfCanvas.INK[0], PdfCanvas.INK[1], PdfCanvas.INK[2]);
        float yl = PdfCanvas.width(c.regular, 7.5f, ch.yLabel());
        c.cs.setTextMatrix(org.apache.pdfbox.util.Matrix.getRotateInstance(Math.PI / 2, bx + 7,
                py + ph / 2 - yl / 2));
        c.cs.showText(PdfCanvas.printable(c.regular, ch.yLabel()));
        c.cs.endText();

        Mapper m = (x, y) -> new float[] {(float) (px + (x - xa.lo()) / (xa.hi() - xa.lo()) * pw),
            (float) (py + (y - ya.lo()) / (ya.hi() - ya.lo()) * ph)};
        int i = 0;
        float legendY = py + ph - 10;
        for (Figure.Series s : ch.series()) {
            float[] col = SERIES_COLOURS[i % SERIES_COLOURS.length];
            double[] xs = s.x();
            double[] ys = s.y();
            c.cs.setStrokingColor(col[0], col[1], col[2]);
            c.cs.setLineWidth(1.2f);
            if (s.dashed()) {
                c.cs.setLineDashPattern(new float[] {4f, 2f}, 0);
            }
            float[] p0 = m.at(xs[0], ys[0]);
            c.cs.moveTo(p0[0], p0[1]);
            for (int j = 1; j < xs.length; j++) {
                float[] p = m.at(xs[j], ys[j]);
                c.cs.lineTo(p[0], p[1]);
            }
            c.cs.stroke();
            c.cs.setLineDashPattern(new float[0], 0);
            for (int j = 0; j < xs.length; j++) {
                float[] p = m.at(xs[j], ys[j]);
                c.fillRect(p[0] - 1.2f, p[1] - 1.2f, 2.4f, 2.4f, col);
            }
            // legend entry, top left inside the plot
            if (s.dashed()) {
                c.dashed(px + 8, legendY + 2.5f, px + 24, legendY + 2.5f, 1.2f, col, 4f, 2f);
            } else {
                c.line(px + 8, legendY + 2.5f, px + 24, legendY + 2.5f, 1.2f, col);
            }
            c.text(s.label(), px + 28, legendY, c.regular, TICK_SIZE, PdfCanvas.INK);
            legendY -= 10;
            i++;
        }
        for (Figure.Marker mk : ch.markers()) {
            float[] p = m.at(mk.x(), mk.y());
            symbol(c, p[0], p[1], mk.filled(), mk.shape());
        }
        if (ch.markers().isEmpty()) {
            return;
        }
        // marker key in the corner of the plot with the fewest data points
        float kw = 0;
        for (Figure.Marker mk : ch.markers()) {
            kw = Math.max(kw, PdfCanvas.width(c.regular, TICK_SIZE, mk.label()));
        }
        kw += 22;
        float kh = ch.markers().size() * 10f + 6;
        float[][] corners = {{px + pw - kw - 6, py + 6}, {px + 6, py + 6}, {px + pw - kw - 6, py + ph - kh - 6},
            {px + 6, py + ph - kh - 6 - 10 * ch.series().size()}};
        int best = 0;
        int bestCount = Integer.MAX_VALUE;
        for (int k = 0; k < corners.length; k++) {
            int count = 0;
            for (Figure.Series sr : ch.series()) {
                double[] xs = sr.x();
                double[] ys = sr.y();
                for (int j = 0; j < xs.length; j++) {
                    float[] p = m.at(xs[j], ys[j]);
                    if (p[0] >= corners[k][0] - 4 && p[0] <= corners[k][0] + kw + 4 && p[1] >= corners[k][1] - 4
                            && p[1] <= corners[k][1] + kh + 4) {
                        count++;
                    }
                }
            }
            for (Figure.Marker mk : ch.markers()) {
                float[] p = m.at(mk.x(), mk.y());
                if (p[0] >= corners[k][0] - 4 && p[0] <= corners[k][0] + kw + 4 && p[1] >= corners[k][1] - 4
                        && p[1] <= corners[k][1] + kh + 4) {
                    count += 100;
                }
            }
            if (count < bestCount) {
                bestCount = count;
                best = k;
            }
        }
        float kx = corners[best][0];
        float ky = corners[best][1];
        c.fillRect(kx, ky, kw, kh, new float[] {1f, 1f, 1f});
        c.strokeRect(kx, ky, kw, kh, 0.4f, PdfCanvas.RULE);
        float ly = ky + kh - 11;
        for (Figure.Marker mk : ch.markers()) {
            symbol(c, kx + 9, ly + 2.5f, mk.filled(), mk.shape());
            c.text(mk.label(), kx + 17, ly, c.regular, TICK_SIZE, PdfCanvas.INK);
            ly -= 10;
        }
    }

    private static void symbol(PdfCanvas c, float x, float y, boolean filled, Figure.Marker.Shape shape)
            throws IOException {
        c.cs.setStrokingColor(PdfCanvas.INK[0], PdfCanvas.INK[1], PdfCanvas.INK[2]);
        c.cs.setLineWidth(0.9f);
        float r = 3.2f;
        switch (shape) {
            case SQUARE -> c.cs.addRect(x - 0.85f * r, y - 0.85f * r, 1.7f * r, 1.7f * r);
            case DIAMOND -> {
                c.cs.moveTo(x, y + 1.2f * r);
                c.cs.lineTo(x + 1.2f * r, y);
                c.cs.lineTo(x, y - 1.2f * r);
                c.cs.lineTo(x - 1.2f * r, y);
                c.cs.closePath();
            }
            default -> c.circlePath(x, y, r);
        }
        if (filled) {
            c.cs.setNonStrokingColor(PdfCanvas.FIRE[0], PdfCanvas.FIRE[1], PdfCanvas.FIRE[2]);
        } else {
            c.cs.setNonStrokingColor(1f, 1f, 1f);
        }
        c.cs.fillAndStroke();
    }

    private interface Mapper {
        float[] at(double x, double y);
    }

    /** Height a bar chart needs for its bars, points. */
    static float barChartHeight(Figure.BarChart ch) {
        return 44f + 15f * ch.bars().size() + 10f * ch.segmentLabels().size();
    }

    /** Draws a {@link Figure.BarChart}: category labels at the left, stacked bars, value axis below, legend. */
    static void drawBars(PdfCanvas c, Figure.BarChart ch, float bx, float by, float bw, float bh) throws IOException {
        double max = 0;
        float labelWidth = 0;
        for (Figure.Bar b : ch.bars()) {
            max = Math.max(max, b.total());
            labelWidth = Math.max(labelWidth, PdfCanvas.width(c.regular, TICK_SIZE, b.label()));
        }
        labelWidth = Math.min(labelWidth, bw * 0.35f);
        Axis xa = Axis.nice(0, max > 0 ? max * 1.12 : 1, 6);
        float legendH = 10f * ch.segmentLabels().size();
        float px = bx + labelWidth + 8;
        float py = by + 26 + legendH;
        float pw = bw - (px - bx) - 8;
        float ph = bh - 26 - legendH - 6;
        for (double v = xa.lo(); v <= xa.hi() + xa.step() * 1e-6; v += xa.step()) {
            float x = (float) (px + (v - xa.lo()) / (xa.hi() - xa.lo()) * pw);
            c.line(x, py, x, py + ph, 0.25f, PdfCanvas.HAIRLINE);
            c.line(x, py, x, py - 3, 0.5f, PdfCanvas.INK);
            c.textCentre(xa.label(v), x, py - 11, c.regular, TICK_SIZE, PdfCanvas.INK);
        }
        c.strokeRect(px, py, pw, ph, 0.6f, PdfCanvas.INK);
        c.textCentre(ch.valueLabel(), px + pw / 2, py - 22, c.regular, 7.5f, PdfCanvas.INK);
        int n = ch.bars().size();
        float slot = ph / n;
        float barH = Math.min(10f, slot * 0.7f);
        for (int i = 0; i < n; i++) {
            Figure.Bar b = ch.bars().get(i);
            float yc = py + ph - slot * (i + 0.5f);
            List<String> label = PdfCanvas.wrap(b.label(), c.regular, TICK_SIZE, labelWidth);
            c.textRight(label.isEmpty() ? "" : label.get(0) + (label.size() > 1 ? "…" : ""), px - 4, yc - 2.5f,
                    c.regular, TICK_SIZE, PdfCanvas.INK);
            double[] vs = b.values();
            double acc = 0;
            for (int k = 0; k < vs.length; k++) {
                float x0 = (float) (px + acc / xa.hi() * pw);
                acc += vs[k];
                float x1 = (float) (px + acc / xa.hi() * pw);
                if (x1 > x0) {
                    c.fillRect(x0, yc - barH / 2, x1 - x0, barH, SERIES_COLOURS[k % SERIES_COLOURS.length]);
                }
            }
            if (!b.note().isEmpty()) {
                c.text(b.note(), (float) (px + acc / xa.hi() * pw) + 3, yc - 2.5f, c.regular, TICK_SIZE - 0.5f,
                        PdfCanvas.MUTED);
            }
        }
        float ly = by + legendH - 8;
        for (int k = 0; k < ch.segmentLabels().size(); k++) {
            c.fillRect(px, ly, 10, 6, SERIES_COLOURS[k % SERIES_COLOURS.length]);
            c.text(ch.segmentLabels().get(k), px + 14, ly, c.regular, TICK_SIZE, PdfCanvas.INK);
            ly -= 10;
        }
    }
}
