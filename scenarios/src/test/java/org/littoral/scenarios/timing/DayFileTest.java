package org.littoral.scenarios.timing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.littoral.scenarios.input.UserInputException;

/** Day files: what a good one gives, and the one-line error a bad key or value gets. */
class DayFileTest {
    static final String GOOD = """
            date: 2031-06-25
            coast: classic-45N
            ambient_wind: {from_deg: 90, speed_m_per_s: 3}
            front: {theta_v_contrast_K: 2.8, breeze_depth_m: 613}
            flights: {interval_min: 30, first_h: 7, last_h: 9, dense_interval_min: 15, dense_start_h: 8, dense_end_h: 9}
            sites:
              - {name: coast, inland_km: 5}
              - {name: inland, inland_km: 25, flight_interval_min: 60}
            ensemble: {members: 6, seed: 3, grid: {points: 256, spacing_km: 1, levels: 24}}
            """;

    private static DaySpec parse(String yaml) {
        return DayFile.parse("test.yaml", yaml, null);
    }

    @Test
    void aGoodDayFileGivesTheSitesFlightsConditionsAndAnEnsembleOfTheGivenSize() {
        DaySpec d = parse(GOOD);
        assertEquals("2031-06-25", d.date());
        assertEquals(2, d.sites().size());
        // 30-min flights 07:00-09:00 at the coast, hourly inland; the 15-min dense window 08:00-09:00 at every site.
        assertArrayEquals(new double[] {7.0, 7.5, 8.0, 8.25, 8.5, 8.75, 9.0}, d.site("coast").flightHours(), 1e-9);
        assertArrayEquals(new double[] {7.0, 8.0, 8.25, 8.5, 8.75, 9.0}, d.site("inland").flightHours(), 1e-9);
        assertEquals(6, d.ensemble().memberCount());
        assertEquals(3L, d.ensemble().ensemble().seed());
        assertEquals(2.8, d.conditions().thetaVContrastK());
        assertTrue(Double.isInfinite(d.conditions().totalDepthM()));
        assertEquals("nonlinear", d.model(), "fronts need the nonlinear model: the default");
        // classic-45N: sea to the west (bearing 270); wind from 90 is offshore, so U_x = -3 m/s.
        assertEquals(-3.0, d.conditions().crossShoreWindMPerS(), 1e-9);
        assertFalse(d.describedDraws().isEmpty());
    }

