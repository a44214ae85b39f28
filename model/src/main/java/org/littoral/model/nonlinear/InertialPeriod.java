package org.littoral.model.nonlinear;

/** Measures an oscillation period from the stored snapshots (zero crossings of u - Ug at one point). */
public final class InertialPeriod {
    private InertialPeriod() {
    }

    /**
     * Mean period, hours, from successive upward zero crossings of u - Ug at level k, column i
     * (crossing times by linear interpolation between stored snapshots). NaN with fewer than two crossings.
     */
    public static double measureHours(NonlinearSolution s, int k, int i) {
        var st = s.stored();
        int nx = s.xM().length;
        double ug = s.background().ambientUMPerS()[k];
        double first = Double.NaN;
        double last = Double.NaN;
        int crossings = 0;
        for (int n = 1; n < st.size(); n++) {
            double a = st.get(n - 1).u()[k * nx + i] - ug;
            double b = st.get(n).u()[k * nx + i] - ug;
            if (a < 0 && b >= 0) {
                double t = st.get(n - 1).timeSec() + (st.get(n).timeSec() - st.get(n - 1).timeSec()) * (-a) / (b - a);
                if (crossings == 0) {
                    first = t;
                }
                last = t;
                crossings++;
            }
        }
        return crossings < 2 ? Double.NaN : (last - first) / (crossings - 1) / 3600.0;
    }
}
