package org.littoral.scenarios.analysis.detect;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.LayerMeans;
import org.littoral.scenarios.analysis.SiteDay;

/**
 * Detector (a): PELT (Killick et al. 2012) with the normal mean-change cost on the layer-mean wind
 * vector of one layer, so that direction is handled as a circular quantity (Mardia &amp; Jupp 2000,
 * Directional Statistics, section 2.2: work with the vector, never with the angle). Either on
 * wind components (u, v), which weights direction changes by speed and stays stable in calm air, or
 * on unit vectors (sin, cos of direction), which sees pure direction changes. The noise scale of
 * each component is estimated from first differences (robust to the changes), with a floor.
 */
public final class WindShiftDetector implements PassageDetector {

    /** How the wind vector enters the cost. */
    public enum Representation { COMPONENTS, UNIT_VECTOR }

    private final DetectionSettings s;
    private final org.littoral.scenarios.analysis.Layer layer;
    private final String name;

    public WindShiftDetector(DetectionSettings settings) {
        this(settings, settings.windLayer, "pelt-wind");
    }

    /** The same detector on another layer (the low layer of shallow breezes), under its own name. */
    public WindShiftDetector(DetectionSettings settings, org.littoral.scenarios.analysis.Layer layer, String name) {
        this.s = settings;
        this.layer = layer;
        this.name = name;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public List<ChangeCandidate> detect(SiteDay sd, Coast coast) {
        int n = sd.size();
        int[] idx = new int[n];
        double[] a = new double[n];
        double[] b = new double[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            Profile p = sd.profiles().get(i);
            double e = LayerMeans.mean(p, p.windEastMPerS(), layer, s.minValidFraction);
            double no = LayerMeans.mean(p, p.windNorthMPerS(), layer, s.minValidFraction);
            if (Double.isNaN(e) || Double.isNaN(no)) {
                continue;
            }
            if (s.windRepresentation == Representation.UNIT_VECTOR) {
                double sp = Math.hypot(e, no);
                if (sp < s.calmSpeedMPerS) {
                    continue; // direction undefined in calm air
                }
                e /= sp;
                no /= sp;
            }
            idx[m] = i;
            a[m] = e;
            b[m] = no;
            m++;
        }
        return segmentAndMap(name(), new double[][] {java.util.Arrays.copyOf(a, m), java.util.Arrays.copyOf(b, m)},
                java.util.Arrays.copyOf(idx, m), sd.timeHours(), s.windRepresentation == Representation.UNIT_VECTOR
                        ? s.unitVectorSdFloor : s.windSdFloorMPerS, s.penalty, s.minSegmentProfiles, true);
    }

    /**
     * Scales each dimension (robust noise scale from differences, or the plain sd when robust is false),
     * runs PELT, maps the change ends back to site-day profile indices.
     */
    static List<ChangeCandidate> segmentAndMap(String name, double[][] data, int[] idx, double[] timeHours,
                                               double sdFloor, Penalty penalty, int minSeg, boolean robust) {
        List<ChangeCandidate> out = new ArrayList<>();
        int m = idx.length;
        if (m < 2 * Math.max(1, minSeg)) {
            return out;
        }
        double[][] scaled = new double[data.length][];
        for (int d = 0; d < data.length; d++) {
            double sc = robust ? RobustScale.noiseSdFromDifferences(data[d]) : RobustScale.sd(data[d]);
            if (!(sc >= sdFloor)) {
                sc = sdFloor;
            }
            scaled[d] = new double[m];
            for (int i = 0; i < m; i++) {
                scaled[d][i] = data[d][i] / sc;
            }
        }
        Segmentation seg = Pelt.segment(new NormalMeanCost(scaled), penalty, minSeg);
        for (int c : seg.changeEnds()) {
            out.add(ChangeCandidate.between(name, idx[c - 1], idx[c], timeHours));
        }
        return out;
    }
}