    @Test
    void withoutAGridTheNonlinearEnsembleRunsOnTheEnsembleGridAndTheLinearOneOnItsOwn() {
        String day = "date: 2031-06-25\ncoast: classic-45N\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\n";
        DaySpec nl = parse(day);
        assertEquals(org.littoral.scenarios.scenario.Scenario.Kind.NONLINEAR, nl.base().kind());
        assertEquals(200, nl.base().xGrid().nx());
        assertEquals(2000.0, nl.base().xGrid().xM(1) - nl.base().xGrid().xM(0), 1e-9);
        assertEquals(6.0, nl.base().output().startClockH(), 1e-9, "an hour before the first flight (07:00 by default)");
        DaySpec lin = parse(day + "ensemble: {model: linear}\n");
        assertEquals(org.littoral.scenarios.scenario.Scenario.Kind.LINEAR, lin.base().kind());
        assertEquals(512, lin.base().xGrid().nx());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "unknown top key | 'date: 2031-06-25\\nflavour: x' | unknown key 'flavour'; allowed at the top level",
        "bad date | 'date: 25/06/2031' | date: '25/06/2031' is not a date; write YYYY-MM-DD",
        "missing coast | 'date: 2031-06-25' | coast: missing; give a coast file",
        "unknown coast | 'date: 2031-06-25\\ncoast: nowhere-9' | coast: 'nowhere-9' is neither a file",
        "missing wind | 'date: 2031-06-25\\ncoast: classic-45N' | ambient_wind: missing; give {from_deg, speed_m_per_s}",
        "wind too fast | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 55}' | ambient_wind.speed_m_per_s: 55 is outside the allowed range; give a number, 0 to 40 m/s",
        "contrast not a number | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nfront: {theta_v_contrast_K: warm}' | front.theta_v_contrast_K: 'warm' is not a number; give a number, 0.05 to 20 K",
        "layer shallower than breeze | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nfront: {breeze_depth_m: 600, layer_depth_m: 400}' | front.layer_depth_m: 400 m is not deeper than breeze_depth_m = 600 m",
        "flight interval | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nflights: {interval_min: 0}' | flights.interval_min: 0 is outside the allowed range; give a number, 1 to 240 min",
        "members | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nensemble: {members: 2.5}' | ensemble.members: 2.5 is not a whole number; give a whole number, 1 to 5000 members",
        "model | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nensemble: {model: fancy}' | ensemble.model: 'fancy' is not a model; use nonlinear",
        "grid points | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nensemble: {model: linear, grid: {points: 300}}' | ensemble.grid.points: 300 is not a power of two (the linear model's FFT needs one); use 256 or 512",
        "distribution range | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nensemble: {ambient_speed_m_per_s: {uniform: {from: 0, to: 60}}}' | ensemble.ambient_speed_m_per_s.uniform.to: 60 is outside the allowed range for ambient_wind.speed_m_per_s; give 0 to 40 m/s",
        "unknown distribution | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nensemble: {buoyancy_frequency_per_s: {lognormal: {mu: 1}}}' | ensemble.buoyancy_frequency_per_s: unknown distribution 'lognormal'; use uniform, normal or choice",
        "site outside domain | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nsites: [{name: far, inland_km: 400}]\\nensemble: {grid: {points: 256, spacing_km: 1}}' | sites: site far at 400 km lies outside -121..121 km",
        "tiny dense interval (the fuzz test found it hanging) | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nflights: {dense_interval_min: 0.000001, dense_start_h: 10, dense_end_h: 12}' | flights.dense_interval_min: 1.0E-6 min is shorter than a minute",
        "all fixed | 'date: 2031-06-25\\ncoast: classic-45N\\nambient_wind: {from_deg: 90, speed_m_per_s: 3}\\nensemble: {ambient_from_deg: fixed, ambient_speed_m_per_s: fixed, heating_amplitude_K_per_h: fixed, buoyancy_frequency_per_s: fixed}' | ensemble: every uncertain input is fixed",
    })
    void aBadDayFileGetsOneLineNamingTheKeyValueAndAllowedRange(String what, String yaml, String expected) {
        UserInputException e = assertThrows(UserInputException.class, () -> parse(yaml.replace("\\n", "\n")));
        assertTrue(e.getMessage().matches("day file test\\.yaml(:\\d+:\\d+)?: .*"), e.getMessage());
        assertTrue(e.getMessage().contains(expected), what + ": " + e.getMessage());
        assertEquals(1, e.getMessage().lines().count(), e.getMessage());
    }

    @Test
    void aUserPassageTableWithAnUnreadableTimeNamesTheFileLineAndColumn(@org.junit.jupiter.api.io.TempDir Path tmp)
            throws Exception {
        Path p = tmp.resolve("p.csv");
        Files.writeString(p, "site,date,passage_time_local\ncoast,2031-06-25,11:75\n");
        UserInputException e = assertThrows(UserInputException.class, () -> PassageTable.read(p, parse(GOOD)));
        assertEquals("p.csv line 2: column 'passage_time_local' value '11:75' is not a local clock time; write HH:MM, "
                + "HH:MM:SS or decimal hours in 0..48", e.getMessage());
    }

    @Test
    void aPassageTableWithoutTheDayNamesTheDaysItHas(@org.junit.jupiter.api.io.TempDir Path tmp) throws Exception {
        Path p = tmp.resolve("p.csv");
        Files.writeString(p, "site,date,passage_time_local\ncoast,2031-06-24,11:00\n");
        UserInputException e = assertThrows(UserInputException.class, () -> PassageTable.read(p, parse(GOOD)));
        assertTrue(e.getMessage().contains("no passages on 2031-06-25") && e.getMessage().contains("[2031-06-24]"), e.getMessage());
    }

    @Test
    void observesPassageTableGivesTheStrengtheningAfterAFirstOnshoreTurnTheSeaBreezeLabel(@org.junit.jupiter.api.io.TempDir Path tmp)
            throws Exception {
        Path p = tmp.resolve("passages.csv");
        Files.writeString(p, "day,site,ordinal,time_local_h,uncertainty_h,confidence,detectors,turns_onshore,kind,"
                + "direction_before_deg,direction_after_deg,cross_shore_before_m_per_s,cross_shore_after_m_per_s\n"
                + "2031-06-25,coast,1,9.4,0.1,1,a,true,INTO_ONSHORE,,,,\n"
                + "2031-06-25,coast,2,11.9,0.1,1,a,true,ONSHORE_STRENGTHENING,,,,\n"
                + "2031-06-25,coast,3,17.0,0.1,1,a,false,OUT_OF_ONSHORE,,,,\n"
                + "2031-06-25,inland,1,13.7,0.2,1,a,true,INTO_ONSHORE,,,,\n");
        PassageTable.Read r = PassageTable.read(p, parse(GOOD));
        assertEquals(3, r.passages().size());
        assertEquals("bay_breeze", r.passages().get(0).label());
        assertEquals("sea_breeze", r.passages().get(1).label());
        assertEquals(11.9, r.passages().get(1).timeHours());
        assertEquals("sea_breeze", r.passages().get(2).label());
        assertEquals(25000.0, r.passages().get(2).inlandDistanceM());
        assertTrue(r.notes().get(0).startsWith("1 passage(s) that do not turn the wind onshore"), r.notes().toString());
    }
}
