package org.littoral.model.linear;

/** How the land is heated relative to the water in the linear model. */
public sealed interface HeatingSpec permits HeatingSpec.ClassicShape, HeatingSpec.SlabMixedLayer {

    /**
     * The classic analytic shape of linear sea-breeze theory:
     * Q = Q0 [pi/2 + arctan(x / x0)] exp(-z / H) times a diurnal time factor (sin(omega t) from
     * sunrise in the purely periodic form), Rotunno (1983) and earlier linear theory.
     *
     * @param amplitudeKPerS Q0 expressed as a potential-temperature heating rate, K/s
     * @param halfWidthM x0, the coastal transition half-width, m
     * @param depthM H, the e-folding depth of the heating, m
     * @param sunriseSolarHours solar time at which the heating changes sign upward (6 h for the pure sinusoid)
     */
    record ClassicShape(double amplitudeKPerS, double halfWidthM, double depthM, double sunriseSolarHours)
            implements HeatingSpec {
    }

    /**
     * Slab mixed-layer heating: the land-minus-water surface sensible heat flux of a diurnal curve
     * (half-sine between sunrise and sunset, zero at night) spread uniformly through a mixed layer
     * whose depth h(t) grows by the zero-order-jump model (Tennekes 1973):
     * h^2 = h0^2 + 2 (1 + 2A) Integral(H dt) / (rho c_p gamma); encroachment when A = 0.
     *
     * @param peakFluxDifferenceWm2 peak land-minus-water sensible heat flux, W/m^2
     * @param sunriseSolarHours start of heating, solar hours
     * @param sunsetSolarHours end of heating, solar hours
     * @param lapseGammaKPerM potential-temperature gradient above the mixed layer, K/m
     * @param entrainmentRatio A (0.2 is usual; 0 is encroachment)
     * @param initialDepthM h0 at sunrise, m
     * @param transitionHalfWidthM half-width of the smoothed land-water step, m
     */
    record SlabMixedLayer(double peakFluxDifferenceWm2, double sunriseSolarHours, double sunsetSolarHours,
                          double lapseGammaKPerM, double entrainmentRatio, double initialDepthM,
                          double transitionHalfWidthM) implements HeatingSpec {
    }
}
