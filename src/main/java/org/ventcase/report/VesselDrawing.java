package org.ventcase.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.ventcase.vessel.Vessel;

/**
 * Draws a {@link Figure.VesselSketch} to scale in a box: grade, the vessel outline with its heads
 * as profiled, the liquid, the fire-exposed wetted wall, the fire-height line and dimensions.
 * Only placement arithmetic here; every printed value is a label of the sketch.
 */
final class VesselDrawing {

    private static final float LABEL_SIZE = 7f;
    private static final float LEFT_LABELS = 118f;
    private static final float RIGHT_LABELS = 150f;

    private VesselDrawing() {
    }

    /** A label to place on one side, pushed apart vertically from its neighbours. */
    private record SideLabel(String text, float y, float anchorX, float anchorY) {
        SideLabel(String text, float y) {
            this(text, y, Float.NaN, Float.NaN);
        }
    }

    /** Scene extent in m: {width, height above grade}, with the padding the drawing adds. */
    private static double[] scene(Figure.VesselSketch s) {
        boolean horizontal = s.shape() == Vessel.Shape.HORIZONTAL_CYLINDER;
        boolean sphere = s.shape() == Vessel.Shape.SPHERE;
        double d1 = sphere ? 0 : depth(s.firstHead());
        double d2 = sphere ? 0 : depth(s.secondHead());
        double width = horizontal ? d1 + s.tangentLengthM() + d2 : s.diameterM();
        double height = horizontal || sphere ? s.diameterM() : d1 + s.tangentLengthM() + d2;
        double top = Math.max(s.bottomElevationM() + height, s.fireHeightM());
        double pad = 0.06 * Math.max(width, top);
        double ground = 0.04 * Math.max(width, top);
        return new double[] {width + 2 * pad, top + pad + ground + 0.02 * top};
    }

    /** Box height that fits the scene to scale in a box of the given width, within 150..300 pt. */
    static float preferredHeight(Figure.VesselSketch s, float boxWidth) {
        double[] sc = scene(s);
        double k = (boxWidth - LEFT_LABELS - RIGHT_LABELS) / sc[0];
        return (float) Math.max(150, Math.min(300, sc[1] * k + 20));
    }

