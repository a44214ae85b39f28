package org.littoral.model.linear;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;

/**
 * The vertical problem of the linear breeze model for one (wavenumber, frequency) when the buoyancy frequency
 * varies with height: Psi'' - m(z)^2 Psi = F(z), Psi(0) = 0, Psi bounded (or radiating) aloft, with
 * m(z)^2 = A N(z)^2 + B (A, B complex, from the wavenumber, frequency, damping and f).
 *
 * <p>Between nodes z_0 = 0 .. z_T the column is cut into cells; in each cell m^2 takes the cell's mean of N^2 and
 * F is linear. Within a cell the equation is then solved exactly: with Psi given at both ends the derivative at
 * each end is
 *
 * <pre>
 *   Psi'(z_j+)     = (g2 Psi_j+1 - g1 Psi_j) / h + h (phiA F_j + phiB F_j+1)
 *   Psi'(z_j+1 -)  = (g1 Psi_j+1 - g2 Psi_j) / h - h (phiB F_j + phiA F_j+1)
 *   g1 = x coth x,  g2 = x csch x,  phiA = (1 - x coth x) / x^2,  phiB = (x csch x - 1) / x^2,  x = m h
 * </pre>
 *
 * (all even in x, so the branch of m inside the column does not matter; x -&gt; 0 gives the cubic of Psi'' = F).
 * Asking Psi' to be continuous at every inner node gives one complex tridiagonal equation per node; above z_T,
 * where N is constant (m = m_top, the caller's decaying or radiating root) and F is either zero or
 * F_T exp(-a (z - z_T)), the solution is Psi_T exp(-m s) + F_T (exp(-a s) - exp(-m s)) / (a^2 - m^2), s = z - z_T,
 * which closes the system at the top node. The scheme is exact for piecewise-constant N^2 and piecewise-linear
 * F: for constant N it reproduces the Green's-function solution ({@link VerticalGreenSolver}) to round-off, and
 * for two layers the interface solution with the reflection coefficient (m1 - m2)/(m1 + m2).
 *
 * <p>The complex tridiagonal system is solved as its real 2 x 2-block banded form by EJML's sparse LU with partial
 * pivoting (Golub and Van Loan 2013, section 4.3, banded LU); the sparsity pattern is built once per instance.
 * Not thread-safe: one instance holds its matrix, factorisation and scratch arrays.
 */
final class StratifiedVerticalSolver {
    /** Below this |x|^2 = |m h|^2 the cell coefficients use their Taylor series (cancellation in the closed form). */
    private static final double SERIES_LIMIT_SQ = 0.01;

    private final int nNodes;
    private final int unknowns;
    private final double[] h;
    private final double[] cellN2;
    private final DMatrixSparseCSC a;
    private final DMatrixRMaj rhs;
    private final DMatrixRMaj sol;
    private final LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu;
    // per-cell coefficients {g1, g2, phiA, phiB}, real and imaginary parts
    private final double[] g1R, g1I, g2R, g2I, paR, paI, pbR, pbI;
    private final double[] cell = new double[8];

