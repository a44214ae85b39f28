package org.littoral.scenarios.run;

import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;
import org.littoral.model.nonlinear.NonlinearSolution;

/**
 * A nonlinear run with its far-field reference: the same model over the inland surface alone, with no
 * coast. Near the ground the ambient wind of a nonlinear run is not the geostrophic wind of the
 * background (drag slows and turns it, and it spins up from rest through an inertial oscillation);
 * the reference has all of that and no breeze, so "breeze wind" = run minus reference at the same time
 * and height isolates the circulation the coast makes.
 */
public final class FarFieldSolution implements BreezeSolution {
    private final NonlinearSolution run;
    private final NonlinearSolution farField;
    private final double interiorFromM;
    private final double interiorToM;

    /**
     * @param spongeM width of the far-field sponge at each end of the run's domain; the interior used by
     *        the diagnostics keeps another {@link #MARGIN_M} clear of it
     */
    FarFieldSolution(NonlinearSolution run, NonlinearSolution farField, double spongeM) {
        this.run = run;
        this.farField = farField;
        double[] x = run.xM();
        double dx = x[1] - x[0];
        this.interiorFromM = x[0] - 0.5 * dx + spongeM + MARGIN_M;
        this.interiorToM = x[x.length - 1] + 0.5 * dx - spongeM - MARGIN_M;
    }

    /** Distance kept between the diagnostics' search and the sponges, m. */
    public static final double MARGIN_M = 10_000.0;

    /** Seaward end of the interior the diagnostics search, m. */
    public double interiorFromM() {
        return interiorFromM;
    }

    /** Landward end of the interior the diagnostics search, m. */
    public double interiorToM() {
        return interiorToM;
    }

    public NonlinearSolution run() {
        return run;
    }

    public NonlinearSolution farField() {
        return farField;
    }

    /**
     * The reference wind profile at time t: {u, v} at the run's levels, m/s (allocates). All reference
     * columns are alike; the first one is taken.
     */
    public double[][] farFieldWindAt(double timeSec) {
        double t = Math.max(farField.startSec(), Math.min(farField.endSec(), timeSec));
        Snapshot s = farField.snapshotAt(t);
        int nx = s.nx();
        int nz = s.nz();
        double[][] out = new double[2][nz];
        for (int k = 0; k < nz; k++) {
            out[0][k] = s.uMPerS()[k * nx];
            out[1][k] = s.vMPerS()[k * nx];
        }
        return out;
    }

    @Override
    public double[] xM() {
        return run.xM();
    }

    @Override
    public double[] zM() {
        return run.zM();
    }

    @Override
    public Background background() {
        return run.background();
    }

    @Override
    public double startSec() {
        return run.startSec();
    }

    @Override
    public double endSec() {
        return run.endSec();
    }

    @Override
    public Snapshot snapshotAt(double timeSec) {
        return run.snapshotAt(timeSec);
    }

    @Override
    public String modelName() {
        return run.modelName();
    }
}
