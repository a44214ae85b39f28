package org.littoral.model.nonlinear;

import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.surface.BulkFlux;
import org.littoral.model.surface.BulkFluxes;
import org.littoral.model.surface.ColumnSurfaceFluxes;
import org.littoral.model.thermo.Thermo;

/**
 * Where the surface heat and moisture fluxes and the drag come from: the kind of {@link Forcing}, picked once
 * by {@link #of}. The surface energy balance ({@link ColumnSurfaceFluxes}: solar geometry, net radiation,
 * bulk formulas) or, for the prescribed forcings, a prescribed land heat flux with a Bowen ratio and bulk
 * formulas with stability over water (no flux at all under prescribed heating or no forcing).
 */
abstract class SurfaceFluxScheme {
    final StaggeredGrid g;
    final BaseState base;

    private SurfaceFluxScheme(StaggeredGrid g, BaseState base) {
        this.g = g;
        this.base = base;
    }

    static SurfaceFluxScheme of(NonlinearConfig cfg, StaggeredGrid g, BaseState base) {
        if (cfg.forcing() instanceof Forcing.SurfaceEnergyBalance seb) {
            return new EnergyBalance(cfg, g, base, seb);
        }
        return new Prescribed(cfg, g, base);
    }

    /**
     * Fluxes of every column from the wind speed at the lowest level and the lowest row of th and q: kinematic
     * heat flux (K m/s), moisture flux (kg/kg m/s) and drag coefficient.
     */
    abstract void domain(double t, double[] wind, double[] th, double[] q, double[] heat, double[] moist, double[] cd);

    /** An evaluator for the surface of column i alone (the far field, the balanced start). */
    abstract Column column(int i);

    /** One column's surface: {kinematic heat flux, moisture flux, drag coefficient} into out. */
    interface Column {
        void compute(double t, double wind, double thetaAir, double qAir, double[] out);
    }

    /** The surface energy balance of each column. */
    private static final class EnergyBalance extends SurfaceFluxScheme {
        private final NonlinearConfig cfg;
        private final Forcing.SurfaceEnergyBalance seb;
        private final ColumnSurfaceFluxes all;
        private final double[] theta1;
        private final double[] q1;

        EnergyBalance(NonlinearConfig cfg, StaggeredGrid g, BaseState base, Forcing.SurfaceEnergyBalance seb) {
            super(g, base);
            this.cfg = cfg;
            this.seb = seb;
            this.all = new ColumnSurfaceFluxes(cfg.surface(), g.xc, cfg.coast(), seb.partition());
            this.theta1 = new double[g.nx];
            this.q1 = new double[g.nx];
        }

        @Override
        void domain(double t, double[] wind, double[] th, double[] q, double[] heat, double[] moist, double[] cd) {
            int nx = g.nx;
            System.arraycopy(th, 0, theta1, 0, nx);
            System.arraycopy(q, 0, q1, 0, nx);
            all.compute(t, seb.cloudFraction(), wind, g.zc[0], theta1, q1, base.surfacePressure);
            System.arraycopy(all.kinematicHeatFluxKMs(), 0, heat, 0, nx);
            System.arraycopy(all.kinematicMoistureFlux(), 0, moist, 0, nx);
            System.arraycopy(all.dragCoefficient(), 0, cd, 0, nx);
        }

        @Override
        Column column(int i) {
            ColumnSurfaceFluxes one = new ColumnSurfaceFluxes(cfg.surface(), new double[] {g.xc[i]}, cfg.coast(), seb.partition());
            double[] w1 = new double[1];
            double[] t1 = new double[1];
            double[] r1 = new double[1];
            return (t, wind, thetaAir, qAir, out) -> {
                w1[0] = wind;
                t1[0] = thetaAir;
                r1[0] = qAir;
                one.compute(t, seb.cloudFraction(), w1, g.zc[0], t1, r1, base.surfacePressure);
                out[0] = one.kinematicHeatFluxKMs()[0];
                out[1] = one.kinematicMoistureFlux()[0];
                out[2] = one.dragCoefficient()[0];
            };
        }
    }

    /**
     * A prescribed land heat flux (Bowen ratio for the moisture) and bulk formulas over water; under the other
     * forcings no flux, neutral drag.
     */
    private static final class Prescribed extends SurfaceFluxScheme {
        private final Forcing.PrescribedSurfaceFlux pf;
        private final SurfaceSegment[] segment;
        private final double[] fluxPair = new double[3];

        Prescribed(NonlinearConfig cfg, StaggeredGrid g, BaseState base) {
            super(g, base);
            this.pf = cfg.forcing() instanceof Forcing.PrescribedSurfaceFlux p ? p : null;
            segment = new SurfaceSegment[g.nx];
            for (int i = 0; i < g.nx; i++) {
                segment[i] = cfg.surface().at(g.xc[i]);
            }
        }

        @Override
        void domain(double t, double[] wind, double[] th, double[] q, double[] heat, double[] moist, double[] cd) {
            for (int i = 0; i < g.nx; i++) {
                fluxes(i, t, wind[i], th[i], q[i], fluxPair);
                heat[i] = fluxPair[0];
                moist[i] = fluxPair[1];
                cd[i] = fluxPair[2];
            }
        }

        @Override
        Column column(int i) {
            return (t, wind, thetaAir, qAir, out) -> fluxes(i, t, wind, thetaAir, qAir, out);
        }

        /**
         * {kinematic heat flux K m/s, moisture flux kg/kg m/s, drag coefficient} over column i's surface: water
         * from the bulk formulas with stability ({@link BulkFlux#overWater}), land drag from
         * {@link BulkFlux#withHeatFlux} (neutral when no flux is prescribed).
         */
        private void fluxes(int i, double t, double wind, double thetaAir, double qAir, double[] out) {
            SurfaceSegment seg = segment[i];
            if (pf == null) {
                out[0] = 0.0;
                out[1] = 0.0;
                out[2] = BulkFlux.neutral(wind, g.zc[0], seg.roughnessM()).dragCoefficient();
                return;
            }
            if (seg instanceof SurfaceSegment.Land l) {
                double hLand = pf.landSensibleWm2(t);
                out[0] = hLand / (base.surfaceRho * Thermo.CP);
                // Bowen ratio B = H / LE (e.g. Oke 1987): LE = H / B by day, no dew at night
                out[1] = hLand > 0 ? hLand / l.bowenRatio() / (base.surfaceRho * Thermo.LV) : 0.0;
                out[2] = BulkFlux.withHeatFlux(wind, g.zc[0], l.roughnessM(), out[0], thetaAir).dragCoefficient();
            } else {
                SurfaceSegment.Water wa = (SurfaceSegment.Water) seg;
                BulkFluxes bf = BulkFlux.overWater(wind, g.zc[0], wa.seaSurfaceTemperatureK(), thetaAir, Math.max(0.0, qAir),
                        base.surfacePressure, wa.roughnessM());
                out[0] = bf.kinematicHeatFluxKMs();
                out[1] = bf.kinematicMoistureFlux();
                out[2] = bf.dragCoefficient();
            }
        }
    }
}
