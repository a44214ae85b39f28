package org.littoral.model.coast;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The surface along x as contiguous segments, ordered inland: e.g. open sea, a barrier strip, a bay
 * and the mainland. The first segment is extended to negative infinity and the last to positive
 * infinity, so every x has a surface.
 */
public final class SurfaceMap {
    private final List<SurfaceSegment> segments;

    public SurfaceMap(List<SurfaceSegment> segments) {
        if (segments.isEmpty()) {
            throw new IllegalArgumentException("a surface map needs at least one segment");
        }
        for (int i = 1; i < segments.size(); i++) {
            SurfaceSegment a = segments.get(i - 1);
            SurfaceSegment b = segments.get(i);
            if (Math.abs(a.toM() - b.fromM()) > 1e-6) {
                throw new IllegalArgumentException("segments '" + a.name() + "' and '" + b.name()
                        + "' do not join: one ends at " + a.toM() + " m, the next starts at " + b.fromM()
                        + " m; make each segment start where the previous one ends");
            }
        }
        this.segments = Collections.unmodifiableList(new ArrayList<>(segments));
    }

    /** The classic single coastline: water for x &lt; 0, land for x &gt;= 0. */
    public static SurfaceMap simpleCoast(double sstK, double landAlbedo, double landBowen, double landRoughnessM) {
        return new SurfaceMap(List.of(
                new SurfaceSegment.Water("sea", Double.NEGATIVE_INFINITY, 0.0, sstK, 2e-4),
                new SurfaceSegment.Land("land", 0.0, Double.POSITIVE_INFINITY, landAlbedo, landBowen, landRoughnessM, 0.3)));
    }

    static void checkSpan(String name, double fromM, double toM) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("every surface segment needs a name");
        }
        if (!(toM > fromM)) {
            throw new IllegalArgumentException("segment '" + name + "' must end after it starts; got from " + fromM + " m to " + toM + " m");
        }
    }

    public List<SurfaceSegment> segments() {
        return segments;
    }

    public SurfaceSegment at(double xM) {
        if (xM < segments.get(0).toM()) {
            return segments.get(0);
        }
        for (SurfaceSegment s : segments) {
            if (s.contains(xM)) {
                return s;
            }
        }
        return segments.get(segments.size() - 1);
    }

    public boolean isLand(double xM) {
        return at(xM).isLand();
    }

    /** Land fraction 0 or 1 at each x (no smoothing). */
    public double[] landMask(double[] xM) {
        double[] m = new double[xM.length];
        for (int i = 0; i < xM.length; i++) {
            m[i] = isLand(xM[i]) ? 1.0 : 0.0;
        }
        return m;
    }

    /** x positions where land meets water (either way), in order. */
    public List<Double> shorelinesM() {
        List<Double> out = new ArrayList<>();
        for (int i = 1; i < segments.size(); i++) {
            if (segments.get(i).isLand() != segments.get(i - 1).isLand()) {
                out.add(segments.get(i).fromM());
            }
        }
        return out;
    }
}
