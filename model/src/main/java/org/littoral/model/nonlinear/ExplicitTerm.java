package org.littoral.model.nonlinear;

/**
 * One explicit term of the equations, evaluated once per Runge-Kutta stage on the whole state. Advection
 * terms come first and write (not add to) the tendency arrays; every other term adds to them. The order of
 * the terms is the order of the additions, so it is fixed where the model is wired.
 */
interface ExplicitTerm {
    /**
     * Adds (or, for advection, writes) this term's tendency for the stage at timeSec.
     *
     * @param stageWeight the weight of this stage's tendency in the whole step (1/6, 1/6, 2/3)
     */
    void apply(double timeSec, double stageWeight);

    /** Called before the first stage of a step. */
    default void beginStep() {
    }

    /** Called after the last stage of a step, with the start-of-step theta and r. */
    default void endStep(double[] thStart, double[] qStart, double dt) {
    }
}
