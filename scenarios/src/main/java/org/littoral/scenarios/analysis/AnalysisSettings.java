package org.littoral.scenarios.analysis;

import java.util.LinkedHashMap;
import java.util.Map;
import org.littoral.scenarios.analysis.detect.DetectionSettings;
import org.littoral.scenarios.analysis.ingest.IngestSettings;
import org.littoral.scenarios.analysis.stats.BreezeTyping;
import org.littoral.scenarios.cli.UserInputException;

/**
 * Every setting of the analysis chain, with documented defaults (docs/analysis.md gives the reasons).
 * Public fields so that a scenario or command can override any of them.
 */
public final class AnalysisSettings {
    public IngestSettings ingest = new IngestSettings();
    public DetectionSettings detection = new DetectionSettings();

    /** Breeze typing sectors and weak-wind threshold (quadrants, 2 m/s). */
    public BreezeTyping breezeTyping = BreezeTyping.defaults();
    /**
     * Layer for the ambient wind, m above ground. Default 300-600 m: above the shallow morning
     * breeze inflow yet within reach of a drone (profiles to about 600 m, REFERENCES.md section 9).
     */
    public Layer ambientLayer = new Layer(300, 600);
    /** Morning window (local clock hours) for the ambient wind; only profiles before the first passage count. */
    public double ambientFromHours = 6.0;
    public double ambientToHours = 10.0;

    /**
     * Per-day attributes supplied by the user, keyed by day (applies to every site) or "day/site";
     * e.g. convection=yes, tag=IOP3, breeze_type=CORKSCREW (overrides the classifier),
     * ambient_wind_speed_m_per_s with ambient_wind_direction_deg (overrides the profiles).
     */
    public Map<String, Map<String, String>> dayAttributes = new LinkedHashMap<>();

    public AnalysisSettings validate() {
        ingest.validate();
        detection.validate();
        if (!(ambientToHours > ambientFromHours)) {
            throw new UserInputException("ambientToHours = " + ambientToHours + " must be after ambientFromHours = "
                    + ambientFromHours + " (defaults 6 and 10 h local)");
        }
        return this;
    }
}
