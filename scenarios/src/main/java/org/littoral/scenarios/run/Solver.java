package org.littoral.scenarios.run;

import org.littoral.model.field.BreezeSolution;
import org.littoral.scenarios.scenario.Scenario;

/** Turns a scenario into a model solution. */
@FunctionalInterface
public interface Solver {
    BreezeSolution solve(Scenario scenario);

    /**
     * The solver littoral uses: the model named by the scenario's {@code kind}. A nonlinear blow-up
     * surfaces as a {@link org.littoral.scenarios.input.UserInputException} (one line, exit code 2).
     */
    static Solver standard() {
        return scenario -> {
            if (scenario.kind() == Scenario.Kind.NONLINEAR) {
                return NonlinearSolver.solve(scenario);
            }
            return LinearSolver.solve(scenario);
        };
    }
}
