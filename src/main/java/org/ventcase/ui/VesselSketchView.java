package org.ventcase.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;

import org.ventcase.vessel.Vessel;

/**
 * Live to-scale side view of the vessel: outline from the vessel's own head profiles, liquid up
 * to the level, grade and the fire height. Redrawn by {@link #draw}; computes no geometry of its
 * own beyond placing the profile points.
 */
final class VesselSketchView extends Pane {

    private static final Color STEEL = Color.web("#34495e");
    private static final Color LIQUID = Color.web("#6fa8c7");
    private static final Color FIRE = Color.web("#d9822b");
    private static final Color GRADE = Color.web("#6b5b45");

    private final Canvas canvas = new Canvas(420, 360);
    private Optional<WizardViewModel.Sketch> sketch = Optional.empty();

    VesselSketchView() {
        getChildren().add(canvas);
        setPrefSize(420, 360);
        setMinSize(300, 260);
        getStyleClass().add("sketch");
        widthProperty().addListener((o, a, b) -> redraw());
        heightProperty().addListener((o, a, b) -> redraw());
    }

    void draw(Optional<WizardViewModel.Sketch> s) {
        sketch = s;
        redraw();
    }

    /** Outline of the vessel in metres: x along the axis (or across), y above grade. */
    static List<double[]> outline(WizardViewModel.Sketch s) {
        Vessel v = s.vessel();
        double e = s.bottomElevation();
        double r = v.diameter() / 2;
        List<double[]> pts = new ArrayList<>();
        switch (v.shape()) {
            case SPHERE -> {
                for (int i = 0; i <= 72; i++) {
                    double a = 2 * Math.PI * i / 72;
                    pts.add(new double[] {r + r * Math.sin(a), e + r - r * Math.cos(a)});
                }
            }
            case HORIZONTAL_CYLINDER -> {
                double h1 = v.firstHeadDepth();
                double l = v.tangentLength();
                double c = e + r;
                List<double[]> left = v.headProfile(true, 12);
                List<double[]> right = v.headProfile(false, 12);
                // lower half: left head tip to right head tip along the bottom
                for (int i = left.size() - 1; i >= 0; i--) {
                    pts.add(new double[] {h1 - left.get(i)[1], c - left.get(i)[0]});
                }
                for (double[] p : right) {
                    pts.add(new double[] {h1 + l + p[1], c - p[0]});
                }
                for (int i = right.size() - 1; i >= 0; i--) {
                    pts.add(new double[] {h1 + l + right.get(i)[1], c + right.get(i)[0]});
                }
                for (double[] p : left) {
                    pts.add(new double[] {h1 - p[1], c + p[0]});
                }
            }
            default -> {
                double h1 = v.firstHeadDepth();
                double l = v.tangentLength();
                List<double[]> bottom = v.headProfile(true, 12);
                List<double[]> top = v.headProfile(false, 12);
                for (int i = bottom.size() - 1; i >= 0; i--) {
                    pts.add(new double[] {r - bottom.get(i)[0], e + h1 - bottom.get(i)[1]});
                }
                for (double[] p : bottom) {
                    pts.add(new double[] {r + p[0], e + h1 - p[1]});
                }
                for (int i = top.size() - 1; i >= 0; i--) {
                    pts.add(new double[] {r + top.get(i)[0], e + h1 + l + top.get(i)[1]});
                }
                for (double[] p : top) {
                    pts.add(new double[] {r - p[0], e + h1 + l + p[1]});
                }
            }
        }
        return pts;
    }

