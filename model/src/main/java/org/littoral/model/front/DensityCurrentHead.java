package org.littoral.model.front;

import org.littoral.model.field.Snapshot;
import org.littoral.model.thermo.Thermo;

/**
 * The head of a breeze front seen as a density current (Benjamin 1968; Simpson &amp; Britter 1980; Simpson 1994):
 * its depth, the virtual-potential-temperature deficit of the air in it and the wind it runs against, read from
 * one snapshot around a known front position. Physics only, stateless.
 *
 * <p>Behind the front means the columns {@code gapM} to {@code gapM + widthM} seaward of it, ahead the same
 * distance landward. The <b>depth</b> h is where the mean breeze cross-shore wind behind the front (total minus
 * the far-field reference at the same height) first turns from onshore to offshore above the lowest level: the
 * top of the onshore flow. The <b>deficit</b> is the mean theta-v over 0..h ahead minus behind (positive: denser
 * air behind), g' = g deficit / theta-v ahead. The <b>ambient wind</b> is the mean total cross-shore wind over
 * 0..h ahead (onshore positive; an opposing offshore wind is negative).
 *
 * @param depthM h, m (NaN when the onshore flow behind has no top below the lid)
 * @param thetaVDeficitK theta-v ahead minus behind, mean over 0..h, K
 * @param thetaVAheadK mean theta-v over 0..h ahead, K
 * @param ambientCrossShoreMPerS mean total cross-shore wind over 0..h ahead, m/s
 */
public record DensityCurrentHead(double depthM, double thetaVDeficitK, double thetaVAheadK, double ambientCrossShoreMPerS) {
    /** Default distance between the front and the columns read behind and ahead of it, m. */
    public static final double GAP_M = 2_000.0;
    /** Default width of the stretch read behind and ahead, m. */
    public static final double WIDTH_M = 6_000.0;

    /** Reduced gravity g' = g deficit / theta-v ahead, m/s^2 (NaN unless the deficit is positive). */
    public double reducedGravity() {
        return thetaVDeficitK > 0 ? Thermo.G * thetaVDeficitK / thetaVAheadK : Double.NaN;
    }

    /**
     * Reads the head around the front at {@code frontXM}.
     *
     * @param s total fields at one time
     * @param xM column positions, m
     * @param zM level heights, m
     * @param referenceUMPerS the far-field (ambient) cross-shore wind at each level, m/s
     */
    public static DensityCurrentHead at(Snapshot s, double[] xM, double[] zM, double[] referenceUMPerS, double frontXM,
                                        double gapM, double widthM) {
        int nx = s.nx();
        int nz = s.nz();
        double[] uBehind = new double[nz];
        double[] tvBehind = new double[nz];
        double[] tvAhead = new double[nz];
        double[] uAhead = new double[nz];
        int nb = 0;
        int na = 0;
        for (int i = 0; i < nx; i++) {
            double d = xM[i] - frontXM;
            boolean behind = d <= -gapM && d >= -gapM - widthM;
            boolean ahead = d >= gapM && d <= gapM + widthM;
            if (!behind && !ahead) {
                continue;
            }
            for (int k = 0; k < nz; k++) {
                int n = k * nx + i;
                double tv = Thermo.virtualPotentialTemperatureK(s.thetaK()[n], s.mixingRatioKgPerKg()[n]);
                if (behind) {
                    uBehind[k] += s.uMPerS()[n] - referenceUMPerS[k];
                    tvBehind[k] += tv;
                } else {
                    uAhead[k] += s.uMPerS()[n];
                    tvAhead[k] += tv;
                }
            }
            if (behind) {
                nb++;
            } else {
                na++;
            }
        }
        if (nb == 0 || na == 0) {
            return new DensityCurrentHead(Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double depth = Double.NaN;
        for (int k = 1; k < nz; k++) {
            double a = uBehind[k - 1] / nb;
            double b = uBehind[k] / nb;
            if (a > 0 && b <= 0) {
                depth = zM[k - 1] + (zM[k] - zM[k - 1]) * a / (a - b);
                break;
            }
        }
        if (Double.isNaN(depth)) {
            return new DensityCurrentHead(Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        // layer means over 0..depth, weighting each level by the part of 0..depth it represents
        double w = 0;
        double tb = 0;
        double ta = 0;
        double ua = 0;
        for (int k = 0; k < nz; k++) {
            double lo = k == 0 ? 0.0 : 0.5 * (zM[k - 1] + zM[k]);
            double hi = k == nz - 1 ? zM[k] : 0.5 * (zM[k] + zM[k + 1]);
            double part = Math.max(0.0, Math.min(hi, depth) - lo);
            if (part <= 0) {
                continue;
            }
            w += part;
            tb += part * tvBehind[k] / nb;
            ta += part * tvAhead[k] / na;
            ua += part * uAhead[k] / na;
        }
        return new DensityCurrentHead(depth, (ta - tb) / w, ta / w, ua / w);
    }
}
