package org.littoral.scenarios.analysis.detect;

/**
 * One change found by one detector. Time convention: the midpoint between the last profile before
 * the change and the first profile after it; the uncertainty is half their separation (the change
 * happened somewhere between the two flights).
 *
 * @param lastBefore index (in the site-day) of the last profile before the change
 * @param firstAfter index of the first profile after the change
 */
public record ChangeCandidate(String detector, int lastBefore, int firstAfter, double timeHours, double uncertaintyHours) {

    static ChangeCandidate between(String detector, int lastBefore, int firstAfter, double[] timeHours) {
        double a = timeHours[lastBefore];
        double b = timeHours[firstAfter];
        return new ChangeCandidate(detector, lastBefore, firstAfter, 0.5 * (a + b), 0.5 * (b - a));
    }
}
