package org.ventcase.vessel;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;

/**
 * Inside geometry of a pressure vessel: a horizontal or vertical cylinder with two heads, or a
 * sphere. Immutable and thread-safe. All lengths in m, areas in m2, volumes in m3.
 *
 * <p><b>Level.</b> A liquid level h is measured vertically from the lowest inside point of the
 * vessel (the bottom of the shell for a horizontal vessel, the apex of the bottom head for a
 * vertical one, the bottom of a sphere) and lies in [0, {@link #totalHeight()}].
 *
 * <p><b>Equations.</b>
 * <ul>
 *   <li>Horizontal shell, inside radius R, tangent length L: V = L A_seg(R, h),
 *       wetted S = 2 R L acos((R - h)/R) ({@link CircularSegment}; standard circular-segment
 *       result). Heads: see {@link HeadGeometry} (closed forms for hemispherical heads and
 *       ellipsoidal volume, adaptive Gauss-Legendre quadrature otherwise).</li>
 *   <li>Vertical vessel: bottom head from its apex, then the shell (V = pi R^2 x,
 *       S = 2 pi R x), then the top head from its tangent line; all closed forms of the solid
 *       and surface of revolution ({@link ProfilePiece}). A flat bottom is wetted as soon as
 *       h &gt; 0; a flat top only when the vessel is liquid-full (h = total height).</li>
 *   <li>Sphere, inside radius R: V = pi h^2 (3R - h) / 3 (spherical cap), S = 2 pi R h
 *       (Archimedes' zone). Source: standard mensuration formulas (e.g. Perry's Chemical
 *       Engineers' Handbook, mensuration section; from memory).</li>
 *   <li>Inverse, level from volume: Brent's method (Commons Math {@link BrentSolver}) on the
 *       bracket [0, total height], on which V(h) is continuous and increasing; absolute accuracy
 *       1e-14 x total height, relative 1e-14, which meets 1e-9 relative in h for
 *       h &gt; 1e-5 x total height.</li>
 * </ul>
 *
 * <p>Field paths used in error messages: {@code vessel.diameter}, {@code vessel.tangentLength},
 * {@code vessel.wallThickness}, {@code vessel.leftHead.*} and {@code vessel.rightHead.*}
 * (horizontal), {@code vessel.bottomHead.*} and {@code vessel.topHead.*} (vertical),
 * {@code level.height}, {@code level.volume}.
 */
public final class Vessel {

    /**
     * Plausible sizes of a process or storage vessel, m (common practice, no source): a dimension
     * outside them is a typing error, refused with the range before anything is derived from it.
     */
    public static final double[] PLAUSIBLE_DIAMETER_M = {0.05, 40.0};
    /** Plausible tangent-to-tangent length, m. */
    public static final double[] PLAUSIBLE_LENGTH_M = {0.05, 200.0};
    /** Plausible wall thickness, m. */
    public static final double[] PLAUSIBLE_WALL_M = {0.0005, 0.5};
    /** Plausible bottom elevation above grade, m (negative: below grade). */
    public static final double[] PLAUSIBLE_ELEVATION_M = {-50.0, 200.0};

    /** The three supported arrangements. */
    public enum Shape {
        HORIZONTAL_CYLINDER, VERTICAL_CYLINDER, SPHERE
    }

    private final Shape shape;
    private final double diameter;
    private final double tangentLength;
    private final Optional<Head> firstHead;
    private final Optional<Head> secondHead;
    private final OptionalDouble wallThickness;
    // derived
    private final double radius;
    private final HeadGeometry first;
    private final HeadGeometry second;
    private final double totalHeight;
    private final double totalVolume;
    private final double totalArea;

