package org.littoral.scenarios.demo;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.thermo.Thermo;

/**
 * The noise-free state of one INVENTED day at one site: a smooth background (a mixed layer that grows by
 * encroachment into a stable free atmosphere, moisture decreasing with height, an ambient wind that backs
 * towards the ground by friction and veers with height) with the day's prescribed fronts blended in.
 * Independent of the littoral breeze models on purpose: it is what the analysis chain is tested against.
 *
 * <p>A front is a smooth step in time (half-width {@link #FRONT_HALF_WIDTH_HOURS}) times a smooth top at
 * the front's depth; behind it the wind turns to the front's direction, the air cools or warms and
 * moistens or dries by the front's (random, either-sign) amounts, and a weak offshore return flow runs
 * above the layer. The head leans back, so its top arrives up to {@link #HEAD_LEAN_HOURS} after the ground
 * arrival (the TRUE passage time is the ground arrival).
 */
public final class DemoAtmosphere {
    /** Half-width of the front's time step (tanh), hours: 3.6 min, well inside one 15-min flight interval. */
    public static final double FRONT_HALF_WIDTH_HOURS = 0.06;
    /** Delay of the head's top relative to its ground arrival, hours. */
    public static final double HEAD_LEAN_HOURS = 0.08;
    /** Clock times heating starts and the mixed layer stops warming, hours. */
    static final double HEATING_START_HOURS = 6.5;
    static final double HEATING_END_HOURS = 15.0;
    static final double MORNING_MIXED_DEPTH_M = 100.0;
    /** Clockwise turning of the breeze after passage (Haurwitz 1947, Northern Hemisphere; from memory). */
    static final double BREEZE_VEERING_DEG_PER_HOUR = 8.0;

    private final DemoDay day;
    private final Coast coast;
    private final List<DemoDay.Front> fronts;
    private final double[] inlandUnit;
    private final double[] scratch = new double[2];
    /** Half-width (hours) of each front's time step, in the order of {@link #fronts}. */
    private final double[] halfWidthHours;

    /** Allocates the front list for one site. */
    public DemoAtmosphere(DemoDay day, int siteIndex) {
        this(day, siteIndex, 0.0, 0.0);
    }

    /**
     * Gradual-turn mode: each front's wind turn takes a duration drawn uniformly from turnMinutesLo..turnMinutesHi
     * (10-90 % of the tanh step, i.e. 2 atanh(0.8) = 2.197 half-widths), deterministic in the day's seed and site.
     * turnMinutesHi = 0 keeps the default sharp front ({@link #FRONT_HALF_WIDTH_HOURS}).
     */
    public DemoAtmosphere(DemoDay day, int siteIndex, double turnMinutesLo, double turnMinutesHi) {
        this.day = day;
        this.coast = DemoCoast.coast(day.date().getDayOfYear());
        List<DemoDay.Front> f = new ArrayList<>();
        for (DemoDay.Front fr : day.fronts()) {
            if (fr.siteIndex() == siteIndex) {
                f.add(fr);
            }
        }
        f.sort((a, b) -> Double.compare(a.arrivalHours(), b.arrivalHours()));
        this.fronts = f;
        this.halfWidthHours = new double[f.size()];
        java.util.Random r = new java.util.Random(DemoFlights.mix(day.seed(), 7000 + siteIndex));
        for (int k = 0; k < f.size(); k++) {
            double minutes = turnMinutesLo + (turnMinutesHi - turnMinutesLo) * r.nextDouble();
            halfWidthHours[k] = turnMinutesHi > 0 ? minutes / 60.0 / 2.1972 : FRONT_HALF_WIDTH_HOURS;
        }
        double az = Math.toRadians(coast.inlandAzimuthDeg());
        this.inlandUnit = new double[] {Math.sin(az), Math.cos(az)};
    }

