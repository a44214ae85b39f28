package org.littoral.scenarios.run;

import org.littoral.model.front.FarFieldSolution;

import java.util.Locale;
import org.littoral.model.nonlinear.ModelBlowUpException;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.NonlinearModel;
import org.littoral.model.nonlinear.NonlinearSolution;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.Scenario;

/**
 * Runs the nonlinear 2D model on a scenario ({@link Scenario#toNonlinearConfig()}) and wraps it with the
 * far-field reference the run pipeline measures the breeze against ({@link FarFieldSolution}). A blow-up
 * becomes one line naming the local time, the place and what to change in the scenario.
 */
final class NonlinearSolver {
    private NonlinearSolver() {
    }

    static FarFieldSolution solve(Scenario scenario) {
        NonlinearConfig main;
        try {
            main = scenario.toNonlinearConfig();
        } catch (IllegalArgumentException e) {
            throw new UserInputException(scenario.source() + ": kind nonlinear: " + e.getMessage(), e);
        }
        NonlinearSolution sol;
        try {
            sol = NonlinearModel.run(main);
        } catch (ModelBlowUpException e) {
            NonlinearSolution part = e.partialSolution();
            throw new UnstableRunException(blowUp(scenario, e).getMessage(), e,
                    part != null && part.snapshotCount() >= 2 ? new FarFieldSolution(part, main.damping().lateralSpongeWidthM()) : null);
        }
        return new FarFieldSolution(sol, main.damping().lateralSpongeWidthM());
    }

    /**
     * The one-line message of a blown-up run, in the scenario's terms (keys, local clock time); {@link ScenarioRun}
     * adds what it kept of the run.
     */
    static UserInputException blowUp(Scenario scenario, ModelBlowUpException e) {
        double clock = scenario.coast().clockHoursFromSolar(e.solarHours());
        String msg = String.format(Locale.ROOT,
                "%s: the nonlinear model became unstable at %s local time (%.2f solar h), x = %.1f km from the coast, z = %.0f m "
                        + "(%s = %.4g); "
                        + "try a finer grid.spacing_km or more grid.levels, a weaker heating (heating.*), a weaker ambient_wind.speed_m_per_s "
                        + "or some physics.friction_per_s (e.g. 1e-5)",
                scenario.source(), ScenarioRun.clock(clock), e.solarHours(), e.xKm(), e.zM(), e.variable(), e.value());
        return new UserInputException(msg, e);
    }
}
