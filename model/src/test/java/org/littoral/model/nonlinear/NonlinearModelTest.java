package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.field.Snapshot;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

class NonlinearModelTest {
    static final SurfaceMap COAST = SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1);

    static Coast coastAt(double lat) {
        return new Coast(lat, 0.0, 0.0, 270.0, 172);
    }

    static NonlinearConfig.Damping noDamping() {
        return NonlinearConfig.Damping.none();
    }

    @Test
    void restingStratifiedAtmosphereWithoutForcingStaysAtRest() {
        NonlinearConfig c = NonlinearConfig.builder(coastAt(40), COAST, HorizontalGrid.centred(64, 2000.0),
                        VerticalGrid.stretched(25, 6000.0, 50.0))
                .forcing(new Forcing.None()).switches(new NonlinearConfig.Switches(true, false, true))
                .damping(NonlinearConfig.Damping.none().withTopLayer(0.3, 300).withLateralSponges(20_000, 600)).solarHours(6, 12).build();
        assertStaysAtRest(NonlinearModel.run(c));
    }

    @Test
    void restingAtmosphereOverUniformLandWithMixingStaysAtRest() {
        SurfaceMap allLand = new SurfaceMap(java.util.List.of(new org.littoral.model.coast.SurfaceSegment.Land("land",
                Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, 0.2, 1.0, 0.1, 0.3)));
        NonlinearConfig c = NonlinearConfig.builder(coastAt(40), allLand, HorizontalGrid.centred(64, 2000.0),
                        VerticalGrid.stretched(25, 6000.0, 50.0))
                .forcing(new Forcing.None()).damping(NonlinearConfig.Damping.none().withTopLayer(0.3, 300).withLateralSponges(20_000, 600))
                .solarHours(6, 12).build();
        assertStaysAtRest(NonlinearModel.run(c));
    }

    private static void assertStaysAtRest(NonlinearSolution s) {
        Snapshot end = s.snapshotAt(s.endSec());
        double maxU = 0;
        double maxW = 0;
        for (int n = 0; n < end.uMPerS().length; n++) {
            maxU = Math.max(maxU, Math.abs(end.uMPerS()[n]));
            maxU = Math.max(maxU, Math.abs(end.vMPerS()[n]));
            maxW = Math.max(maxW, Math.abs(end.wMPerS()[n]));
        }
        assertTrue(maxU < 1e-9, "max |u|, |v| = " + maxU);
        assertTrue(maxW < 1e-9, "max |w| = " + maxW);
        assertTrue(s.complete());
    }

    /** Inertial period 2 pi / f (docs/references.md section 7: 23.93 h at 30 deg, 16.92 h at 45 deg, recomputed here). */
    @ParameterizedTest
    @ValueSource(doubles = {30.0, 45.0, -45.0})
    void uniformWindPerturbationOscillatesWithTheInertialPeriod(double lat) {
        Coast coast = coastAt(lat);
        double expectedH = 2 * Math.PI / Math.abs(coast.coriolisPerS()) / 3600.0;
        NonlinearConfig c = NonlinearConfig.builder(coast, COAST, HorizontalGrid.centred(8, 2000.0),
                        VerticalGrid.uniform(5, 2000.0))
                .forcing(new Forcing.None()).switches(new NonlinearConfig.Switches(true, false, false))
                .damping(noDamping()).solarHours(0, 2.3 * expectedH).outputIntervalS(300)
                .initialUPerturbation((x, z) -> 1.0).build();
        NonlinearSolution s = NonlinearModel.run(c);
        double period = InertialPeriod.measureHours(s, 0, 0);
        assertEquals(expectedH, period, 0.01 * expectedH);
    }

    @ParameterizedTest
    @EnumSource(NonlinearConfig.ScalarTransport.class)
    void squareWaveOfMoistureAdvectedByAUniformWindKeepsItsBoundsAndMoves(NonlinearConfig.ScalarTransport scheme) {
        double q0 = 0.008;
        NonlinearConfig.Numerics num = scheme == NonlinearConfig.ScalarTransport.FCT_STEP
                ? NonlinearConfig.Numerics.standard() : NonlinearConfig.Numerics.limitedStages();
        assertEquals(scheme, num.scalarTransport());
        NonlinearConfig c = NonlinearConfig.builder(coastAt(0.0), COAST, HorizontalGrid.centred(100, 1000.0),
                        VerticalGrid.uniform(5, 2000.0))
                .forcing(new Forcing.None()).switches(new NonlinearConfig.Switches(true, false, false))
                .damping(noDamping()).moisture(q0, 0.0).geostrophicWind(10.0, 270.0).solarHours(0, 1)
                .initialMixingRatioPerturbation((x, z) -> Math.abs(x) < 10_000 ? 0.004 : 0.0).numerics(num).build();
        NonlinearSolution s = NonlinearModel.run(c);
        Snapshot end = s.snapshotAt(s.endSec());
        double lo = Double.MAX_VALUE;
        double hi = -Double.MAX_VALUE;
        double mass = 0;
        double moment = 0;
        double[] x = s.xM();
        for (int i = 0; i < end.nx(); i++) {
            double r = end.mixingRatioKgPerKg()[2 * end.nx() + i];
            lo = Math.min(lo, r);
            hi = Math.max(hi, r);
            mass += r - q0;
            moment += (r - q0) * x[i];
        }
        // snapshots are single precision: allow one float ulp of 0.012 (~1e-9)
        assertTrue(lo >= q0 - 2e-9, "undershoot " + (lo - q0));
        assertTrue(hi <= q0 + 0.004 + 2e-9, "overshoot " + (hi - q0 - 0.004));
        double u = c.geostrophicModelComponents()[0];
        assertEquals(10.0, Math.abs(u), 1e-9);
        // centroid moves u t (wind from 270 deg blows east; the coast's +x points east here)
        assertEquals(u * 3600.0, moment / mass, 500.0);
    }

    @Test
    void flowStaysNonDivergentAfterProjection() {
        NonlinearConfig c = NonlinearConfig.builder(coastAt(40), COAST, HorizontalGrid.centred(80, 2000.0),
                        VerticalGrid.stretched(21, 5000.0, 50.0))
                .forcing(new Forcing.PrescribedSurfaceFlux(300, 6, 18, 0)).solarHours(8, 11).build();
        NonlinearModel m = NonlinearModel.create(c);
        NonlinearSolution s = m.integrate();
        assertTrue(s.complete());
        assertTrue(m.maxRelativeDivergence() < 1e-10, "relative divergence " + m.maxRelativeDivergence());
    }

    @Test
    void violentHeatingStopsWithABlowUpThatNamesTimeAndPlaceAndKeepsTheSnapshots() {
        NonlinearConfig c = NonlinearConfig.builder(coastAt(40), COAST, HorizontalGrid.centred(64, 1000.0),
                        VerticalGrid.uniform(17, 4000.0))
                .forcing(new Forcing.PrescribedHeating((x, z, t) -> x > 0 && z < 500 ? 0.5 : 0.0))
                .damping(NonlinearConfig.Damping.none().withTopLayer(0.3, 300).withLateralSponges(10_000, 600))
                .numerics(new NonlinearConfig.Numerics(0.5, 1.0, 300, 30.0)).outputIntervalS(60).solarHours(6, 9).build();
        ModelBlowUpException e = assertThrows(ModelBlowUpException.class, () -> NonlinearModel.run(c));
        assertTrue(e.getMessage().contains("solar h") && e.getMessage().contains("x =") && e.getMessage().contains("try"),
                e.getMessage());
        assertTrue(e.solarHours() > 6 && e.solarHours() < 9);
        NonlinearSolution partial = e.partialSolution();
        assertFalse(partial.complete());
        assertTrue(partial.snapshotCount() >= 1);
        assertTrue(partial.endSec() <= e.solarHours() * 3600.0);
    }
}
