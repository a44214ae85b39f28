package org.littoral.scenarios.analysis.detect;

import java.util.Locale;

/**
 * Penalty for adding a change point, in the units of {@link NormalMeanCost} (twice the negative
 * log-likelihood).
 *
 * <ul>
 *   <li>{@link Kind#BIC}: Schwarz (1978) information criterion, (p + 1) ln n per change for a change
 *       in p means (p new mean parameters plus the change location); for p = 1 this is the
 *       2 ln n of docs/references.md section 8 and of Killick et al. (2012) (their "SIC").</li>
 *   <li>{@link Kind#MBIC}: modified BIC of Zhang &amp; Siegmund (2007), Biometrics 63, 22-32:
 *       3 ln n per change plus Sum_j ln(n_j / n) over the segments, for p = 1. For p &gt; 1 we use
 *       (p + 2) ln n per change with the same segment-length term (our extension; it reduces to
 *       Zhang &amp; Siegmund for p = 1). The length term is super-additive, so PELT pruning stays exact.</li>
 *   <li>{@link Kind#MANUAL}: a fixed value per change.</li>
 * </ul>
 */
public record Penalty(Kind kind, double manualValue, double factor) {

    public enum Kind { BIC, MBIC, MANUAL }

    public Penalty {
        if (kind == Kind.MANUAL && !(manualValue >= 0)) {
            throw new IllegalArgumentException("manual penalty must be >= 0; got " + manualValue);
        }
        if (!(factor > 0)) {
            throw new IllegalArgumentException("penalty factor must be > 0; got " + factor);
        }
    }

    public static Penalty bic() {
        return new Penalty(Kind.BIC, Double.NaN, 1.0);
    }

    public static Penalty mbic() {
        return new Penalty(Kind.MBIC, Double.NaN, 1.0);
    }

    public static Penalty manual(double value) {
        return new Penalty(Kind.MANUAL, value, 1.0);
    }

    /** Same penalty multiplied by f (a sensitivity knob: f &gt; 1 gives fewer changes). */
    public Penalty times(double f) {
        return new Penalty(kind, manualValue, factor * f);
    }

    /** Penalty per change point for a series of n samples and p changing parameters (means, or means and slopes). */
    public double perChange(int n, int p) {
        double logN = Math.log(n);
        double v = switch (kind) {
            case BIC -> (p + 1) * logN;
            case MBIC -> (p + 2) * logN;
            case MANUAL -> manualValue;
        };
        return factor * v;
    }

    /** Additive term per segment of the given length (non-zero only for MBIC). */
    public double perSegment(int segmentLength, int n) {
        return kind == Kind.MBIC ? factor * Math.log((double) segmentLength / n) : 0.0;
    }

    /** Parses "bic", "mbic" or a number (manual penalty). */
    public static Penalty parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("bic") || t.equals("sic")) {
            return bic();
        }
        if (t.equals("mbic")) {
            return mbic();
        }
        try {
            return manual(Double.parseDouble(t));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("penalty must be bic, mbic or a number >= 0; got '" + text + "'");
        }
    }
}
