package org.littoral.scenarios.analysis.detect;

import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.SiteDay;

/** Finds change points (candidate front passages) in the profiles of one site and day. */
public interface PassageDetector {
    /** Short stable name used in output tables, e.g. "pelt-wind". */
    String name();

    /** Candidates in time order. */
    List<ChangeCandidate> detect(SiteDay siteDay, Coast coast);
}
