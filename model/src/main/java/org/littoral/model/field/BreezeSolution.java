package org.littoral.model.field;

/**
 * What either breeze model hands to the rest of littoral: a grid, a background state and the
 * ability to give the fields at any time in its span. The linear model synthesises a snapshot from
 * its harmonics; the nonlinear model interpolates between stored snapshots.
 */
public interface BreezeSolution {
    /** Cross-shore positions of the columns, m (coast at 0, inland positive). */
    double[] xM();

    /** Heights of the levels, m. */
    double[] zM();

    Background background();

    /** First time available, s of local solar time. */
    double startSec();

    /** Last time available, s of local solar time. */
    double endSec();

    /** The fields at time t (allocates a new snapshot). */
    Snapshot snapshotAt(double timeSec);

    /** Short human-readable label of the model that made this ("linear spectral", "nonlinear"). */
    String modelName();
}
