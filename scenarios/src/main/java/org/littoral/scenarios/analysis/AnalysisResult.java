package org.littoral.scenarios.analysis;

import java.util.ArrayList;
import java.util.List;
import org.littoral.scenarios.analysis.detect.Passage;

/** Everything the chain computed, per site-day and over the whole set. */
public record AnalysisResult(List<SiteDayResult> siteDays, List<String> notes) {

    /** All passages in site-day order. Allocates. */
    public List<Passage> passages() {
        List<Passage> out = new ArrayList<>();
        for (SiteDayResult r : siteDays) {
            out.addAll(r.passages());
        }
        return out;
    }
}
