package org.littoral.scenarios.plan;

/**
 * What one ensemble member gives at one candidate site for one cadence: the model's own front arrival
 * (the truth for scoring) and what the analysis chain detected in the synthetic soundings.
 *
 * @param truthClockH model front arrival, local clock hours (NaN when the front never arrives)
 * @param detectedClockH passage time the analysis chain detected (NaN when none was detected)
 * @param profilesBefore profiles flown inside operating hours before the detected passage
 * @param profilesAfter profiles flown inside operating hours after the detected passage
 * @param separatedBayAndSea true when two onshore passages were detected that match the bay-breeze and
 *                           sea-breeze arrivals (only meaningful where the coast has a bay)
 */
public record SiteOutcome(double truthClockH, double detectedClockH, int profilesBefore, int profilesAfter,
                          boolean separatedBayAndSea) {

    public boolean frontArrives() {
        return !Double.isNaN(truthClockH);
    }

    /**
     * The passage counts as captured when the front arrives, a passage is detected within the timing
     * tolerance of the truth, and enough profiles were flown on each side of it.
     */
    public boolean captured(PlanCriteria c) {
        return frontArrives() && !Double.isNaN(detectedClockH)
                && Math.abs(detectedClockH - truthClockH) <= c.timingToleranceH()
                && profilesBefore >= c.minProfilesBefore() && profilesAfter >= c.minProfilesAfter();
    }
}
