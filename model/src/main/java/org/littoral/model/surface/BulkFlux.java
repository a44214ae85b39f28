package org.littoral.model.surface;

import org.littoral.model.thermo.Thermo;

/**
 * Bulk surface-layer transfer with stability.
 *
 * <p>Neutral drag from the logarithmic wind profile, C_DN = (kappa / ln(z_a / z0))^2. Over water the
 * neutral heat and moisture coefficients at 10 m are those of Large &amp; Pond (1982), J. Phys. Oceanogr.
 * 12, 464-482: C_HN = 1.13e-3, C_EN = 1.15e-3 (from memory, docs/references.md section 10), carried to
 * other heights through a scalar roughness length chosen to reproduce them at 10 m.
 *
 * <p>Stability: Louis (1979), Boundary-Layer Meteorol. 17, 187-202, functions of the bulk Richardson
 * number with the constants b = c = d = 5 of Louis, Tiedtke &amp; Geleyn (1982, ECMWF workshop on
 * planetary boundary layer parameterisation); structure and constants from memory:
 * <pre>
 * unstable (Ri &lt; 0): F_m = 1 - 2 b Ri / (1 + C |Ri|^1/2),  F_h = 1 - 3 b Ri / (1 + C |Ri|^1/2),
 *                    C = 3 b c C_DN (z_a / z0)^1/2
 * stable (Ri &gt;= 0): F_m = 1 / (1 + 2 b Ri / (1 + d Ri)^1/2),  F_h = 1 / (1 + 3 b Ri (1 + d Ri)^1/2)
 * </pre>
 * C_D = C_DN F_m, C_H = C_HN F_h, C_E = C_EN F_h.
 *
 * <p>Wind speeds below {@link #MIN_WIND_MS} are raised to it, a stated choice standing in for
 * sub-grid gustiness so that calm, unstable water still exchanges heat.
 */
public final class BulkFlux {
    /** von Karman constant. */
    public static final double KARMAN = 0.4;
    /** Large &amp; Pond (1982) neutral 10 m Stanton number (from memory). */
    public static final double WATER_CHN10 = 1.13e-3;
    /** Large &amp; Pond (1982) neutral 10 m Dalton number (from memory). */
    public static final double WATER_CEN10 = 1.15e-3;
    /** Saturation vapour pressure over sea water relative to pure water (salinity; Sverdrup et al. 1942, from memory). */
    public static final double SEA_WATER_VAPOUR_FACTOR = 0.98;
    /** Lowest wind speed used in the bulk formulas, m/s (stated choice: gustiness floor). */
    public static final double MIN_WIND_MS = 0.5;
    static final double LOUIS_B = 5.0;
    static final double LOUIS_C = 5.0;
    static final double LOUIS_D = 5.0;

    private BulkFlux() {
    }

    /** Neutral drag coefficient (kappa / ln(z_a / z0))^2 of the logarithmic wind law. */
    public static double neutralDragCoefficient(double heightM, double roughnessM) {
        if (!(roughnessM > 0 && heightM > roughnessM)) {
            throw new IllegalArgumentException("bulk formulas need 0 < roughness < height; got roughness " + roughnessM
                    + " m at height " + heightM + " m");
        }
        double l = Math.log(heightM / roughnessM);
        return KARMAN * KARMAN / (l * l);
    }

    /**
     * Neutral scalar transfer coefficient at z_a reproducing a 10 m neutral value C10 with momentum
     * roughness z0: kappa^2 / (ln(z_a/z0) ln(z_a/z0t)), ln(10/z0t) = kappa^2 / (C10 ln(10/z0)).
     */
    public static double neutralScalarCoefficient(double heightM, double roughnessM, double c10) {
        neutralDragCoefficient(heightM, roughnessM);
        double lm10 = Math.log(10.0 / roughnessM);
        double lt10 = KARMAN * KARMAN / (c10 * lm10);
        double lnZ0t = Math.log(10.0) - lt10;
        double lt = Math.log(heightM) - lnZ0t;
        return KARMAN * KARMAN / (Math.log(heightM / roughnessM) * lt);
    }

