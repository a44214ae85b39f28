package org.littoral.model.coast;

/**
 * One stretch of surface along x, from {@code fromM} to {@code toM} (x increases inland; the first
 * segment may start at negative infinity and the last end at positive infinity).
 */
public sealed interface SurfaceSegment permits SurfaceSegment.Water, SurfaceSegment.Land {
    String name();

    double fromM();

    double toM();

    /** Aerodynamic roughness length, m. */
    double roughnessM();

    default boolean isLand() {
        return this instanceof Land;
    }

    default boolean contains(double xM) {
        return xM >= fromM() && xM < toM();
    }

    /**
     * Open water or a bay/lagoon.
     *
     * @param seaSurfaceTemperatureK water surface temperature
     * @param roughnessM roughness length (about 2e-4 m over open water, common practice)
     */
    record Water(String name, double fromM, double toM, double seaSurfaceTemperatureK, double roughnessM)
            implements SurfaceSegment {
        public Water {
            SurfaceMap.checkSpan(name, fromM, toM);
            if (!(seaSurfaceTemperatureK > 250 && seaSurfaceTemperatureK < 320)) {
                throw new IllegalArgumentException("segment '" + name + "': sea-surface temperature must be in 250..320 K; got "
                        + seaSurfaceTemperatureK);
            }
            if (!(roughnessM > 0 && roughnessM < 0.1)) {
                throw new IllegalArgumentException("segment '" + name + "': water roughness must be in (0, 0.1) m; got " + roughnessM);
            }
        }
    }

    /**
     * Land.
     *
     * @param albedo surface albedo, 0..1
     * @param bowenRatio sensible / latent heat flux ratio (Oke 1987: grassland ~0.5, semi-arid 2-6)
     * @param roughnessM roughness length, m
     * @param soilMoistureFraction soil moisture availability 0..1 (used when the energy balance is soil-moisture driven)
     */
    record Land(String name, double fromM, double toM, double albedo, double bowenRatio, double roughnessM,
                double soilMoistureFraction) implements SurfaceSegment {
        public Land {
            SurfaceMap.checkSpan(name, fromM, toM);
            if (!(albedo >= 0 && albedo <= 1)) {
                throw new IllegalArgumentException("segment '" + name + "': albedo must be in 0..1; got " + albedo);
            }
            if (!(bowenRatio > 0 && bowenRatio <= 20)) {
                throw new IllegalArgumentException("segment '" + name + "': Bowen ratio must be in (0, 20]; got " + bowenRatio);
            }
            if (!(roughnessM > 0 && roughnessM <= 5)) {
                throw new IllegalArgumentException("segment '" + name + "': land roughness must be in (0, 5] m; got " + roughnessM);
            }
            if (!(soilMoistureFraction >= 0 && soilMoistureFraction <= 1)) {
                throw new IllegalArgumentException("segment '" + name + "': soil moisture must be in 0..1; got " + soilMoistureFraction);
            }
        }
    }
}
