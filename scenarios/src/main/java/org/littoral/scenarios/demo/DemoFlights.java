package org.littoral.scenarios.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.model.thermo.Thermo;

/**
 * Flights of the INVENTED campaign: the schedule (every 30 min from 07:00 to 18:00, every 15 min within
 * 75 min of the time the team expected the front, a few flights lost, afternoon flights cancelled while a
 * convective storm is near) and the instruments (two temperature and two humidity sensors with lag, bias
 * and noise; wind from the aircraft's attitude, noisy; turbulence in the mixed layer). Raw ascents are
 * sampled at 10 Hz with ascent and descent; binned profiles are 5 m averages of the ascent.
 */
public final class DemoFlights {
    public static final double FIRST_FLIGHT_HOURS = 7.0;
    public static final double LAST_FLIGHT_HOURS = 18.0;
    public static final double CADENCE_HOURS = 0.5;
    public static final double DENSE_CADENCE_HOURS = 0.25;
    public static final double DENSE_HALF_WINDOW_HOURS = 1.25;
    public static final double CEILING_M = 600.0;
    public static final double BIN_M = 5.0;
    public static final double ASCENT_M_PER_S = 3.0;
    public static final double DESCENT_M_PER_S = 5.0;
    public static final double SAMPLE_HZ = 10.0;
    /** Seconds on the ground, logging, before the climb. */
    static final double GROUND_S = 5.0;
    static final double HOVER_S = 3.0;

    /**
     * One planned-and-flown flight.
     *
     * @param binnedGlitch a QC-worthy fault planted in the binned profile ("" for none)
     * @param rawGlitch a QC-worthy fault planted in the raw ascent ("" for none)
     */
    public record Flight(String id, int siteIndex, double takeoffHours, double ceilingM, String binnedGlitch,
                         String rawGlitch, long seed) {
    }

    private DemoFlights() {
    }

    static long mix(long a, long b) {
        long z = a * 0x9E3779B97F4A7C15L + b;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** The flights actually flown at one site on one day, in time order (allocates). */
    public static List<Flight> schedule(DemoDay day, int siteIndex) {
        Random r = new Random(mix(day.seed(), 1000 + siteIndex));
        String site = DemoCoast.SITES.get(siteIndex).name();
        String date = day.date().toString().replace("-", "");
        double centre = day.denseWindowCentreHours()[siteIndex];
        double stormStart = day.background().convectionStartHours();
        List<Flight> out = new ArrayList<>();
        int rhGlitchFlight = -1;
        int windGlitchFlight = -1;
        int n = (int) Math.round((LAST_FLIGHT_HOURS - FIRST_FLIGHT_HOURS) / DENSE_CADENCE_HOURS);
        List<Double> planned = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            double t = FIRST_FLIGHT_HOURS + i * DENSE_CADENCE_HOURS;
            boolean onHalfHour = i % 2 == 0;
            if (onHalfHour || Math.abs(t - centre) <= DENSE_HALF_WINDOW_HOURS) {
                planned.add(t);
            }
        }
        if (day.convective()) {
            rhGlitchFlight = planned.size() - 4 - r.nextInt(3);
        }
        if (r.nextDouble() < 0.12) {
            windGlitchFlight = r.nextInt(planned.size());
        }
        // Raw-file faults on every site-day (seen only when the day is written raw): two humidity spikes
        // over 100 %, one temperature dropout, one flight logged in kelvin.
        int[] rawGlitchFlights = distinct(r, planned.size(), 4);
        for (int i = 0; i < planned.size(); i++) {
            double t = planned.get(i);
            boolean lost = r.nextDouble() < DemoCampaign.MISSING_FLIGHT_FRACTION;
            boolean storm = !Double.isNaN(stormStart) && t >= stormStart && t <= stormStart + 1.25;
            double jitterS = Math.round(60.0 * (-0.5 + 2.0 * r.nextDouble()));
            double ceiling = r.nextDouble() < 0.015 ? 50.0 * (5 + r.nextInt(5)) : CEILING_M; // aborted climbs
            String binnedGlitch = i == rhGlitchFlight ? "rh_over_100" : i == windGlitchFlight ? "wind_speed_spike" : "";
            String rawGlitch = i == rawGlitchFlights[0] || i == rawGlitchFlights[1] ? "rh2_spike"
                    : i == rawGlitchFlights[2] ? "t1_dropout" : i == rawGlitchFlights[3] ? "t1_in_kelvin" : "";
            long seed = r.nextLong();
            if (lost || storm) {
                continue;
            }
            int hh = (int) Math.floor(t + 1e-9);
            int mm = (int) Math.round((t - hh) * 60.0);
            String id = String.format(java.util.Locale.ROOT, "%s-%s-%02d%02d", site, date, hh, mm);
            out.add(new Flight(id, siteIndex, t + jitterS / 3600.0, ceiling, binnedGlitch, rawGlitch, seed));
        }
        return out;
    }