    /** Bulk Richardson number g z (theta_va - theta_vs) / (theta_v U^2), theta_v the mean of the two. */
    public static double bulkRichardson(double heightM, double thetaVAirK, double thetaVSurfaceK, double windMs) {
        double u = Math.max(windMs, MIN_WIND_MS);
        return Thermo.G * heightM * (thetaVAirK - thetaVSurfaceK) / (0.5 * (thetaVAirK + thetaVSurfaceK) * u * u);
    }

    /** Louis (1979) stability factor for momentum F_m(Ri). */
    public static double louisMomentumFactor(double ri, double heightM, double roughnessM) {
        if (ri < 0) {
            double c = 3.0 * LOUIS_B * LOUIS_C * neutralDragCoefficient(heightM, roughnessM) * Math.sqrt(heightM / roughnessM);
            return 1.0 - 2.0 * LOUIS_B * ri / (1.0 + c * Math.sqrt(-ri));
        }
        return 1.0 / (1.0 + 2.0 * LOUIS_B * ri / Math.sqrt(1.0 + LOUIS_D * ri));
    }

    /** Louis (1979) stability factor for heat and moisture F_h(Ri). */
    public static double louisHeatFactor(double ri, double heightM, double roughnessM) {
        if (ri < 0) {
            double c = 3.0 * LOUIS_B * LOUIS_C * neutralDragCoefficient(heightM, roughnessM) * Math.sqrt(heightM / roughnessM);
            return 1.0 - 3.0 * LOUIS_B * ri / (1.0 + c * Math.sqrt(-ri));
        }
        return 1.0 / (1.0 + 3.0 * LOUIS_B * ri * Math.sqrt(1.0 + LOUIS_D * ri));
    }

    /**
     * Fluxes over open water (sea-water vapour pressure lowered by 2 % for salinity).
     *
     * @param windMs wind speed at z_a
     * @param heightM z_a, height of the air values above the water
     * @param seaSurfaceTemperatureK water surface temperature
     * @param thetaAirK potential temperature at z_a (reference pressure {@link Thermo#P0})
     * @param mixingRatioAir water-vapour mixing ratio at z_a, kg/kg
     * @param surfacePressurePa surface pressure
     * @param roughnessM momentum roughness length of the water
     */
    public static BulkFluxes overWater(double windMs, double heightM, double seaSurfaceTemperatureK, double thetaAirK,
                                       double mixingRatioAir, double surfacePressurePa, double roughnessM) {
        return overWater(windMs, heightM, seaSurfaceTemperatureK, thetaAirK, mixingRatioAir, surfacePressurePa, roughnessM,
                SEA_WATER_VAPOUR_FACTOR);
    }

    /**
     * Fluxes over water with a stated vapour-pressure factor (0.98 for sea water, 1.0 for fresh water).
     * See {@link #overWater(double, double, double, double, double, double, double)}.
     */
    public static BulkFluxes overWater(double windMs, double heightM, double seaSurfaceTemperatureK, double thetaAirK,
                                       double mixingRatioAir, double surfacePressurePa, double roughnessM,
                                       double vapourFactor) {
        double u = Math.max(Math.abs(windMs), MIN_WIND_MS);
        double thetaS = Thermo.potentialTemperatureK(seaSurfaceTemperatureK, surfacePressurePa);
        double rS = Thermo.mixingRatio(vapourFactor * Thermo.saturationVapourPressurePa(seaSurfaceTemperatureK),
                surfacePressurePa);
        double ri = bulkRichardson(heightM, Thermo.virtualPotentialTemperatureK(thetaAirK, mixingRatioAir),
                Thermo.virtualPotentialTemperatureK(thetaS, rS), u);
        double cd = neutralDragCoefficient(heightM, roughnessM) * louisMomentumFactor(ri, heightM, roughnessM);
        double fh = louisHeatFactor(ri, heightM, roughnessM);
        double ch = neutralScalarCoefficient(heightM, roughnessM, WATER_CHN10) * fh;
        double ce = neutralScalarCoefficient(heightM, roughnessM, WATER_CEN10) * fh;
        double tAir = Thermo.temperatureFromPotentialK(thetaAirK, surfacePressurePa);
        double rho = Thermo.densityKgM3(surfacePressurePa, tAir, mixingRatioAir);
        double wt = ch * u * (thetaS - thetaAirK);
        double wr = ce * u * (rS - mixingRatioAir);
        return new BulkFluxes(Math.sqrt(cd) * u, rho * cd * u * u, rho * Thermo.CP * wt, rho * Thermo.LV * wr, wt, wr,
                cd, ch, ce, ri, rho);
    }

