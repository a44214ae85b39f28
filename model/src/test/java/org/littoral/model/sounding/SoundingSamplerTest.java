package org.littoral.model.sounding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;

class SoundingSamplerTest {
    // sea to the west: the land-to-sea bearing is 270, so +x (inland) points east
    private final Coast westCoast = new Coast(45, 0, 0, 270, 172);

    private List<Profile> fly(AnalyticSolution sol, Coast coast, SoundingSpec spec, FlightSchedule schedule) {
        return new SoundingSampler(sol, coast, List.of(new VirtualSite("A", 12.3e3), new VirtualSite("B", 40e3)),
                schedule, spec).sampleAll();
    }

    @Test
    void fieldsLinearInXZAndTimeAreReproducedExactly() {
        AnalyticSolution sol = new AnalyticSolution(5, 0);
        SoundingSampler sampler = new SoundingSampler(sol, westCoast, List.of(new VirtualSite("A", 12.3e3)),
                FlightSchedule.regular(60, 9, 10), SoundingSpec.of(600, "test"));
        List<Profile> ps = sampler.sampleAll();
        assertEquals(2, ps.size());
        Profile p = ps.get(1);
        assertEquals(10.0, p.timeHours(), 1e-12);
        assertEquals(120, p.size());
        double t0 = sampler.modelTimeSec(10.0);
        for (int b = 0; b < p.size(); b++) {
            double z = p.heightM()[b];
            assertEquals((b + 0.5) * 5.0, z, 1e-12);
            double tb = t0 + z / 2.0; // sampled when the drone climbing at 2 m/s passes z
            double pres = sol.pressureBackground(z) + sol.px * 12.3e3;
            // Poisson's equation T = theta (p / 1000 hPa)^0.2854 (Bolton 1980 kappa)
            double temp = sol.theta(z, tb) * Math.pow(pres / 100000.0, 0.2854);
            assertEquals(pres, p.pressurePa()[b], 1e-6);
            assertEquals(sol.theta(z, tb), p.thetaK()[b], 1e-9);
            assertEquals(temp, p.temperatureK()[b], 1e-9);
            assertEquals(sol.r0 + sol.rz * z, p.mixingRatioKgPerKg()[b], 1e-12);
        }
    }

    @Test
    void onshoreWindOnAWestCoastIsAWesterlyFrom270() {
        // meteorological convention: direction the wind blows from, clockwise from north (WMO)
        Profile p = fly(new AnalyticSolution(5, 0), westCoast, SoundingSpec.of(100, "t"), FlightSchedule.regular(60, 12, 12)).get(0);
        assertEquals(270.0, p.windDirectionDeg(3), 1e-9);
        assertEquals(5.0, p.windSpeed(3), 1e-12);
        assertEquals(5.0, p.windEastMPerS()[3], 1e-12);
        assertEquals(0.0, p.windNorthMPerS()[3], 1e-12);
    }

    @Test
    void positiveAlongshoreWindOnAWestCoastBlowsFromTheSouth() {
        // +y is 90 degrees left of +x (east), i.e. north; a northward-moving wind is a southerly, 180
        Profile p = fly(new AnalyticSolution(0, 4), westCoast, SoundingSpec.of(100, "t"), FlightSchedule.regular(60, 12, 12)).get(0);
        assertEquals(180.0, p.windDirectionDeg(0), 1e-9);
    }

    @Test
    void onshoreWindOnAnEastCoastIsAnEasterly() {
        Coast eastCoast = new Coast(45, 0, 0, 90, 172);
        Profile p = fly(new AnalyticSolution(3, 0), eastCoast, SoundingSpec.of(100, "t"), FlightSchedule.regular(60, 12, 12)).get(0);
        assertEquals(90.0, p.windDirectionDeg(0), 1e-9);
    }

