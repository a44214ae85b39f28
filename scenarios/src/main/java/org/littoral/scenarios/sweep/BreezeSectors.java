package org.littoral.scenarios.sweep;

import org.littoral.model.coast.Coast;

/**
 * Breeze type of a member from its ambient (geostrophic) wind relative to the coast, in the trade terms of
 * Miller et al. (2003, Rev. Geophys. 41) and Steele et al. (2013, ACP 13; 2015, QJRMS 141): pure (offshore
 * or weak ambient flow), corkscrew and backdoor (shore-parallel flow), synoptic (ambient flow already onshore).
 *
 * <p>Northern Hemisphere: corkscrew when the land is on the LEFT looking downwind, backdoor when it is on the
 * right; mirrored in the Southern Hemisphere (REFERENCES.md section 3, from memory, consistent with common
 * practice). In model axes (+x inland, +y 90 degrees to the left of +x) a wind towards -y has the land on its
 * left. Sectors: the shore-parallel sectors are centred on the coastline with a settable half-width
 * (45 degrees gives quadrants, REFERENCES.md section 3), the onshore and offshore sectors take the rest.
 *
 * @param shoreParallelHalfWidthDeg half-width of each shore-parallel sector, degrees (0 < w < 90)
 * @param calmBelowMPerS ambient speeds below this are "pure" whatever their direction
 */
public record BreezeSectors(double shoreParallelHalfWidthDeg, double calmBelowMPerS) {

    public static final BreezeSectors QUADRANTS = new BreezeSectors(45.0, 1.0);

    /** The four trade types. */
    public enum Type {
        PURE("pure"), CORKSCREW("corkscrew"), BACKDOOR("backdoor"), SYNOPTIC("synoptic");

        public final String label;

        Type(String label) {
            this.label = label;
        }
    }

    public BreezeSectors {
        if (!(shoreParallelHalfWidthDeg > 0 && shoreParallelHalfWidthDeg < 90)) {
            throw new IllegalArgumentException("shore-parallel sector half-width must be in (0, 90) deg; got "
                    + shoreParallelHalfWidthDeg);
        }
        if (!(calmBelowMPerS >= 0)) {
            throw new IllegalArgumentException("calm threshold must be >= 0 m/s; got " + calmBelowMPerS);
        }
    }

    /**
     * Angle (deg, -180..180) of the direction the ambient wind blows TOWARDS, measured anticlockwise from the
     * inland (+x) axis: 0 onshore, +-180 offshore, +90 towards +y (land on the right), -90 towards -y.
     */
    public static double towardsAngleFromInlandDeg(double fromDeg, double bearingLandToSeaDeg) {
        // Wind from the sea side (fromDeg == bearing) blows inland; compass angles run clockwise, model angles anticlockwise.
        double a = -(fromDeg - bearingLandToSeaDeg);
        a = ((a % 360.0) + 540.0) % 360.0 - 180.0;
        return a;
    }

    public Type classify(double fromDeg, double speedMPerS, double bearingLandToSeaDeg, double latitudeDeg) {
        if (speedMPerS < calmBelowMPerS) {
            return Type.PURE;
        }
        double a = towardsAngleFromInlandDeg(fromDeg, bearingLandToSeaDeg);
        double abs = Math.abs(a);
        if (Math.abs(abs - 90.0) < shoreParallelHalfWidthDeg) {
            boolean landOnLeft = a < 0; // towards -y: +x (land) is to the left
            boolean northern = latitudeDeg >= 0;
            return landOnLeft == northern ? Type.CORKSCREW : Type.BACKDOOR;
        }
        return abs < 90.0 ? Type.SYNOPTIC : Type.PURE;
    }

    /** Cross-shore (onshore positive) component of the ambient wind, m/s, via {@link Coast}'s conventions. */
    public static double onshoreComponentMPerS(double fromDeg, double speedMPerS, double bearingLandToSeaDeg) {
        double[] en = Coast.eastNorthFromDirection(speedMPerS, fromDeg);
        return new Coast(0, 0, 0, bearingLandToSeaDeg, 1).crossShore(en[0], en[1]);
    }

    /** Alongshore (+y) component of the ambient wind, m/s. */
    public static double alongshoreComponentMPerS(double fromDeg, double speedMPerS, double bearingLandToSeaDeg) {
        double[] en = Coast.eastNorthFromDirection(speedMPerS, fromDeg);
        return new Coast(0, 0, 0, bearingLandToSeaDeg, 1).alongshore(en[0], en[1]);
    }
}