    private void redraw() {
        double w = Math.max(getWidth(), 300);
        double h = Math.max(getHeight(), 260);
        canvas.setWidth(w);
        canvas.setHeight(h);
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.setFill(Color.web("#fbfaf7"));
        g.fillRect(0, 0, w, h);
        g.setFont(Font.font(12));
        if (sketch.isEmpty()) {
            g.setFill(Color.GRAY);
            g.setTextAlign(TextAlignment.CENTER);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(Messages.get("sketch.unavailable"), w / 2, h / 2, w - 20);
            return;
        }
        WizardViewModel.Sketch s = sketch.get();
        List<double[]> pts = outline(s);
        double minX = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        double maxY = Math.max(s.fireHeight(), 0);
        for (double[] p : pts) {
            minX = Math.min(minX, p[0]);
            maxX = Math.max(maxX, p[0]);
            maxY = Math.max(maxY, p[1]);
        }
        // room for the dimension lines: the chain of elevations on the left, the length above,
        // the level label on the right, and the summary lines under grade
        double marginL = 104;
        double marginR = 88;
        double marginT = 56;
        double marginB = 30;
        double summaryH = 62;
        double spanX = maxX - minX;
        double scale = Math.min((w - marginL - marginR) / spanX, (h - marginT - marginB - summaryH) / maxY);
        double ox = marginL + ((w - marginL - marginR) - spanX * scale) / 2 - minX * scale;
        // the drawing sits under the title; what height is left goes to the summary, not to empty sky
        double groundY = marginT + maxY * scale;
        java.util.function.DoubleUnaryOperator sx = x -> ox + x * scale;
        java.util.function.DoubleUnaryOperator sy = y -> groundY - y * scale;

        // grade
        g.setStroke(GRADE);
        g.setLineWidth(2);
        g.strokeLine(4, groundY, w - 4, groundY);
        g.setLineWidth(1);
        for (double x = 8; x < w - 8; x += 12) {
            g.strokeLine(x, groundY, x - 6, groundY + 6);
        }
        g.setFill(GRADE);
        g.setTextAlign(TextAlignment.RIGHT);
        g.setTextBaseline(VPos.TOP);
        g.fillText(Messages.get("sketch.grade"), w - 6, groundY + 8);

        // liquid, clipped to the outline
        g.save();
        g.beginPath();
        for (int i = 0; i < pts.size(); i++) {
            double[] p = pts.get(i);
            if (i == 0) {
                g.moveTo(sx.applyAsDouble(p[0]), sy.applyAsDouble(p[1]));
            } else {
                g.lineTo(sx.applyAsDouble(p[0]), sy.applyAsDouble(p[1]));
            }
        }
        g.closePath();
        g.clip();
        if (s.levelM() > 0) {
            double top = sy.applyAsDouble(s.bottomElevation() + s.levelM());
            double bottom = sy.applyAsDouble(s.bottomElevation());
            g.setFill(LIQUID);
            g.fillRect(sx.applyAsDouble(minX) - 2, top, spanX * scale + 4, bottom - top + 2);
        }
        g.restore();

        // outline
        g.setStroke(STEEL);
        g.setLineWidth(2);
        g.beginPath();
        for (int i = 0; i < pts.size(); i++) {
            double[] p = pts.get(i);
            if (i == 0) {
                g.moveTo(sx.applyAsDouble(p[0]), sy.applyAsDouble(p[1]));
            } else {
                g.lineTo(sx.applyAsDouble(p[0]), sy.applyAsDouble(p[1]));
            }
        }
        g.closePath();
        g.stroke();

        // supports down to grade (schematic)
        g.setLineWidth(1);
        g.setStroke(STEEL.deriveColor(0, 1, 1, 0.5));
        double yb = sy.applyAsDouble(s.bottomElevation());
        double cx = sx.applyAsDouble((minX + maxX) / 2);
        double q = spanX * scale / 4;
        g.strokeLine(cx - q, yb, cx - q, groundY);
        g.strokeLine(cx + q, yb, cx + q, groundY);

        // fire height
        double yf = sy.applyAsDouble(s.fireHeight());
        g.setStroke(FIRE);
        g.setLineWidth(1.5);
        g.setLineDashes(8, 5);
        g.strokeLine(4, yf, w - 4, yf);
        g.setLineDashes();
        g.setFill(FIRE);
        g.setTextAlign(TextAlignment.RIGHT);
        g.setTextBaseline(VPos.BOTTOM);
        g.fillText(Messages.get("sketch.fire") + " " + fmt(s.fireHeight()) + " m", w - 6, yf - 2);

        // level
        if (s.levelM() > 0) {
            double yl = sy.applyAsDouble(s.bottomElevation() + s.levelM());
            g.setStroke(LIQUID.darker());
            g.setLineWidth(1);
            g.strokeLine(sx.applyAsDouble(maxX), yl, w - marginR + 10, yl);
            g.setFill(LIQUID.darker().darker());
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(Messages.get("sketch.level") + "\n" + fmt(s.levelM()) + " m", w - marginR + 12, yl);
        }
        dimensions(g, s, sx, sy, minX, maxX, groundY);
        summary(g, s, groundY + 26, w);
        if (s.vessel().shape() == Vessel.Shape.HORIZONTAL_CYLINDER) {
            endView(g, s, groundY + 26 + 44, w, h);
        }
        g.setFill(STEEL);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.fillText(Messages.get("sketch.title"), 6, 6);
    }

    private static final Color DIMENSION = Color.web("#5d6d7e");

