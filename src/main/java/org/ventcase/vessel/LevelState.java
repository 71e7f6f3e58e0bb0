package org.ventcase.vessel;

/**
 * Everything a relief basis needs from the vessel at one liquid level, computed in one place.
 *
 * @param vessel              the vessel
 * @param levelM              liquid height above the lowest inside point, m
 * @param levelPercentHeight  the same as % of the inside height
 * @param levelPercentVolume  liquid volume as % of the total volume
 * @param totalVolume         m3
 * @param liquidVolume        m3
 * @param vapourVolume        m3
 * @param totalInsideArea     m2
 * @param wettedArea          inside area wetted by liquid, m2
 * @param fire                fire-exposed wetted area with the rule applied
 */
public record LevelState(Vessel vessel, double levelM, double levelPercentHeight, double levelPercentVolume,
                         double totalVolume, double liquidVolume, double vapourVolume, double totalInsideArea,
                         double wettedArea, FireExposedArea fire) {

    /** Evaluates the vessel at a level, with fire exposure. */
    public static LevelState of(Vessel vessel, Level level, FireExposure exposure) {
        double h = vessel.heightOf(level);
        double vl = vessel.liquidVolume(h);
        double vt = vessel.totalVolume();
        return new LevelState(vessel, h, 100.0 * h / vessel.totalHeight(), 100.0 * vl / vt, vt, vl,
                vessel.vapourVolume(h), vessel.totalInsideArea(), vessel.wettedArea(h),
                vessel.fireExposedArea(h, exposure));
    }
}
