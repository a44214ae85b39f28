package org.littoral.scenarios.analysis;

import java.util.List;
import java.util.Map;
import org.littoral.scenarios.analysis.detect.ChangeCandidate;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.stats.BreezeType;

/**
 * Analysis of one site-day.
 *
 * @param ambientWind  {east, north} ambient wind (m/s), NaN when unavailable
 * @param ambientSource "profiles", "user" or "none"
 * @param attributes   grouping attributes: site, day, month, breeze_type, plus the user's per-day attributes
 */
public record SiteDayResult(SiteDay siteDay, List<Passage> passages, List<ChangeCandidate> unconfirmed,
                            List<String> notes, double[] ambientWind, String ambientSource, BreezeType breezeType,
                            Map<String, String> attributes) {

    /** The first passage that brings onshore flow, or null. */
    public Passage firstOnshorePassage() {
        for (Passage p : passages) {
            if (p.turnsOnshore()) {
                return p;
            }
        }
        return null;
    }
}
