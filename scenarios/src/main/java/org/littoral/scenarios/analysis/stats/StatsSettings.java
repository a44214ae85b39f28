package org.littoral.scenarios.analysis.stats;

import java.util.List;
import org.littoral.scenarios.input.UserInputException;

/** Settings of group comparisons. Public fields; defaults and reasons in docs/analysis.md. */
public final class StatsSettings {
    /** Per-day attributes whose groups are compared pairwise. Default breeze_type. */
    public List<String> groupBy = List.of("breeze_type");
    /** Groups with fewer values than this are not compared. Default 3. */
    public int minGroupSize = 3;
    /** Both samples at least this large (and near normal) for the z-test. Default 30 (common practice). */
    public int zTestMinN = 30;
    /** Jarque-Bera p below this marks a sample far from normal. Default 0.05. */
    public double normalityAlpha = 0.05;
    /** |skewness| above this marks a sample far from normal. Default 1 (common rule of thumb). */
    public double skewnessLimit = 1.0;
    /** Below this size normality is not assessed (JB meaningless); Welch is used unless the other sample is far from normal. Default 8. */
    public int minNForNormality = 8;
    /** Family-wise level for the multiple-comparison note. Default 0.05. */
    public double alpha = 0.05;

    public StatsSettings validate() {
        if (minGroupSize < 2) {
            throw new UserInputException("stats.minGroupSize = " + minGroupSize + " must be >= 2 (default 3)");
        }
        if (!(alpha > 0 && alpha < 1) || !(normalityAlpha > 0 && normalityAlpha < 1)) {
            throw new UserInputException("stats.alpha and stats.normalityAlpha must be in (0, 1) (default 0.05)");
        }
        return this;
    }
}
