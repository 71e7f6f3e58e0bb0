package org.ventcase.vessel;

import org.ventcase.common.InvalidInputException;

/**
 * The shape of one vessel head (end closure), as specified by the user. Dimensions are inside
 * dimensions in metres; checks that need the vessel diameter (for example an ellipsoidal depth
 * of at most D/2) are made when the head is attached to a {@link Vessel}, with the full field
 * path such as {@code vessel.bottomHead.depth}.
 *
 * <p>The head depth {@code a} is the axial distance from the tangent line (where the head meets
 * the cylindrical shell) to the head's outermost inside point:
 * <ul>
 *   <li>flat: a = 0;</li>
 *   <li>hemispherical: a = D/2;</li>
 *   <li>ellipsoidal (half of an oblate spheroid with semi-axes D/2 and a): a as given;</li>
 *   <li>torispherical, crown (dish) radius Rc, knuckle radius rk, R = D/2:
 *       a = Rc - sqrt((Rc - rk)^2 - (R - rk)^2) (plane geometry of two tangent circles);</li>
 *   <li>conical with half-angle alpha measured from the vessel axis: a = R / tan(alpha).</li>
 * </ul>
 */
public sealed interface Head permits Head.Flat, Head.Hemispherical, Head.Ellipsoidal,
        Head.Torispherical, Head.Conical {

    /** Inside depth of the head from the tangent line to its outermost inside point, m. */
    double depth(double diameter);

    /** A short name for a calculation sheet, e.g. {@code "ellipsoidal, depth 0.5 m"}. */
    default String describe() {
        return describe(Words.SI);
    }

    /** {@link #describe()} with lengths written as {@code w} writes them. */
    String describe(Words w);

    /** A flat plate closure. */
    static Flat flat() {
        return new Flat();
    }

    /** A hemispherical head (inside radius D/2). */
    static Hemispherical hemispherical() {
        return new Hemispherical();
    }

    /** An ellipsoidal head of the given inside depth, m (0 &lt; depth &lt;= D/2). */
    static Ellipsoidal ellipsoidal(double depth) {
        return new Ellipsoidal(depth);
    }

    /**
     * The 2:1 semi-ellipsoidal head: depth D/4 (major-to-minor axis ratio 2). Common practice
     * naming for ASME pressure-vessel heads.
     */
    static Ellipsoidal ellipsoidal2to1(double diameter) {
        InvalidInputException.requirePositive("vessel.diameter", diameter, "m");
        return new Ellipsoidal(diameter / 4.0);
    }

    /** A torispherical head with crown (dish) radius and knuckle radius, both inside, m. */
    static Torispherical torispherical(double crownRadius, double knuckleRadius) {
        return new Torispherical(crownRadius, knuckleRadius);
    }

    /**
     * ASME flanged-and-dished head: crown radius D, knuckle radius 0.06 D (common practice; the
     * same f = 1, k = 0.06 pair is the default of fluids' torispherical head).
     */
    static Torispherical asmeFlangedAndDished(double diameter) {
        InvalidInputException.requirePositive("vessel.diameter", diameter, "m");
        return new Torispherical(diameter, 0.06 * diameter);
    }

    /** The 80/10 torispherical head: crown radius 0.8 D, knuckle radius 0.1 D (common practice). */
    static Torispherical torispherical80_10(double diameter) {
        InvalidInputException.requirePositive("vessel.diameter", diameter, "m");
        return new Torispherical(0.8 * diameter, 0.1 * diameter);
    }

    /** A conical head with half-angle (from the vessel axis) in degrees, 0 &lt; angle &lt; 90. */
    static Conical conical(double halfAngleDeg) {
        return new Conical(halfAngleDeg);
    }

    /** Flat plate head; depth 0. */
    record Flat() implements Head {
        @Override
        public double depth(double diameter) {
            return 0.0;
        }

        @Override
        public String describe(Words w) {
            return "flat";
        }
    }

    /** Hemispherical head; depth D/2. */
    record Hemispherical() implements Head {
        @Override
        public double depth(double diameter) {
            return diameter / 2.0;
        }

        @Override
        public String describe(Words w) {
            return "hemispherical";
        }
    }

    /**
     * Ellipsoidal head: half of an oblate spheroid with equatorial semi-axis D/2 and polar
     * semi-axis equal to {@code depth}. A depth of D/2 is a hemisphere.
     *
     * @param depth inside depth from the tangent line, m; must be finite and &gt; 0 here and
     *              &lt;= D/2 once attached to a vessel
     */
    record Ellipsoidal(double depth) implements Head {
        public Ellipsoidal {
            InvalidInputException.requirePositive("head.depth", depth, "m");
        }

        @Override
        public double depth(double diameter) {
            return depth;
        }

        @Override
        public String describe(Words w) {
            return "ellipsoidal, depth " + w.m(depth);
        }
    }

    /**
     * Torispherical head: a spherical crown of radius {@code crownRadius} joined tangentially to
     * a toroidal knuckle of radius {@code knuckleRadius}, which meets the shell tangentially.
     * Geometric only when 0 &lt; knuckle &lt; D/2, knuckle &lt; crown and crown &gt;= D/2
     * (checked when attached to a vessel). In fluids' notation crown = f D, knuckle = k D.
     */
    record Torispherical(double crownRadius, double knuckleRadius) implements Head {
        public Torispherical {
            InvalidInputException.requirePositive("head.crownRadius", crownRadius, "m");
            InvalidInputException.requirePositive("head.knuckleRadius", knuckleRadius, "m");
        }

        @Override
        public double depth(double diameter) {
            double r = diameter / 2.0;
            double rc = crownRadius;
            double rk = knuckleRadius;
            return rc - Math.sqrt((rc - rk) * (rc - rk) - (r - rk) * (r - rk));
        }

        @Override
        public String describe(Words w) {
            return "torispherical, crown radius " + w.m(crownRadius) + ", knuckle radius " + w.m(knuckleRadius);
        }
    }

    /**
     * Conical head with half-angle measured from the vessel axis (90 deg would be flat). Depth
     * a = (D/2) / tan(alpha).
     *
     * @param halfAngleDeg half-angle in degrees, 0 &lt; alpha &lt; 90
     */
    record Conical(double halfAngleDeg) implements Head {
        public Conical {
            if (!(halfAngleDeg > 0 && halfAngleDeg < 90)) {
                throw new InvalidInputException("head.halfAngle", Fmt.g(halfAngleDeg) + " deg",
                        "expected a half-angle from the vessel axis greater than 0 and less than 90 deg");
            }
        }

        @Override
        public double depth(double diameter) {
            return diameter / 2.0 / Math.tan(Math.toRadians(halfAngleDeg));
        }

        @Override
        public String describe(Words w) {
            return "conical, half-angle " + Fmt.g(halfAngleDeg) + " deg";
        }
    }
}