    /** Heating progress 0..1: a half-cosine from {@link #HEATING_START_HOURS} to {@link #HEATING_END_HOURS}. */
    static double heatingProgress(double hours) {
        double s = (hours - HEATING_START_HOURS) / (HEATING_END_HOURS - HEATING_START_HOURS);
        s = Math.max(0.0, Math.min(1.0, s));
        return 0.5 * (1.0 - Math.cos(Math.PI * s));
    }

    /** Mixed-layer potential temperature, K. */
    public double mixedLayerThetaK(double hours) {
        DemoDay.Background b = day.background();
        return b.morningThetaK() + b.lapseKPerM() * MORNING_MIXED_DEPTH_M + b.warmingK() * heatingProgress(hours);
    }

    /** Mixed-layer depth by encroachment: where the free-atmosphere theta equals the mixed-layer theta, m. */
    public double mixedLayerDepthM(double hours) {
        DemoDay.Background b = day.background();
        return (mixedLayerThetaK(hours) - b.morningThetaK()) / b.lapseKPerM();
    }

    /** Background potential temperature, K: smooth maximum of the mixed layer and the free atmosphere. */
    double backgroundThetaK(double z, double hours) {
        DemoDay.Background b = day.background();
        double thetaMixed = mixedLayerThetaK(hours);
        double thetaFree = b.morningThetaK() + b.lapseKPerM() * z;
        double delta = 0.25;
        double x = (thetaFree - thetaMixed) / delta;
        double smoothMax = thetaMixed + delta * (x > 30 ? x : Math.log1p(Math.exp(x)));
        // Superadiabatic surface layer while the sun heats the ground.
        double flux = Math.max(0.0, Math.sin(Math.PI * (hours - 6.0) / 13.0));
        return smoothMax + 1.5 * flux * Math.exp(-z / 25.0);
    }

    /** Background mixing ratio, kg/kg: well mixed below the mixed-layer top, drier above. */
    double backgroundMixingRatio(double z, double hours) {
        double r0 = day.background().morningMixingRatioGPerKg();
        double s = heatingProgress(hours);
        // Morning evaporation moistens the layer, afternoon entrainment of dry air dries it.
        double rMixed = r0 + 0.8 * s - 1.4 * s * s;
        double rFree = 0.65 * r0 * Math.exp(-z / 3000.0);
        double h = mixedLayerDepthM(hours);
        double above = 1.0 / (1.0 + Math.exp(-(z - h) / 30.0));
        return 1e-3 * ((rMixed * (1.0 - 0.04 * z / 1000.0)) * (1.0 - above) + rFree * above);
    }

    /** Ambient wind (east, north), m/s: reduced and backed towards the ground by friction. */
    void ambientWind(double z, double hours, double[] out) {
        double s = day.ambientSpeedMPerS();
        double factor = 0.5 + 0.5 * (1.0 - Math.exp(-z / 200.0));
        if (z < mixedLayerDepthM(hours)) {
            factor += (1.0 - factor) * 0.3 * heatingProgress(hours); // daytime mixing evens the profile
        }
        // Northern Hemisphere: the wind near the ground blows from a direction backed (anticlockwise)
        // by up to ~25 deg from the wind aloft, i.e. it veers with height (common practice).
        double dir = day.ambientDirectionDeg() - 25.0 * Math.exp(-z / 250.0);
        double[] en = Coast.eastNorthFromDirection(s * factor, dir);
        out[0] = en[0];
        out[1] = en[1];
    }

