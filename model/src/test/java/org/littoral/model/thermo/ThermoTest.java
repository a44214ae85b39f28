package org.littoral.model.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ThermoTest {
    // Worked example of docs/references.md section 6 (C): p = 850 hPa, T = 20 C, Td = 18 C.
    private static final double P = 85000.0;
    private static final double T = 293.15;
    private static final double TD = 291.15;

    @ParameterizedTest(name = "e_s({0} C) within Bolton''s 0.1 % of IAPWS {1} hPa")
    @CsvSource({"0, 6.1121", "10, 12.2818", "20, 23.3921", "30, 42.4669"})
    void boltonSaturationVapourPressureIsWithinItsStatedAccuracyOfIapws(double celsius, double iapwsHPa) {
        // IAPWS-IF97 saturation pressure (docs/references.md section 6, C); Bolton (1980): 0.1 % from -30 to 35 C.
        double es = Thermo.saturationVapourPressurePa(celsius + Thermo.T0) / 100.0;
        assertEquals(iapwsHPa, es, 0.001 * iapwsHPa);
    }

    @ParameterizedTest(name = "Bolton eq. 10 at {0} C is {1} hPa")
    @CsvSource({"0, 6.1120", "10, 12.2717", "20, 23.3695", "30, 42.4558"})
    void boltonSaturationVapourPressureReproducesItsOwnFormula(double celsius, double boltonHPa) {
        // docs/references.md section 6 (C): 6.112 exp(17.67 T / (T + 243.5)).
        assertEquals(boltonHPa, Thermo.saturationVapourPressurePa(celsius + Thermo.T0) / 100.0, 5e-4);
    }

    @Test
    void workedExampleVapourPressureIs20Point626HectoPascals() {
        assertEquals(20.626, Thermo.saturationVapourPressurePa(TD) / 100.0, 5e-4);
    }

    @Test
    void workedExampleMixingRatioIs15Point469GramsPerKilogram() {
        double r = Thermo.mixingRatio(Thermo.saturationVapourPressurePa(TD), P);
        assertEquals(15.469, r * 1000.0, 5e-4);
    }

    @Test
    void workedExampleLclTemperatureIs290Point678Kelvin() {
        // Bolton (1980) eq. 15 (the T, Td form).
        assertEquals(290.678, Thermo.lclTemperatureK(T, TD), 5e-4);
    }

    @Test
    void boltonsThreeLclFormsAgreeOnTheWorkedExample() {
        // Bolton (1980) eqs. 15, 21 and 22 are fits to the same exact T_L; they agree to about 0.1 K.
        double e = Thermo.saturationVapourPressurePa(TD);
        double rh = e / Thermo.saturationVapourPressurePa(T);
        double eq15 = Thermo.lclTemperatureK(T, TD);
        assertEquals(eq15, Thermo.lclTemperatureFromVapourPressureK(T, e), 0.1);
        assertEquals(eq15, Thermo.lclTemperatureFromRelativeHumidityK(T, rh), 0.1);
    }

    @Test
    void workedExampleThetaEFromEquation39Is353Point92Kelvin() {
        double r = Thermo.mixingRatio(Thermo.saturationVapourPressurePa(TD), P);
        assertEquals(353.92, Thermo.equivalentPotentialTemperatureK(T, P, r), 0.05);
        // Davies-Jones (2009), itself accurate to 0.015 K, gives 353.911 K on this example.
        assertEquals(353.911, Thermo.equivalentPotentialTemperatureK(T, P, r), 0.02);
    }

    @Test
    void workedExampleThetaEFromEquation43Is353Point89Kelvin() {
        double r = Thermo.mixingRatio(Thermo.saturationVapourPressurePa(TD), P);
        assertEquals(353.89, Thermo.equivalentPotentialTemperatureEq43K(T, P, r), 0.05);
    }

    @Test
    void saturatedMixingRatioAt20CAnd1000HectoPascalsIs14Point90GramsPerKilogram() {
        // docs/references.md section 6 (C) computes 14.90 g/kg with the IAPWS e_s = 23.3921 hPa; Bolton's e_s is
        // 0.1 % lower, which lowers r by about 0.015 g/kg.
        double iapwsR = 0.622 * 2339.21 / (100000.0 - 2339.21);
        assertEquals(14.90, iapwsR * 1000.0, 5e-3);
        assertEquals(14.90, Thermo.saturationMixingRatio(293.15, 100000.0) * 1000.0, 0.02);
    }

    @Test
    void virtualPotentialTemperatureExampleIs301Point805Kelvin() {
        // docs/references.md section 6 (C): theta = 300 K, r = 0.010 kg/kg.
        assertEquals(301.805, Thermo.virtualPotentialTemperatureK(300.0, 0.010), 5e-4);
    }

    @Test
    void latentHeatAtZeroCelsiusIsTheBoltonValue() {
        // Bolton (1980) eq. 2 (number from memory): 2.501e6 J/kg at 0 C, 2.4536e6 at 20 C.
        assertEquals(2.501e6, Thermo.latentHeatOfVaporisation(273.15), 1e-6);
        assertEquals(2.4536e6, Thermo.latentHeatOfVaporisation(293.15), 1.0);
    }

    private final Random random = new Random(20261202L);

    @RepeatedTest(50)
    void dewpointIsTheInverseOfSaturationVapourPressure() {
        double t = Thermo.T0 - 30.0 + 65.0 * random.nextDouble();
        assertEquals(t, Thermo.dewpointK(Thermo.saturationVapourPressurePa(t)), 1e-9);
    }

    @RepeatedTest(50)
    void relativeHumidityRoundTripsThroughTheMixingRatio() {
        double t = Thermo.T0 - 10.0 + 45.0 * random.nextDouble();
        double p = 70000.0 + 35000.0 * random.nextDouble();
        double rh = 0.05 + 0.95 * random.nextDouble();
        assertEquals(rh, Thermo.relativeHumidity(Thermo.mixingRatioFromRelativeHumidity(rh, t, p), t, p), 1e-12);
    }

    @RepeatedTest(20)
    void potentialTemperatureRoundTrips() {
        double t = 250.0 + 60.0 * random.nextDouble();
        double p = 50000.0 + 55000.0 * random.nextDouble();
        assertEquals(t, Thermo.temperatureFromPotentialK(Thermo.potentialTemperatureK(t, p), p), 1e-9);
    }
}
