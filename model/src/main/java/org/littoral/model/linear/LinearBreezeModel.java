package org.littoral.model.linear;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.field.Background;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.thermo.Thermo;

/**
 * The linear spectral land-water breeze model: the linearised Boussinesq equations on an f-plane
 * about a stratified basic state (constant N) at rest or moving with a uniform cross-shore wind U,
 * with Rayleigh friction alpha on the momentum and Newtonian cooling alpha_b on the buoyancy
 * (Rotunno 1983, J. Atmos. Sci. 40, 1999-2009; friction as in Dalu and Pielke 1989):
 *
 * <pre>
 *   D_m u - f v = -phi_x,   D_m v + f u = 0,   eps D_m w = -phi_z + b,   D_b b + N^2 w = Q,   u_x + w_z = 0,
 *   D_m = d/dt + U d/dx + alpha,  D_b = d/dt + U d/dx + alpha_b,  eps = 0 hydrostatic, 1 non-hydrostatic.
 * </pre>
 *
 * With u = psi_z, w = -psi_x and every field proportional to exp(i (k x + omega t)), D_m -&gt; s_m =
 * alpha + i (omega + k U) (the Doppler shift of Jiang 2012) and likewise s_b, and
 * (s_m^2 + f^2) psi_zz - k^2 (N^2 s_m / s_b + eps s_m^2) psi = -i k (s_m / s_b) Q, which reduces to
 * Rotunno's (D^2 + f^2) psi_zz + N^2 psi_xx = -Q_x when alpha = alpha_b and eps = 0. Per (k, omega_n)
 * this is psi'' - m^2 psi = c q_n(z), solved exactly with w(0) = 0 and the root Re(m) &gt; 0 (decaying
 * aloft); without damping and |omega + k U| &gt; |f| the limit of vanishing damping, Im(m) = -sign(omega + k U) |m|,
 * which carries energy upward. The forcing is expanded in diurnal harmonics n = 0..N, the coast in
 * Fourier modes of the periodic x domain ({@link ShoreMask}).
 *
 * <p>With a height-varying basic state ({@link LinearConfig#stratification()}: mixed layer, capping inversion,
 * free atmosphere) N^2 depends on z, the vertical problem becomes psi'' - m(z)^2 psi = c q_n(z) and is solved per
 * (k, omega_n) by a banded solve that is exact for piecewise-constant N^2 ({@link StratifiedColumn},
 * {@link StratifiedVerticalSolver}); above the varying part N is constant and the same root rule applies.
 *
 * <p>The passive water-vapour perturbation obeys D_b q' + w dq0/dz = 0 (relaxed at the cooling rate).
 */
public final class LinearBreezeModel {
    /** Modes whose coastal forcing is below this fraction of the largest are left at zero. */
    private static final double NEGLIGIBLE_MODE = 1e-13;
    /** Nodes per afternoon mixed-layer depth when the slab forcing is resolved for the vertical solve. */
    private static final int SLAB_NODES_PER_DEPTH = 96;
    /** Modes gathered before their levels are written out (at most; fewer when nx is smaller). */
    private static final int MODE_BLOCK = 16;

    private LinearBreezeModel() {
    }

