package org.littoral.model.surface;

/**
 * Surface drag at one point.
 *
 * @param dragCoefficient C_D at z_a, stability included
 * @param frictionVelocityMs u* = sqrt(C_D) U
 * @param bulkRichardson Ri_B used for the stability correction
 */
public record Drag(double dragCoefficient, double frictionVelocityMs, double bulkRichardson) {

    /** Kinematic stress u*^2, m2/s2: the surface momentum flux divided by density. */
    public double kinematicStressM2s2() {
        return frictionVelocityMs * frictionVelocityMs;
    }
}
