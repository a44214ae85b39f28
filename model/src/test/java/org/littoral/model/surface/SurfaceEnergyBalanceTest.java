package org.littoral.model.surface;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceSegment;

class SurfaceEnergyBalanceTest {

    @Test
    void bowenPartitionConservesAvailableEnergyAndHasTheRequestedRatio() {
        EnergyBalance eb = SurfaceEnergyBalance.partitionByBowenRatio(500.0, 50.0, 0.5);
        assertEquals(450.0, eb.sensibleHeatFluxWm2() + eb.latentHeatFluxWm2(), 1e-9);
        assertEquals(0.5, eb.bowenRatio(), 1e-12);
    }

    @Test
    void slopeOverPsychrometricConstantAt20CIsAbout2Point15() {
        // Allen et al. (1998) FAO-56, Annex 2 tables 2.2 and 2.4 (from memory): Delta(20 C) = 0.145 kPa/K,
        // gamma(sea level) = 0.0674 kPa/K.
        assertEquals(0.145 / 0.0674, SurfaceEnergyBalance.slopeOverPsychrometric(293.15, 101325.0), 0.05);
    }

    @Test
    void priestleyTaylorPartitionConservesAvailableEnergy() {
        EnergyBalance eb = SurfaceEnergyBalance.partitionByPriestleyTaylor(400.0, 40.0, 0.8, 293.15, 100000.0);
        assertEquals(360.0, eb.sensibleHeatFluxWm2() + eb.latentHeatFluxWm2(), 1e-9);
    }

    @Test
    void drySurfaceInPriestleyTaylorFormEvaporatesOnlyBetaPrime() {
        // de Bruin & Holtslag (1982): alpha = 0 leaves LE = beta' = 20 W/m2 (from memory).
        EnergyBalance eb = SurfaceEnergyBalance.partitionByPriestleyTaylor(400.0, 40.0, 0.0, 293.15, 100000.0);
        assertEquals(20.0, eb.latentHeatFluxWm2(), 1e-12);
    }

    @Test
    void moisterLandHasASmallerBowenRatio() {
        EnergyBalance wet = SurfaceEnergyBalance.partitionByPriestleyTaylor(400.0, 40.0, 1.0, 293.15, 100000.0);
        EnergyBalance dry = SurfaceEnergyBalance.partitionByPriestleyTaylor(400.0, 40.0, 0.3, 293.15, 100000.0);
        assertTrue(wet.bowenRatio() < dry.bowenRatio());
        // Oke (1987): well-watered grass has Bowen ratio below 1 (from memory).
        assertTrue(wet.bowenRatio() < 1.0);
    }

    @Test
    void landEnergyBalanceHeatsTheAirAtNoonAndCoolsItAtMidnight() {
        Coast c = new Coast(40, 0, 0, 270, 172);
        SurfaceSegment.Land grass = new SurfaceSegment.Land("grass", 0, 1e5, 0.23, 0.5, 0.05, 0.5);
        EnergyBalance noon = SurfaceEnergyBalance.land(c, grass, 12 * 3600.0, 0.0, 298.15, 101325.0,
                SurfaceEnergyBalance.Partition.BOWEN_RATIO);
        EnergyBalance night = SurfaceEnergyBalance.land(c, grass, 0.0, 0.0, 288.15, 101325.0,
                SurfaceEnergyBalance.Partition.BOWEN_RATIO);
        assertTrue(noon.sensibleHeatFluxWm2() > 100, "noon H = " + noon.sensibleHeatFluxWm2());
        assertTrue(night.sensibleHeatFluxWm2() < 0, "night H = " + night.sensibleHeatFluxWm2());
        assertEquals(0.1 * noon.netRadiationWm2(), noon.groundHeatFluxWm2(), 1e-9);
    }
}
