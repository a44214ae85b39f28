package org.littoral.model.front;

import java.util.Arrays;
import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;
import org.littoral.model.nonlinear.NonlinearSolution;

/**
 * A nonlinear run with the far-field reference its breeze is measured against. Near the ground the
 * ambient wind of a nonlinear run is not the geostrophic wind of the background: drag slows and turns it
 * (more over rough land), it follows the diurnal cycle of mixing (deeper by day) with an inertial oscillation, and in a 2D domain the
 * column-integrated cross-shore flow is the same at every x, so the land's boundary-layer flow also
 * adjusts to the sea's. The reference is therefore the run itself far inland: at each time and level the
 * median over the landward {@link #BAND_M} of the interior (the median, so that resolved convective
 * cells do not move it). "Breeze wind" = run minus reference isolates the circulation the coast makes,
 * as long as the front has not reached that band (with the default 400 km domain, about 110 km inland).
 */
public final class FarFieldSolution implements BreezeSolution {
    /** Distance kept between the diagnostics' search and the sponges, m. */
    public static final double MARGIN_M = 10_000.0;
    /** Width of the far-inland band whose median wind is the reference, m. */
    public static final double BAND_M = 30_000.0;

    private final NonlinearSolution run;
    private final double interiorFromM;
    private final double interiorToM;
    private final int bandFrom;
    private final int bandTo;

    /**
     * @param spongeM width of the far-field sponge at each end of the run's domain; the interior used by
     *        the diagnostics keeps another {@link #MARGIN_M} clear of it
     */
    public FarFieldSolution(NonlinearSolution run, double spongeM) {
        this.run = run;
        double[] x = run.xM();
        double dx = x[1] - x[0];
        this.interiorFromM = x[0] - 0.5 * dx + spongeM + MARGIN_M;
        this.interiorToM = x[x.length - 1] + 0.5 * dx - spongeM - MARGIN_M;
        int hi = x.length - 1;
        while (hi > 0 && x[hi] > interiorToM) {
            hi--;
        }
        int lo = hi;
        while (lo > 0 && x[lo - 1] >= Math.max(0.5 * interiorToM, interiorToM - BAND_M)) {
            lo--;
        }
        this.bandFrom = lo;
        this.bandTo = hi;
    }

    /** A nonlinear run with its far-field reference (sponges of the given width at each end). */
    public static FarFieldSolution of(NonlinearSolution run, double spongeM) {
        return new FarFieldSolution(run, spongeM);
    }

    public NonlinearSolution run() {
        return run;
    }

    /** Seaward end of the interior the diagnostics search, m. */
    public double interiorFromM() {
        return interiorFromM;
    }

    /** Landward end of the interior the diagnostics search, m. */
    public double interiorToM() {
        return interiorToM;
    }

    /** Cross-shore extent of the reference band, m: {from, to}. */
    public double[] referenceBandM() {
        double[] x = run.xM();
        return new double[] {x[bandFrom], x[bandTo]};
    }

    /** The reference wind profile of a snapshot of this run: {u, v} at its levels, m/s (allocates). */
    public double[][] farFieldWind(Snapshot s) {
        int nx = s.nx();
        int nz = s.nz();
        int m = bandTo - bandFrom + 1;
        double[] work = new double[m];
        double[][] out = new double[2][nz];
        for (int k = 0; k < nz; k++) {
            out[0][k] = median(s.uMPerS(), k * nx, work);
            out[1][k] = median(s.vMPerS(), k * nx, work);
        }
        return out;
    }

    /** The reference wind profile at time t (allocates a snapshot). */
    public double[][] farFieldWindAt(double timeSec) {
        return farFieldWind(run.snapshotAt(timeSec));
    }

    private double median(double[] a, int row, double[] work) {
        for (int i = bandFrom; i <= bandTo; i++) {
            work[i - bandFrom] = a[row + i];
        }
        Arrays.sort(work);
        int m = work.length;
        return (m & 1) == 1 ? work[m / 2] : 0.5 * (work[m / 2 - 1] + work[m / 2]);
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
