package org.ventcase.thermo;

import static org.ventcase.common.PhysicalConstants.R;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;

/**
 * Saturation of a pure fluid by equal fugacity of the liquid and vapour roots.
 *
 * <p>Psat(T): the coexistence pressure lies between the pressures of the two spinodal points
 * (the extrema of P(v) on the isotherm). Those are found by bisection on the sign of (dP/dv)_T
 * either side of v* = (Zc/Omega_b) b, where the function
 * (2v + u b)(v - b)^2/((v + sigma b)(v + epsilon b))^2 has its single maximum (the critical
 * volume of the equation, independent of T). Inside that bracket g(P) = ln phi_L - ln phi_V
 * decreases monotonically (dg/d ln P = Z_L - Z_V), so a Newton iteration in ln P, safeguarded by
 * bisection, cannot leave the bracket and converges quadratically. Tsat(P): Newton in 1/T with
 * the exact Clausius-Clapeyron slope d ln Psat/d(1/T) = -Delta H/(R Delta Z), safeguarded the
 * same way.
 *
 * <p>Source of the method's ingredients: M.L. Michelsen, J.M. Mollerup, Thermodynamic Models:
 * Fundamentals and Computational Aspects, 2nd ed., 2007, ch. 12 (saturation by equal fugacity).
 * Stateless and thread-safe.
 */
public final class PureSaturation {

    /** Highest reduced temperature at which a saturation point is computed. */
    public static final double MAX_TR = 0.9999;
    /** Lowest reduced temperature accepted. */
    public static final double MIN_TR = 0.2;

    /** Relative difference from the Rackett density above which a warning is given. */
    public static final double RACKETT_WARNING = 0.03;

    private static final int MAX_ITER = 100;
    private static final double G_TOL = 1e-12;

    private final CubicModel model;
    private final Component component;
    private static final double[] ONE = {1.0};

    public PureSaturation(CubicModel model) {
        if (model.size() != 1) {
            throw new IllegalArgumentException("pure-fluid saturation needs a one-component model");
        }
        this.model = model;
        this.component = model.components().get(0);
    }

    /** Saturation pressure at T, Pa. */
    public double pressure(double t) {
        return solvePressure(t).p;
    }

    /** The full saturation state at temperature T. */
    public SaturationResult atTemperature(double t, DensityBasis basis) {
        InvalidInputException.requireInRange("temperature", t, 1, 5000, "K");
        Psat s = solvePressure(t);
        return result(t, s, s.iterations, basis);
    }