    /** Solves for the periodic diurnal response. Allocates the harmonic coefficient arrays (4 nx nz doubles per harmonic). */
    public static LinearSolution solve(LinearConfig cfg) {
        check(cfg);
        HorizontalGrid grid = cfg.xGrid();
        int nx = grid.nx();
        double lx = grid.lengthM();
        double[] zOut = cfg.zGrid().levelsM();
        int nz = zOut.length;
        double f = cfg.coast().coriolisPerS();
        double n2 = cfg.buoyancyFrequencyPerS() * cfg.buoyancyFrequencyPerS();
        double uAmb = cfg.ambientCrossShoreMPerS();
        double am = cfg.frictionPerS();
        double ab = cfg.newtonianCoolingPerS();
        double eps = cfg.hydrostatic() ? 0.0 : 1.0;
        double gammaQ = cfg.mixingRatioGradientPerM();
        double tS = Thermo.temperatureFromPotentialK(cfg.surfaceThetaK(), cfg.surfacePressurePa());
        double rho0 = Thermo.densityKgM3(cfg.surfacePressurePa(), tS, 0.0);
        HeatingHarmonics heat = HeatingHarmonics.of(cfg.heating(), cfg.harmonics(), cfg.surfaceThetaK(), rho0 * Thermo.CP);
        String widthKey = cfg.heating() instanceof HeatingSpec.ClassicShape ? "heating.halfWidthM" : "heating.transitionHalfWidthM";
        ShoreMask mask = ShoreMask.of(cfg.surface(), grid, heat.halfWidthM(), widthKey);
        int nh = heat.count();
        boolean hasMean = heat.harmonic(0) == 0;
        if (hasMean && (!(am > 0) || !(ab > 0))) {
            throw new IllegalArgumentException("frictionPerS = " + am + " and newtonianCoolingPerS = " + ab
                    + ": the slab heating has a daily mean, whose steady response needs both > 0 (e.g. 1e-5 1/s)");
        }

        double maxMask = 0;
        for (int kk = 1; kk < nx; kk++) {
            maxMask = Math.max(maxMask, Math.hypot(mask.re[kk], mask.im[kk]));
        }

        // vertical nodes: exact closed form for exp(-z/H); Green's recursion on resolved nodes for the slab
        VerticalGreenSolver solver = null;
        int[] outNode = null;
        double[][] nodeFr = null;
        double[][] nodeFi = null;
        if (!heat.exponential()) {
            List<Double> nodes = new ArrayList<>();
            outNode = slabNodes(zOut, heat.sourceTopM(), nodes);
            double[] zn = new double[nodes.size()];
            for (int j = 0; j < zn.length; j++) {
                zn[j] = nodes.get(j);
            }
            solver = new VerticalGreenSolver(zn);
            nodeFr = new double[nh][zn.length];
            nodeFi = new double[nh][zn.length];
            double[] q = new double[2];
            for (int h = 0; h < nh; h++) {
                for (int j = 0; j < zn.length; j++) {
                    heat.profile(h, zn[j], q);
                    nodeFr[h][j] = q[0];
                    nodeFi[h][j] = q[1];
                }
            }
        }
        // height-varying N: one banded solve per mode on the stratified column, for either heating shape
        StratifiedColumn column = cfg.stratification() == null ? null : new StratifiedColumn(cfg.stratification(), zOut, heat);
        double n2Top = column == null ? n2 : column.topBuoyancyFrequencySquared();
        double[] rootTop = new double[2];
        int nn = solver == null ? 0 : solver.size();
        double[] pr = new double[nn];
        double[] pi = new double[nn];
        double[] pzr = new double[nn];
        double[] pzi = new double[nn];
        double[] ex = new double[4];
        // modes are solved one at a time but stored level-major (a[l * nx + kk]): results of MODE_BLOCK
        // consecutive modes are gathered here and written out as contiguous runs (cache-friendly)
        int mb = Math.min(MODE_BLOCK, nx); // both powers of two, so mb divides nx
        double[] tpR = new double[mb * nz];
        double[] tpI = new double[mb * nz];
        double[] tuR = new double[mb * nz];
        double[] tuI = new double[mb * nz];
        boolean[] blockDone = new boolean[mb];

        LinearSolution.Builder b = new LinearSolution.Builder(cfg, nh, nx, nz, zOut);
        double[] q = new double[2];
        for (int h = 0; h < nh; h++) {
            b.omega[h] = heat.omega(h);
            for (int l = 0; l < nz; l++) {
                heat.profile(h, zOut[l], q);
                b.qR[h][l] = q[0];
                b.qI[h][l] = q[1];
                heat.integralAbove(h, zOut[l], q);
                b.qIntR[h][l] = q[0];
                b.qIntI[h][l] = q[1];
            }
            double w = heat.omega(h);
            double[] psR = b.psiR[h], psI = b.psiI[h], uR = b.uR[h], uI = b.uI[h];
            for (int kk = 0; kk < nx; kk++) {
                if (kk % mb == 0 && kk > 0) {
                    flushBlock(kk - mb, blockDone, nx, nz, tpR, tpI, tuR, tuI, psR, psI, uR, uI);
                }
                if (kk == nx / 2) {
                    continue;
                }
                double k = ShoreMask.wavenumber(kk, nx, lx);
                double mR = mask.re[kk], mI = mask.im[kk];
                double wh = w + k * uAmb;
                // s_m = am + i wh, s_b = ab + i wh
                double sbb = ab * ab + wh * wh;
                if (sbb == 0) {
                    throw new IllegalArgumentException("newtonianCoolingPerS = 0 with a steady (daily-mean) forcing component has no"
                            + " periodic solution; set newtonianCoolingPerS > 0");
                }
                // M / s_b (buoyancy driven directly by the heating)
                double isbR = ab / sbb, isbI = -wh / sbb;
                b.bqR[h][kk] = mR * isbR - mI * isbI;
                b.bqI[h][kk] = mR * isbI + mI * isbR;
                if (kk == 0) {
                    // horizontally uniform part: no circulation; pressure from the hydrostatic integral of b
                    b.p0R[h] = -rho0 * b.bqR[h][0];
                    b.p0I[h] = -rho0 * b.bqI[h][0];
                    continue;
                }
                double smm = am * am + wh * wh;
                double denR = am * am - wh * wh + f * f;
                double denI = 2 * am * wh;
                double dd = denR * denR + denI * denI;
                if (dd < 1e-8 * Math.pow(HeatingHarmonics.OMEGA_DAY, 4)) {
                    throw new IllegalArgumentException("frictionPerS = " + am + ": the inviscid response is singular where the"
                            + " (Doppler-shifted) frequency equals f (latitude " + cfg.coast().latitudeDeg()
                            + " deg, near the critical latitude 29.91 deg); set frictionPerS > 0, e.g. 1e-5 1/s");
                }
                // ratio = s_m / s_b
                double raR = (am * ab + wh * wh) / sbb;
                double raI = (wh * ab - am * wh) / sbb;
                // m^2 = k^2 (N^2 ratio + eps s_m^2) / den
                double numR = n2 * raR + eps * (am * am - wh * wh);
                double numI = n2 * raI + eps * (2 * am * wh);
                double m2R = k * k * (numR * denR + numI * denI) / dd;
                double m2I = k * k * (numI * denR - numR * denI) / dd;
                double rr = Math.hypot(m2R, m2I);
                double mr = Math.sqrt(Math.max(0.0, 0.5 * (rr + m2R)));
                double mi = Math.sqrt(Math.max(0.0, 0.5 * (rr - m2R)));
                if (m2I < 0) {
                    mi = -mi;
                }
                if (m2I == 0 && m2R < 0) {
                    // inviscid and propagating: limit of vanishing damping (upward energy), see class comment
                    mr = 0;
                    mi = -Math.signum(wh) * Math.sqrt(-m2R);
                }
                // multipliers from psi: w = -i k psi; b += i k N^2 psi / s_b; q = i k Gamma psi / s_b
                b.cwR[h][kk] = 0;
                b.cwI[h][kk] = -k;
                b.cbR[h][kk] = -k * n2 * isbI;
                b.cbI[h][kk] = k * n2 * isbR;
                b.cqR[h][kk] = -k * gammaQ * isbI;
                b.cqI[h][kk] = k * gammaQ * isbR;
                // from u: v = -f u / s_m; p = rho0 i den u / (k s_m)
                double ismR = am / smm, ismI = -wh / smm;
                b.cvR[h][kk] = -f * ismR;
                b.cvI[h][kk] = -f * ismI;
                double tR = denR * ismR - denI * ismI;
                double tI = denR * ismI + denI * ismR;
                b.cpR[h][kk] = -rho0 * tI / k;
                b.cpI[h][kk] = rho0 * tR / k;
                if (Math.hypot(mR, mI) < NEGLIGIBLE_MODE * maxMask) {
                    continue;
                }
                // c = -i k ratio M / den
                double rmR = raR * mR - raI * mI;
                double rmI = raR * mI + raI * mR;
                double aR = k * rmI;
                double aI = -k * rmR;
                double cR = (aR * denR + aI * denI) / dd;
                double cI = (aI * denR - aR * denI) / dd;
                if (column != null) {
                    // m(z)^2 = A N(z)^2 + B, A = k^2 ratio / den, B = k^2 eps s_m^2 / den
                    double capAR = k * k * (raR * denR + raI * denI) / dd;
                    double capAI = k * k * (raI * denR - raR * denI) / dd;
                    double smR = am * am - wh * wh;
                    double smI = 2 * am * wh;
                    double bR = k * k * eps * (smR * denR + smI * denI) / dd;
                    double bI = k * k * eps * (smI * denR - smR * denI) / dd;
                    root(capAR * n2Top + bR, capAI * n2Top + bI, wh, rootTop);
                    int off = (kk % mb) * nz;
                    column.solve(h, capAR, capAI, bR, bI, rootTop[0], rootTop[1], tpR, tpI, tuR, tuI, off);
                    for (int l = 0; l < nz; l++) {
                        double xr = tpR[off + l], xi = tpI[off + l], yr = tuR[off + l], yi = tuI[off + l];
                        tpR[off + l] = cR * xr - cI * xi;
                        tpI[off + l] = cR * xi + cI * xr;
                        tuR[off + l] = cR * yr - cI * yi;
                        tuI[off + l] = cR * yi + cI * yr;
                    }
                } else if (heat.exponential()) {
                    double a = heat.decayPerM();
                    heat.profile(h, 0.0, q);
                    double qr = q[0];
                    double qi = q[1];
                    // source amplitude at z = 0 times c
                    double sR = cR * qr - cI * qi;
                    double sI = cR * qi + cI * qr;
                    int off = (kk % mb) * nz;
                    for (int l = 0; l < nz; l++) {
                        VerticalGreenSolver.exponentialSource(a, mr, mi, zOut[l], ex);
                        tpR[off + l] = sR * ex[0] - sI * ex[1];
                        tpI[off + l] = sR * ex[1] + sI * ex[0];
                        tuR[off + l] = sR * ex[2] - sI * ex[3];
                        tuI[off + l] = sR * ex[3] + sI * ex[2];
                    }
                } else {
                    solver.solve(mr, mi, nodeFr[h], nodeFi[h], pr, pi, pzr, pzi);
                    int off = (kk % mb) * nz;
                    for (int l = 0; l < nz; l++) {
                        int j = outNode[l];
                        tpR[off + l] = cR * pr[j] - cI * pi[j];
                        tpI[off + l] = cR * pi[j] + cI * pr[j];
                        tuR[off + l] = cR * pzr[j] - cI * pzi[j];
                        tuI[off + l] = cR * pzi[j] + cI * pzr[j];
                    }
                }
                blockDone[kk % mb] = true;
            }
            flushBlock(nx - mb, blockDone, nx, nz, tpR, tpI, tuR, tuI, psR, psI, uR, uI);
        }
        Background bg;
        if (cfg.stratification() == null) {
            bg = Background.constantN(zOut, cfg.surfaceThetaK(), cfg.buoyancyFrequencyPerS(), cfg.surfaceMixingRatio(),
                    gammaQ, cfg.surfacePressurePa(), uAmb, 0.0);
        } else {
            // b = (Q + i k N^2(z) psi) / s_b: the multipliers hold N_ref^2, each level scales them to its own N^2
            double[] th = new double[nz];
            for (int l = 0; l < nz; l++) {
                th[l] = cfg.stratification().thetaK(zOut[l]);
                b.buoyancyScale[l] = cfg.stratification().buoyancyFrequencySquared(zOut[l]) / n2;
            }
            bg = Background.ofTheta(zOut, th, cfg.surfaceMixingRatio(), gammaQ, cfg.surfacePressurePa(), uAmb, 0.0);
        }
        return b.build(bg);
    }

