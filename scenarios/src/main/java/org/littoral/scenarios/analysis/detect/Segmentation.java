package org.littoral.scenarios.analysis.detect;

/**
 * An optimal segmentation of a series of n samples.
 *
 * @param changeEnds the end (exclusive) of every segment but the last, increasing: a value c means
 *                   "a change after the c-th sample" (samples c-1 and c lie in different segments)
 * @param totalCost  Sum of segment costs + segment terms + penalty per change (the minimised quantity)
 */
public record Segmentation(int[] changeEnds, double totalCost) {

    public int changes() {
        return changeEnds.length;
    }
}
