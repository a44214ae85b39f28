package org.littoral.validation.sensitivity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.sensitivity.ReferenceFunctions;
import org.littoral.scenarios.sensitivity.SampleDesign;
import org.littoral.scenarios.sensitivity.SobolIndices;
import org.littoral.scenarios.validate.ValidationCase;

/**
 * The Sobol' index estimators of {@code littoral influence} (Saltelli et al. 2010 for S_i, Jansen 1999 for S_Ti) on
 * test functions with closed-form indices: the Ishigami function (Ishigami and Homma 1990; analytic indices from the
 * variance decomposition in Sobol' and Levitan 1999 and Saltelli et al. 2008, computed here, not pasted) and the
 * Sobol' g-function (Saltelli and Sobol' 1995).
 *
 * <p>Tolerance from the sample size: each study uses N = 2^13 rows of a Sobol' sequence (N (k + 2) evaluations); the
 * tolerance of every index is three bootstrap standard errors of that same study (500 resamples over rows, Archer,
 * Saltelli and Sobol' 1997), at least 0.005. The bootstrap treats the rows as random, so for the low-discrepancy
 * rows it overstates the error (quasi-Monte Carlo converges faster than N^-1/2): the tolerance is conservative. At
 * this N it is about 0.02-0.05 for the Ishigami indices and 0.01-0.07 for the g-function's important inputs.
 */
public final class SensitivityIndicesSuite implements org.littoral.scenarios.validate.ValidationSuite {
    private static final String ISHIGAMI = "Ishigami & Homma (1990), a = 7, b = 0.1; analytic indices: Sobol' & Levitan (1999), "
            + "Saltelli et al. (2008) section 4.1";
    private static final String GFUN = "Saltelli & Sobol' (1995), g-function, a = (0, 1, 4.5, 9, 99, 99, 99, 99); analytic "
            + "indices: Saltelli et al. (2008) section 3.6";
    private static final int N = 8192;

    @Override
    public String title() {
        return "Variance-based sensitivity indices (littoral influence)";
    }

    @Override
    public int order() {
        return 85;
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        SampleDesign d3 = SampleDesign.of(SampleDesign.Points.SOBOL, N, 3, 0);
        SobolIndices.Result ish = ReferenceFunctions.study(u -> ReferenceFunctions.ishigami(u, 7, 0.1), d3, 500, 20261205L);
        ReferenceFunctions.Analytic ia = ReferenceFunctions.ishigamiIndices(7, 0.1);
        for (int i = 0; i < 3; i++) {
            SobolIndices.Index x = ish.indices()[i];
            out.add(indexCase("sensitivity.ishigami-S" + (i + 1), ISHIGAMI, "first-order index S" + (i + 1)
                    + " (Saltelli et al. 2010 estimator)", ia.first()[i], x.first(), x.firstSe()));
            out.add(indexCase("sensitivity.ishigami-ST" + (i + 1), ISHIGAMI, "total index S_T" + (i + 1)
                    + " (Jansen 1999 estimator)", ia.total()[i], x.total(), x.totalSe()));
        }
        double[] a = {0, 1, 4.5, 9, 99, 99, 99, 99};
        SampleDesign d8 = SampleDesign.of(SampleDesign.Points.SOBOL, N, a.length, 0);
        SobolIndices.Result g = ReferenceFunctions.study(u -> ReferenceFunctions.gFunction(u, a), d8, 500, 20261206L);
        ReferenceFunctions.Analytic ga = ReferenceFunctions.gFunctionIndices(a);
        for (int i = 0; i < 4; i++) {
            SobolIndices.Index x = g.indices()[i];
            out.add(indexCase("sensitivity.gfunction-S" + (i + 1), GFUN, "first-order index S" + (i + 1) + " (a = " + a[i] + ")",
                    ga.first()[i], x.first(), x.firstSe()));
            out.add(indexCase("sensitivity.gfunction-ST" + (i + 1), GFUN, "total index S_T" + (i + 1) + " (a = " + a[i] + ")",
                    ga.total()[i], x.total(), x.totalSe()));
        }
        double sumUnimportant = 0;
        double sumExpected = 0;
        for (int i = 4; i < a.length; i++) {
            sumUnimportant += g.indices()[i].total();
            sumExpected += ga.total()[i];
        }
        out.add(ValidationCase.absolute("sensitivity.gfunction-unimportant", GFUN, "sum of S_T5..S_T8 (a = 99: nearly inert inputs)",
                sumExpected, 0.005, sumUnimportant, false, "four inputs with a = 99 must come out inert; tolerance 0.005 "
                        + "(their analytic total indices are about 1e-4 each)"));
        return out;
    }

    private static ValidationCase indexCase(String id, String source, String quantity, double expected, double got, double se) {
        double tol = Math.max(0.005, 3 * se);
        return ValidationCase.absolute(id, source, quantity, expected, tol, got, false, String.format(Locale.ROOT,
                "N = %d Sobol'-sequence rows; tolerance = 3 bootstrap standard errors (%.4f) of this study, at least 0.005",
                N, se));
    }
}