    @Test
    void noiseIsReproducibleForASeedAndDiffersBetweenSeeds() {
        AnalyticSolution sol = new AnalyticSolution(5, 1);
        FlightSchedule sch = FlightSchedule.regular(30, 10, 12);
        List<Profile> a = fly(sol, westCoast, SoundingSpec.of(300, "t").withNoise(InstrumentNoise.withDefaults(7)), sch);
        List<Profile> b = fly(sol, westCoast, SoundingSpec.of(300, "t").withNoise(InstrumentNoise.withDefaults(7)), sch);
        List<Profile> c = fly(sol, westCoast, SoundingSpec.of(300, "t").withNoise(InstrumentNoise.withDefaults(8)), sch);
        for (int i = 0; i < a.size(); i++) {
            assertArrayEquals(a.get(i).temperatureK(), b.get(i).temperatureK(), 0.0);
            assertArrayEquals(a.get(i).mixingRatioKgPerKg(), b.get(i).mixingRatioKgPerKg(), 0.0);
            assertArrayEquals(a.get(i).windEastMPerS(), b.get(i).windEastMPerS(), 0.0);
        }
        assertNotEquals(a.get(0).temperatureK()[0], c.get(0).temperatureK()[0]);
    }

    @Test
    void temperatureNoiseHasTheDocumentedSigma() {
        AnalyticSolution sol = new AnalyticSolution(5, 0);
        FlightSchedule sch = FlightSchedule.regular(10, 8, 16);
        List<Profile> clean = fly(sol, westCoast, SoundingSpec.of(600, "t"), sch);
        List<Profile> noisy = fly(sol, westCoast, SoundingSpec.of(600, "t").withNoise(InstrumentNoise.withDefaults(3)), sch);
        double sum2 = 0;
        int n = 0;
        for (int i = 0; i < clean.size(); i++) {
            for (int b = 0; b < clean.get(i).size(); b++) {
                double d = noisy.get(i).temperatureK()[b] - clean.get(i).temperatureK()[b];
                sum2 += d * d;
                n++;
            }
        }
        // n ~ 11,000 draws: the sample sigma is within about 1.5 % of 0.2 K (3 standard errors)
        assertEquals(InstrumentNoise.DEFAULT_TEMPERATURE_SIGMA_K, Math.sqrt(sum2 / n), 0.2 * 0.03);
    }

    @Test
    void aSiteOutsideTheDomainIsRejected() {
        AnalyticSolution sol = new AnalyticSolution(5, 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new SoundingSampler(sol, westCoast,
                List.of(new VirtualSite("far", 500e3)), FlightSchedule.regular(30, 6, 20), SoundingSpec.of(600, "t")));
        assertEquals(true, e.getMessage().contains("far"));
    }

    @Test
    void aCeilingAboveTheModelTopIsRejected() {
        AnalyticSolution sol = new AnalyticSolution(5, 0);
        assertThrows(IllegalArgumentException.class, () -> new SoundingSampler(sol, westCoast,
                List.of(new VirtualSite("A", 1e3)), FlightSchedule.regular(30, 6, 20), SoundingSpec.of(3000, "t")));
    }

    @Test
    void aPeriodicSolutionWrapsFlightsPastItsSpan() {
        // clock 23:58 at 45 E, UTC+0 is solar 02:58 next day: outside [0, 86400] unless wrapped
        Coast east = new Coast(45, 45, 0, 270, 172);
        AnalyticSolution sol = new AnalyticSolution(5, 0);
        FlightSchedule late = FlightSchedule.regular(30, 23.9, 23.9);
        assertThrows(IllegalArgumentException.class, () -> new SoundingSampler(sol, east, List.of(new VirtualSite("A", 0)), late,
                SoundingSpec.of(100, "t")).sampleAll());
        SoundingSampler wrapped = new SoundingSampler(sol, east, List.of(new VirtualSite("A", 0)), late, SoundingSpec.of(100, "t"), true);
        Profile p = wrapped.sampleAll().get(0);
        double t = wrapped.modelTimeSec(23.9) - 86400.0 + 2.5 / 2.0;
        assertEquals(sol.theta(2.5, t), p.thetaK()[0], 1e-9);
    }
}
