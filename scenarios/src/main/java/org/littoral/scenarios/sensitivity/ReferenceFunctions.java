package org.littoral.scenarios.sensitivity;

/**
 * Test functions of sensitivity analysis whose Sobol' indices are known in closed form: the checks of the
 * estimators in {@link SobolIndices} (unit tests and {@code littoral validate}). Inputs are points of the unit
 * hypercube, mapped to each function's own input distribution here.
 */
public final class ReferenceFunctions {
    private ReferenceFunctions() {
    }

    /** Closed-form first-order and total indices of a test function. */
    public record Analytic(double[] first, double[] total) {
    }

    /**
     * Ishigami and Homma (1990), Proc. ISUMA '90, 398-403: f = sin x1 + a sin^2 x2 + b x3^4 sin x1, x_i uniform on
     * [-pi, pi]. Usual constants a = 7, b = 0.1 (Saltelli et al. 2008, Global Sensitivity Analysis: The Primer, Wiley).
     */
    public static double ishigami(double[] u, double a, double b) {
        double x1 = -Math.PI + 2 * Math.PI * u[0];
        double x2 = -Math.PI + 2 * Math.PI * u[1];
        double x3 = -Math.PI + 2 * Math.PI * u[2];
        double s2 = Math.sin(x2);
        double x34 = x3 * x3 * x3 * x3;
        return Math.sin(x1) + a * s2 * s2 + b * x34 * Math.sin(x1);
    }

    /**
     * The Ishigami function's indices from its variance decomposition (Sobol' and Levitan 1999, Comput. Phys. Commun.
     * 117, 52-61; Saltelli et al. 2008, section 4.1): V = a^2/8 + b pi^4/5 + b^2 pi^8/18 + 1/2,
     * V1 = 1/2 (1 + b pi^4/5)^2, V2 = a^2/8, V3 = 0, V13 = b^2 pi^8 (1/18 - 1/50); S_T1 = (V1 + V13)/V,
     * S_T2 = V2/V, S_T3 = V13/V.
     */
    public static Analytic ishigamiIndices(double a, double b) {
        double p4 = Math.pow(Math.PI, 4);
        double p8 = p4 * p4;
        double v = a * a / 8 + b * p4 / 5 + b * b * p8 / 18 + 0.5;
        double v1 = 0.5 * (1 + b * p4 / 5) * (1 + b * p4 / 5);
        double v2 = a * a / 8;
        double v13 = b * b * p8 * (1.0 / 18 - 1.0 / 50);
        return new Analytic(new double[] {v1 / v, v2 / v, 0}, new double[] {(v1 + v13) / v, v2 / v, v13 / v});
    }

    /**
     * Sobol' g-function (Saltelli and Sobol' 1995, Reliab. Eng. Syst. Saf. 50, 225-239): g = prod_i (|4 x_i - 2| +
     * a_i) / (1 + a_i), x_i uniform on [0, 1]; small a_i makes input i important, large a_i unimportant.
     */
    public static double gFunction(double[] u, double[] a) {
        double g = 1;
        for (int i = 0; i < a.length; i++) {
            g *= (Math.abs(4 * u[i] - 2) + a[i]) / (1 + a[i]);
        }
        return g;
    }

    /**
     * The g-function's indices (Saltelli and Sobol' 1995; Saltelli et al. 2008, section 3.6): partial variances
     * V_i = 1 / (3 (1 + a_i)^2), V = prod (1 + V_i) - 1, S_i = V_i / V, S_Ti = V_i prod_{j != i} (1 + V_j) / V.
     */
    public static Analytic gFunctionIndices(double[] a) {
        int k = a.length;
        double[] vi = new double[k];
        double prod = 1;
        for (int i = 0; i < k; i++) {
            vi[i] = 1.0 / (3 * (1 + a[i]) * (1 + a[i]));
            prod *= 1 + vi[i];
        }
        double v = prod - 1;
        double[] s = new double[k];
        double[] t = new double[k];
        for (int i = 0; i < k; i++) {
            s[i] = vi[i] / v;
            t[i] = vi[i] * (prod / (1 + vi[i])) / v;
        }
        return new Analytic(s, t);
    }

    /**
     * Runs a study of a function of the unit hypercube (tests, validation): evaluates it on A, B and every A_B^(i)
     * and returns the indices with bootstrap intervals.
     */
    public static SobolIndices.Result study(java.util.function.ToDoubleFunction<double[]> f, SampleDesign d, int resamples,
                                            long seed) {
        int n = d.n();
        int k = d.k();
        double[] ya = new double[n];
        double[] yb = new double[n];
        double[][] yab = new double[k][n];
        for (int j = 0; j < n; j++) {
            ya[j] = f.applyAsDouble(d.a(j));
            yb[j] = f.applyAsDouble(d.b(j));
            for (int i = 0; i < k; i++) {
                yab[i][j] = f.applyAsDouble(d.ab(i, j));
            }
        }
        return SobolIndices.estimate(ya, yb, yab, resamples, 0.95, seed);
    }
}