    /**
     * The root m of m^2 with Re(m) &gt;= 0 (decaying aloft); for a purely propagating m^2 &lt; 0 without damping the
     * limit of vanishing damping, Im(m) = -sign(omega + k U) |m| (upward energy), as for constant N.
     */
    static void root(double m2R, double m2I, double wh, double[] out) {
        double rr = Math.hypot(m2R, m2I);
        double mr = Math.sqrt(Math.max(0.0, 0.5 * (rr + m2R)));
        double mi = Math.sqrt(Math.max(0.0, 0.5 * (rr - m2R)));
        if (m2I < 0) {
            mi = -mi;
        }
        if (m2I == 0 && m2R < 0) {
            mr = 0;
            mi = -Math.signum(wh) * Math.sqrt(-m2R);
        }
        out[0] = mr;
        out[1] = mi;
    }

    /** Writes the solved modes first .. first + done.length - 1 (those marked done) to the level-major arrays and clears the marks. */
    private static void flushBlock(int first, boolean[] done, int nx, int nz, double[] tpR, double[] tpI, double[] tuR,
                                   double[] tuI, double[] psR, double[] psI, double[] uR, double[] uI) {
        for (int l = 0; l < nz; l++) {
            int row = l * nx + first;
            for (int bk = 0; bk < done.length; bk++) {
                if (done[bk]) {
                    int t = bk * nz + l;
                    psR[row + bk] = tpR[t];
                    psI[row + bk] = tpI[t];
                    uR[row + bk] = tuR[t];
                    uI[row + bk] = tuI[t];
                }
            }
        }
        java.util.Arrays.fill(done, false);
    }

