package org.littoral.scenarios.scenario;

import java.util.LinkedHashMap;
import java.util.Map;
import org.littoral.model.linear.LinearBreezeModel;
import org.littoral.scenarios.input.UserInputException;

/**
 * The model's own limits, applied to a scenario when it is read (so a run never starts with values the model
 * will refuse), and the model's messages put in the scenario file's terms: YAML keys, never Java field names.
 */
public final class ModelLimits {
    private ModelLimits() {
    }

    /** Model names in messages and the scenario keys (and units) they come from. */
    private static final Map<String, String> KEYS = new LinkedHashMap<>();

    static {
        KEYS.put("newtonianCoolingPerS", "physics.cooling_per_s");
        KEYS.put("frictionPerS", "physics.friction_per_s");
        KEYS.put("buoyancyFrequencyPerS", "atmosphere.buoyancy_frequency_per_s");
        KEYS.put("ambientCrossShoreMPerS", "the cross-shore part of ambient_wind.speed_m_per_s");
        KEYS.put("surfaceThetaK", "atmosphere.surface_theta_K");
        KEYS.put("surfacePressurePa", "atmosphere.surface_pressure_hPa (in Pa)");
        KEYS.put("heating.transitionHalfWidthM", "heating.transition_half_width_km (in m)");
        KEYS.put("heating.halfWidthM", "heating.half_width_km (in m)");
        KEYS.put("amplitudeKPerS", "heating.amplitude_K_per_h (per second)");
        KEYS.put("depthM", "heating.depth_m");
        KEYS.put("sunriseSolarHours", "heating.sunrise_solar_h");
        KEYS.put("sunsetSolarHours", "heating.sunset_solar_h");
        KEYS.put("lapseGammaKPerM", "heating.lapse_above_K_per_km (per m)");
        KEYS.put("entrainmentRatio", "heating.entrainment_ratio");
        KEYS.put("initialDepthM", "heating.initial_depth_m");
        KEYS.put("peakFluxDifferenceWm2", "heating.peak_flux_difference_W_per_m2");
        KEYS.put("xGrid nx", "grid.points");
    }

    /** A model message with its Java names replaced by the scenario keys they come from. */
    public static String inYamlTerms(String modelMessage) {
        if (modelMessage == null) {
            return "(no reason given)";
        }
        String s = modelMessage;
        for (Map.Entry<String, String> e : KEYS.entrySet()) {
            s = s.replace(e.getKey(), e.getValue());
        }
        return s;
    }

    /**
     * Applies the model's configuration checks to a scenario that passed the schema; a refusal becomes one line
     * naming the keys.
     */
    static void check(Scenario s, String source) {
        try {
            if (s.kind() == Scenario.Kind.LINEAR) {
                LinearBreezeModel.check(s.toLinearConfig());
            } else {
                s.toNonlinearConfig();
            }
        } catch (IllegalArgumentException e) {
            throw new UserInputException(source + ": the " + (s.kind() == Scenario.Kind.LINEAR ? "linear" : "nonlinear")
                    + " model refuses these values: " + inYamlTerms(e.getMessage()) + "; change that key", e);
        }
    }
}
