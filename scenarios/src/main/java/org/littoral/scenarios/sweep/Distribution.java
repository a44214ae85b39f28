package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.node.DoubleNode;
import java.util.List;
import java.util.SplittableRandom;

/**
 * How an uncertain input of an ensemble is drawn. Every draw uses only {@link SplittableRandom#nextDouble()}
 * (whose algorithm is fixed by its specification), so a seed gives the same members on every JDK.
 */
public sealed interface Distribution permits Distribution.Uniform, Distribution.Normal, Distribution.Choice {

    AxisValue draw(SplittableRandom random);

    /** Uniform on [from, to); a direction ({@code wrapDeg}) is wrapped into [0, 360) afterwards. */
    record Uniform(double from, double to, boolean wrapDeg) implements Distribution {
        @Override
        public AxisValue draw(SplittableRandom random) {
            double v = from + (to - from) * random.nextDouble();
            if (wrapDeg) {
                v = ((v % 360.0) + 360.0) % 360.0;
            }
            return AxisValue.of(DoubleNode.valueOf(v));
        }
    }

    /**
     * Normal with mean and standard deviation, truncated to [min, max] by drawing again (a truncated normal;
     * clamping would pile probability onto the bounds). When {@code wrapDeg} is true the value is a direction
     * and is wrapped into [0, 360) instead.
     */
    record Normal(double mean, double sd, double min, double max, boolean wrapDeg) implements Distribution {
        private static final int MAX_TRIES = 10_000;

        @Override
        public AxisValue draw(SplittableRandom random) {
            for (int k = 0; k < MAX_TRIES; k++) {
                double v = mean + sd * standardNormal(random);
                if (wrapDeg) {
                    v = ((v % 360.0) + 360.0) % 360.0;
                    return AxisValue.of(DoubleNode.valueOf(v));
                }
                if (v >= min && v <= max) {
                    return AxisValue.of(DoubleNode.valueOf(v));
                }
            }
            // Only reachable when [min, max] lies far in a tail; the parser rejects windows that narrow.
            throw new IllegalStateException("normal(" + mean + ", " + sd + ") found no value in [" + min + ", " + max + "]");
        }

        /** Box-Muller transform (Box and Muller 1958, Ann. Math. Statist. 29, 610-611), one of the pair. */
        static double standardNormal(SplittableRandom random) {
            double u1 = 1.0 - random.nextDouble(); // (0, 1], keeps log finite
            double u2 = random.nextDouble();
            return Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2.0 * Math.PI * u2);
        }
    }

    /** One of a list of values (numbers, names or whole sub-documents such as a coast layout), with weights. */
    record Choice(List<AxisValue> options, double[] weights) implements Distribution {
        @Override
        public AxisValue draw(SplittableRandom random) {
            double total = 0;
            for (double w : weights) {
                total += w;
            }
            double u = random.nextDouble() * total;
            double acc = 0;
            for (int i = 0; i < options.size(); i++) {
                acc += weights[i];
                if (u < acc) {
                    return options.get(i);
                }
            }
            return options.get(options.size() - 1);
        }
    }
}
