package org.littoral.scenarios.analysis.ingest;

/**
 * One raw flight (ascent and descent) as sampled, SI, before binning. Sensors are averaged by the
 * binner. Missing samples are NaN.
 *
 * @param startTimeHours local clock time (hours since local midnight of the day) of sample 0
 * @param timeS elapsed time of each sample since sample 0, s (non-decreasing)
 * @param temperatureSensorsK temperatureSensorsK[s][i]: sensor s, sample i
 * @param rhSensors relative humidity as a fraction, rhSensors[s][i]; may be null when mixing ratio is given
 * @param mixingRatioKgPerKg per-sample mixing ratio, or null when RH sensors are given
 */
public record RawFlight(String site, String day, String flightId, double startTimeHours, double[] timeS,
                        double[] heightM, double[] pressurePa, double[][] temperatureSensorsK, double[][] rhSensors,
                        double[] mixingRatioKgPerKg, double[] windEastMPerS, double[] windNorthMPerS, String file,
                        int firstLine) {

    public int size() {
        return timeS.length;
    }
}
