package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

class TridiagonalTest {

    /**
     * -x'' = 2 on (0, 1) with x(0) = x(1) = 0 has the solution x(1 - x); the three-point second difference is
     * exact for a quadratic, so the discrete solution equals it at the nodes (common practice).
     */
    @Test
    void oneColumnSolvesTheDiscretePoissonProblemExactlyForAQuadratic() {
        int n = 49;
        double h = 1.0 / (n + 1);
        double[] a = new double[n];
        double[] b = new double[n];
        double[] c = new double[n];
        double[] r = new double[n];
        for (int k = 0; k < n; k++) {
            a[k] = k > 0 ? -1.0 : 0.0;
            c[k] = k < n - 1 ? -1.0 : 0.0;
            b[k] = 2.0;
            r[k] = 2.0 * h * h;
        }
        double[] x = new double[n];
        Tridiagonal.solveColumn(a, b, c, r, x, n);
        for (int k = 0; k < n; k++) {
            double z = (k + 1) * h;
            assertEquals(z * (1 - z), x[k], 1e-12);
        }
    }

    @Test
    void interleavedColumnsAgreeWithOneColumnSolvesToRoundOff() {
        Random rnd = new Random(15);
        int nx = 7;
        int nz = 12;
        double[] lo = new double[nx * nz];
        double[] hi = new double[nx * nz];
        double[] drag = new double[nx];
        double[] rhs = new double[nx * nz];
        for (int k = 0; k < nz; k++) {
            for (int i = 0; i < nx; i++) {
                lo[k * nx + i] = k > 0 ? 3 * rnd.nextDouble() : 0.0;
                hi[k * nx + i] = k < nz - 1 ? 3 * rnd.nextDouble() : 0.0;
                rhs[k * nx + i] = rnd.nextGaussian();
            }
        }
        for (int i = 0; i < nx; i++) {
            drag[i] = rnd.nextDouble();
        }
        double[] m = new double[nx * nz];
        double[] piv = new double[nx * nz];
        double[] s = new double[nx * nz];
        Tridiagonal.factoriseColumns(lo, hi, drag, 0.5, m, piv, nx, nz);
        Tridiagonal.solveColumns(rhs.clone(), m, piv, hi, s, nx, nz);
        for (int i = 0; i < nx; i++) {
            double[] a = new double[nz];
            double[] b = new double[nz];
            double[] c = new double[nz];
            double[] r = new double[nz];
            for (int k = 0; k < nz; k++) {
                a[k] = -lo[k * nx + i];
                c[k] = -hi[k * nx + i];
                b[k] = 1.0 + lo[k * nx + i] + hi[k * nx + i];
                r[k] = rhs[k * nx + i];
            }
            b[0] += 0.5 * drag[i];
            double[] x = new double[nz];
            Tridiagonal.solveColumn(a, b, c, r, x, nz);
            for (int k = 0; k < nz; k++) {
                assertEquals(x[k], s[k * nx + i], 1e-12 * (1 + Math.abs(x[k])));
            }
        }
    }
}