    private static int[] distinct(Random r, int n, int k) {
        int[] out = new int[k];
        for (int j = 0; j < k; j++) {
            int c;
            boolean again;
            do {
                c = r.nextInt(n);
                again = false;
                for (int q = 0; q < j; q++) {
                    again |= out[q] == c;
                }
            } while (again);
            out[j] = c;
        }
        return out;
    }

    /** A binned ascent, edge units: deg C, percent, hPa, m/s, deg. */
    public record BinnedAscent(Flight flight, double[] heightM, double[] pressureHPa, double[] temperatureC,
                               double[] rhPercent, double[] windSpeedMPerS, double[] windDirectionDeg) {
        /** The same ascent as a {@link Profile} (SI), deriving mixing ratio and the rest from T, RH and p. */
        public Profile toProfile(DemoDay day) {
            int n = heightM.length;
            double[] p = new double[n];
            double[] t = new double[n];
            double[] r = new double[n];
            double[] east = new double[n];
            double[] north = new double[n];
            for (int k = 0; k < n; k++) {
                p[k] = 100.0 * pressureHPa[k];
                t[k] = temperatureC[k] + Thermo.T0;
                r[k] = Thermo.mixingRatioFromRelativeHumidity(rhPercent[k] / 100.0, t[k], p[k]);
                double[] en = Coast.eastNorthFromDirection(windSpeedMPerS[k], windDirectionDeg[k]);
                east[k] = en[0];
                north[k] = en[1];
            }
            return Profile.fromState(DemoCoast.SITES.get(flight.siteIndex()).name(), day.date().toString(),
                    flight.takeoffHours(), heightM.clone(), p, t, r, east, north);
        }
    }

    /** Turbulence amplitude scale 0..~2.5: strong in the afternoon mixed layer, larger under convection. */
    private static double turbulence(DemoAtmosphere atm, DemoDay day, double z, double hours) {
        double flux = Math.max(0.0, Math.sin(Math.PI * (hours - 6.0) / 13.0));
        double inside = z < atm.mixedLayerDepthM(hours) ? 1.0 : 0.2;
        double storm = day.convective() && hours >= day.background().convectionStartHours() - 0.5 ? 2.5 : 1.0;
        return flux * inside * storm;
    }

    /** Samples one binned ascent (allocates its arrays). */
    public static BinnedAscent binned(DemoDay day, Flight f) {
        return binned(day, f, 0.0, 0.0);
    }

