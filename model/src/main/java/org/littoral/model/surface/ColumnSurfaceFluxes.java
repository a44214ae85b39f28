package org.littoral.model.surface;

import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.thermo.Thermo;

/**
 * Surface fluxes for every column of a cross-shore grid, from the surface map: land columns from the
 * energy balance ({@link SurfaceEnergyBalance#land}) with drag from {@link BulkFlux#withHeatFlux}; water
 * columns from {@link BulkFlux#overWater} with the segment's sea-surface temperature.
 *
 * <p>Allocates its output arrays once, in the constructor; {@link #compute} allocates nothing, so it can
 * be called every time step. The arrays returned by the accessors are overwritten by each call.
 */
public final class ColumnSurfaceFluxes {
    private final SurfaceSegment[] segmentOfColumn;
    private final Coast coast;
    private final SurfaceEnergyBalance.Partition partition;
    private final double[] sensibleWm2;
    private final double[] latentWm2;
    private final double[] kinematicHeat;
    private final double[] kinematicMoisture;
    private final double[] uStar;
    private final double[] dragCoefficient;
    private final double[] netRadiationWm2;

    /**
     * @param map the surface along x
     * @param xM column positions, m (x positive inland)
     * @param coast latitude and day of year (for the sun)
     * @param partition how land available energy is split into H and LE
     */
    public ColumnSurfaceFluxes(SurfaceMap map, double[] xM, Coast coast, SurfaceEnergyBalance.Partition partition) {
        int n = xM.length;
        this.coast = coast;
        this.partition = partition;
        segmentOfColumn = new SurfaceSegment[n];
        for (int i = 0; i < n; i++) {
            segmentOfColumn[i] = map.at(xM[i]);
        }
        sensibleWm2 = new double[n];
        latentWm2 = new double[n];
        kinematicHeat = new double[n];
        kinematicMoisture = new double[n];
        uStar = new double[n];
        dragCoefficient = new double[n];
        netRadiationWm2 = new double[n];
    }

    /**
     * Fluxes at model time t from the air at the first level above the surface.
     *
     * @param modelTimeS seconds since solar midnight of day 0
     * @param cloudFraction total cloud 0..1
     * @param windSpeedMs wind speed at z_a per column
     * @param heightM z_a, height of the first level
     * @param thetaAirK potential temperature at z_a per column
     * @param mixingRatioAir mixing ratio at z_a per column, kg/kg
     * @param surfacePressurePa surface pressure
     */
    public void compute(double modelTimeS, double cloudFraction, double[] windSpeedMs, double heightM, double[] thetaAirK,
                        double[] mixingRatioAir, double surfacePressurePa) {
        int n = segmentOfColumn.length;
        if (windSpeedMs.length != n || thetaAirK.length != n || mixingRatioAir.length != n) {
            throw new IllegalArgumentException("air arrays must have one value per column (" + n + ")");
        }
        // the sun is the same for every column at one time
        double sinAlpha = SolarGeometry.sinElevationAt(coast, modelTimeS);
        double kDown = ClearSkyRadiation.globalWm2(sinAlpha, cloudFraction);
        for (int i = 0; i < n; i++) {
            SurfaceSegment s = segmentOfColumn[i];
            if (s instanceof SurfaceSegment.Water w) {
                BulkFluxes f = BulkFlux.overWater(windSpeedMs[i], heightM, w.seaSurfaceTemperatureK(), thetaAirK[i],
                        mixingRatioAir[i], surfacePressurePa, w.roughnessM());
                sensibleWm2[i] = f.sensibleHeatFluxWm2();
                latentWm2[i] = f.latentHeatFluxWm2();
                kinematicHeat[i] = f.kinematicHeatFluxKMs();
                kinematicMoisture[i] = f.kinematicMoistureFlux();
                uStar[i] = f.frictionVelocityMs();
                dragCoefficient[i] = f.dragCoefficient();
                netRadiationWm2[i] = Double.NaN;
            } else {
                SurfaceSegment.Land l = (SurfaceSegment.Land) s;
                double tAir = Thermo.temperatureFromPotentialK(thetaAirK[i], surfacePressurePa);
                EnergyBalance eb = SurfaceEnergyBalance.land(l, sinAlpha, kDown, cloudFraction, tAir, surfacePressurePa,
                        partition);
                double rho = Thermo.densityKgM3(surfacePressurePa, tAir, mixingRatioAir[i]);
                sensibleWm2[i] = eb.sensibleHeatFluxWm2();
                latentWm2[i] = eb.latentHeatFluxWm2();
                kinematicHeat[i] = eb.sensibleHeatFluxWm2() / (rho * Thermo.CP);
                kinematicMoisture[i] = eb.latentHeatFluxWm2() / (rho * Thermo.LV);
                Drag d = BulkFlux.withHeatFlux(windSpeedMs[i], heightM, l.roughnessM(), kinematicHeat[i], thetaAirK[i]);
                uStar[i] = d.frictionVelocityMs();
                dragCoefficient[i] = d.dragCoefficient();
                netRadiationWm2[i] = eb.netRadiationWm2();
            }
        }
    }

    /** H per column, W/m2 (upward positive). */
    public double[] sensibleHeatFluxWm2() {
        return sensibleWm2;
    }

    /** LE per column, W/m2 (upward positive). */
    public double[] latentHeatFluxWm2() {
        return latentWm2;
    }

    /** w'theta'_s per column, K m/s. */
    public double[] kinematicHeatFluxKMs() {
        return kinematicHeat;
    }

    /** w'r'_s per column, (kg/kg) m/s. */
    public double[] kinematicMoistureFlux() {
        return kinematicMoisture;
    }

    /** u* per column, m/s. */
    public double[] frictionVelocityMs() {
        return uStar;
    }

    /** C_D at z_a per column: surface stress is -C_D |U| (u, v) in kinematic units. */
    public double[] dragCoefficient() {
        return dragCoefficient;
    }

    /** Q* per land column, W/m2 (NaN over water, where it is not computed). */
    public double[] netRadiationWm2() {
        return netRadiationWm2;
    }

    /** Whether column i is land. */
    public boolean isLand(int i) {
        return segmentOfColumn[i].isLand();
    }
}
