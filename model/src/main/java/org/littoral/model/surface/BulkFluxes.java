package org.littoral.model.surface;

/**
 * Surface fluxes from bulk formulas at one point (all fluxes positive upward).
 *
 * @param frictionVelocityMs u* = sqrt(C_D) U
 * @param momentumFluxNm2 surface stress magnitude tau = rho C_D U^2 (acts against the wind at z_a)
 * @param sensibleHeatFluxWm2 H = rho c_p C_H U (theta_s - theta_a)
 * @param latentHeatFluxWm2 LE = rho L_v C_E U (r_s - r_a)
 * @param kinematicHeatFluxKMs w'theta'_s = H / (rho c_p), K m/s
 * @param kinematicMoistureFlux w'r'_s = LE / (rho L_v), (kg/kg) m/s
 * @param dragCoefficient C_D at z_a, stability included
 * @param heatCoefficient C_H at z_a, stability included
 * @param moistureCoefficient C_E at z_a, stability included
 * @param bulkRichardson Ri_B between the surface and z_a (negative when unstable)
 * @param airDensityKgM3 rho used in the conversions
 */
public record BulkFluxes(double frictionVelocityMs, double momentumFluxNm2, double sensibleHeatFluxWm2,
                         double latentHeatFluxWm2, double kinematicHeatFluxKMs, double kinematicMoistureFlux,
                         double dragCoefficient, double heatCoefficient, double moistureCoefficient,
                         double bulkRichardson, double airDensityKgM3) {
}
