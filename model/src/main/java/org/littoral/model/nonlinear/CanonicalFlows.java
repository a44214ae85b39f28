package org.littoral.model.nonlinear;

import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.thermo.Thermo;

/**
 * Idealised flows with published answers, run through the nonlinear model on coarse grids (seconds of
 * CPU each). Used by the unit tests and the validation suite; physics only, no I/O.
 */
public final class CanonicalFlows {
    private CanonicalFlows() {
    }

    /** A surface map of water everywhere (no land-sea contrast). */
    public static SurfaceMap allWater(double sstK) {
        return new SurfaceMap(List.of(new SurfaceSegment.Water("water", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY,
                sstK, 2e-4)));
    }

    /** A surface map of land everywhere. */
    public static SurfaceMap allLand(double bowenRatio, double roughnessM) {
        return new SurfaceMap(List.of(new SurfaceSegment.Land("land", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY,
                0.2, bowenRatio, roughnessM, 0.3)));
    }

    /**
     * Result of a lock-exchange run.
     *
     * @param frontSpeedMPerS speed of the dense current's nose along the ground (fit over the second and third thirds)
     * @param referenceSpeedMPerS sqrt(g' H)
     */
    public record LockExchange(double frontSpeedMPerS, double referenceSpeedMPerS, double depthM, double reducedGravity) {
        /** Front speed over sqrt(g' H): 0.5 for the energy-conserving current of Benjamin (1968). */
        public double froudeNumber() {
            return frontSpeedMPerS / referenceSpeedMPerS;
        }
    }

    /**
     * Full-depth lock exchange without rotation, heating, mixing or damping: air colder by deltaThetaK for
     * x &lt; 0 beside warmer air, neutral background, rigid lid at H. Free-slip ground (no drag).
     */
    public static LockExchange lockExchange(double depthM, double deltaThetaK, int nx, double dxM, int layers, double durationS) {
        double theta = 300.0;
        double half = 0.5 * nx * dxM;
        NonlinearConfig c = NonlinearConfig.builder(new Coast(0.0, 0.0, 0.0, 270.0, 80), allWater(293.15),
                        HorizontalGrid.centred(nx, dxM), VerticalGrid.uniform(layers + 1, depthM))
                .theta(new ThetaProfile.ConstantN(theta, 0.0)).moisture(0.0, 0.0)
                .forcing(new Forcing.None()).switches(new NonlinearConfig.Switches(true, false, false))
                .damping(NonlinearConfig.Damping.none())
                .solarHours(0, durationS / 3600.0).outputIntervalS(durationS / 30.0)
                // x < 0 cold; the periodic wrap makes a second lock at the domain ends, half a domain away
                .initialThetaPerturbation((x, z) -> x < 0 && x > -half ? -deltaThetaK : 0.0).build();
        NonlinearSolution s = NonlinearModel.run(c);
        double[] x = s.xM();
        List<NonlinearSolution.Stored> st = s.stored();
        int n0 = st.size() / 3;
        double sx = 0;
        double st1 = 0;
        double sxx = 0;
        double sxt = 0;
        int m = 0;
        for (int n = n0; n < st.size(); n++) {
            float[] th = st.get(n).theta();
            double nose = Double.NaN;
            double threshold = theta - 0.5 * deltaThetaK;
            // nose of the cold current moving into x > 0, searched up to a quarter domain (before it meets the other)
            for (int i = 1; i < x.length; i++) {
                if (x[i] <= 0 || x[i] > 0.5 * half) {
                    continue;
                }
                if (th[i - 1] < threshold && th[i] >= threshold) {
                    nose = x[i - 1] + (threshold - th[i - 1]) / (th[i] - th[i - 1]) * (x[i] - x[i - 1]);
                }
            }
            if (Double.isNaN(nose)) {
                continue;
            }
            double t = st.get(n).timeSec();
            sx += t;
            st1 += nose;
            sxx += t * t;
            sxt += t * nose;
            m++;
        }
        double speed = (m * sxt - sx * st1) / (m * sxx - sx * sx);
        double gPrime = Thermo.G * deltaThetaK / theta;
        return new LockExchange(speed, Math.sqrt(gPrime * depthM), depthM, gPrime);
    }

