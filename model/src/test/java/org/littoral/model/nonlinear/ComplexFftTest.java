package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ComplexFftTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 7, 8, 12, 20, 30, 64, 100, 400, 512})
    void mixedRadixTransformEqualsTheDirectDftDefinition(int n) {
        Random rnd = new Random(n);
        double[] re = new double[n];
        double[] im = new double[n];
        for (int t = 0; t < n; t++) {
            re[t] = rnd.nextGaussian();
            im[t] = rnd.nextGaussian();
        }
        double[] r2 = re.clone();
        double[] i2 = im.clone();
        new ComplexFft(n).forward(r2, i2);
        for (int fr = 0; fr < n; fr++) {
            double sr = 0;
            double si = 0;
            for (int t = 0; t < n; t++) {
                double a = -2 * Math.PI * (double) fr * t / n;
                sr += re[t] * Math.cos(a) - im[t] * Math.sin(a);
                si += re[t] * Math.sin(a) + im[t] * Math.cos(a);
            }
            assertEquals(sr, r2[fr], 1e-9 * n, "re at " + fr);
            assertEquals(si, i2[fr], 1e-9 * n, "im at " + fr);
        }
        new ComplexFft(n).inverse(r2, i2);
        for (int t = 0; t < n; t++) {
            assertEquals(re[t], r2[t] / n, 1e-12 * n);
            assertEquals(im[t], i2[t] / n, 1e-12 * n);
        }
    }
}
