package org.littoral.model.nonlinear;

import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

/**
 * Everything the nonlinear breeze model needs. Build one with {@link #builder}; every setting has a
 * default suitable for a mid-latitude sea breeze except the coast, the surface map and the grids.
 *
 * @param coast latitude (sets f = 2 Omega sin(lat)), orientation (turns the geostrophic wind into model axes)
 * @param surface land and water segments along x
 * @param xGrid periodic cross-shore grid of cell centres; use a domain much wider than the breeze,
 *        with {@link Damping#lateralSpongeWidthM} of far field at each end; nx with small prime factors
 * @param zInterfaces layer interfaces from the ground (0 m) to the rigid lid; scalars, u and v live
 *        at mid-layer, and snapshots are given there (so nz = levels - 1)
 * @param theta background potential temperature theta_0(z)
 * @param surfaceMixingRatio background water-vapour mixing ratio at the ground, kg/kg
 * @param mixingRatioGradientPerM background d r / dz, kg/kg per m (negative: drier aloft; clipped at 1e-5 kg/kg)
 * @param surfacePressurePa background surface pressure
 * @param geostrophicSpeedMPerS speed of the geostrophic (ambient) wind
 * @param geostrophicDirectionFromDeg meteorological direction the geostrophic wind blows from, deg
 * @param startSolarHours start of the run, local solar hours (may exceed 24 for later days)
 * @param endSolarHours end of the run, local solar hours
 * @param outputIntervalS interval between stored snapshots, s (steps are shortened to land on them)
 * @param forcing heating or surface fluxes
 * @param switches mechanism switches (nonlinear terms, mixing, moisture buoyancy)
 * @param damping Rayleigh friction / Newtonian cooling, damping layer aloft, lateral sponges
 * @param boundaryLayer slab mixed layer and K-profile settings
 * @param numerics step control and blow-up limits
 * @param initialThetaPerturbationK theta - theta_0 at the start, K (tests; usually zero)
 * @param initialUPerturbationMPerS u - Ug at the start, m/s (tests; usually zero)
 * @param initialMixingRatioPerturbation r - r_0 at the start, kg/kg (tests; usually zero)
 * @param initialWind the wind the run starts from (null: {@link InitialWind#BALANCED_BOUNDARY_LAYER})
 */
