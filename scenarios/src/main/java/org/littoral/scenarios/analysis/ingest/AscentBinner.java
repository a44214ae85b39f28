package org.littoral.scenarios.analysis.ingest;

import java.util.Locale;
import org.littoral.model.sounding.Profile;
import org.littoral.model.thermo.Thermo;

/**
 * Turns one raw flight into a binned {@link Profile}: keeps the ascending part (from the lowest
 * sample before the highest one, up to the highest), averages the temperature and humidity
 * sensors, converts RH to mixing ratio with Bolton (1980) eq. 10, and averages samples into height
 * bins of a fixed step centred on multiples of the step. Wind is averaged as a vector. Derived
 * quantities (RH, dewpoint, theta, theta-v, theta-e) come from {@link Profile#fromState}.
 */
public final class AscentBinner {
    private AscentBinner() {
    }

    /** Bins a flight; returns null (and logs why) when it has too few ascending samples. Allocates the profile. */
    public static Profile bin(RawFlight f, IngestSettings s, QcLog log) {
        int n = f.size();
        String prof = "flight " + f.flightId();
        int iMax = -1;
        double zMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            if (f.heightM()[i] > zMax) {
                zMax = f.heightM()[i];
                iMax = i;
            }
        }
        if (iMax < 0) {
            log.add(f.file(), f.firstLine(), f.day(), f.site(), prof, ProfileColumns.HEIGHT_M, "", QcLog.Action.REMOVED_PROFILE,
                    "flight-without-heights", "no valid height in the flight");
            return null;
        }
        int i0 = 0;
        double zMin = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= iMax; i++) {
            if (f.heightM()[i] < zMin) {
                zMin = f.heightM()[i];
                i0 = i;
            }
        }
        int before = i0;
        int after = n - 1 - iMax;
        if (before > 0) {
            log.add(f.file(), f.firstLine(), f.day(), f.site(), prof, ProfileColumns.HEIGHT_M, Integer.toString(before),
                    QcLog.Action.REMOVED_SAMPLE, "pre-launch-samples", before + " samples before the lowest point of the ascent");
        }
        if (after > 0 && !s.useDescent) {
            log.add(f.file(), f.firstLine(), f.day(), f.site(), prof, ProfileColumns.HEIGHT_M, Integer.toString(after),
                    QcLog.Action.REMOVED_SAMPLE, "descent-samples", after + " samples after the top of the ascent (descent kept out)");
        }
        return binRange(f, s, log, i0, iMax, zMin, zMax, prof, "ascent");
    }

    /**
     * The descending part of a flight (from the top down to the lowest sample after it) as a profile of its own, timed
     * at the start of the descent; null (logged) when it has too few samples. Used with ingest.useDescent.
     */
    public static Profile binDescent(RawFlight f, IngestSettings s, QcLog log) {
        int n = f.size();
        String prof = "flight " + f.flightId() + " descent";
        int iMax = -1;
        double zMax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            if (f.heightM()[i] > zMax) {
                zMax = f.heightM()[i];
                iMax = i;
            }
        }
        if (iMax < 0) {
            return null;
        }
        int i1 = iMax;
        double zMin = Double.POSITIVE_INFINITY;
        for (int i = iMax; i < n; i++) {
            if (f.heightM()[i] < zMin) {
                zMin = f.heightM()[i];
                i1 = i;
            }
        }
        return binRange(f, s, log, iMax, i1, zMin, zMax, prof, "descent");
    }

    private static Profile binRange(RawFlight f, IngestSettings s, QcLog log, int i0, int iMax, double zMin, double zMax,
                                    String prof, String part) {
        int m = iMax - i0 + 1;
        if (m < s.minAscentSamples) {
            log.add(f.file(), f.firstLine(), f.day(), f.site(), prof, ProfileColumns.HEIGHT_M, Integer.toString(m),
                    QcLog.Action.REMOVED_PROFILE, "short-" + part, "only " + m + " " + part + " samples (< " + s.minAscentSamples + ")");
            return null;
        }
        double step = s.binStepM;
        int kLo = (int) Math.round(Math.max(zMin, 0.0) / step);
        if (zMin < 0) {
            kLo = (int) Math.round(zMin / step);
        }
        int kHi = (int) Math.round(zMax / step);
        int nb = kHi - kLo + 1;
        double[] z = new double[nb];
        double[] sp = new double[nb];
        double[] st = new double[nb];
        double[] sr = new double[nb];
        double[] se = new double[nb];
        double[] sn = new double[nb];
        int[] np = new int[nb];
        int[] nt = new int[nb];
        int[] nr = new int[nb];
        int[] nw = new int[nb];
        double[][] ts = f.temperatureSensorsK();
        double[][] hs = f.rhSensors();
        double[] mr = f.mixingRatioKgPerKg();
        for (int i = i0; i <= iMax; i++) {
            double h = f.heightM()[i];
            if (Double.isNaN(h)) {
                continue;
            }
            int b = (int) Math.round(h / step) - kLo;
            double t = sensorMean(ts, i);
            double p = f.pressurePa()[i];
            if (!Double.isNaN(p)) {
                sp[b] += p;
                np[b]++;
            }
            if (!Double.isNaN(t)) {
                st[b] += t;
                nt[b]++;
            }
            double r;
            if (mr != null) {
                r = mr[i];
            } else {
                double rh = sensorMean(hs, i);
                r = Double.isNaN(rh) || Double.isNaN(t) || Double.isNaN(p) ? Double.NaN
                        : Thermo.mixingRatioFromRelativeHumidity(rh, t, p);
            }
            if (!Double.isNaN(r)) {
                sr[b] += r;
                nr[b]++;
            }
            double ue = f.windEastMPerS()[i];
            double vn = f.windNorthMPerS()[i];
            if (!Double.isNaN(ue) && !Double.isNaN(vn)) {
                se[b] += ue;
                sn[b] += vn;
                nw[b]++;
            }
        }
        for (int b = 0; b < nb; b++) {
            z[b] = (b + kLo) * step;
            sp[b] = np[b] > 0 ? sp[b] / np[b] : Double.NaN;
            st[b] = nt[b] > 0 ? st[b] / nt[b] : Double.NaN;
            sr[b] = nr[b] > 0 ? sr[b] / nr[b] : Double.NaN;
            se[b] = nw[b] > 0 ? se[b] / nw[b] : Double.NaN;
            sn[b] = nw[b] > 0 ? sn[b] / nw[b] : Double.NaN;
        }
        double launchHours = f.startTimeHours() + f.timeS()[i0] / 3600.0;
        return ProfileDerivation.profile(f.site(), f.day(), launchHours, z, sp, st, sr, se, sn);
    }

    private static double sensorMean(double[][] sensors, int i) {
        if (sensors == null) {
            return Double.NaN;
        }
        double sum = 0;
        int c = 0;
        for (double[] s : sensors) {
            double v = s[i];
            if (!Double.isNaN(v)) {
                sum += v;
                c++;
            }
        }
        return c > 0 ? sum / c : Double.NaN;
    }

    static String hours(double h) {
        return String.format(Locale.ROOT, "%.4f", h);
    }
}
