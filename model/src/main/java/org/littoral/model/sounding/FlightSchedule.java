package org.littoral.model.sounding;

import java.util.ArrayList;
import java.util.List;

/**
 * When the drones launch, in local clock hours of the day: every {@code cadenceMin} minutes from
 * {@code windowStartH} to {@code windowEndH} inclusive, and additionally every {@code denseCadenceMin}
 * minutes from {@code denseStartH} to {@code denseEndH} (the window in which a front is expected).
 * Launches closer than one second are merged. Without a dense window, {@code denseCadenceMin} is 0.
 */
public record FlightSchedule(double cadenceMin, double windowStartH, double windowEndH,
                             double denseCadenceMin, double denseStartH, double denseEndH) {

    private static final double MERGE_H = 1.0 / 3600.0;

    public FlightSchedule {
        if (!(cadenceMin > 0)) {
            throw new IllegalArgumentException("flight cadence must be positive minutes; got " + cadenceMin);
        }
        if (!(windowEndH >= windowStartH)) {
            throw new IllegalArgumentException("operating window must end after it starts; got " + windowStartH + " h to "
                    + windowEndH + " h");
        }
        if (denseCadenceMin < 0 || Double.isNaN(denseCadenceMin)) {
            throw new IllegalArgumentException("dense cadence must be positive minutes (or 0 for none); got " + denseCadenceMin);
        }
        if (denseCadenceMin > 0 && !(denseEndH >= denseStartH)) {
            throw new IllegalArgumentException("dense window must end after it starts; got " + denseStartH + " h to "
                    + denseEndH + " h");
        }
    }

    /** A single cadence, no dense window. */
    public static FlightSchedule regular(double cadenceMin, double windowStartH, double windowEndH) {
        return new FlightSchedule(cadenceMin, windowStartH, windowEndH, 0.0, Double.NaN, Double.NaN);
    }

    public boolean hasDenseWindow() {
        return denseCadenceMin > 0;
    }

    /** An upper bound of the number of launches, counted without listing them (a size check before a run). */
    public long launchCountAtMost() {
        long n = (long) Math.floor((windowEndH - windowStartH) * 60.0 / cadenceMin + 1e-9) + 1;
        if (hasDenseWindow() && denseEndH >= denseStartH) {
            n += (long) Math.floor((denseEndH - denseStartH) * 60.0 / denseCadenceMin + 1e-9) + 1;
        }
        return n;
    }

    /** Launch times, local clock hours, increasing (allocates). */
    public List<Double> launchTimesClockHours() {
        List<Double> times = new ArrayList<>();
        addSeries(times, windowStartH, windowEndH, cadenceMin);
        if (hasDenseWindow()) {
            addSeries(times, Math.max(denseStartH, windowStartH), Math.min(denseEndH, windowEndH), denseCadenceMin);
        }
        times.sort(Double::compare);
        List<Double> merged = new ArrayList<>(times.size());
        for (double t : times) {
            if (merged.isEmpty() || t - merged.get(merged.size() - 1) > MERGE_H) {
                merged.add(t);
            }
        }
        return merged;
    }

    private static void addSeries(List<Double> out, double fromH, double toH, double stepMin) {
        double stepH = stepMin / 60.0;
        // counted steps, not repeated addition, so 48 half-hour steps land exactly on the window end
        for (int k = 0; ; k++) {
            double t = fromH + k * stepH;
            if (t > toH + MERGE_H) {
                break;
            }
            out.add(t);
        }
    }
}