    /**
     * Signed area swept by the low-level wind perturbation (u - Ug, v - Vg) at the coast over one day of
     * the classic diurnal heating (half the integral of u dv - v du): negative = clockwise rotation seen
     * from above, the sense Haurwitz (1947) found for the Northern Hemisphere.
     *
     * @return {signed area m2/s2, peak perturbation speed m/s}
     */
    public static double[] breezeHodographArea(double latitudeDeg) {
        double omega = 2 * Math.PI / 86400.0;
        double q0 = 4e-5;
        double x0 = 20_000.0;
        double depth = 500.0;
        HeatingRate q = (x, z, t) -> q0 * (0.5 * Math.PI + Math.atan(x / x0)) * Math.exp(-z / depth)
                * Math.sin(omega * (t - 6 * 3600.0));
        NonlinearConfig c = NonlinearConfig.builder(new Coast(latitudeDeg, 0.0, 0.0, 270.0, 172), SurfaceMap.simpleCoast(293.15, 0.2, 1, 0.1),
                        HorizontalGrid.centred(64, 8000.0), VerticalGrid.stretched(17, 8000.0, 60.0))
                .forcing(new Forcing.PrescribedHeating(q)).switches(new NonlinearConfig.Switches(true, false, false))
                .damping(NonlinearConfig.Damping.none().withFrictionPerS(1.0 / 86400.0).withCoolingPerS(1.0 / 86400.0)
                        .withTopLayer(0.3, 600).withLateralSponges(100_000, 1800))
                .solarHours(6, 54).outputIntervalS(900).build();
        NonlinearSolution s = NonlinearModel.run(c);
        int nx = s.xM().length;
        int i = nx / 2; // x = 0, the coast
        List<NonlinearSolution.Stored> st = s.stored();
        double area = 0;
        double peak = 0;
        double start = 30 * 3600.0;
        for (int n = 1; n < st.size(); n++) {
            if (st.get(n - 1).timeSec() < start) {
                continue;
            }
            double u1 = st.get(n - 1).u()[i];
            double v1 = st.get(n - 1).v()[i];
            double u2 = st.get(n).u()[i];
            double v2 = st.get(n).v()[i];
            area += 0.5 * (u1 * v2 - v1 * u2);
            peak = Math.max(peak, Math.hypot(u2, v2));
        }
        return new double[] {area, peak};
    }

    /**
     * Near-surface front diagnostics of a coast run at one time: the strongest convergence of the
     * lowest-layer cross-shore wind over land (0..maxInlandM) and where it is.
     *
     * @return {front x m, convergence -du/dx 1/s, peak lowest-layer onshore wind m/s relative to Ug}
     */
    public static double[] frontAt(NonlinearSolution s, double timeSec, double maxInlandM) {
        var snap = s.snapshotAt(timeSec);
        double[] x = s.xM();
        double ug = s.background().ambientUMPerS()[0];
        double best = 0;
        double at = Double.NaN;
        double peak = 0;
        for (int i = 1; i < x.length - 1; i++) {
            double ua = snap.uMPerS()[i] - ug;
            if (Math.abs(x[i]) < maxInlandM) {
                peak = Math.max(peak, ua);
            }
            if (x[i] < 0 || x[i] > maxInlandM) {
                continue;
            }
            double conv = -(snap.uMPerS()[i + 1] - snap.uMPerS()[i - 1]) / (x[i + 1] - x[i - 1]);
            if (conv > best) {
                best = conv;
                at = x[i];
            }
        }
        return new double[] {at, best, peak};
    }

