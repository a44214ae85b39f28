package org.littoral.model.front;

import org.littoral.model.grid.Bracket;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.FieldSampling;
import org.littoral.model.field.Snapshot;
import org.littoral.model.front.FrontTrack;
import org.littoral.model.front.NearSurfaceSection;
import org.littoral.model.front.SearchZone;
import org.littoral.model.thermo.Thermo;

/**
 * The solution evaluated at the output times and reduced to what the diagnostics and plots need:
 * the near-surface cross-shore breeze wind u' = u - U_ambient along x (a time-distance section) and,
 * at each site, time-height sections of u', the alongshore breeze v' and theta'. The "breeze" is the
 * model wind minus the ambient wind, so an onshore perturbation shows even against offshore flow. For a
 * nonlinear run ({@link FarFieldSolution}) the ambient wind is its far-field reference at the same time
 * and height: the run's own median wind far inland, which has the same drag, turning and spin-up.
 * Each output time costs one snapshot, which is not kept.
 */
public final class FieldSections {
    /** Output times, local clock hours, and the matching model times, s. */
    public final double[] clockH;
    public final double[] modelSec;
    public final double[] xM;
    public final double[] zM;
    public final double nearSurfaceM;
    /** [time][x] near-surface cross-shore breeze wind, m/s (onshore positive). */
    public final double[][] nearSurfaceU;
    /** [time][x] near-surface total cross-shore wind, m/s. */
    public final double[][] nearSurfaceTotalU;
    /** [time][x] near-surface total alongshore wind, m/s (ambient included). */
    public final double[][] nearSurfaceTotalV;
    /** [time][x] near-surface virtual potential temperature, K (nonlinear runs; null for linear theory). */
    public double[][] nearSurfaceThetaV;
    /** [site][time][level]. */
    public final double[][][] siteU;
    public final double[][][] siteV;
    public final double[][][] siteTheta;
    /** Times (clock hours) dropped because they lie outside the solution's span. */
    public final List<Double> dropped;
    /**
     * The part of the domain the diagnostics search (peak, penetration, plot range): the whole domain for
     * the linear model, the interior clear of the far-field sponges for a nonlinear run.
     */
    public double interiorFromM;
    public double interiorToM;
    /**
     * True for a nonlinear run, which makes fronts: arrivals are front passages ({@link FrontTrack}); false for
     * linear theory, which has none: arrivals are the onset of onshore flow.
     */
    public boolean fronts;
    /** What the diagnostics may search, and what lies beyond each end. */
    public SearchZone zone;

    private FieldSections(double[] clockH, double[] modelSec, double[] xM, double[] zM, double nearSurfaceM, int sites,
                          List<Double> dropped) {
        this.clockH = clockH;
        this.modelSec = modelSec;
        this.xM = xM;
        this.zM = zM;
        this.nearSurfaceM = nearSurfaceM;
        int nt = clockH.length;
        nearSurfaceU = new double[nt][xM.length];
        nearSurfaceTotalU = new double[nt][xM.length];
        nearSurfaceTotalV = new double[nt][xM.length];
        siteU = new double[sites][nt][zM.length];
        siteV = new double[sites][nt][zM.length];
        siteTheta = new double[sites][nt][zM.length];
        this.dropped = dropped;
        this.interiorFromM = xM[0];
        this.interiorToM = xM[xM.length - 1];
    }

    /** The near-surface section the front diagnostics read (shares this object's arrays). */
    public NearSurfaceSection section() {
        return new NearSurfaceSection(clockH, xM, nearSurfaceM, nearSurfaceTotalU, nearSurfaceU, nearSurfaceTotalV, nearSurfaceThetaV, fronts,
                zone);
    }

