package org.littoral.model.front;

import java.util.Locale;

/**
 * The thresholds of the front definition (docs/fronts.md). A front at time t is the landward edge of the
 * onshore breeze flow connected to the coast where (a) the near-surface wind converges most, (b) the mean
 * cross-shore wind drops by at least {@code minJumpMPerS} from the {@code sideWindowM} behind it to the
 * {@code sideWindowM} ahead of it, with onshore flow behind, and (c) the air behind is denser: its mean
 * virtual potential temperature is at least {@code minThetaVContrastK} below the mean ahead. That is the
 * head of a density current (Benjamin 1968; Simpson 1994): a sharp shift to onshore wind with
 * convergence and cooler, usually moister, air behind it.
 *
 * @param onshoreThresholdMPerS onshore means a total cross-shore wind AND a breeze wind of at least this, m/s
 * @param minJumpMPerS smallest drop of the mean cross-shore wind across the front, m/s; default 1.0, the
 *        smallest wind change the analysis chain accepts as a passage (DetectionSettings.minVectorChangeMPerS)
 * @param minThetaVContrastK smallest theta-v deficit of the air behind the front, K (default 0.3)
 * @param frontWindowM the convergence maximum is searched within this distance of the onshore reach, m
 * @param sideWindowM width of the windows behind and ahead of the front for the jump and the contrast, m
 * @param onshoreHalfWidthDeg linear theory only (its leading edge is the onshore flow itself): the total wind must
 *        also lie within this many degrees of the inland direction, the analysis chain's onshore sector
 *        (DetectionSettings.onshoreHalfWidthDeg, default 60)
 */
public record FrontCriteria(double onshoreThresholdMPerS, double minJumpMPerS, double minThetaVContrastK, double frontWindowM,
                            double sideWindowM, double onshoreHalfWidthDeg) {
    public static final double DEFAULT_MIN_JUMP_M_PER_S = 1.0;
    public static final double DEFAULT_MIN_THETA_V_CONTRAST_K = 0.3;
    public static final double DEFAULT_FRONT_WINDOW_M = 5_000.0;
    public static final double DEFAULT_SIDE_WINDOW_M = 5_000.0;
    public static final double DEFAULT_ONSHORE_HALF_WIDTH_DEG = 60.0;

    public FrontCriteria {
        if (!(onshoreThresholdMPerS >= 0) || !(minJumpMPerS > 0) || !(minThetaVContrastK >= 0) || !(frontWindowM > 0)
                || !(sideWindowM > 0) || !(onshoreHalfWidthDeg > 0 && onshoreHalfWidthDeg <= 90)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "front criteria: need threshold >= 0, jump > 0, contrast >= 0 "
                    + ", positive windows and a sector half-width in (0, 90] deg; got %g m/s, %g m/s, %g K, %g m, %g m, %g deg",
                    onshoreThresholdMPerS, minJumpMPerS, minThetaVContrastK, frontWindowM, sideWindowM, onshoreHalfWidthDeg));
        }
    }

    /** The standard criteria with the given onshore threshold (a scenario's output.onshore_threshold_m_per_s). */
    public static FrontCriteria standard(double onshoreThresholdMPerS) {
        return new FrontCriteria(onshoreThresholdMPerS, DEFAULT_MIN_JUMP_M_PER_S, DEFAULT_MIN_THETA_V_CONTRAST_K,
                DEFAULT_FRONT_WINDOW_M, DEFAULT_SIDE_WINDOW_M, DEFAULT_ONSHORE_HALF_WIDTH_DEG);
    }

    /** One sentence stating exactly what is computed, for a summary's "definitions" line. */
    public String describe(boolean fronts, double heightM) {
        String onshore = String.format(Locale.ROOT, "onshore = total cross-shore wind and breeze wind (total minus ambient) both "
                + ">= %s m/s at %s m", num(onshoreThresholdMPerS), num(heightM));
        if (!fronts) {
            return onshore + String.format(Locale.ROOT, " with the total wind within %s deg of the inland direction", num(onshoreHalfWidthDeg))
                    + "; linear theory has no front: the onshore reach is the landward edge of the onshore flow connected "
                    + "to the coast, onset at the coast and arrival at a site are the first output-interpolated times the reach "
                    + "gets there, penetration is its farthest extent";
        }
        return onshore + String.format(Locale.ROOT, "; the front is where the near-surface convergence peaks within %s km of the "
                        + "landward edge of the onshore flow connected to the coast, counted only where the mean cross-shore wind "
                        + "drops by >= %s m/s from the %s km behind to the %s km ahead (onshore behind) and theta-v behind is "
                        + ">= %s K lower, and only when found at two consecutive output times no more than 10 m/s apart; "
                        + "onset at the coast and arrival at a site are the first times the front gets there "
                        + "(interpolated between output times), penetration is its farthest position; no front, no onset, "
                        + "arrival or penetration", num(frontWindowM / 1000.0), num(minJumpMPerS), num(sideWindowM / 1000.0),
                num(sideWindowM / 1000.0), num(minThetaVContrastK));
    }

    private static String num(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
