package org.littoral.model.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The height-varying-N vertical solve (EJML banded LU) against exact solutions: the Green's-function recursion for
 * constant N (round-off), a two-layer solution derived from the interface conditions (round-off), and the closed
 * form for an exponential source (second-order convergence, the source being piecewise linear between nodes).
 */
class StratifiedVerticalSolverTest {
    private static final double OMEGA = 2 * Math.PI / 86400.0;

    /** A and B of m^2 = A N^2 + B for the hydrostatic, equally damped case (Rotunno 1983 with friction alpha). */
    private static double[] ab(double k, double f, double alpha, double omega) {
        // den = (alpha + i omega)^2 + f^2, A = k^2 / den, B = 0
        Complex den = new Complex(alpha, omega).multiply(new Complex(alpha, omega)).add(f * f);
        Complex a = new Complex(k * k, 0).divide(den);
        return new double[] {a.getReal(), a.getImaginary(), 0, 0};
    }

    private static Complex root(double[] ab, double n2) {
        Complex m = new Complex(ab[0] * n2 + ab[2], ab[1] * n2 + ab[3]).sqrt();
        return m.getReal() < 0 ? m.negate() : m;
    }

    /** Stretched nodes 0 .. top, the spacing growing from dz0 by factor r, with the given heights inserted. */
    private static double[] nodes(double top, double dz0, double r, double... extra) {
        double[] z = new double[4000];
        int n = 0;
        double d = dz0;
        for (double zz = 0; zz < top - 1e-9; zz += d, d *= r) {
            z[n++] = zz;
        }
        z[n++] = top;
        double[] all = Arrays.copyOf(z, n + extra.length);
        System.arraycopy(extra, 0, all, n, extra.length);
        return Arrays.stream(all).sorted().distinct().toArray();
    }

    @ParameterizedTest(name = "wavelength {0} km, friction {1} 1/s, latitude {2}")
    @CsvSource({"200, 2e-5, 40", "50, 1e-5, 40", "500, 5e-5, 20", "100, 0, 45"})
    void constantNReproducesTheGreensFunctionSolutionToRoundOff(double lambdaKm, double alpha, double latDeg) {
        double k = 2 * Math.PI / (lambdaKm * 1000);
        double f = 2 * 7.2921e-5 * Math.sin(Math.toRadians(latDeg));
        double n2 = 1e-4;
        double[] ab = ab(k, f, alpha, OMEGA);
        Complex m = root(ab, n2);
        double[] z = nodes(3000, 10, 1.04);
        int n = z.length;
        double[] fr = new double[n];
        double[] fi = new double[n];
        for (int j = 0; j < n; j++) {
            // a slab-like source: strongest near the ground, gone above 1200 m
            double s = Math.max(0, 1 - z[j] / 1200);
            fr[j] = s * s;
            fi[j] = 0.3 * s;
        }
        double[] cellN2 = new double[n - 1];
        Arrays.fill(cellN2, n2);
        double[][] strat = new double[4][n];
        StratifiedVerticalSolver s = new StratifiedVerticalSolver(z, cellN2);
        assertTrue(s.solve(ab[0], ab[1], ab[2], ab[3], m.getReal(), m.getImaginary(), fr, fi, Double.NaN,
                strat[0], strat[1], strat[2], strat[3]));
        double[][] green = new double[4][n];
        new VerticalGreenSolver(z).solve(m.getReal(), m.getImaginary(), fr, fi, green[0], green[1], green[2], green[3]);
        double scale = 0;
        double scaleZ = 0;
        for (int j = 0; j < n; j++) {
            scale = Math.max(scale, Math.hypot(green[0][j], green[1][j]));
            scaleZ = Math.max(scaleZ, Math.hypot(green[2][j], green[3][j]));
        }
        // round-off: 1e-9 of the largest value allows for the conditioning of the two methods (up to ~1e5 for
        // the inviscid elliptic case); any error of the scheme itself would be O(dz^2) ~ 1e-4
        for (int j = 0; j < n; j++) {
            assertEquals(green[0][j], strat[0][j], 1e-9 * scale, "Re psi at " + z[j] + " m");
            assertEquals(green[1][j], strat[1][j], 1e-9 * scale, "Im psi at " + z[j] + " m");
            assertEquals(green[2][j], strat[2][j], 1e-9 * scaleZ, "Re psi_z at " + z[j] + " m");
            assertEquals(green[3][j], strat[3][j], 1e-9 * scaleZ, "Im psi_z at " + z[j] + " m");
        }
    }