    static void draw(PdfCanvas c, Figure.VesselSketch s, float bx, float by, float bw, float bh) throws IOException {
        boolean horizontal = s.shape() == Vessel.Shape.HORIZONTAL_CYLINDER;
        boolean sphere = s.shape() == Vessel.Shape.SPHERE;
        double d1 = sphere ? 0 : depth(s.firstHead());
        double d2 = sphere ? 0 : depth(s.secondHead());
        double r = s.diameterM() / 2;
        double e = s.bottomElevationM();
        double width = horizontal ? d1 + s.tangentLengthM() + d2 : s.diameterM();
        double height = horizontal || sphere ? s.diameterM() : d1 + s.tangentLengthM() + d2;
        double top = Math.max(e + height, s.fireHeightM());
        // scene: x in [-pad, width + pad], y in [-ground, top + pad]
        double pad = 0.06 * Math.max(width, top);
        double ground = 0.04 * Math.max(width, top);
        double sceneW = width + 2 * pad;
        double sceneH = top + pad + ground + 0.02 * top;
        float areaX = bx + LEFT_LABELS;
        float areaW = bw - LEFT_LABELS - RIGHT_LABELS;
        float areaY = by + 4;
        float areaH = bh - 16;
        float k = (float) Math.min(areaW / sceneW, areaH / sceneH);
        float ox = (float) (areaX + (areaW - sceneW * k) / 2 + pad * k);
        float oy = (float) (areaY + ground * k);
        Mapper m = (x, y) -> new float[] {ox + (float) (x * k), oy + (float) (y * k)};

        List<float[]> outline = outline(s, d1, r, e, horizontal, sphere, m);
        float[] lo = m.at(0, e);
        float[] hi = m.at(width, e + height);
        float vesselLeft = lo[0];
        float vesselRight = hi[0];
        float gradeY = m.at(0, 0)[1];

        // liquid, clipped to the vessel
        float levelY = m.at(0, e + s.liquidLevelM())[1];
        float fireLevelY = m.at(0, e + s.fireWettedLevelM())[1];
        c.cs.saveGraphicsState();
        path(c, outline);
        c.cs.clip();
        c.fillRect(vesselLeft - 2, lo[1] - 2, vesselRight - vesselLeft + 4, levelY - lo[1] + 2, PdfCanvas.LIQUID);
        // fire-exposed wetted zone: light hatch over the liquid below the effective level
        if (s.fireWettedLevelM() > 0) {
            c.cs.setStrokingColor(PdfCanvas.FIRE[0], PdfCanvas.FIRE[1], PdfCanvas.FIRE[2]);
            c.cs.setLineWidth(0.35f);
            float h = fireLevelY - lo[1];
            for (float x = vesselLeft - h; x < vesselRight; x += 5f) {
                c.cs.moveTo(x, lo[1]);
                c.cs.lineTo(x + h, fireLevelY);
            }
            c.cs.stroke();
        }
        c.cs.restoreGraphicsState();
        // the exposed wall itself, drawn heavy
        if (s.fireWettedLevelM() > 0) {
            c.cs.saveGraphicsState();
            c.cs.addRect(vesselLeft - 5, lo[1] - 5, vesselRight - vesselLeft + 10, fireLevelY - lo[1] + 5);
            c.cs.clip();
            c.cs.setStrokingColor(PdfCanvas.FIRE[0], PdfCanvas.FIRE[1], PdfCanvas.FIRE[2]);
            c.cs.setLineWidth(2.4f);
            path(c, outline);
            c.cs.stroke();
            c.cs.restoreGraphicsState();
        }
        // outline and tangent lines
        c.cs.setStrokingColor(PdfCanvas.INK[0], PdfCanvas.INK[1], PdfCanvas.INK[2]);
        c.cs.setLineWidth(0.9f);
        path(c, outline);
        c.cs.stroke();
        if (!sphere) {
            for (double t : new double[] {d1, d1 + s.tangentLengthM()}) {
                float[] a = horizontal ? m.at(t, e) : m.at(0, e + t);
                float[] b = horizontal ? m.at(t, e + height) : m.at(width, e + t);
                c.dashed(a[0], a[1], b[0], b[1], 0.3f, PdfCanvas.RULE, 2f, 2f);
            }
        }
        // liquid surface
        c.cs.saveGraphicsState();
        path(c, outline);
        c.cs.clip();
        c.line(vesselLeft, levelY, vesselRight, levelY, 0.8f, PdfCanvas.ACCENT);
        c.cs.restoreGraphicsState();

        // grade with hatch
        float gx0 = areaX;
        float gx1 = areaX + areaW;
        c.line(gx0, gradeY, gx1, gradeY, 0.9f, PdfCanvas.INK);
        c.cs.setStrokingColor(PdfCanvas.RULE[0], PdfCanvas.RULE[1], PdfCanvas.RULE[2]);
        c.cs.setLineWidth(0.3f);
        for (float x = gx0; x < gx1 - 4; x += 6f) {
            c.cs.moveTo(x + 4, gradeY);
            c.cs.lineTo(x, gradeY - 4);
        }
        c.cs.stroke();
        // fire height line across the drawing area
        float fireY = m.at(0, s.fireHeightM())[1];
        c.dashed(gx0, fireY, gx1, fireY, 0.7f, PdfCanvas.FIRE, 5f, 2.5f);

        // dimension: bottom elevation (left of the vessel)
        float dimX = vesselLeft - 10;
        List<SideLabel> left = new ArrayList<>();
        if (e > 0) {
            dimension(c, dimX, gradeY, dimX, lo[1]);
            float lowX = horizontal ? vesselLeft : (vesselLeft + vesselRight) / 2;
            c.dashed(dimX - 3, lo[1], lowX, lo[1], 0.3f, PdfCanvas.MUTED, 1f, 1.5f);
            left.add(new SideLabel(s.labels().elevation(), (gradeY + lo[1]) / 2));
        }
        left.add(new SideLabel(s.labels().level(), levelY));
        left.add(new SideLabel("grade", gradeY));
        // level marker: small triangle on the liquid surface at the left wall
        float tx = vesselLeft + Math.min(18f, (vesselRight - vesselLeft) / 6);
        c.cs.setNonStrokingColor(PdfCanvas.ACCENT[0], PdfCanvas.ACCENT[1], PdfCanvas.ACCENT[2]);
        c.cs.moveTo(tx - 3, levelY + 5);
        c.cs.lineTo(tx + 3, levelY + 5);
        c.cs.lineTo(tx, levelY);
        c.cs.closePath();
        c.cs.fill();
        // leader from the level label to the vessel wall
        c.dashed(areaX - 4, levelY, vesselLeft, levelY, 0.3f, PdfCanvas.ACCENT, 1f, 1.5f);

        // dimensions: horizontal and sphere: diameter on the right, tangent length above;
        // vertical: diameter above the top head, tangent length on the right
        List<SideLabel> right = new ArrayList<>();
        float labelX = areaX + areaW + 8;
        right.add(new SideLabel(s.labels().fireHeight(), fireY + 3));
        float ddx = vesselRight + 10;
        if (horizontal || sphere) {
            dimension(c, ddx, lo[1], ddx, hi[1]);
            float mid = (lo[1] + hi[1]) / 2;
            right.add(new SideLabel(s.labels().diameter(), mid - 2, ddx + 3, mid));
            if (horizontal) {
                float[] a = m.at(d1, e + height);
                float[] b = m.at(d1 + s.tangentLengthM(), e + height);
                float y = a[1] + 8;
                dimension(c, a[0], y, b[0], y);
                c.textCentre(s.labels().length(), (a[0] + b[0]) / 2, y + 3, c.regular, LABEL_SIZE, PdfCanvas.INK);
            }
        } else {
            float y = hi[1] + 8;
            dimension(c, vesselLeft, y, vesselRight, y);
            c.textCentre(s.labels().diameter(), (vesselLeft + vesselRight) / 2, y + 3, c.regular, LABEL_SIZE,
                    PdfCanvas.INK);
            float[] a = m.at(width, e + d1);
            float[] b = m.at(width, e + d1 + s.tangentLengthM());
            dimension(c, ddx, a[1], ddx, b[1]);
            float mid = (a[1] + b[1]) / 2;
            right.add(new SideLabel(s.labels().length(), mid - 2, ddx + 3, mid));
        }
        placeLeft(c, left, areaX - 6, by + 2, by + bh - 4);
        placeRight(c, right, labelX, by + 2, by + bh - 4, bx + bw);
        // legend top left
        float ly = by + bh - 6;
        float lx = bx + 2;
        c.fillRect(lx, ly - 6, 10, 6, PdfCanvas.LIQUID);
        c.text("liquid", lx + 14, ly - 6, c.regular, LABEL_SIZE, PdfCanvas.MUTED);
        c.line(lx, ly - 14, lx + 10, ly - 14, 2.4f, PdfCanvas.FIRE);
        c.text(s.labels().fireArea(), lx + 14, ly - 16.5f, c.regular, LABEL_SIZE, PdfCanvas.MUTED);
        c.dashed(lx, ly - 25, lx + 10, ly - 25, 0.7f, PdfCanvas.FIRE, 3f, 1.5f);
        c.text("fire height", lx + 14, ly - 27.5f, c.regular, LABEL_SIZE, PdfCanvas.MUTED);
    }

