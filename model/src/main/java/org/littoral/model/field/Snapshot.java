package org.littoral.model.field;

/**
 * The x-z fields at one time, flattened row by row: value at level k, column i is {@code a[k * nx + i]}.
 * Winds and scalars are TOTAL values (ambient wind and background included); pressure is the
 * perturbation from the background hydrostatic pressure.
 *
 * @param timeSec local solar time, seconds since solar midnight of day 0 (may exceed 86400 on later days)
 */
public record Snapshot(double timeSec, int nx, int nz, double[] uMPerS, double[] vMPerS, double[] wMPerS,
                       double[] thetaK, double[] mixingRatioKgPerKg, double[] pressurePerturbationPa) {

    public int index(int k, int i) {
        return k * nx + i;
    }

    public double u(int k, int i) {
        return uMPerS[k * nx + i];
    }

    public double theta(int k, int i) {
        return thetaK[k * nx + i];
    }
}
