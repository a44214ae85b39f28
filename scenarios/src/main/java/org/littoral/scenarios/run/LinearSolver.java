package org.littoral.scenarios.run;

import org.littoral.model.field.BreezeSolution;
import org.littoral.model.linear.LinearBreezeModel;
import org.littoral.scenarios.scenario.Scenario;

/** Runs the linear spectral model on a scenario. */
final class LinearSolver {
    private LinearSolver() {
    }

    static BreezeSolution solve(Scenario scenario) {
        return LinearBreezeModel.solve(scenario.toLinearConfig());
    }
}
