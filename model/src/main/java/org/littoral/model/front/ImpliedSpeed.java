package org.littoral.model.front;

/**
 * Propagation speed implied by the arrivals at two places: only when both exist and their times differ by more
 * than the sum of their timing uncertainties; otherwise "not resolved".
 *
 * @param mPerS distance over time difference, m/s; null when not resolved
 * @param note why not resolved (null when resolved)
 */
public record ImpliedSpeed(Double mPerS, String note) {
    public boolean resolved() {
        return mPerS != null;
    }
}
