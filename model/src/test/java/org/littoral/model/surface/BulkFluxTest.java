package org.littoral.model.surface;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.thermo.Thermo;

class BulkFluxTest {
    private static final double P = Thermo.P0; // so that theta_s = SST

    @Test
    void neutralDragFollowsTheLogLaw() {
        // (kappa / ln(10 / 2e-4))^2 = 1.366e-3; Large & Pond (1981) give 1000 C_DN = 1.2 for 4-11 m/s (from memory).
        double cd = BulkFlux.neutralDragCoefficient(10.0, 2e-4);
        assertEquals(Math.pow(0.4 / Math.log(5e4), 2), cd, 1e-15);
        assertEquals(1.2e-3, cd, 0.25e-3);
    }

    @Test
    void neutralScalarCoefficientAtTenMetresIsLargeAndPondsValue() {
        // Large & Pond (1982): C_HN(10 m) = 1.13e-3, C_EN = 1.15e-3 (from memory).
        assertEquals(1.13e-3, BulkFlux.neutralScalarCoefficient(10.0, 2e-4, BulkFlux.WATER_CHN10), 1e-12);
        assertTrue(BulkFlux.neutralScalarCoefficient(30.0, 2e-4, BulkFlux.WATER_CHN10) < 1.13e-3);
    }

    @Test
    void louisFactorsAreOneInNeutralConditions() {
        assertEquals(1.0, BulkFlux.louisMomentumFactor(0.0, 10, 2e-4), 0.0);
        assertEquals(1.0, BulkFlux.louisHeatFactor(0.0, 10, 2e-4), 0.0);
        assertEquals(1.0, BulkFlux.louisHeatFactor(-1e-12, 10, 2e-4), 1e-9);
    }

    @Test
    void louisFactorsEnhanceTransferWhenUnstableAndReduceItWhenStable() {
        assertTrue(BulkFlux.louisHeatFactor(-0.5, 10, 2e-4) > BulkFlux.louisHeatFactor(-0.1, 10, 2e-4));
        assertTrue(BulkFlux.louisHeatFactor(-0.1, 10, 2e-4) > 1.0);
        assertTrue(BulkFlux.louisHeatFactor(0.1, 10, 2e-4) < 1.0);
        assertTrue(BulkFlux.louisMomentumFactor(0.2, 10, 2e-4) < BulkFlux.louisMomentumFactor(0.1, 10, 2e-4));
    }

    @Test
    void nearNeutralSensibleHeatFluxMatchesTheLargeAndPondNeutralCoefficient() {
        // Strong wind, small air-sea difference: Ri ~ 0, so H ~ rho c_p C_HN U (theta_s - theta_a).
        BulkFluxes f = BulkFlux.overWater(12.0, 10.0, 290.15, 289.95, 0.008, P, 2e-4);
        double expected = f.airDensityKgM3() * Thermo.CP * 1.13e-3 * 12.0 * 0.2;
        assertEquals(expected, f.sensibleHeatFluxWm2(), 0.05 * expected);
    }

    @Test
    void warmWaterUnderCoolAirGivesUpwardFluxesAndEnhancedTransfer() {
        BulkFluxes f = BulkFlux.overWater(4.0, 10.0, 295.15, 290.15, 0.008, P, 2e-4);
        assertTrue(f.bulkRichardson() < 0);
        assertTrue(f.sensibleHeatFluxWm2() > 0 && f.latentHeatFluxWm2() > 0);
        assertTrue(f.heatCoefficient() > 1.13e-3);
    }

    @Test
    void coolWaterUnderWarmAirGivesDownwardHeatFluxAndReducedDrag() {
        BulkFluxes f = BulkFlux.overWater(4.0, 10.0, 288.15, 295.15, 0.008, P, 2e-4);
        assertTrue(f.bulkRichardson() > 0);
        assertTrue(f.sensibleHeatFluxWm2() < 0);
        assertTrue(f.dragCoefficient() < BulkFlux.neutralDragCoefficient(10.0, 2e-4));
    }

    @Test
    void fluxesAreInTheKinematicRatioOfDensityTimesHeatCapacity() {
        BulkFluxes f = BulkFlux.overWater(6.0, 10.0, 295.15, 292.15, 0.010, P, 2e-4);
        assertEquals(f.sensibleHeatFluxWm2(), f.airDensityKgM3() * Thermo.CP * f.kinematicHeatFluxKMs(), 1e-9);
        assertEquals(f.momentumFluxNm2(), f.airDensityKgM3() * f.frictionVelocityMs() * f.frictionVelocityMs(), 1e-12);
    }

    @Test
    void roughLandHasSeveralTimesTheDragOfWater() {
        Drag land = BulkFlux.neutral(5.0, 10.0, 0.1);
        Drag water = BulkFlux.neutral(5.0, 10.0, 2e-4);
        assertTrue(land.dragCoefficient() > 4 * water.dragCoefficient());
    }

    @Test
    void landRichardsonNumberIsConsistentWithTheGivenHeatFlux() {
        double u = 3.0;
        double z = 10.0;
        double z0 = 0.1;
        double wt = 0.15;
        double theta = 300.0;
        Drag d = BulkFlux.withHeatFlux(u, z, z0, wt, theta);
        double ch = BulkFlux.neutralDragCoefficient(z, z0) * BulkFlux.louisHeatFactor(d.bulkRichardson(), z, z0);
        double riImplied = -Thermo.G * z * wt / (theta * ch * u * u * u);
        assertEquals(riImplied, d.bulkRichardson(), 1e-9);
        assertTrue(d.dragCoefficient() > BulkFlux.neutralDragCoefficient(z, z0));
    }

    @Test
    void weakDownwardLandFluxGivesAStableConsistentRichardsonNumber() {
        Drag d = BulkFlux.withHeatFlux(8.0, 10.0, 0.05, -0.01, 290.0);
        double ch = BulkFlux.neutralDragCoefficient(10.0, 0.05) * BulkFlux.louisHeatFactor(d.bulkRichardson(), 10.0, 0.05);
        assertTrue(d.bulkRichardson() > 0);
        assertEquals(Thermo.G * 10.0 * 0.01 / (290.0 * ch * 512.0), d.bulkRichardson(), 1e-9);
    }

    @Test
    void roughnessAboveTheMeasurementHeightIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> BulkFlux.neutralDragCoefficient(1.0, 2.0));
    }
}
