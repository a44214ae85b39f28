package org.littoral.model.front;

/**
 * What the front diagnostics read: near-surface fields along x at a series of times (a time-distance section).
 * Arrays are [time][x]; nothing is copied, so callers must not change them while a track is in use.
 *
 * @param timeH times, hours on the caller's clock (the run pipeline passes local clock hours); increasing
 * @param xM cross-shore positions of the columns, m, x positive inland, coast at 0; increasing, evenly spaced
 * @param heightM height of the section above ground, m
 * @param totalCrossShoreMPerS total cross-shore wind (ambient included), onshore positive
 * @param breezeCrossShoreMPerS the breeze: total minus the ambient (or far-field reference) wind at the same height
 * @param totalAlongshoreMPerS total alongshore wind; null to leave direction out (linear theory uses it for
 *        its onshore sector, see {@link FrontCriteria#onshoreHalfWidthDeg})
 * @param thetaVK virtual potential temperature, K; null when the model has none worth using (linear theory)
 * @param fronts true when the model can make a front (the nonlinear model): arrivals are then front passages;
 *        false for linear theory, which has no front: arrivals are then the onset of onshore flow
 * @param zone where the diagnostics may search
 */
public record NearSurfaceSection(double[] timeH, double[] xM, double heightM, double[][] totalCrossShoreMPerS,
                                 double[][] breezeCrossShoreMPerS, double[][] totalAlongshoreMPerS, double[][] thetaVK, boolean fronts, SearchZone zone) {
    public NearSurfaceSection {
        if (timeH == null || timeH.length == 0) {
            throw new IllegalArgumentException("near-surface section: no times");
        }
        if (xM == null || xM.length < 3) {
            throw new IllegalArgumentException("near-surface section: need at least 3 columns");
        }
        if (totalCrossShoreMPerS.length != timeH.length || breezeCrossShoreMPerS.length != timeH.length
                || (thetaVK != null && thetaVK.length != timeH.length)
                || (totalAlongshoreMPerS != null && totalAlongshoreMPerS.length != timeH.length)) {
            throw new IllegalArgumentException("near-surface section: every field needs one row per time (" + timeH.length + ")");
        }
        if (fronts && thetaVK == null) {
            throw new IllegalArgumentException("near-surface section: a model that makes fronts must give theta-v (the density contrast)");
        }
        if (zone == null) {
            throw new IllegalArgumentException("near-surface section: give the search zone");
        }
    }

    public int times() {
        return timeH.length;
    }

    public int columns() {
        return xM.length;
    }

    public double dxM() {
        return xM[1] - xM[0];
    }
}
