package org.littoral.scenarios.sensitivity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Which ambient wind direction, speed and land heating would explain observed passage times: an inverse fit through a
 * cheap surrogate of the model's arrivals.
 *
 * <p><b>Surrogate.</b> Per site, a quadratic response surface (Box and Draper 1987) of the model's arrival time in the
 * ambient wind's vector components (speed x sine and cosine of the direction, so the direction wraps smoothly and is
 * undefined at calm as it should be) and the heating: 10 coefficients, fitted by least squares to the ensemble members
 * whose front reaches the site (a linear surface, 4 coefficients, when fewer than 15 members arrive; none below 6). Its
 * error is the leave-one-out cross-validated RMS, from the PRESS residuals e_i / (1 - h_ii) of the linear least-squares
 * fit (Stone 1974); the other uncertain inputs of the ensemble (stratification, SST, mixed-layer depth) are not in the
 * surface, so their effect is part of that error.
 *
 * <p><b>Fit.</b> Weighted least squares with Commons Math's Levenberg-Marquardt optimizer (Levenberg 1944; Marquardt
 * 1963): residuals (t_obs - t_surrogate) / sqrt(sigma_obs^2 + sigma_cv^2) at each observed site, plus one residual per
 * parameter (p - prior mean) / prior sd from the day file's ensemble distribution, a Gaussian prior that keeps the
 * problem well posed when there are fewer sites than parameters. Parameters are bounded by the range the ensemble
 * covered (the surrogate does not extrapolate); the direction wraps. Covariance (J^T J)^-1 of the weighted residuals at
 * the optimum (Tarantola 2005, section 3.2), which carries the timing and surrogate errors and the prior.
 *
 * <p><b>Ill-posedness.</b> From the data part alone, in units of the prior sd: the eigenvalues of J_d^T J_d. An
 * eigenvalue below 1 is a direction in which the timings say less than the prior (a flat direction: the fit there is
 * the prior's); the condition number is the ratio of the largest to the smallest; parameters at a bound of the
 * ensemble's range are named.
 */
public final class ConditionsFit {
    /** Fewest arrived members for a quadratic surface (1.5 x its 10 coefficients) and for a linear one. */
    static final int QUADRATIC_MIN = 15;
    static final int LINEAR_MIN = 6;

    /** Which fitted quantity: its reader name, unit, prior and range. */
    public record Parameter(String name, String keyPath, String unit, boolean direction, double priorMean, double priorSd,
                            double min, double max) {
    }

    /** One ensemble member: its values of the three conditions and its arrival at each site (NaN: none). */
    public record Sample(double fromDeg, double speedMPerS, double heating, double[] arrivalH) {
    }

    /** The surrogate of one site. */
    public record SiteSurrogate(String site, int members, String form, double cvRmsH, double[] coefficients) {
    }

    /** The observed passage at a site (local clock h) and its uncertainty (h, one sd). */
    public record Observation(String site, double timeH, double sigmaH) {
    }

    /**
     * @param estimate fitted value per parameter (in fitted order)
     * @param sd one-sd uncertainty per parameter
     * @param atBound per parameter: "" or which bound of the ensemble's range the fit sits at
     * @param dataEigen eigenvalues of the data-only normal matrix in prior-sd units, descending
     * @param flatDirections sentences naming the directions the timings do not constrain
     * @param condition condition number of the data-only normal matrix (infinite when a direction is wholly flat)
     * @param fittedH surrogate arrival at each observed site at the estimate
     * @param chiSquare sum of squared data residuals at the estimate
     * @param note empty, or why no fit was made
     */
    public record Fit(List<Parameter> parameters, double[] estimate, double[] sd, String[] atBound, double[] dataEigen,
                      List<String> flatDirections, double condition, List<Observation> used, double[] fittedH, double chiSquare,
                      List<SiteSurrogate> surrogates, String note) {
        public boolean done() {
            return note.isEmpty();
        }
    }

    private final List<Parameter> params;
    private final double[] fixedValues;
    private final int[] which; // 0 = direction, 1 = speed, 2 = heating for each fitted parameter
    private final List<String> sites;
    private final List<SiteSurrogate> surrogates;
    private final double[] featureMean = new double[3];
    private final double[] featureSd = new double[3];

    /**
     * @param params the fitted conditions, a subset of direction, speed and heating, each with its prior and range
     * @param which per fitted parameter: 0 direction, 1 speed, 2 heating
     * @param fixed the values of direction, speed and heating used when not fitted
     * @param sites site names, in the order of {@link Sample#arrivalH()}
     */
    public ConditionsFit(List<Parameter> params, int[] which, double[] fixed, List<String> sites, List<Sample> ensemble) {
        if (params.size() != which.length || params.isEmpty()) {
            throw new IllegalArgumentException("one 'which' per fitted parameter, at least one");
        }
        this.params = List.copyOf(params);
        this.which = which.clone();
        this.fixedValues = fixed.clone();
        this.sites = List.copyOf(sites);
        double[][] f = new double[ensemble.size()][];
        for (int j = 0; j < f.length; j++) {
            Sample s = ensemble.get(j);
            f[j] = rawFeatures(s.fromDeg(), s.speedMPerS(), s.heating());
        }
        for (int c = 0; c < 3; c++) {
            double m = 0;
            for (double[] r : f) {
                m += r[c];
            }
            m /= Math.max(1, f.length);
            double v = 0;
            for (double[] r : f) {
                v += (r[c] - m) * (r[c] - m);
            }
            featureMean[c] = m;
            double sd = Math.sqrt(v / Math.max(1, f.length - 1));
            featureSd[c] = sd > 1e-12 ? sd : 1;
        }
        List<SiteSurrogate> sur = new ArrayList<>();
        for (int s = 0; s < sites.size(); s++) {
            List<double[]> x = new ArrayList<>();
            List<Double> y = new ArrayList<>();
            for (int j = 0; j < f.length; j++) {
                double t = ensemble.get(j).arrivalH()[s];
                if (Double.isFinite(t)) {
                    x.add(f[j]);
                    y.add(t);
                }
            }
            sur.add(surrogate(sites.get(s), x, y));
        }
        this.surrogates = List.copyOf(sur);
    }

    public List<SiteSurrogate> surrogates() {
        return surrogates;
    }

    /** Wind vector components (speed x sin, speed x cos of the direction) and the heating. */
    private static double[] rawFeatures(double fromDeg, double speed, double heating) {
        double r = Math.toRadians(fromDeg);
        return new double[] {speed * Math.sin(r), speed * Math.cos(r), heating};
    }

    private double[] terms(double[] raw, boolean quadratic) {
        double e = (raw[0] - featureMean[0]) / featureSd[0];
        double n = (raw[1] - featureMean[1]) / featureSd[1];
        double q = (raw[2] - featureMean[2]) / featureSd[2];
        return quadratic ? new double[] {1, e, n, q, e * e, n * n, q * q, e * n, e * q, n * q} : new double[] {1, e, n, q};
    }

    private SiteSurrogate surrogate(String site, List<double[]> x, List<Double> y) {
        int m = y.size();
        boolean quad = m >= QUADRATIC_MIN;
        if (m < LINEAR_MIN) {
            return new SiteSurrogate(site, m, "none (" + m + " members arrive; at least " + LINEAR_MIN + " needed)", Double.NaN, null);
        }
        int p = quad ? 10 : 4;
        double[][] a = new double[m][];
        double[] b = new double[m];
        for (int j = 0; j < m; j++) {
            a[j] = terms(x.get(j), quad);
            b[j] = y.get(j);
        }
        RealMatrix am = new Array2DRowRealMatrix(a, false);
        QRDecomposition qr = new QRDecomposition(am, 1e-10);
        if (!qr.getSolver().isNonSingular()) {
            return new SiteSurrogate(site, m, "none (the members' conditions do not span the surface)", Double.NaN, null);
        }
        double[] coef = qr.getSolver().solve(new ArrayRealVector(b, false)).toArray();
        // hat matrix diagonal h_ii = |Q_1 row i|^2 for the thin Q of A (Stone 1974: PRESS residual e_i / (1 - h_ii))
        RealMatrix q = qr.getQ();
        double press = 0;
        for (int j = 0; j < m; j++) {
            double h = 0;
            for (int c = 0; c < p; c++) {
                h += q.getEntry(j, c) * q.getEntry(j, c);
            }
            double fit = 0;
            for (int c = 0; c < p; c++) {
                fit += a[j][c] * coef[c];
            }
            double e = (b[j] - fit) / Math.max(1e-9, 1 - h);
            press += e * e;
        }
        return new SiteSurrogate(site, m, quad ? "quadratic (10 terms)" : "linear (4 terms)", Math.sqrt(press / m), coef);
    }

    /** The surrogate arrival at site s for the three conditions (NaN when the site has no surrogate). */
    public double predict(int s, double fromDeg, double speed, double heating) {
        SiteSurrogate sur = surrogates.get(s);
        if (sur.coefficients() == null) {
            return Double.NaN;
        }
        double[] t = terms(rawFeatures(fromDeg, speed, heating), sur.coefficients().length == 10);
        double v = 0;
        for (int c = 0; c < t.length; c++) {
            v += t[c] * sur.coefficients()[c];
        }
        return v;
    }

    private double[] conditions(double[] p) {
        double[] c = fixedValues.clone();
        for (int i = 0; i < p.length; i++) {
            c[which[i]] = p[i];
        }
        return c;
    }

    /** Fits the conditions to the observed passages (sites without a surrogate or observation are left out). */
    public Fit fit(List<Observation> observed) {
        List<Integer> idx = new ArrayList<>();
        List<Observation> used = new ArrayList<>();
        for (Observation o : observed) {
            int s = sites.indexOf(o.site());
            if (s >= 0 && surrogates.get(s).coefficients() != null && Double.isFinite(o.timeH())) {
                idx.add(s);
                used.add(o);
            }
        }
        int k = params.size();
        if (used.isEmpty()) {
            return new Fit(params, null, null, null, null, List.of(), Double.NaN, used, null, Double.NaN, surrogates,
                    "no observed site has a surrogate (too few ensemble members reach the observed sites)");
        }
        int nd = used.size();
        double[] sig = new double[nd];
        for (int d = 0; d < nd; d++) {
            double cv = surrogates.get(idx.get(d)).cvRmsH();
            sig[d] = Math.sqrt(used.get(d).sigmaH() * used.get(d).sigmaH() + cv * cv);
        }
        // work in z = (p - prior mean) / prior sd
        MultivariateJacobianFunction model = z -> {
            double[] r = residuals(z.toArray(), idx, used, sig);
            double[][] jac = new double[r.length][k];
            for (int i = 0; i < k; i++) {
                double[] zp = z.toArray();
                double h = 1e-5;
                zp[i] += h;
                double[] rp = residuals(zp, idx, used, sig);
                for (int row = 0; row < r.length; row++) {
                    jac[row][i] = (rp[row] - r[row]) / h;
                }
            }
            return new Pair<>(new ArrayRealVector(r, false), new Array2DRowRealMatrix(jac, false));
        };
        double[] lo = new double[k];
        double[] hi = new double[k];
        for (int i = 0; i < k; i++) {
            Parameter p = params.get(i);
            lo[i] = p.direction() ? Double.NEGATIVE_INFINITY : (p.min() - p.priorMean()) / p.priorSd();
            hi[i] = p.direction() ? Double.POSITIVE_INFINITY : (p.max() - p.priorMean()) / p.priorSd();
        }
        // residuals are "model minus target" in Commons Math; ours already hold the whole weighted misfit, target 0
        LeastSquaresProblem problem = new LeastSquaresBuilder().start(new double[k]).model(model)
                .target(new double[nd + k]).maxEvaluations(2000).maxIterations(500).lazyEvaluation(false)
                .parameterValidator(z -> {
                    double[] v = z.toArray();
                    for (int i = 0; i < k; i++) {
                        v[i] = Math.min(hi[i], Math.max(lo[i], v[i]));
                    }
                    return new ArrayRealVector(v, false);
                }).build();
        LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer().optimize(problem);
        double[] z = opt.getPoint().toArray();
        RealMatrix jac = opt.getJacobian();
        RealMatrix cov = new LUDecomposition(jac.transpose().multiply(jac)).getSolver().getInverse();
        double[] est = new double[k];
        double[] sd = new double[k];
        String[] bound = new String[k];
        for (int i = 0; i < k; i++) {
            Parameter p = params.get(i);
            double v = p.priorMean() + p.priorSd() * z[i];
            est[i] = p.direction() ? ((v % 360) + 360) % 360 : v;
            sd[i] = p.priorSd() * Math.sqrt(Math.max(0, cov.getEntry(i, i)));
            double tol = 1e-3;
            bound[i] = !p.direction() && z[i] <= lo[i] + tol ? "at the lowest value the ensemble covered (" + fmt(p.min()) + " "
                    + p.unit() + ")" : !p.direction() && z[i] >= hi[i] - tol ? "at the highest value the ensemble covered ("
                    + fmt(p.max()) + " " + p.unit() + ")" : "";
        }
        // data part alone: rows 0..nd-1 of the Jacobian (in prior-sd units)
        RealMatrix jd = jac.getSubMatrix(0, nd - 1, 0, k - 1);
        EigenDecomposition eig = new EigenDecomposition(jd.transpose().multiply(jd));
        double[] ev = eig.getRealEigenvalues().clone();
        Integer[] order = new Integer[k];
        for (int i = 0; i < k; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(ev[b], ev[a]));
        double[] sorted = new double[k];
        List<String> flat = new ArrayList<>();
        for (int r = 0; r < k; r++) {
            int i = order[r];
            sorted[r] = Math.max(0, ev[i]);
            if (ev[i] < 1) {
                RealVector v = eig.getEigenvector(i);
                flat.add(String.format(Locale.ROOT, "%s: the timings constrain it %s the prior (eigenvalue %.2g)", combination(v),
                        ev[i] < 0.1 ? "far less than" : "less than", Math.max(0, ev[i])));
            }
        }
        double cond = sorted[k - 1] > 1e-12 * Math.max(1, sorted[0]) ? sorted[0] / sorted[k - 1] : Double.POSITIVE_INFINITY;
        double[] fitted = new double[nd];
        double chi = 0;
        double[] c = conditions(est);
        for (int d = 0; d < nd; d++) {
            fitted[d] = predict(idx.get(d), c[0], c[1], c[2]);
            double r = (used.get(d).timeH() - fitted[d]) / sig[d];
            chi += r * r;
        }
        return new Fit(params, est, sd, bound, sorted, flat, cond, used, fitted, chi, surrogates, "");
    }

    private double[] residuals(double[] z, List<Integer> idx, List<Observation> used, double[] sig) {
        int k = params.size();
        double[] p = new double[k];
        for (int i = 0; i < k; i++) {
            p[i] = params.get(i).priorMean() + params.get(i).priorSd() * z[i];
        }
        double[] c = conditions(p);
        double[] r = new double[used.size() + k];
        for (int d = 0; d < used.size(); d++) {
            r[d] = (predict(idx.get(d), c[0], c[1], c[2]) - used.get(d).timeH()) / sig[d];
        }
        System.arraycopy(z, 0, r, used.size(), k);
        return r;
    }

    /** "mostly ambient speed, against heating" from an eigenvector in prior-sd units. */
    private String combination(RealVector v) {
        List<String> parts = new ArrayList<>();
        int lead = v.getMaxIndex() >= 0 && Math.abs(v.getMaxValue()) >= Math.abs(v.getMinValue()) ? v.getMaxIndex() : v.getMinIndex();
        double sign = Math.signum(v.getEntry(lead));
        for (int i = 0; i < v.getDimension(); i++) {
            double w = v.getEntry(i) * sign;
            if (Math.abs(w) >= 0.3) {
                parts.add((w > 0 ? "+" : "-") + params.get(i).name());
            }
        }
        return parts.size() == 1 ? params.get(lead).name() + " alone" : "the combination " + String.join(" ", parts)
                + " (in units of each prior sd)";
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, Math.abs(v) >= 100 ? "%.0f" : Math.abs(v) >= 1 ? "%.2f" : "%.3g", v);
    }
}