    private interface Mapper {
        float[] at(double x, double y);
    }

    private static double depth(List<double[]> profile) {
        return profile.isEmpty() ? 0 : profile.get(profile.size() - 1)[1];
    }

    /** Closed outline, counter-clockwise, in page coordinates. */
    private static List<float[]> outline(Figure.VesselSketch s, double d1, double r, double e, boolean horizontal,
            boolean sphere, Mapper m) {
        List<float[]> pts = new ArrayList<>();
        if (sphere) {
            for (int i = 0; i <= 96; i++) {
                double a = 2 * Math.PI * i / 96 - Math.PI / 2;
                pts.add(m.at(r + r * Math.cos(a), e + r + r * Math.sin(a)));
            }
            return pts;
        }
        double l = s.tangentLengthM();
        List<double[]> h1 = s.firstHead();
        List<double[]> h2 = s.secondHead();
        if (horizontal) {
            double cy = e + r;
            // bottom shell left to right, right head bottom to top, top shell right to left, left head top to bottom
            pts.add(m.at(d1, cy - r));
            pts.add(m.at(d1 + l, cy - r));
            for (double[] p : h2) {
                pts.add(m.at(d1 + l + p[1], cy - p[0]));
            }
            for (int i = h2.size() - 1; i >= 0; i--) {
                pts.add(m.at(d1 + l + h2.get(i)[1], cy + h2.get(i)[0]));
            }
            pts.add(m.at(d1, cy + r));
            for (double[] p : h1) {
                pts.add(m.at(d1 - p[1], cy + p[0]));
            }
            for (int i = h1.size() - 1; i >= 0; i--) {
                pts.add(m.at(d1 - h1.get(i)[1], cy - h1.get(i)[0]));
            }
        } else {
            // right shell bottom to top, top head right to left, left shell top to bottom, bottom head left to right
            double cx = r;
            pts.add(m.at(cx + r, e + d1));
            pts.add(m.at(cx + r, e + d1 + l));
            for (double[] p : h2) {
                pts.add(m.at(cx + p[0], e + d1 + l + p[1]));
            }
            for (int i = h2.size() - 1; i >= 0; i--) {
                pts.add(m.at(cx - h2.get(i)[0], e + d1 + l + h2.get(i)[1]));
            }
            pts.add(m.at(cx - r, e + d1));
            for (double[] p : h1) {
                pts.add(m.at(cx - p[0], e + d1 - p[1]));
            }
            for (int i = h1.size() - 1; i >= 0; i--) {
                pts.add(m.at(cx + h1.get(i)[0], e + d1 - h1.get(i)[1]));
            }
        }
        return pts;
    }

