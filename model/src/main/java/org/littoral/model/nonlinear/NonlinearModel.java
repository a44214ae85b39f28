package org.littoral.model.nonlinear;

import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.field.Background;
import org.littoral.model.mixedlayer.SlabMixedLayer;
import org.littoral.model.surface.BulkFlux;
import org.littoral.model.surface.BulkFluxes;
import org.littoral.model.surface.ColumnSurfaceFluxes;
import org.littoral.model.surface.KProfile;
import org.littoral.model.thermo.Thermo;

/**
 * The 2D (x, z) non-hydrostatic Boussinesq breeze model on an f-plane. Prognostic u (cross-shore), v
 * (alongshore), w, theta and water-vapour mixing ratio r on an Arakawa C-grid, x periodic, rigid lid.
 *
 * <pre>
 *   du/dt = -adv(u) - d(phi)/dx + f (v - Vg) - alpha (u - Ug) + mixing + drag
 *   dv/dt = -adv(v)             - f (u - Ug) - alpha (v - Vg) + mixing + drag
 *   dw/dt = -adv(w) - d(phi)/dz + b           - alpha w
 *   d(theta)/dt = -adv(theta) + Q - alpha_N (theta - theta_0) + mixing (surface heat flux)
 *   dr/dt       = -adv(r)         - alpha_N (r - r_0)         + mixing (surface moisture flux)
 *   du/dx + dw/dz = 0,    b = g [(theta - theta_0) / theta_0 + 0.608 (r - r_0)]
 * </pre>
 *
 * Time stepping: the three-stage strong-stability-preserving Runge-Kutta scheme of Shu &amp; Osher
 * (1988), J. Comput. Phys. 77, 439-471, eq. (2.18), with a pressure projection (Chorin 1968, Math.
 * Comp. 22, 745-762) after each stage; the step adapts to the Courant number and to N and f. Mixing,
 * surface fluxes, drag and the sponges are applied implicitly (backward Euler, tridiagonal in z) once per
 * step before the explicit stages (first-order splitting). Advection: scalars theta and r in flux form
 * with the MUSCL piecewise-linear reconstruction (van Leer 1979, J. Comput. Phys. 32, 101-136) and the
 * monotonised-central limiter (van Leer 1977, J. Comput. Phys. 23, 276-299), monotone and
 * positivity-preserving at Courant sums up to 0.5; momentum by the third-order upwind-biased flux of
 * Wicker &amp; Skamarock (2002), Mon. Wea. Rev. 130, 2088-2097, eq. (4).
 *
 * <p>Physics only: no I/O. Use {@link #run(NonlinearConfig)}.
 */
public final class NonlinearModel {
    static final double KARMAN = 0.4;
    /** Virtual-temperature factor 1/eps - 1 (e.g. Emanuel 1994, Atmospheric Convection, eq. 4.3.1). */
    static final double VIRTUAL_FACTOR = 0.608;

    private final NonlinearConfig cfg;
    private final StaggeredGrid g;
    private final PoissonSolver poisson;
    private final int nx;
    private final int nz;
    private final double f;
    private final double ug;
    private final double vg;
    private final boolean lin;
    private final double invDx;

    // background at centres and interfaces
    private final double[] th0;
    private final double[] dth0;
    private final double[] q0;
    private final double[] dq0;
    private final double[] rho0;
    private final double nMax;
    private final double surfaceRho;
    private final double surfacePressure;
    private final Background background;

    // state and stage copies
    private final double[] u;
    private final double[] v;
    private final double[] w;
    private final double[] th;
    private final double[] q;
    private final double[] un;
    private final double[] vn;
    private final double[] wn;
    private final double[] thn;
    private final double[] qn;
    private final double[] tu;
    private final double[] tv;
    private final double[] tw;
    private final double[] tth;
    private final double[] tq;
    private final double[] chi;
    /** Kinematic pressure p' / rho_0 of the last projection is chi * phiScale (0 before the first step). */
    private double phiScale;
    // row and column work buffers
    private final double[] fx;
    /** Limited slopes in x of one row. */
    private final double[] hSlope;
    /** Row copies shifted in x (see {@link #shift}) and the shifted flux row. */
    private final double[] sh1;
    private final double[] sh2;
    private final double[] sh3;
    private final double[] sh4;
    // row copies for loops that must read several rows at one index (vector instructions)
    private final double[] rowA;
    private final double[] rowB;
    private final double[] rowC;
    private final double[] rowD;
    private final double[] rowU;
    private final double[] rowW;
    private final double[] rowT;
    private final double[] fxs;
    private final double[] fzBot;
    private final double[] fzTop;
    private final double[] slopeA;
    private final double[] slopeB;
    private final double[] colA;
    private final double[] colB;
    private final double[] colC;
    private final double[] colR;
    private final double[] colK;

    // surface and boundary layer per column
    private final boolean[] land;
    private final SurfaceSegment[] segment;
    private final ColumnSurfaceFluxes energyBalance;
    private final double[] theta1;
    private final double[] q1;
    private final double[] z0;
    private final double[] bowen;
    private final double[] sstK;
    private final double[] cd;
    private final double[] windSfc;
    private final double[] heatFluxKin;
    private final double[] moistFluxKin;
    private final double[] h;
    private final double[] hWork;
    private final double[] kIface;

    // damping coefficients
    private final double[] rTopC;
    private final double[] rTopF;
    private final double[] rLatC;
    private final double[] rLatU;
    private final int iLeftC;
    private final int iRightC;
    private final int iLeftU;
    private final int iRightU;
    private final double[] refL;
    private final double[] refR;

    private final double[] heatingBuf;
    private double dtLast;
    private final FarFieldColumn farLeft;
    private final FarFieldColumn farRight;
    // flux-corrected scalar transport (nonlinear mode): the step's weighted mean fluxes and velocity
    private final boolean useFct;
    private final FluxCorrectedTransport fct;
    private final double[] fxTh;
    private final double[] fzTh;
    private final double[] fxQ;
    private final double[] fzQ;
    private final double[] uMean;
    private final double[] wMean;
    private double stageWeight;