    /**
     * Fills {@code out} with {theta K, mixing ratio kg/kg, wind east m/s, wind north m/s, front weight 0..1
     * of the last front} at height z (m) and clock time (hours). Cheap: no allocation (so not thread-safe).
     */
    public void state(double z, double hours, double[] out) {
        double[] w2 = scratch;
        ambientWind(z, hours, w2);
        double east = w2[0];
        double north = w2[1];
        double thetaAnomaly = 0.0;
        double mixingAnomaly = 0.0;
        double lastWeight = 0.0;
        for (int fi = 0; fi < fronts.size(); fi++) {
            DemoDay.Front f = fronts.get(fi);
            double depth = f.depthM();
            double lean = HEAD_LEAN_HOURS * Math.min(z / depth, 1.5);
            double g = 0.5 * (1.0 + Math.tanh((hours - f.arrivalHours() - lean) / halfWidthHours[fi]));
            double top = 0.5 * (1.0 - Math.tanh((z - depth) / (0.08 * depth + 20.0)));
            double w = g * top;
            double since = Math.max(0.0, hours - f.arrivalHours());
            double dir = f.directionFromDeg() + BREEZE_VEERING_DEG_PER_HOUR * since;
            double jet = 0.75 + 0.25 * Math.exp(-Math.pow((z - 0.3 * depth) / (0.3 * depth), 2));
            double nearGround = 0.6 + 0.4 * (1.0 - Math.exp(-z / 60.0));
            double[] breeze = Coast.eastNorthFromDirection(f.postFrontSpeedMPerS() * jet * nearGround, dir);
            // Weak offshore return flow above the breeze layer.
            double ret = -0.3 * f.postFrontSpeedMPerS() * Math.exp(-Math.pow((z - 1.5 * depth) / (0.4 * depth), 2))
                    * g * (1.0 - top);
            east = (1.0 - w) * east + w * breeze[0] + ret * inlandUnit[0];
            north = (1.0 - w) * north + w * breeze[1] + ret * inlandUnit[1];
            double growth = hours > f.arrivalHours() ? 0.6 + 0.4 * (1.0 - Math.exp(-since / 0.75)) : 0.6;
            double shape = 1.0 - 0.5 * Math.min(z / depth, 1.0);
            thetaAnomaly = (1.0 - w) * thetaAnomaly + w * f.thetaChangeK() * shape * growth;
            mixingAnomaly = (1.0 - w) * mixingAnomaly + w * 1e-3 * f.mixingRatioChangeGPerKg() * shape * growth;
            lastWeight = w;
        }
        out[0] = backgroundThetaK(z, hours) + thetaAnomaly;
        out[1] = Math.max(5e-4, backgroundMixingRatio(z, hours) + mixingAnomaly);
        out[2] = east;
        out[3] = north;
        out[4] = lastWeight;
    }

    /** Surface pressure, Pa, with a small pressure rise behind each front (the density current's head). */
    double surfacePressurePa(double hours) {
        double p = day.background().surfacePressureHPa() * 100.0;
        for (int fi = 0; fi < fronts.size(); fi++) {
            p += 30.0 * 0.5 * (1.0 + Math.tanh((hours - fronts.get(fi).arrivalHours()) / halfWidthHours[fi]));
        }
        return p;
    }

    /**
     * Hydrostatic pressure column (allocates) on heights 0, dz, 2 dz ... top at one time, integrating
     * dp/dz = -g p / (R_d T_v) with the day's temperature and moisture.
     */
    public double[] pressureColumnPa(double hours, double dzM, double topM) {
        int n = (int) Math.ceil(topM / dzM) + 1;
        double[] p = new double[n];
        double[] s = new double[5];
        p[0] = surfacePressurePa(hours);
        for (int k = 1; k < n; k++) {
            double zMid = (k - 0.5) * dzM;
            state(zMid, hours, s);
            // Predictor for the mid-level pressure, then the virtual temperature there.
            double pMid = p[k - 1] * Math.exp(-Thermo.G * 0.5 * dzM / (Thermo.RD * 290.0));
            double t = Thermo.temperatureFromPotentialK(s[0], pMid);
            double tv = Thermo.virtualTemperatureK(t, s[1]);
            p[k] = p[k - 1] * Math.exp(-Thermo.G * dzM / (Thermo.RD * tv));
        }
        return p;
    }

    /** Saturation-limited mixing ratio: the invented air never supersaturates (98.5 % RH at most). */
    static double limitToSaturation(double mixingRatio, double temperatureK, double pressurePa) {
        return Math.min(mixingRatio, Thermo.mixingRatioFromRelativeHumidity(0.985, temperatureK, pressurePa));
    }
}
