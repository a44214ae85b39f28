package org.littoral.scenarios.analysis.stats;

/**
 * One comparison between two groups of a metric.
 *
 * @param metric     e.g. "change theta_K 10-100m"
 * @param difference meanA - meanB
 * @param test       Z_TEST, WELCH_T or MANN_WHITNEY
 * @param why        the diagnostics behind the choice
 * @param pHolm      Holm (1979) adjusted p over all rows of the table
 */
public record ComparisonRow(String metric, String attribute, String groupA, String groupB, int nA, int nB, double meanA,
                            double meanB, double difference, Test test, double statistic, double degreesOfFreedom,
                            double pValue, double pHolm, NormalityDiagnostics diagnosticsA,
                            NormalityDiagnostics diagnosticsB, String why) {

    public enum Test { Z_TEST, WELCH_T, MANN_WHITNEY }

    ComparisonRow withHolm(double p) {
        return new ComparisonRow(metric, attribute, groupA, groupB, nA, nB, meanA, meanB, difference, test, statistic,
                degreesOfFreedom, pValue, p, diagnosticsA, diagnosticsB, why);
    }
}
