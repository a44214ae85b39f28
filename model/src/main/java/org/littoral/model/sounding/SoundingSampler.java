package org.littoral.model.sounding;

import org.littoral.model.grid.Bracket;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.littoral.model.coast.Coast;
import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.FieldSampling;
import org.littoral.model.field.Snapshot;
import org.littoral.model.thermo.Thermo;

/**
 * Flies virtual drones through a {@link BreezeSolution}: at every launch of a {@link FlightSchedule}
 * and every {@link VirtualSite}, one binned ascent as a {@link Profile}.
 *
 * <p>Sampling: fields are interpolated bilinearly in (x, z) and linearly in time between evaluation
 * nodes spaced at most {@link SoundingSpec#maxNodeSpacingSec()} apart through each ascent (the bin at
 * height z is taken at launch + z / ascent rate, see {@link SoundingSpec}). Pressure is the
 * background hydrostatic pressure (log-linear in z) plus the interpolated perturbation; temperature
 * follows from theta and p by Poisson's equation; winds go to earth components through {@link Coast}.
 * All sites flown at the same launch share one evaluation of the solution per node.
 */
public final class SoundingSampler {
    private final BreezeSolution solution;
    private final Coast coast;
    private final List<VirtualSite> sites;
    private final FlightSchedule schedule;
    private final SoundingSpec spec;
    private final boolean periodic;

    private final double[] xM;
    private final double[] zM;
    private final int nx;
    private final int nz;
    private final double[] binZ;
    private final int[] binLevel;
    private final double[] binLevelWeight;
    private final double[] binBackgroundPressurePa;
    private final int[] siteColumn;
    private final double[] siteColumnWeight;

    public SoundingSampler(BreezeSolution solution, Coast coast, List<VirtualSite> sites, FlightSchedule schedule,
                           SoundingSpec spec) {
        this(solution, coast, sites, schedule, spec, false);
    }

    /**
     * @param periodic true when the solution repeats with the period endSec - startSec (the linear
     *                 model's diurnal solution): times outside the span are wrapped into it instead of rejected
     */
    public SoundingSampler(BreezeSolution solution, Coast coast, List<VirtualSite> sites, FlightSchedule schedule,
                           SoundingSpec spec, boolean periodic) {
        this.periodic = periodic;
        this.solution = solution;
        this.coast = coast;
        this.sites = List.copyOf(sites);
        this.schedule = schedule;
        this.spec = spec;
        this.xM = solution.xM();
        this.zM = solution.zM();
        this.nx = xM.length;
        this.nz = zM.length;
        if (spec.ceilingM() > zM[nz - 1]) {
            throw new IllegalArgumentException("altitude ceiling " + spec.ceilingM() + " m is above the model top "
                    + zM[nz - 1] + " m; lower the ceiling or raise the grid top");
        }
        binZ = spec.binCentresM();
        int nb = binZ.length;
        binLevel = new int[nb];
        binLevelWeight = new double[nb];
        binBackgroundPressurePa = new double[nb];
        Background bg = solution.background();
        for (int b = 0; b < nb; b++) {
            int k = Bracket.index(zM, binZ[b]);
            binLevel[b] = k;
            binLevelWeight[b] = Bracket.upperWeight(zM, k, binZ[b]);
            // hydrostatic pressure is close to exponential in z: interpolate its logarithm
            double w = binLevelWeight[b];
            binBackgroundPressurePa[b] = Math.exp((1 - w) * Math.log(bg.pressurePa()[k]) + w * Math.log(bg.pressurePa()[k + 1]));
        }
        siteColumn = new int[this.sites.size()];
        siteColumnWeight = new double[this.sites.size()];
        for (int s = 0; s < this.sites.size(); s++) {
            VirtualSite site = this.sites.get(s);
            double x = site.inlandDistanceM();
            if (x < xM[0] || x > xM[nx - 1]) {
                throw new IllegalArgumentException("site '" + site.name() + "' at " + x / 1000.0 + " km inland is outside the model domain "
                        + xM[0] / 1000.0 + " to " + xM[nx - 1] / 1000.0 + " km; move the site or widen the domain");
            }
            siteColumn[s] = Bracket.index(xM, x);
            siteColumnWeight[s] = Bracket.upperWeight(xM, siteColumn[s], x);
        }
    }

