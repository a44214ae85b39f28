package org.littoral.scenarios.analysis.stats;

import org.littoral.model.coast.Coast;
import org.littoral.scenarios.input.UserInputException;

/**
 * Classifies the ambient wind into a {@link BreezeType}. The wind is resolved into cross-shore
 * (onshore positive) and alongshore (+y, 90 degrees left of inland) components with {@link Coast}.
 * Sectors are quadrants relative to the coastline by default (docs/references.md section 3 marks the
 * boundaries as a choice): onshore within +-45 degrees of the inland direction is SYNOPTIC, offshore
 * within +-45 degrees of the seaward direction is PURE, the rest is shore-parallel. Looking downwind
 * along +y the land (+x) is on the right, so in the Northern Hemisphere +y flow is BACKDOOR and -y
 * flow CORKSCREW (land on the left looking downwind); mirrored in the Southern Hemisphere. Ambient
 * speed below a threshold is PURE whatever its direction (weak flow, Miller et al. 2003).
 * Reusable by the sweep engine: it needs only the ambient wind and the coast.
 */
public final class BreezeTyping {
    /** Half-width of the onshore (synoptic) sector, degrees. Default 45 (quadrants). */
    public final double onshoreHalfWidthDeg;
    /** Half-width of the offshore (pure) sector, degrees. Default 45 (quadrants). */
    public final double offshoreHalfWidthDeg;
    /** Ambient speed below which the day is PURE, m/s. Default 2 (weak flow; Crosman &amp; Horel 2010, from memory). */
    public final double weakWindMPerS;

    public BreezeTyping(double onshoreHalfWidthDeg, double offshoreHalfWidthDeg, double weakWindMPerS) {
        if (!(onshoreHalfWidthDeg >= 0 && offshoreHalfWidthDeg >= 0 && onshoreHalfWidthDeg + offshoreHalfWidthDeg <= 180)) {
            throw new UserInputException("breeze typing sectors: onshore half-width " + onshoreHalfWidthDeg
                    + " and offshore half-width " + offshoreHalfWidthDeg + " must be >= 0 and add up to at most 180 degrees");
        }
        if (!(weakWindMPerS >= 0)) {
            throw new UserInputException("breeze typing weakWindMPerS = " + weakWindMPerS + " must be >= 0 m/s");
        }
        this.onshoreHalfWidthDeg = onshoreHalfWidthDeg;
        this.offshoreHalfWidthDeg = offshoreHalfWidthDeg;
        this.weakWindMPerS = weakWindMPerS;
    }

    /** Quadrants and a 2 m/s weak-wind threshold. */
    public static BreezeTyping defaults() {
        return new BreezeTyping(45, 45, 2.0);
    }

    /** Type from earth components (m/s) of the ambient wind. */
    public BreezeType classify(double eastMPerS, double northMPerS, Coast coast) {
        return classifyModel(coast.crossShore(eastMPerS, northMPerS), coast.alongshore(eastMPerS, northMPerS),
                coast.southernHemisphere());
    }

    /** Type from model components: u cross-shore (onshore positive), v alongshore (+y). */
    public BreezeType classifyModel(double uCross, double vAlong, boolean southernHemisphere) {
        if (Double.isNaN(uCross) || Double.isNaN(vAlong)) {
            return BreezeType.UNDETERMINED;
        }
        if (Math.hypot(uCross, vAlong) < weakWindMPerS) {
            return BreezeType.PURE;
        }
        double angle = Math.toDegrees(Math.atan2(Math.abs(vAlong), uCross)); // 0 = onshore, 180 = offshore
        if (angle <= onshoreHalfWidthDeg) {
            return BreezeType.SYNOPTIC;
        }
        if (angle >= 180.0 - offshoreHalfWidthDeg) {
            return BreezeType.PURE;
        }
        boolean landOnRight = vAlong > 0;
        if (southernHemisphere) {
            return landOnRight ? BreezeType.CORKSCREW : BreezeType.BACKDOOR;
        }
        return landOnRight ? BreezeType.BACKDOOR : BreezeType.CORKSCREW;
    }
}
