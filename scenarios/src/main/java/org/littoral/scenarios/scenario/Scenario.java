package org.littoral.scenarios.scenario;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.linear.HeatingSpec;
import org.littoral.model.linear.LinearConfig;
import org.littoral.model.nonlinear.CanonicalFlows;
import org.littoral.model.nonlinear.Forcing;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.ThetaProfile;
import org.littoral.model.surface.SurfaceEnergyBalance;
import org.littoral.model.sounding.FlightSchedule;
import org.littoral.model.sounding.SoundingSpec;
import org.littoral.model.sounding.VirtualSite;

/**
 * A validated scenario, in SI units and model types. Built by {@link ScenarioFile}; {@link #inputs()}
 * is the file as read with every default filled in (echoed into run summaries).
 *
 * @param heating the classic or slab heating; null when the land is heated by the surface energy balance
 *        ({@code energyBalance} is then given; kind nonlinear only)
 * @param energyBalance cloud and partition of {@code heating: shape: energy_balance}, else null
 */
public record Scenario(String name, String description, Kind kind, String source, Coast coast, SurfaceMap surface,
                       HorizontalGrid xGrid, VerticalGrid zGrid, Atmosphere atmosphere, AmbientWind ambientWind,
                       HeatingSpec heating, EnergyBalance energyBalance, Physics physics, List<VirtualSite> sites,
                       Flights flights, Output output, ObjectNode inputs) {

    /** Width of the far-field sponge at each end of the nonlinear model's periodic domain, m. */
    public static final double NONLINEAR_SPONGE_M = 50_000.0;
    /** Longest interval between the nonlinear model's stored snapshots, s (output times between are interpolated). */
    public static final double NONLINEAR_STORE_MAX_S = 600.0;

    /** Land heated by the surface energy balance (nonlinear model). */
    public record EnergyBalance(double cloudFraction, SurfaceEnergyBalance.Partition partition) {
    }

    /** Which model runs the scenario. */
    public enum Kind { LINEAR, NONLINEAR }

    /**
     * Basic state, SI.
     *
     * @param layers the layered sounding (mixed layer, inversion, free atmosphere with N = buoyancyFrequencyPerS), or
     *        null for constant N from the ground
     */
    public record Atmosphere(double surfaceThetaK, double buoyancyFrequencyPerS, double surfaceMixingRatio,
                             double mixingRatioGradientPerM, double surfacePressurePa, ThetaProfile layers) {

        /** The potential-temperature profile both models use. */
        public ThetaProfile thetaProfile() {
            return layers != null ? layers : new ThetaProfile.ConstantN(surfaceThetaK, buoyancyFrequencyPerS);
        }
    }

    /** Large-scale wind: speed and meteorological direction, with its model-axis components. */
    public record AmbientWind(double speedMPerS, double fromDeg, double crossShoreMPerS, double alongshoreMPerS) {
    }

    /** Model switches and damping, SI. */
    public record Physics(double frictionPerS, double coolingPerS, boolean hydrostatic, int harmonics) {
    }

    /** Flight plan: schedule plus how each ascent is binned. */
    public record Flights(FlightSchedule schedule, SoundingSpec sounding) {
    }

    /** Output times (local clock hours), near-surface height and onshore threshold. */
    public record Output(double startClockH, double endClockH, double stepMin, double nearSurfaceM,
                         double onshoreThresholdMPerS) {
        /** Output times in local clock hours (allocates). */
        public double[] clockHours() {
            int n = (int) Math.floor((endClockH - startClockH) / (stepMin / 60.0) + 1e-9) + 1;
            double[] t = new double[n];
            for (int k = 0; k < n; k++) {
                t[k] = startClockH + k * stepMin / 60.0;
            }
            return t;
        }
    }

    /** Hours before sunrise at which a nonlinear run starts at the latest (its balanced start, then the coast's adjustment). */
    public static final double NONLINEAR_LEAD_BEFORE_SUNRISE_H = 2.0;

    /**
     * Span of a nonlinear run, local solar hours: from the earliest of the first output time, the first launch and
     * {@link #NONLINEAR_LEAD_BEFORE_SUNRISE_H} before sunrise (so the run starts at night from its balanced boundary
     * layer and the coast has adjusted before the land heats) to the later of the last output time and the end of the
     * last ascent.
     */
    public double[] nonlinearSolarSpanHours() {
        List<Double> launches = flights.schedule().launchTimesClockHours();
        double startClock = output.startClockH();
        double endClock = output.endClockH();
        if (!launches.isEmpty()) {
            double ascentH = flights.sounding().ceilingM() / flights.sounding().ascentRateMPerS() / 3600.0;
            startClock = Math.min(startClock, launches.get(0));
            endClock = Math.max(endClock, launches.get(launches.size() - 1) + ascentH);
        }
        double start = Math.min(coast.solarHoursFromClock(startClock), sunriseSolarHours() - NONLINEAR_LEAD_BEFORE_SUNRISE_H);
        return new double[] {start, coast.solarHoursFromClock(endClock)};
    }

    /** When the land starts to heat, local solar hours: the heating's sunrise, or the sun's for the energy balance. */
    public double sunriseSolarHours() {
        if (heating instanceof HeatingSpec.SlabMixedLayer slab) {
            return slab.sunriseSolarHours();
        }
        if (heating instanceof HeatingSpec.ClassicShape c) {
            return c.sunriseSolarHours();
        }
        return org.littoral.model.surface.SolarGeometry.sunriseSolarHours(coast.latitudeDeg(),
                org.littoral.model.surface.SolarGeometry.declinationRad(coast.dayOfYear()));
    }

    /**
     * The nonlinear model's configuration for this scenario: the grid's levels are the layer interfaces,
     * the ambient wind is the geostrophic wind, friction and cooling are the Rayleigh and Newtonian
     * damping, and the heating becomes the model's forcing (energy balance, a prescribed half-sine land
     * flux for slab, the same heating rate for classic). Far-field sponges of {@link #NONLINEAR_SPONGE_M}
     * at each end; snapshots stored at the output step or {@link #NONLINEAR_STORE_MAX_S}, whichever is shorter.
     */
    public NonlinearConfig toNonlinearConfig() {
        return nonlinearBuilder(surface, xGrid, NONLINEAR_SPONGE_M).build();
    }

    private NonlinearConfig.Builder nonlinearBuilder(SurfaceMap map, HorizontalGrid xg, double spongeM) {
        double[] span = nonlinearSolarSpanHours();
        NonlinearConfig.Damping std = NonlinearConfig.Damping.standard();
        NonlinearConfig.BoundaryLayer bl = NonlinearConfig.BoundaryLayer.standard();
        Forcing forcing;
        if (energyBalance != null) {
            forcing = new Forcing.SurfaceEnergyBalance(energyBalance.cloudFraction(), energyBalance.partition());
        } else if (heating instanceof HeatingSpec.SlabMixedLayer slab) {
            forcing = new Forcing.PrescribedSurfaceFlux(slab.peakFluxDifferenceWm2(), slab.sunriseSolarHours(), slab.sunsetSolarHours(), 0.0);
            bl = new NonlinearConfig.BoundaryLayer(slab.entrainmentRatio(), Math.max(10.0, slab.initialDepthM()), bl.nightDepthM(),
                    bl.marineDepthM(), bl.backgroundDiffusivityM2PerS());
        } else {
            HeatingSpec.ClassicShape c = (HeatingSpec.ClassicShape) heating;
            forcing = new Forcing.PrescribedHeating(CanonicalFlows.classicPeriodicHeating(c.amplitudeKPerS(), c.halfWidthM(),
                    c.depthM(), c.sunriseSolarHours(), xg));
        }
        return NonlinearConfig.builder(coast, map, xg, zGrid)
                .theta(atmosphere.thetaProfile())
                .moisture(atmosphere.surfaceMixingRatio(), atmosphere.mixingRatioGradientPerM())
                .surfacePressurePa(atmosphere.surfacePressurePa())
                .geostrophicWind(ambientWind.speedMPerS(), ambientWind.fromDeg())
                .solarHours(span[0], span[1])
                .outputIntervalS(Math.min(NONLINEAR_STORE_MAX_S, output.stepMin() * 60.0))
                .forcing(forcing)
                .damping(std.withFrictionPerS(physics.frictionPerS()).withCoolingPerS(physics.coolingPerS())
                        .withLateralSponges(spongeM, std.lateralTimescaleS()))
                .boundaryLayer(bl);
    }

    /** The linear model's configuration for this scenario. */
    public LinearConfig toLinearConfig() {
        return new LinearConfig(coast, surface, xGrid, zGrid, atmosphere.buoyancyFrequencyPerS(), physics.frictionPerS(),
                physics.coolingPerS(), ambientWind.crossShoreMPerS(), physics.hydrostatic(), physics.harmonics(), heating,
                atmosphere.surfaceThetaK(), atmosphere.surfaceMixingRatio(), atmosphere.mixingRatioGradientPerM(),
                atmosphere.surfacePressurePa(), atmosphere.layers());
    }
}
