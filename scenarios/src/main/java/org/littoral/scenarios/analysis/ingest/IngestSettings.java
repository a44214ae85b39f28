package org.littoral.scenarios.analysis.ingest;

import org.littoral.scenarios.input.UserInputException;

/**
 * Settings of ingest and quality control. Public fields with documented defaults (see docs/analysis.md).
 */
public final class IngestSettings {
    /** Height step of the bins, m. Default 5 m: the usual drone-profile bin (docs/references.md section 9). */
    public double binStepM = 5.0;
    /** RH above 100 % up to this value is capped at 100 % and logged (sensor overshoot); above it the value is removed. */
    public double rhRemoveAbovePercent = 110.0;
    /** A value in a Celsius temperature column above this looks like kelvin: removed and warned. */
    public double kelvinLookingAboveC = 100.0;
    /** Temperatures (C) outside [min, max] (and not kelvin-like) are removed. */
    public double temperatureMinC = -90.0;
    public double temperatureMaxC = 60.0;
    /** Pressure (hPa) outside [min, max] is removed. */
    public double pressureMinHPa = 100.0;
    public double pressureMaxHPa = 1100.0;
    /** Wind speed above this (m/s) is removed with its direction. */
    public double windSpeedMaxMPerS = 80.0;
    /**
     * A binned wind speed further than this (m/s) from the median of its neighbours is a spike and is removed
     * with its direction. Default 10 m/s: a low-level jet changes speed by a few m/s per 10 m, an attitude or
     * logging glitch by much more (common practice for drone and sonde profiles; from memory).
     */
    public double windSpikeMPerS = 10.0;
    /** Neighbours either side (bins) of the spike test's median. Default 3 (15 m at 5 m bins). */
    public int windSpikeHalfWindowBins = 3;
    /** Mixing ratio above this (g/kg) is removed. */
    public double mixingRatioMaxGPerKg = 50.0;
    /**
     * Also use the descending part of each raw flight as a profile of its own (timed at the start of the descent).
     * Default false (ascent only): a descending drone flies into its own downwash and sensors lag the other way.
     */
    public boolean useDescent = false;
    /** A raw flight with fewer ascending samples than this is removed (logged). */
    public int minAscentSamples = 5;

    public IngestSettings validate() {
        if (!(binStepM > 0)) {
            throw new UserInputException("ingest.binStepM = " + binStepM + " must be > 0 m (default 5)");
        }
        if (!(rhRemoveAbovePercent >= 100)) {
            throw new UserInputException("ingest.rhRemoveAbovePercent = " + rhRemoveAbovePercent + " must be >= 100 (default 110)");
        }
        if (!(windSpikeMPerS > 0) || windSpikeHalfWindowBins < 1) {
            throw new UserInputException("ingest.windSpikeMPerS = " + windSpikeMPerS + " must be > 0 (default 10) and "
                    + "ingest.windSpikeHalfWindowBins = " + windSpikeHalfWindowBins + " >= 1 (default 3)");
        }
        return this;
    }
}