    private Vessel(Shape shape, double diameter, double tangentLength, Head a, Head b,
            OptionalDouble wallThickness) {
        InvalidInputException.requirePositive("vessel.diameter", diameter, "m");
        this.shape = shape;
        this.diameter = diameter;
        this.radius = diameter / 2.0;
        this.wallThickness = wallThickness;
        if (wallThickness.isPresent()) {
            InvalidInputException.requirePositive("vessel.wallThickness", wallThickness.getAsDouble(), "m");
        }
        if (shape == Shape.SPHERE) {
            this.tangentLength = 0.0;
            this.firstHead = Optional.empty();
            this.secondHead = Optional.empty();
            this.first = null;
            this.second = null;
            this.totalHeight = diameter;
            this.totalVolume = Math.PI * diameter * diameter * diameter / 6.0;
            this.totalArea = Math.PI * diameter * diameter;
            return;
        }
        InvalidInputException.requirePositive("vessel.tangentLength", tangentLength, "m");
        this.tangentLength = tangentLength;
        this.firstHead = Optional.of(Objects.requireNonNull(a, "first head"));
        this.secondHead = Optional.of(Objects.requireNonNull(b, "second head"));
        boolean horizontal = shape == Shape.HORIZONTAL_CYLINDER;
        this.first = HeadGeometry.of(a, diameter, horizontal ? "vessel.leftHead" : "vessel.bottomHead");
        this.second = HeadGeometry.of(b, diameter, horizontal ? "vessel.rightHead" : "vessel.topHead");
        this.totalHeight = horizontal ? diameter : first.depth() + tangentLength + second.depth();
        this.totalVolume = first.volume() + Math.PI * radius * radius * tangentLength + second.volume();
        this.totalArea = first.area() + Math.PI * diameter * tangentLength + second.area();
    }

    /**
     * A horizontal cylinder with a head at each end.
     *
     * @param diameter      inside diameter D, m (&gt; 0)
     * @param tangentLength shell length between the tangent lines, m (&gt; 0)
     * @param left          head at one end (field {@code vessel.leftHead})
     * @param right         head at the other end (field {@code vessel.rightHead})
     */
    public static Vessel horizontal(double diameter, double tangentLength, Head left, Head right) {
        return new Vessel(Shape.HORIZONTAL_CYLINDER, diameter, tangentLength, left, right, OptionalDouble.empty());
    }

    /**
     * A vertical cylinder with a bottom and a top head.
     *
     * @param diameter      inside diameter D, m (&gt; 0)
     * @param tangentLength shell height between the tangent lines, m (&gt; 0)
     * @param bottom        bottom head (field {@code vessel.bottomHead})
     * @param top           top head (field {@code vessel.topHead})
     */
    public static Vessel vertical(double diameter, double tangentLength, Head bottom, Head top) {
        return new Vessel(Shape.VERTICAL_CYLINDER, diameter, tangentLength, bottom, top, OptionalDouble.empty());
    }

    /** A sphere of inside diameter D, m (&gt; 0). */
    public static Vessel sphere(double diameter) {
        return new Vessel(Shape.SPHERE, diameter, 0.0, null, null, OptionalDouble.empty());
    }

    /** The same vessel with a wall thickness (m, &gt; 0), used only for {@link #outsideArea()}. */
    public Vessel withWallThickness(double thickness) {
        return new Vessel(shape, diameter, tangentLength, firstHead.orElse(null), secondHead.orElse(null),
                OptionalDouble.of(thickness));
    }

    public Shape shape() {
        return shape;
    }

    /** Inside diameter, m. */
    public double diameter() {
        return diameter;
    }

    /** Tangent-to-tangent length, m (0 for a sphere). */
    public double tangentLength() {
        return tangentLength;
    }

    /** Left head (horizontal) or bottom head (vertical); empty for a sphere. */
    public Optional<Head> firstHead() {
        return firstHead;
    }

    /** Right head (horizontal) or top head (vertical); empty for a sphere. */
    public Optional<Head> secondHead() {
        return secondHead;
    }

    public OptionalDouble wallThickness() {
        return wallThickness;
    }

    /** Vertical inside extent from the lowest to the highest inside point, m. */
    public double totalHeight() {
        return totalHeight;
    }

    /** Inside volume, m3. */
    public double totalVolume() {
        return totalVolume;
    }

    /** Inside surface area, heads included (flat heads as discs), m2. */
    public double totalInsideArea() {
        return totalArea;
    }

