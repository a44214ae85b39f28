package org.littoral.scenarios.plan;

import org.littoral.model.sounding.FlightSchedule;

/**
 * One way of flying a site: a base interval over the operating hours and, optionally, a denser interval
 * inside a window. The window is either fixed by the user or {@code auto}: chosen per site from the
 * ensemble's arrival times there ({@link DenseWindow}).
 *
 * @param name label used in tables
 * @param intervalMin base flight interval, minutes
 * @param denseIntervalMin dense interval inside the window, minutes (0 = no dense window)
 * @param autoWindow true when the dense window comes from the ensemble
 * @param denseStartH fixed window start, local clock hours (NaN when auto or none)
 * @param denseEndH fixed window end (NaN when auto or none)
 */
public record CadenceOption(String name, double intervalMin, double denseIntervalMin, boolean autoWindow,
                            double denseStartH, double denseEndH) {

    public boolean hasDense() {
        return denseIntervalMin > 0;
    }

    /** The schedule at one site; {@code window} is used when the option's window is auto. */
    public FlightSchedule schedule(double operatingStartH, double operatingEndH, DenseWindow window) {
        if (!hasDense()) {
            return FlightSchedule.regular(intervalMin, operatingStartH, operatingEndH);
        }
        double s = autoWindow ? window.startClockH() : denseStartH;
        double e = autoWindow ? window.endClockH() : denseEndH;
        if (Double.isNaN(s) || Double.isNaN(e)) {
            return FlightSchedule.regular(intervalMin, operatingStartH, operatingEndH);
        }
        // snap the dense window onto the base grid so that dense launches include every base launch
        double step = intervalMin / 60.0;
        s = operatingStartH + Math.floor((s - operatingStartH) / step) * step;
        e = operatingStartH + Math.ceil((e - operatingStartH) / step) * step;
        return new FlightSchedule(intervalMin, operatingStartH, operatingEndH, denseIntervalMin, Math.max(s, operatingStartH),
                Math.min(e, operatingEndH));
    }
}