    /**
     * Two layers, N1 below H1 and N2 above, source F = F0 (1 - z/D) below D &lt; H1 (zero above), Psi(0) = 0,
     * decaying aloft. Derived here from the interface conditions (Psi and Psi' continuous): above the source the
     * lower layer holds P [exp(-m1 (z - H1)) + R exp(m1 (z - H1))] with the interface reflection coefficient
     * R = (m1 - m2)/(m1 + m2) (the textbook form for a wave meeting a change of medium, e.g. Gill 1982, section
     * 8.4, from memory), the upper layer P (1 + R) exp(-m2 (z - H1)); below D, Psi = -F/m1^2 + (F0/m1^2) cosh(m1 z)
     * + C sinh(m1 z); C and P from continuity at D by Cramer's rule. Complex arithmetic from Commons Math.
     */
    @ParameterizedTest(name = "N1 = {0}, N2 = {1} 1/s, wavelength {2} km")
    @CsvSource({"0.005, 0.015, 200", "0.015, 0.005, 200", "0.001, 0.01, 300", "0.01, 0.01, 150"})
    void twoLayersReproduceTheInterfaceSolutionToRoundOff(double n1, double n2, double lambdaKm) {
        double k = 2 * Math.PI / (lambdaKm * 1000);
        double f = 2 * 7.2921e-5 * Math.sin(Math.toRadians(40));
        double[] ab = ab(k, f, 2e-5, OMEGA);
        double h1 = 1000;
        double d = 600;
        Complex f0 = new Complex(1.0, 0.5);
        Complex m1 = root(ab, n1 * n1);
        Complex m2 = root(ab, n2 * n2);
        double[] z = nodes(h1, 15, 1.02, d);
        int n = z.length;
        double[] fr = new double[n];
        double[] fi = new double[n];
        double[] cellN2 = new double[n - 1];
        for (int j = 0; j < n; j++) {
            double s = Math.max(0, 1 - z[j] / d);
            fr[j] = f0.getReal() * s;
            fi[j] = f0.getImaginary() * s;
        }
        Arrays.fill(cellN2, n1 * n1);
        double[][] got = new double[4][n];
        StratifiedVerticalSolver s = new StratifiedVerticalSolver(z, cellN2);
        assertTrue(s.solve(ab[0], ab[1], ab[2], ab[3], m2.getReal(), m2.getImaginary(), fr, fi, Double.NaN,
                got[0], got[1], got[2], got[3]));

        Complex r = m1.subtract(m2).divide(m1.add(m2));
        Complex sh = m1.multiply(d).sinh();
        Complex ch = m1.multiply(d).cosh();
        Complex u = m1.multiply(-(d - h1)).exp().add(r.multiply(m1.multiply(d - h1).exp()));
        Complex uz = m1.negate().multiply(m1.multiply(-(d - h1)).exp()).add(r.multiply(m1).multiply(m1.multiply(d - h1).exp()));
        Complex m1sq = m1.multiply(m1);
        Complex det = sh.negate().multiply(uz).add(u.multiply(m1).multiply(ch));
        Complex c = f0.divide(m1sq).multiply(ch).multiply(uz)
                .subtract(u.multiply(f0.divide(m1sq.multiply(d)).add(f0.divide(m1).multiply(sh)))).divide(det);
        Complex p = f0.divide(m1).subtract(sh.multiply(f0).divide(m1sq.multiply(d))).divide(det);
        double scale = 0;
        Complex[] exact = new Complex[n];
        Complex[] exactZ = new Complex[n];
        for (int j = 0; j < n; j++) {
            double zz = z[j];
            if (zz <= d) {
                Complex fz = f0.multiply(1 - zz / d);
                exact[j] = fz.negate().divide(m1sq).add(f0.divide(m1sq).multiply(m1.multiply(zz).cosh())).add(c.multiply(m1.multiply(zz).sinh()));
                exactZ[j] = f0.divide(m1sq.multiply(d)).add(f0.divide(m1).multiply(m1.multiply(zz).sinh())).add(c.multiply(m1).multiply(m1.multiply(zz).cosh()));
            } else {
                Complex e1 = m1.multiply(-(zz - h1)).exp();
                Complex e2 = m1.multiply(zz - h1).exp();
                exact[j] = p.multiply(e1.add(r.multiply(e2)));
                exactZ[j] = p.multiply(m1).multiply(r.multiply(e2).subtract(e1));
            }
            scale = Math.max(scale, exact[j].abs());
        }
        // above H1: Psi = P (1 + R) exp(-m2 (z - H1)), slope -m2 times that, at the top node
        Complex top = p.multiply(r.add(1));
        assertEquals(top.getReal(), exact[n - 1].getReal(), 1e-12 * scale, "the exact solution is continuous at H1");
        assertEquals(top.multiply(m2).negate().getReal(), got[2][n - 1], 1e-10 * scale * m2.abs(), "Re psi_z just above H1");
        for (int j = 0; j < n; j++) {
            assertEquals(exact[j].getReal(), got[0][j], 1e-11 * scale, "Re psi at " + z[j] + " m");
            assertEquals(exact[j].getImaginary(), got[1][j], 1e-11 * scale, "Im psi at " + z[j] + " m");
            if (j < n - 1) {
                assertEquals(exactZ[j].getReal(), got[2][j], 1e-10 * scale * m1.abs() + 1e-12 * scale / d, "Re psi_z at " + z[j] + " m");
                assertEquals(exactZ[j].getImaginary(), got[3][j], 1e-10 * scale * m1.abs() + 1e-12 * scale / d, "Im psi_z at " + z[j] + " m");
            }
        }
    }