    /**
     * Nodes for the slab solve: z = 0, every output level, each output cell below the source top split
     * evenly so no node spacing exceeds sourceTop / {@value #SLAB_NODES_PER_DEPTH}, and nodes up to the
     * source top if it lies above the output grid. Returns the node index of every output level.
     */
    static int[] slabNodes(double[] zOut, double sourceTopM, List<Double> nodes) {
        double dReq = sourceTopM / SLAB_NODES_PER_DEPTH;
        int[] map = new int[zOut.length];
        nodes.add(0.0);
        double prev = 0.0;
        for (int l = 0; l < zOut.length; l++) {
            double z = zOut[l];
            if (z <= 0) {
                map[l] = 0;
                continue;
            }
            int r = prev < sourceTopM ? (int) Math.ceil((z - prev) / dReq - 1e-9) : 1;
            r = Math.max(1, r);
            for (int s = 1; s < r; s++) {
                nodes.add(prev + (z - prev) * s / r);
            }
            nodes.add(z);
            map[l] = nodes.size() - 1;
            prev = z;
        }
        while (prev < sourceTopM) {
            prev = Math.min(sourceTopM, prev + dReq);
            nodes.add(prev);
        }
        return map;
    }

    /**
     * The checks {@link #solve} makes before any work, callable on their own so that an application can refuse a
     * configuration before it starts (combinations that are singular only at some wavenumbers are found by solve).
     */
    public static void check(LinearConfig c) {
        if (c.coast() == null || c.surface() == null || c.xGrid() == null || c.zGrid() == null || c.heating() == null) {
            throw new IllegalArgumentException("linear model configuration is missing coast, surface, xGrid, zGrid or heating");
        }
        int nx = c.xGrid().nx();
        if (Integer.bitCount(nx) != 1) {
            throw new IllegalArgumentException("xGrid nx = " + nx + " must be a power of two for the FFT; use e.g. "
                    + Integer.highestOneBit(nx) + " or " + 2 * Integer.highestOneBit(nx));
        }
        if (!(c.buoyancyFrequencyPerS() > 0 && c.buoyancyFrequencyPerS() < 0.1)) {
            throw new IllegalArgumentException("buoyancyFrequencyPerS must be in (0, 0.1) 1/s; got " + c.buoyancyFrequencyPerS());
        }
        if (!(c.frictionPerS() >= 0 && c.frictionPerS() < 1e-2)) {
            throw new IllegalArgumentException("frictionPerS must be in [0, 0.01) 1/s; got " + c.frictionPerS());
        }
        if (!(c.newtonianCoolingPerS() >= 0 && c.newtonianCoolingPerS() < 1e-2)) {
            throw new IllegalArgumentException("newtonianCoolingPerS must be in [0, 0.01) 1/s; got " + c.newtonianCoolingPerS());
        }
        if (!(Math.abs(c.ambientCrossShoreMPerS()) <= 50)) {
            throw new IllegalArgumentException("ambientCrossShoreMPerS must be within +-50 m/s; got " + c.ambientCrossShoreMPerS());
        }
        if (c.harmonics() > 240) {
            throw new IllegalArgumentException("harmonics must be at most 240 (6-minute resolution); got " + c.harmonics());
        }
        if (c.zGrid().levelM(0) < 0) {
            throw new IllegalArgumentException("the lowest output level must be at or above the ground; got " + c.zGrid().levelM(0) + " m");
        }
        if (!(c.surfaceThetaK() > 200 && c.surfaceThetaK() < 400)) {
            throw new IllegalArgumentException("surfaceThetaK must be in 200..400 K; got " + c.surfaceThetaK());
        }
        if (!(c.surfacePressurePa() > 5e4 && c.surfacePressurePa() < 1.1e5)) {
            throw new IllegalArgumentException("surfacePressurePa must be in 50000..110000 Pa; got " + c.surfacePressurePa());
        }
    }
}
