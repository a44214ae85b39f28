package org.littoral.scenarios.analysis.detect;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.Variable;

/**
 * Detector (b), our extension of the same cost: one PELT search over many series at once (each
 * variable in each layer, e.g. wind components, theta and mixing ratio at three levels). Every series
 * is standardised to unit standard deviation over the day (floored), so that no variable or level
 * dominates, and the cost is the sum over series of the unit-variance normal mean-change cost: a
 * change point is placed where all series jointly change their means. Because the daily standard
 * deviation contains the signal, this is a scaled-likelihood criterion rather than a likelihood;
 * the penalty counts one mean per series plus the location ((p + 1) ln n for BIC). A profile
 * missing any series is left out of this detector. The penalty is multiplied by
 * {@link DetectionSettings#multiPenaltyFactor} (default 2): slow diurnal trends in theta otherwise
 * get cut into steps.
 */
public final class MultivariateDetector implements PassageDetector {

    private final DetectionSettings s;

    public MultivariateDetector(DetectionSettings settings) {
        this.s = settings;
    }

    @Override
    public String name() {
        return "pelt-multi";
    }

    @Override
    public List<ChangeCandidate> detect(SiteDay sd, Coast coast) {
        List<double[]> series = new ArrayList<>();
        List<Double> floors = new ArrayList<>();
        for (Layer layer : s.multiLayers) {
            for (Variable v : s.multiVariables) {
                series.add(sd.series(v, layer, coast, s.minValidFraction));
                floors.add(sdFloor(v));
            }
        }
        int n = sd.size();
        int[] idx = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            boolean ok = true;
            for (double[] y : series) {
                ok &= !Double.isNaN(y[i]);
            }
            if (ok) {
                idx[m++] = i;
            }
        }
        idx = java.util.Arrays.copyOf(idx, m);
        List<ChangeCandidate> out = new ArrayList<>();
        if (m < 2 * Math.max(1, s.minSegmentProfiles)) {
            return out;
        }
        double[][] data = new double[series.size()][m];
        for (int d = 0; d < data.length; d++) {
            double[] y = series.get(d);
            double mean = 0;
            for (int i = 0; i < m; i++) {
                data[d][i] = y[idx[i]];
                mean += data[d][i];
            }
            mean /= m;
            double sc = RobustScale.sd(data[d]);
            if (!(sc >= floors.get(d))) {
                sc = floors.get(d);
            }
            for (int i = 0; i < m; i++) {
                data[d][i] = (data[d][i] - mean) / sc;
            }
        }
        Segmentation seg = Pelt.segment(new NormalMeanCost(data), s.penalty.times(s.multiPenaltyFactor), s.minSegmentProfiles);
        for (int c : seg.changeEnds()) {
            out.add(ChangeCandidate.between(name(), idx[c - 1], idx[c], sd.timeHours()));
        }
        return out;
    }

    private double sdFloor(Variable v) {
        return switch (v) {
            case THETA, TEMPERATURE, THETA_E -> s.thetaSdFloorK;
            case MIXING_RATIO -> s.mixingRatioSdFloorGPerKg;
            default -> s.windSdFloorMPerS;
        };
    }
}