    /** As {@link #binned(DemoDay, Flight)} with gradual wind turns ({@link DemoAtmosphere} gradual-turn mode). */
    public static BinnedAscent binned(DemoDay day, Flight f, double turnMinutesLo, double turnMinutesHi) {
        DemoAtmosphere atm = new DemoAtmosphere(day, f.siteIndex(), turnMinutesLo, turnMinutesHi);
        Random r = new Random(mix(f.seed(), 1));
        int nBins = (int) Math.floor(f.ceilingM() / BIN_M + 1e-9);
        double[] z = new double[nBins];
        double[] pOut = new double[nBins];
        double[] tOut = new double[nBins];
        double[] rhOut = new double[nBins];
        double[] wsOut = new double[nBins];
        double[] wdOut = new double[nBins];
        double[] pCol = atm.pressureColumnPa(f.takeoffHours(), BIN_M / 2.0, f.ceilingM());
        double[] s = new double[5];
        double tempBias = 0.5 * (0.08 * r.nextGaussian() + 0.08 * r.nextGaussian() + 0.1);
        double rhBias = 0.7 * r.nextGaussian();
        double pBias = 0.3 * r.nextGaussian();
        double phi = Math.exp(-BIN_M / 24.0); // turbulence decorrelates over ~8 s of climb
        double innov = Math.sqrt(1.0 - phi * phi);
        double turbT = 0.0;
        double turbU = 0.0;
        double turbV = 0.0;
        int glitchStart = f.binnedGlitch().equals("rh_over_100") ? nBins / 2 + r.nextInt(nBins / 3)
                : f.binnedGlitch().equals("wind_speed_spike") ? 10 + r.nextInt(Math.max(1, nBins - 20)) : -1;
        int glitchLen = f.binnedGlitch().equals("rh_over_100") ? 3 + r.nextInt(4) : 1;
        for (int k = 0; k < nBins; k++) {
            z[k] = (k + 0.5) * BIN_M;
            double hours = f.takeoffHours() + (GROUND_S + z[k] / ASCENT_M_PER_S) / 3600.0;
            atm.state(z[k], hours, s);
            double p = pCol[2 * k + 1];
            double amp = turbulence(atm, day, z[k], hours);
            turbT = phi * turbT + innov * r.nextGaussian();
            turbU = phi * turbU + innov * r.nextGaussian();
            turbV = phi * turbV + innov * r.nextGaussian();
            double tK = Thermo.temperatureFromPotentialK(s[0], p) + 0.2 * amp * turbT + tempBias + 0.01 * r.nextGaussian();
            double mix = DemoAtmosphere.limitToSaturation(s[1], tK, p);
            double rh = 100.0 * Thermo.relativeHumidity(mix, tK, p) + rhBias + 0.3 * r.nextGaussian();
            rh = Math.max(1.0, Math.min(100.0, rh));
            double east = s[2] + 0.5 * amp * turbU + 0.15 * r.nextGaussian();
            double north = s[3] + 0.5 * amp * turbV + 0.15 * r.nextGaussian();
            double speed = Math.hypot(east, north);
            if (k >= glitchStart && k < glitchStart + glitchLen && glitchStart >= 0) {
                if (f.binnedGlitch().equals("rh_over_100")) {
                    rh = 100.3 + 1.2 * r.nextDouble(); // wetted sensor in convective cloud
                } else {
                    speed = 24.0 + 6.0 * r.nextDouble(); // attitude-estimate spike
                }
            }
            pOut[k] = (p + 100.0 * pBias) / 100.0 + 0.02 * r.nextGaussian();
            tOut[k] = tK - Thermo.T0;
            rhOut[k] = rh;
            wsOut[k] = speed;
            wdOut[k] = Coast.directionFromDeg(east, north);
        }
        return new BinnedAscent(f, z, pOut, tOut, rhOut, wsOut, wdOut);
    }

    /** A raw 10 Hz flight (ascent, hover, descent), edge units; NaN marks a missing sensor value. */
    public record RawFlight(Flight flight, double[] timeS, double[] heightM, double[] pressureHPa,
                            double[] temperatureC1, double[] temperatureC2, double[] rhPercent1, double[] rhPercent2,
                            double[] windSpeedMPerS, double[] windDirectionDeg) {
    }

