package org.littoral.scenarios.timing;

import java.util.List;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.SweepSpec;

/**
 * A parsed check-timing day file (docs/timing-checks.md): the day, its conditions, the sites with their
 * flight times, and the ensemble of plausible model days as a sweep specification for the sweep machinery.
 *
 * @param source the day file, for messages
 * @param date the day (YYYY-MM-DD); passages of other days are ignored
 * @param base the base scenario, with the day's ambient wind and sites applied
 * @param conditions what sets the plausible density-current speed
 * @param conditionsGiven which of contrast and depth the day file gave ("theta_v_contrast_K", "breeze_depth_m")
 * @param sites the profiling sites, ordered inland
 * @param defaultUncertaintyH timing uncertainty of a passage whose table gives none
 * @param ensemble the ensemble as a sweep (base + fixed grid settings + drawn uncertain inputs)
 * @param model "linear" (quick look) or "nonlinear" (through the scenario {@code kind} and {@code Solver.standard()})
 * @param describedDraws the uncertain inputs in the day file's own names, for the report
 */
public record DaySpec(String source, String date, Scenario base, TimingInputs.DayConditions conditions,
                      List<String> conditionsGiven, List<Site> sites, double defaultUncertaintyH, SweepSpec ensemble,
                      String model, List<String> describedDraws, TimingInputs.Settings settings) {

    /**
     * @param flightHours take-off times of the site's flights, local clock hours, ascending
     */
    public record Site(String name, double inlandKm, double flightIntervalMin, double[] flightHours) {
    }

    public Site site(String name) {
        for (Site s : sites) {
            if (s.name().equals(name)) {
                return s;
            }
        }
        return null;
    }
}
