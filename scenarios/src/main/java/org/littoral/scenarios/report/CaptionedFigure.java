package org.littoral.scenarios.report;

/** A figure with the file name it is written under and its caption (for a report and its PNG files). */
public record CaptionedFigure(String fileName, Figure figure, String caption) {
}