    /** Samples one raw flight at 10 Hz (allocates its arrays). */
    public static RawFlight raw(DemoDay day, Flight f) {
        DemoAtmosphere atm = new DemoAtmosphere(day, f.siteIndex());
        Random r = new Random(mix(f.seed(), 2));
        double climbS = f.ceilingM() / ASCENT_M_PER_S;
        double descentS = f.ceilingM() / DESCENT_M_PER_S;
        double totalS = GROUND_S + climbS + HOVER_S + descentS + 2.0;
        int n = (int) Math.floor(totalS * SAMPLE_HZ);
        double dt = 1.0 / SAMPLE_HZ;
        double[] ts = new double[n];
        double[] zs = new double[n];
        double[] ps = new double[n];
        double[] t1 = new double[n];
        double[] t2 = new double[n];
        double[] h1 = new double[n];
        double[] h2 = new double[n];
        double[] ws = new double[n];
        double[] wd = new double[n];
        double colDz = 1.0;
        double[] pCol = atm.pressureColumnPa(f.takeoffHours(), colDz, f.ceilingM() + 2.0);
        double[] s = new double[5];
        double bias1 = 0.08 * r.nextGaussian();
        double bias2 = 0.08 * r.nextGaussian() + 0.1;
        double rhBias1 = r.nextGaussian();
        double rhBias2 = r.nextGaussian();
        double pBias = 0.3 * r.nextGaussian();
        // First-order sensor lags (s): slower for the humidity sensors (common practice for small sensors).
        double tau1 = 1.2;
        double tau2 = 2.0;
        double tauH1 = 2.5;
        double tauH2 = 4.0;
        double phi = Math.exp(-dt / 8.0); // turbulence correlation time ~8 s
        double innov = Math.sqrt(1.0 - phi * phi);
        double turbT = 0.0;
        double turbU = 0.0;
        double turbV = 0.0;
        double y1 = Double.NaN;
        double y2 = Double.NaN;
        double yh1 = Double.NaN;
        double yh2 = Double.NaN;
        int glitchAt = (int) ((GROUND_S + (0.2 + 0.6 * r.nextDouble()) * climbS) * SAMPLE_HZ);
        for (int i = 0; i < n; i++) {
            double t = i * dt;
            double z;
            if (t < GROUND_S) {
                z = 0.3;
            } else if (t < GROUND_S + climbS) {
                double tau = t - GROUND_S; // climb rate varies by +-3 % with a 44 s period
                z = 0.3 + ASCENT_M_PER_S * (tau + 0.03 * 7.0 * (1.0 - Math.cos(tau / 7.0)));
            } else if (t < GROUND_S + climbS + HOVER_S) {
                z = f.ceilingM();
            } else {
                z = Math.max(0.3, f.ceilingM() - DESCENT_M_PER_S * (t - GROUND_S - climbS - HOVER_S));
            }
            z = Math.min(z, f.ceilingM());
            double hours = f.takeoffHours() + t / 3600.0;
            atm.state(z, hours, s);
            int kc = Math.min(pCol.length - 2, (int) (z / colDz));
            double frac = z / colDz - kc;
            double p = pCol[kc] * (1.0 - frac) + pCol[kc + 1] * frac;
            double amp = turbulence(atm, day, z, hours);
            turbT = phi * turbT + innov * r.nextGaussian();
            turbU = phi * turbU + innov * r.nextGaussian();
            turbV = phi * turbV + innov * r.nextGaussian();
            double tK = Thermo.temperatureFromPotentialK(s[0], p) + 0.25 * amp * turbT;
            double mix = DemoAtmosphere.limitToSaturation(s[1], tK, p);
            double rh = 100.0 * Thermo.relativeHumidity(mix, tK, p);
            if (i == 0) {
                y1 = tK;
                y2 = tK;
                yh1 = rh;
                yh2 = rh;
            }
            y1 += (tK - y1) * dt / tau1;
            y2 += (tK - y2) * dt / tau2;
            yh1 += (rh - yh1) * dt / tauH1;
            yh2 += (rh - yh2) * dt / tauH2;
            double east = s[2] + 0.6 * amp * turbU + 0.4 * r.nextGaussian();
            double north = s[3] + 0.6 * amp * turbV + 0.4 * r.nextGaussian();
            ts[i] = t;
            zs[i] = Math.max(0.0, z + 0.15 * r.nextGaussian());
            ps[i] = (p + 100.0 * pBias) / 100.0 + 0.04 * r.nextGaussian();
            t1[i] = y1 - Thermo.T0 + bias1 + 0.03 * r.nextGaussian();
            t2[i] = y2 - Thermo.T0 + bias2 + 0.03 * r.nextGaussian();
            h1[i] = Math.max(1.0, Math.min(100.0, yh1 + rhBias1 + 0.3 * r.nextGaussian()));
            h2[i] = Math.max(1.0, Math.min(100.0, yh2 + rhBias2 + 0.3 * r.nextGaussian()));
            ws[i] = Math.hypot(east, north);
            wd[i] = Coast.directionFromDeg(east, north);
            switch (f.rawGlitch()) {
                case "rh2_spike" -> {
                    if (i >= glitchAt && i < glitchAt + 8) {
                        h2[i] = 103.0 + 5.0 * r.nextDouble();
                    }
                }
                case "t1_dropout" -> {
                    if (i >= glitchAt && i < glitchAt + 30) {
                        t1[i] = Double.NaN;
                    }
                }
                case "t1_in_kelvin" -> t1[i] += Thermo.T0; // logger set to kelvin for this flight
                default -> {
                }
            }
        }
        return new RawFlight(f, ts, zs, ps, t1, t2, h1, h2, ws, wd);
    }
}
