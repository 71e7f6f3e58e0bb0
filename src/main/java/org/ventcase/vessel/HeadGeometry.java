package org.ventcase.vessel;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;

/**
 * A head attached to a shell of inside radius R: its meridian as a list of {@link ProfilePiece}s,
 * its depth, and its volumes and areas cut by planes either normal to the axis (vertical vessel)
 * or parallel to it (horizontal vessel). Immutable; the quadrature objects are created per call,
 * so one instance may be shared between threads.
 *
 * <p><b>Horizontal vessel, partial head.</b> The head is a surface of revolution about a
 * horizontal axis at elevation R above the vessel bottom. At the meridian point (r, z) the cross
 * section normal to the axis is a circle of radius r; with the liquid at elevation h it is filled
 * to depth d = h - (R - r). Hence
 * <pre>
 *   V(h) = integral A_seg(r, d) dz          (A_seg: {@link CircularSegment#area})
 *   S(h) = integral 2 theta0 r ds,  theta0 = acos((R - h) / r)   (clamped to [0, pi])
 * </pre>
 * where r ds dtheta is the area element of a surface of revolution and the wetted azimuths are
 * |theta| &lt;= theta0 measured from the lowest generator. Closed forms are used for the
 * hemisphere (V = pi h^2 (3R - h) / 6, half a spherical cap; S = pi R h, half of Archimedes' zone)
 * and for the ellipsoid's volume (the hemisphere value scaled by a/R, since the ellipsoid is the
 * hemisphere stretched along the axis). The other cases (ellipsoid area, torispherical and conical
 * heads) are integrated over each meridian piece with Commons Math's
 * {@link IterativeLegendreGaussIntegrator} (8-point Gauss-Legendre, relative accuracy
 * {@value #REL_ACCURACY}), after splitting each piece where r = |R - h| (there theta0 and d have
 * square-root behaviour) and substituting t = t0 + (t1 - t0)(1 - cos(pi u))/2, which makes the
 * integrand smooth at both ends of every sub-interval. Above the axis (h &gt; R) the complement
 * V(h) = V_head - V(2R - h) (reflection symmetry) is used.
 */
final class HeadGeometry {
    static final double REL_ACCURACY = 1e-12;
    private static final int GAUSS_POINTS = 8;
    private static final int MAX_EVALUATIONS = 1_000_000;

    private final Head head;
    private final double radius;
    private final double depth;
    private final List<ProfilePiece> pieces;
    private final double volume;
    private final double area;

    private HeadGeometry(Head head, double radius, double depth, List<ProfilePiece> pieces) {
        this.head = head;
        this.radius = radius;
        this.depth = depth;
        this.pieces = List.copyOf(pieces);
        double v = 0.0;
        double s = 0.0;
        for (ProfilePiece p : this.pieces) {
            v += p.volumeBetween(p.zStart(), p.zEnd());
            s += p.areaBetween(p.zStart(), p.zEnd());
        }
        this.volume = v;
        this.area = isFlat() ? Math.PI * radius * radius : s;
    }

    /**
     * Builds the geometry of {@code head} on a shell of inside diameter {@code diameter}, checking
     * the diameter-dependent limits and naming the field as {@code field + ".depth"} etc.
     */
    /**
     * Points along the head's inside profile, from the tangent line (r = R, z = 0) to the head's
     * outermost point on the axis (r = 0, z = depth), {@code perPiece} + 1 points per profile piece
     * (shared end points listed once). A flat head gives the two ends of its plate.
     */
    double[][] profile(int perPiece) {
        java.util.List<double[]> pts = new java.util.ArrayList<>();
        pts.add(new double[] {radius, 0.0});
        for (ProfilePiece p : pieces) {
            for (int i = 1; i <= perPiece; i++) {
                double t = p.t0() + (p.t1() - p.t0()) * i / perPiece;
                pts.add(new double[] {p.r(t), p.z(t)});
            }
        }
        if (pieces.isEmpty()) {
            pts.add(new double[] {0.0, 0.0});
        }
        return pts.toArray(new double[0][]);
    }