    /**
     * Dimension lines: on the left the chain grade - bottom - top (bottom elevation, then the
     * inside diameter or, for a vertical vessel, the height to the top of the head), above the
     * vessel the tangent-to-tangent length (horizontal) or the inside diameter (vertical, sphere).
     */
    private static void dimensions(GraphicsContext g, WizardViewModel.Sketch s, java.util.function.DoubleUnaryOperator sx,
                                   java.util.function.DoubleUnaryOperator sy, double minX, double maxX, double groundY) {
        Vessel v = s.vessel();
        double e = s.bottomElevation();
        double top = e + v.totalHeight();
        double x = sx.applyAsDouble(minX) - 14;
        g.setStroke(DIMENSION);
        g.setFill(DIMENSION);
        g.setLineWidth(1);
        g.setFont(Font.font(11));
        if (e > 0) {
            vertical(g, x, groundY, sy.applyAsDouble(e), Messages.get("sketch.bottom") + " " + fmt(e) + " m");
        }
        String upper = v.shape() == Vessel.Shape.VERTICAL_CYLINDER ? Messages.get("sketch.height")
                : Messages.get("sketch.diameter");
        vertical(g, x, sy.applyAsDouble(e), sy.applyAsDouble(top), upper + " " + fmt(v.totalHeight()) + " m");
        double y = sy.applyAsDouble(top) - 14;
        if (v.shape() == Vessel.Shape.HORIZONTAL_CYLINDER) {
            double h1 = v.firstHeadDepth();
            horizontal(g, sx.applyAsDouble(h1), sx.applyAsDouble(h1 + v.tangentLength()), y,
                    Messages.get("sketch.length") + " " + fmt(v.tangentLength()) + " m");
        } else {
            horizontal(g, sx.applyAsDouble(minX), sx.applyAsDouble(maxX), y,
                    Messages.get("sketch.diameter") + " " + fmt(v.diameter()) + " m");
        }
    }

    private static void vertical(GraphicsContext g, double x, double y0, double y1, String label) {
        g.strokeLine(x, y0, x, y1);
        g.strokeLine(x - 4, y0, x + 4, y0);
        g.strokeLine(x - 4, y1, x + 4, y1);
        g.setTextAlign(TextAlignment.RIGHT);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(label, x - 6, (y0 + y1) / 2);
    }

    private static void horizontal(GraphicsContext g, double x0, double x1, double y, String label) {
        g.strokeLine(x0, y, x1, y);
        g.strokeLine(x0, y - 4, x0, y + 4);
        g.strokeLine(x1, y - 4, x1, y + 4);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.BOTTOM);
        g.fillText(label, (x0 + x1) / 2, y - 3);
    }

    /**
     * For a horizontal vessel, whose side view is long and thin: the cross-section, enlarged, with
     * the liquid up to the level, where the fill can be read.
     */
    private static void endView(GraphicsContext g, WizardViewModel.Sketch s, double y, double w, double h) {
        double room = Math.min(w - 100, h - y - 50);
        if (room < 60) {
            return;
        }
        double d = s.vessel().diameter();
        double r = room / 2;
        double cx = w / 2;
        double cy = y + 40 + r;
        double level = Math.min(Math.max(s.levelM(), 0), d);
        g.setFill(STEEL);
        g.setFont(Font.font(12));
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.fillText(Messages.get("sketch.endView"), 8, y);
        if (level > 0) {
            // the circular segment below the level: the arc between the two points where the level
            // line meets the circle, closed by the level line
            double yl = cy + r - level / d * room;
            double half = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, (yl - cy) / r))));
            g.setFill(LIQUID);
            g.fillArc(cx - r, cy - r, room, room, 270 - half, 2 * half, javafx.scene.shape.ArcType.CHORD);
            g.setStroke(LIQUID.darker());
            g.setLineWidth(1);
            g.strokeLine(cx + r, yl, cx + r + 14, yl);
            g.setFill(LIQUID.darker().darker());
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(fmt(level) + " m", cx + r + 16, yl);
        }
        g.setStroke(STEEL);
        g.setLineWidth(2);
        g.strokeOval(cx - r, cy - r, room, room);
        g.setStroke(DIMENSION);
        g.setFill(DIMENSION);
        g.setLineWidth(1);
        g.setFont(Font.font(11));
        horizontal(g, cx - r, cx + r, cy - r - 8, Messages.get("sketch.diameter") + " " + fmt(d) + " m");
    }

    /** Under grade: the volumes and the fill, from the same geometry the calculation uses. */
    private static void summary(GraphicsContext g, WizardViewModel.Sketch s, double y, double w) {
        Vessel v = s.vessel();
        double total = v.totalVolume();
        double level = Math.min(Math.max(s.levelM(), 0), v.totalHeight());
        double liquid = v.liquidVolume(level);
        g.setFill(STEEL);
        g.setFont(Font.font(12));
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.fillText(String.format(java.util.Locale.ROOT, Messages.get("sketch.volumes"), total, liquid,
                total > 0 ? 100 * liquid / total : 0.0), 8, y, w - 16);
        g.fillText(String.format(java.util.Locale.ROOT, Messages.get("sketch.fireLine"), s.bottomElevation(),
                s.fireHeight()), 8, y + 18, w - 16);
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.2f", v);
    }
}