    @Test
    void anExponentialSourceConvergesAtSecondOrderToTheClosedForm() {
        double k = 2 * Math.PI / 200e3;
        double f = 2 * 7.2921e-5 * Math.sin(Math.toRadians(40));
        double[] ab = ab(k, f, 2e-5, OMEGA);
        double n2 = 1e-4;
        double decay = 1.0 / 800;
        Complex m = root(ab, n2);
        double[] err = new double[2];
        for (int level = 0; level < 2; level++) {
            double dz = level == 0 ? 40 : 20;
            double[] z = nodes(1500, dz, 1.0);
            int n = z.length;
            double[] fr = new double[n];
            double[] fi = new double[n];
            for (int j = 0; j < n; j++) {
                fr[j] = Math.exp(-decay * z[j]);
            }
            double[] cellN2 = new double[n - 1];
            Arrays.fill(cellN2, n2);
            double[][] got = new double[4][n];
            assertTrue(new StratifiedVerticalSolver(z, cellN2).solve(ab[0], ab[1], ab[2], ab[3], m.getReal(), m.getImaginary(),
                    fr, fi, decay, got[0], got[1], got[2], got[3]));
            double[] out = new double[4];
            double scale = 0;
            for (int j = 0; j < n; j++) {
                VerticalGreenSolver.exponentialSource(decay, m.getReal(), m.getImaginary(), z[j], out);
                err[level] = Math.max(err[level], Math.hypot(out[0] - got[0][j], out[1] - got[1][j]));
                scale = Math.max(scale, Math.hypot(out[0], out[1]));
            }
            err[level] /= scale;
        }
        // halving the spacing cuts the error by about four (second order); the error is small already
        assertTrue(err[0] < 1e-3, "error at 40 m: " + err[0]);
        assertEquals(4.0, err[0] / err[1], 0.5, "errors " + Arrays.toString(err));
    }
}
