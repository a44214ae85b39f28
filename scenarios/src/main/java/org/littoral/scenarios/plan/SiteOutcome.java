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

    /** Why a member's passage at a site was or was not captured (the first reason that applies, in this order). */
    public enum Result {
        /** The model's front (onset of onshore flow, linear model) does not reach the site during operating hours. */
        NO_FRONT,
        /** The chain finds no onshore passage in the site's soundings. */
        NOT_DETECTED,
        /** The chain's passage is further from the model's time than the timing tolerance. */
        OFF_TIME,
        /** Too few profiles before or after the detected passage inside operating hours. */
        TOO_FEW_PROFILES,
        CAPTURED
    }

    /** The outcome under the criteria: captured, or the first reason it is not. */
    public Result result(PlanCriteria c) {
        if (!frontArrives()) {
            return Result.NO_FRONT;
        }
        if (Double.isNaN(detectedClockH)) {
            return Result.NOT_DETECTED;
        }
        if (Math.abs(detectedClockH - truthClockH) > c.timingToleranceH()) {
            return Result.OFF_TIME;
        }
        if (profilesBefore < c.minProfilesBefore() || profilesAfter < c.minProfilesAfter()) {
            return Result.TOO_FEW_PROFILES;
        }
        return Result.CAPTURED;
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
