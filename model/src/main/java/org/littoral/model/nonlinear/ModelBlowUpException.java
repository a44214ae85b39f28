package org.littoral.model.nonlinear;

import java.util.Locale;

/**
 * The nonlinear run went unstable (a NaN, or a wind beyond the configured limit). Names when and
 * where, suggests a fix, and carries the snapshots stored before the blow-up.
 */
public final class ModelBlowUpException extends RuntimeException {
    private final double solarHours;
    private final double xKm;
    private final double zM;
    private final String variable;
    private final double value;
    private final transient NonlinearSolution partial;

    ModelBlowUpException(double solarHours, double xKm, double zM, String variable, double value, double dtS,
                         NonlinearSolution partial) {
        super(String.format(Locale.ROOT,
                "nonlinear model blew up at %.3f solar h, x = %.1f km, z = %.0f m: %s = %.4g (step %.1f s); "
                        + "try a smaller numerics.courantNumber (e.g. 0.3), more damping (shorter topTimescaleS or "
                        + "lateralTimescaleS, a deeper top layer) or a smoother/weaker heating; the %d snapshots up to "
                        + "%.2f solar h are kept", solarHours, xKm, zM, variable, value, dtS, partial.snapshotCount(),
                partial.snapshotCount() == 0 ? Double.NaN : partial.endSec() / 3600.0));
        this.solarHours = solarHours;
        this.xKm = xKm;
        this.zM = zM;
        this.variable = variable;
        this.value = value;
        this.partial = partial;
    }

    public double solarHours() {
        return solarHours;
    }

    public double xKm() {
        return xKm;
    }

    public double zM() {
        return zM;
    }

    public String variable() {
        return variable;
    }

    public double value() {
        return value;
    }

    /** The snapshots stored before the blow-up ({@link NonlinearSolution#complete()} is false). */
    public NonlinearSolution partialSolution() {
        return partial;
    }
}