    /** Model time (s of local solar time since solar midnight of day 0) of a local clock time on the spec's day. */
    public double modelTimeSec(double clockHours) {
        return coast.solarHoursFromClock(clockHours) * 3600.0 + spec.dayIndex() * 86400.0;
    }

    /** All profiles, ordered by launch time, then by site in the order given (allocates). */
    public List<Profile> sampleAll() {
        return sample(false);
    }

    /**
     * The profiles of the flights that fit inside the solution's span, skipping the others (for a run that
     * stopped early); for a periodic solution the same as {@link #sampleAll()}.
     */
    public List<Profile> sampleFlightsInsideSpan() {
        return sample(true);
    }

    private List<Profile> sample(boolean skipOutside) {
        List<Double> launches = schedule.launchTimesClockHours();
        List<Profile> out = new ArrayList<>(launches.size() * sites.size());
        Random rng = spec.noise() == null ? null : new Random(spec.noise().seed());
        double ascentSec = spec.ceilingM() / spec.ascentRateMPerS();
        int nodes = Math.max(1, (int) Math.ceil(ascentSec / spec.maxNodeSpacingSec() - 1e-9));
        double nodeStep = ascentSec / nodes;
        int ns = sites.size();
        // column values at each node and site, five variables: [node][site][var][level]
        double[][][][] cols = new double[nodes + 1][ns][5][nz];
        for (double clockH : launches) {
            double t0 = modelTimeSec(clockH);
            if (!periodic && (t0 < solution.startSec() - 1e-6 || t0 + ascentSec > solution.endSec() + 1e-6)) {
                if (skipOutside) {
                    continue;
                }
                throw new IllegalArgumentException("flight at " + clockH + " h local clock (model time " + t0
                        + " s) is outside the solution's span " + solution.startSec() + " to " + solution.endSec()
                        + " s; narrow the flight window or lengthen the run");
            }
            for (int j = 0; j <= nodes; j++) {
                fillColumns(t0 + j * nodeStep, cols[j]);
            }
            for (int s = 0; s < ns; s++) {
                out.add(buildProfile(sites.get(s).name(), clockH, cols, s, nodeStep, rng));
            }
        }
        return out;
    }

    /** t wrapped into [startSec, endSec) for a periodic solution; unchanged otherwise. */
    private double inSpan(double t) {
        if (!periodic) {
            return t;
        }
        double period = solution.endSec() - solution.startSec();
        return solution.startSec() + ((t - solution.startSec()) % period + period) % period;
    }

