package org.ventcase.vessel;

/**
 * Plane geometry of a circle cut by a straight line (a circular segment).
 *
 * <p>For a circle of radius r filled to depth d (0 &lt;= d &lt;= 2r), with half-angle
 * alpha = acos((r - d) / r):
 * <pre>
 *   area       A(r, d) = r^2 alpha - (r - d) sqrt(d (2r - d))
 *   arc length s(r, d) = 2 r alpha
 * </pre>
 * Source: the standard circular-segment result, e.g. Perry's Chemical Engineers' Handbook,
 * "Mensuration formulas", or any table of plane-figure areas. alpha is evaluated as
 * 2 asin(sqrt(d / 2r)), which stays accurate for small d where acos(1 - d/r) loses digits; for
 * d &gt; r the complement pi r^2 - A(r, 2r - d) is used.
 */
final class CircularSegment {
    private CircularSegment() {
    }

    /** Half-angle alpha (rad) subtended by the wetted arc, depth d in [0, 2r]; clamps outside. */
    static double halfAngle(double r, double d) {
        if (d <= 0) {
            return 0.0;
        }
        if (d >= 2 * r) {
            return Math.PI;
        }
        if (d <= r) {
            return 2.0 * Math.asin(Math.sqrt(d / (2.0 * r)));
        }
        return Math.PI - 2.0 * Math.asin(Math.sqrt((2.0 * r - d) / (2.0 * r)));
    }

    /** Area of the segment of depth d in a circle of radius r; 0 for d &lt;= 0, pi r^2 for d &gt;= 2r. */
    static double area(double r, double d) {
        if (d <= 0) {
            return 0.0;
        }
        if (d >= 2 * r) {
            return Math.PI * r * r;
        }
        if (d > r) {
            return Math.PI * r * r - area(r, 2 * r - d);
        }
        double alpha = 2.0 * Math.asin(Math.sqrt(d / (2.0 * r)));
        return r * r * alpha - (r - d) * Math.sqrt(d * (2.0 * r - d));
    }
}
