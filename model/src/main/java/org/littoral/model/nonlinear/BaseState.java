package org.littoral.model.nonlinear;

import org.littoral.model.field.Background;
import org.littoral.model.thermo.Thermo;

/**
 * The basic state the nonlinear model perturbs: the geostrophic wind (Ug, Vg) in model components, the
 * Coriolis parameter, theta_0(z) and r_0(z) with their gradients at layer centres, the hydrostatic pressure
 * and density of that state, and the largest buoyancy frequency (for the step choice). Immutable.
 */
final class BaseState {
    final double f;
    final double ug;
    final double vg;
    final double[] th0;
    final double[] dth0;
    final double[] q0;
    final double[] dq0;
    final double[] rho0;
    final double nMax;
    final double surfaceRho;
    final double surfacePressure;
    final Background background;

    BaseState(NonlinearConfig cfg, StaggeredGrid g) {
        int nz = g.nz;
        f = cfg.coast().coriolisPerS();
        double[] gw = cfg.geostrophicModelComponents();
        ug = gw[0];
        vg = gw[1];
        th0 = new double[nz];
        dth0 = new double[nz];
        q0 = new double[nz];
        dq0 = new double[nz];
        double n2max = 0;
        for (int k = 0; k < nz; k++) {
            th0[k] = cfg.theta().thetaK(g.zc[k]);
            dth0[k] = cfg.theta().gradientKPerM(g.zc[k]);
            double r = cfg.surfaceMixingRatio() + cfg.mixingRatioGradientPerM() * g.zc[k];
            q0[k] = Math.max(1e-5, r);
            dq0[k] = r > 1e-5 ? cfg.mixingRatioGradientPerM() : 0.0;
            n2max = Math.max(n2max, Thermo.G / th0[k] * dth0[k]);
        }
        for (int k = 1; k < nz; k++) {
            double zi = g.zf[k];
            n2max = Math.max(n2max, Thermo.G / cfg.theta().thetaK(zi) * cfg.theta().gradientKPerM(zi));
        }
        nMax = Math.sqrt(n2max);
        double[] uA = new double[nz];
        double[] vA = new double[nz];
        java.util.Arrays.fill(uA, ug);
        java.util.Arrays.fill(vA, vg);
        double[] p0 = Background.pressureFromTheta(g.zc, th0, q0, cfg.surfacePressurePa());
        background = new Background(g.zc.clone(), th0.clone(), q0.clone(), p0, uA, vA);
        rho0 = new double[nz];
        for (int k = 0; k < nz; k++) {
            rho0[k] = Thermo.densityKgM3(p0[k], Thermo.temperatureFromPotentialK(th0[k], p0[k]), q0[k]);
        }
        surfacePressure = cfg.surfacePressurePa();
        double ts = Thermo.temperatureFromPotentialK(cfg.theta().thetaK(0.0), surfacePressure);
        surfaceRho = Thermo.densityKgM3(surfacePressure, ts, cfg.surfaceMixingRatio());
    }
}