    /** The full saturation state at pressure P (absolute, Pa). */
    public SaturationResult atPressure(double p, DensityBasis basis) {
        InvalidInputException.requireInRange("pressure", p, 1e-3, 1e10, "Pa");
        double tc = model.tc(0);
        double pc = model.pc(0);
        if (p >= pc) {
            throw new NoSolutionException("pressure", String.format(Locale.US,
                    "%.6g Pa is at or above the critical pressure of %s (Pc = %.6g Pa): there is no saturation; "
                            + "the fluid is a single phase", p, component.name(), pc));
        }
        double xLo = 1.0 / (MAX_TR * tc);
        double xHi = 1.0 / (MIN_TR * tc);
        Psat top = solvePressure(MAX_TR * tc);
        if (p > top.p) {
            throw new NoSolutionException("pressure", String.format(Locale.US,
                    "%.6g Pa is above the saturation pressure at Tr = %.4f (%.6g Pa): within %.3g %% of the critical "
                            + "pressure liquid and vapour are not distinct enough to compute; treat the fluid as near-critical",
                    p, MAX_TR, top.p, 100 * (pc - p) / pc));
        }
        double lnP = Math.log(p);
        // Initial estimate from the acentric-factor definition: log10 Pr = 7/3 (1 + omega)(1 - 1/Tr).
        double x = (1.0 - Math.log10(p / pc) / (7.0 / 3.0 * (1.0 + component.omega()))) / tc;
        if (!(x > xLo && x < xHi)) {
            x = 0.5 * (xLo + xHi);
        }
        // The cold end of the bracket: step down from the estimate until Psat < p. Starting at
        // Tr = 0.2 itself fails for fluids whose vapour pressure there is ~1e-11 Pa (methanol,
        // ethanol, n-decane): the equal-fugacity solve cannot resolve such pressures, and no
        // relief state needs them.
        int total = top.iterations;
        double tCold = Math.min(1.0 / x, MAX_TR * tc * 0.999);
        double hi = Double.NaN;
        for (int k = 0; k < 80; k++) {
            Psat s;
            try {
                s = solvePressure(tCold);
            } catch (ConvergenceException e) {
                throw new NoSolutionException("pressure", String.format(Locale.US,
                        "%.6g Pa is a vapour pressure too low to resolve for %s (the saturation at %.2f K, Tr = %.3f, "
                                + "does not converge)", p, component.name(), tCold, tCold / tc));
            }
            total += s.iterations;
            if (s.p < p) {
                hi = 1.0 / tCold;
                break;
            }
            if (tCold <= MIN_TR * tc * (1 + 1e-12)) {
                throw new NoSolutionException("pressure", String.format(Locale.US,
                        "%.6g Pa is below the saturation pressure at Tr = %.2f (%.6g Pa), the lowest temperature "
                                + "the equation of state is used for", p, MIN_TR, s.p));
            }
            tCold = Math.max(MIN_TR * tc, 0.9 * tCold);
        }
        if (Double.isNaN(hi)) {
            throw new NoSolutionException("pressure", String.format(Locale.US,
                    "no saturation temperature found for %.6g Pa above Tr = %.2f", p, MIN_TR));
        }
        if (!(x > xLo && x <= hi)) {
            x = 0.5 * (xLo + hi);
        }
        double lo = xLo; // f(lo) > 0: Psat above p
        // hi: f(hi) < 0
        for (int it = 0; it < MAX_ITER; it++) {
            double t = 1.0 / x;
            Psat s = solvePressure(t);
            total += s.iterations;
            double f = Math.log(s.p) - lnP;
            if (Math.abs(f) < 1e-12) {
                return result(t, s, total, basis);
            }
            if (f > 0) {
                lo = x;
            } else {
                hi = x;
            }
            double dH = s.hV - s.hL;
            double dZ = s.zV - s.zL;
            double slope = -dH / (R * dZ); // d ln Psat / d(1/T)
            double xn = x - f / slope;
            if (!(xn > lo && xn < hi) || !Double.isFinite(xn)) {
                xn = 0.5 * (lo + hi);
            }
            if (Math.abs(xn - x) <= 1e-15 * x) {
                return result(1.0 / xn, solvePressure(1.0 / xn), total, basis);
            }
            x = xn;
        }
        throw new ConvergenceException("Tsat(P) Newton in 1/T", MAX_ITER, Double.NaN,
                String.format(Locale.US, "%s at %.6g Pa, bracket T = [%.6f, %.6f] K", component.name(), p,
                        1 / hi, 1 / lo));
    }

    private record Psat(double p, double zL, double zV, double lnPhiL, double lnPhiV, double hL, double hV,
                        MixParams m, int iterations) {
    }

    /** The cubic's own saturated-liquid molar volume at T, m3/mol (no translation). */
    double liquidMolarVolumeCubic(double t) {
        Psat s = solvePressure(t);
        return s.zL * R * t / s.p;
    }

