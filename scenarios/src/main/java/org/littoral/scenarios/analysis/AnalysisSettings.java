package org.littoral.scenarios.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.littoral.scenarios.analysis.composite.CompositeSpec;
import org.littoral.scenarios.analysis.detect.DetectionSettings;
import org.littoral.scenarios.analysis.ingest.IngestSettings;
import org.littoral.scenarios.analysis.metrics.MetricSettings;
import org.littoral.scenarios.analysis.stats.StatsSettings;
import org.littoral.scenarios.analysis.stats.BreezeTyping;
import org.littoral.scenarios.input.UserInputException;

/**
 * Every setting of the analysis chain, with documented defaults (docs/analysis.md gives the reasons).
 * Public fields so that a scenario or command can override any of them.
 */
public final class AnalysisSettings {
    public IngestSettings ingest = new IngestSettings();
    public DetectionSettings detection = new DetectionSettings();
    public MetricSettings metrics = new MetricSettings();
    public StatsSettings stats = new StatsSettings();

    /**
     * Composites. Default: theta, mixing ratio, theta-e and cross-shore wind in the 10-100 m layer, by
     * time relative to the first onshore passage (anomalies, 30-min bins, -3..+4 h) and by hour of day
     * (values, 1-h bins, 06-20 h), grouped by breeze type.
     */
    public List<CompositeSpec> composites = defaultComposites();

    /** Breeze typing sectors and weak-wind threshold (quadrants, 2 m/s). */
    public BreezeTyping breezeTyping = BreezeTyping.defaults();
    /**
     * Layer for the ambient wind, m above ground. Default 300-600 m: above the shallow morning
     * breeze inflow yet within reach of a drone (profiles to about 600 m, docs/references.md section 9).
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

    /**
     * The campaign's local clock (a column map's time zone, else the coast's UTC offset); when set, outputs carry
     * UTC beside local time. Null for synthetic runs whose days are labels.
     */
    public java.time.ZoneId localZone;

    /**
     * Inland distance (m) of each site, from the coast file's {@code sites:} list (empty when none): passage order
     * between sites is checked against it ({@link ConventionCheck}).
     */
    public Map<String, Double> siteInlandM = new LinkedHashMap<>();

    public AnalysisSettings validate() {
        ingest.validate();
        detection.validate();
        metrics.validate();
        stats.validate();
        if (!(ambientToHours > ambientFromHours)) {
            throw new UserInputException("ambientToHours = " + ambientToHours + " must be after ambientFromHours = "
                    + ambientFromHours + " (defaults 6 and 10 h local)");
        }
        return this;
    }

    static List<CompositeSpec> defaultComposites() {
        List<CompositeSpec> l = new ArrayList<>();
        Layer near = new Layer(10, 100);
        for (Variable v : List.of(Variable.THETA, Variable.MIXING_RATIO, Variable.THETA_E, Variable.CROSS_SHORE_WIND)) {
            l.add(CompositeSpec.relative(v, near, "breeze_type"));
        }
        for (Variable v : List.of(Variable.THETA, Variable.MIXING_RATIO, Variable.THETA_E, Variable.CROSS_SHORE_WIND)) {
            l.add(CompositeSpec.hourOfDay(v, near, "breeze_type"));
        }
        return l;
    }
}
