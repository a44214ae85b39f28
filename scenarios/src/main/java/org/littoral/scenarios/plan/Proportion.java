package org.littoral.scenarios.plan;

/**
 * An estimated probability from k successes in n ensemble members, with the Wilson score interval
 * (Wilson 1927, J. Am. Stat. Assoc. 22, 209-212), which behaves well near 0 and 1 and for small n.
 *
 * @param successes k
 * @param trials n
 * @param lower lower bound of the 95 % interval
 * @param upper upper bound of the 95 % interval
 */
public record Proportion(int successes, int trials, double lower, double upper) {
    public static Proportion of(int successes, int trials) {
        if (trials <= 0) {
            return new Proportion(0, 0, 0.0, 1.0);
        }
        // Commons Math's implementation of the Wilson score interval, 95 %.
        org.apache.commons.math3.stat.interval.ConfidenceInterval ci =
                new org.apache.commons.math3.stat.interval.WilsonScoreInterval().createInterval(trials, successes, 0.95);
        return new Proportion(successes, trials, Math.max(0.0, ci.getLowerBound()), Math.min(1.0, ci.getUpperBound()));
    }

    public double estimate() {
        return trials == 0 ? Double.NaN : (double) successes / trials;
    }
}