    private NonlinearModel(NonlinearConfig cfg) {
        this.cfg = cfg;
        this.g = new StaggeredGrid(cfg.xGrid(), cfg.zInterfaces());
        this.poisson = new PoissonSolver(g);
        this.nx = g.nx;
        this.nz = g.nz;
        this.f = cfg.coast().coriolisPerS();
        double[] gw = cfg.geostrophicModelComponents();
        this.ug = gw[0];
        this.vg = gw[1];
        this.lin = !cfg.switches().nonlinearTerms();
        this.invDx = 1.0 / g.dx;

        th0 = new double[nz];
        dth0 = new double[nz];
        q0 = new double[nz];
        dq0 = new double[nz];
        double n2max = 0;
        for (int k = 0; k < nz; k++) {
            th0[k] = cfg.theta().thetaK(g.zc[k]);
            dth0[k] = cfg.theta().gradientKPerM(g.zc[k]);
            double r = cfg.surfaceMixingRatio() + cfg.mixingRatioGradientPerM() * g.zc[k];
            q0[k] = Math.max(1e-5, r);
            dq0[k] = r > 1e-5 ? cfg.mixingRatioGradientPerM() : 0.0;
            n2max = Math.max(n2max, Thermo.G / th0[k] * dth0[k]);
        }
        for (int k = 1; k < nz; k++) {
            double zi = g.zf[k];
            n2max = Math.max(n2max, Thermo.G / cfg.theta().thetaK(zi) * cfg.theta().gradientKPerM(zi));
        }
        nMax = Math.sqrt(n2max);
        double[] uA = new double[nz];
        double[] vA = new double[nz];
        java.util.Arrays.fill(uA, ug);
        java.util.Arrays.fill(vA, vg);
        double[] p0 = Background.pressureFromTheta(g.zc, th0, q0, cfg.surfacePressurePa());
        background = new Background(g.zc.clone(), th0.clone(), q0.clone(), p0, uA, vA);
        rho0 = new double[nz];
        for (int k = 0; k < nz; k++) {
            rho0[k] = Thermo.densityKgM3(p0[k], Thermo.temperatureFromPotentialK(th0[k], p0[k]), q0[k]);
        }
        surfacePressure = cfg.surfacePressurePa();
        double ts = Thermo.temperatureFromPotentialK(cfg.theta().thetaK(0.0), surfacePressure);
        surfaceRho = Thermo.densityKgM3(surfacePressure, ts, cfg.surfaceMixingRatio());

        int nc = nz * nx;
        u = new double[nc];
        v = new double[nc];
        w = new double[(nz + 1) * nx];
        th = new double[nc];
        q = new double[nc];
        un = new double[nc];
        vn = new double[nc];
        wn = new double[(nz + 1) * nx];
        thn = new double[nc];
        qn = new double[nc];
        tu = new double[nc];
        tv = new double[nc];
        tw = new double[(nz + 1) * nx];
        tth = new double[nc];
        tq = new double[nc];
        chi = new double[nc];
        fx = new double[nx + 1];
        useFct = !lin && cfg.numerics().scalarTransport() == NonlinearConfig.ScalarTransport.FCT_STEP;
        fct = useFct ? new FluxCorrectedTransport(nx, nz, g.dx, g.dzf) : null;
        fxTh = useFct ? new double[nc] : null;
        fzTh = useFct ? new double[(nz + 1) * nx] : null;
        fxQ = useFct ? new double[nc] : null;
        fzQ = useFct ? new double[(nz + 1) * nx] : null;
        uMean = useFct ? new double[nc] : null;
        wMean = useFct ? new double[(nz + 1) * nx] : null;
        sh1 = new double[nx];
        sh2 = new double[nx];
        sh3 = new double[nx];
        sh4 = new double[nx];
        rowA = new double[nx];
        rowB = new double[nx];
        rowC = new double[nx];
        rowD = new double[nx];
        rowU = new double[nx];
        rowW = new double[nx];
        rowT = new double[nx];
        fxs = new double[nx];
        hSlope = new double[nx];
        fzBot = new double[nx];
        fzTop = new double[nx];
        slopeA = new double[nx];
        slopeB = new double[nx];
        colA = new double[nz];
        colB = new double[nz];
        colC = new double[nz];
        colR = new double[nz];
        colK = new double[nz + 1];
        heatingBuf = cfg.forcing() instanceof Forcing.PrescribedHeating ? new double[nc] : null;

        land = new boolean[nx];
        z0 = new double[nx];
        bowen = new double[nx];
        sstK = new double[nx];
        cd = new double[nx];
        windSfc = new double[nx];
        heatFluxKin = new double[nx];
        moistFluxKin = new double[nx];
        h = new double[nx];
        hWork = new double[nx];
        kIface = new double[(nz + 1) * nx];
        cgFactor = new double[nx];
        colTv = new double[nz];
        colU = new double[nz];
        colV = new double[nz];
        dtOverDz = new double[nz];
        dragCol = new double[nx];
        dragFace = new double[nx];
        fluxCol = new double[nx];
        cgCol = new double[nx];
        triK = new double[(nz + 1) * nx];
        triLo = new double[nc];
        triHi = new double[nc];
        triM = new double[nc];
        triB = new double[nc];
        triR = new double[nc];
        segment = new SurfaceSegment[nx];
        theta1 = new double[nx];
        q1 = new double[nx];
        energyBalance = cfg.forcing() instanceof Forcing.SurfaceEnergyBalance seb
                ? new ColumnSurfaceFluxes(cfg.surface(), g.xc, cfg.coast(), seb.partition()) : null;
        for (int i = 0; i < nx; i++) {
            SurfaceSegment s = cfg.surface().at(g.xc[i]);
            segment[i] = s;
            land[i] = s.isLand();
            z0[i] = s.roughnessM();
            if (s instanceof SurfaceSegment.Land l) {
                bowen[i] = l.bowenRatio();
                h[i] = cfg.boundaryLayer().initialDepthM();
            } else if (s instanceof SurfaceSegment.Water wa) {
                sstK[i] = wa.seaSurfaceTemperatureK();
                h[i] = cfg.boundaryLayer().marineDepthM();
            }
            // neutral drag at the lowest level from the log law (e.g. Garratt 1992, The Atmospheric Boundary Layer, eq. 3.23)
            double lnz = Math.log(g.zc[0] / z0[i]);
            cd[i] = (KARMAN / lnz) * (KARMAN / lnz);
        }

        // damping coefficients: sin^2 ramps (Durran & Klemp 1983, Mon. Wea. Rev. 111, 2341-2361)
        NonlinearConfig.Damping d = cfg.damping();
        rTopC = new double[nz];
        rTopF = new double[nz + 1];
        if (d.topLayerFraction() > 0) {
            double zd = g.topM() * (1.0 - d.topLayerFraction());
            double depth = g.topM() - zd;
            for (int k = 0; k < nz; k++) {
                rTopC[k] = topRate(g.zc[k], zd, depth, d.topTimescaleS());
            }
            for (int k = 1; k < nz; k++) {
                rTopF[k] = topRate(g.zf[k], zd, depth, d.topTimescaleS());
            }
        }
        rLatC = new double[nx];
        rLatU = new double[nx];
        double width = d.lateralSpongeWidthM();
        double left = g.xc[0] - 0.5 * g.dx;
        double right = g.xc[nx - 1] + 0.5 * g.dx;
        int il = 0;
        int ir = nx - 1;
        int ilu = 0;
        int iru = nx - 1;
        if (width > 0) {
            while (il < nx && g.xc[il] - left < width) {
                il++;
            }
            while (ir >= 0 && right - g.xc[ir] < width) {
                ir--;
            }
            while (ilu < nx && g.xc[ilu] - 0.5 * g.dx - left < width) {
                ilu++;
            }
            while (iru >= 0 && right - (g.xc[iru] - 0.5 * g.dx) < width) {
                iru--;
            }
            for (int i = 0; i < nx; i++) {
                rLatC[i] = lateralRate(g.xc[i], left, right, width, d.lateralTimescaleS());
                rLatU[i] = lateralRate(g.xc[i] - 0.5 * g.dx, left, right, width, d.lateralTimescaleS());
            }
        }
        iLeftC = il;
        iRightC = ir;
        iLeftU = ilu;
        iRightU = iru;
        refL = new double[nz + 1];
        refR = new double[nz + 1];
        farLeft = width > 0 ? new FarFieldColumn(iLeftC) : null;
        farRight = width > 0 ? new FarFieldColumn(iRightC) : null;
    }

    private static double topRate(double z, double zd, double depth, double tau) {
        if (z <= zd) {
            return 0.0;
        }
        double s = Math.sin(0.5 * Math.PI * (z - zd) / depth);
        return s * s / tau;
    }

    private static double lateralRate(double x, double left, double right, double width, double tau) {
        double dist = Math.min(x - left, right - x);
        if (dist >= width) {
            return 0.0;
        }
        double s = Math.sin(0.5 * Math.PI * (1.0 - Math.max(0.0, dist) / width));
        return s * s / tau;
    }

    /**
     * Runs the model from start to end and returns the stored snapshots.
     *
     * @throws ModelBlowUpException when the run goes unstable (carries the partial solution)
     */
    public static NonlinearSolution run(NonlinearConfig config) {
        return new NonlinearModel(config).integrate();
    }

    /** For tests: a model ready to integrate, whose final discrete divergence can be inspected. */
    static NonlinearModel create(NonlinearConfig config) {
        return new NonlinearModel(config);
    }

