package org.littoral.scenarios.analysis.ingest;

import java.util.List;
import java.util.Map;
import org.littoral.model.sounding.Profile;

/**
 * Profiles read from one file, with the QC log of what was removed or flagged.
 *
 * @param raw           true when the file held raw ascents (binned here), false for already-binned profiles
 * @param dayAttributes values of the extra (non-profile) columns, e.g. convection or tag, keyed "day/site";
 *                      merge them into AnalysisSettings.dayAttributes to group by them
 */
public record IngestResult(List<Profile> profiles, QcLog qc, boolean raw, Map<String, Map<String, String>> dayAttributes) {
}
