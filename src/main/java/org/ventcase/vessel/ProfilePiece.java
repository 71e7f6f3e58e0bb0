package org.ventcase.vessel;

/**
 * One smooth piece of a head's meridian (the curve that, rotated about the vessel axis, sweeps
 * the head surface). Coordinates: r is the distance from the vessel axis, z the axial distance
 * from the tangent plane, positive outward toward the head's apex. Each piece is parametrised by
 * t from {@link #t0()} (tangent side) to {@link #t1()} (apex side); along it r is non-increasing
 * and z non-decreasing.
 *
 * <p>Volumes and areas between two planes normal to the axis ({@link #volumeBetween},
 * {@link #areaBetween}) are closed forms of the solid and surface of revolution:
 * V = pi integral r(z)^2 dz, S = 2 pi integral r ds (Pappus-Guldinus; any calculus text).
 */
sealed interface ProfilePiece permits ProfilePiece.Arc, ProfilePiece.EllipseQuadrant, ProfilePiece.Line {

    double t0();

    double t1();

    double r(double t);

    double z(double t);

    /** dz/dt. */
    double dzdt(double t);

    /** ds/dt, s the arc length of the meridian. */
    double dsdt(double t);

    /** The parameter at which r(t) equals {@code radius}, for r(t1) &lt;= radius &lt;= r(t0). */
    double paramAtRadius(double radius);

    /** Volume of revolution between the planes z0 &lt;= z1, both within this piece's z range, m3. */
    double volumeBetween(double z0, double z1);

    /** Surface of revolution between the planes z0 &lt;= z1, both within this piece's z range, m2. */
    double areaBetween(double z0, double z1);

    default double zStart() {
        return z(t0());
    }

    default double zEnd() {
        return z(t1());
    }

    /**
     * Circular arc with centre (rc, zc) and radius rho: r = rc + rho cos(phi),
     * z = zc + rho sin(phi), phi from phiStart to phiEnd within [0, pi/2]. Used for hemispheres,
     * torispherical crowns (rc = 0) and knuckles (rc = R - rk, zc = 0).
     *
     * <p>With u = z - zc and w = sqrt(rho^2 - u^2):
     * V = pi [ (rc^2 + rho^2) u - u^3/3 + rc (u w + rho^2 asin(u/rho)) ] between the limits;
     * S = 2 pi rho [ rc phi + rho sin(phi) ] between the limits (for rc = 0 this is Archimedes'
     * zone area 2 pi rho dz).
     */
    record Arc(double rc, double zc, double rho, double phiStart, double phiEnd) implements ProfilePiece {
        @Override
        public double t0() {
            return phiStart;
        }

        @Override
        public double t1() {
            return phiEnd;
        }

        @Override
        public double r(double t) {
            return rc + rho * Math.cos(t);
        }

        @Override
        public double z(double t) {
            return zc + rho * Math.sin(t);
        }

        @Override
        public double dzdt(double t) {
            return rho * Math.cos(t);
        }

        @Override
        public double dsdt(double t) {
            return rho;
        }

        @Override
        public double paramAtRadius(double radius) {
            double c = Math.max(-1.0, Math.min(1.0, (radius - rc) / rho));
            return Math.min(phiEnd, Math.max(phiStart, Math.acos(c)));
        }

        private double u(double z) {
            return Math.max(-rho, Math.min(rho, z - zc));
        }

        @Override
        public double volumeBetween(double z0, double z1) {
            double u0 = u(z0);
            double u1 = u(z1);
            if (rc == 0.0) {
                // pi (u1 - u0) [ (rho^2 - u1^2) + (rho^2 - u0 u1) + (rho^2 - u0^2) ] / 3, written with
                // (rho - u) factors so that thin slices near the apex keep their digits
                double a = (rho - u1) * (rho + u1);
                double b = rho * (rho - u1) + u1 * (rho - u0);
                double c = (rho - u0) * (rho + u0);
                return Math.PI * (u1 - u0) * (a + b + c) / 3.0;
            }
            return Math.PI * (f(u1) - f(u0));
        }

        private double f(double u) {
            double w = Math.sqrt(Math.max(0.0, rho * rho - u * u));
            return (rc * rc + rho * rho) * u - u * u * u / 3.0
                    + rc * (u * w + rho * rho * Math.asin(u / rho));
        }

