package org.littoral.model.mixedlayer;

/**
 * Prognostic depth of a convective slab mixed layer, one column at a time (advection of h, if wanted,
 * is the caller's job).
 *
 * <p>Growth: the zero-order-jump model into a constant lapse rate gamma (Tennekes 1973, J. Atmos. Sci.
 * 30, 558-567; Carson 1973, QJRMS 99, 450-467): dh/dt = (1 + 2A) w'theta'_s / (gamma h), A the
 * entrainment ratio (0.2 usual, from memory; 0 is encroachment). Over one step with the flux held
 * constant the ODE integrates exactly, d(h^2)/dt = 2 (1 + 2A) w'theta'_s / gamma, so {@link #step} is
 * exact for piecewise-constant flux, stable for any step and starts from h = 0 without the
 * singularity of dh/dt.
 *
 * <p>Collapse: when the surface flux is zero or downward (after sunset, or over water cooler than
 * the air) the convective layer stops being maintained and the column is given the collapsed
 * (nocturnal, residual-stable or marine) depth {@code collapsedDepthM}; the next morning's growth
 * starts from there. A stated simplification of the evening transition.
 *
 * @param entrainmentRatio A &gt;= 0
 * @param lapseRateKPerM gamma, potential-temperature gradient above the layer, K/m (&gt; 0)
 * @param collapsedDepthM depth when the flux is not upward, m (e.g. 100-300 m over land at night, the
 *                        marine-layer depth over water)
 */
public record SlabMixedLayer(double entrainmentRatio, double lapseRateKPerM, double collapsedDepthM) {
    /** Usual entrainment ratio (Tennekes 1973; from memory, docs/references.md section 5). */
    public static final double USUAL_ENTRAINMENT_RATIO = 0.2;

    public SlabMixedLayer {
        if (!(entrainmentRatio >= 0 && entrainmentRatio <= 1)) {
            throw new IllegalArgumentException("entrainment ratio A must be in 0..1 (0.2 usual); got " + entrainmentRatio);
        }
        if (!(lapseRateKPerM > 0 && lapseRateKPerM < 0.1)) {
            throw new IllegalArgumentException("lapse rate above the mixed layer must be in (0, 0.1) K/m (e.g. 0.005); got "
                    + lapseRateKPerM);
        }
        if (!(collapsedDepthM >= 0 && collapsedDepthM < 5000)) {
            throw new IllegalArgumentException("collapsed (night/marine) depth must be in 0..5000 m; got " + collapsedDepthM);
        }
    }

    /** Growth rate dh/dt = (1 + 2A) w'theta'_s / (gamma h), m/s; zero for a non-upward flux. */
    public double growthRateMPerS(double depthM, double kinematicHeatFluxKMs) {
        if (kinematicHeatFluxKMs <= 0) {
            return 0.0;
        }
        return (1.0 + 2.0 * entrainmentRatio) * kinematicHeatFluxKMs / (lapseRateKPerM * depthM);
    }

    /**
     * Depth after a step dt with the kinematic surface heat flux held constant over it.
     *
     * @param depthM depth at the start of the step
     * @param kinematicHeatFluxKMs w'theta'_s = H / (rho c_p), K m/s
     */
    public double step(double depthM, double kinematicHeatFluxKMs, double dtS) {
        if (kinematicHeatFluxKMs <= 0) {
            return collapsedDepthM;
        }
        double h2 = depthM * depthM + 2.0 * (1.0 + 2.0 * entrainmentRatio) * kinematicHeatFluxKMs * dtS / lapseRateKPerM;
        return Math.sqrt(h2);
    }

    /** Steps every column in place: depthM[i] = step(depthM[i], kinematicHeatFluxKMs[i], dtS). No allocation. */
    public void stepColumns(double[] depthM, double[] kinematicHeatFluxKMs, double dtS) {
        if (depthM.length != kinematicHeatFluxKMs.length) {
            throw new IllegalArgumentException("depth and flux arrays differ in length: " + depthM.length + " and "
                    + kinematicHeatFluxKMs.length);
        }
        for (int i = 0; i < depthM.length; i++) {
            depthM[i] = step(depthM[i], kinematicHeatFluxKMs[i], dtS);
        }
    }

    /**
     * Warming rate of the slab, K/s: the flux falls linearly from w'theta'_s at the ground to
     * -A w'theta'_s at h, so d(theta)/dt = (1 + A) w'theta'_s / h inside the layer and zero above
     * (zero-order jump; Tennekes 1973). This is the heating profile that spreads the surface flux
     * through h(x, t). Zero for a non-upward flux or an empty layer.
     */
    public double heatingRateKPerS(double zM, double depthM, double kinematicHeatFluxKMs) {
        if (kinematicHeatFluxKMs <= 0 || depthM <= 0 || zM < 0 || zM >= depthM) {
            return 0.0;
        }
        return (1.0 + entrainmentRatio) * kinematicHeatFluxKMs / depthM;
    }

    /** Kinematic flux w'theta'_s = H / (rho c_p), K m/s. */
    public static double kinematicHeatFluxKMs(double sensibleHeatFluxWm2, double rhoCpJPerM3K) {
        return sensibleHeatFluxWm2 / rhoCpJPerM3K;
    }
}
