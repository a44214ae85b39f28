package org.littoral.scenarios.analysis.detect;

/**
 * Normal mean-change segment cost for a p-dimensional series with unit noise variance in every
 * dimension (scale the data first): C(y_a..y_{b-1}) = Sum_d Sum_i (y_di - mean_d)^2.
 * This is twice the negative log-likelihood up to a constant (Killick, Fearnhead &amp; Eckley 2012,
 * JASA 107, 1590-1598, section 1; docs/references.md section 8). Computed in O(1) per segment from
 * prefix sums; splitting a segment never increases it, so PELT may prune with K = 0.
 *
 * <p>Allocates its prefix sums (2 p (n + 1) doubles) once in the constructor.
 */
public final class NormalMeanCost implements SegmentCost {
    private final int n;
    private final int dims;
    private final double[] s1;
    private final double[] s2;

    /** @param data data[d][i], d = dimension, i = time index; no NaN allowed (drop or fill missing samples first) */
    public NormalMeanCost(double[][] data) {
        if (data.length == 0) {
            throw new IllegalArgumentException("need at least one dimension");
        }
        this.dims = data.length;
        this.n = data[0].length;
        this.s1 = new double[dims * (n + 1)];
        this.s2 = new double[dims * (n + 1)];
        for (int d = 0; d < dims; d++) {
            double[] y = data[d];
            if (y.length != n) {
                throw new IllegalArgumentException("dimension " + d + " has " + y.length + " values, expected " + n);
            }
            int base = d * (n + 1);
            for (int i = 0; i < n; i++) {
                double v = y[i];
                if (Double.isNaN(v)) {
                    throw new IllegalArgumentException("NaN at index " + i + " of dimension " + d);
                }
                s1[base + i + 1] = s1[base + i] + v;
                s2[base + i + 1] = s2[base + i] + v * v;
            }
        }
    }

    @Override
    public int length() {
        return n;
    }

    public int dimensions() {
        return dims;
    }

    /** One mean per dimension. */
    @Override
    public int parametersPerChange() {
        return dims;
    }

    /** Cost of the segment of samples a..b-1 (0 &lt;= a &lt; b &lt;= n). */
    @Override
    public double cost(int a, int b) {
        int len = b - a;
        double c = 0.0;
        for (int d = 0; d < dims; d++) {
            int base = d * (n + 1);
            double sum = s1[base + b] - s1[base + a];
            double sq = s2[base + b] - s2[base + a];
            c += sq - sum * sum / len;
        }
        // Rounding can leave a tiny negative value for a constant segment.
        return c > 0.0 ? c : 0.0;
    }

    /** Mean of dimension d over samples a..b-1. */
    public double mean(int d, int a, int b) {
        int base = d * (n + 1);
        return (s1[base + b] - s1[base + a]) / (b - a);
    }
}