    private Psat solvePressure(double t) {
        double tc = model.tc(0);
        double tr = t / tc;
        if (tr >= 1.0) {
            throw new NoSolutionException("temperature", String.format(Locale.US,
                    "%.6g K is at or above the critical temperature of %s (Tc = %.6g K): there is no saturation; "
                            + "the fluid is supercritical", t, component.name(), tc));
        }
        if (tr > MAX_TR * (1 + 1e-12)) {
            throw new NoSolutionException("temperature", String.format(Locale.US,
                    "%.6g K is within %.3g K of the critical temperature of %s (Tc = %.6g K; Tr = %.6f > %.4f): "
                            + "liquid and vapour are not distinct enough to compute; treat the fluid as near-critical",
                    t, tc - t, component.name(), tc, tr, MAX_TR));
        }
        if (tr < MIN_TR * (1 - 1e-12)) {
            throw new NoSolutionException("temperature", String.format(Locale.US,
                    "%.6g K is below Tr = %.2f for %s: below the range the equation of state is used for", t,
                    MIN_TR, component.name()));
        }
        MixParams m = model.mix(t, ONE);
        double[] spin = spinodalPressures(m);
        double pHi = spin[1] * (1.0 - 1e-9);
        double pLo = spin[0] > 0 ? spin[0] * (1.0 + 1e-9) : spin[1] * 1e-30;
        double lnLo = Math.log(pLo);
        double lnHi = Math.log(pHi);
        // Start from the acentric-factor estimate, clipped into the bracket.
        double lnP = Math.log(model.pc(0)) + Math.log(10) * 7.0 / 3.0 * (1 + component.omega()) * (1 - 1 / tr);
        if (!(lnP > lnLo && lnP < lnHi)) {
            lnP = 0.5 * (lnLo + lnHi);
        }
        double g = Double.NaN;
        for (int it = 1; it <= MAX_ITER; it++) {
            double p = Math.exp(lnP);
            CubicRoots r = model.roots(m, p);
            if (r.count() < 2) {
                // Round-off at a bracket end: move inward.
                double vStar = model.variant().zc() / model.variant().omegaB() * m.b();
                boolean vapourLike = r.smallest() * R * t / p > vStar;
                if (vapourLike) {
                    lnLo = lnP;
                } else {
                    lnHi = lnP;
                }
                lnP = 0.5 * (lnLo + lnHi);
                continue;
            }
            double zl = r.smallest();
            double zv = r.largest();
            double gl = model.reducedResidualGibbs(m, p, zl);
            double gv = model.reducedResidualGibbs(m, p, zv);
            g = gl - gv;
            if (Math.abs(g) < G_TOL || lnHi - lnLo < 1e-15) {
                return new Psat(p, zl, zv, gl, gv, model.residualEnthalpy(m, p, zl), model.residualEnthalpy(m, p, zv),
                        m, it);
            }
            if (g > 0) {
                lnLo = lnP;
            } else {
                lnHi = lnP;
            }
            double next = lnP - g / (zl - zv);
            if (!(next > lnLo && next < lnHi)) {
                next = 0.5 * (lnLo + lnHi);
            }
            lnP = next;
        }
        throw new ConvergenceException("Psat(T) equal fugacity", MAX_ITER, g,
                String.format(Locale.US, "%s at %.6f K, bracket P = [%.6g, %.6g] Pa", component.name(), t,
                        Math.exp(lnLo), Math.exp(lnHi)));
    }

