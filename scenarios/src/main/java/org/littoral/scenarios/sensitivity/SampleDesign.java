package org.littoral.scenarios.sensitivity;

import java.util.SplittableRandom;
import org.apache.commons.math3.random.SobolSequenceGenerator;

/**
 * The two independent sample matrices A and B (N rows, k columns, points of the unit hypercube) of a
 * variance-based sensitivity study, and the "radial" matrices A_B^(i) (A with column i taken from B) built from
 * them: Saltelli et al. (2010), Comput. Phys. Commun. 181, 259-270, section 3. The study costs N (k + 2) model runs.
 *
 * <p>A and B are the first and last k coordinates of a 2k-dimensional point set: either a Sobol' low-discrepancy
 * sequence (Sobol' 1967; direction numbers of Joe and Kuo 2008, as in Commons Math's
 * {@link SobolSequenceGenerator}), the choice Saltelli et al. (2010) recommend, or seeded pseudo-random points. The
 * Sobol' sequence's first point (the origin) is skipped: it sits on the corner of the hypercube, where an
 * unbounded distribution's quantile is infinite.
 */
public final class SampleDesign {

    /** How the points are chosen. */
    public enum Points {
        /** Sobol' low-discrepancy sequence (quasi-Monte Carlo). */
        SOBOL,
        /** Seeded pseudo-random points (Monte Carlo). */
        RANDOM
    }

    private final double[][] a;
    private final double[][] b;
    private final Points points;

    private SampleDesign(double[][] a, double[][] b, Points points) {
        this.a = a;
        this.b = b;
        this.points = points;
    }

    /**
     * @param n rows of A and B (base sample size; a power of two suits the Sobol' sequence best)
     * @param k inputs
     * @param seed seed of the pseudo-random points (unused for {@link Points#SOBOL})
     */
    public static SampleDesign of(Points points, int n, int k, long seed) {
        if (n < 2) {
            throw new IllegalArgumentException("base sample size must be at least 2; got " + n);
        }
        if (k < 1 || 2 * k > 1000) {
            throw new IllegalArgumentException("inputs must be 1..500; got " + k);
        }
        double[][] a = new double[n][k];
        double[][] b = new double[n][k];
        if (points == Points.SOBOL) {
            SobolSequenceGenerator g = new SobolSequenceGenerator(2 * k);
            g.skipTo(1);
            for (int j = 0; j < n; j++) {
                double[] p = g.nextVector();
                System.arraycopy(p, 0, a[j], 0, k);
                System.arraycopy(p, k, b[j], 0, k);
            }
        } else {
            SplittableRandom r = new SplittableRandom(seed);
            for (int j = 0; j < n; j++) {
                for (int i = 0; i < k; i++) {
                    a[j][i] = r.nextDouble();
                }
                for (int i = 0; i < k; i++) {
                    b[j][i] = r.nextDouble();
                }
            }
        }
        return new SampleDesign(a, b, points);
    }

    public Points points() {
        return points;
    }

    public int n() {
        return a.length;
    }

    public int k() {
        return a[0].length;
    }

    /** Row j of A (a copy). */
    public double[] a(int j) {
        return a[j].clone();
    }

    /** Row j of B (a copy). */
    public double[] b(int j) {
        return b[j].clone();
    }

    /** Row j of A_B^(i): row j of A with coordinate i from B (a copy). */
    public double[] ab(int i, int j) {
        double[] r = a[j].clone();
        r[i] = b[j][i];
        return r;
    }

    /** Number of model runs of the study: N (k + 2). */
    public int runs() {
        return n() * (k() + 2);
    }

    /**
     * Point number p of the study in run order (block 0 = A, block 1 = B, block 2 + i = A_B^(i); row j inside a
     * block), so that member p of a sweep is this point.
     */
    public double[] point(int p) {
        int n = n();
        int block = p / n;
        int j = p % n;
        if (block == 0) {
            return a(j);
        }
        if (block == 1) {
            return b(j);
        }
        return ab(block - 2, j);
    }
}
