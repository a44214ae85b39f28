package org.littoral.scenarios.analysis;

import org.littoral.model.sounding.Profile;

/** Layer means of profile arrays, ignoring missing levels (NaN). */
public final class LayerMeans {
    private LayerMeans() {
    }

    /** Mean of a[k] over levels with heightM[k] in the layer; NaN when too few levels are valid. */
    public static double mean(Profile p, double[] a, Layer layer, double minValidFraction) {
        double[] z = p.heightM();
        double sum = 0;
        int valid = 0;
        int inside = 0;
        for (int k = 0; k < z.length; k++) {
            if (layer.contains(z[k])) {
                inside++;
                double v = a[k];
                if (!Double.isNaN(v)) {
                    sum += v;
                    valid++;
                }
            }
        }
        if (inside == 0 || valid == 0 || valid < minValidFraction * inside) {
            return Double.NaN;
        }
        return sum / valid;
    }
}
