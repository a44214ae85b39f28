package org.littoral.scenarios.run;

import org.littoral.model.front.FarFieldSolution;

import org.littoral.model.nonlinear.ModelBlowUpException;
import org.littoral.scenarios.input.UserInputException;

/**
 * A nonlinear run that went unstable, with the snapshots it stored before (as the run pipeline reads them), so
 * that {@link ScenarioRun} can write what was computed before saying why it stopped.
 */
public final class UnstableRunException extends UserInputException {
    private static final long serialVersionUID = 1L;
    private final transient FarFieldSolution partial;

    UnstableRunException(String message, ModelBlowUpException cause, FarFieldSolution partial) {
        super(message, cause);
        this.partial = partial;
    }

    /** The model's own report: time, place, variable and value of the blow-up. */
    public ModelBlowUpException blowUp() {
        return (ModelBlowUpException) getCause();
    }

    /** The run up to its last stored snapshot, or null when fewer than two snapshots were stored. */
    public FarFieldSolution partial() {
        return partial;
    }
}
