package org.littoral.scenarios.analysis.detect;

/**
 * A segment cost for change-point search: twice the negative log-likelihood of a segment with its
 * own parameters, super-additive under splitting (so PELT may prune with K = 0).
 */
public interface SegmentCost {
    /** Number of samples. */
    int length();

    /** Parameters that change at a change point (for the BIC/MBIC penalty). */
    int parametersPerChange();

    /** Cost of samples a..b-1. */
    double cost(int a, int b);
}
