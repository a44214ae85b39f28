package org.littoral.scenarios.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.littoral.model.coast.Coast;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.analysis.ingest.RawFlight;

/**
 * INVENTED raw 10 Hz drone flights for benchmarks and tests, independent of the littoral models:
 * a smooth well-mixed background (dry-adiabatic lapse, uniform mixing ratio, diurnal warming), a
 * prescribed front at a given time (wind turns onshore in a layer of given depth, with cooling and
 * moistening), optionally an earlier, weaker bay-breeze front, sensor noise with a seed, two
 * temperature and two humidity sensors, and a descent after each ascent. Not data.
 */
public final class SyntheticAscents {
    private SyntheticAscents() {
    }

    /**
     * One invented day at one site.
     *
     * @param frontHours     local time of the sea-breeze front (NaN: no breeze)
     * @param bayFrontHours  local time of an earlier bay-breeze front (NaN: none)
     * @param ambient        ambient wind {east, north}, m/s
     * @param onshoreMPerS   onshore speed behind the sea-breeze front (70 % of it behind the bay-breeze front)
     */
    public record DaySpec(String site, String day, Coast coast, double[] ambient, double frontHours, double bayFrontHours,
                          double onshoreMPerS, double breezeDepthM, double coolingK, double moisteningGPerKg,
                          double firstFlightHours, double lastFlightHours, double cadenceHours, double ceilingM,
                          double sampleHz, long seed) {

        /** A typical day: flights every 30 min 08:00-18:00 to 600 m at 10 Hz. */
        public static DaySpec typical(String site, String day, Coast coast, double[] ambient, double frontHours,
                                      double bayFrontHours, long seed) {
            return new DaySpec(site, day, coast, ambient, frontHours, bayFrontHours, 5.0, 500.0, 2.0, 1.5, 8.0, 18.0,
                    0.5, 600.0, 10.0, seed);
        }
    }

    /** Generates the flights of a day. Allocates every flight (about 6000 samples each at 10 Hz). */
    public static List<RawFlight> day(DaySpec d) {
        Random rnd = new Random(d.seed());
        List<RawFlight> out = new ArrayList<>();
        int k = 0;
        for (double t = d.firstFlightHours(); t <= d.lastFlightHours() + 1e-9; t += d.cadenceHours()) {
            out.add(flight(d, "F" + (++k), t + 0.02 * rnd.nextGaussian() * d.cadenceHours(), rnd));
        }
        return out;
    }

    static RawFlight flight(DaySpec d, String id, double launchHours, Random rnd) {
        double ascent = 2.0;
        double descent = 3.0;
        double hz = d.sampleHz();
        int nGround = (int) (5 * hz);
        int nUp = (int) Math.ceil(d.ceilingM() / ascent * hz);
        int nDown = (int) Math.ceil(d.ceilingM() / descent * hz);
        int n = nGround + nUp + nDown;
        double[] ts = new double[n];
        double[] z = new double[n];
        double[] p = new double[n];
        double[][] tk = new double[2][n];
        double[][] rh = new double[2][n];
        double[] ue = new double[n];
        double[] vn = new double[n];
        Coast c = d.coast();
        boolean sea = !Double.isNaN(d.frontHours()) && launchHours > d.frontHours();
        boolean bay = !sea && !Double.isNaN(d.bayFrontHours()) && launchHours > d.bayFrontHours();
        double strength = sea ? 1.0 : bay ? 0.7 : 0.0;
        double cool = sea ? d.coolingK() : bay ? 0.3 * d.coolingK() : 0.0;
        double moist = sea ? d.moisteningGPerKg() : bay ? 0.3 * d.moisteningGPerKg() : 0.0;
        // Diurnal warming of the mixed layer, K: 0 at 06 h, +6 K at 15 h (invented).
        double warm = 6.0 * Math.max(0.0, Math.sin(Math.PI * (launchHours - 6.0) / 18.0));
        double onE = c.eastward(d.onshoreMPerS() * strength, 0.0);
        double onN = c.northward(d.onshoreMPerS() * strength, 0.0);
        double gustE = 0.4 * rnd.nextGaussian();
        double gustN = 0.4 * rnd.nextGaussian();
        for (int i = 0; i < n; i++) {
            ts[i] = i / hz;
            double h;
            if (i < nGround) {
                h = 0.0;
            } else if (i < nGround + nUp) {
                h = Math.min(d.ceilingM(), (i - nGround + 1) * ascent / hz);
            } else {
                h = Math.max(0.0, d.ceilingM() - (i - nGround - nUp + 1) * descent / hz);
            }
            z[i] = h + 0.3 * rnd.nextGaussian();
            double inBreeze = Math.max(0.0, 1.0 - h / d.breezeDepthM());
            double tK = 293.15 + warm - 0.0098 * h - cool * inBreeze;
            double pPa = 101300.0 * Math.exp(-h / 8400.0);
            double r = (9.0 + moist * inBreeze) / 1000.0;
            double rhTrue = Math.min(1.0, Thermo.relativeHumidity(r, tK, pPa));
            p[i] = pPa + 10.0 * rnd.nextGaussian();
            for (int s = 0; s < 2; s++) {
                tk[s][i] = tK + 0.1 * rnd.nextGaussian();
                rh[s][i] = rhTrue + 0.01 * rnd.nextGaussian();
            }
            double below = h < d.breezeDepthM() ? 1.0 : 0.0;
            double amb = 1.0 - 0.7 * strength * below;
            ue[i] = d.ambient()[0] * amb + onE * below + gustE + 0.5 * rnd.nextGaussian();
            vn[i] = d.ambient()[1] * amb + onN * below + gustN + 0.5 * rnd.nextGaussian();
        }
        return new RawFlight(d.site(), d.day(), id, launchHours, ts, z, p, tk, rh, null, ue, vn, "memory", 0);
    }
}
