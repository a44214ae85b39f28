package org.littoral.scenarios.run;

/** Figures of a run (drawn with the report package's figure library). */
final class RunFigures {
    private RunFigures() {
    }

    /**
     * Cross-shore range worth plotting: where the near-surface breeze ever exceeds 5 % of its peak
     * magnitude inside the interior the diagnostics search, padded by 10 %, clamped to the domain.
     */
    static double[] plotRangeM(FieldSections fs) {
        int nx = fs.xM.length;
        double[] amp = new double[nx];
        double peak = 0;
        for (double[] row : fs.nearSurfaceU) {
            for (int i = 0; i < nx; i++) {
                if (fs.xM[i] < fs.interiorFromM || fs.xM[i] > fs.interiorToM) {
                    continue;
                }
                amp[i] = Math.max(amp[i], Math.abs(row[i]));
                peak = Math.max(peak, amp[i]);
            }
        }
        double lo = 0;
        double hi = 0;
        for (int i = 0; i < nx; i++) {
            if (amp[i] >= 0.05 * peak) {
                lo = Math.min(lo, fs.xM[i]);
                hi = Math.max(hi, fs.xM[i]);
            }
        }
        double pad = 0.1 * (hi - lo);
        return new double[] {Math.max(fs.xM[0], lo - pad), Math.min(fs.xM[nx - 1], hi + pad)};
    }
}