    /** Largest |du/dx + dw/dz| * dx / (typical |u|) of the current state: relative discrete divergence (tests). */
    double maxRelativeDivergence() {
        double maxD = 0;
        double maxU = 1e-30;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double d = (u[o + g.ip1[i]] - u[o + i]) * invDx + (w[o + nx + i] - w[o + i]) / g.dzf[k];
                maxD = Math.max(maxD, Math.abs(d));
                maxU = Math.max(maxU, Math.abs(u[o + i] - ug));
            }
        }
        return maxD * g.dx / maxU;
    }

    NonlinearSolution integrate() {
        NonlinearSolution sol = new NonlinearSolution(g.xc, g.zc, background);
        initialise();
        double t0 = cfg.startSolarHours() * 3600.0;
        double tEnd = cfg.endSolarHours() * 3600.0;
        double interval = cfg.outputIntervalS();
        double t = t0;
        long steps = 0;
        store(sol, t);
        int nOut = 1;
        double nextOut = Math.min(t0 + nOut * interval, tEnd);
        while (t < tEnd - 1e-6) {
            double dt = chooseStep();
            if (t + dt > nextOut - 1e-6) {
                dt = nextOut - t;
            } else if (t + 1.5 * dt > nextOut) {
                dt = 0.5 * (nextOut - t); // two similar steps rather than one tiny one
            }
            dtLast = dt;
            implicitPhysics(t, dt);
            // mixing, drag and sponges change u and w column by column: remove the divergence they leave
            // before flux-form advection sees it (a divergent flow would act as a spurious source of theta)
            project(dt);
            rk3(t, dt);
            t += dt;
            steps++;
            checkBlowUp(t, sol, steps);
            if (Math.abs(t - nextOut) < 1e-6) {
                t = nextOut;
                store(sol, t);
                nOut++;
                nextOut = Math.min(t0 + nOut * interval, tEnd);
            }
        }
        sol.finish(true, steps);
        return sol;
    }

    private void initialise() {
        ScalarField thp = cfg.initialThetaPerturbationK();
        ScalarField up = cfg.initialUPerturbationMPerS();
        ScalarField qp = cfg.initialMixingRatioPerturbation();
        double t0 = cfg.startSolarHours() * 3600.0;
        // the wind of each column's own steady boundary layer (one balance per surface segment), or geostrophic
        double[][] colU = new double[nx][];
        double[][] colV = new double[nx][];
        java.util.Map<SurfaceSegment, double[][]> bySegment = new java.util.IdentityHashMap<>();
        for (int i = 0; i < nx; i++) {
            int col = i;
            double[][] b = bySegment.computeIfAbsent(segment[i], s -> balancedWind(col, t0));
            colU[i] = b[0];
            colV[i] = b[1];
        }
        for (int k = 0; k < nz; k++) {
            for (int i = 0; i < nx; i++) {
                int n = k * nx + i;
                // u at the west face of cell i: between the columns i - 1 and i
                u[n] = 0.5 * (colU[g.im1[i]][k] + colU[i][k]) + up.at(g.xc[i] - 0.5 * g.dx, g.zc[k]);
                v[n] = colV[i][k];
                th[n] = th0[k] + thp.at(g.xc[i], g.zc[k]);
                q[n] = Math.max(0.0, q0[k] + qp.at(g.xc[i], g.zc[k]));
            }
        }
        if (farLeft != null) {
            farLeft.startFrom(colU[farLeft.i], colV[farLeft.i]);
            farRight.startFrom(colU[farRight.i], colV[farRight.i]);
        }
        project(1.0);
        phiScale = 0.0; // no pressure before the first step
    }

    /**
     * The steady boundary-layer wind {u, v} of column i at time t ({@link NonlinearConfig.InitialWind}): the
     * geostrophic wind without mixing or with {@link NonlinearConfig.InitialWind#GEOSTROPHIC}; otherwise the
     * {@link EkmanBalance} of the column's surface drag and K-profile at the background theta and r and the start
     * depth h, iterated until the drag (which depends on the wind it makes) settles.
     */
    private double[][] balancedWind(int i, double t) {
        double[] ub = new double[nz];
        double[] vb = new double[nz];
        java.util.Arrays.fill(ub, ug);
        java.util.Arrays.fill(vb, vg);
        if (!cfg.switches().mixing() || cfg.initialWind() == NonlinearConfig.InitialWind.GEOSTROPHIC) {
            return new double[][] {ub, vb};
        }
        double alpha = cfg.damping().rayleighFrictionPerS();
        double[] damp = new double[nz];
        for (int k = 0; k < nz; k++) {
            damp[k] = alpha + rTopC[k];
        }
        ColumnSurfaceFluxes one = cfg.forcing() instanceof Forcing.SurfaceEnergyBalance seb
                ? new ColumnSurfaceFluxes(cfg.surface(), new double[] {g.xc[i]}, cfg.coast(), seb.partition()) : null;
        double[] kI = new double[nz + 1];
        double[] fl = new double[3];
        double drag = Double.NaN;
        for (int it = 0; it < 60; it++) {
            double spd = Math.max(0.5, Math.hypot(ub[0], vb[0]));
            if (one != null) {
                one.compute(t, ((Forcing.SurfaceEnergyBalance) cfg.forcing()).cloudFraction(), new double[] {spd}, g.zc[0],
                        new double[] {th0[0]}, new double[] {q0[0]}, surfacePressure);
                fl[0] = one.kinematicHeatFluxKMs()[0];
                fl[2] = one.dragCoefficient()[0];
            } else {
                fluxes(i, t, spd, th0[0], q0[0], fl);
            }
            kProfile(fl[0], spd, fl[2], h[i], kI, 0, 1);
            double d = fl[2] * spd;
            // under-relaxed: the drag and the wind it makes settle together
            double next = Double.isNaN(drag) ? d : 0.5 * (drag + d);
            boolean settled = !Double.isNaN(drag) && Math.abs(next - drag) <= 1e-6 * Math.max(next, 1e-6);
            drag = next;
            EkmanBalance.solve(g.dzf, g.dzc, kI, drag, f, damp, ug, vg, ub, vb);
            if (settled) {
                break;
            }
        }
        return new double[][] {ub, vb};
    }

    // ---------------------------------------------------------------- step control

    private double chooseStep() {
        double c = 0;
        if (lin) {
            c = Math.abs(ug) * invDx;
        } else {
            for (int k = 0; k < nz; k++) {
                double idz = 1.0 / g.dzf[k];
                int o = k * nx;
                for (int i = 0; i < nx; i++) {
                    double cu = Math.max(Math.abs(u[o + i]), Math.abs(u[o + g.ip1[i]])) * invDx;
                    double cw = Math.max(Math.abs(w[o + i]), Math.abs(w[o + nx + i])) * idz;
                    if (cu + cw > c) {
                        c = cu + cw;
                    }
                }
            }
        }
        NonlinearConfig.Numerics num = cfg.numerics();
        double dt = num.maxStepS();
        if (c > 0) {
            // the limited-slope scheme (linear mode, or chosen) is monotone only up to a Courant sum of 0.5
            double courant = useFct ? num.courantNumber() : Math.min(num.courantNumber(), 0.5);
            dt = Math.min(dt, courant / c);
        }
        if (nMax > 0) {
            dt = Math.min(dt, num.buoyancyStepFactor() / nMax);
        }
        if (f != 0) {
            dt = Math.min(dt, num.buoyancyStepFactor() / Math.abs(f));
        }
        double rate = cfg.damping().rayleighFrictionPerS() + cfg.damping().newtonianCoolingPerS();
        if (rate > 0) {
            dt = Math.min(dt, 1.0 / rate);
        }
        return dt;
    }

    // ---------------------------------------------------------------- SSP-RK3 with projection

    private void rk3(double t, double dt) {
        System.arraycopy(u, 0, un, 0, u.length);
        System.arraycopy(v, 0, vn, 0, v.length);
        System.arraycopy(w, 0, wn, 0, w.length);
        System.arraycopy(th, 0, thn, 0, th.length);
        System.arraycopy(q, 0, qn, 0, q.length);
        // Shu & Osher (1988) eq. 2.18: u1 = un + dt L(un); u2 = 3/4 un + 1/4 (u1 + dt L(u1));
        // u(n+1) = 1/3 un + 2/3 (u2 + dt L(u2)); stage times t, t + dt, t + dt/2.
        // the weight of each stage's tendency in the step: 1/6, 1/6, 2/3
        if (useFct) {
            java.util.Arrays.fill(fxTh, 0.0);
            java.util.Arrays.fill(fzTh, 0.0);
            java.util.Arrays.fill(fxQ, 0.0);
            java.util.Arrays.fill(fzQ, 0.0);
            java.util.Arrays.fill(uMean, 0.0);
            java.util.Arrays.fill(wMean, 0.0);
        }
        stageWeight = 1.0 / 6.0;
        stage(t, dt, 0.0, 1.0);
        stageWeight = 1.0 / 6.0;
        stage(t + dt, dt, 0.75, 0.25);
        stageWeight = 2.0 / 3.0;
        stage(t + 0.5 * dt, dt, 1.0 / 3.0, 2.0 / 3.0);
        if (useFct) {
            // theta and r leave the step as s_n + dt S - dt div F with F the step's mean third-order flux:
            // limit F against first-order upwind (final-stage limiting, Skamarock 2006)
            fct.limit(thn, th, fxTh, fzTh, uMean, wMean, dt);
            fct.limit(qn, q, fxQ, fzQ, uMean, wMean, dt);
        }
    }

    private void stage(double t, double dt, double a, double b) {
        tendencies(t);
        combine(u, un, tu, a, b, dt);
        combine(v, vn, tv, a, b, dt);
        combine(w, wn, tw, a, b, dt);
        combine(th, thn, tth, a, b, dt);
        combine(q, qn, tq, a, b, dt);
        project(b * dt);
    }

    private static void combine(double[] x, double[] xn, double[] tx, double a, double b, double dt) {
        if (a == 0.0) {
            for (int n = 0; n < x.length; n++) {
                x[n] = x[n] + dt * tx[n];
            }
        } else {
            for (int n = 0; n < x.length; n++) {
                x[n] = a * xn[n] + b * (x[n] + dt * tx[n]);
            }
        }
    }

    /** Removes the divergence of (u, w); chi / dtEff is the kinematic pressure p' / rho_0. */
    private void project(double dtEff) {
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx - 1; i++) {
                chi[o + i] = (u[o + i + 1] - u[o + i]) * invDx + (w[o + nx + i] - w[o + i]) * idz;
            }
            int e = o + nx - 1;
            chi[e] = (u[o] - u[e]) * invDx + (w[e + nx] - w[e]) * idz;
        }
        poisson.solve(chi, chi);
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            u[o] -= (chi[o] - chi[o + nx - 1]) * invDx;
            for (int i = 1; i < nx; i++) {
                u[o + i] -= (chi[o + i] - chi[o + i - 1]) * invDx;
            }
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            double idz = 1.0 / g.dzc[k];
            for (int i = 0; i < nx; i++) {
                w[o + i] -= (chi[o + i] - chi[o - nx + i]) * idz;
            }
        }
        // phi = chi / dtEff is only read when a snapshot is stored: keep chi and the factor
        phiScale = 1.0 / dtEff;
    }

    // ---------------------------------------------------------------- explicit tendencies

    private void tendencies(double t) {
        // the advection routines write (not add to) their tendency arrays: they start every tendency
        // from zero; w at the ground and the lid has no tendency
        java.util.Arrays.fill(tw, 0, nx, 0.0);
        java.util.Arrays.fill(tw, nz * nx, (nz + 1) * nx, 0.0);
        advectU();
        advectCentre3(v, tv, null, null);
        advectW();
        if (useFct) {
            double wt = stageWeight;
            for (int n = 0; n < uMean.length; n++) {
                uMean[n] += wt * u[n];
            }
            for (int n = 0; n < wMean.length; n++) {
                wMean[n] += wt * w[n];
            }
            advectCentre3(th, tth, fxTh, fzTh);
            advectCentre3(q, tq, fxQ, fzQ);
        } else {
            advectCentreLimited(th, tth);
            advectCentreLimited(q, tq);
        }
        double alpha = cfg.damping().rayleighFrictionPerS();
        double alphaN = cfg.damping().newtonianCoolingPerS();
        boolean moist = cfg.switches().moistureBuoyancy();
        // Coriolis and damping; a zero damping rate adds nothing, so its terms are skipped
        boolean damped = alpha != 0.0;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            shift(v, o, -1, sh1); // v of cell i - 1
            shift(u, o, 1, sh2);  // u at the east face of cell i
            if (damped) {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    tu[n] += f * (0.5 * (sh1[i] + v[n]) - vg) - alpha * (u[n] - ug);
                    tv[n] += -f * (0.5 * (u[n] + sh2[i]) - ug) - alpha * (v[n] - vg);
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    tu[n] += f * (0.5 * (sh1[i] + v[n]) - vg);
                    tv[n] += -f * (0.5 * (u[n] + sh2[i]) - ug);
                }
            }
            if (alphaN != 0.0) {
                double t0k = th0[k];
                double q0k = q0[k];
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    tth[n] -= alphaN * (th[n] - t0k);
                    tq[n] -= alphaN * (q[n] - q0k);
                }
            }
            if (lin) {
                // linearised vertical advection of the basic state: -w d(theta_0)/dz, -w d(r_0)/dz
                for (int i = 0; i < nx; i++) {
                    double wc = 0.5 * (w[o + i] + w[o + nx + i]);
                    tth[o + i] -= wc * dth0[k];
                    tq[o + i] -= wc * dq0[k];
                }
            }
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            double wl = g.wLo[k];
            double bl = Thermo.G * wl / th0[k - 1];
            double bh = Thermo.G * (1.0 - wl) / th0[k];
            double tLo = th0[k - 1];
            double tHi = th0[k];
            if (moist) {
                double qLo = q0[k - 1];
                double qHi = q0[k];
                double gv = Thermo.G * VIRTUAL_FACTOR;
                double wh = 1.0 - wl;
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double b = bl * (th[n - nx] - tLo) + bh * (th[n] - tHi);
                    b += gv * (wl * (q[n - nx] - qLo) + wh * (q[n] - qHi));
                    tw[n] += damped ? b - alpha * w[n] : b;
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double b = bl * (th[n - nx] - tLo) + bh * (th[n] - tHi);
                    tw[n] += damped ? b - alpha * w[n] : b;
                }
            }
        }
        if (cfg.forcing() instanceof Forcing.PrescribedHeating ph) {
            HeatingRate hr = ph.heating();
            for (int k = 0; k < nz; k++) {
                for (int i = 0; i < nx; i++) {
                    tth[k * nx + i] += hr.kelvinPerSecond(g.xc[i], g.zc[k], t);
                }
            }
        }
    }

    private static final double ONE_TWELFTH = 1.0 / 12.0;

    /** Third-order upwind-biased flux, Wicker &amp; Skamarock (2002) eq. 4: 4th-order centred plus |a| dissipation. */
    private static double flux3(double a, double fm1, double f0, double fp1, double fp2) {
        // one multiplication by 1/12 rather than two divisions by 12: a round-off-level difference that
        // lets the flux loops run as vector instructions
        return (a * (7.0 * (f0 + fp1) - (fm1 + fp2)) + Math.abs(a) * ((fp2 - fm1) - 3.0 * (fp1 - f0))) * ONE_TWELFTH;
    }

    /** Monotonised-central limited slope (van Leer 1977): minmod(2 dm, 2 dp, (dm + dp) / 2). */
    private static double mcSlope(double dm, double dp) {
        if (dm * dp <= 0.0) {
            return 0.0;
        }
        double c = 0.5 * (dm + dp);
        double lim = 2.0 * Math.min(Math.abs(dm), Math.abs(dp));
        return Math.abs(c) < lim ? c : Math.copySign(lim, c);
    }

    private void advectCentreLimited(double[] s, double[] ts) {
        // one sweep up the levels: x fluxes of level k, then the z flux through its top, so each row of
        // ts is updated once while rows k..k+2 of s are still in cache (same operations in the same order
        // per point as an x pass followed by a z pass)
        double[] sl = hSlope;
        java.util.Arrays.fill(fzBot, 0.0);
        java.util.Arrays.fill(slopeA, 0.0); // z slope of layer k: zero next to ground and lid (first order there)
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            shift(s, o, -1, sh1);
            shift(s, o, 1, sh2);
            for (int i = 0; i < nx; i++) {
                double c = s[o + i];
                sl[i] = mcSlope(c - sh1[i], sh2[i] - c);
            }
            shift(sl, 0, -1, sh3); // slope of cell i - 1
            // fx[i]: flux through the west face of cell i, upwind reconstruction; the upwind choice as
            // max(a, 0) L + min(a, 0) R (the same value as selecting L or R, without a branch)
            if (lin) {
                double ap = Math.max(ug, 0.0);
                double am = Math.min(ug, 0.0);
                for (int i = 0; i < nx; i++) {
                    fx[i] = ap * (sh1[i] + 0.5 * sh3[i]) + am * (s[o + i] - 0.5 * sl[i]);
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    double a = u[o + i];
                    fx[i] = Math.max(a, 0.0) * (sh1[i] + 0.5 * sh3[i]) + Math.min(a, 0.0) * (s[o + i] - 0.5 * sl[i]);
                }
            }
            shift(fx, 0, 1, fxs);
            if (lin) {
                for (int i = 0; i < nx; i++) {
                    ts[o + i] = 0.0 - (fxs[i] - fx[i]) * invDx;
                }
                continue;
            }
            if (k + 1 < nz) {
                if (k + 1 < nz - 1) {
                    for (int i = 0; i < nx; i++) {
                        slopeB[i] = mcSlope(s[o + nx + i] - s[o + i], s[o + 2 * nx + i] - s[o + nx + i]);
                    }
                } else {
                    java.util.Arrays.fill(slopeB, 0.0);
                }
                for (int i = 0; i < nx; i++) {
                    double a = w[o + nx + i];
                    fzTop[i] = Math.max(a, 0.0) * (s[o + i] + 0.5 * slopeA[i])
                            + Math.min(a, 0.0) * (s[o + nx + i] - 0.5 * slopeB[i]);
                }
            } else {
                java.util.Arrays.fill(fzTop, 0.0);
            }
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fxs[i] - fx[i]) * invDx;
                ts[o + i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
                slopeA[i] = slopeB[i];
            }
        }
    }

    /*
     * The momentum advection loops below read every neighbour from a row copy at the same index
     * (sh1..sh4, fxs): loops of that form are compiled to vector instructions, loops with shifted
     * indices into one array are not.
     */

    /** out[i] = s[o + (i + d) mod nx] for one row and a shift |d| &lt;= 2. */
    private void shift(double[] s, int o, int d, double[] out) {
        if (d > 0) {
            System.arraycopy(s, o + d, out, 0, nx - d);
            System.arraycopy(s, o, out, nx - d, d);
        } else {
            int e = -d;
            System.arraycopy(s, o + nx - e, out, 0, e);
            System.arraycopy(s, o, out, e, nx - e);
        }
    }

    /*
     * Each routine below sweeps up the levels once: the x fluxes of a row, then the z flux through its
     * top, so each tendency row is written once while the few rows the fluxes read are still in cache
     * (the same operations in the same order per point as an x pass followed by a z pass).
     */

    /**
     * Advection of a cell-centred field (v; theta and r under flux-corrected transport) with the third-order
     * flux: by the ambient wind in x only in linear mode, by the flow in x and z otherwise
     * ({@link #advectCentre3Rows}). When accX is not null the fluxes, times the stage weight, are added to
     * accX (west faces) and accZ (interfaces).
     */
    private void advectCentre3(double[] s, double[] ts, double[] accX, double[] accZ) {
        if (!lin) {
            advectCentre3Rows(s, ts, accX, accZ);
            return;
        }
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            shift(s, o, -2, sh1);
            shift(s, o, -1, sh2);
            shift(s, o, 1, sh3);
            // fx[i]: flux through the west face of cell i
            for (int i = 0; i < nx; i++) {
                fx[i] = flux3(ug, sh1[i], sh2[i], s[o + i], sh3[i]);
            }
            shift(fx, 0, 1, fxs);
            for (int i = 0; i < nx; i++) {
                ts[o + i] = 0.0 - (fxs[i] - fx[i]) * invDx;
            }
        }
    }

    /**
     * The nonlinear path of {@link #advectCentre3}: x fluxes of a row, then the z flux through its top (third
     * order inside, centred second order next to the ground and the lid); every loop reads and writes row
     * copies at one index, so that all of them compile to vector instructions.
     */
    private void advectCentre3Rows(double[] s, double[] ts, double[] accX, double[] accZ) {
        java.util.Arrays.fill(fzBot, 0.0);
        double wt = stageWeight;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            shift(s, o, -2, sh1);
            shift(s, o, -1, sh2);
            shift(s, o, 1, sh3);
            System.arraycopy(s, o, rowB, 0, nx);
            System.arraycopy(u, o, rowU, 0, nx);
            for (int i = 0; i < nx; i++) {
                fx[i] = flux3(rowU[i], sh1[i], sh2[i], rowB[i], sh3[i]);
            }
            shift(fx, 0, 1, fxs);
            if (accX != null) {
                System.arraycopy(accX, o, rowT, 0, nx);
                for (int i = 0; i < nx; i++) {
                    rowT[i] += wt * fx[i];
                }
                System.arraycopy(rowT, 0, accX, o, nx);
            }
            int kf = k + 1; // top interface of layer k
            int of = kf * nx;
            if (kf >= 2 && kf <= nz - 2) {
                System.arraycopy(s, o - nx, rowA, 0, nx);
                System.arraycopy(s, o + nx, rowC, 0, nx);
                System.arraycopy(s, o + 2 * nx, rowD, 0, nx);
                System.arraycopy(w, of, rowW, 0, nx);
                for (int i = 0; i < nx; i++) {
                    fzTop[i] = flux3(rowW[i], rowA[i], rowB[i], rowC[i], rowD[i]);
                }
            } else if (kf < nz) {
                double wl = g.wLo[kf];
                System.arraycopy(s, o + nx, rowC, 0, nx);
                System.arraycopy(w, of, rowW, 0, nx);
                for (int i = 0; i < nx; i++) {
                    fzTop[i] = rowW[i] * (wl * rowB[i] + (1.0 - wl) * rowC[i]);
                }
            } else {
                java.util.Arrays.fill(fzTop, 0.0);
            }
            if (accZ != null && kf < nz) {
                System.arraycopy(accZ, of, rowT, 0, nx);
                for (int i = 0; i < nx; i++) {
                    rowT[i] += wt * fzTop[i];
                }
                System.arraycopy(rowT, 0, accZ, of, nx);
            }
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fxs[i] - fx[i]) * invDx;
                rowT[i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
            }
            System.arraycopy(rowT, 0, ts, o, nx);
        }
    }

    private void advectU() {
        java.util.Arrays.fill(fzBot, 0.0);
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            shift(u, o, -1, sh1);
            shift(u, o, 1, sh2);
            shift(u, o, 2, sh3);
            // fx[i]: flux through cell centre i, the east side of the u control volume around face i
            if (lin) {
                for (int i = 0; i < nx; i++) {
                    fx[i] = flux3(ug, sh1[i], u[o + i], sh2[i], sh3[i]);
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    double a = 0.5 * (u[o + i] + sh2[i]);
                    fx[i] = flux3(a, sh1[i], u[o + i], sh2[i], sh3[i]);
                }
            }
            shift(fx, 0, -1, fxs);
            if (lin) {
                for (int i = 0; i < nx; i++) {
                    tu[o + i] = 0.0 - (fx[i] - fxs[i]) * invDx;
                }
                continue;
            }
            int kf = k + 1;
            int of = kf * nx;
            if (kf < nz) {
                shift(w, of, -1, sh1);
            }
            if (kf >= 2 && kf <= nz - 2) {
                for (int i = 0; i < nx; i++) {
                    double a = 0.5 * (sh1[i] + w[of + i]);
                    int n = o + i;
                    fzTop[i] = flux3(a, u[n - nx], u[n], u[n + nx], u[n + 2 * nx]);
                }
            } else if (kf < nz) {
                double wl = g.wLo[kf];
                for (int i = 0; i < nx; i++) {
                    double a = 0.5 * (sh1[i] + w[of + i]);
                    int n = o + i;
                    fzTop[i] = a * (wl * u[n] + (1.0 - wl) * u[n + nx]);
                }
            } else {
                java.util.Arrays.fill(fzTop, 0.0);
            }
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fx[i] - fxs[i]) * invDx;
                tu[o + i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
            }
        }
    }

    private void advectW() {
        if (!lin) {
            // vertical flux through layer centre 0 (between the ground and interface 1)
            for (int i = 0; i < nx; i++) {
                double a = 0.5 * (w[i] + w[nx + i]);
                fzBot[i] = a * a;
            }
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            double wl = g.wLo[k];
            shift(w, o, -1, sh1);
            shift(w, o, 1, sh2);
            shift(w, o, 2, sh3);
            // fx[i]: flux through x_{i+1/2} at interface k
            if (lin) {
                for (int i = 0; i < nx; i++) {
                    fx[i] = flux3(ug, sh1[i], w[o + i], sh2[i], sh3[i]);
                }
                shift(fx, 0, -1, fxs);
                for (int i = 0; i < nx; i++) {
                    tw[o + i] = 0.0 - (fx[i] - fxs[i]) * invDx;
                }
                continue;
            }
            shift(u, o - nx, 1, sh4);
            shift(u, o, 1, fxs);
            for (int i = 0; i < nx; i++) {
                double a = wl * sh4[i] + (1.0 - wl) * fxs[i];
                fx[i] = flux3(a, sh1[i], w[o + i], sh2[i], sh3[i]);
            }
            shift(fx, 0, -1, fxs);
            // vertical flux through layer centre k (between interfaces k and k+1)
            if (k + 2 <= nz) {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double a = 0.5 * (w[n] + w[n + nx]);
                    fzTop[i] = flux3(a, w[n - nx], w[n], w[n + nx], w[n + 2 * nx]);
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double a = 0.5 * (w[n] + w[n + nx]);
                    fzTop[i] = a * a;
                }
            }
            double idz = 1.0 / g.dzc[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fx[i] - fxs[i]) * invDx;
                tw[o + i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
            }
        }
    }

    // ---------------------------------------------------------------- implicit physics (split)

    private void implicitPhysics(double t, double dt) {
        if (farLeft != null) {
            farLeft.step(t, dt);
            farRight.step(t, dt);
        }
        surfaceFluxes(t);
        if (cfg.switches().mixing()) {
            mixedLayer(t, dt);
            verticalMixing(dt);
        } else {
            double idz = dt / g.dzf[0];
            for (int i = 0; i < nx; i++) {
                th[i] += heatFluxKin[i] * idz;
                q[i] = Math.max(0.0, q[i] + moistFluxKin[i] * idz);
            }
        }
        sponges(dt);
    }

    /**
     * Surface heat and moisture fluxes (kinematic: K m/s and kg/kg m/s) and drag coefficients of every
     * column, from the air in the lowest layer.
     */
    private void surfaceFluxes(double t) {
        for (int i = 0; i < nx; i++) {
            double uc = 0.5 * (u[i] + u[g.ip1[i]]);
            windSfc[i] = Math.max(0.5, Math.sqrt(uc * uc + v[i] * v[i]));
        }
        if (energyBalance != null) {
            System.arraycopy(th, 0, theta1, 0, nx);
            System.arraycopy(q, 0, q1, 0, nx);
            energyBalance.compute(t, ((Forcing.SurfaceEnergyBalance) cfg.forcing()).cloudFraction(), windSfc, g.zc[0],
                    theta1, q1, surfacePressure);
            System.arraycopy(energyBalance.kinematicHeatFluxKMs(), 0, heatFluxKin, 0, nx);
            System.arraycopy(energyBalance.kinematicMoistureFlux(), 0, moistFluxKin, 0, nx);
            System.arraycopy(energyBalance.dragCoefficient(), 0, cd, 0, nx);
            return;
        }
        for (int i = 0; i < nx; i++) {
            fluxes(i, t, windSfc[i], th[i], q[i], fluxPair);
            heatFluxKin[i] = fluxPair[0];
            moistFluxKin[i] = fluxPair[1];
            cd[i] = fluxPair[2];
        }
    }

    private final double[] fluxPair = new double[3];

    /**
     * {kinematic heat flux K m/s, moisture flux kg/kg m/s, drag coefficient} over column i's surface for
     * the prescribed forcings: water from the bulk formulas with stability ({@link BulkFlux#overWater}),
     * land drag from {@link BulkFlux#withHeatFlux} (neutral when no flux is prescribed).
     */
    private void fluxes(int i, double t, double wind, double thetaAir, double qAir, double[] out) {
        SurfaceSegment seg = segment[i];
        if (!(cfg.forcing() instanceof Forcing.PrescribedSurfaceFlux pf)) {
            out[0] = 0.0;
            out[1] = 0.0;
            out[2] = BulkFlux.neutral(wind, g.zc[0], seg.roughnessM()).dragCoefficient();
            return;
        }
        if (seg instanceof SurfaceSegment.Land l) {
            double hLand = pf.landSensibleWm2(t);
            out[0] = hLand / (surfaceRho * Thermo.CP);
            // Bowen ratio B = H / LE (e.g. Oke 1987): LE = H / B by day, no dew at night
            out[1] = hLand > 0 ? hLand / l.bowenRatio() / (surfaceRho * Thermo.LV) : 0.0;
            out[2] = BulkFlux.withHeatFlux(wind, g.zc[0], l.roughnessM(), out[0], thetaAir).dragCoefficient();
        } else {
            SurfaceSegment.Water wa = (SurfaceSegment.Water) seg;
            BulkFluxes bf = BulkFlux.overWater(wind, g.zc[0], wa.seaSurfaceTemperatureK(), thetaAir, Math.max(0.0, qAir),
                    surfacePressure, wa.roughnessM());
            out[0] = bf.kinematicHeatFluxKMs();
            out[1] = bf.kinematicMoistureFlux();
            out[2] = bf.dragCoefficient();
        }
    }

    /**
     * Slab mixed-layer depth per column: zero-order-jump growth d(h^2)/dt = 2 (1 + 2A) H_kin / gamma
     * (Tennekes 1973) while the surface heats, upwind advection by the layer-mean cross-shore wind,
     * collapse to the night depth when the heat flux turns negative; the marine layer over water keeps
     * at least its configured depth.
     */
    private void mixedLayer(double t, double dt) {
        NonlinearConfig.BoundaryLayer bl = cfg.boundaryLayer();
        // advection: dh/dt = -u_ml dh/dx (first-order upwind, monotone)
        for (int i = 0; i < nx; i++) {
            double hu = 0;
            double wsum = 0;
            for (int k = 0; k < nz && g.zf[k] < h[i]; k++) {
                double dz = Math.min(g.zf[k + 1], h[i]) - g.zf[k];
                hu += 0.5 * (u[k * nx + i] + u[k * nx + g.ip1[i]]) * dz;
                wsum += dz;
            }
            double um = wsum > 0 ? hu / wsum : 0;
            double dhdx = um >= 0 ? (h[i] - h[g.im1[i]]) * invDx : (h[g.ip1[i]] - h[i]) * invDx;
            hWork[i] = h[i] - dt * um * dhdx;
        }
        for (int i = 0; i < nx; i++) {
            h[i] = grownDepth(hWork[i], heatFluxKin[i], land[i], dt);
        }
    }

    /** One step of the slab depth: ZOJ growth while heated, collapse on land when not, marine floor on water. */
    private double grownDepth(double hh, double heatFlux, boolean isLand, double dt) {
        NonlinearConfig.BoundaryLayer bl = cfg.boundaryLayer();
        double floor = isLand ? bl.nightDepthM() : bl.marineDepthM();
        if (heatFlux > 0 || isLand) {
            double gamma = Math.min(0.09, Math.max(1e-4, cfg.theta().gradientKPerM(hh)));
            // zero-order-jump growth d(h^2)/dt = 2 (1 + 2A) H_kin / gamma, collapse when not heated (Tennekes 1973)
            hh = new SlabMixedLayer(bl.entrainmentRatio(), gamma, floor).step(hh, heatFlux, dt);
        }
        return Math.min(Math.max(hh, floor), 0.9 * g.topM());
    }

    /**
     * Implicit (backward Euler) vertical mixing of u, v, theta and r with K from the K-profile
     * K = kappa w_s z (1 - z/h)^2 below h (Troen &amp; Mahrt 1986), w_s = (u*^3 + 0.6 w*^3)^(1/3)
     * (Holtslag &amp; Boville 1993; from memory), plus a background K above; surface fluxes and the bulk
     * drag tau/rho = C_D |V| V (implicit in V) as the lower boundary condition.
     */
    private void verticalMixing(double dt) {
        for (int i = 0; i < nx; i++) {
            double hm = h[i];
            if (heatFluxKin[i] > 0) {
                for (int k = 0; k < nz; k++) {
                    int n = k * nx + i;
                    colTv[k] = th[n] * (1.0 + VIRTUAL_FACTOR * q[n]);
                    colU[k] = 0.5 * (u[n] + u[k * nx + g.ip1[i]]);
                    colV[k] = v[n];
                }
                hm = mixingDepth(colTv, colU, colV, h[i], heatFluxKin[i], Math.sqrt(cd[i]) * windSfc[i]);
            }
            cgFactor[i] = kProfile(heatFluxKin[i], windSfc[i], cd[i], hm, kIface, i, nx);
        }
        // all columns at once: each level is a loop over columns, so the Thomas recurrences of
        // different columns run side by side (same arithmetic per column as a column-by-column solve)
        double kb = cfg.boundaryLayer().backgroundDiffusivityM2PerS();
        for (int i = 0; i < nx; i++) {
            dragCol[i] = cd[i] * windSfc[i];
        }
        // theta and r: K of the column itself, no drag; one factorisation for both
        diffusionCoefficients(kIface, false, dt);
        factorise(null, dt, triM, triB);
        for (int i = 0; i < nx; i++) {
            fluxCol[i] = heatFluxKin[i];
            cgCol[i] = cgFactor[i] * heatFluxKin[i];
        }
        solveFactorised(th, triM, triB, dt, kb);
        for (int i = 0; i < nx; i++) {
            fluxCol[i] = moistFluxKin[i];
            cgCol[i] = cgFactor[i] * moistFluxKin[i];
        }
        solveFactorised(q, triM, triB, dt, kb);
        // v: same K, drag on the lowest layer
        java.util.Arrays.fill(fluxCol, 0.0);
        java.util.Arrays.fill(cgCol, 0.0);
        factorise(dragCol, dt, triM, triB);
        solveFactorised(v, triM, triB, dt, kb);
        // u at the west face of cell i: average K and drag of the two columns
        for (int i = 0; i < nx; i++) {
            int l = g.im1[i];
            dragFace[i] = 0.5 * (cd[i] * windSfc[i] + cd[l] * windSfc[l]);
        }
        diffusionCoefficients(kIface, true, dt);
        factorise(dragFace, dt, triM, triB);
        solveFactorised(u, triM, triB, dt, kb);
        for (int i = 0; i < nx; i++) {
            q[i] = Math.max(q[i], 0.0);
        }
    }

    /**
     * Interface diffusivities (column K, or the average of columns i-1 and i at u points) into triK and
     * the backward-Euler couplings lo = dt K_k / (dz_k dzc_k), hi = dt K_(k+1) / (dz_k dzc_(k+1)) into
     * triLo and triHi, all [k * nx + i].
     */
    private void diffusionCoefficients(double[] kI, boolean faces, double dt) {
        int[] im = g.im1;
        for (int k = 0; k <= nz; k++) {
            int o = k * nx;
            if (faces) {
                for (int i = 0; i < nx; i++) {
                    triK[o + i] = 0.5 * (kI[o + im[i]] + kI[o + i]);
                }
            } else {
                System.arraycopy(kI, o, triK, o, nx);
            }
        }
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double cLo = k > 0 ? dt / (g.dzf[k] * g.dzc[k]) : 0.0;
            double cHi = k < nz - 1 ? dt / (g.dzf[k] * g.dzc[k + 1]) : 0.0;
            for (int i = 0; i < nx; i++) {
                triLo[o + i] = cLo * triK[o + i];
                triHi[o + i] = cHi * triK[o + nx + i];
            }
        }
    }

    /**
     * Thomas forward elimination of the matrices (-lo, 1 + lo + hi (+ dt drag / dz_0 at k = 0), -hi)
     * of all columns: multipliers into m and reciprocal pivots into b (one division per point; the
     * solves then only multiply).
     */
    private void factorise(double[] dragMPerS, double dt, double[] m, double[] b) {
        double dragFactor = dt / g.dzf[0];
        for (int i = 0; i < nx; i++) {
            double b0 = 1.0 + triLo[i] + triHi[i];
            if (dragMPerS != null) {
                b0 += dragFactor * dragMPerS[i];
            }
            b[i] = 1.0 / b0;
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double mk = -triLo[o + i] * b[o - nx + i];
                m[o + i] = mk;
                b[o + i] = 1.0 / (1.0 + triLo[o + i] + triHi[o + i] + mk * triHi[o - nx + i]);
            }
        }
    }

    /**
     * Backward-Euler diffusion of s for all columns with the factorised matrices; surface flux fluxCol
     * into the lowest layer and the explicit divergence of the non-local flux cgCol * max(0, K - K_bg).
     */
    private void solveFactorised(double[] s, double[] m, double[] b, double dt, double kb) {
        for (int k = 0; k < nz; k++) {
            dtOverDz[k] = dt / g.dzf[k];
        }
        double[] r = triR;
        System.arraycopy(s, 0, r, 0, nz * nx);
        for (int i = 0; i < nx; i++) {
            double cg = cgCol[i];
            if (cg == 0.0) {
                continue;
            }
            // explicit divergence of the non-local flux K gamma_c through the layer's interfaces
            for (int k = 0; k < nz; k++) {
                int n = k * nx + i;
                double fTop = k + 1 < nz ? Math.max(0.0, triK[n + nx] - kb) : 0.0;
                double fBot = k > 0 ? Math.max(0.0, triK[n] - kb) : 0.0;
                r[n] -= dtOverDz[k] * cg * (fTop - fBot);
            }
        }
        double fluxFactor = dt / g.dzf[0];
        for (int i = 0; i < nx; i++) {
            r[i] += fluxFactor * fluxCol[i];
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                r[o + i] -= m[o + i] * r[o - nx + i];
            }
        }
        int top = (nz - 1) * nx;
        for (int i = 0; i < nx; i++) {
            s[top + i] = r[top + i] * b[top + i];
        }
        for (int k = nz - 2; k >= 0; k--) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                s[o + i] = (r[o + i] + triHi[o + i] * s[o + nx + i]) * b[o + i];
            }
        }
    }

    private final double[] dtOverDz;
    private final double[] dragCol;
    private final double[] dragFace;
    private final double[] fluxCol;
    private final double[] cgCol;
    private final double[] triK;
    private final double[] triLo;
    private final double[] triHi;
    private final double[] triM;
    private final double[] triB;
    private final double[] triR;

    /** K at interfaces 0..nz of one column into out[offset + k * stride]. */
    private double kProfile(double heatFlux, double wind, double cdI, double hI, double[] out, int offset, int stride) {
        double kbg = cfg.boundaryLayer().backgroundDiffusivityM2PerS();
        double ustar = Math.max(0.01, Math.sqrt(cdI) * wind);
        // Troen & Mahrt (1986) profile with the Holtslag & Boville (1993) velocity scale (surface package)
        KProfile kp = KProfile.of(ustar, heatFlux, th0[0], hI, kbg);
        out[offset] = 0;
        out[offset + nz * stride] = 0;
        for (int k = 1; k < nz; k++) {
            out[offset + k * stride] = g.zf[k] < hI ? kp.diffusivityM2s(g.zf[k]) : kbg;
        }
        // countergradient (non-local) term of Troen & Mahrt (1986): gamma_c = C w'x'_s / (w_s h), C = 6.5
        // (from memory), so the heated layer mixes to neutral instead of staying superadiabatic
        return heatFlux > 0 ? COUNTERGRADIENT_C / (kp.velocityScaleMs(0.5 * hI) * hI) : 0.0;
    }

    static final double COUNTERGRADIENT_C = 6.5;
    /** Critical bulk Richardson number of the mixing-depth diagnosis (Vogelezang &amp; Holtslag 1996, from memory). */
    static final double RI_CRITICAL = 0.25;
    /** Weight of u*^2 in the bulk Richardson number's shear (Vogelezang &amp; Holtslag 1996, b = 100, from memory). */
    static final double RI_USTAR_WEIGHT = 100.0;
    /** Thermal excess of a surface parcel, b w'theta'_s / w_s with b = 8.5 (Troen &amp; Mahrt 1986, from memory). */
    static final double EXCESS_B = 8.5;

    private final double[] colTv;
    private final double[] colU;
    private final double[] colV;

    /**
     * Depth of the turbulent layer of a heated column, m: the slab mixed-layer depth, unless the column's own
     * profile caps the turbulence lower, as where cool marine air has run in under the warm convective layer
     * behind a breeze front. Diagnosed as in non-local K-profile schemes (Troen &amp; Mahrt 1986, BLM 37,
     * 129-148; Vogelezang &amp; Holtslag 1996, BLM 81, 245-269; from memory): the lowest height where the bulk
     * Richardson number of a surface parcel with its thermal excess,
     * Ri_b(z) = (g / theta_v1) (theta_v(z) - theta_v1 - b w'theta'_s / w_s) (z - z1) / (|V(z) - V1|^2 + 100 u*^2),
     * reaches 0.25; never above the slab depth and never below the night depth.
     */
    private double mixingDepth(double[] tv, double[] uc, double[] vc, double hSlab, double heatFlux, double ustar) {
        double ws = KProfile.mixedLayerVelocityScaleMs(Math.max(0.01, ustar), KProfile.convectiveVelocityMs(heatFlux, th0[0], hSlab));
        double thS = tv[0] + EXCESS_B * heatFlux / ws;
        double shear0 = RI_USTAR_WEIGHT * ustar * ustar;
        double floor = cfg.boundaryLayer().nightDepthM();
        double prevRi = 0.0;
        for (int k = 1; k < nz && g.zc[k - 1] < hSlab; k++) {
            double du = uc[k] - uc[0];
            double dv = vc[k] - vc[0];
            double ri = Thermo.G / tv[0] * (tv[k] - thS) * (g.zc[k] - g.zc[0]) / (du * du + dv * dv + shear0 + 1e-6);
            if (ri >= RI_CRITICAL) {
                double f0 = (RI_CRITICAL - prevRi) / (ri - prevRi);
                double z = g.zc[k - 1] + Math.max(0.0, Math.min(1.0, f0)) * (g.zc[k] - g.zc[k - 1]);
                return Math.max(floor, Math.min(hSlab, z));
            }
            prevRi = ri;
        }
        return hSlab;
    }
    private double[] cgFactor;

    /**
     * Backward-Euler diffusion of the column s[offset + k * stride] with interface diffusivities colK; a
     * surface flux (kinematic) into the lowest layer, a linear drag coefficient (m/s) on the lowest layer
     * and the non-local (countergradient) flux term.
     */
    private void solveColumn(double[] s, int offset, int stride, double dt, double surfaceFlux, double dragMPerS,
                             double countergradient) {
        for (int k = 0; k < nz; k++) {
            double lo = k > 0 ? dt * colK[k] / (g.dzf[k] * g.dzc[k]) : 0.0;
            double hi = k < nz - 1 ? dt * colK[k + 1] / (g.dzf[k] * g.dzc[k + 1]) : 0.0;
            colA[k] = -lo;
            colC[k] = -hi;
            colB[k] = 1.0 + lo + hi;
            colR[k] = s[offset + k * stride];
            if (countergradient != 0.0) {
                // explicit divergence of the non-local flux K gamma_c through the layer's interfaces
                double kb = cfg.boundaryLayer().backgroundDiffusivityM2PerS();
                double fTop = k + 1 < nz ? Math.max(0.0, colK[k + 1] - kb) : 0.0;
                double fBot = k > 0 ? Math.max(0.0, colK[k] - kb) : 0.0;
                colR[k] -= dt * countergradient * (fTop - fBot) / g.dzf[k];
            }
        }
        colR[0] += dt * surfaceFlux / g.dzf[0];
        colB[0] += dt * dragMPerS / g.dzf[0];
        // Thomas algorithm
        for (int k = 1; k < nz; k++) {
            double m = colA[k] / colB[k - 1];
            colB[k] -= m * colC[k - 1];
            colR[k] -= m * colR[k - 1];
        }
        double x = colR[nz - 1] / colB[nz - 1];
        s[offset + (nz - 1) * stride] = x;
        for (int k = nz - 2; k >= 0; k--) {
            x = (colR[k] - colC[k] * x) / colB[k];
            s[offset + k * stride] = x;
        }
    }

    /**
     * The undisturbed far field over the surface at each end of the domain: a single column with the same
     * surface fluxes, slab mixed layer, K-profile mixing, drag, Coriolis and damping but no circulation. It starts
     * from the same balanced state as the domain and then follows the day (the boundary layer deepens, mixes
     * momentum down, and turns with the inertial oscillation of its changing friction). The lateral sponges relax
     * u, v, theta and r toward it: a reference that evolves with the local physics yet cannot feed back on the
     * circulation.
     */
    private final class FarFieldColumn {
        final int i;
        final double[] thRef = new double[nz];
        final double[] qRef = new double[nz];
        final double[] uRef = new double[nz];
        final double[] vRef = new double[nz];
        double hRef;
        final double[] flRef = new double[3];
        final ColumnSurfaceFluxes eb1;
        final double[] one1 = new double[1];
        final double[] one2 = new double[1];
        final double[] one3 = new double[1];

        FarFieldColumn(int i) {
            this.i = i;
            System.arraycopy(th0, 0, thRef, 0, nz);
            System.arraycopy(q0, 0, qRef, 0, nz);
            java.util.Arrays.fill(uRef, ug);
            java.util.Arrays.fill(vRef, vg);
            hRef = land[i] ? cfg.boundaryLayer().initialDepthM() : cfg.boundaryLayer().marineDepthM();
            eb1 = cfg.forcing() instanceof Forcing.SurfaceEnergyBalance seb
                    ? new ColumnSurfaceFluxes(cfg.surface(), new double[] {g.xc[i]}, cfg.coast(), seb.partition()) : null;
        }

        void startFrom(double[] u0, double[] v0) {
            System.arraycopy(u0, 0, uRef, 0, nz);
            System.arraycopy(v0, 0, vRef, 0, nz);
        }

        void step(double t, double dt) {
            double spd = Math.max(0.5, Math.hypot(uRef[0], vRef[0]));
            double[] fl = flRef;
            if (eb1 != null) {
                one1[0] = spd;
                one2[0] = thRef[0];
                one3[0] = qRef[0];
                eb1.compute(t, ((Forcing.SurfaceEnergyBalance) cfg.forcing()).cloudFraction(), one1, g.zc[0], one2, one3,
                        surfacePressure);
                fl[0] = eb1.kinematicHeatFluxKMs()[0];
                fl[1] = eb1.kinematicMoistureFlux()[0];
                fl[2] = eb1.dragCoefficient()[0];
            } else {
                fluxes(i, t, spd, thRef[0], qRef[0], fl);
            }
            double alphaN = cfg.damping().newtonianCoolingPerS();
            if (alphaN > 0 || heatingBuf != null) {
                HeatingRate hr = cfg.forcing() instanceof Forcing.PrescribedHeating ph ? ph.heating() : null;
                for (int k = 0; k < nz; k++) {
                    double q = hr == null ? 0.0 : hr.kelvinPerSecond(g.xc[i], g.zc[k], t);
                    thRef[k] = (thRef[k] + dt * (q + alphaN * th0[k])) / (1.0 + dt * alphaN);
                    qRef[k] = (qRef[k] + dt * alphaN * q0[k]) / (1.0 + dt * alphaN);
                }
            }
            if (!cfg.switches().mixing()) {
                thRef[0] += dt * fl[0] / g.dzf[0];
                qRef[0] = Math.max(0.0, qRef[0] + dt * fl[1] / g.dzf[0]);
            } else {
                hRef = grownDepth(hRef, fl[0], land[i], dt);
                double hm = hRef;
                if (fl[0] > 0) {
                    for (int k = 0; k < nz; k++) {
                        colTv[k] = thRef[k] * (1.0 + VIRTUAL_FACTOR * qRef[k]);
                    }
                    hm = mixingDepth(colTv, uRef, vRef, hRef, fl[0], Math.sqrt(fl[2]) * spd);
                }
                double cg = kProfile(fl[0], spd, fl[2], hm, colK, 0, 1);
                solveColumn(thRef, 0, 1, dt, fl[0], 0.0, cg * fl[0]);
                solveColumn(qRef, 0, 1, dt, fl[1], 0.0, cg * fl[1]);
                qRef[0] = Math.max(0.0, qRef[0]);
                // momentum: the same K, and the implicit drag C_D |V| on the lowest layer
                solveColumn(uRef, 0, 1, dt, 0.0, fl[2] * spd, 0.0);
                solveColumn(vRef, 0, 1, dt, 0.0, fl[2] * spd, 0.0);
            }
            // Coriolis and Rayleigh friction about the geostrophic wind, trapezoidal in time (the rotation is neutral):
            // W - Wg -> (W - Wg) (1 - c dt/2) / (1 + c dt/2), c = alpha + i f
            double a = 0.5 * dt * cfg.damping().rayleighFrictionPerS();
            double b = 0.5 * dt * f;
            double den = (1 + a) * (1 + a) + b * b;
            // (1 - a - i b) / (1 + a + i b) = [(1 - a)(1 + a) - b^2 - i 2b] / den
            double gRe = ((1 - a) * (1 + a) - b * b) / den;
            double gIm = -2 * b / den;
            for (int k = 0; k < nz; k++) {
                double du = uRef[k] - ug;
                double dv = vRef[k] - vg;
                uRef[k] = ug + gRe * du - gIm * dv;
                vRef[k] = vg + gRe * dv + gIm * du;
            }
            // the same damping layer aloft as the domain, so the sponge corners agree
            for (int k = 0; k < nz; k++) {
                double rt = dt * rTopC[k];
                if (rt > 0) {
                    thRef[k] = (thRef[k] + rt * th0[k]) / (1.0 + rt);
                    qRef[k] = (qRef[k] + rt * q0[k]) / (1.0 + rt);
                    uRef[k] = (uRef[k] + rt * ug) / (1.0 + rt);
                    vRef[k] = (vRef[k] + rt * vg) / (1.0 + rt);
                }
            }
        }
    }

    /**
     * Implicit Rayleigh relaxation: aloft toward the ambient state (Ug, Vg, 0, theta_0, r_0); in the
     * lateral sponges u, v, w toward (Ug, Vg, 0) and theta, r toward the {@link FarFieldColumn} of that
     * end (the far field over that surface keeps its own heating without a spurious coast at the wrap).
     */
    private void sponges(double dt) {
        boolean lateral = cfg.damping().lateralSpongeWidthM() > 0;
        relaxWind(u, dt, rLatU, lateral, ug, farLeft == null ? null : farLeft.uRef, farRight == null ? null : farRight.uRef);
        relaxWind(v, dt, rLatC, lateral, vg, farLeft == null ? null : farLeft.vRef, farRight == null ? null : farRight.vRef);
        relaxScalar(th, th0, farLeft == null ? null : farLeft.thRef, farRight == null ? null : farRight.thRef, dt, lateral);
        relaxScalar(q, q0, farLeft == null ? null : farLeft.qRef, farRight == null ? null : farRight.qRef, dt, lateral);
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double r = dt * (rTopF[k] + (lateral ? rLatC[i] : 0.0));
                if (r > 0) {
                    w[o + i] /= 1.0 + r;
                }
            }
        }
    }

    /**
     * Horizontal wind: aloft toward the geostrophic value, in the lateral sponges toward the far-field column of
     * that end (its own boundary layer over that surface; an independent reference, so no feedback).
     */
    private void relaxWind(double[] s, double dt, double[] rLat, boolean lateral, double ambient, double[] refLeft,
                           double[] refRight) {
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double rt = dt * rTopC[k];
            if (rt > 0) {
                for (int i = 0; i < nx; i++) {
                    s[o + i] = (s[o + i] + rt * ambient) / (1.0 + rt);
                }
            }
            if (!lateral) {
                continue;
            }
            double left = refLeft[k];
            double right = refRight[k];
            for (int i = 0; i < nx; i++) {
                double rl = dt * rLat[i];
                if (rl > 0) {
                    double ref = i < nx / 2 ? left : right;
                    s[o + i] = (s[o + i] + rl * ref) / (1.0 + rl);
                }
            }
        }
    }

    /** Top layer toward the ambient profile first, then the lateral sponge toward the far-field column. */
    private void relaxScalar(double[] s, double[] ambient, double[] farLeft, double[] farRight, double dt, boolean lateral) {
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double rt = dt * rTopC[k];
            if (rt > 0) {
                for (int i = 0; i < nx; i++) {
                    s[o + i] = (s[o + i] + rt * ambient[k]) / (1.0 + rt);
                }
            }
            if (!lateral) {
                continue;
            }
            double refLeft = farLeft[k];
            double refRight = farRight[k];
            for (int i = 0; i < nx; i++) {
                double rl = dt * rLatC[i];
                if (rl > 0) {
                    double ref = i < nx / 2 ? refLeft : refRight;
                    s[o + i] = (s[o + i] + rl * ref) / (1.0 + rl);
                }
            }
        }
    }

    // ---------------------------------------------------------------- checks and output

    private void checkBlowUp(double t, NonlinearSolution sol, long steps) {
        double limit = cfg.numerics().blowUpWindMPerS();
        String var = null;
        int at = -1;
        double val = 0;
        for (int n = 0; n < u.length && var == null; n++) {
            if (!(Math.abs(u[n]) <= limit)) {
                var = "u";
                at = n;
                val = u[n];
            } else if (!(Math.abs(v[n]) <= limit)) {
                var = "v";
                at = n;
                val = v[n];
            } else if (!(Math.abs(w[n + nx]) <= limit)) {
                var = "w";
                at = n + nx;
                val = w[n + nx];
            } else if (!(Math.abs(th[n] - 300.0) < 200.0)) {
                var = "theta";
                at = n;
                val = th[n];
            } else if (Double.isNaN(q[n])) {
                var = "mixing ratio";
                at = n;
                val = q[n];
            }
        }
        if (var == null) {
            return;
        }
        int k = at / nx;
        int i = at % nx;
        double z = var.equals("w") ? g.zf[k] : g.zc[k];
        double x = var.equals("u") ? g.xc[i] - 0.5 * g.dx : g.xc[i];
        sol.finish(false, steps);
        throw new ModelBlowUpException(t / 3600.0, x / 1000.0, z, var, val, dtLast, sol);
    }

    private void store(NonlinearSolution sol, double t) {
        int nc = nz * nx;
        float[] fu = new float[nc];
        float[] fv = new float[nc];
        float[] fw = new float[nc];
        float[] ft = new float[nc];
        float[] fq = new float[nc];
        float[] fp = new float[nc];
        float[] fh = new float[nx];
        float[] fs = new float[nx];
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                int n = o + i;
                fu[n] = (float) (0.5 * (u[n] + u[o + g.ip1[i]]));
                fv[n] = (float) v[n];
                fw[n] = (float) (0.5 * (w[n] + w[n + nx]));
                ft[n] = (float) th[n];
                fq[n] = (float) q[n];
                fp[n] = phiScale == 0.0 ? 0.0f : (float) (rho0[k] * (chi[n] * phiScale));
            }
        }
        for (int i = 0; i < nx; i++) {
            fh[i] = (float) h[i];
            fs[i] = (float) (heatFluxKin[i] * surfaceRho * Thermo.CP);
        }
        sol.add(new NonlinearSolution.Stored(t, fu, fv, fw, ft, fq, fp, fh, fs));
    }
}
