package org.littoral.model.nonlinear;

/** What drives the nonlinear model. */
public sealed interface Forcing permits Forcing.None, Forcing.PrescribedHeating, Forcing.PrescribedSurfaceFlux,
        Forcing.SurfaceEnergyBalance {

    /** No diabatic forcing and no surface heat or moisture fluxes (drag still acts when mixing is on). */
    record None() implements Forcing {
    }

    /**
     * A heating rate Q(x, z, t) added to the theta equation, no surface heat or moisture fluxes: the
     * forcing of the linear model, for like-with-like comparisons.
     */
    record PrescribedHeating(HeatingRate heating) implements Forcing {
        public PrescribedHeating {
            if (heating == null) {
                throw new IllegalArgumentException("prescribed heating: the heating rate function is missing");
            }
        }
    }

    /**
     * A prescribed diurnal land sensible heat flux, H = peak sin(pi (t - sunrise) / (sunset - sunrise))
     * by day and {@code nightSensibleWm2} at night, with latent heat H / Bowen ratio of the land segment
     * (by day); water fluxes from the bulk formulas with stability of
     * {@link org.littoral.model.surface.BulkFlux#overWater} and the segment's sea-surface temperature.
     */
    record PrescribedSurfaceFlux(double peakLandSensibleWm2, double sunriseSolarHours, double sunsetSolarHours,
                                 double nightSensibleWm2) implements Forcing {
        public PrescribedSurfaceFlux {
            if (!(peakLandSensibleWm2 >= 0 && peakLandSensibleWm2 <= 1000)) {
                throw new IllegalArgumentException("prescribed surface flux: peak land sensible heat flux must be in 0..1000 W/m2; got "
                        + peakLandSensibleWm2);
            }
            if (!(sunsetSolarHours > sunriseSolarHours && sunriseSolarHours >= 0 && sunsetSolarHours <= 24)) {
                throw new IllegalArgumentException("prescribed surface flux: need 0 <= sunrise < sunset <= 24 solar hours; got "
                        + sunriseSolarHours + " and " + sunsetSolarHours);
            }
            if (!(nightSensibleWm2 <= 0 && nightSensibleWm2 >= -200)) {
                throw new IllegalArgumentException("prescribed surface flux: night sensible heat flux must be in -200..0 W/m2; got "
                        + nightSensibleWm2);
            }
        }

        /** Land sensible heat flux at solar time t, W/m2. */
        public double landSensibleWm2(double timeSec) {
            double h = ((timeSec / 3600.0) % 24.0 + 24.0) % 24.0;
            if (h <= sunriseSolarHours || h >= sunsetSolarHours) {
                return nightSensibleWm2;
            }
            return Math.max(nightSensibleWm2,
                    peakLandSensibleWm2 * Math.sin(Math.PI * (h - sunriseSolarHours) / (sunsetSolarHours - sunriseSolarHours)));
        }
    }

    /**
     * Land fluxes from the surface energy balance driven by solar geometry (latitude, day of year, solar
     * time) and cloud fraction ({@link org.littoral.model.surface.ColumnSurfaceFluxes}); water fluxes from
     * bulk formulas with stability and the segment's sea-surface temperature.
     *
     * @param cloudFraction total cloud, 0..1
     * @param partition how land available energy splits into sensible and latent heat
     */
    record SurfaceEnergyBalance(double cloudFraction,
                                org.littoral.model.surface.SurfaceEnergyBalance.Partition partition) implements Forcing {
        public SurfaceEnergyBalance {
            if (!(cloudFraction >= 0 && cloudFraction <= 1)) {
                throw new IllegalArgumentException("surface energy balance: cloud fraction must be in 0..1; got " + cloudFraction);
            }
            if (partition == null) {
                throw new IllegalArgumentException("surface energy balance: choose a partition (BOWEN_RATIO or PRIESTLEY_TAYLOR)");
            }
        }
    }
}
