package org.littoral.model.nonlinear;

import org.littoral.model.thermo.Thermo;

/**
 * Runs a {@link NonlinearModel} from the start to the end of its configuration: the time loop, the choice of
 * each step (Courant number of the flow, buoyancy and inertial frequencies, damping rates; steps shortened to
 * land on every output time), the blow-up check after each step and the snapshots at the output interval.
 * The physics never sees the clock beyond the step it is given.
 */
final class Simulation {
    private final NonlinearModel model;
    private final NonlinearConfig cfg;
    private final StaggeredGrid g;
    private final ModelState st;
    private final BaseState base;
    private final int nx;
    private final int nz;
    private final double invDx;
    /** Courant number the scalar scheme allows. */
    private final double courant;
    private double dtLast;

    Simulation(NonlinearModel model) {
        this.model = model;
        this.cfg = model.cfg;
        this.g = model.g;
        this.st = model.st;
        this.base = model.base;
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        NonlinearConfig.Numerics num = cfg.numerics();
        // the limited-slope scheme (linear mode, or chosen) is monotone only up to a Courant sum of 0.5
        this.courant = model.fluxCorrected ? num.courantNumber() : Math.min(num.courantNumber(), 0.5);
    }

    NonlinearSolution run() {
        NonlinearSolution sol = new NonlinearSolution(g.xc, g.zc, base.background);
        model.initialise();
        double t0 = cfg.startSolarHours() * 3600.0;
        double tEnd = cfg.endSolarHours() * 3600.0;
        double interval = cfg.outputIntervalS();
        double t = t0;
        long steps = 0;
        store(sol, t);
        int nOut = 1;
        double nextOut = Math.min(t0 + nOut * interval, tEnd);
        while (t < tEnd - 1e-6) {
            double dt = chooseStep();
            if (t + dt > nextOut - 1e-6) {
                dt = nextOut - t;
            } else if (t + 1.5 * dt > nextOut) {
                dt = 0.5 * (nextOut - t); // two similar steps rather than one tiny one
            }
            dtLast = dt;
            model.step(t, dt);
            t += dt;
            steps++;
            checkBlowUp(t, sol, steps);
            if (Math.abs(t - nextOut) < 1e-6) {
                t = nextOut;
                store(sol, t);
                nOut++;
                nextOut = Math.min(t0 + nOut * interval, tEnd);
            }
        }
        sol.finish(true, steps);
        return sol;
    }

    private double chooseStep() {
        double c = model.advectiveRate.getAsDouble();
        NonlinearConfig.Numerics num = cfg.numerics();
        double dt = num.maxStepS();
        if (c > 0) {
            dt = Math.min(dt, courant / c);
        }
        if (base.nMax > 0) {
            dt = Math.min(dt, num.buoyancyStepFactor() / base.nMax);
        }
        if (base.f != 0) {
            dt = Math.min(dt, num.buoyancyStepFactor() / Math.abs(base.f));
        }
        double rate = cfg.damping().rayleighFrictionPerS() + cfg.damping().newtonianCoolingPerS();
        if (rate > 0) {
            dt = Math.min(dt, 1.0 / rate);
        }
        return dt;
    }

    /** Largest Courant rate |u|/dx + |w|/dz of any cell, 1/s (the flow's own advection). */
    static double flowCourantRate(StaggeredGrid g, ModelState st) {
        int nx = g.nx;
        double invDx = 1.0 / g.dx;
        double[] u = st.u;
        double[] w = st.w;
        double c = 0;
        for (int k = 0; k < g.nz; k++) {
            double idz = 1.0 / g.dzf[k];
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double cu = Math.max(Math.abs(u[o + i]), Math.abs(u[o + g.ip1[i]])) * invDx;
                double cw = Math.max(Math.abs(w[o + i]), Math.abs(w[o + nx + i])) * idz;
                if (cu + cw > c) {
                    c = cu + cw;
                }
            }
        }
        return c;
    }

    private void checkBlowUp(double t, NonlinearSolution sol, long steps) {
        double limit = cfg.numerics().blowUpWindMPerS();
        double[] u = st.u;
        double[] v = st.v;
        double[] w = st.w;
        double[] th = st.th;
        double[] q = st.q;
        String var = null;
        int at = -1;
        double val = 0;
        for (int n = 0; n < u.length && var == null; n++) {
            if (!(Math.abs(u[n]) <= limit)) {
                var = "u";
                at = n;
                val = u[n];
            } else if (!(Math.abs(v[n]) <= limit)) {
                var = "v";
                at = n;
                val = v[n];
            } else if (!(Math.abs(w[n + nx]) <= limit)) {
                var = "w";
                at = n + nx;
                val = w[n + nx];
            } else if (!(Math.abs(th[n] - 300.0) < 200.0)) {
                var = "theta";
                at = n;
                val = th[n];
            } else if (Double.isNaN(q[n])) {
                var = "mixing ratio";
                at = n;
                val = q[n];
            }
        }
        if (var == null) {
            return;
        }
        int k = at / nx;
        int i = at % nx;
        double z = var.equals("w") ? g.zf[k] : g.zc[k];
        double x = var.equals("u") ? g.xc[i] - 0.5 * g.dx : g.xc[i];
        sol.finish(false, steps);
        throw new ModelBlowUpException(t / 3600.0, x / 1000.0, z, var, val, dtLast, sol);
    }

    private void store(NonlinearSolution sol, double t) {
        double[] u = st.u;
        double[] v = st.v;
        double[] w = st.w;
        double[] th = st.th;
        double[] q = st.q;
        double[] chi = model.projection.chi();
        double phiScale = model.projection.phiScale();
        double[] h = model.mixedLayer.h;
        double[] heatFluxKin = model.surface.heatFluxKin;
        int nc = nz * nx;
        float[] fu = new float[nc];
        float[] fv = new float[nc];
        float[] fw = new float[nc];
        float[] ft = new float[nc];
        float[] fq = new float[nc];
        float[] fp = new float[nc];
        float[] fh = new float[nx];
        float[] fs = new float[nx];
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                int n = o + i;
                fu[n] = (float) (0.5 * (u[n] + u[o + g.ip1[i]]));
                fv[n] = (float) v[n];
                fw[n] = (float) (0.5 * (w[n] + w[n + nx]));
                ft[n] = (float) th[n];
                fq[n] = (float) q[n];
                fp[n] = phiScale == 0.0 ? 0.0f : (float) (base.rho0[k] * (chi[n] * phiScale));
            }
        }
        for (int i = 0; i < nx; i++) {
            fh[i] = (float) h[i];
            fs[i] = (float) (heatFluxKin[i] * base.surfaceRho * Thermo.CP);
        }
        sol.add(new NonlinearSolution.Stored(t, fu, fv, fw, ft, fq, fp, fh, fs));
    }
}
