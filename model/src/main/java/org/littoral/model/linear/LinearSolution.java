package org.littoral.model.linear;

import java.util.LinkedHashMap;
import java.util.Map;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.FieldSampling;
import org.littoral.model.field.Snapshot;
import org.littoral.model.thermo.Thermo;

/**
 * The periodic diurnal solution of {@link LinearBreezeModel}, stored as diurnal harmonics of the
 * streamfunction psi and of u = psi_z for every Fourier mode k and output level; every other field
 * follows from the polarisation relations of the linear equations (w = -i k psi,
 * b = (Q + i k N^2 psi)/s_b, v = -f u / s_m, p' = rho0 i (s_m^2 + f^2) u / (k s_m), q' = i k Gamma psi / s_b).
 * Any time is valid (the solution repeats every 86400 s); {@link #startSec()} and {@link #endSec()}
 * give one day.
 *
 * <p>Fast paths ({@link FieldSampling}):
 * <ul>
 * <li>{@link #columnAt(double, double)}: the first call at a given x sums the Fourier series at that x
 *   once for every harmonic (O(harmonics x nx x nz)) and caches the column harmonics (the last 32 to 1024
 *   positions are kept); every later call at that x costs O(harmonics x nz). This is the path for
 *   virtual sites: sample a site at as many times as wanted for the price of one series sum.</li>
 * <li>{@link #crossShoreWindAtLevel(int, double)}: one level, one inverse FFT.</li>
 * <li>{@link #columnAtIndex(int, double)}: as columnAt at grid column i.</li>
 * </ul>
 * {@link #snapshotAt(double)} synthesises all fields (6 nz inverse FFTs) and allocates.
 * Thread-safe for concurrent reads (the column cache is synchronised).
 */
public final class LinearSolution implements BreezeSolution, FieldSampling {
    private static final int FIELDS = 6;
    private static final int U = 0, V = 1, W = 2, B = 3, Q = 4, P = 5;
    /** Column cache bound: at least 32 positions, at most 1024, and about 64 MB of cached harmonics. */
    private static final long CACHE_BYTES = 64L << 20;

