package org.littoral.scenarios.sensitivity;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Variance-based sensitivity indices from the model outputs at the rows of A, B and A_B^(i) ({@link SampleDesign}):
 * <ul>
 * <li>first-order index S_i = V[E(Y|X_i)] / V(Y), with the estimator of Saltelli et al. (2010), Comput. Phys.
 *     Commun. 181, 259-270, Table 2 (b): V_i = (1/N) sum_j f(B)_j (f(A_B^(i))_j - f(A)_j);</li>
 * <li>total index S_Ti = E[V(Y|X_~i)] / V(Y), with the estimator of Jansen (1999), Comput. Phys. Commun. 117, 35-43
 *     (Saltelli et al. 2010, Table 2 (f)): V_Ti = (1/2N) sum_j (f(A)_j - f(A_B^(i))_j)^2;</li>
 * <li>V(Y) from f(A) and f(B) together (2N values, common practice); f(B) is centred on the mean of f(A) and f(B) in
 *     the first-order estimator, which leaves its expectation unchanged and keeps it stable when the output's mean is
 *     large against its spread;</li>
 * <li>confidence intervals by the bootstrap over rows j (Efron and Tibshirani 1993, percentile interval), the rows
 *     of A, B and A_B^(i) resampled together so that each resample is a valid design (Archer, Saltelli and Sobol'
 *     1997, J. Stat. Comput. Simul. 58, 99-120).</li>
 * </ul>
 * Rows holding a missing output (NaN) in any of the blocks are left out as a whole, so every index uses the same rows;
 * {@link Result#rowsUsed()} says how many remained.
 */
public final class SobolIndices {
    private SobolIndices() {
    }

    /**
     * Index of one input with its bootstrap interval.
     *
     * @param first first-order index S_i
     * @param firstLow lower end of its interval
     * @param firstHigh upper end
     * @param total total index S_Ti
     * @param totalLow lower end of its interval
     * @param totalHigh upper end
     * @param firstSe bootstrap standard error of S_i
     * @param totalSe bootstrap standard error of S_Ti
     */
    public record Index(double first, double firstLow, double firstHigh, double total, double totalLow, double totalHigh,
                        double firstSe, double totalSe) {
    }

    /**
     * @param indices one per input, in input order (NaN when the output has no variance or no rows remain)
     * @param variance V(Y)
     * @param mean E(Y)
     * @param rowsUsed rows of the design with every output present
     * @param level confidence level of the intervals (e.g. 0.95)
     * @param resamples bootstrap resamples
     */
    public record Result(Index[] indices, double variance, double mean, int rowsUsed, double level, int resamples) {
    }

    /**
     * @param yA f(A), N values
     * @param yB f(B), N values
     * @param yAB yAB[i] = f(A_B^(i)), N values each
     * @param resamples bootstrap resamples (0: no intervals, NaN ends)
     * @param level confidence level, in (0, 1)
     * @param seed seed of the bootstrap
     */
    public static Result estimate(double[] yA, double[] yB, double[][] yAB, int resamples, double level, long seed) {
        int n = yA.length;
        int k = yAB.length;
        if (yB.length != n) {
            throw new IllegalArgumentException("f(A) and f(B) differ in length: " + n + " and " + yB.length);
        }
        int[] rows = new int[n];
        int m = 0;
        for (int j = 0; j < n; j++) {
            boolean ok = Double.isFinite(yA[j]) && Double.isFinite(yB[j]);
            for (int i = 0; i < k && ok; i++) {
                if (yAB[i].length != n) {
                    throw new IllegalArgumentException("f(A_B) of input " + i + " has " + yAB[i].length + " values, not " + n);
                }
                ok = Double.isFinite(yAB[i][j]);
            }
            if (ok) {
                rows[m++] = j;
            }
        }
        rows = Arrays.copyOf(rows, m);
        double[] point = new double[2 * k + 2];
        compute(yA, yB, yAB, rows, point);
        Index[] out = new Index[k];
        if (resamples <= 0 || m < 2) {
            for (int i = 0; i < k; i++) {
                out[i] = new Index(point[i], Double.NaN, Double.NaN, point[k + i], Double.NaN, Double.NaN, Double.NaN, Double.NaN);
            }
            return new Result(out, point[2 * k], point[2 * k + 1], m, level, 0);
        }
        double[][] boot = new double[2 * k][resamples];
        SplittableRandom r = new SplittableRandom(seed);
        int[] pick = new int[m];
        double[] b = new double[2 * k + 2];
        for (int s = 0; s < resamples; s++) {
            for (int j = 0; j < m; j++) {
                pick[j] = rows[r.nextInt(m)];
            }
            compute(yA, yB, yAB, pick, b);
            for (int i = 0; i < 2 * k; i++) {
                boot[i][s] = b[i];
            }
        }
        double lo = 0.5 * (1 - level);
        for (int i = 0; i < k; i++) {
            double[] f = finite(boot[i]);
            double[] t = finite(boot[k + i]);
            out[i] = new Index(point[i], quantile(f, lo), quantile(f, 1 - lo), point[k + i], quantile(t, lo),
                    quantile(t, 1 - lo), sd(f), sd(t));
        }
        return new Result(out, point[2 * k], point[2 * k + 1], m, level, resamples);
    }

    /** Fills out[0..k) with S_i, out[k..2k) with S_Ti, out[2k] with V(Y), out[2k+1] with the mean, over the given rows. */
    private static void compute(double[] yA, double[] yB, double[][] yAB, int[] rows, double[] out) {
        int k = yAB.length;
        int m = rows.length;
        if (m == 0) {
            Arrays.fill(out, Double.NaN);
            return;
        }
        double sum = 0;
        for (int j : rows) {
            sum += yA[j] + yB[j];
        }
        double mean = sum / (2.0 * m);
        double ss = 0;
        for (int j : rows) {
            double da = yA[j] - mean;
            double db = yB[j] - mean;
            ss += da * da + db * db;
        }
        double v = m > 1 ? ss / (2.0 * m - 1) : Double.NaN;
        for (int i = 0; i < k; i++) {
            double vi = 0;
            double vt = 0;
            double[] ab = yAB[i];
            for (int j : rows) {
                // Saltelli et al. (2010), Table 2 (b), with f(B) centred on the sample mean: the same expectation (the
                // mean times E[f(A_B) - f(A)] = 0) but a far smaller variance when the output's mean is large against its
                // spread, as for arrival times of about 10 h that vary by half an hour (common practice)
                vi += (yB[j] - mean) * (ab[j] - yA[j]);
                double d = yA[j] - ab[j];
                vt += d * d; // Jansen (1999); Saltelli et al. (2010), Table 2 (f)
            }
            out[i] = v > 0 ? vi / m / v : Double.NaN;
            out[k + i] = v > 0 ? vt / (2.0 * m) / v : Double.NaN;
        }
        out[2 * k] = v;
        out[2 * k + 1] = mean;
    }

    private static double[] finite(double[] a) {
        return Arrays.stream(a).filter(Double::isFinite).sorted().toArray();
    }

    /** Quantile of sorted values, linear between order statistics (Hyndman and Fan 1996, type 7). */
    static double quantile(double[] sorted, double p) {
        if (sorted.length == 0) {
            return Double.NaN;
        }
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, sorted.length - 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }

    private static double sd(double[] a) {
        if (a.length < 2) {
            return Double.NaN;
        }
        double m = 0;
        for (double x : a) {
            m += x;
        }
        m /= a.length;
        double s = 0;
        for (double x : a) {
            s += (x - m) * (x - m);
        }
        return Math.sqrt(s / (a.length - 1));
    }
}
