package org.littoral.model.linear;

import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.nonlinear.ThetaProfile;

/**
 * Everything the linear spectral model needs. The basic state is stratified with constant
 * buoyancy frequency N and moves with a uniform cross-shore wind U (onshore positive).
 *
 * @param coast latitude (sets f), orientation and solar-time information
 * @param surface land/water layout; the heating follows its land mask (smoothed)
 * @param xGrid periodic cross-shore grid (power-of-two nx for the FFT)
 * @param zGrid levels at which fields are output
 * @param buoyancyFrequencyPerS N of the basic state
 * @param frictionPerS Rayleigh friction alpha (0 = inviscid)
 * @param newtonianCoolingPerS Newtonian cooling rate (usually equal to the friction)
 * @param ambientCrossShoreMPerS uniform basic-state wind U (onshore positive), Doppler shift
 * @param hydrostatic true for the hydrostatic equations, false to keep D^2 psi_xx
 * @param harmonics number of diurnal time harmonics kept (1 for a pure sinusoid)
 * @param heating the heating shape
 * @param surfaceThetaK basic-state potential temperature at the ground
 * @param surfaceMixingRatio basic-state mixing ratio at the ground, kg/kg
 * @param mixingRatioGradientPerM basic-state d(r)/dz, kg/kg per m (negative: drier aloft)
 * @param surfacePressurePa basic-state surface pressure
 * @param stratification a height-varying basic state (mixed layer, capping inversion, free atmosphere), whose
 *        N(z) the vertical problem then uses (banded solve); null for constant N = buoyancyFrequencyPerS. With it,
 *        buoyancyFrequencyPerS is the N above the profile's varying part.
 */
public record LinearConfig(Coast coast, SurfaceMap surface, HorizontalGrid xGrid, VerticalGrid zGrid,
                           double buoyancyFrequencyPerS, double frictionPerS, double newtonianCoolingPerS,
                           double ambientCrossShoreMPerS, boolean hydrostatic, int harmonics,
                           HeatingSpec heating, double surfaceThetaK, double surfaceMixingRatio,
                           double mixingRatioGradientPerM, double surfacePressurePa, ThetaProfile stratification) {

    /** Constant N: no stratification profile. */
    public LinearConfig(Coast coast, SurfaceMap surface, HorizontalGrid xGrid, VerticalGrid zGrid,
                        double buoyancyFrequencyPerS, double frictionPerS, double newtonianCoolingPerS,
                        double ambientCrossShoreMPerS, boolean hydrostatic, int harmonics,
                        HeatingSpec heating, double surfaceThetaK, double surfaceMixingRatio,
                        double mixingRatioGradientPerM, double surfacePressurePa) {
        this(coast, surface, xGrid, zGrid, buoyancyFrequencyPerS, frictionPerS, newtonianCoolingPerS, ambientCrossShoreMPerS,
                hydrostatic, harmonics, heating, surfaceThetaK, surfaceMixingRatio, mixingRatioGradientPerM, surfacePressurePa, null);
    }

    /** This configuration with the given stratification profile (null: constant N). */
    public LinearConfig withStratification(ThetaProfile profile) {
        return new LinearConfig(coast, surface, xGrid, zGrid, buoyancyFrequencyPerS, frictionPerS, newtonianCoolingPerS,
                ambientCrossShoreMPerS, hydrostatic, harmonics, heating, surfaceThetaK, surfaceMixingRatio, mixingRatioGradientPerM,
                surfacePressurePa, profile);
    }
}