        @Override
        public double areaBetween(double z0, double z1) {
            double u0 = u(z0);
            double u1 = u(z1);
            double phi0 = Math.asin(u0 / rho);
            double phi1 = Math.asin(u1 / rho);
            return 2.0 * Math.PI * rho * (rc * (phi1 - phi0) + (u1 - u0));
        }
    }

    /**
     * Quarter ellipse of an oblate spheroid with equatorial semi-axis R and polar semi-axis a
     * (a &lt;= R), centre on the tangent plane: r = R cos t, z = a sin t, t in [0, pi/2].
     *
     * <p>V = pi R^2 [ z - z^3 / (3 a^2) ] between the limits. Surface: r ds = R sqrt(1 + c^2 z^2) dz
     * with c^2 = (R^2 - a^2) / a^4, so S = 2 pi R [ G(z) ] with
     * G(z) = ( z sqrt(1 + c^2 z^2) + asinh(c z) / c ) / 2 (standard integral); for c a &lt; 1e-6
     * the series G = z + c^2 z^3 / 6 is used (truncation below 1e-24 relative).
     */
    record EllipseQuadrant(double radius, double depth) implements ProfilePiece {
        @Override
        public double t0() {
            return 0.0;
        }

        @Override
        public double t1() {
            return Math.PI / 2.0;
        }

        @Override
        public double r(double t) {
            return radius * Math.cos(t);
        }

        @Override
        public double z(double t) {
            return depth * Math.sin(t);
        }

        @Override
        public double dzdt(double t) {
            return depth * Math.cos(t);
        }

        @Override
        public double dsdt(double t) {
            double s = radius * Math.sin(t);
            double c = depth * Math.cos(t);
            return Math.sqrt(s * s + c * c);
        }

        @Override
        public double paramAtRadius(double r) {
            return Math.acos(Math.max(-1.0, Math.min(1.0, r / radius)));
        }

        @Override
        public double volumeBetween(double z0, double z1) {
            double a = depth;
            double x = (a - z1) * (a + z1);
            double y = a * (a - z1) + z1 * (a - z0);
            double w = (a - z0) * (a + z0);
            return Math.PI * radius * radius * (z1 - z0) * (x + y + w) / (3.0 * a * a);
        }

        @Override
        public double areaBetween(double z0, double z1) {
            return 2.0 * Math.PI * radius * (g(z1) - g(z0));
        }

        private double g(double z) {
            double c2 = (radius - depth) * (radius + depth) / (depth * depth * depth * depth);
            double c = Math.sqrt(Math.max(0.0, c2));
            if (c * depth < 1e-6) {
                return z + c2 * z * z * z / 6.0;
            }
            return 0.5 * (z * Math.sqrt(1.0 + c2 * z * z) + asinh(c * z) / c);
        }

        private static double asinh(double x) {
            return Math.log(x + Math.sqrt(x * x + 1.0));
        }
    }

    /**
     * Straight generator of a cone from (R, 0) to the apex (0, a): r = R (1 - t), z = a t,
     * t in [0, 1]. V = (pi R^2 a / 3) [ (1 - z0/a)^3 - (1 - z1/a)^3 ];
     * S = pi (r0 + r1) (z1 - z0) sqrt(R^2 + a^2) / a (frustum lateral area).
     */
    record Line(double radius, double depth) implements ProfilePiece {
        @Override
        public double t0() {
            return 0.0;
        }

        @Override
        public double t1() {
            return 1.0;
        }

        @Override
        public double r(double t) {
            return radius * (1.0 - t);
        }

        @Override
        public double z(double t) {
            return depth * t;
        }

        @Override
        public double dzdt(double t) {
            return depth;
        }

        @Override
        public double dsdt(double t) {
            return Math.hypot(radius, depth);
        }

        @Override
        public double paramAtRadius(double r) {
            return Math.max(0.0, Math.min(1.0, 1.0 - r / radius));
        }

        @Override
        public double volumeBetween(double z0, double z1) {
            double q0 = 1.0 - z0 / depth;
            double q1 = 1.0 - z1 / depth;
            return Math.PI * radius * radius * depth / 3.0 * (q0 * q0 * q0 - q1 * q1 * q1);
        }

        @Override
        public double areaBetween(double z0, double z1) {
            double r0 = radius * (1.0 - z0 / depth);
            double r1 = radius * (1.0 - z1 / depth);
            return Math.PI * (r0 + r1) * (z1 - z0) * Math.hypot(radius, depth) / depth;
        }
    }
}
