package org.littoral.model.nonlinear;

/** A field f(x, z) used for initial perturbations (tests, lock exchange, inertial oscillation). */
@FunctionalInterface
public interface ScalarField {
    double at(double xM, double zM);

    ScalarField ZERO = (x, z) -> 0.0;
}
