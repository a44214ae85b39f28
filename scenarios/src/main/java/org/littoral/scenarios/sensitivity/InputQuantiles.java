package org.littoral.scenarios.sensitivity;

import com.fasterxml.jackson.databind.node.DoubleNode;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.littoral.scenarios.sweep.AxisValue;
import org.littoral.scenarios.sweep.Distribution;

/**
 * Maps a point u in [0, 1) of the unit interval to a value of an uncertain input by the input's quantile function
 * (inverse transform sampling, common practice), so that the sample design's uniform coordinates become draws from the
 * very distributions the sweep, plan and check-timing ensembles use ({@link Distribution}).
 */
public final class InputQuantiles {
    private static final NormalDistribution STANDARD = new NormalDistribution(null, 0, 1);

    private InputQuantiles() {
    }

    /** The value of the distribution at probability u (0 &lt;= u &lt; 1). */
    public static AxisValue valueAt(Distribution d, double u) {
        double p = Math.min(Math.max(u, 1e-12), 1 - 1e-12);
        if (d instanceof Distribution.Uniform un) {
            return number(wrap(un.from() + (un.to() - un.from()) * u, un.wrapDeg()));
        }
        if (d instanceof Distribution.Normal n) {
            if (n.wrapDeg()) {
                return number(wrap(n.mean() + n.sd() * STANDARD.inverseCumulativeProbability(p), true));
            }
            // truncated normal: invert the normal CDF between the truncation points
            double lo = Double.isFinite(n.min()) ? STANDARD.cumulativeProbability((n.min() - n.mean()) / n.sd()) : 0;
            double hi = Double.isFinite(n.max()) ? STANDARD.cumulativeProbability((n.max() - n.mean()) / n.sd()) : 1;
            double q = lo + p * (hi - lo);
            double v = n.mean() + n.sd() * STANDARD.inverseCumulativeProbability(Math.min(Math.max(q, 1e-15), 1 - 1e-15));
            return number(Math.min(Math.max(v, n.min()), n.max()));
        }
        Distribution.Choice c = (Distribution.Choice) d;
        double total = 0;
        for (double w : c.weights()) {
            total += w;
        }
        double acc = 0;
        for (int i = 0; i < c.options().size(); i++) {
            acc += c.weights()[i];
            if (u * total < acc) {
                return c.options().get(i);
            }
        }
        return c.options().get(c.options().size() - 1);
    }

    /** Whether the input is a compass direction (values wrap at 360). */
    public static boolean isDirection(Distribution d) {
        return d instanceof Distribution.Uniform u && u.wrapDeg() || d instanceof Distribution.Normal n && n.wrapDeg();
    }

    /** Mean and standard deviation of a numeric input (a direction: about its mean, not wrapped), for priors. */
    public static double[] meanSd(Distribution d) {
        int m = 2000;
        double s = 0;
        double ss = 0;
        double first = Double.NaN;
        for (int i = 0; i < m; i++) {
            AxisValue v = valueAt(d, (i + 0.5) / m);
            if (!v.value().isNumber()) {
                return new double[] {Double.NaN, Double.NaN};
            }
            double x = v.value().asDouble();
            if (isDirection(d)) {
                if (Double.isNaN(first)) {
                    first = x;
                }
                x = first + Math.IEEEremainder(x - first, 360.0);
            }
            s += x;
            ss += x * x;
        }
        double mean = s / m;
        return new double[] {isDirection(d) ? ((mean % 360) + 360) % 360 : mean, Math.sqrt(Math.max(0, ss / m - mean * mean))};
    }

    private static double wrap(double v, boolean deg) {
        return deg ? ((v % 360.0) + 360.0) % 360.0 : v;
    }

    private static AxisValue number(double v) {
        double r = Math.round(v * 1e6) / 1e6;
        DoubleNode n = DoubleNode.valueOf(r);
        return new AxisValue(n.toString(), n);
    }
}
