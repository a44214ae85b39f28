package org.littoral.validation.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** The closed-form helper that supplies the linear-theory check values, against independent formulas. */
class ClassicSurfaceWindTest {
    private static final double EULER_GAMMA = 0.5772156649015329;

    @Test
    void expE1OfRealArgumentMatchesTabulatedE1() {
        // Abramowitz & Stegun (1964), table 5.1 (from memory): E1(1) = 0.2193839344, E1(0.1) = 1.8229239584
        assertEquals(Math.E * 0.2193839344, ClassicSurfaceWind.expE1(1.0, 0.0)[0], 1e-9);
        assertEquals(Math.exp(0.1) * 1.8229239584, ClassicSurfaceWind.expE1(0.1, 0.0)[0], 1e-9);
        assertEquals(0.0, ClassicSurfaceWind.expE1(0.1, 0.0)[1], 1e-15);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.02, 0.0529, 0.3, 1.0, 2.5})
    void expE1OfImaginaryArgumentMatchesTheSineAndCosineIntegrals(double y) {
        // E1(i y) = -Ci(y) + i (Si(y) - pi/2) (Abramowitz & Stegun 1964, 5.2.23), Si and Ci by their power series (5.2.14, 5.2.16)
        double si = 0;
        double ci = EULER_GAMMA + Math.log(y);
        double term = y; // y^(2n+1)/(2n+1)!
        for (int n = 0; n < 30; n++) {
            si += (n % 2 == 0 ? 1 : -1) * term / (2 * n + 1);
            double even = term * y / (2 * n + 2); // y^(2n+2)/(2n+2)!
            ci += (n % 2 == 0 ? -1 : 1) * even / (2 * n + 2);
            term = even * y / (2 * n + 3);
        }
        double e1r = -ci;
        double e1i = si - Math.PI / 2;
        // G = exp(i y) E1(i y)
        double gr = Math.cos(y) * e1r - Math.sin(y) * e1i;
        double gi = Math.cos(y) * e1i + Math.sin(y) * e1r;
        double[] g = ClassicSurfaceWind.expE1(0.0, y);
        assertEquals(gr, g[0], 1e-8);
        assertEquals(gi, g[1], 1e-8);
    }

    @Test
    void fourierIntegralAtTheCoastEqualsTheElementaryClosedForm() {
        // u(0,0) per unit Qc = G(c) / (N sqrt(f^2 - omega^2)), c = x0 sqrt(f^2 - omega^2) / (N H) (derived in the class comment)
        double n = 0.01;
        double h = 1000;
        double f = 1.0313e-4;
        double w = 2 * Math.PI / 86400;
        double x0 = 13e3;
        double s = Math.sqrt(f * f - w * w);
        double expected = ClassicSurfaceWind.expE1(x0 * s / (n * h), 0)[0] / (n * s);
        double[] a = new ClassicSurfaceWind(n, h, f, w, 0.0, 0.0, x0).amplitude(0.0);
        assertEquals(expected, a[0], 1e-8 * expected);
        assertEquals(0.0, a[1], 1e-12 * expected);
    }
}
