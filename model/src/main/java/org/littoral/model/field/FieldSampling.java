package org.littoral.model.field;

/**
 * Optional fast paths a {@link BreezeSolution} may offer besides {@link BreezeSolution#snapshotAt}:
 * one level along x, or one column at any x, without building the whole x-z snapshot. Consumers
 * (front diagnostics, site sampling) use them when present and fall back to snapshots otherwise.
 */
public interface FieldSampling {
    /** TOTAL cross-shore wind u (ambient included) at every column of level {@code levelIndex}, time t (allocates nx). */
    double[] crossShoreWindAtLevel(int levelIndex, double timeSec);

    /** Alongshore wind v (as {@link Snapshot#vMPerS()} holds it) at every column of level {@code levelIndex}, time t (allocates nx). */
    double[] alongshoreWindAtLevel(int levelIndex, double timeSec);

    /**
     * The fields of the single column at cross-shore position {@code xM} (anywhere in the domain) as a
     * one-column {@link Snapshot} (nx = 1): TOTAL u, v, w, theta, mixing ratio and the pressure
     * perturbation on the solution's levels.
     */
    Snapshot columnAt(double xM, double timeSec);
}
