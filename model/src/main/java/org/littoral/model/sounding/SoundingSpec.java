package org.littoral.model.sounding;

/**
 * How synthetic ascents are flown and binned.
 *
 * <p>Bins are {@code binM} thick from the ground to {@code ceilingM}; each bin is reported at its
 * centre ((j + 1/2) binM), the value being the field at the centre height at the moment the drone
 * passes it (second-order equal to the bin mean for a smooth field). The drone leaves the ground at
 * the launch time and climbs at {@code ascentRateMPerS}, so the bin at height z is sampled at
 * launch + z / ascent rate: a 600 m profile at 2 m/s spans 5 minutes.
 *
 * @param ceilingM altitude ceiling of the ascent, m above ground
 * @param binM bin thickness, m (5 m is usual for drone profiles)
 * @param ascentRateMPerS climb rate, m/s (1-3 m/s for multirotors); must be positive
 * @param maxNodeSpacingSec the solution is evaluated at nodes no further apart than this during an
 *                          ascent and interpolated linearly in time between them
 * @param noise instrument noise, or null for none
 * @param dayLabel the {@link Profile#day()} label given to the profiles
 * @param dayIndex which model day (0 = the first) the clock times refer to
 */
public record SoundingSpec(double ceilingM, double binM, double ascentRateMPerS, double maxNodeSpacingSec,
                           InstrumentNoise noise, String dayLabel, int dayIndex) {

    public static final double DEFAULT_BIN_M = 5.0;
    public static final double DEFAULT_ASCENT_RATE_M_PER_S = 2.0;
    public static final double DEFAULT_NODE_SPACING_SEC = 60.0;

    public SoundingSpec {
        if (!(ceilingM > 0)) {
            throw new IllegalArgumentException("altitude ceiling must be positive; got " + ceilingM + " m");
        }
        if (!(binM > 0) || binM > ceilingM) {
            throw new IllegalArgumentException("bin size must be in (0, ceiling = " + ceilingM + "] m; got " + binM + " m");
        }
        if (!(ascentRateMPerS > 0)) {
            throw new IllegalArgumentException("ascent rate must be positive; got " + ascentRateMPerS + " m/s");
        }
        if (!(maxNodeSpacingSec > 0)) {
            throw new IllegalArgumentException("node spacing must be positive; got " + maxNodeSpacingSec + " s");
        }
        if (dayIndex < 0) {
            throw new IllegalArgumentException("day index must be >= 0; got " + dayIndex);
        }
    }

    /** 5 m bins, 2 m/s ascent, nodes every 60 s, no noise, day 0. */
    public static SoundingSpec of(double ceilingM, String dayLabel) {
        return new SoundingSpec(ceilingM, DEFAULT_BIN_M, DEFAULT_ASCENT_RATE_M_PER_S, DEFAULT_NODE_SPACING_SEC, null,
                dayLabel, 0);
    }

    public SoundingSpec withNoise(InstrumentNoise n) {
        return new SoundingSpec(ceilingM, binM, ascentRateMPerS, maxNodeSpacingSec, n, dayLabel, dayIndex);
    }

    public SoundingSpec withBin(double bin) {
        return new SoundingSpec(ceilingM, bin, ascentRateMPerS, maxNodeSpacingSec, noise, dayLabel, dayIndex);
    }

    public SoundingSpec withAscentRate(double rate) {
        return new SoundingSpec(ceilingM, binM, rate, maxNodeSpacingSec, noise, dayLabel, dayIndex);
    }

    /** Number of bins below the ceiling. */
    public int binCount() {
        return (int) Math.floor(ceilingM / binM + 1e-9);
    }

    /** Bin-centre heights, m (allocates). */
    public double[] binCentresM() {
        int n = binCount();
        double[] z = new double[n];
        for (int j = 0; j < n; j++) {
            z[j] = (j + 0.5) * binM;
        }
        return z;
    }
}