    /**
     * Evaluates the solution at the given local clock times.
     *
     * @param siteXM cross-shore positions of the sites, m (inside the domain)
     * @param periodic true when the solution repeats with period endSec - startSec (times are wrapped)
     * @param progress called after each time with (done, total); may be null
     */
    public static FieldSections evaluate(BreezeSolution sol, Coast coast, double[] clockHours, double nearSurfaceM,
                                         double[] siteXM, boolean periodic,
                                         java.util.function.BiConsumer<Integer, Integer> progress) {
        List<Double> keepClock = new ArrayList<>();
        List<Double> keepModel = new ArrayList<>();
        List<Double> dropped = new ArrayList<>();
        for (double h : clockHours) {
            double t = coast.solarHoursFromClock(h) * 3600.0;
            if (periodic) {
                double period = sol.endSec() - sol.startSec();
                t = sol.startSec() + ((t - sol.startSec()) % period + period) % period;
            }
            if (t >= sol.startSec() - 1e-6 && t <= sol.endSec() + 1e-6) {
                keepClock.add(h);
                keepModel.add(t);
            } else {
                dropped.add(h);
            }
        }
        double[] xM = sol.xM();
        double[] zM = sol.zM();
        int nx = xM.length;
        int nz = zM.length;
        FieldSections fs = new FieldSections(toArray(keepClock), toArray(keepModel), xM, zM, nearSurfaceM, siteXM.length, dropped);
        Background bg = sol.background();
        int k0 = Bracket.index(zM, nearSurfaceM);
        double wz = Math.max(0, Math.min(1, (nearSurfaceM - zM[k0]) / (zM[k0 + 1] - zM[k0])));
        double ambientNear = Background.interpolate(bg.zM(), bg.ambientUMPerS(), nearSurfaceM);
        int[] col = new int[siteXM.length];
        double[] wx = new double[siteXM.length];
        for (int s = 0; s < siteXM.length; s++) {
            col[s] = Bracket.index(xM, siteXM[s]);
            wx[s] = Math.max(0, Math.min(1, (siteXM[s] - xM[col[s]]) / (xM[col[s] + 1] - xM[col[s]])));
        }
        double[] uBg = new double[nz];
        double[] vBg = new double[nz];
        double[] thBg = new double[nz];
        for (int k = 0; k < nz; k++) {
            uBg[k] = Background.interpolate(bg.zM(), bg.ambientUMPerS(), zM[k]);
            vBg[k] = Background.interpolate(bg.zM(), bg.ambientVMPerS(), zM[k]);
            thBg[k] = Background.interpolate(bg.zM(), bg.thetaK(), zM[k]);
        }
        int nt = fs.clockH.length;
        FarFieldSolution far = sol instanceof FarFieldSolution ff ? ff : null;
        if (far != null) {
            fs.interiorFromM = far.interiorFromM();
            // the landward end of the search is where the reference band begins
            fs.interiorToM = Math.min(far.interiorToM(), far.referenceBandM()[0]);
            fs.fronts = true;
            fs.nearSurfaceThetaV = new double[nt][nx];
            fs.zone = new SearchZone(fs.interiorFromM, fs.interiorToM, String.format(java.util.Locale.ROOT,
                    "far-field sponge (and a %.0f km margin)", FarFieldSolution.MARGIN_M / 1000.0),
                    "reference band of the far-field wind");
        } else if (periodic) {
            // a periodic domain repeats the coast with land and sea swapped at +-L/2: search half-way to it
            fs.zone = SearchZone.periodic(nx * (xM[1] - xM[0]));
            fs.interiorFromM = Math.max(xM[0], fs.zone.fromM());
            fs.interiorToM = Math.min(xM[nx - 1], fs.zone.toM());
        } else {
            fs.zone = new SearchZone(Math.min(0, xM[0]), Math.max(0, xM[nx - 1]), "end of the domain", "end of the domain");
        }
        if (far == null && sol instanceof FieldSampling fast) {
            // Fast path (the linear model): four one-level syntheses for the near-surface section and two cached
            // columns per site instead of a whole snapshot per time; same levels, columns and weights.
            for (int n = 0; n < nt; n++) {
                double t = fs.modelSec[n];
                double[] u0 = fast.crossShoreWindAtLevel(k0, t);
                double[] u1 = fast.crossShoreWindAtLevel(k0 + 1, t);
                double[] v0 = fast.alongshoreWindAtLevel(k0, t);
                double[] v1 = fast.alongshoreWindAtLevel(k0 + 1, t);
                for (int i = 0; i < nx; i++) {
                    double total = (1 - wz) * u0[i] + wz * u1[i];
                    fs.nearSurfaceTotalU[n][i] = total;
                    fs.nearSurfaceTotalV[n][i] = (1 - wz) * v0[i] + wz * v1[i];
                    fs.nearSurfaceU[n][i] = total - ambientNear;
                }
                for (int site = 0; site < col.length; site++) {
                    Snapshot a = fast.columnAt(xM[col[site]], t);
                    Snapshot b = wx[site] == 0 ? a : fast.columnAt(xM[col[site] + 1], t);
                    double w = wx[site];
                    for (int k = 0; k < nz; k++) {
                        fs.siteU[site][n][k] = (1 - w) * a.uMPerS()[k] + w * b.uMPerS()[k] - uBg[k];
                        fs.siteV[site][n][k] = (1 - w) * a.vMPerS()[k] + w * b.vMPerS()[k] - vBg[k];
                        fs.siteTheta[site][n][k] = (1 - w) * a.thetaK()[k] + w * b.thetaK()[k] - thBg[k];
                    }
                }
                if (progress != null) {
                    progress.accept(n + 1, nt);
                }
            }
            return fs;
        }
        for (int n = 0; n < nt; n++) {
            Snapshot s = sol.snapshotAt(fs.modelSec[n]);
            if (far != null) {
                double[][] ref = far.farFieldWind(s);
                System.arraycopy(ref[0], 0, uBg, 0, nz);
                System.arraycopy(ref[1], 0, vBg, 0, nz);
                ambientNear = (1 - wz) * uBg[k0] + wz * uBg[k0 + 1];
            }
            double[] u = s.uMPerS();
            double[] v = s.vMPerS();
            for (int i = 0; i < nx; i++) {
                double total = (1 - wz) * u[k0 * nx + i] + wz * u[(k0 + 1) * nx + i];
                fs.nearSurfaceTotalU[n][i] = total;
                fs.nearSurfaceTotalV[n][i] = (1 - wz) * v[k0 * nx + i] + wz * v[(k0 + 1) * nx + i];
                fs.nearSurfaceU[n][i] = total - ambientNear;
            }
            if (fs.nearSurfaceThetaV != null) {
                double[] th = s.thetaK();
                double[] r = s.mixingRatioKgPerKg();
                for (int i = 0; i < nx; i++) {
                    int a = k0 * nx + i;
                    fs.nearSurfaceThetaV[n][i] = (1 - wz) * Thermo.virtualPotentialTemperatureK(th[a], r[a])
                            + wz * Thermo.virtualPotentialTemperatureK(th[a + nx], r[a + nx]);
                }
            }
            for (int site = 0; site < col.length; site++) {
                int i = col[site];
                double w = wx[site];
                for (int k = 0; k < nz; k++) {
                    int a = k * nx + i;
                    fs.siteU[site][n][k] = (1 - w) * u[a] + w * u[a + 1] - uBg[k];
                    fs.siteV[site][n][k] = (1 - w) * s.vMPerS()[a] + w * s.vMPerS()[a + 1] - vBg[k];
                    fs.siteTheta[site][n][k] = (1 - w) * s.thetaK()[a] + w * s.thetaK()[a + 1] - thBg[k];
                }
            }
            if (progress != null) {
                progress.accept(n + 1, nt);
            }
        }
        return fs;
    }

    private static double[] toArray(List<Double> l) {
        double[] a = new double[l.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = l.get(i);
        }
        return a;
    }
}
