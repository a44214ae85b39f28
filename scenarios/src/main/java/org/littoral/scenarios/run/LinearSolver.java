package org.littoral.scenarios.run;

import org.littoral.model.field.BreezeSolution;
import org.littoral.scenarios.scenario.Scenario;

/** Runs the linear spectral model on a scenario. */
final class LinearSolver {
    private LinearSolver() {
    }

    static BreezeSolution solve(Scenario scenario) {
        // The linear spectral model (org.littoral.model.linear.LinearBreezeModel) has not landed in this build yet.
        throw new IllegalStateException("the linear spectral model is not in this build yet; scenario '" + scenario.name()
                + "' was read and validated but cannot be run");
    }
}
