package org.littoral.model.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.field.Snapshot;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

class LinearBreezeModelTest {
    private static final double NOON = 12 * 3600.0;

    private static double maxAbs(double[] a) {
        double m = 0;
        for (double v : a) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    @Test
    void verticalVelocityVanishesAtTheGround() {
        LinearSolution s = LinearBreezeModel.solve(LinearTestConfigs.classic45(2e-4));
        Snapshot sn = s.snapshotAt(15 * 3600.0);
        double wmax = maxAbs(sn.wMPerS());
        assertTrue(wmax > 1e-3, "there is a circulation");
        for (int i = 0; i < sn.nx(); i++) {
            assertEquals(0.0, sn.wMPerS()[i], 1e-12 * wmax);
        }
    }

    @Test
    void zeroHeatingGivesTheBackgroundStateExactly() {
        LinearSolution s = LinearBreezeModel.solve(LinearTestConfigs.classic45(0.0));
        Snapshot sn = s.snapshotAt(NOON);
        for (int k = 0; k < sn.nz(); k++) {
            for (int i = 0; i < sn.nx(); i++) {
                int j = sn.index(k, i);
                assertEquals(0.0, sn.uMPerS()[j]);
                assertEquals(0.0, sn.wMPerS()[j]);
                assertEquals(s.background().thetaK()[k], sn.thetaK()[j]);
                assertEquals(0.0, sn.pressurePerturbationPa()[j]);
            }
        }
    }

    @Test
    void doublingTheHeatingDoublesTheResponse() {
        Snapshot a = LinearBreezeModel.solve(LinearTestConfigs.classic45(1e-4)).snapshotAt(NOON);
        Snapshot b = LinearBreezeModel.solve(LinearTestConfigs.classic45(2e-4)).snapshotAt(NOON);
        double umax = maxAbs(a.uMPerS());
        assertTrue(umax > 0.1);
        for (int j = 0; j < a.uMPerS().length; j++) {
            assertEquals(2 * a.uMPerS()[j], b.uMPerS()[j], 1e-10 * umax);
            assertEquals(2 * a.vMPerS()[j], b.vMPerS()[j], 1e-10 * umax);
        }
    }

    @Test
    void alongshoreWindChangesSignWithTheHemisphereAndCrossShoreWindDoesNot() {
        HeatingSpec heat = LinearTestConfigs.classic(2e-4, 10e3, 1000);
        LinearSolution north = LinearBreezeModel.solve(LinearTestConfigs.config(40, heat, 256, 4000, 21, 4000, 1e-5, 0, true, 1));
        LinearSolution south = LinearBreezeModel.solve(LinearTestConfigs.config(-40, heat, 256, 4000, 21, 4000, 1e-5, 0, true, 1));
        Snapshot n = north.snapshotAt(16 * 3600.0);
        Snapshot s = south.snapshotAt(16 * 3600.0);
        double vmax = maxAbs(n.vMPerS());
        assertTrue(vmax > 0.1);
        for (int j = 0; j < n.vMPerS().length; j++) {
            assertEquals(-n.vMPerS()[j], s.vMPerS()[j], 1e-10 * vmax);
            assertEquals(n.uMPerS()[j], s.uMPerS()[j], 1e-10 * vmax);
        }
    }

    @Test
    void hydrostaticAndNonHydrostaticAgreeAtLongWavelengths() {
        // coastal transition 60 km wide against N H / omega ~ 140 km: k^2 omega^2/N^2 is tiny for every forced mode
        HeatingSpec heat = LinearTestConfigs.classic(2e-4, 60e3, 1000);
        Snapshot h = LinearBreezeModel.solve(LinearTestConfigs.config(20, heat, 256, 8000, 21, 4000, 1e-5, 0, true, 1))
                .snapshotAt(15 * 3600.0);
        Snapshot nh = LinearBreezeModel.solve(LinearTestConfigs.config(20, heat, 256, 8000, 21, 4000, 1e-5, 0, false, 1))
                .snapshotAt(15 * 3600.0);
        double umax = maxAbs(h.uMPerS());
        for (int j = 0; j < h.uMPerS().length; j++) {
            assertEquals(h.uMPerS()[j], nh.uMPerS()[j], 1e-3 * umax);
        }
    }

    @Test
    void shortCoastalTransitionMakesTheNonHydrostaticResponseDiffer() {
        // with U = 10 m/s the Doppler-shifted frequency k U reaches N for 6 km waves, which a 1 km coast forces:
        // then eps D^2 psi_xx matters and the two forms must differ (so the check above is not vacuous)
        HeatingSpec heat = LinearTestConfigs.classic(2e-4, 1000, 300);
        Snapshot h = LinearBreezeModel.solve(LinearTestConfigs.config(20, heat, 512, 500, 21, 2000, 1e-5, 10, true, 1))
                .snapshotAt(15 * 3600.0);
        Snapshot nh = LinearBreezeModel.solve(LinearTestConfigs.config(20, heat, 512, 500, 21, 2000, 1e-5, 10, false, 1))
                .snapshotAt(15 * 3600.0);
        double diff = 0;
        for (int j = 0; j < h.wMPerS().length; j++) {
            diff = Math.max(diff, Math.abs(h.wMPerS()[j] - nh.wMPerS()[j]));
        }
        assertTrue(diff > 0.05 * maxAbs(h.wMPerS()), "difference " + diff + " of " + maxAbs(h.wMPerS()));
    }

    @Test
    void columnsLevelsAndSnapshotsAgree() {
        HeatingSpec slab = new HeatingSpec.SlabMixedLayer(200, 6, 18, 0.005, 0.2, 100, 10e3);
        LinearSolution s = LinearBreezeModel.solve(LinearTestConfigs.config(35, slab, 256, 2000, 31, 3000, 1e-5, -3, true, 8));
        double t = 14.5 * 3600;
        Snapshot sn = s.snapshotAt(t);
        int i = 140;
        Snapshot col = s.columnAtIndex(i, t);
        double[] lev = s.crossShoreWindAtLevel(2, t);
        assertEquals(sn.u(2, i), lev[i], 1e-9);
        for (int k = 0; k < sn.nz(); k++) {
            int j = sn.index(k, i);
            assertEquals(sn.uMPerS()[j], col.uMPerS()[k], 1e-9);
            assertEquals(sn.vMPerS()[j], col.vMPerS()[k], 1e-9);
            assertEquals(sn.wMPerS()[j], col.wMPerS()[k], 1e-11);
            assertEquals(sn.thetaK()[j], col.thetaK()[k], 1e-9);
            assertEquals(sn.mixingRatioKgPerKg()[j], col.mixingRatioKgPerKg()[k], 1e-12);
            assertEquals(sn.pressurePerturbationPa()[j], col.pressurePerturbationPa()[k], 1e-7);
        }
    }

    @Test
    void shoreMaskIsTheSumOfArctanStepsForABayBehindABarrier() {
        SurfaceMap map = new SurfaceMap(List.of(
                new SurfaceSegment.Water("sea", Double.NEGATIVE_INFINITY, 0, 293, 2e-4),
                new SurfaceSegment.Land("barrier", 0, 5e3, 0.2, 1, 0.1, 0.3),
                new SurfaceSegment.Water("bay", 5e3, 25e3, 295, 2e-4),
                new SurfaceSegment.Land("mainland", 25e3, Double.POSITIVE_INFINITY, 0.2, 1, 0.1, 0.3)));
        HorizontalGrid grid = HorizontalGrid.centred(4096, 500);
        double x0 = 1500;
        ShoreMask m = ShoreMask.of(map, grid, x0, "x0");
        for (double x : new double[] {-20e3, -2e3, 0, 2.5e3, 6e3, 15e3, 24e3, 40e3, 200e3}) {
            // (1/pi)(pi/2 + arctan) up at 0 and 25 km, down at 5 km; the far edge (+-1024 km) adds < 1e-3
            double expected = step(x, 0, x0) - step(x, 5e3, x0) + step(x, 25e3, x0);
            assertEquals(expected, m.valueAt(x, grid.nx(), grid.lengthM()), 2e-3, "x = " + x);
        }
    }

    private static double step(double x, double xs, double x0) {
        return 0.5 + Math.atan((x - xs) / x0) / Math.PI;
    }

    @Test
    void slabHeatingHarmonicsRebuildTheMixedLayerHeatingRate() {
        // Q = g/theta0 dH/(rho cp h) below h(t): the n = 0 term is the daily mean, checked by direct quadrature
        HeatingSpec.SlabMixedLayer slab = new HeatingSpec.SlabMixedLayer(200, 6, 18, 0.005, 0.2, 100, 10e3);
        double rhoCp = 1206;
        HeatingHarmonics hh = HeatingHarmonics.of(slab, 4, 300, rhoCp);
        double[] q = new double[2];
        for (double z : new double[] {50, 600, 1200}) {
            double sum = 0;
            int n = 200000;
            double td = 12 * 3600;
            for (int j = 0; j < n; j++) {
                double tau = (j + 0.5) * td / n;
                double flux = 200 / rhoCp * Math.sin(Math.PI * tau / td);
                double cum = 200 / rhoCp * td / Math.PI * (1 - Math.cos(Math.PI * tau / td));
                // Tennekes (1973) zero-order jump, A = 0.2
                double h = Math.sqrt(100 * 100 + 2 * 1.4 * cum / 0.005);
                if (z < h) {
                    sum += 9.80665 / 300 * flux / h * td / n;
                }
            }
            hh.profile(0, z, q);
            assertEquals(sum / 86400, q[0], 2e-3 * sum / 86400, "z = " + z);
            assertEquals(0.0, q[1], 1e-15);
        }
    }

    @Test
    void inviscidAtTheCriticalLatitudeIsRefusedWithAClearMessage() {
        HeatingSpec heat = LinearTestConfigs.classic(2e-4, 10e3, 1000);
        double crit = Math.toDegrees(Math.asin(2 * Math.PI / 86400 / (2 * Coast.EARTH_ROTATION_PER_S)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LinearBreezeModel.solve(
                LinearTestConfigs.config(crit, heat, 256, 4000, 21, 4000, 0.0, 0, true, 1)));
        assertTrue(e.getMessage().contains("frictionPerS"), e.getMessage());
    }

    @Test
    void nonPowerOfTwoGridIsRefused() {
        HeatingSpec heat = LinearTestConfigs.classic(2e-4, 10e3, 1000);
        LinearConfig c = new LinearConfig(new Coast(45, 0, 0, 270, 180), SurfaceMap.simpleCoast(293, 0.2, 1, 0.1),
                HorizontalGrid.centred(300, 4000), VerticalGrid.uniform(21, 4000), 0.01, 1e-5, 1e-5, 0, true, 1, heat,
                300, 0.01, -3e-6, 101325);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LinearBreezeModel.solve(c));
        assertTrue(e.getMessage().contains("nx = 300"), e.getMessage());
    }

    @Test
    void slabSolutionIsConvergedInTheVerticalNodeSpacing() {
        // the same slab case on output grids of 31 and 61 levels: the common levels agree to 1 %
        HeatingSpec slab = new HeatingSpec.SlabMixedLayer(200, 6, 18, 0.005, 0.2, 100, 10e3);
        LinearSolution a = LinearBreezeModel.solve(LinearTestConfigs.config(45, slab, 256, 2000, 31, 3000, 1e-5, 0, true, 12));
        LinearSolution b = LinearBreezeModel.solve(LinearTestConfigs.config(45, slab, 256, 2000, 61, 3000, 1e-5, 0, true, 12));
        Snapshot ca = a.columnAt(4000, 15 * 3600);
        Snapshot cb = b.columnAt(4000, 15 * 3600);
        double umax = maxAbs(ca.uMPerS()) - 0;
        for (int k = 0; k < 31; k++) {
            assertEquals(ca.uMPerS()[k], cb.uMPerS()[2 * k], 1e-2 * umax, "level " + k);
        }
    }
}