    static HeadGeometry of(Head head, double diameter, String field) {
        double r = diameter / 2.0;
        List<ProfilePiece> pieces = new ArrayList<>();
        if (head instanceof Head.Flat) {
            return new HeadGeometry(head, r, 0.0, pieces);
        }
        if (head instanceof Head.Hemispherical) {
            pieces.add(new ProfilePiece.Arc(0.0, 0.0, r, 0.0, Math.PI / 2.0));
            return new HeadGeometry(head, r, r, pieces);
        }
        if (head instanceof Head.Ellipsoidal e) {
            if (!(e.depth() > 0 && e.depth() <= r)) {
                throw new InvalidInputException(field + ".depth", Fmt.g(e.depth()) + " m",
                        "expected a depth greater than 0 and at most D/2 = " + Fmt.g(r)
                                + " m (D/2 is a hemisphere)");
            }
            pieces.add(new ProfilePiece.EllipseQuadrant(r, e.depth()));
            return new HeadGeometry(head, r, e.depth(), pieces);
        }
        if (head instanceof Head.Torispherical t) {
            double rc = t.crownRadius();
            double rk = t.knuckleRadius();
            if (!(rc >= r)) {
                throw new InvalidInputException(field + ".crownRadius", Fmt.g(rc) + " m",
                        "expected a crown radius of at least D/2 = " + Fmt.g(r) + " m");
            }
            if (!(rk > 0 && rk < rc && rk < r)) {
                throw new InvalidInputException(field + ".knuckleRadius", Fmt.g(rk) + " m",
                        "expected a knuckle radius greater than 0 and less than both the crown radius ("
                                + Fmt.g(rc) + " m) and D/2 (" + Fmt.g(r) + " m)");
            }
            double a = t.depth(diameter);
            // junction angle from the horizontal: cos(phi1) = (R - rk) / (Rc - rk)
            double phi1 = Math.acos(Math.min(1.0, (r - rk) / (rc - rk)));
            if (phi1 > 0) {
                pieces.add(new ProfilePiece.Arc(r - rk, 0.0, rk, 0.0, phi1));
            }
            pieces.add(new ProfilePiece.Arc(0.0, a - rc, rc, phi1, Math.PI / 2.0));
            return new HeadGeometry(head, r, a, pieces);
        }
        if (head instanceof Head.Conical c) {
            double a = c.depth(diameter);
            pieces.add(new ProfilePiece.Line(r, a));
            return new HeadGeometry(head, r, a, pieces);
        }
        throw new IllegalStateException("unknown head " + head);
    }

    Head head() {
        return head;
    }

    boolean isFlat() {
        return pieces.isEmpty();
    }

    double depth() {
        return depth;
    }

    double volume() {
        return volume;
    }

    /** Inside surface area of the head (pi R^2 for a flat head). */
    double area() {
        return area;
    }

    // ---------------------------------------------------------------- vertical axis

    /** Volume between the apex and the plane at axial distance y (0..depth) from the apex. */
    double volumeFromApex(double y) {
        double zCut = depth - y;
        double v = 0.0;
        for (ProfilePiece p : pieces) {
            if (p.zEnd() > zCut) {
                v += p.volumeBetween(Math.max(zCut, p.zStart()), p.zEnd());
            }
        }
        return v;
    }

    /** Curved surface between the apex and the plane at distance y from the apex (not for flat heads). */
    double areaFromApex(double y) {
        double zCut = depth - y;
        double s = 0.0;
        for (ProfilePiece p : pieces) {
            if (p.zEnd() > zCut) {
                s += p.areaBetween(Math.max(zCut, p.zStart()), p.zEnd());
            }
        }
        return s;
    }

    /** Volume between the tangent plane and the plane at axial distance x (0..depth) from it. */
    double volumeFromTangent(double x) {
        double v = 0.0;
        for (ProfilePiece p : pieces) {
            if (p.zStart() < x) {
                v += p.volumeBetween(p.zStart(), Math.min(x, p.zEnd()));
            }
        }
        return v;
    }

    /** Curved surface between the tangent plane and the plane at distance x from it. */
    double areaFromTangent(double x) {
        double s = 0.0;
        for (ProfilePiece p : pieces) {
            if (p.zStart() < x) {
                s += p.areaBetween(p.zStart(), Math.min(x, p.zEnd()));
            }
        }
        return s;
    }