    /** Inside depth of the first (left/bottom) head, m; 0 for a sphere. */
    public double firstHeadDepth() {
        return first == null ? 0.0 : first.depth();
    }

    /** Inside depth of the second (right/top) head, m; 0 for a sphere. */
    public double secondHeadDepth() {
        return second == null ? 0.0 : second.depth();
    }

    /**
     * The inside profile of the first (left/bottom) or second (right/top) head, for drawings:
     * points (r, z), r the distance from the vessel axis and z the axial distance outward from
     * the tangent line, both in m, running from (D/2, 0) to (0, head depth). Each curved piece of
     * the profile (ellipse quadrant; knuckle and crown arcs; hemisphere; cone line) is sampled at
     * {@code perPiece} equal parameter steps. Empty for a sphere (see {@link #diameter()}).
     *
     * @param first    true for the left/bottom head, false for the right/top head
     * @param perPiece samples per profile piece, 1..1000
     */
    public java.util.List<double[]> headProfile(boolean first, int perPiece) {
        InvalidInputException.requireInRange("perPiece", perPiece, 1, 1000, "");
        if (shape == Shape.SPHERE) {
            return java.util.List.of();
        }
        double[][] pts = (first ? this.first : this.second).profile(perPiece);
        return java.util.List.of(pts);
    }

    /**
     * Outside surface area, m2, when a wall thickness t is given: the area of the same vessel
     * with outside dimensions D + 2t and each head radius or depth grown by t (exact for shells,
     * spheres, hemispheres and torispherical arcs, whose offset surfaces are again arcs; an
     * approximation for ellipsoidal heads, whose offset is not exactly an ellipsoid; the cone
     * keeps its half-angle; each flat head adds t to the shell length). Empty without a wall
     * thickness.
     */
    public OptionalDouble outsideArea() {
        if (wallThickness.isEmpty()) {
            return OptionalDouble.empty();
        }
        double t = wallThickness.getAsDouble();
        if (shape == Shape.SPHERE) {
            return OptionalDouble.of(Vessel.sphere(diameter + 2 * t).totalInsideArea());
        }
        Head a = offset(firstHead.orElseThrow(), t);
        Head b = offset(secondHead.orElseThrow(), t);
        double extra = (a instanceof Head.Flat ? t : 0.0) + (b instanceof Head.Flat ? t : 0.0);
        Vessel outer = new Vessel(shape, diameter + 2 * t, tangentLength + extra, a, b, OptionalDouble.empty());
        return OptionalDouble.of(outer.totalInsideArea());
    }

    private static Head offset(Head h, double t) {
        if (h instanceof Head.Ellipsoidal e) {
            return new Head.Ellipsoidal(e.depth() + t);
        }
        if (h instanceof Head.Torispherical tor) {
            return new Head.Torispherical(tor.crownRadius() + t, tor.knuckleRadius() + t);
        }
        return h;
    }

    // ------------------------------------------------------------------------------ by level

    /** Liquid volume at level h (m above the lowest inside point), m3. */
    public double liquidVolume(double h) {
        checkLevel(h);
        if (h == totalHeight) {
            return totalVolume;
        }
        switch (shape) {
            case SPHERE:
                return Math.PI * h * h * (3 * radius - h) / 3.0;
            case HORIZONTAL_CYLINDER:
                return tangentLength * CircularSegment.area(radius, h)
                        + first.horizontalVolume(h) + second.horizontalVolume(h);
            default:
                double ab = first.depth();
                double v = first.volumeFromApex(Math.min(h, ab));
                if (h > ab) {
                    v += Math.PI * radius * radius * Math.min(h - ab, tangentLength);
                }
                if (h > ab + tangentLength) {
                    v += second.volumeFromTangent(Math.min(h - ab - tangentLength, second.depth()));
                }
                return v;
        }
    }

    /** Vapour (gas) space volume at level h: total volume minus liquid volume, m3. */
    public double vapourVolume(double h) {
        return totalVolume - liquidVolume(h);
    }

