package org.littoral.model.surface;

/**
 * The surface energy budget of a land column, W/m2: Q* = G + H + LE.
 *
 * @param netRadiationWm2 Q*, positive into the surface
 * @param groundHeatFluxWm2 G, positive into the ground
 * @param sensibleHeatFluxWm2 H, positive upward (heating the air)
 * @param latentHeatFluxWm2 LE, positive upward (evaporation)
 */
public record EnergyBalance(double netRadiationWm2, double groundHeatFluxWm2, double sensibleHeatFluxWm2,
                            double latentHeatFluxWm2) {

    /** Available energy Q* - G. */
    public double availableEnergyWm2() {
        return netRadiationWm2 - groundHeatFluxWm2;
    }

    /** H / LE (infinite when LE = 0). */
    public double bowenRatio() {
        return sensibleHeatFluxWm2 / latentHeatFluxWm2;
    }
}
