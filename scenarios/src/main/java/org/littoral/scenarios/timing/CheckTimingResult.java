package org.littoral.scenarios.timing;

import java.nio.file.Path;
import org.littoral.scenarios.report.FanChartFigure;
import org.littoral.scenarios.report.Table;

/**
 * What {@code littoral check-timing} produced, for the command line and for callers that embed it (the demo):
 * the check itself, the files written, and the figure and tables ready to put into another report.
 */
public record CheckTimingResult(Path dir, Path flagsCsv, Path envelopeCsv, Path summaryJson, Path figurePng, Path reportHtml,
                                TimingCheck.Result check, FanChartFigure figure, String figureCaption, Table flagsTable,
                                Table envelopeTable, int members, int failedMembers, String model, double wallSeconds) {
}
