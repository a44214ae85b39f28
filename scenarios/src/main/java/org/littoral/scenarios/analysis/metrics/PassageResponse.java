package org.littoral.scenarios.analysis.metrics;

import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.analysis.detect.Passage;

/**
 * Response of one layer-mean variable to one passage.
 *
 * @param preMean            mean over profiles in [t - pre, t)
 * @param postMean           mean over profiles in (t, t + post]
 * @param change             postMean - preMean
 * @param tendencyPerHour    mean of the centred time derivative (uneven spacing) over the post-window profiles, per hour
 * @param referenceValue     the anomaly reference (pre-passage mean or daily mean)
 * @param anomaly            postMean - referenceValue
 * @param changeStandardised change standardised over all passages with the same layer and variable
 */
public record PassageResponse(Passage passage, Layer layer, Variable variable, int nPre, int nPost, double preMean,
                              double postMean, double change, double tendencyPerHour, double referenceValue, double anomaly,
                              double changeStandardised) {

    PassageResponse withStandardised(double z) {
        return new PassageResponse(passage, layer, variable, nPre, nPost, preMean, postMean, change, tendencyPerHour,
                referenceValue, anomaly, z);
    }
}
