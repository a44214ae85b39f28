package org.littoral.scenarios.analysis.ingest;

import java.util.List;
import org.littoral.model.sounding.Profile;

/**
 * Profiles read from one file, with the QC log of what was removed or flagged.
 *
 * @param raw true when the file held raw ascents (binned here), false for already-binned profiles
 */
public record IngestResult(List<Profile> profiles, QcLog qc, boolean raw) {
}