public record NonlinearConfig(Coast coast, SurfaceMap surface, HorizontalGrid xGrid, VerticalGrid zInterfaces,
                              ThetaProfile theta, double surfaceMixingRatio, double mixingRatioGradientPerM,
                              double surfacePressurePa, double geostrophicSpeedMPerS, double geostrophicDirectionFromDeg,
                              double startSolarHours, double endSolarHours, double outputIntervalS, Forcing forcing,
                              Switches switches, Damping damping, BoundaryLayer boundaryLayer, Numerics numerics,
                              ScalarField initialThetaPerturbationK, ScalarField initialUPerturbationMPerS,
                              ScalarField initialMixingRatioPerturbation, InitialWind initialWind) {

    public NonlinearConfig {
        if (coast == null || surface == null || xGrid == null || zInterfaces == null || theta == null || forcing == null
                || switches == null || damping == null || boundaryLayer == null || numerics == null) {
            throw new IllegalArgumentException("nonlinear model: coast, surface, grids, theta, forcing, switches, damping, "
                    + "boundaryLayer and numerics must all be given");
        }
        if (!(endSolarHours > startSolarHours)) {
            throw new IllegalArgumentException("nonlinear model: end (" + endSolarHours + " solar h) must be after start ("
                    + startSolarHours + " solar h)");
        }
        if (!(outputIntervalS > 0)) {
            throw new IllegalArgumentException("nonlinear model: output interval must be positive; got " + outputIntervalS + " s");
        }
        if (!(geostrophicSpeedMPerS >= 0 && geostrophicSpeedMPerS <= 40)) {
            throw new IllegalArgumentException("nonlinear model: geostrophic wind speed must be in 0..40 m/s; got " + geostrophicSpeedMPerS);
        }
        if (!(surfaceMixingRatio >= 0 && surfaceMixingRatio < 0.05)) {
            throw new IllegalArgumentException("nonlinear model: surface mixing ratio must be in 0..0.05 kg/kg; got " + surfaceMixingRatio);
        }
        if (!(surfacePressurePa > 50000 && surfacePressurePa < 110000)) {
            throw new IllegalArgumentException("nonlinear model: surface pressure must be in 50000..110000 Pa; got " + surfacePressurePa);
        }
        if (damping.lateralSpongeWidthM() * 2 >= xGrid.lengthM()) {
            throw new IllegalArgumentException("nonlinear model: the two lateral sponges (" + damping.lateralSpongeWidthM()
                    + " m each) do not fit in the " + xGrid.lengthM() + " m domain; narrow them or widen the domain");
        }
        if (initialThetaPerturbationK == null) {
            initialThetaPerturbationK = ScalarField.ZERO;
        }
        if (initialUPerturbationMPerS == null) {
            initialUPerturbationMPerS = ScalarField.ZERO;
        }
        if (initialMixingRatioPerturbation == null) {
            initialMixingRatioPerturbation = ScalarField.ZERO;
        }
        if (initialWind == null) {
            initialWind = InitialWind.BALANCED_BOUNDARY_LAYER;
        }
    }

    /** The wind a run starts from (before any {@code initialUPerturbationMPerS}). */
    public enum InitialWind {
        /**
         * Each column starts in the steady boundary layer of its surface: the geostrophic wind slowed and turned
         * by the surface drag and the turbulent mixing of the start time, where Coriolis, drag and mixing balance
         * (the steady Ekman layer, Ekman 1905, solved on the model's own levels with its own K-profile and drag;
         * {@link EkmanBalance}). The far-field columns that feed the sponges start from the same state. Without
         * mixing this is the geostrophic wind.
         */
        BALANCED_BOUNDARY_LAYER,
        /** The geostrophic wind (Ug, Vg) at every level: a near-surface wind out of balance with the drag. */
        GEOSTROPHIC
    }

    /** Geostrophic wind in model axes: {Ug (cross-shore, onshore +), Vg (alongshore +y)}, via {@link Coast}. */
    public double[] geostrophicModelComponents() {
        if (geostrophicSpeedMPerS == 0) {
            return new double[] {0.0, 0.0};
        }
        double[] en = Coast.eastNorthFromDirection(geostrophicSpeedMPerS, geostrophicDirectionFromDeg);
        return new double[] {coast.crossShore(en[0], en[1]), coast.alongshore(en[0], en[1])};
    }

    /**
     * Mechanism switches.
     *
     * @param nonlinearTerms false: advection only by the uniform ambient cross-shore wind Ug (and
     *        -w d theta_0/dz), so the model solves the linear equations of the linear spectral model
     * @param mixing false: no turbulent mixing and no surface drag; surface heat and moisture fluxes
     *        then go into the lowest layer
     * @param moistureBuoyancy true: buoyancy includes the virtual effect 0.608 g (r - r_0)
     */
    public record Switches(boolean nonlinearTerms, boolean mixing, boolean moistureBuoyancy) {
        public static Switches full() {
            return new Switches(true, true, true);
        }

        /** The linear model's equations: no nonlinear advection, no mixing, dry buoyancy. */
        public static Switches linearEquations() {
            return new Switches(false, false, false);
        }
    }

    /**
     * Damping.
     *
     * @param rayleighFrictionPerS alpha of linear theory applied to u - Ug, v - Vg and w (0 = none)
     * @param newtonianCoolingPerS rate applied to theta - theta_0 and r - r_0 (0 = none)
     * @param topLayerFraction fraction of the depth, from the lid down, with Rayleigh damping toward the
     *        ambient state (0 disables); coefficient rising as sin^2 (Klemp &amp; Lilly 1978; Durran &amp; Klemp 1983)
     * @param topTimescaleS damping e-folding time at the lid
     * @param lateralSpongeWidthM width of the far-field sponge at each end of the periodic domain (0 disables)
     * @param lateralTimescaleS damping time at the domain ends; the sponge relaxes u, v, w toward (Ug, Vg, 0)
     *        and theta, r toward a single-column model of the far field over that end's surface (same
     *        surface fluxes, mixed layer and mixing, no circulation)
     */
    public record Damping(double rayleighFrictionPerS, double newtonianCoolingPerS, double topLayerFraction,
                          double topTimescaleS, double lateralSpongeWidthM, double lateralTimescaleS) {
        public Damping {
            if (!(rayleighFrictionPerS >= 0 && newtonianCoolingPerS >= 0)) {
                throw new IllegalArgumentException("damping: Rayleigh friction and Newtonian cooling must be >= 0; got "
                        + rayleighFrictionPerS + " and " + newtonianCoolingPerS + " 1/s");
            }
            if (!(topLayerFraction >= 0 && topLayerFraction < 0.8)) {
                throw new IllegalArgumentException("damping: top damping layer fraction must be in 0..0.8; got " + topLayerFraction);
            }
            if (!(topTimescaleS > 0 && lateralTimescaleS > 0)) {
                throw new IllegalArgumentException("damping: timescales must be positive; got " + topTimescaleS + " and "
                        + lateralTimescaleS + " s");
            }
            if (!(lateralSpongeWidthM >= 0)) {
                throw new IllegalArgumentException("damping: lateral sponge width must be >= 0; got " + lateralSpongeWidthM + " m");
            }
        }

        /** A damping layer over the top 30 % (300 s) and 50 km lateral sponges (600 s); no friction or cooling. */
        public static Damping standard() {
            return new Damping(0.0, 0.0, 0.3, 300.0, 50_000.0, 600.0);
        }

        /** No friction, no cooling, no damping layer and no lateral sponges (timescales kept at 300 s and 600 s). */
        public static Damping none() {
            return new Damping(0.0, 0.0, 0.0, 300.0, 0.0, 600.0);
        }

        /** This damping with Rayleigh friction alpha on the winds, 1/s. */
        public Damping withFrictionPerS(double alpha) {
            return new Damping(alpha, newtonianCoolingPerS, topLayerFraction, topTimescaleS, lateralSpongeWidthM, lateralTimescaleS);
        }

        /** This damping with Newtonian cooling alpha_N on theta and r, 1/s. */
        public Damping withCoolingPerS(double alphaN) {
            return new Damping(rayleighFrictionPerS, alphaN, topLayerFraction, topTimescaleS, lateralSpongeWidthM, lateralTimescaleS);
        }

        /** This damping with a damping layer over the top fraction of the domain at the given timescale. */
        public Damping withTopLayer(double fraction, double timescaleS) {
            return new Damping(rayleighFrictionPerS, newtonianCoolingPerS, fraction, timescaleS, lateralSpongeWidthM, lateralTimescaleS);
        }

        /** This damping with lateral sponges of the given width at each end and timescale (width 0: none). */
        public Damping withLateralSponges(double widthM, double timescaleS) {
            return new Damping(rayleighFrictionPerS, newtonianCoolingPerS, topLayerFraction, topTimescaleS, widthM, timescaleS);
        }
    }

    /**
     * Slab mixed layer and K-profile.
     *
     * @param entrainmentRatio A of the zero-order-jump growth (0.2 usual; Tennekes 1973)
     * @param initialDepthM h at the start over land, m
     * @param nightDepthM depth the land layer collapses to when the surface heat flux turns negative, m
     * @param marineDepthM depth of the shallow marine layer over water, m
     * @param backgroundDiffusivityM2PerS K above the mixed layer, m2/s
     */
    public record BoundaryLayer(double entrainmentRatio, double initialDepthM, double nightDepthM, double marineDepthM,
                                double backgroundDiffusivityM2PerS) {
        public BoundaryLayer {
            if (!(entrainmentRatio >= 0 && entrainmentRatio <= 1)) {
                throw new IllegalArgumentException("boundary layer: entrainment ratio must be in 0..1; got " + entrainmentRatio);
            }
            if (!(initialDepthM >= 10 && nightDepthM >= 10 && marineDepthM >= 10)) {
                throw new IllegalArgumentException("boundary layer: initial, night and marine depths must be >= 10 m; got "
                        + initialDepthM + ", " + nightDepthM + ", " + marineDepthM + " m");
            }
            if (!(backgroundDiffusivityM2PerS >= 0 && backgroundDiffusivityM2PerS <= 50)) {
                throw new IllegalArgumentException("boundary layer: background diffusivity must be in 0..50 m2/s; got "
                        + backgroundDiffusivityM2PerS);
            }
        }

        public static BoundaryLayer standard() {
            return new BoundaryLayer(0.2, 100.0, 100.0, 200.0, 0.5);
        }
    }

    /**
     * How potential temperature and mixing ratio are advected in the nonlinear model (the linear mode
     * always uses the limited-slope scheme with the ambient wind).
     */
    public enum ScalarTransport {
        /**
         * Second-order upwind fluxes with the monotonised-central slope limiter (van Leer 1977) in every
         * Runge-Kutta stage: monotone for Courant sums up to 0.5.
         */
        LIMITED_STAGES,
        /**
         * Third-order upwind-biased fluxes (Wicker &amp; Skamarock 2002) in the stages, then a flux-corrected
         * transport limiter (Zalesak 1979, in two dimensions) on the step's time-averaged flux against a
         * first-order upwind solution (final-stage limiting, Skamarock 2006): monotone and positive for
         * Courant sums up to about 1.
         */
        FCT_STEP
    }

    /**
     * Step control.
     *
     * @param courantNumber target of max(|u| dt/dx + |w| dt/dz): 1.0 by default with {@link ScalarTransport#FCT_STEP},
     *        at most 0.5 for {@link ScalarTransport#LIMITED_STAGES} to keep it monotone
     * @param buoyancyStepFactor dt &lt;= factor / N_max (gravity-wave limit) and factor / |f| (inertial)
     * @param maxStepS largest step allowed, s
     * @param blowUpWindMPerS |u|, |v| or |w| above this stops the run with {@link ModelBlowUpException}
     * @param scalarTransport the advection scheme of theta and mixing ratio
     */
    public record Numerics(double courantNumber, double buoyancyStepFactor, double maxStepS, double blowUpWindMPerS,
                           ScalarTransport scalarTransport) {
        public Numerics {
            if (!(courantNumber > 0 && courantNumber <= 1.2)) {
                throw new IllegalArgumentException("numerics: Courant number must be in (0, 1.2]; got " + courantNumber);
            }
            if (!(buoyancyStepFactor > 0 && buoyancyStepFactor <= 1.7)) {
                throw new IllegalArgumentException("numerics: buoyancy step factor must be in (0, 1.7]; got " + buoyancyStepFactor);
            }
            if (!(maxStepS > 0)) {
                throw new IllegalArgumentException("numerics: maximum step must be positive; got " + maxStepS + " s");
            }
            if (!(blowUpWindMPerS > 0)) {
                throw new IllegalArgumentException("numerics: blow-up wind limit must be positive; got " + blowUpWindMPerS);
            }
            if (scalarTransport == null) {
                throw new IllegalArgumentException("numerics: scalar transport must be LIMITED_STAGES or FCT_STEP; got null");
            }
        }

        /** Step control with the default scalar transport, {@link ScalarTransport#FCT_STEP}. */
        public Numerics(double courantNumber, double buoyancyStepFactor, double maxStepS, double blowUpWindMPerS) {
            this(courantNumber, buoyancyStepFactor, maxStepS, blowUpWindMPerS, ScalarTransport.FCT_STEP);
        }

        /** Courant sum 1.0, flux-corrected scalar transport. */
        public static Numerics standard() {
            return new Numerics(1.0, 1.0, 300.0, 80.0, ScalarTransport.FCT_STEP);
        }

        /** The earlier scheme: limited slopes in every stage at Courant sum 0.5 (twice the steps). */
        public static Numerics limitedStages() {
            return new Numerics(0.5, 1.0, 300.0, 80.0, ScalarTransport.LIMITED_STAGES);
        }
    }

    public static Builder builder(Coast coast, SurfaceMap surface, HorizontalGrid xGrid, VerticalGrid zInterfaces) {
        return new Builder(coast, surface, xGrid, zInterfaces);
    }

    /** Builder with defaults: N = 0.01 1/s from 300 K, 8 g/kg at the ground drying 2 g/kg per km, calm, 6-18 solar h. */
    public static final class Builder {
        private final Coast coast;
        private final SurfaceMap surface;
        private final HorizontalGrid xGrid;
        private final VerticalGrid zInterfaces;
        private ThetaProfile theta = new ThetaProfile.ConstantN(300.0, 0.01);
        private double surfaceMixingRatio = 0.008;
        private double mixingRatioGradientPerM = -2e-6;
        private double surfacePressurePa = 101325.0;
        private double geostrophicSpeed = 0.0;
        private double geostrophicFromDeg = 0.0;
        private double startSolarHours = 6.0;
        private double endSolarHours = 18.0;
        private double outputIntervalS = 600.0;
        private Forcing forcing = new Forcing.PrescribedSurfaceFlux(250.0, 6.0, 18.0, 0.0);
        private Switches switches = Switches.full();
        private Damping damping = Damping.standard();
        private BoundaryLayer boundaryLayer = BoundaryLayer.standard();
        private Numerics numerics = Numerics.standard();
        private ScalarField thetaPerturbation = ScalarField.ZERO;
        private ScalarField uPerturbation = ScalarField.ZERO;
        private ScalarField rPerturbation = ScalarField.ZERO;
        private InitialWind initialWind = InitialWind.BALANCED_BOUNDARY_LAYER;

        private Builder(Coast coast, SurfaceMap surface, HorizontalGrid xGrid, VerticalGrid zInterfaces) {
            this.coast = coast;
            this.surface = surface;
            this.xGrid = xGrid;
            this.zInterfaces = zInterfaces;
        }

        public Builder theta(ThetaProfile p) {
            this.theta = p;
            return this;
        }

        public Builder moisture(double surfaceMixingRatio, double gradientPerM) {
            this.surfaceMixingRatio = surfaceMixingRatio;
            this.mixingRatioGradientPerM = gradientPerM;
            return this;
        }

        public Builder surfacePressurePa(double p) {
            this.surfacePressurePa = p;
            return this;
        }

        public Builder geostrophicWind(double speedMPerS, double directionFromDeg) {
            this.geostrophicSpeed = speedMPerS;
            this.geostrophicFromDeg = directionFromDeg;
            return this;
        }

        public Builder solarHours(double start, double end) {
            this.startSolarHours = start;
            this.endSolarHours = end;
            return this;
        }

        public Builder outputIntervalS(double s) {
            this.outputIntervalS = s;
            return this;
        }

        public Builder forcing(Forcing f) {
            this.forcing = f;
            return this;
        }

        public Builder switches(Switches s) {
            this.switches = s;
            return this;
        }

        public Builder damping(Damping d) {
            this.damping = d;
            return this;
        }

        public Builder boundaryLayer(BoundaryLayer b) {
            this.boundaryLayer = b;
            return this;
        }

        public Builder numerics(Numerics n) {
            this.numerics = n;
            return this;
        }

        public Builder initialThetaPerturbation(ScalarField f) {
            this.thetaPerturbation = f;
            return this;
        }

        public Builder initialUPerturbation(ScalarField f) {
            this.uPerturbation = f;
            return this;
        }

        public Builder initialMixingRatioPerturbation(ScalarField f) {
            this.rPerturbation = f;
            return this;
        }

        public Builder initialWind(InitialWind w) {
            this.initialWind = w;
            return this;
        }

        public NonlinearConfig build() {
            return new NonlinearConfig(coast, surface, xGrid, zInterfaces, theta, surfaceMixingRatio, mixingRatioGradientPerM,
                    surfacePressurePa, geostrophicSpeed, geostrophicFromDeg, startSolarHours, endSolarHours, outputIntervalS,
                    forcing, switches, damping, boundaryLayer, numerics, thetaPerturbation, uPerturbation, rPerturbation,
                    initialWind);
        }
    }
}
