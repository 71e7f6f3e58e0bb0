package org.ventcase.report;

import java.util.List;
import java.util.Objects;

import org.ventcase.vessel.Vessel;

/** A figure on the sheet: a vessel sketch, a line chart or a bar chart. Numbers are for drawing; labels are formatted text. */
public sealed interface Figure permits Figure.VesselSketch, Figure.LineChart, Figure.BarChart {

    /** Caption printed under the figure. */
    String caption();

    /**
     * To-scale elevation of a vessel with grade, liquid level and the fire zone. Lengths in m
     * (used only to place lines); every printed dimension is in {@code labels}.
     *
     * @param caption             caption
     * @param shape               horizontal, vertical or sphere
     * @param diameterM           inside diameter
     * @param tangentLengthM      tangent-to-tangent length (0 for a sphere)
     * @param firstHead           left/bottom head profile (r, z) from the tangent line to the apex; empty for a sphere
     * @param secondHead          right/top head profile
     * @param bottomElevationM    lowest inside point above grade
     * @param liquidLevelM        liquid level above the lowest inside point
     * @param fireHeightM         fire height above grade
     * @param fireWettedLevelM    level up to which the wetted wall counts as fire-exposed, above the lowest inside point
     * @param labels              dimension texts: diameter, length, elevation, level, fireHeight, fireArea
     */
    record VesselSketch(String caption, Vessel.Shape shape, double diameterM, double tangentLengthM,
                        List<double[]> firstHead, List<double[]> secondHead, double bottomElevationM,
                        double liquidLevelM, double fireHeightM, double fireWettedLevelM, SketchLabels labels)
            implements Figure {
        public VesselSketch {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(shape, "shape");
            Objects.requireNonNull(labels, "labels");
            firstHead = List.copyOf(firstHead);
            secondHead = List.copyOf(secondHead);
            for (double v : new double[] {diameterM, tangentLengthM, bottomElevationM, liquidLevelM, fireHeightM,
                    fireWettedLevelM}) {
                if (!Double.isFinite(v) || v < 0) {
                    throw new IllegalArgumentException("sketch dimensions must be finite and >= 0");
                }
            }
        }
    }

    /**
     * The printed dimensions of a vessel sketch.
     *
     * @param diameter   e.g. "ID 3.200 m"
     * @param length     e.g. "T/T 16.000 m" (empty for a sphere)
     * @param elevation  bottom elevation above grade
     * @param level      liquid level
     * @param fireHeight fire height above grade
     * @param fireArea   fire-exposed wetted area
     */
    record SketchLabels(String diameter, String length, String elevation, String level, String fireHeight,
                        String fireArea) {
        public SketchLabels {
            Objects.requireNonNull(diameter);
            Objects.requireNonNull(length);
            Objects.requireNonNull(elevation);
            Objects.requireNonNull(level);
            Objects.requireNonNull(fireHeight);
            Objects.requireNonNull(fireArea);
        }
    }

    /**
     * A line chart: one or more series of (x, y) points and labelled markers, axes in display units.
     *
     * @param caption caption
     * @param xLabel  x-axis title with unit
     * @param yLabel  y-axis title with unit
     * @param series  the curves, drawn in order
     * @param markers labelled points
     */
    record LineChart(String caption, String xLabel, String yLabel, List<Series> series, List<Marker> markers)
            implements Figure {
        public LineChart {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(xLabel, "xLabel");
            Objects.requireNonNull(yLabel, "yLabel");
            series = List.copyOf(series);
            markers = List.copyOf(markers);
            if (series.isEmpty()) {
                throw new IllegalArgumentException("a chart needs at least one series");
            }
        }
    }

    /**
     * One curve.
     *
     * @param label  legend text
     * @param x      x values
     * @param y      y values, same length
     * @param dashed drawn dashed (e.g. a second branch)
     */
    record Series(String label, double[] x, double[] y, boolean dashed) {
        public Series {
            Objects.requireNonNull(label, "label");
            x = x.clone();
            y = y.clone();
            if (x.length != y.length || x.length < 2) {
                throw new IllegalArgumentException(label + ": x and y need the same length, at least 2");
            }
            for (int i = 0; i < x.length; i++) {
                if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                    throw new IllegalArgumentException(label + ": point " + i + " is not finite");
                }
            }
        }

        @Override
        public double[] x() {
            return x.clone();
        }

        @Override
        public double[] y() {
            return y.clone();
        }
    }

    /**
     * A labelled point.
     *
     * @param label  text beside the point
     * @param x      x in axis units
     * @param y      y in axis units
     * @param filled filled (e.g. governing) or open (e.g. case point) symbol
     */
    record Marker(String label, double x, double y, boolean filled, Shape shape) {
        public Marker {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(shape, "shape");
            if (!Double.isFinite(x) || !Double.isFinite(y)) {
                throw new IllegalArgumentException(label + ": marker not finite");
            }
        }

        /** A round marker. */
        public Marker(String label, double x, double y, boolean filled) {
            this(label, x, y, filled, Shape.CIRCLE);
        }

        /** The symbol drawn, so that different kinds of point are told apart without colour. */
        public enum Shape {
            CIRCLE, SQUARE, DIAMOND
        }
    }

    /**
     * A horizontal bar chart: one bar per category, each bar made of stacked segments (e.g. liquid
     * and vapour), values &gt;= 0 in display units.
     *
     * @param caption       caption
     * @param valueLabel    value-axis title with unit
     * @param segmentLabels legend text per segment, in stacking order
     * @param bars          the bars, drawn top to bottom
     */
    record BarChart(String caption, String valueLabel, List<String> segmentLabels, List<Bar> bars) implements Figure {
        public BarChart {
            Objects.requireNonNull(caption, "caption");
            Objects.requireNonNull(valueLabel, "valueLabel");
            segmentLabels = List.copyOf(segmentLabels);
            bars = List.copyOf(bars);
            if (bars.isEmpty() || segmentLabels.isEmpty()) {
                throw new IllegalArgumentException("a bar chart needs at least one bar and one segment");
            }
            for (Bar b : bars) {
                if (b.values().length != segmentLabels.size()) {
                    throw new IllegalArgumentException(b.label() + ": one value per segment is needed");
                }
            }
        }
    }

    /**
     * One bar.
     *
     * @param label  category text at the left of the bar
     * @param values one value per segment, each finite and &gt;= 0
     * @param note   text printed at the end of the bar (e.g. the total), may be empty
     */
    record Bar(String label, double[] values, String note) {
        public Bar {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(note, "note");
            values = values.clone();
            for (double v : values) {
                if (!Double.isFinite(v) || v < 0) {
                    throw new IllegalArgumentException(label + ": bar values must be finite and >= 0");
                }
            }
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        /** Sum of the segments. */
        public double total() {
            double t = 0;
            for (double v : values) {
                t += v;
            }
            return t;
        }
    }
}
