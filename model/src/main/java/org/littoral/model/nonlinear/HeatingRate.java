package org.littoral.model.nonlinear;

/**
 * A prescribed diabatic heating Q(x, z, t) as a potential-temperature tendency, K/s. Used to force the
 * nonlinear model with exactly the heating the linear model uses, so the two are compared like with like.
 */
@FunctionalInterface
public interface HeatingRate {
    /**
     * @param xM cross-shore position (coast 0, inland positive)
     * @param zM height above ground
     * @param timeSec local solar time, s since solar midnight of day 0
     */
    double kelvinPerSecond(double xM, double zM, double timeSec);
}
