package org.littoral.model.nonlinear;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;

/**
 * Stored snapshots of a nonlinear run (single precision, all variables at cell centres), linearly
 * interpolated in time by {@link #snapshotAt}. A solution returned inside a {@link ModelBlowUpException}
 * is partial: {@link #complete()} is false and {@link #endSec()} is the last stored time.
 */
public final class NonlinearSolution implements BreezeSolution {
    private final double[] xM;
    private final double[] zM;
    private final Background background;
    private final List<Stored> stored = new ArrayList<>();
    private boolean complete;
    private long stepsTaken;

    /**
     * One stored time: fields flattened a[k * nx + i]; mixed-layer depth and surface sensible heat flux (W/m2, of
     * the step that ended here; zero at the start) per column.
     */
    record Stored(double timeSec, float[] u, float[] v, float[] w, float[] theta, float[] r, float[] p, float[] h,
                  float[] sensibleHeatFluxWm2) {
    }

    NonlinearSolution(double[] xM, double[] zM, Background background) {
        this.xM = xM.clone();
        this.zM = zM.clone();
        this.background = background;
    }

    void add(Stored s) {
        stored.add(s);
    }

    void finish(boolean complete, long steps) {
        this.complete = complete;
        this.stepsTaken = steps;
    }

    /** True when the run reached its end time; false for the partial solution of a blown-up run. */
    public boolean complete() {
        return complete;
    }

    public long stepsTaken() {
        return stepsTaken;
    }

    public int snapshotCount() {
        return stored.size();
    }

    /** Stored output times, s of solar time. */
    public double[] storedTimesSec() {
        double[] t = new double[stored.size()];
        for (int n = 0; n < t.length; n++) {
            t[n] = stored.get(n).timeSec();
        }
        return t;
    }

    @Override
    public double[] xM() {
        return xM.clone();
    }

    @Override
    public double[] zM() {
        return zM.clone();
    }

    @Override
    public Background background() {
        return background;
    }

    @Override
    public double startSec() {
        return stored.isEmpty() ? Double.NaN : stored.get(0).timeSec();
    }

    @Override
    public double endSec() {
        return stored.isEmpty() ? Double.NaN : stored.get(stored.size() - 1).timeSec();
    }

    @Override
    public String modelName() {
        return "nonlinear";
    }

    @Override
    public Snapshot snapshotAt(double timeSec) {
        if (stored.isEmpty()) {
            throw new IllegalStateException("the nonlinear run stored no snapshot");
        }
        if (!(timeSec >= startSec() - 1e-6 && timeSec <= endSec() + 1e-6)) {
            throw new IllegalArgumentException("time " + timeSec / 3600.0 + " solar h is outside the run ("
                    + startSec() / 3600.0 + " to " + endSec() / 3600.0 + " solar h); ask for a time inside it");
        }
        int hi = 0;
        while (hi < stored.size() - 1 && stored.get(hi).timeSec() < timeSec) {
            hi++;
        }
        int lo = Math.max(0, hi - 1);
        Stored a = stored.get(lo);
        Stored b = stored.get(hi);
        double wb = b.timeSec() > a.timeSec() ? (timeSec - a.timeSec()) / (b.timeSec() - a.timeSec()) : 1.0;
        wb = Math.max(0, Math.min(1, wb));
        int nx = xM.length;
        int nz = zM.length;
        return new Snapshot(timeSec, nx, nz, lerp(a.u(), b.u(), wb), lerp(a.v(), b.v(), wb), lerp(a.w(), b.w(), wb),
                lerp(a.theta(), b.theta(), wb), lerp(a.r(), b.r(), wb), lerp(a.p(), b.p(), wb));
    }

    /** Slab mixed-layer depth h(x) at time t, m (linear in time between stored snapshots; allocates). */
    public double[] mixedLayerDepthM(double timeSec) {
        int hi = 0;
        while (hi < stored.size() - 1 && stored.get(hi).timeSec() < timeSec) {
            hi++;
        }
        int lo = Math.max(0, hi - 1);
        Stored a = stored.get(lo);
        Stored b = stored.get(hi);
        double wb = b.timeSec() > a.timeSec() ? (timeSec - a.timeSec()) / (b.timeSec() - a.timeSec()) : 1.0;
        return lerp(a.h(), b.h(), Math.max(0, Math.min(1, wb)));
    }

    /** Surface sensible heat flux per column at the stored time nearest to t (upward positive), W/m2 (allocates). */
    public double[] sensibleHeatFluxWm2(double timeSec) {
        Stored best = stored.get(0);
        for (Stored st : stored) {
            if (Math.abs(st.timeSec() - timeSec) < Math.abs(best.timeSec() - timeSec)) {
                best = st;
            }
        }
        double[] out = new double[xM.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = best.sensibleHeatFluxWm2()[i];
        }
        return out;
    }

    List<Stored> stored() {
        return Collections.unmodifiableList(stored);
    }

    private static double[] lerp(float[] a, float[] b, double wb) {
        double[] out = new double[a.length];
        double wa = 1.0 - wb;
        for (int n = 0; n < a.length; n++) {
            out[n] = wa * a[n] + wb * b[n];
        }
        return out;
    }
}
