package org.littoral.scenarios.timing;

/** Inputs of a timing check: plain data holders. Times are local clock hours. */
public final class TimingInputs {
    private TimingInputs() {
    }

    /**
     * One observed passage (from {@code littoral observe} or a user table).
     *
     * @param label which front it is ("sea_breeze", "bay_breeze", ...): only passages with the same label are
     *     compared between sites and with an envelope
     */
    public record ObservedPassage(String day, String site, double inlandDistanceM, String label, double timeHours,
                                  double uncertaintyHours) {
        public ObservedPassage {
            if (!(uncertaintyHours >= 0)) {
                throw new IllegalArgumentException("passage " + day + "/" + site + ": uncertainty must be >= 0 h; got "
                        + uncertaintyHours);
            }
        }
    }

    /**
     * The day's conditions that set the plausible front speed.
     *
     * @param crossShoreWindMPerS ambient cross-shore wind above the breeze, onshore positive
     * @param thetaVContrastK land-minus-sea (or pre-minus-post-front) theta-v contrast, K
     * @param thetaVK reference theta-v, K
     * @param breezeDepthM depth of the breeze (current) layer, m
     * @param totalDepthM depth of the layer the current runs under (mixed-layer depth); infinite for the deep limit
     * @param earliestOnsetHours earliest plausible breeze onset at the coast (NaN if unknown)
     */
    public record DayConditions(String day, double crossShoreWindMPerS, double thetaVContrastK, double contrastUncertaintyK,
                                double thetaVK, double breezeDepthM, double depthUncertaintyM, double totalDepthM,
                                double earliestOnsetHours) {
    }

    /** Model arrival times at one site for one label from an ensemble (NaN: that member's front never arrived). */
    public record ArrivalEnvelope(String site, String label, double[] arrivalHours) {
    }

    /** Settings with documented defaults (docs/timing-checks.md). */
    public static final class Settings {
        /** Envelope percentiles outside which an observed time is flagged (our choice: central 90 %). */
        public double envelopeLowPercentile = 5.0;
        public double envelopeHighPercentile = 95.0;
        /** Lowest fraction of the laboratory density-current speed still plausible (friction and mixing). */
        public double retardationMin = 0.4;
        /**
         * Whether the envelope is evidence for a flag. False for a linear-model envelope: linear theory has no front, so
         * its times (onset of onshore flow) are shown beside the observations but never flag a passage on their own.
         */
        public boolean envelopeFlags = true;
    }
}