    /**
     * @param nodesM node heights, the first exactly 0, strictly increasing, the last the top z_T
     * @param cellN2PerS2 N^2 of each cell (nodesM.length - 1 values), 1/s^2
     */
    StratifiedVerticalSolver(double[] nodesM, double[] cellN2PerS2) {
        if (nodesM.length < 2 || nodesM[0] != 0.0) {
            throw new IllegalArgumentException("stratified vertical solver nodes must start at z = 0 and have at least 2 points");
        }
        if (cellN2PerS2.length != nodesM.length - 1) {
            throw new IllegalArgumentException("stratified vertical solver needs one N^2 per cell: " + (nodesM.length - 1)
                    + ", got " + cellN2PerS2.length);
        }
        nNodes = nodesM.length;
        unknowns = nNodes - 1;
        h = new double[nNodes - 1];
        for (int j = 0; j + 1 < nNodes; j++) {
            h[j] = nodesM[j + 1] - nodesM[j];
            if (!(h[j] > 0)) {
                throw new IllegalArgumentException("stratified vertical solver nodes must increase strictly at node " + (j + 1));
            }
        }
        cellN2 = cellN2PerS2.clone();
        int n = 2 * unknowns;
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, 12 * unknowns);
        for (int r = 0; r < unknowns; r++) {
            for (int q = Math.max(0, r - 1); q <= Math.min(unknowns - 1, r + 1); q++) {
                for (int p = 0; p < 2; p++) {
                    for (int s = 0; s < 2; s++) {
                        t.addItem(2 * r + p, 2 * q + s, 1.0);
                    }
                }
            }
        }
        a = new DMatrixSparseCSC(n, n, 0);
        DConvertMatrixStruct.convert(t, a);
        rhs = new DMatrixRMaj(n, 1);
        sol = new DMatrixRMaj(n, 1);
        lu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
        g1R = new double[nNodes - 1];
        g1I = new double[nNodes - 1];
        g2R = new double[nNodes - 1];
        g2I = new double[nNodes - 1];
        paR = new double[nNodes - 1];
        paI = new double[nNodes - 1];
        pbR = new double[nNodes - 1];
        pbI = new double[nNodes - 1];
    }

    int size() {
        return nNodes;
    }

    /**
     * Solves for one mode and writes Psi and Psi_z at the nodes.
     *
     * @param aR real part of A in m^2 = A N^2 + B (likewise aI, bR, bI)
     * @param mTopR the root m above z_T (Re m &gt;= 0, or the radiating root), real part (mTopI its imaginary part)
     * @param fr source F at the nodes, real part (piecewise linear between nodes); fi its imaginary part
     * @param tailDecayPerM a &gt; 0 when F continues above z_T as F_T exp(-a (z - z_T)); NaN when F is zero above z_T
     * @return false when the system is singular (a resonant column without damping)
     */
    boolean solve(double aR, double aI, double bR, double bI, double mTopR, double mTopI, double[] fr, double[] fi,
                  double tailDecayPerM, double[] psiR, double[] psiI, double[] psiZR, double[] psiZI) {
        for (int j = 0; j < nNodes - 1; j++) {
            double hh = h[j] * h[j];
            cellCoefficients((aR * cellN2[j] + bR) * hh, (aI * cellN2[j] + bI) * hh, cell);
            g1R[j] = cell[0];
            g1I[j] = cell[1];
            g2R[j] = cell[2];
            g2I[j] = cell[3];
            paR[j] = cell[4];
            paI[j] = cell[5];
            pbR[j] = cell[6];
            pbI[j] = cell[7];
        }
        int top = nNodes - 1;
        // F_T E'(0): the exponential tail's particular solution has slope -F_T / (a + m) at z_T
        double tailR = 0;
        double tailI = 0;
        if (tailDecayPerM > 0) {
            double dr = tailDecayPerM + mTopR;
            double di = mTopI;
            double dd = dr * dr + di * di;
            // -F_T / (a + m)
            tailR = -(fr[top] * dr + fi[top] * di) / dd;
            tailI = -(fi[top] * dr - fr[top] * di) / dd;
        }
        for (int j = 1; j <= top; j++) {
            int r = j - 1;
            int below = j - 1;
            double ih = 1.0 / h[below];
            // -g2/h on Psi_{j-1} (Psi_0 = 0 is not an unknown)
            if (j > 1) {
                set(r, r - 1, -g2R[below] * ih, -g2I[below] * ih);
            }
            double dR = g1R[below] * ih;
            double dI = g1I[below] * ih;
            // h_{j-1} (phiB F_{j-1} + phiA F_j)
            double sR = h[below] * (mulR(pbR[below], pbI[below], fr[j - 1], fi[j - 1]) + mulR(paR[below], paI[below], fr[j], fi[j]));
            double sI = h[below] * (mulI(pbR[below], pbI[below], fr[j - 1], fi[j - 1]) + mulI(paR[below], paI[below], fr[j], fi[j]));
            if (j < top) {
                double ia = 1.0 / h[j];
                dR += g1R[j] * ia;
                dI += g1I[j] * ia;
                set(r, r + 1, -g2R[j] * ia, -g2I[j] * ia);
                sR += h[j] * (mulR(paR[j], paI[j], fr[j], fi[j]) + mulR(pbR[j], pbI[j], fr[j + 1], fi[j + 1]));
                sI += h[j] * (mulI(paR[j], paI[j], fr[j], fi[j]) + mulI(pbR[j], pbI[j], fr[j + 1], fi[j + 1]));
            } else {
                dR += mTopR;
                dI += mTopI;
                sR += tailR;
                sI += tailI;
            }
            set(r, r, dR, dI);
            rhs.data[2 * r] = sR;
            rhs.data[2 * r + 1] = sI;
        }
        if (!lu.setA(a)) {
            return false;
        }
        lu.solve(rhs, sol);
        psiR[0] = 0;
        psiI[0] = 0;
        for (int j = 1; j <= top; j++) {
            psiR[j] = sol.data[2 * (j - 1)];
            psiI[j] = sol.data[2 * (j - 1) + 1];
        }
        for (int j = 0; j < top; j++) {
            // Psi'(z_j+) = (g2 Psi_{j+1} - g1 Psi_j) / h + h (phiA F_j + phiB F_{j+1})
            double ih = 1.0 / h[j];
            psiZR[j] = (mulR(g2R[j], g2I[j], psiR[j + 1], psiI[j + 1]) - mulR(g1R[j], g1I[j], psiR[j], psiI[j])) * ih
                    + h[j] * (mulR(paR[j], paI[j], fr[j], fi[j]) + mulR(pbR[j], pbI[j], fr[j + 1], fi[j + 1]));
            psiZI[j] = (mulI(g2R[j], g2I[j], psiR[j + 1], psiI[j + 1]) - mulI(g1R[j], g1I[j], psiR[j], psiI[j])) * ih
                    + h[j] * (mulI(paR[j], paI[j], fr[j], fi[j]) + mulI(pbR[j], pbI[j], fr[j + 1], fi[j + 1]));
        }
        psiZR[top] = -mulR(mTopR, mTopI, psiR[top], psiI[top]) + tailR;
        psiZI[top] = -mulI(mTopR, mTopI, psiR[top], psiI[top]) + tailI;
        return true;
    }

    /** Writes the complex coefficient (cr, ci) of unknown q in equation r as its real 2 x 2 block. */
    private void set(int r, int q, double cr, double ci) {
        a.unsafe_set(2 * r, 2 * q, cr);
        a.unsafe_set(2 * r, 2 * q + 1, -ci);
        a.unsafe_set(2 * r + 1, 2 * q, ci);
        a.unsafe_set(2 * r + 1, 2 * q + 1, cr);
    }

    private static double mulR(double ar, double ai, double br, double bi) {
        return ar * br - ai * bi;
    }

    private static double mulI(double ar, double ai, double br, double bi) {
        return ar * bi + ai * br;
    }

    /**
     * g1 = x coth x, g2 = x csch x, phiA = (1 - g1)/x^2, phiB = (g2 - 1)/x^2 for y = x^2 = (yr, yi); writes
     * {g1, g2, phiA, phiB} as (re, im) pairs. Series for small |x| (Bernoulli-number expansions of x coth x and
     * x csch x, Abramowitz and Stegun 1964, section 4.5, from memory), closed forms through exp(-x) and
     * exp(-2x) (bounded for Re x &gt;= 0) otherwise.
     */
    static void cellCoefficients(double yr, double yi, double[] out) {
        if (yr * yr + yi * yi < SERIES_LIMIT_SQ) {
            double y2r = yr * yr - yi * yi, y2i = 2 * yr * yi;
            double y3r = y2r * yr - y2i * yi, y3i = y2r * yi + y2i * yr;
            double y4r = y3r * yr - y3i * yi, y4i = y3r * yi + y3i * yr;
            double y5r = y4r * yr - y4i * yi, y5i = y4r * yi + y4i * yr;
            // x coth x = 1 + y/3 - y^2/45 + 2 y^3/945 - y^4/4725 + 2 y^5/93555
            double c1 = 1.0 / 3, c2 = -1.0 / 45, c3 = 2.0 / 945, c4 = -1.0 / 4725, c5 = 2.0 / 93555;
            // x csch x = 1 - y/6 + 7 y^2/360 - 31 y^3/15120 + 127 y^4/604800 - 73 y^5/3421440
            double s1 = -1.0 / 6, s2 = 7.0 / 360, s3 = -31.0 / 15120, s4 = 127.0 / 604800, s5 = -73.0 / 3421440;
            out[0] = 1 + c1 * yr + c2 * y2r + c3 * y3r + c4 * y4r + c5 * y5r;
            out[1] = c1 * yi + c2 * y2i + c3 * y3i + c4 * y4i + c5 * y5i;
            out[2] = 1 + s1 * yr + s2 * y2r + s3 * y3r + s4 * y4r + s5 * y5r;
            out[3] = s1 * yi + s2 * y2i + s3 * y3i + s4 * y4i + s5 * y5i;
            out[4] = -(c1 + c2 * yr + c3 * y2r + c4 * y3r + c5 * y4r);
            out[5] = -(c2 * yi + c3 * y2i + c4 * y3i + c5 * y4i);
            out[6] = s1 + s2 * yr + s3 * y2r + s4 * y3r + s5 * y4r;
            out[7] = s2 * yi + s3 * y2i + s4 * y3i + s5 * y4i;
            return;
        }
        // principal square root, Re x >= 0
        double mod = Math.hypot(yr, yi);
        double xr = Math.sqrt(0.5 * (mod + yr));
        double xi = Math.sqrt(Math.max(0.0, 0.5 * (mod - yr)));
        if (yi < 0) {
            xi = -xi;
        }
        double m1 = Math.exp(-xr);
        double e1r = m1 * Math.cos(xi), e1i = -m1 * Math.sin(xi);
        double m2 = m1 * m1;
        double e2r = m2 * Math.cos(2 * xi), e2i = -m2 * Math.sin(2 * xi);
        // coth x = (1 + e2) / (1 - e2), csch x = 2 e1 / (1 - e2)
        double dr = 1 - e2r, di = -e2i;
        double dd = dr * dr + di * di;
        double nr = 1 + e2r, ni = e2i;
        double cothR = (nr * dr + ni * di) / dd, cothI = (ni * dr - nr * di) / dd;
        double cschR = 2 * (e1r * dr + e1i * di) / dd, cschI = 2 * (e1i * dr - e1r * di) / dd;
        double g1r = xr * cothR - xi * cothI, g1i = xr * cothI + xi * cothR;
        double g2r = xr * cschR - xi * cschI, g2i = xr * cschI + xi * cschR;
        double yy = yr * yr + yi * yi;
        // (1 - g1) / y and (g2 - 1) / y
        double ar = 1 - g1r, ai = -g1i;
        double br = g2r - 1, bi = g2i;
        out[0] = g1r;
        out[1] = g1i;
        out[2] = g2r;
        out[3] = g2i;
        out[4] = (ar * yr + ai * yi) / yy;
        out[5] = (ai * yr - ar * yi) / yy;
        out[6] = (br * yr + bi * yi) / yy;
        out[7] = (bi * yr - br * yi) / yy;
    }
}