    private final int nh, nx, nz;
    private final double[] x;
    private final double[] z;
    private final double lengthM;
    private final double x0M;
    private final double thetaOverG;
    private final Background bg;
    private final double[] omega;
    private final double[][] psiR, psiI, uR, uI;
    // per (harmonic, mode) multipliers
    private final double[][] cwR, cwI, cbR, cbI, cqR, cqI, cvR, cvI, cpR, cpI, bqR, bqI;
    private final double[] p0R, p0I;
    private final double[][] qR, qI, qIntR, qIntI;
    private final double[] shiftR, shiftI;
    /** N^2(z) / N_ref^2 per level: the buoyancy multipliers hold N_ref^2 (all 1 for constant N). */
    private final double[] buoyancyScale;
    private final int cachePositions;
    private final Map<Double, double[][]> columns = new LinkedHashMap<>(64, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Double, double[][]> e) {
            return size() > cachePositions;
        }
    };

    private LinearSolution(Builder b, Background bg) {
        nh = b.nh;
        nx = b.nx;
        nz = b.nz;
        long bytesPerPosition = 8L * nh * 2 * FIELDS * nz;
        cachePositions = (int) Math.max(32, Math.min(1024, CACHE_BYTES / Math.max(1, bytesPerPosition)));
        x = b.cfg.xGrid().pointsM();
        z = b.z.clone();
        lengthM = b.cfg.xGrid().lengthM();
        x0M = b.cfg.xGrid().x0M();
        thetaOverG = b.cfg.surfaceThetaK() / Thermo.G;
        this.bg = bg;
        omega = b.omega;
        psiR = b.psiR;
        psiI = b.psiI;
        uR = b.uR;
        uI = b.uI;
        cwR = b.cwR;
        cwI = b.cwI;
        cbR = b.cbR;
        cbI = b.cbI;
        cqR = b.cqR;
        cqI = b.cqI;
        cvR = b.cvR;
        cvI = b.cvI;
        cpR = b.cpR;
        cpI = b.cpI;
        bqR = b.bqR;
        bqI = b.bqI;
        p0R = b.p0R;
        p0I = b.p0I;
        qR = b.qR;
        qI = b.qI;
        qIntR = b.qIntR;
        qIntI = b.qIntI;
        buoyancyScale = b.buoyancyScale.clone();
        shiftR = new double[nx];
        shiftI = new double[nx];
        for (int kk = 0; kk < nx; kk++) {
            double k = ShoreMask.wavenumber(kk, nx, lengthM);
            // the inverse DFT of Commons Math divides by n; the grid starts at x0
            shiftR[kk] = nx * Math.cos(k * x0M);
            shiftI[kk] = nx * Math.sin(k * x0M);
        }
    }

    @Override
    public double[] xM() {
        return x.clone();
    }

    @Override
    public double[] zM() {
        return z.clone();
    }

    @Override
    public Background background() {
        return bg;
    }

    @Override
    public double startSec() {
        return 0;
    }

    @Override
    public double endSec() {
        return HeatingHarmonics.DAY_S;
    }

    @Override
    public String modelName() {
        return "linear spectral";
    }

    /** Number of diurnal harmonics stored (including n = 0 where present). */
    public int harmonicCount() {
        return nh;
    }

    /** Angular frequency of stored harmonic h, rad/s. */
    public double harmonicOmega(int h) {
        return omega[h];
    }

    @Override
    public Snapshot snapshotAt(double timeSec) {
        int n = nx * nz;
        double[][] sr = new double[FIELDS][n];
        double[][] si = new double[FIELDS][n];
        double[] ar = new double[FIELDS * nx];
        double[] ai = new double[FIELDS * nx];
        for (int h = 0; h < nh; h++) {
            double er = Math.cos(omega[h] * timeSec);
            double ei = Math.sin(omega[h] * timeSec);
            // time factor folded into the multipliers: a_F(k) = mult_F(k) e^{i w t}
            for (int kk = 0; kk < nx; kk++) {
                setMul(ar, ai, U * nx + kk, 1, 0, er, ei);
                setMul(ar, ai, V * nx + kk, cvR[h][kk], cvI[h][kk], er, ei);
                setMul(ar, ai, W * nx + kk, cwR[h][kk], cwI[h][kk], er, ei);
                setMul(ar, ai, B * nx + kk, cbR[h][kk], cbI[h][kk], er, ei);
                setMul(ar, ai, Q * nx + kk, cqR[h][kk], cqI[h][kk], er, ei);
                setMul(ar, ai, P * nx + kk, cpR[h][kk], cpI[h][kk], er, ei);
            }
            double[] pR = psiR[h], pI = psiI[h], vR = uR[h], vI = uI[h];
            for (int l = 0; l < nz; l++) {
                int off = l * nx;
                for (int kk = 0; kk < nx; kk++) {
                    int idx = off + kk;
                    double xr = pR[idx], xi = pI[idx], yr = vR[idx], yi = vI[idx];
                    if (xr == 0 && xi == 0 && yr == 0 && yi == 0) {
                        continue;
                    }
                    acc(sr[U], si[U], idx, ar[kk], ai[kk], yr, yi);
                    acc(sr[V], si[V], idx, ar[V * nx + kk], ai[V * nx + kk], yr, yi);
                    acc(sr[P], si[P], idx, ar[P * nx + kk], ai[P * nx + kk], yr, yi);
                    acc(sr[W], si[W], idx, ar[W * nx + kk], ai[W * nx + kk], xr, xi);
                    acc(sr[B], si[B], idx, ar[B * nx + kk], ai[B * nx + kk], xr * buoyancyScale[l], xi * buoyancyScale[l]);
                    acc(sr[Q], si[Q], idx, ar[Q * nx + kk], ai[Q * nx + kk], xr, xi);
                }
                // buoyancy forced directly by the heating, and the uniform hydrostatic pressure
                double qr = qR[h][l] * er - qI[h][l] * ei;
                double qi = qR[h][l] * ei + qI[h][l] * er;
                for (int kk = 0; kk < nx; kk++) {
                    acc(sr[B], si[B], off + kk, bqR[h][kk], bqI[h][kk], qr, qi);
                }
                double gr = qIntR[h][l] * er - qIntI[h][l] * ei;
                double gi = qIntR[h][l] * ei + qIntI[h][l] * er;
                acc(sr[P], si[P], off, p0R[h], p0I[h], gr, gi);
            }
        }
        FastFourierTransformer fft = new FastFourierTransformer(DftNormalization.STANDARD);
        double[][] ri = new double[2][nx];
        double[][] out = new double[FIELDS][n];
        for (int fIdx = 0; fIdx < FIELDS; fIdx++) {
            for (int l = 0; l < nz; l++) {
                inverse(fft, sr[fIdx], si[fIdx], l * nx, ri);
                System.arraycopy(ri[0], 0, out[fIdx], l * nx, nx);
            }
        }
        double[] th = new double[n];
        double[] r = new double[n];
        double[] u = out[U];
        for (int l = 0; l < nz; l++) {
            for (int i = 0; i < nx; i++) {
                int idx = l * nx + i;
                u[idx] += bg.ambientUMPerS()[l];
                th[idx] = bg.thetaK()[l] + thetaOverG * out[B][idx];
                r[idx] = bg.mixingRatioKgPerKg()[l] + out[Q][idx];
            }
        }
        return new Snapshot(timeSec, nx, nz, u, out[V], out[W], th, r, out[P]);
    }

    @Override
    public double[] crossShoreWindAtLevel(int levelIndex, double timeSec) {
        double[] u = levelOfUModes(levelIndex, timeSec, null, null);
        double ua = bg.ambientUMPerS()[levelIndex];
        for (int i = 0; i < nx; i++) {
            u[i] += ua;
        }
        return u;
    }

    @Override
    public double[] alongshoreWindAtLevel(int levelIndex, double timeSec) {
        return levelOfUModes(levelIndex, timeSec, cvR, cvI);
    }

    /**
     * One level of a field built on the modes' u structure: sum over harmonics of mult(k) e^{i w t} times the
     * u mode at that level, then one inverse FFT (as {@link #snapshotAt} does for the whole field). A null
     * multiplier means 1 (the cross-shore wind itself). Allocates nx.
     */
    private double[] levelOfUModes(int levelIndex, double timeSec, double[][] multR, double[][] multI) {
        if (levelIndex < 0 || levelIndex >= nz) {
            throw new IllegalArgumentException("level index " + levelIndex + " outside 0.." + (nz - 1));
        }
        double[] sr = new double[nx];
        double[] si = new double[nx];
        int off = levelIndex * nx;
        for (int h = 0; h < nh; h++) {
            double er = Math.cos(omega[h] * timeSec);
            double ei = Math.sin(omega[h] * timeSec);
            double[] vR = uR[h], vI = uI[h];
            double[] mR = multR == null ? null : multR[h];
            double[] mI = multI == null ? null : multI[h];
            for (int kk = 0; kk < nx; kk++) {
                double ar = mR == null ? er : mR[kk] * er - mI[kk] * ei;
                double ai = mR == null ? ei : mR[kk] * ei + mI[kk] * er;
                double yr = vR[off + kk], yi = vI[off + kk];
                sr[kk] += ar * yr - ai * yi;
                si[kk] += ar * yi + ai * yr;
            }
        }
        double[][] ri = new double[2][nx];
        inverse(new FastFourierTransformer(DftNormalization.STANDARD), sr, si, 0, ri);
        return ri[0];
    }

    /** {@link #columnAt(double, double)} at grid column i. */
    public Snapshot columnAtIndex(int i, double timeSec) {
        if (i < 0 || i >= nx) {
            throw new IllegalArgumentException("column index " + i + " outside 0.." + (nx - 1));
        }
        return columnAt(x[i], timeSec);
    }

    @Override
    public Snapshot columnAt(double xM, double timeSec) {
        if (!(xM >= x[0] && xM <= x[0] + lengthM)) {
            throw new IllegalArgumentException("x = " + xM / 1000.0 + " km is outside the periodic domain " + x[0] / 1000.0
                    + " to " + (x[0] + lengthM) / 1000.0 + " km");
        }
        double[][] c = columnHarmonics(xM);
        double[] f = new double[FIELDS * nz];
        for (int h = 0; h < nh; h++) {
            double er = Math.cos(omega[h] * timeSec);
            double ei = Math.sin(omega[h] * timeSec);
            double[] ch = c[h];
            for (int j = 0; j < FIELDS * nz; j++) {
                f[j] += ch[2 * j] * er - ch[2 * j + 1] * ei;
            }
        }
        double[] u = new double[nz], v = new double[nz], w = new double[nz], th = new double[nz], r = new double[nz],
                p = new double[nz];
        for (int l = 0; l < nz; l++) {
            u[l] = f[U * nz + l] + bg.ambientUMPerS()[l];
            v[l] = f[V * nz + l];
            w[l] = f[W * nz + l];
            th[l] = bg.thetaK()[l] + thetaOverG * f[B * nz + l];
            r[l] = bg.mixingRatioKgPerKg()[l] + f[Q * nz + l];
            p[l] = f[P * nz + l];
        }
        return new Snapshot(timeSec, 1, nz, u, v, w, th, r, p);
    }

    /** Per harmonic, interleaved (re, im) of the six fields on the levels at x; cached. */
    private double[][] columnHarmonics(double xM) {
        synchronized (columns) {
            double[][] c = columns.get(xM);
            if (c != null) {
                return c;
            }
        }
        double[][] c = new double[nh][2 * FIELDS * nz];
        double[] ekR = new double[nx];
        double[] ekI = new double[nx];
        for (int kk = 0; kk < nx; kk++) {
            double k = ShoreMask.wavenumber(kk, nx, lengthM);
            ekR[kk] = Math.cos(k * xM);
            ekI[kk] = Math.sin(k * xM);
        }
        double[] ar = new double[FIELDS * nx];
        double[] ai = new double[FIELDS * nx];
        for (int h = 0; h < nh; h++) {
            double bqSr = 0, bqSi = 0;
            for (int kk = 0; kk < nx; kk++) {
                double er = ekR[kk], ei = ekI[kk];
                setMul(ar, ai, U * nx + kk, 1, 0, er, ei);
                setMul(ar, ai, V * nx + kk, cvR[h][kk], cvI[h][kk], er, ei);
                setMul(ar, ai, W * nx + kk, cwR[h][kk], cwI[h][kk], er, ei);
                setMul(ar, ai, B * nx + kk, cbR[h][kk], cbI[h][kk], er, ei);
                setMul(ar, ai, Q * nx + kk, cqR[h][kk], cqI[h][kk], er, ei);
                setMul(ar, ai, P * nx + kk, cpR[h][kk], cpI[h][kk], er, ei);
                bqSr += bqR[h][kk] * er - bqI[h][kk] * ei;
                bqSi += bqR[h][kk] * ei + bqI[h][kk] * er;
            }
            double[] pR = psiR[h], pI = psiI[h], vR = uR[h], vI = uI[h];
            double[] ch = c[h];
            for (int l = 0; l < nz; l++) {
                int off = l * nx;
                double uRe = 0, uIm = 0, vRe = 0, vIm = 0, pRe = 0, pIm = 0, wRe = 0, wIm = 0, bRe = 0, bIm = 0, qRe = 0, qIm = 0;
                for (int kk = 0; kk < nx; kk++) {
                    double yr = vR[off + kk], yi = vI[off + kk];
                    double xr = pR[off + kk], xi = pI[off + kk];
                    double a0r = ar[kk], a0i = ai[kk];
                    uRe += a0r * yr - a0i * yi;
                    uIm += a0r * yi + a0i * yr;
                    double a1r = ar[V * nx + kk], a1i = ai[V * nx + kk];
                    vRe += a1r * yr - a1i * yi;
                    vIm += a1r * yi + a1i * yr;
                    double a5r = ar[P * nx + kk], a5i = ai[P * nx + kk];
                    pRe += a5r * yr - a5i * yi;
                    pIm += a5r * yi + a5i * yr;
                    double a2r = ar[W * nx + kk], a2i = ai[W * nx + kk];
                    wRe += a2r * xr - a2i * xi;
                    wIm += a2r * xi + a2i * xr;
                    double a3r = ar[B * nx + kk], a3i = ai[B * nx + kk];
                    bRe += a3r * xr - a3i * xi;
                    bIm += a3r * xi + a3i * xr;
                    double a4r = ar[Q * nx + kk], a4i = ai[Q * nx + kk];
                    qRe += a4r * xr - a4i * xi;
                    qIm += a4r * xi + a4i * xr;
                }
                bRe *= buoyancyScale[l];
                bIm *= buoyancyScale[l];
                bRe += bqSr * qR[h][l] - bqSi * qI[h][l];
                bIm += bqSr * qI[h][l] + bqSi * qR[h][l];
                pRe += p0R[h] * qIntR[h][l] - p0I[h] * qIntI[h][l];
                pIm += p0R[h] * qIntI[h][l] + p0I[h] * qIntR[h][l];
                put(ch, U * nz + l, uRe, uIm);
                put(ch, V * nz + l, vRe, vIm);
                put(ch, W * nz + l, wRe, wIm);
                put(ch, B * nz + l, bRe, bIm);
                put(ch, Q * nz + l, qRe, qIm);
                put(ch, P * nz + l, pRe, pIm);
            }
        }
        synchronized (columns) {
            columns.put(xM, c);
        }
        return c;
    }

    /**
     * Complex amplitude of the cross-shore wind perturbation u' of stored harmonic h at level l along x
     * (u' = Re[a exp(i omega_h t)]); {re[], im[]}, allocates. For phase and ray analyses.
     */
    public double[][] crossShoreWindHarmonic(int h, int levelIndex) {
        double[] sr = new double[nx];
        double[] si = new double[nx];
        System.arraycopy(uR[h], levelIndex * nx, sr, 0, nx);
        System.arraycopy(uI[h], levelIndex * nx, si, 0, nx);
        double[][] ri = new double[2][nx];
        inverse(new FastFourierTransformer(DftNormalization.STANDARD), sr, si, 0, ri);
        return ri;
    }

    private void inverse(FastFourierTransformer fft, double[] sr, double[] si, int off, double[][] ri) {
        double[] re = ri[0], im = ri[1];
        for (int kk = 0; kk < nx; kk++) {
            double a = sr[off + kk], b = si[off + kk];
            re[kk] = a * shiftR[kk] - b * shiftI[kk];
            im[kk] = a * shiftI[kk] + b * shiftR[kk];
        }
        FastFourierTransformer.transformInPlace(ri, DftNormalization.STANDARD, TransformType.INVERSE);
    }

    private static void setMul(double[] ar, double[] ai, int i, double mr, double mi, double er, double ei) {
        ar[i] = mr * er - mi * ei;
        ai[i] = mr * ei + mi * er;
    }

    private static void acc(double[] sr, double[] si, int i, double ar, double ai, double xr, double xi) {
        sr[i] += ar * xr - ai * xi;
        si[i] += ar * xi + ai * xr;
    }

    private static void put(double[] c, int j, double re, double im) {
        c[2 * j] = re;
        c[2 * j + 1] = im;
    }

    /** Mutable holder the model fills; package-private. */
    static final class Builder {
        final LinearConfig cfg;
        final int nh, nx, nz;
        final double[] z;
        final double[] omega;
        final double[][] psiR, psiI, uR, uI;
        final double[][] cwR, cwI, cbR, cbI, cqR, cqI, cvR, cvI, cpR, cpI, bqR, bqI;
        final double[] p0R, p0I;
        final double[][] qR, qI, qIntR, qIntI;
        final double[] buoyancyScale;

        Builder(LinearConfig cfg, int nh, int nx, int nz, double[] z) {
            this.cfg = cfg;
            this.nh = nh;
            this.nx = nx;
            this.nz = nz;
            this.z = z;
            omega = new double[nh];
            psiR = new double[nh][nx * nz];
            psiI = new double[nh][nx * nz];
            uR = new double[nh][nx * nz];
            uI = new double[nh][nx * nz];
            cwR = new double[nh][nx];
            cwI = new double[nh][nx];
            cbR = new double[nh][nx];
            cbI = new double[nh][nx];
            cqR = new double[nh][nx];
            cqI = new double[nh][nx];
            cvR = new double[nh][nx];
            cvI = new double[nh][nx];
            cpR = new double[nh][nx];
            cpI = new double[nh][nx];
            bqR = new double[nh][nx];
            bqI = new double[nh][nx];
            p0R = new double[nh];
            p0I = new double[nh];
            qR = new double[nh][nz];
            qI = new double[nh][nz];
            qIntR = new double[nh][nz];
            qIntI = new double[nh][nz];
            buoyancyScale = new double[nz];
            java.util.Arrays.fill(buoyancyScale, 1.0);
        }

        LinearSolution build(Background bg) {
            return new LinearSolution(this, bg);
        }
    }
}
