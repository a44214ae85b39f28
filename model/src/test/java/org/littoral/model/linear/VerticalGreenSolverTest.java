package org.littoral.model.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class VerticalGreenSolverTest {
    private static final double A = 1.0 / 1000.0;

    /** Textbook solution of psi'' - m^2 psi = exp(-a z), psi(0) = 0, bounded: (e^{-az} - e^{-mz})/(a^2 - m^2). */
    private static double[] textbook(double mr, double mi, double z) {
        // direct complex arithmetic, no shared code with the solver
        double ea = Math.exp(-A * z);
        double emr = Math.exp(-mr * z) * Math.cos(mi * z);
        double emi = -Math.exp(-mr * z) * Math.sin(mi * z);
        double dr = A * A - (mr * mr - mi * mi);
        double di = -2 * mr * mi;
        double dd = dr * dr + di * di;
        double nr = ea - emr, ni = -emi;
        return new double[] {(nr * dr + ni * di) / dd, (ni * dr - nr * di) / dd};
    }

    @ParameterizedTest(name = "m = {0} + {1} i per m")
    @CsvSource({"3e-3, 0", "5e-4, 0", "2e-3, 1.5e-3", "1e-5, -2e-3", "0, -2e-3", "0, 4e-3", "1.2e-3, 0"})
    void greenRecursionMatchesTheClosedFormForAnExponentialSource(double mr, double mi) {
        int n = 4001;
        double top = 16000;
        double[] z = new double[n];
        double[] fr = new double[n];
        double[] fi = new double[n];
        for (int j = 0; j < n; j++) {
            z[j] = top * j / (n - 1);
            fr[j] = Math.exp(-A * z[j]);
        }
        VerticalGreenSolver s = new VerticalGreenSolver(z);
        double[] pr = new double[n], pi = new double[n], qr = new double[n], qi = new double[n];
        s.solve(mr, mi, fr, fi, pr, pi, qr, qi);
        double scale = 0;
        for (int j = 0; j < n; j += 50) {
            double[] t = textbook(mr, mi, z[j]);
            scale = Math.max(scale, Math.hypot(t[0], t[1]));
        }
        double[] out = new double[4];
        for (int j = 0; j < n / 2; j += 50) {
            double[] t = textbook(mr, mi, z[j]);
            // piecewise-linear source on 4 m cells: error O((a dz)^2) ~ 1e-5; the truncated tail exp(-16) ~ 1e-7
            assertEquals(t[0], pr[j], 2e-5 * scale, "Re psi at z = " + z[j]);
            assertEquals(t[1], pi[j], 2e-5 * scale, "Im psi at z = " + z[j]);
            VerticalGreenSolver.exponentialSource(A, mr, mi, z[j], out);
            assertEquals(t[0], out[0], 1e-9 * scale, "closed form Re psi");
            assertEquals(t[1], out[1], 1e-9 * scale, "closed form Im psi");
            assertEquals(out[2], qr[j], 2e-5 * scale * Math.max(A, Math.hypot(mr, mi)), "Re psi_z");
            assertEquals(out[3], qi[j], 2e-5 * scale * Math.max(A, Math.hypot(mr, mi)), "Im psi_z");
        }
    }

    @ParameterizedTest(name = "m = {0} + {1} i per m")
    @CsvSource({"2e-3, 1e-3", "0, -2e-3", "1e-3, 0", "1.0000001e-3, 0"})
    void closedFormSatisfiesTheOdeTheGroundConditionAndItsDerivative(double mr, double mi) {
        double[] o = new double[4], p = new double[4], q = new double[4];
        VerticalGreenSolver.exponentialSource(A, mr, mi, 0.0, o);
        assertEquals(0.0, o[0], 1e-18);
        assertEquals(0.0, o[1], 1e-18);
        double h = 1.0;
        double hd = 0.01;
        for (double z : new double[] {200, 1000, 2500}) {
            VerticalGreenSolver.exponentialSource(A, mr, mi, z, o);
            VerticalGreenSolver.exponentialSource(A, mr, mi, z + h, p);
            VerticalGreenSolver.exponentialSource(A, mr, mi, z - h, q);
            double m2r = mr * mr - mi * mi, m2i = 2 * mr * mi;
            double resR = (p[0] - 2 * o[0] + q[0]) / (h * h) - (m2r * o[0] - m2i * o[1]) - Math.exp(-A * z);
            double resI = (p[1] - 2 * o[1] + q[1]) / (h * h) - (m2r * o[1] + m2i * o[0]);
            // second-difference truncation h^2/12 psi'''' ~ h^2 |m|^4 |psi| / 12
            double k4 = Math.pow(Math.max(A, Math.hypot(mr, mi)), 4);
            double tolRes = 1e-6 * Math.exp(-A * z) + h * h * k4 * Math.hypot(o[0], o[1]) / 6;
            assertEquals(0.0, resR, tolRes);
            assertEquals(0.0, resI, tolRes);
            VerticalGreenSolver.exponentialSource(A, mr, mi, z + hd, p);
            VerticalGreenSolver.exponentialSource(A, mr, mi, z - hd, q);
            // central difference with hd = 1 cm: truncation and round-off both below 1e-7
            double tol = 1e-7 * Math.hypot(o[2], o[3]) + 1e-13 * Math.hypot(o[0], o[1]) / hd;
            assertEquals((p[0] - q[0]) / (2 * hd), o[2], tol);
            assertEquals((p[1] - q[1]) / (2 * hd), o[3], tol);
        }
    }

    @ParameterizedTest(name = "m = {0} + {1} i per m")
    @CsvSource({"1e-3, 0", "1e-3, 2e-3", "0, -3e-3"})
    void solutionIsBoundedAboveACompactSource(double mr, double mi) {
        int n = 2001;
        double[] z = new double[n];
        double[] fr = new double[n];
        double[] fi = new double[n];
        for (int j = 0; j < n; j++) {
            z[j] = 10.0 * j;
            fr[j] = z[j] < 1000 ? 1.0 - z[j] / 1000 : 0.0;
        }
        VerticalGreenSolver s = new VerticalGreenSolver(z);
        double[] pr = new double[n], pi = new double[n], qr = new double[n], qi = new double[n];
        s.solve(mr, mi, fr, fi, pr, pi, qr, qi);
        double at1km = Math.hypot(pr[100], pi[100]);
        for (int j = 101; j < n; j++) {
            double a = Math.hypot(pr[j], pi[j]);
            // above the source psi = psi(h) exp(-m (z - h)): decays for Re m > 0, constant modulus when radiating
            double expected = at1km * Math.exp(-mr * (z[j] - 1000));
            assertEquals(expected, a, 1e-9 * at1km + 1e-6 * expected);
        }
        assertTrue(at1km > 0);
    }
}
