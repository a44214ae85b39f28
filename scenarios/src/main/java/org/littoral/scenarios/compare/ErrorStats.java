package org.littoral.scenarios.compare;

/**
 * Running bias and root-mean-square of paired differences d = model - observed (Wilks 2011,
 * "Statistical Methods in the Atmospheric Sciences", 3rd ed., section 8.3: mean error and RMSE).
 * NaN differences are skipped.
 */
public final class ErrorStats {
    private final boolean circular;
    private int n;
    private double sum;
    private double sumSquares;
    private double sumObserved;
    private double sumModel;
    private double sinObserved;
    private double cosObserved;
    private double sinModel;
    private double cosModel;

    /** @param circular true for directions (degrees): the means are then vector means of unit vectors */
    public ErrorStats(boolean circular) {
        this.circular = circular;
    }

    public ErrorStats() {
        this(false);
    }

    /** Adds one pair; for directions pass the wrapped difference as {@code difference}. */
    public void add(double model, double observed, double difference) {
        if (Double.isNaN(difference)) {
            return;
        }
        n++;
        sum += difference;
        sumSquares += difference * difference;
        sumObserved += observed;
        sumModel += model;
        if (circular) {
            sinObserved += Math.sin(Math.toRadians(observed));
            cosObserved += Math.cos(Math.toRadians(observed));
            sinModel += Math.sin(Math.toRadians(model));
            cosModel += Math.cos(Math.toRadians(model));
        }
    }

    public void add(double model, double observed) {
        add(model, observed, model - observed);
    }

    public int n() {
        return n;
    }

    /** Mean of model - observed; NaN when empty. */
    public double bias() {
        return n == 0 ? Double.NaN : sum / n;
    }

    /** sqrt(mean((model - observed)^2)); NaN when empty. */
    public double rmse() {
        return n == 0 ? Double.NaN : Math.sqrt(sumSquares / n);
    }

    /** Mean of the observed values; for directions the direction of the mean unit vector, 0-360 deg. */
    public double meanObserved() {
        return n == 0 ? Double.NaN : circular ? meanDirection(sinObserved, cosObserved) : sumObserved / n;
    }

    public double meanModel() {
        return n == 0 ? Double.NaN : circular ? meanDirection(sinModel, cosModel) : sumModel / n;
    }

    private static double meanDirection(double s, double c) {
        if (Math.hypot(s, c) < 1e-12) {
            return Double.NaN;
        }
        double d = Math.toDegrees(Math.atan2(s, c));
        return d < 0 ? d + 360.0 : d;
    }
}
