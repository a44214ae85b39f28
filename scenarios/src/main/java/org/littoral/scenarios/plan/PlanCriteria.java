package org.littoral.scenarios.plan;

/**
 * What counts as success for a campaign plan.
 *
 * @param minProfilesBefore profiles needed before the passage (default 2)
 * @param minProfilesAfter profiles needed after the passage (default 2: the response metrics look two hours on)
 * @param timingToleranceH how close a detected passage must be to the truth; one base flight interval by default
 *                         (common practice: timing from profiles is good to about one flight interval), and the
 *                         same for every cadence option so that a denser cadence is never judged more harshly
 * @param speedRelativeTolerance how close the implied propagation speed between two sites must be to the model's
 *                               own front speed between them, as a fraction (default 0.25)
 */
public record PlanCriteria(int minProfilesBefore, int minProfilesAfter, double timingToleranceH,
                           double speedRelativeTolerance) {
    public PlanCriteria {
        if (minProfilesBefore < 0 || minProfilesAfter < 0) {
            throw new IllegalArgumentException("profile counts before/after must be >= 0; got " + minProfilesBefore + ", "
                    + minProfilesAfter);
        }
        if (!(timingToleranceH > 0)) {
            throw new IllegalArgumentException("timing tolerance must be positive hours; got " + timingToleranceH);
        }
        if (!(speedRelativeTolerance > 0)) {
            throw new IllegalArgumentException("speed tolerance must be a positive fraction; got " + speedRelativeTolerance);
        }
    }

    public static PlanCriteria defaults() {
        return new PlanCriteria(2, 2, 0.5, 0.25);
    }
}
