package org.littoral.scenarios.timing;

/**
 * Advice about one observed passage time: never an edit of the data.
 *
 * @param favoured for {@link Kind#ONE_CADENCE_OFF}: "earlier" or "later" (which neighbouring flight the evidence favours)
 * @param suggestedTimeHours for {@link Kind#ONE_CADENCE_OFF}: the time the evidence favours; otherwise NaN
 * @param value the number behind the flag: percentile (OUTSIDE_ENVELOPE), speed ratio to the nominal density-current
 *     speed (IMPLIED_SPEED_IMPLAUSIBLE), hours early (EARLIER_THAN_ANY_PLAUSIBLE_ONSET, INLAND_BEFORE_COAST)
 */
public record TimingFlag(Kind kind, String day, String site, String label, double observedHours, double value,
                         String favoured, double suggestedTimeHours, String reason) {

    /** Why a time is doubtful. */
    public enum Kind {
        EARLIER_THAN_ANY_PLAUSIBLE_ONSET, INLAND_BEFORE_COAST, IMPLIED_SPEED_IMPLAUSIBLE, ONE_CADENCE_OFF, OUTSIDE_ENVELOPE
    }
}
