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
        double marginL = 16;
        double marginR = 96;
        double marginT = 28;
        double marginB = 34;
        double spanX = maxX - minX;
        double scale = Math.min((w - marginL - marginR) / spanX, (h - marginT - marginB) / maxY);
        double ox = marginL + ((w - marginL - marginR) - spanX * scale) / 2 - minX * scale;
        double groundY = h - marginB;
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
        g.setFill(STEEL);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.fillText(Messages.get("sketch.title"), 6, 6);
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.2f", v);
    }
}
