package org.littoral.scenarios.demo;

import java.time.LocalDate;
import java.util.List;

/**
 * One INVENTED campaign day: what the per-day table says about it, the smooth background it is drawn
 * from, and the prescribed fronts (sorted by arrival) that pass the sites.
 *
 * @param date the day
 * @param ambientDirectionDeg direction the ambient (above-breeze) wind blows from, deg
 * @param ambientSpeedMPerS ambient wind speed, m/s
 * @param breezeType pure, corkscrew, backdoor or synoptic, from the ambient wind relative to the coast
 * @param convective whether afternoon convection occurred (flag for composites)
 * @param tags observer's notes (e.g. bay-breeze-first, overcast, strong-offshore, front-stalled)
 * @param background the smooth no-breeze state of the day
 * @param thetaVContrastK land-minus-sea virtual potential temperature contrast that drives the front, K
 * @param breezeDepthM depth of the sea-breeze layer, m
 * @param fronts the prescribed passages at each site, in time order (empty on a null day)
 * @param denseWindowCentreHours per site (same order as {@link DemoCoast#SITES}): the clock time the campaign
 *     team EXPECTED the passage (truth plus a forecast error), around which flights are every 15 min
 * @param seed the day's own seed, so one day can be regenerated without the others
 */
public record DemoDay(LocalDate date, double ambientDirectionDeg, double ambientSpeedMPerS, String breezeType,
                      boolean convective, List<String> tags, Background background, double thetaVContrastK,
                      double breezeDepthM, List<Front> fronts, double[] denseWindowCentreHours, long seed) {

    /**
     * Smooth background of the day (no breeze).
     *
     * @param surfacePressureHPa surface pressure at the sites, hPa
     * @param morningThetaK potential temperature of the morning surface layer, K
     * @param lapseKPerM free-atmosphere d(theta)/dz, K/m
     * @param warmingK mixed-layer warming from morning to mid-afternoon, K
     * @param morningMixingRatioGPerKg morning mixed-layer mixing ratio, g/kg
     * @param convectionStartHours clock time afternoon convection begins (NaN when none)
     */
    public record Background(double surfacePressureHPa, double morningThetaK, double lapseKPerM, double warmingK,
                             double morningMixingRatioGPerKg, double convectionStartHours) {
    }

    /**
     * One prescribed passage at one site (the truth).
     *
     * @param siteIndex index into {@link DemoCoast#SITES}
     * @param kind "sea_breeze" or "bay_breeze"
     * @param arrivalHours clock time the front reaches the site at the ground, hours
     * @param speedMPerS front speed over the ground, m/s
     * @param depthM depth of the air behind this front, m
     * @param directionFromDeg direction the post-front wind blows from, deg
     * @param postFrontSpeedMPerS post-front wind speed in the layer, m/s
     * @param thetaChangeK change of potential temperature behind the front near the ground, K (either sign)
     * @param mixingRatioChangeGPerKg change of mixing ratio behind the front, g/kg (either sign)
     */
    public record Front(int siteIndex, String kind, double arrivalHours, double speedMPerS, double depthM,
                        double directionFromDeg, double postFrontSpeedMPerS, double thetaChangeK,
                        double mixingRatioChangeGPerKg) {
    }

    public boolean isNullDay() {
        return fronts.isEmpty();
    }

    /** Ambient cross-shore wind, m/s, onshore positive (x axis points inland, azimuth bearing + 180). */
    public double ambientCrossShoreMPerS() {
        double[] en = org.littoral.model.coast.Coast.eastNorthFromDirection(ambientSpeedMPerS, ambientDirectionDeg);
        return DemoCoast.coast(date.getDayOfYear()).crossShore(en[0], en[1]);
    }
}
