package org.littoral.scenarios.analysis.detect;

import java.util.List;

/**
 * One detected passage at a site on a day. Time convention (docs/analysis.md): between the last profile before and
 * the first profile after the change; an onshore passage when the onshore wind component is half way from its value
 * before to its value after (in the low layer when that turned onshore too), other changes at the midpoint.
 *
 * @param ordinal            1, 2, ... in time order within the site-day
 * @param timeHours          local clock hours
 * @param uncertaintyHours   at least half the local flight interval; larger when detectors disagree
 * @param confidence         fraction of the detectors run that found it (0..1)
 * @param detectors          names of the detectors that found it
 * @param lastBefore         site-day index of the last profile before
 * @param firstAfter         site-day index of the first profile after
 * @param windBefore         mean wind {east, north} (m/s) of the detection layer (of the low layer for a shallow onshore
 *                           passage) between the previous change and this one
 * @param windAfter          the same between this change and the next one
 * @param crossShoreBeforeMPerS onshore-positive component before; after likewise
 * @param kind               onshore-sector label
 */
public record Passage(String site, String day, int ordinal, double timeHours, double uncertaintyHours, double confidence,
                      List<String> detectors, int lastBefore, int firstAfter, double[] windBefore, double[] windAfter,
                      double crossShoreBeforeMPerS, double crossShoreAfterMPerS, double directionBeforeDeg,
                      double directionAfterDeg, PassageKind kind) {

    /** True when the passage brings or strengthens onshore flow (a breeze front). */
    public boolean turnsOnshore() {
        return kind.onshore();
    }
}
