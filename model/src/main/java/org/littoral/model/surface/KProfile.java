package org.littoral.model.surface;

import org.littoral.model.thermo.Thermo;

/**
 * Eddy diffusivity through a boundary layer of depth h, in the profile form of Troen &amp; Mahrt (1986),
 * Boundary-Layer Meteorol. 37, 129-148: K(z) = kappa w_s z (1 - z/h)^2, never below a background
 * minimum (and equal to it above h).
 *
 * <p>Velocity scale: convective (upward heat flux) w_s = (u*^3 + 0.6 w*^3)^(1/3), the mixed-layer form of
 * Holtslag &amp; Boville (1993), J. Climate 6, 1825-1842 (from memory, docs/references.md section 5), with the
 * convective velocity w* = (g/theta w'theta'_s h)^(1/3) (Deardorff 1970). Stable or neutral (downward or
 * zero heat flux, including a shallow marine layer over cool water): w_s = u* / phi_m(z/L) with the
 * Businger-Dyer phi_m = 1 + 5 z/L (Dyer 1974, from memory) and the Obukhov length
 * L = -u*^3 theta / (kappa g w'theta'_s). For a marine or nocturnal layer pass its (shallow) depth as h.
 * The same K is used for momentum and scalars (turbulent Prandtl number 1, a stated simplification).
 */
public final class KProfile {
    /** Holtslag &amp; Boville (1993) weight of w*^3 in the mixed-layer velocity scale (from memory). */
    public static final double WSTAR_WEIGHT = 0.6;
    /** Businger-Dyer stable slope in phi_m = 1 + 5 z/L (Dyer 1974, from memory). */
    public static final double STABLE_SLOPE = 5.0;

    private final double depthM;
    private final double frictionVelocityMs;
    private final double convectiveVelocityMs;
    private final double obukhovLengthM;
    private final double minimumM2s;
    private final boolean convective;
    private final double mixedVelocityMs;

    private KProfile(double depthM, double frictionVelocityMs, double convectiveVelocityMs, double obukhovLengthM,
                     double minimumM2s, boolean convective) {
        this.depthM = depthM;
        this.frictionVelocityMs = frictionVelocityMs;
        this.convectiveVelocityMs = convectiveVelocityMs;
        this.obukhovLengthM = obukhovLengthM;
        this.minimumM2s = minimumM2s;
        this.convective = convective;
        // the convective velocity scale is height-independent: evaluated once (cube root) per profile
        this.mixedVelocityMs = convective ? mixedLayerVelocityScaleMs(frictionVelocityMs, convectiveVelocityMs) : 0.0;
    }

    /**
     * The profile of one column.
     *
     * @param frictionVelocityMs u*
     * @param kinematicHeatFluxKMs w'theta'_s (positive upward)
     * @param thetaK potential temperature of the layer (reference for buoyancy)
     * @param depthM boundary-layer depth h (mixed-layer, nocturnal or marine-layer depth)
     * @param minimumM2s background K, used above h and wherever the profile is smaller
     */
    public static KProfile of(double frictionVelocityMs, double kinematicHeatFluxKMs, double thetaK, double depthM,
                              double minimumM2s) {
        if (!(depthM >= 0) || !(minimumM2s >= 0) || !(frictionVelocityMs >= 0) || !(thetaK > 0)) {
            throw new IllegalArgumentException("K profile needs h >= 0, K_min >= 0, u* >= 0 and theta > 0; got h = " + depthM
                    + " m, K_min = " + minimumM2s + " m2/s, u* = " + frictionVelocityMs + " m/s, theta = " + thetaK + " K");
        }
        boolean conv = kinematicHeatFluxKMs > 0;
        return new KProfile(depthM, frictionVelocityMs, convectiveVelocityMs(kinematicHeatFluxKMs, thetaK, depthM),
                obukhovLengthM(frictionVelocityMs, kinematicHeatFluxKMs, thetaK), minimumM2s, conv);
    }

    /** Deardorff convective velocity w* = (g/theta w'theta'_s h)^(1/3); zero unless the flux is upward. */
    public static double convectiveVelocityMs(double kinematicHeatFluxKMs, double thetaK, double depthM) {
        if (kinematicHeatFluxKMs <= 0 || depthM <= 0) {
            return 0.0;
        }
        return Math.cbrt(Thermo.G / thetaK * kinematicHeatFluxKMs * depthM);
    }

    /** Holtslag &amp; Boville (1993) mixed-layer velocity scale (u*^3 + 0.6 w*^3)^(1/3). */
    public static double mixedLayerVelocityScaleMs(double frictionVelocityMs, double convectiveVelocityMs) {
        double u3 = frictionVelocityMs * frictionVelocityMs * frictionVelocityMs;
        double w3 = convectiveVelocityMs * convectiveVelocityMs * convectiveVelocityMs;
        return Math.cbrt(u3 + WSTAR_WEIGHT * w3);
    }

    /** Obukhov length L = -u*^3 theta / (kappa g w'theta'_s), m; infinite for zero flux. */
    public static double obukhovLengthM(double frictionVelocityMs, double kinematicHeatFluxKMs, double thetaK) {
        if (kinematicHeatFluxKMs == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double u3 = frictionVelocityMs * frictionVelocityMs * frictionVelocityMs;
        return -u3 * thetaK / (BulkFlux.KARMAN * Thermo.G * kinematicHeatFluxKMs);
    }

    /** Velocity scale w_s at height z. */
    public double velocityScaleMs(double zM) {
        if (convective) {
            return mixedVelocityMs;
        }
        double phi = 1.0 + STABLE_SLOPE * zM / obukhovLengthM; // L > 0 or infinite here
        return frictionVelocityMs / phi;
    }

    /** K(z), m2/s. */
    public double diffusivityM2s(double zM) {
        if (zM <= 0 || zM >= depthM) {
            return minimumM2s;
        }
        double s = 1.0 - zM / depthM;
        return Math.max(minimumM2s, BulkFlux.KARMAN * velocityScaleMs(zM) * zM * s * s);
    }

    /** Fills out[k] = K(zM[k]); no allocation. */
    public void fill(double[] zM, double[] out) {
        for (int k = 0; k < zM.length; k++) {
            out[k] = diffusivityM2s(zM[k]);
        }
    }

    public double depthM() {
        return depthM;
    }

    public double frictionVelocityMs() {
        return frictionVelocityMs;
    }

    public double convectiveVelocityMs() {
        return convectiveVelocityMs;
    }

    public double obukhovLengthM() {
        return obukhovLengthM;
    }

    public double minimumM2s() {
        return minimumM2s;
    }

    public boolean isConvective() {
        return convective;
    }
}
