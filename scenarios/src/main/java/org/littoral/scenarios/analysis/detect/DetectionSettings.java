package org.littoral.scenarios.analysis.detect;

import java.util.List;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.input.UserInputException;

/** Settings of passage detection. Public fields; defaults and reasons in docs/analysis.md. */
public final class DetectionSettings {
    /**
     * Layer of the wind-shift detector, m above ground. Default 100-300 m: above the surface layer
     * (obstacles, take-off) yet inside the onshore inflow of a breeze, typically 0.5-1 km deep
     * (Simpson 1994), and below its return flow.
     */
    public Layer windLayer = new Layer(100, 300);
    /** Wind as components (default: stable in calm air) or unit vectors (pure direction). */
    public WindShiftDetector.Representation windRepresentation = WindShiftDetector.Representation.COMPONENTS;
    /** Penalty: BIC (default), MBIC or manual. */
    public Penalty penalty = Penalty.bic();
    /** Minimum segment length in profiles. Default 2: one odd flight is not a new regime. */
    public int minSegmentProfiles = 2;
    /** Floor of the wind noise scale, m/s. Default 0.75: typical flight-to-flight scatter of a layer-mean drone wind. */
    public double windSdFloorMPerS = 0.75;
    /** Floor of the unit-vector noise scale (dimensionless). */
    public double unitVectorSdFloor = 0.15;
    /** Below this layer-mean speed (m/s) direction is undefined (unit-vector cost and sector labels). */
    public double calmSpeedMPerS = 0.5;
    /** A layer mean needs at least this fraction of the layer's levels valid. */
    public double minValidFraction = 0.5;

    /** Run the multivariate detector (b). */
    public boolean useMultivariate = true;
    /** Layers of the multivariate detector. Default 50-150, 150-300, 300-500 m: low, middle and top of a breeze layer. */
    public List<Layer> multiLayers = List.of(new Layer(50, 150), new Layer(150, 300), new Layer(300, 500));
    /** Variables of the multivariate detector: wind components, theta and mixing ratio (issue 4). */
    public List<Variable> multiVariables = List.of(Variable.WIND_EAST, Variable.WIND_NORTH, Variable.THETA,
            Variable.MIXING_RATIO);
    /** Floors of the standardising scales. */
    public double thetaSdFloorK = 0.2;
    public double mixingRatioSdFloorGPerKg = 0.2;
    /**
     * Multiplier of the multivariate detector's penalty. Default 2: on invented days
     * ({@code SyntheticAscents}, 60 days) factor 1 gave about 40 % false changes, mostly diurnal
     * theta trends cut into steps, and factor 2 none with the same hits. Re-tune for real campaigns.
     */
    public double multiPenaltyFactor = 2.0;

    /**
     * Report only passages the wind-shift detector finds (default true: the wind shift is the most
     * reliable passage signal, docs/references.md section 9); other detectors then add confidence and
     * timing spread, and their unmatched changes are listed as unconfirmed.
     */
    public boolean requirePrimary = true;
    /** A wind-detector change whose before/after mean wind vectors differ by less than this (m/s) is rejected (listed). */
    public double minVectorChangeMPerS = 1.0;
    /** Changes of different detectors match when their times differ by at most max(sum of their uncertainties, this), hours. */
    public double matchMinHours = 0.25;
    /**
     * Half-width of the onshore sector, degrees either side of the direction pointing inland
     * (the wind blowing from sea to land). Default 60: excludes flow within 30 degrees of shore-parallel.
     */
    public double onshoreHalfWidthDeg = 60.0;

    /**
     * One passage per gradual turn (docs/analysis.md, "Gradual turns"): two consecutive changes become one passage
     * when the wind state between them lasts at most {@link #gradualTurnMaxHours}, the wind keeps turning the
     * same way through both (no turn back), and the whole turn brings or strengthens onshore flow. Default on.
     */
    public boolean mergeGradualTurns = true;
    /**
     * Longest intermediate state (first to last profile between the two changes), hours, that still counts as
     * mid-turn. Default 0.75 h: a 20-40 min turn leaves one to three 15-min flights mid-turn, while a bay breeze
     * holds for 1.5 h or more before the sea breeze.
     */
    public double gradualTurnMaxHours = 0.75;
    /**
     * With the gradual-turn rule on, a later onshore-strengthening change on a site-day that already has an onshore
     * passage counts as a second front only if the wind turns towards onshore by this many degrees ...
     */
    public double strengtheningMinTurnDeg = 10.0;
    /** ... or the onshore component rises by this much, m/s. Default 1 (a bay breeze at 70 % of the sea breeze still counts). */
    public double strengtheningMinGainMPerS = 1.0;
    /** Turns smaller than this (deg) between the states do not count as turning back. Default 10. */
    public double turnBackToleranceDeg = 10.0;

    /**
     * Search the low layer too (docs/analysis.md, "Shallow breezes"): a change that turns the wind of
     * {@link #shallowWindLayer} into the onshore sector is an onshore passage even when the deeper detection layer
     * does not turn onshore (a shallow bay or lake breeze). Default on.
     */
    public boolean useShallowLayer = true;
    /** The low layer, m above ground. Default 30-130 m: above the take-off bins, inside a 150-250 m deep bay breeze. */
    public Layer shallowWindLayer = new Layer(30, 130);
    /**
     * A second onshore passage that only strengthens onshore flow must be a step, not a drift: when one straight line in
     * time fits the layer wind of the two segments as well as the step does (Schwarz 1978 BIC), it is the breeze turning
     * steadily (Haurwitz 1947), labelled OTHER. Default on (with {@link #mergeGradualTurns}).
     */
    public boolean driftTest = true;
    /**
     * Time an onshore passage when the layer's onshore wind component is half way from its value before the change to
     * its value after it (linear between the two flights around the change), in the lowest layer that turns onshore.
     * Default on; off: the midpoint between the two flights.
     */
    public boolean halfTurnTiming = true;

    public DetectionSettings validate() {
        if (minSegmentProfiles < 1) {
            throw new UserInputException("detection.minSegmentProfiles = " + minSegmentProfiles + " must be >= 1 (default 2)");
        }
        if (!(onshoreHalfWidthDeg > 0 && onshoreHalfWidthDeg < 180)) {
            throw new UserInputException("detection.onshoreHalfWidthDeg = " + onshoreHalfWidthDeg + " must be in (0, 180) (default 60)");
        }
        if (!(minValidFraction > 0 && minValidFraction <= 1)) {
            throw new UserInputException("detection.minValidFraction = " + minValidFraction + " must be in (0, 1] (default 0.5)");
        }
        if (!(gradualTurnMaxHours >= 0)) {
            throw new UserInputException("detection.gradualTurnMaxHours = " + gradualTurnMaxHours + " must be >= 0 h (default 0.75)");
        }
        if (multiLayers.isEmpty() || multiVariables.isEmpty()) {
            throw new UserInputException("detection.multiLayers and detection.multiVariables must not be empty");
        }
        return this;
    }
}
