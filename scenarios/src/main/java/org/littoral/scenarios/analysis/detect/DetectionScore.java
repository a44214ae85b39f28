package org.littoral.scenarios.analysis.detect;

import java.util.Arrays;

/**
 * Skill of a detector against known passage times (invented campaigns, model front arrivals): a
 * true passage is found when a detection lies within one local flight interval of it (the spacing
 * of the two flights around the true time, docs/references.md section 9: timing from profiles is good to
 * about one flight interval). Each detection matches at most one truth, closest first.
 */
public record DetectionScore(int truths, int detections, int hits, int falseDetections) {

    /** Fraction of true passages found (NaN without truths). */
    public double hitRate() {
        return truths == 0 ? Double.NaN : (double) hits / truths;
    }

    /** Fraction of detections that match no true passage (NaN without detections). */
    public double falseRate() {
        return detections == 0 ? Double.NaN : (double) falseDetections / detections;
    }

    public DetectionScore plus(DetectionScore o) {
        return new DetectionScore(truths + o.truths, detections + o.detections, hits + o.hits,
                falseDetections + o.falseDetections);
    }

    /**
     * Scores one site-day.
     *
     * @param flightHours profile times of the site-day, increasing
     */
    public static DetectionScore score(double[] trueHours, double[] detectedHours, double[] flightHours) {
        boolean[] used = new boolean[detectedHours.length];
        double[] truth = trueHours.clone();
        Arrays.sort(truth);
        int hits = 0;
        for (double t : truth) {
            double tol = localInterval(t, flightHours);
            int best = -1;
            double bestDt = Double.POSITIVE_INFINITY;
            for (int j = 0; j < detectedHours.length; j++) {
                double dt = Math.abs(detectedHours[j] - t);
                if (!used[j] && dt <= tol && dt < bestDt) {
                    best = j;
                    bestDt = dt;
                }
            }
            if (best >= 0) {
                used[best] = true;
                hits++;
            }
        }
        return new DetectionScore(truth.length, detectedHours.length, hits, detectedHours.length - hits);
    }

    /** Spacing of the flights around t (the nearest spacing at the ends of the day). */
    static double localInterval(double t, double[] f) {
        if (f.length < 2) {
            return Double.POSITIVE_INFINITY;
        }
        for (int i = 1; i < f.length; i++) {
            if (t <= f[i]) {
                return f[i] - f[i - 1];
            }
        }
        return f[f.length - 1] - f[f.length - 2];
    }
}
