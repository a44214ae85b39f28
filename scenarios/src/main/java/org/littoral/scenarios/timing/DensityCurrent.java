package org.littoral.scenarios.timing;

/**
 * Speed of a gravity (density) current, the usual idealisation of a sea-breeze front. Stateless.
 *
 * <ul>
 * <li>Benjamin (1968), J. Fluid Mech. 31, 209-248: a steady current of depth h in a channel of depth H,
 *     energy-conserving limit, U = [g' h (2H - h)(H - h) / (H (H + h))]^(1/2); U/sqrt(g' h) tends to
 *     sqrt(2) as h/H -&gt; 0 and is 1/sqrt(2) at h/H = 1/2 (where U = sqrt(g' H)/2, the lock exchange).</li>
 * <li>Simpson &amp; Britter (1980), QJRMS 106, 485-500 (from memory): against an opposing wind U_o the
 *     front moves at U_f = 0.87 sqrt(g' h) - 0.59 U_o (0.86 and 0.62 are also quoted).</li>
 * <li>Typical sea-breeze fronts move at 1-5 m/s (Simpson 1994, Sea Breeze and Local Winds; from memory).</li>
 * </ul>
 */
public final class DensityCurrent {
    /** Standard gravity, m/s^2. */
    public static final double G = 9.80665;
    /** Simpson &amp; Britter (1980) coefficients, from memory: the two quoted pairs. */
    public static final double SB_FROUDE = 0.87;
    public static final double SB_WIND = 0.59;
    public static final double SB_FROUDE_ALT = 0.86;
    public static final double SB_WIND_ALT = 0.62;
    /** Typical sea-breeze front speeds, m/s (Simpson 1994, from memory). */
    public static final double TYPICAL_MIN_M_PER_S = 1.0;
    public static final double TYPICAL_MAX_M_PER_S = 5.0;

    private DensityCurrent() {
    }

    /** Reduced gravity g' = g dtheta_v / theta_v, m/s^2, from the virtual potential temperature contrast. */
    public static double reducedGravity(double thetaVContrastK, double thetaVK) {
        if (!(thetaVContrastK > 0) || !(thetaVK > 0)) {
            throw new IllegalArgumentException("reduced gravity needs a positive theta-v contrast and theta-v; got "
                    + thetaVContrastK + " K and " + thetaVK + " K");
        }
        return G * thetaVContrastK / thetaVK;
    }

    /**
     * Benjamin (1968) speed of a current of depth h under a layer of total depth H (0 &lt; h &lt; H), m/s.
     * H infinite gives the deep limit sqrt(2 g' h).
     */
    public static double benjaminSpeedMPerS(double reducedGravity, double currentDepthM, double totalDepthM) {
        if (!(reducedGravity > 0) || !(currentDepthM > 0) || !(totalDepthM > currentDepthM)) {
            throw new IllegalArgumentException("Benjamin speed needs g' > 0 and 0 < h < H; got g' = " + reducedGravity
                    + ", h = " + currentDepthM + " m, H = " + totalDepthM + " m");
        }
        if (Double.isInfinite(totalDepthM)) {
            return Math.sqrt(2.0 * reducedGravity * currentDepthM);
        }
        double h = currentDepthM;
        double bigH = totalDepthM;
        return Math.sqrt(reducedGravity * h * (2 * bigH - h) * (bigH - h) / (bigH * (bigH + h)));
    }

    /** Benjamin's Froude number U / sqrt(g' h) as a function of h/H alone. */
    public static double benjaminFroude(double depthRatio) {
        return benjaminSpeedMPerS(1.0, depthRatio, 1.0) / Math.sqrt(depthRatio);
    }

    /**
     * Simpson &amp; Britter (1980) front speed over the ground against an ambient cross-shore wind (from memory):
     * U_f = a sqrt(g' h) + b U_x, with U_x onshore positive (an opposing, offshore wind is U_x &lt; 0).
     */
    public static double simpsonBritterSpeedMPerS(double reducedGravity, double currentDepthM, double crossShoreWindMPerS,
                                                  double froude, double windFactor) {
        return froude * Math.sqrt(reducedGravity * currentDepthM) + windFactor * crossShoreWindMPerS;
    }

    /**
     * The plausible range of front speed over the ground (m/s) for a day: the smallest and largest of
     * Simpson &amp; Britter with both coefficient pairs and of Benjamin's current (relative to the ambient air,
     * plus the full ambient cross-shore wind), over the current depth and contrast ranges given; the lower
     * end is then multiplied by {@code retardationMin} because surface friction and mixing slow real
     * fronts below the laboratory values (our allowance, a setting), and nothing goes below zero.
     * Returns {min, nominal, max}; nominal is Simpson &amp; Britter (0.87, 0.59) at the central values.
     */
    public static double[] plausibleSpeedRangeMPerS(double thetaVContrastK, double contrastUncertaintyK, double thetaVK,
                                                    double depthM, double depthUncertaintyM, double totalDepthM,
                                                    double crossShoreWindMPerS, double retardationMin) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0.0;
        double[] contrasts = {Math.max(0.05, thetaVContrastK - contrastUncertaintyK), thetaVContrastK + contrastUncertaintyK};
        double[] depths = {Math.max(10.0, depthM - depthUncertaintyM), depthM + depthUncertaintyM};
        for (double c : contrasts) {
            for (double h : depths) {
                double gp = reducedGravity(c, thetaVK);
                double[] speeds = {
                    simpsonBritterSpeedMPerS(gp, h, crossShoreWindMPerS, SB_FROUDE, SB_WIND),
                    simpsonBritterSpeedMPerS(gp, h, crossShoreWindMPerS, SB_FROUDE_ALT, SB_WIND_ALT),
                    benjaminSpeedMPerS(gp, h, Math.max(totalDepthM, 1.05 * h)) + crossShoreWindMPerS,
                };
                for (double s : speeds) {
                    lo = Math.min(lo, s);
                    hi = Math.max(hi, s);
                }
            }
        }
        double nominal = simpsonBritterSpeedMPerS(reducedGravity(thetaVContrastK, thetaVK), depthM, crossShoreWindMPerS,
                SB_FROUDE, SB_WIND);
        return new double[] {Math.max(0.0, retardationMin * lo), Math.max(0.0, nominal), Math.max(0.0, hi)};
    }
}
