package org.littoral.scenarios.analysis.detect;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.DetectionSettings;

/**
 * Skill of the passage detectors on a campaign whose true passage times are known (the invented demo
 * campaign, synthetic soundings): per detector (all its change points), for the combined passages, and
 * for the passages that turn the wind onshore (the breeze fronts, which is what the true times are).
 * A true passage is found when a detection lies within one local flight interval of it
 * ({@link DetectionScore#score}).
 */
public final class CampaignSkill {
    private CampaignSkill() {
    }

    /** One row: what was scored and its score. */
    public record Row(String what, DetectionScore score) {
    }

    /** Label of the row scoring the onshore-turning passages. */
    public static final String ONSHORE = "onshore-turning passages";

    /**
     * @param truth true passage times (local hours) per site-day key ("day/site"); site-days without an
     *              entry have none (null days)
     */
    public static List<Row> score(AnalysisResult ar, DetectionSettings s, Coast coast, Map<String, double[]> truth) {
        List<PassageDetector> dets = PassageFinder.detectors(s);
        DetectionScore[] per = new DetectionScore[dets.size() + 2];
        Arrays.fill(per, new DetectionScore(0, 0, 0, 0));
        for (SiteDayResult r : ar.siteDays()) {
            double[] tr = truth.getOrDefault(r.siteDay().key(), new double[0]);
            double[] t = r.siteDay().timeHours();
            for (int k = 0; k < dets.size(); k++) {
                double[] found = dets.get(k).detect(r.siteDay(), coast).stream().mapToDouble(ChangeCandidate::timeHours).toArray();
                per[k] = per[k].plus(DetectionScore.score(tr, found, t));
            }
            double[] all = r.passages().stream().mapToDouble(Passage::timeHours).toArray();
            per[dets.size()] = per[dets.size()].plus(DetectionScore.score(tr, all, t));
            double[] onshore = r.passages().stream().filter(Passage::turnsOnshore).mapToDouble(Passage::timeHours).toArray();
            per[dets.size() + 1] = per[dets.size() + 1].plus(DetectionScore.score(tr, onshore, t));
        }
        List<Row> out = new ArrayList<>();
        for (int k = 0; k < dets.size(); k++) {
            out.add(new Row(dets.get(k).name() + " (all change points)", per[k]));
        }
        out.add(new Row("passages, both detectors combined (any kind)", per[dets.size()]));
        out.add(new Row(ONSHORE, per[dets.size() + 1]));
        return out;
    }
}