    private void fillColumns(double t, double[][][] perSite) {
        if (solution instanceof FieldSampling fast) {
            // Column fast path (the linear model: O(harmonics x nz) per column once a position is cached) on the
            // same two bracketing grid columns and weights as the snapshot path, so results agree to round-off.
            double tt = inSpan(t);
            for (int s = 0; s < siteColumn.length; s++) {
                int i = siteColumn[s];
                double w = siteColumnWeight[s];
                Snapshot a = fast.columnAt(xM[i], tt);
                Snapshot b = w == 0 ? a : fast.columnAt(xM[i + 1], tt);
                double[][] c = perSite[s];
                for (int k = 0; k < nz; k++) {
                    c[0][k] = (1 - w) * a.uMPerS()[k] + w * b.uMPerS()[k];
                    c[1][k] = (1 - w) * a.vMPerS()[k] + w * b.vMPerS()[k];
                    c[2][k] = (1 - w) * a.thetaK()[k] + w * b.thetaK()[k];
                    c[3][k] = (1 - w) * a.mixingRatioKgPerKg()[k] + w * b.mixingRatioKgPerKg()[k];
                    c[4][k] = (1 - w) * a.pressurePerturbationPa()[k] + w * b.pressurePerturbationPa()[k];
                }
            }
            return;
        }
        Snapshot snap = solution.snapshotAt(inSpan(t));
        for (int s = 0; s < siteColumn.length; s++) {
            int i = siteColumn[s];
            double w = siteColumnWeight[s];
            double[][] c = perSite[s];
            for (int k = 0; k < nz; k++) {
                int a = k * nx + i;
                c[0][k] = (1 - w) * snap.uMPerS()[a] + w * snap.uMPerS()[a + 1];
                c[1][k] = (1 - w) * snap.vMPerS()[a] + w * snap.vMPerS()[a + 1];
                c[2][k] = (1 - w) * snap.thetaK()[a] + w * snap.thetaK()[a + 1];
                c[3][k] = (1 - w) * snap.mixingRatioKgPerKg()[a] + w * snap.mixingRatioKgPerKg()[a + 1];
                c[4][k] = (1 - w) * snap.pressurePerturbationPa()[a] + w * snap.pressurePerturbationPa()[a + 1];
            }
        }
    }

    private Profile buildProfile(String site, double clockH, double[][][][] cols, int s, double nodeStep, Random rng) {
        int nb = binZ.length;
        int nodes = cols.length - 1;
        double[] p = new double[nb];
        double[] t = new double[nb];
        double[] r = new double[nb];
        double[] east = new double[nb];
        double[] north = new double[nb];
        double[] val = new double[5];
        for (int b = 0; b < nb; b++) {
            double sinceLaunch = binZ[b] / spec.ascentRateMPerS();
            int j = Math.min(nodes - 1, (int) Math.floor(sinceLaunch / nodeStep));
            double wt = Math.max(0.0, Math.min(1.0, sinceLaunch / nodeStep - j));
            int k = binLevel[b];
            double wz = binLevelWeight[b];
            for (int v = 0; v < 5; v++) {
                double[] a = cols[j][s][v];
                double[] c = cols[j + 1][s][v];
                double atJ = (1 - wz) * a[k] + wz * a[k + 1];
                double atJ1 = (1 - wz) * c[k] + wz * c[k + 1];
                val[v] = (1 - wt) * atJ + wt * atJ1;
            }
            p[b] = binBackgroundPressurePa[b] + val[4];
            t[b] = Thermo.temperatureFromPotentialK(val[2], p[b]);
            r[b] = val[3];
            east[b] = coast.eastward(val[0], val[1]);
            north[b] = coast.northward(val[0], val[1]);
            if (rng != null) {
                addNoise(b, p, t, r, east, north, rng);
            }
        }
        return Profile.fromState(site, spec.dayLabel(), clockH, binZ.clone(), p, t, r, east, north);
    }

    /** Fixed draw order per bin (T, RH, p, east, north) keeps runs reproducible for a seed. */
    private void addNoise(int b, double[] p, double[] t, double[] r, double[] east, double[] north, Random rng) {
        InstrumentNoise n = spec.noise();
        double rh = Thermo.relativeHumidity(r[b], t[b], p[b]);
        t[b] += n.temperatureSigmaK() * rng.nextGaussian();
        rh = Math.max(0.0, Math.min(1.0, rh + n.relativeHumiditySigma() * rng.nextGaussian()));
        p[b] += n.pressureSigmaPa() * rng.nextGaussian();
        east[b] += n.windComponentSigmaMPerS() * rng.nextGaussian();
        north[b] += n.windComponentSigmaMPerS() * rng.nextGaussian();
        r[b] = Thermo.mixingRatioFromRelativeHumidity(rh, t[b], p[b]);
    }

    public List<VirtualSite> sites() {
        return sites;
    }
}
