package org.littoral.scenarios.run;

import org.littoral.model.field.BreezeSolution;
import org.littoral.scenarios.cli.UserInputException;
import org.littoral.scenarios.scenario.Scenario;

/** Turns a scenario into a model solution. */
@FunctionalInterface
public interface Solver {
    BreezeSolution solve(Scenario scenario);

    /** The solver littoral uses: the model named by the scenario's {@code kind}. */
    static Solver standard() {
        return scenario -> {
            if (scenario.kind() == Scenario.Kind.NONLINEAR) {
                throw new UserInputException(scenario.source() + ": kind = nonlinear: the nonlinear model is not yet available in this "
                        + "version of littoral; use kind: linear");
            }
            return LinearSolver.solve(scenario);
        };
    }
}
