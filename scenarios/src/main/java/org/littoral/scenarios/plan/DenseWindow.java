package org.littoral.scenarios.plan;

import java.util.Arrays;

/**
 * The window in which to fly the dense cadence at a site: from the ensemble's arrival-time distribution
 * at that distance, the 10th to 90th percentile widened by a margin on each side (one base interval by
 * default, so the profiles just before and after the passage are dense too), clipped to operating hours.
 */
public record DenseWindow(double startClockH, double endClockH, double arrivalFraction) {

    /**
     * @param arrivalsClockH arrival times from the ensemble (NaN = no arrival in that member)
     * @param marginH widening on each side
     */
    public static DenseWindow fromArrivals(double[] arrivalsClockH, double marginH, double operatingStartH,
                                           double operatingEndH) {
        double[] a = Arrays.stream(arrivalsClockH).filter(v -> !Double.isNaN(v)).sorted().toArray();
        if (a.length == 0) {
            return new DenseWindow(Double.NaN, Double.NaN, 0.0);
        }
        double p10 = percentile(a, 10);
        double p90 = percentile(a, 90);
        double start = Math.max(operatingStartH, p10 - marginH);
        double end = Math.min(operatingEndH, p90 + marginH);
        return new DenseWindow(start, Math.max(start, end), (double) a.length / arrivalsClockH.length);
    }

    public boolean exists() {
        return !Double.isNaN(startClockH);
    }

    /**
     * Percentile by linear interpolation between closest ranks (Hyndman &amp; Fan 1996, Am. Stat. 50,
     * definition 7, the default of most statistics packages), via Commons Math.
     */
    public static double percentile(double[] sorted, double pct) {
        return new org.apache.commons.math3.stat.descriptive.rank.Percentile()
                .withEstimationType(org.apache.commons.math3.stat.descriptive.rank.Percentile.EstimationType.R_7)
                .evaluate(sorted, Math.max(1e-9, pct));
    }
}