    /**
     * Drag with stability over a surface whose kinematic heat flux is known (land, where H comes from
     * the energy balance and the surface temperature is not carried). The bulk Richardson number is
     * the one consistent with that flux under the same Louis (1979) functions, Louis assuming equal
     * momentum and heat roughness:
     * Ri = -g z_a w'theta' / (theta C_DN F_h(Ri) U^3), solved by bisection. When a downward flux is
     * larger than the wind can carry (no stable root), the Richardson number of the largest carried
     * flux is used: the surface layer is then close to decoupling.
     *
     * @param kinematicHeatFluxKMs w'theta'_s, K m/s (positive upward)
     * @param thetaAirK potential temperature at z_a
     */
    public static Drag withHeatFlux(double windMs, double heightM, double roughnessM, double kinematicHeatFluxKMs,
                                    double thetaAirK) {
        double u = Math.max(Math.abs(windMs), MIN_WIND_MS);
        double cdn = neutralDragCoefficient(heightM, roughnessM);
        double k = Thermo.G * heightM * kinematicHeatFluxKMs / (thetaAirK * cdn * u * u * u);
        double ri = consistentRichardson(k, heightM, roughnessM);
        double cd = cdn * louisMomentumFactor(ri, heightM, roughnessM);
        return new Drag(cd, Math.sqrt(cd) * u, ri);
    }

    /** Neutral drag (no stability correction): the land-water friction contrast alone. */
    public static Drag neutral(double windMs, double heightM, double roughnessM) {
        double u = Math.max(Math.abs(windMs), MIN_WIND_MS);
        double cd = neutralDragCoefficient(heightM, roughnessM);
        return new Drag(cd, Math.sqrt(cd) * u, 0.0);
    }

    /** Root of g(Ri) = Ri + k / F_h(Ri) (see {@link #withHeatFlux}). */
    static double consistentRichardson(double k, double heightM, double roughnessM) {
        if (k == 0) {
            return 0.0;
        }
        // F_h of louisHeatFactor with its unstable-branch constant evaluated once for the whole search
        // (the same arithmetic, so the same root to the last bit)
        double cUnstable = 3.0 * LOUIS_B * LOUIS_C * neutralDragCoefficient(heightM, roughnessM) * Math.sqrt(heightM / roughnessM);
        if (k > 0) {
            // Unstable: g is increasing, g(0) = k > 0 and g(-k) <= 0 because F_h >= 1 there.
            double lo = -k;
            double hi = 0.0;
            for (int i = 0; i < 60; i++) {
                double mid = 0.5 * (lo + hi);
                if (mid + k / louisHeatFactor(mid, cUnstable) > 0) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            return 0.5 * (lo + hi);
        }
        // Stable: g(0) = k < 0; walk out geometrically to the first sign change (the weakly stable branch).
        double prev = 0.0;
        double best = 0.0;
        double bestG = k;
        for (double ri = 1e-4; ri <= 10.0; ri *= 1.25) {
            double g = ri + k / louisHeatFactor(ri, cUnstable);
            if (g > 0) {
                double lo = prev;
                double hi = ri;
                for (int i = 0; i < 60; i++) {
                    double mid = 0.5 * (lo + hi);
                    if (mid + k / louisHeatFactor(mid, cUnstable) > 0) {
                        hi = mid;
                    } else {
                        lo = mid;
                    }
                }
                return 0.5 * (lo + hi);
            }
            if (g > bestG) {
                bestG = g;
                best = ri;
            }
            prev = ri;
        }
        return best;
    }

    /** {@link #louisHeatFactor(double, double, double)} given its unstable-branch constant c. */
    private static double louisHeatFactor(double ri, double cUnstable) {
        if (ri < 0) {
            return 1.0 - 3.0 * LOUIS_B * ri / (1.0 + cUnstable * Math.sqrt(-ri));
        }
        return 1.0 / (1.0 + 3.0 * LOUIS_B * ri * Math.sqrt(1.0 + LOUIS_D * ri));
    }
}
