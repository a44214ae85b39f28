package org.littoral.model.sounding;

/**
 * Gaussian, bin-to-bin independent instrument noise added to synthetic soundings, drawn from a
 * {@link java.util.Random} seeded with {@code seed} so a run is reproducible. The default sigmas are
 * typical of small multirotor sensor packages (common practice, not a particular instrument):
 * temperature 0.2 K, relative humidity 2 % (absolute), pressure 0.5 hPa, each horizontal wind
 * component 0.5 m/s. Humidity noise is applied to RH (what the sensor measures) and the mixing ratio is
 * recomputed from the noisy RH, temperature and pressure.
 */
public record InstrumentNoise(long seed, double temperatureSigmaK, double relativeHumiditySigma,
                              double pressureSigmaPa, double windComponentSigmaMPerS) {

    public static final double DEFAULT_TEMPERATURE_SIGMA_K = 0.2;
    public static final double DEFAULT_RH_SIGMA = 0.02;
    public static final double DEFAULT_PRESSURE_SIGMA_PA = 50.0;
    public static final double DEFAULT_WIND_SIGMA_M_PER_S = 0.5;

    public InstrumentNoise {
        if (temperatureSigmaK < 0 || relativeHumiditySigma < 0 || pressureSigmaPa < 0 || windComponentSigmaMPerS < 0) {
            throw new IllegalArgumentException("noise sigmas must be >= 0; got T " + temperatureSigmaK + " K, RH "
                    + relativeHumiditySigma + ", p " + pressureSigmaPa + " Pa, wind " + windComponentSigmaMPerS + " m/s");
        }
    }

    public static InstrumentNoise withDefaults(long seed) {
        return new InstrumentNoise(seed, DEFAULT_TEMPERATURE_SIGMA_K, DEFAULT_RH_SIGMA, DEFAULT_PRESSURE_SIGMA_PA,
                DEFAULT_WIND_SIGMA_M_PER_S);
    }
}
