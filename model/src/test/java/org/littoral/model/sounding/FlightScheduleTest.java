package org.littoral.model.sounding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class FlightScheduleTest {

    @Test
    void halfHourlyFlightsFromSixToTwentyAreTwentyNineLaunches() {
        // (20 - 6) h / 0.5 h + 1 = 29, both window ends included
        List<Double> t = FlightSchedule.regular(30, 6, 20).launchTimesClockHours();
        assertEquals(29, t.size());
        assertEquals(6.0, t.get(0), 1e-12);
        assertEquals(20.0, t.get(28), 1e-12);
    }

    @Test
    void denseWindowAddsQuarterHourLaunchesWithoutDuplicates() {
        // base 29 launches; 11-15 h every 15 min is 17 launches of which 9 coincide with the base ones
        List<Double> t = new FlightSchedule(30, 6, 20, 15, 11, 15).launchTimesClockHours();
        assertEquals(29 + 17 - 9, t.size());
        assertTrue(t.contains(11.25));
        assertTrue(t.contains(14.75));
        assertTrue(!t.contains(10.75));
        for (int i = 1; i < t.size(); i++) {
            assertTrue(t.get(i) > t.get(i - 1), "launch times increase");
        }
    }

    @Test
    void denseWindowIsClippedToTheOperatingWindow() {
        List<Double> t = new FlightSchedule(60, 8, 12, 20, 11, 18).launchTimesClockHours();
        assertEquals(12.0, t.get(t.size() - 1), 1e-12);
    }

    @Test
    void aZeroCadenceIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> FlightSchedule.regular(0, 6, 20));
    }
}
