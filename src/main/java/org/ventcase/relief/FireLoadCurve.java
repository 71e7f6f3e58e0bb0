package org.ventcase.relief;

import java.util.ArrayList;
import java.util.List;

import org.ventcase.common.InvalidInputException;
import org.ventcase.vessel.Level;

/**
 * The wetted-vessel fire relief load as a function of the fill level: {@link WettedFire} run at
 * a series of liquid levels (percent of volume), everything else as in the case. A reviewer sees
 * from it how the load responds to the level the case assumed and at which level it is largest.
 *
 * <p>With P1, T1 and L fixed by the relieving pressure, W = Q / L and Q = C F A^0.82, so the load
 * follows the fire-exposed wetted area A: it rises with the level until the liquid reaches the top
 * of the fire zone (fire height above grade minus the vessel's bottom elevation) and is flat above
 * it. The governing point is the one with the largest load; on a flat top it is the lowest level
 * reaching that load within {@link #PLATEAU_TOLERANCE}.
 *
 * @param points         the evaluated levels, ascending
 * @param governingIndex index into {@code points} of the largest load
 * @param caseLevelIndex index into {@code points} of the case's own level
 */
public record FireLoadCurve(List<Point> points, int governingIndex, int caseLevelIndex) {

    /**
     * Relative difference below which two loads count as equal when finding the governing level
     * (1e-9: loads on the plateau come from the same area and differ only by round-off).
     */
    public static final double PLATEAU_TOLERANCE = 1e-9;

    /**
     * One level.
     *
     * @param levelPercentVolume  liquid volume as % of the vessel volume
     * @param levelPercentHeight  liquid height as % of the inside height
     * @param levelM              liquid height above the lowest inside point, m
     * @param fireWettedAreaM2    fire-exposed wetted area, m2
     * @param heatW               fire heat input Q, W
     * @param reliefLoadKgPerS    relief load W, kg/s
     * @param requiredAreaM2      API 520 required effective area, m2
     */
    public record Point(double levelPercentVolume, double levelPercentHeight, double levelM, double fireWettedAreaM2,
                        double heatW, double reliefLoadKgPerS, double requiredAreaM2) {
    }

    public FireLoadCurve {
        points = List.copyOf(points);
        if (points.isEmpty()) {
            throw new IllegalArgumentException("a load curve needs at least one point");
        }
    }

    /** The point with the largest relief load. */
    public Point governing() {
        return points.get(governingIndex);
    }

    /** The point at the case's own fill level. */
    public Point caseLevel() {
        return points.get(caseLevelIndex);
    }

    /**
     * Runs the case at {@code steps} + 1 evenly spaced levels from {@code fromPercent} to
     * {@code toPercent} of the vessel volume, plus the case's own level if it is not one of them.
     *
     * @param base        the case; its level is replaced at each point
     * @param fromPercent lowest level, % of volume, &gt; 0 (an empty vessel has no wetted area)
     * @param toPercent   highest level, % of volume, &lt;= 100 and &gt; fromPercent
     * @param steps       number of intervals, 1..200
     */
    public static FireLoadCurve overLevels(WettedFireInput base, double fromPercent, double toPercent, int steps) {
        return overLevels(base.level().percentOfVolumeIn(base.vessel()), fromPercent, toPercent, steps, pct -> {
            WettedFireInput in = new WettedFireInput(base.component(), base.eos(), base.densityBasis(), base.vessel(),
                    Level.ofPercentOfVolume(pct), base.exposure(), base.storageTemperatureK(), base.relieving(),
                    base.fireFighting(), base.environment(), base.backPressurePa(), base.kd(), base.kb(), base.kc(),
                    base.subtractDisplacedVapour());
            WettedFireResult r = WettedFire.run(in);
            return new Point(r.vessel().levelPercentVolume(), r.vessel().levelPercentHeight(), r.vessel().levelM(),
                    r.vessel().fire().area(), r.heat().heatW(), r.reliefLoadKgPerS(), r.sizing().areaM2());
        });
    }

    /**
     * The same curve for any fire method: {@code evaluate} runs the fire case at a level given in %
     * of volume and returns its point. Levels as in {@link #overLevels(WettedFireInput, double, double,
     * int)}, with the case's own level {@code casePercent} added where it is not one of them.
     */
    public static FireLoadCurve overLevels(double casePercent, double fromPercent, double toPercent, int steps,
                                           java.util.function.DoubleFunction<Point> evaluate) {
        if (!(fromPercent > 0) || fromPercent > 100) {
            throw InvalidInputException.invalid("curve.fromPercent", fromPercent,
                    "expected a level above 0 and at most 100 % of volume");
        }
        InvalidInputException.requireInRange("curve.toPercent", toPercent, fromPercent, 100, "%");
        if (!(toPercent > fromPercent)) {
            throw InvalidInputException.invalid("curve.toPercent", toPercent,
                    "expected a level above curve.fromPercent (" + fromPercent + " %)");
        }
        InvalidInputException.requireInRange("curve.steps", steps, 1, 200, "");
        List<Double> levels = new ArrayList<>();
        for (int i = 0; i <= steps; i++) {
            levels.add(fromPercent + (toPercent - fromPercent) * i / steps);
        }
        int caseIndex = -1;
        for (int i = 0; i < levels.size(); i++) {
            if (Math.abs(levels.get(i) - casePercent) < 1e-9) {
                caseIndex = i;
            }
        }
        if (caseIndex < 0) {
            int at = 0;
            while (at < levels.size() && levels.get(at) < casePercent) {
                at++;
            }
            levels.add(at, casePercent);
            caseIndex = at;
        }
        List<Point> pts = new ArrayList<>();
        for (double pct : levels) {
            pts.add(evaluate.apply(pct));
        }
        int gov = 0;
        for (int i = 1; i < pts.size(); i++) {
            double wi = pts.get(i).reliefLoadKgPerS();
            double wg = pts.get(gov).reliefLoadKgPerS();
            if (wi > wg * (1 + PLATEAU_TOLERANCE)) {
                gov = i;
            }
        }
        return new FireLoadCurve(pts, gov, caseIndex);
    }
}