    /**
     * Inside area in contact with liquid at level h, m2. Zero at h = 0 (no liquid); a flat
     * bottom head of a vertical vessel counts in full for any h &gt; 0; a flat top head counts
     * only at h = total height.
     */
    public double wettedArea(double h) {
        checkLevel(h);
        if (h == 0.0) {
            return 0.0;
        }
        if (h == totalHeight) {
            return totalArea;
        }
        switch (shape) {
            case SPHERE:
                return 2.0 * Math.PI * radius * h;
            case HORIZONTAL_CYLINDER:
                return tangentLength * 2.0 * radius * CircularSegment.halfAngle(radius, h)
                        + first.horizontalArea(h) + second.horizontalArea(h);
            default:
                double ab = first.depth();
                double s = bottomHeadWettedArea(h);
                if (h > ab) {
                    s += 2.0 * Math.PI * radius * Math.min(h - ab, tangentLength);
                }
                if (h > ab + tangentLength && !second.isFlat()) {
                    s += second.areaFromTangent(Math.min(h - ab - tangentLength, second.depth()));
                }
                return s;
        }
    }

    /** Inside area not wetted at level h (total minus wetted), m2; the gas-exposed wall. */
    public double unwettedArea(double h) {
        return totalArea - wettedArea(h);
    }

    private double bottomHeadWettedArea(double h) {
        if (h <= 0) {
            return 0.0;
        }
        return first.isFlat() ? first.area() : first.areaFromApex(Math.min(h, first.depth()));
    }

    /**
     * The level (m above the lowest inside point) at which the liquid volume is {@code volume}
     * (m3, 0..total volume); Brent's method, see the class comment.
     */
    public double levelAtVolume(double volume) {
        InvalidInputException.requireInRange("level.volume", volume, 0.0, totalVolume, "m3");
        if (volume == 0.0) {
            return 0.0;
        }
        if (volume == totalVolume) {
            return totalHeight;
        }
        BrentSolver solver = new BrentSolver(1e-14, 1e-14 * totalHeight, 1e-300);
        try {
            return solver.solve(500, x -> liquidVolume(x) - volume, 0.0, totalHeight);
        } catch (MathIllegalStateException e) {
            throw new ConvergenceException("Brent (level from volume)", solver.getEvaluations(), Double.NaN,
                    "volume " + volume + " m3 of " + totalVolume + " m3: " + e.getMessage());
        }
    }

    /** Level in metres for any {@link Level} basis (height, % of height, % of volume). */
    public double heightOf(Level level) {
        return level.heightIn(this);
    }

    // ------------------------------------------------------------------------------ fire

