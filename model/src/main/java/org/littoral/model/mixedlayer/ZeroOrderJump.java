package org.littoral.model.mixedlayer;

/**
 * Convective mixed-layer growth by the zero-order-jump model into a constant lapse rate gamma
 * (Tennekes 1973, J. Atmos. Sci. 30, 558-567; Carson 1973, QJRMS 99, 450-467): with the entrainment
 * ratio A (entrainment flux = -A times the surface flux),
 * h^2 = h0^2 + 2 (1 + 2A) Integral(w'theta'_s dt) / gamma. A = 0 is encroachment.
 */
public final class ZeroOrderJump {
    private ZeroOrderJump() {
    }

    /**
     * Mixed-layer depth after a cumulative kinematic surface heat flux.
     *
     * @param initialDepthM h0
     * @param entrainmentRatio A (0.2 usual, 0 for encroachment)
     * @param lapseKPerM gamma, potential-temperature gradient above the layer, K/m
     * @param cumulativeKinematicFluxKm integral of w'theta'_s over time, K m (flux in K m/s times s)
     */
    public static double depthM(double initialDepthM, double entrainmentRatio, double lapseKPerM,
                                double cumulativeKinematicFluxKm) {
        double h2 = initialDepthM * initialDepthM
                + 2.0 * (1.0 + 2.0 * entrainmentRatio) * Math.max(0.0, cumulativeKinematicFluxKm) / lapseKPerM;
        return Math.sqrt(h2);
    }
}