    // ---------------------------------------------------------------- horizontal axis

    /** Liquid volume in the head of a horizontal vessel at level h (0..2R) above the vessel bottom. */
    double horizontalVolume(double h) {
        if (h <= 0 || isFlat()) {
            return 0.0;
        }
        if (h >= 2 * radius) {
            return volume;
        }
        if (head instanceof Head.Hemispherical || head instanceof Head.Ellipsoidal) {
            return depth / radius * Math.PI * h * h * (3 * radius - h) / 6.0;
        }
        return horizontalVolumeByQuadrature(h);
    }

    /** Wetted inside area of the head of a horizontal vessel at level h (0..2R). */
    double horizontalArea(double h) {
        if (h <= 0) {
            return 0.0;
        }
        if (h >= 2 * radius) {
            return area;
        }
        if (isFlat()) {
            return CircularSegment.area(radius, h);
        }
        if (head instanceof Head.Hemispherical) {
            return Math.PI * radius * h;
        }
        // the wetted area and the fire-exposed area of one level ask for the same value: the last one
        // is kept (an immutable pair, so a head shared between threads stays correct)
        Memo m = lastArea;
        if (m != null && m.h() == h) {
            return m.value();
        }
        double a = horizontalAreaByQuadrature(h);
        lastArea = new Memo(h, a);
        return a;
    }

    private record Memo(double h, double value) {
    }

    private volatile Memo lastArea;

    /** Quadrature path for the volume, whatever the head; package-private so tests can compare with closed forms. */
    double horizontalVolumeByQuadrature(double h) {
        if (h > radius) {
            return volume - horizontalVolumeByQuadrature(2 * radius - h);
        }
        double k = radius - h;
        return integrateBelow(k, p -> t -> CircularSegment.area(p.r(t), p.r(t) - k) * p.dzdt(t),
                radius * radius * depth, "horizontal head volume");
    }

    /** Quadrature path for the wetted area, whatever the (curved) head. */
    double horizontalAreaByQuadrature(double h) {
        if (h > radius) {
            return area - horizontalAreaByQuadrature(2 * radius - h);
        }
        double k = radius - h;
        return integrateBelow(k, p -> t -> {
            double r = p.r(t);
            return 2.0 * CircularSegment.halfAngle(r, r - k) * r * p.dsdt(t);
        }, area, "horizontal head wetted area");
    }

    private interface PieceIntegrand {
        DoubleUnaryOperator on(ProfilePiece p);
    }

    /** Sum over pieces of the integral over the part of each piece with r &gt; k (where the integrand is non-zero). */
    private double integrateBelow(double k, PieceIntegrand integrand, double scale, String what) {
        double sum = 0.0;
        for (ProfilePiece p : pieces) {
            if (p.r(p.t0()) <= k) {
                continue;
            }
            double tEnd = p.r(p.t1()) >= k ? p.t1() : p.paramAtRadius(k);
            sum += integrate(integrand.on(p), p.t0(), tEnd, scale, what);
        }
        return sum;
    }

    private static double integrate(DoubleUnaryOperator f, double a, double b, double scale, String what) {
        if (!(b > a)) {
            return 0.0;
        }
        double width = b - a;
        // t = a + (b - a)(1 - cos(pi u))/2 ; dt/du = (b - a) pi sin(pi u) / 2
        org.apache.commons.math3.analysis.UnivariateFunction g = u -> {
            double t = a + width * 0.5 * (1.0 - Math.cos(Math.PI * u));
            return f.applyAsDouble(t) * width * 0.5 * Math.PI * Math.sin(Math.PI * u);
        };
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(
                GAUSS_POINTS, REL_ACCURACY, REL_ACCURACY * 1e-3 * scale, 2, 60);
        try {
            return integrator.integrate(MAX_EVALUATIONS, g, 0.0, 1.0);
        } catch (MaxCountExceededException e) {
            throw new ConvergenceException("Iterative Gauss-Legendre (" + what + ")",
                    integrator.getIterations(), Double.NaN,
                    "interval [" + a + ", " + b + "], relative accuracy " + REL_ACCURACY);
        }
    }
}