    /**
     * Pressures at the liquid and vapour spinodals {P_liq_spinodal, P_vap_spinodal} of the
     * isotherm; the first may be negative.
     */
    double[] spinodalPressures(MixParams m) {
        EosVariant v = model.variant();
        double b = m.b();
        double vStar = v.zc() / v.omegaB() * b;
        double rt = R * m.t();
        if (!(slopeSign(m, vStar) > 0)) {
            throw new NoSolutionException("temperature", "the isotherm has no van der Waals loop (supercritical)");
        }
        double lo = b * (1 + 1e-12);
        double hi = vStar;
        for (int i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (slopeSign(m, mid) < 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double v1 = 0.5 * (lo + hi);
        lo = vStar;
        hi = 2 * vStar;
        while (slopeSign(m, hi) > 0) {
            lo = hi;
            hi *= 2;
        }
        for (int i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (slopeSign(m, mid) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double v2 = 0.5 * (lo + hi);
        return new double[] {pressure(m, v1, rt), pressure(m, v2, rt)};
    }

    private double pressure(MixParams m, double vol, double rt) {
        double b = m.b();
        EosVariant v = model.variant();
        return rt / (vol - b) - m.a() / ((vol + v.sigma() * b) * (vol + v.epsilon() * b));
    }

    /** Sign of (dP/dv)_T, computed without division: a(2v + u b)(v - b)^2 - R T den^2. */
    private double slopeSign(MixParams m, double vol) {
        EosVariant v = model.variant();
        double b = m.b();
        double den = (vol + v.sigma() * b) * (vol + v.epsilon() * b);
        double u = v.sigma() + v.epsilon();
        return m.a() * (2 * vol + u * b) * (vol - b) * (vol - b) - R * m.t() * den * den;
    }

    private SaturationResult result(double t, Psat s, int iterations, DensityBasis basis) {
        List<String> warnings = new ArrayList<>(model.notes());
        double mw = component.molarMass();
        double rt = R * t;
        double vl = s.zL * rt / s.p;
        double vv = s.zV * rt / s.p;
        DensityBasis used = basis;
        double c = 0;
        if (basis == DensityBasis.TRANSLATED) {
            if (model.hasVolumeShift()) {
                c = model.volumeShift(t, ONE);
            } else {
                used = DensityBasis.CUBIC;
                warnings.add(model.variant().displayName()
                        + " has no published volume shift: densities are the raw cubic's.");
            }
        }
        double tr = t / model.tc(0);
        String cold = model.variant() == EosVariant.PRTWU ? MeasuredDeviations.note(component, tr) : "";
        if (!cold.isEmpty()) {
            warnings.add(cold);
        }
        if (tr > 0.9 && tr <= 0.95) {
            warnings.add(String.format(Locale.US,
                    "Tr = %.4f: above Tr 0.9 a cubic equation's vapour density and latent heat lose accuracy%s.", tr,
                    model.variant() == EosVariant.PRTWU
                            ? " (against reference equations at Tr 0.925, for most built-in fluids: vapour density up "
                                    + "to 4 % high, latent heat up to 4 % low, liquid density up to 2.3 % low, and more "
                                    + "closer to Tc; docs/accuracy.md)"
                            : ""));
        }
        if (tr > 0.95) {
            warnings.add(String.format(Locale.US,
                    "Tr = %.4f: near the critical point the latent heat is small and changes fast with temperature, "
                            + "and cubic-equation liquid densities are least accurate.", tr));
        }
        if (!component.cp().inRange(t)) {
            warnings.add(String.format(Locale.US, "%.2f K is outside the ideal-gas Cp range of %s (%.0f-%.0f K).", t,
                    component.name(), component.cp().tMinK(), component.cp().tMaxK()));
        }
        SaturationResult.PhaseState liq = new SaturationResult.PhaseState(s.zL, vl, vl - c, mw / 1e3 / (vl - c), used,
                s.lnPhiL, s.hL);
        double dh = s.hV - s.hL;
        double vvUsed = vv - c;
        double latent = dh;
        String latentSource = "";
        java.util.Optional<LatentHeatCorrelation.Anchored> anchored = LatentHeatCorrelation.anchor(model.variant(),
                component, t, dh, vl - c, vv - vl);
        if (anchored.isPresent()) {
            latent = anchored.get().latentHeatJmol();
            latentSource = LatentHeatCorrelation.CITATION;
            if (used == DensityBasis.TRANSLATED) {
                vvUsed = anchored.get().vapourMolarVolume();
            }
        }
        SaturationResult.PhaseState vap = new SaturationResult.PhaseState(s.zV, vv, vvUsed, mw / 1e3 / vvUsed, used,
                s.lnPhiV, s.hV);
        double rackett = rackettDensity(component, t);
        double dev = liq.density() / rackett - 1.0;
        String densityCheck = "";
        if (Math.abs(dev) > RACKETT_WARNING) {
            densityCheck = String.format(Locale.US,
                    "The %s liquid density of %s at %.2f K (%.2f C) (%.4g kg/m3) differs from the Rackett correlation "
                            + "(%.4g kg/m3, Z_RA from %s) by %+.1f %%: a liquid inventory on this basis may be %s; "
                            + "compare the bases before relying on it.", used.label(), component.name(), t, t - 273.15,
                    liq.density(), rackett, Citations.rackett(component), 100 * dev,
                    dev < 0 ? "understated" : "overstated");
            warnings.add(densityCheck);
        }
        return new SaturationResult(model.variant(), component, t, s.p, liq, vap, latent, latent / (mw * 1e-3),
                rackett, iterations, warnings, densityCheck, latentSource, dh);
    }

    /**
     * Saturated-liquid density by the Rackett equation in the Spencer-Danner form,
     * v_sat = (R Tc/Pc) Z_RA^(1 + (1 - Tr)^(2/7)).
     * Source: C.F. Spencer, R.P. Danner, J. Chem. Eng. Data 17 (1972) 236-241,
     * DOI 10.1021/je60053a012.
     *
     * @return kg/m3
     */
    public static double rackettDensity(Component c, double t) {
        double tr = Math.min(t / c.tcK(), 1.0);
        double v = R * c.tcK() / c.pcPa() * Math.pow(c.rackettZ(), 1.0 + Math.pow(1.0 - tr, 2.0 / 7.0));
        return c.molarMass() * 1e-3 / v;
    }
}