    private static void path(PdfCanvas c, List<float[]> pts) throws IOException {
        c.cs.moveTo(pts.get(0)[0], pts.get(0)[1]);
        for (int i = 1; i < pts.size(); i++) {
            c.cs.lineTo(pts.get(i)[0], pts.get(i)[1]);
        }
        c.cs.closePath();
    }

    /** A thin dimension line with short end ticks. */
    private static void dimension(PdfCanvas c, float x0, float y0, float x1, float y1) throws IOException {
        c.line(x0, y0, x1, y1, 0.4f, PdfCanvas.MUTED);
        boolean vertical = Math.abs(x1 - x0) < Math.abs(y1 - y0);
        for (float[] p : new float[][] {{x0, y0}, {x1, y1}}) {
            if (vertical) {
                c.line(p[0] - 3, p[1], p[0] + 3, p[1], 0.4f, PdfCanvas.MUTED);
            } else {
                c.line(p[0], p[1] - 3, p[0], p[1] + 3, 0.4f, PdfCanvas.MUTED);
            }
        }
    }

    private static List<SideLabel> spread(List<SideLabel> in, float lo, float hi) {
        List<SideLabel> sorted = new ArrayList<>(in);
        sorted.sort(Comparator.comparingDouble(SideLabel::y));
        float gap = 9f;
        List<SideLabel> out = new ArrayList<>();
        float last = lo - gap;
        for (SideLabel l : sorted) {
            float y = Math.max(l.y(), last + gap);
            out.add(new SideLabel(l.text(), y, l.anchorX(), l.anchorY()));
            last = y;
        }
        // if the top overflows, shift everything down
        if (!out.isEmpty() && last > hi) {
            float shift = last - hi;
            List<SideLabel> moved = new ArrayList<>();
            for (SideLabel l : out) {
                moved.add(new SideLabel(l.text(), Math.max(lo, l.y() - shift), l.anchorX(), l.anchorY()));
            }
            return moved;
        }
        return out;
    }

    private static void placeLeft(PdfCanvas c, List<SideLabel> labels, float xRight, float lo, float hi)
            throws IOException {
        for (SideLabel l : spread(labels, lo + 3, hi - 36)) {
            c.textRight(l.text(), xRight, l.y() - 2.5f, c.regular, LABEL_SIZE, PdfCanvas.INK);
        }
    }

    private static void placeRight(PdfCanvas c, List<SideLabel> labels, float x, float lo, float hi, float limit)
            throws IOException {
        float max = limit - x;
        for (SideLabel l : spread(labels, lo + 3, hi)) {
            List<String> lines = PdfCanvas.wrap(l.text(), c.regular, LABEL_SIZE, max);
            if (!Float.isNaN(l.anchorX())) {
                c.cs.setStrokingColor(PdfCanvas.MUTED[0], PdfCanvas.MUTED[1], PdfCanvas.MUTED[2]);
                c.cs.setLineWidth(0.3f);
                c.cs.setLineDashPattern(new float[] {1f, 1.5f}, 0);
                c.cs.moveTo(l.anchorX(), l.anchorY());
                c.cs.lineTo(x - 3, l.y());
                c.cs.stroke();
                c.cs.setLineDashPattern(new float[0], 0);
            }
            float y = l.y() - 2.5f;
            for (String line : lines) {
                c.text(line, x, y, c.regular, LABEL_SIZE, PdfCanvas.INK);
                y -= 8f;
            }
        }
    }
}