    /**
     * Fire-exposed wetted area at liquid level h under API Std 521 / ISO 23251 practice: the
     * wetted inside area below the lower of the liquid level and the top of the fire zone
     * (fire height above grade minus the elevation of the vessel's lowest inside point).
     *
     * <ul>
     *   <li>Cylinders: h_eff = min(h, H_fire - z_bottom).</li>
     *   <li>Spheres (REFERENCES.md section 1, [M]): "up to the maximum horizontal diameter or the
     *       fire height, whichever is greater", read as h_eff = min(h, max(R, H_fire - z_bottom)):
     *       the lower hemisphere counts even where it rises above the fire height, but never
     *       more than the liquid actually wets.</li>
     *   <li>Bottom at or above the fire height (z_bottom &gt;= H_fire), any shape: area 0; the
     *       rule text says so and that the gas-filled (unwetted) vessel case should be
     *       considered. This takes precedence over the sphere rule (a judgement: no flame
     *       reaches the vessel).</li>
     *   <li>Optionally, for a vertical vessel only, the bottom head inside a skirt is excluded
     *       (API 521: heads inside skirts with limited ventilation normally excluded).</li>
     * </ul>
     */
    public FireExposedArea fireExposedArea(double h, FireExposure fire) {
        checkLevel(h);
        Objects.requireNonNull(fire, "fire");
        if (fire.excludeSkirtedBottomHead() && shape != Shape.VERTICAL_CYLINDER) {
            throw InvalidInputException.invalid("fire.excludeSkirtedBottomHead", true,
                    "expected false: a skirted bottom head can be excluded only for a vertical vessel; this vessel is "
                            + shape.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        }
        double zone = fire.fireHeight() - fire.bottomElevation();
        double fireHeight = fire.fireHeight();
        double bottom = fire.bottomElevation();
        // the rule's words are written when read, in the units asked for (FireExposedArea.Rule)
        java.util.function.Function<Words, String> base = w -> "API Std 521 / ISO 23251 fire case: wetted area "
                + "within " + w.m(fireHeight) + " above grade (the base of the pool fire); vessel bottom (lowest "
                + "inside point) " + w.m(bottom) + " above grade; liquid level " + w.m(h) + " above the vessel "
                + "bottom. ";
        if (!(zone > 0)) {
            return new FireExposedArea(0.0, 0.0, new FireExposedArea.Rule(w -> base.apply(w) + "The vessel bottom is "
                    + "at or above the fire height, so no wetted area lies within the fire zone: wetted area 0. "
                    + "Consider the gas-filled (unwetted) vessel case."));
        }
        double limit = shape == Shape.SPHERE ? Math.max(radius, zone) : zone;
        boolean sphere = shape == Shape.SPHERE;
        double r = radius;
        double hEff = Math.min(h, Math.min(limit, totalHeight));
        double area = wettedArea(hEff);
        double excluded = fire.excludeSkirtedBottomHead() ? bottomHeadWettedArea(hEff) : Double.NaN;
        if (fire.excludeSkirtedBottomHead()) {
            area = Math.max(0.0, area - excluded);
        }
        boolean skirt = fire.excludeSkirtedBottomHead();
        return new FireExposedArea(area, hEff, new FireExposedArea.Rule(w -> base.apply(w) + (sphere
                ? "Sphere: wetted area up to the maximum horizontal diameter (" + w.m(r) + " above the bottom) or "
                        + "the fire height (" + w.m(zone) + " above the bottom), whichever is greater, limited by the "
                        + "liquid level"
                : "Wetted area below the lower of the liquid level and the fire height (" + w.m(zone)
                        + " above the vessel bottom)")
                + "; effective level " + w.m(hEff) + " (" + (hEff == h ? "liquid level governs" : "fire zone governs")
                + ")." + (skirt ? " Bottom head inside the skirt excluded (" + w.m2(excluded) + ")." : "")));
    }

    private void checkLevel(double h) {
        InvalidInputException.requireInRange("level.height", h, 0.0, totalHeight, "m");
    }

    /** One line for a calculation sheet. */
    public String describe() {
        return describe(Words.SI);
    }

    /** {@link #describe()} with lengths written as {@code w} writes them. */
    public String describe(Words w) {
        switch (shape) {
            case SPHERE:
                return "sphere, inside diameter " + w.m(diameter);
            case HORIZONTAL_CYLINDER:
                return "horizontal cylinder, inside diameter " + w.m(diameter) + ", tangent length "
                        + w.m(tangentLength) + ", heads: " + firstHead.orElseThrow().describe(w) + " / "
                        + secondHead.orElseThrow().describe(w);
            default:
                return "vertical cylinder, inside diameter " + w.m(diameter) + ", tangent length "
                        + w.m(tangentLength) + ", bottom head " + firstHead.orElseThrow().describe(w)
                        + ", top head " + secondHead.orElseThrow().describe(w);
        }
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Vessel v)) {
            return false;
        }
        return shape == v.shape && Double.compare(diameter, v.diameter) == 0
                && Double.compare(tangentLength, v.tangentLength) == 0 && firstHead.equals(v.firstHead)
                && secondHead.equals(v.secondHead) && wallThickness.equals(v.wallThickness);
    }

    @Override
    public int hashCode() {
        return Objects.hash(shape, diameter, tangentLength, firstHead, secondHead, wallThickness);
    }

    @Override
    public String toString() {
        return describe();
    }
}
