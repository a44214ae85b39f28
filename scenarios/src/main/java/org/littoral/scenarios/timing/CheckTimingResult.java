package org.littoral.scenarios.timing;

import java.nio.file.Path;
import org.littoral.scenarios.report.FanChartFigure;
import org.littoral.scenarios.report.Table;

/**
 * What {@code littoral check-timing} produced, for the command line and for callers that embed it (the demo):
 * the check itself, the files written, and the figure and tables ready to put into another report.
 *
 * @param flagsTable the rows of flags.csv (decimal hours)
 * @param envelopeTable the rows of envelope.csv (decimal hours)
 * @param flagsView the flags as a reader sees them (HH:MM)
 * @param envelopeView the envelope as a reader sees it (HH:MM)
 * @param flagsCaption the flags' caption, computed from the flags (never contradicts them)
 * @param envelopeCaption the envelope's caption (says what the members' times are)
 * @param notes what the check assumed or left out (earliest onset, failed members, a linear envelope)
 */
public record CheckTimingResult(Path dir, Path flagsCsv, Path envelopeCsv, Path summaryJson, Path figurePng, Path reportHtml,
                                TimingCheck.Result check, FanChartFigure figure, String figureCaption, Table flagsTable,
                                Table envelopeTable, int members, int failedMembers, String model, double wallSeconds,
                                Table flagsView, Table envelopeView, String flagsCaption, String envelopeCaption,
                                java.util.List<String> notes) {

    /**
     * The result of a step that computed the ensemble elsewhere or only in part (a shard, a submission to a batch
     * system): no check, no files; {@code members} and {@code failedMembers} count the ensemble and what failed now.
     */
    public static CheckTimingResult elsewhere(Path dir, org.littoral.scenarios.sweep.SweepExecutor.Outcome o) {
        return new CheckTimingResult(dir, null, null, null, null, null, null, null, null, null, null, o.members(), o.failedNow(),
                null, o.wallSeconds(), null, null, null, null, java.util.List.of());
    }
}