    /**
     * A sea breeze on a coarse grid (2 km, 320 km domain, 40 layers to 5 km) with a prescribed land
     * heat flux (250 W/m2 peak from 06 solar h, Bowen ratio 1) under a geostrophic wind; like a scenario run, it starts
     * 2 h before the heating from the balanced boundary layer, so the coast has adjusted before the land heats.
     */
    public static NonlinearSolution coarseSeaBreeze(double latitudeDeg, double geostrophicSpeed, double fromDeg, double endSolarHours) {
        NonlinearConfig c = NonlinearConfig.builder(new Coast(latitudeDeg, 0.0, 0.0, 270.0, 172),
                        SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1), HorizontalGrid.centred(160, 2000.0),
                        VerticalGrid.stretched(41, 5000.0, 30.0))
                .geostrophicWind(geostrophicSpeed, fromDeg)
                .forcing(new Forcing.PrescribedSurfaceFlux(250.0, 6.0, 18.0, 0.0))
                .solarHours(4.0, endSolarHours).outputIntervalS(900.0).build();
        return NonlinearModel.run(c);
    }

    /**
     * Slab mixed-layer depth over uniform land heated by a prescribed half-sine flux, in the full model
     * (mixing on, no coast), into a constant lapse rate.
     *
     * @return {model h at the end m, zero-order-jump h m, depth of the resolved well-mixed theta layer m}
     */
    public static double[] heatedColumn(double peakFluxWm2, double lapseKPerM, double entrainmentRatio, double endSolarHours) {
        double[] zt = {0.0, 10_000.0};
        double[] tt = {300.0, 300.0 + lapseKPerM * 10_000.0};
        NonlinearConfig.BoundaryLayer bl = new NonlinearConfig.BoundaryLayer(entrainmentRatio, 100.0, 100.0, 200.0, 0.5);
        NonlinearConfig c = NonlinearConfig.builder(new Coast(40.0, 0.0, 0.0, 270.0, 172), allLand(1.0, 0.1),
                        HorizontalGrid.centred(8, 2000.0), VerticalGrid.uniform(81, 4000.0))
                .theta(new ThetaProfile.Tabulated(zt, tt)).boundaryLayer(bl)
                .damping(NonlinearConfig.Damping.none().withTopLayer(0.2, 600))
                .forcing(new Forcing.PrescribedSurfaceFlux(peakFluxWm2, 6.0, 18.0, 0.0))
                .solarHours(6.0, endSolarHours).outputIntervalS(1800.0).build();
        NonlinearSolution s = NonlinearModel.run(c);
        double hModel = s.mixedLayerDepthM(s.endSec())[0];
        // zero-order jump: h^2 = h0^2 + 2 (1 + 2A) Integral(H_kin dt) / gamma (Tennekes 1973)
        double ts = Thermo.temperatureFromPotentialK(300.0, c.surfacePressurePa());
        double rho = Thermo.densityKgM3(c.surfacePressurePa(), ts, c.surfaceMixingRatio());
        double dayS = 12 * 3600.0;
        double integral = peakFluxWm2 / (rho * Thermo.CP) * dayS / Math.PI
                * (1.0 - Math.cos(Math.PI * (endSolarHours - 6.0) * 3600.0 / dayS));
        double hZoj = org.littoral.model.mixedlayer.ZeroOrderJump.depthM(100.0, entrainmentRatio, lapseKPerM, integral);
        // resolved theta: top of the layer within 0.5 K of the lowest-layer theta (a common parcel-style criterion)
        var snap = s.snapshotAt(s.endSec());
        double[] z = s.zM();
        double th1 = snap.thetaK()[0];
        double top = z[0];
        for (int k = 0; k < z.length; k++) {
            if (snap.thetaK()[k * snap.nx()] > th1 + 0.5) {
                break;
            }
            top = z[k];
        }
        return new double[] {hModel, hZoj, top};
    }

    /**
     * The classic heating of linear theory on a periodic domain, Q = Q0 pi M(x) exp(-z/H) sin(Omega (t - t_r)),
     * with M the land indicator of [0, L/2) smoothed by arctan steps of half-width x0 and summed over its
     * periodic images: the mask the linear model uses (its {@code ShoreMask}) rebuilt in x space.
     */
    public static HeatingRate classicPeriodicHeating(double q0KPerS, double x0M, double depthM, double sunriseSolarHours,
                                                     HorizontalGrid grid) {
        double omega = 2 * Math.PI / 86400.0;
        double length = grid.lengthM();
        double[] piM = new double[grid.nx()];
        for (int i = 0; i < piM.length; i++) {
            piM[i] = periodicArctanMask(grid.xM(i), x0M, length);
        }
        return (x, z, t) -> {
            int i = (int) Math.round((x - grid.x0M()) / grid.dxM());
            double m = i >= 0 && i < piM.length && Math.abs(grid.xM(i) - x) < 1e-6 ? piM[i] : periodicArctanMask(x, x0M, length);
            return q0KPerS * m * Math.exp(-z / depthM) * Math.sin(omega * (t - sunriseSolarHours * 3600.0));
        };
    }

    /** pi M(x) for land on [0, L/2): arctan steps at 0 and L/2 with their periodic images (|n| &lt;= 400). */
    static double periodicArctanMask(double x, double x0M, double length) {
        double half = 0.5 * length;
        double m = 0;
        for (int n = -400; n <= 400; n++) {
            double xs = n * length;
            m += Math.atan((x - xs) / x0M) - Math.atan((x - xs - half) / x0M);
        }
        return m;
    }

    /**
     * The nonlinear model with {@code Switches.linearEquations()} against the linear spectral model,
     * same classic heating, 45 N, N = 0.01, friction = cooling = 1/(12 h), non-hydrostatic; the nonlinear
     * run spins up from rest for two days and day 3 is compared with the periodic linear solution.
     *
     * @return {peak onshore u nonlinear, peak linear, time of peak nonlinear h, time of peak linear h,
     *         pattern correlation of u at the linear peak (|x| &lt; 150 km, z &lt; 4 km)}
     */
    public static double[] linearModeComparison() {
        Coast coast = new Coast(45.0, 0.0, 0.0, 270.0, 172);
        SurfaceMap map = SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1);
        int nx = 128;
        HorizontalGrid xg = HorizontalGrid.centred(nx, 4000.0);
        VerticalGrid zi = VerticalGrid.stretched(25, 8000.0, 50.0);
        double alpha = 1.0 / 43200.0;
        double q0 = 2e-5;
        double x0 = 10_000.0;
        double hq = 500.0;
        NonlinearConfig c = NonlinearConfig.builder(coast, map, xg, zi).switches(NonlinearConfig.Switches.linearEquations())
                .forcing(new Forcing.PrescribedHeating(classicPeriodicHeating(q0, x0, hq, 6.0, xg)))
                .damping(NonlinearConfig.Damping.none().withFrictionPerS(alpha).withCoolingPerS(alpha).withTopLayer(0.3, 600)).solarHours(0, 72).outputIntervalS(900).build();
        NonlinearSolution s = NonlinearModel.run(c);
        double[] zc = s.zM();
        org.littoral.model.linear.LinearConfig lc = new org.littoral.model.linear.LinearConfig(coast, map, xg, VerticalGrid.of(zc),
                0.01, alpha, alpha, 0.0, false, 1, new org.littoral.model.linear.HeatingSpec.ClassicShape(q0, x0, hq, 6.0),
                300.0, 0.008, -2e-6, 101325.0);
        var ls = org.littoral.model.linear.LinearBreezeModel.solve(lc);
        double[] x = s.xM();
        double bestN = -1e9;
        double tN = 0;
        double bestL = -1e9;
        double tL = 0;
        for (double t = 48 * 3600.0; t <= 72 * 3600.0; t += 900.0) {
            var a = s.snapshotAt(t);
            var b = ls.snapshotAt(t);
            for (int i = 0; i < nx; i++) {
                if (Math.abs(x[i]) > 100_000) {
                    continue;
                }
                if (a.uMPerS()[i] > bestN) {
                    bestN = a.uMPerS()[i];
                    tN = t;
                }
                if (b.uMPerS()[i] > bestL) {
                    bestL = b.uMPerS()[i];
                    tL = t;
                }
            }
        }
        var a = s.snapshotAt(tL);
        var b = ls.snapshotAt(tL);
        double ma = 0;
        double mb = 0;
        int n = 0;
        for (int k = 0; k < zc.length; k++) {
            for (int i = 0; i < nx; i++) {
                if (Math.abs(x[i]) <= 150_000 && zc[k] <= 4000) {
                    ma += a.uMPerS()[k * nx + i];
                    mb += b.uMPerS()[k * nx + i];
                    n++;
                }
            }
        }
        ma /= n;
        mb /= n;
        double sab = 0;
        double saa = 0;
        double sbb = 0;
        for (int k = 0; k < zc.length; k++) {
            for (int i = 0; i < nx; i++) {
                if (Math.abs(x[i]) <= 150_000 && zc[k] <= 4000) {
                    double da = a.uMPerS()[k * nx + i] - ma;
                    double db = b.uMPerS()[k * nx + i] - mb;
                    sab += da * db;
                    saa += da * da;
                    sbb += db * db;
                }
            }
        }
        return new double[] {bestN, bestL, tN / 3600.0 - 48, tL / 3600.0 - 48, sab / Math.sqrt(saa * sbb)};
    }
}
