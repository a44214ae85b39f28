package org.littoral.scenarios.analysis;

import java.util.ArrayList;
import java.util.List;
import org.littoral.scenarios.analysis.composite.CompositeRow;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.metrics.DistributionRow;
import org.littoral.scenarios.analysis.metrics.PassageResponse;
import org.littoral.scenarios.analysis.stats.ComparisonRow;

/**
 * Everything the chain computed.
 *
 * @param siteDays       per site-day: passages, unconfirmed changes, ambient wind, breeze type, attributes
 * @param responses      response metrics of every passage, layer and variable
 * @param distributions  distributions over passages of change, tendency and anomaly
 * @param composites     box-and-whisker composites
 * @param comparisons    group comparisons (first onshore passage per site-day), Holm-adjusted
 * @param comparisonNote the multiple-comparison note for that table
 * @param notes          everything left out or rejected, one line each
 */
public record AnalysisResult(List<SiteDayResult> siteDays, List<PassageResponse> responses,
                             List<DistributionRow> distributions, List<CompositeRow> composites,
                             List<ComparisonRow> comparisons, String comparisonNote, List<String> notes) {

    /** All passages in site-day order. Allocates. */
    public List<Passage> passages() {
        List<Passage> out = new ArrayList<>();
        for (SiteDayResult r : siteDays) {
            out.addAll(r.passages());
        }
        return out;
    }
}
