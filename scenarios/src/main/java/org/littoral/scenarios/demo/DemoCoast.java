package org.littoral.scenarios.demo;

import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.coast.SurfaceSegment;

/**
 * The INVENTED coast of the demo campaign, "Quillmarsh Reach": open sea, a sandy barrier strip, a shallow
 * bay and the mainland, with two profiling sites. Nothing here describes a real place: the latitude is
 * plausible for a mid-latitude summer, and the longitude is put in open ocean (no coast exists there) so
 * that only the local clock-minus-solar offset matters.
 */
public final class DemoCoast {
    public static final String NAME = "Quillmarsh Reach (INVENTED coast)";
    public static final String CAMPAIGN = "Quillmarsh Reach demonstration campaign (INVENTED DATA, not observations)";
    public static final double LATITUDE_DEG = 39.6;
    /** Open North Atlantic, where no coast exists: the coast is invented. */
    public static final double LONGITUDE_DEG = -45.0;
    public static final double UTC_OFFSET_HOURS = -3.0;
    /** Land-to-sea bearing: the sea lies to the south-east, so an onshore wind blows FROM 135 degrees. */
    public static final double BEARING_LAND_TO_SEA_DEG = 135.0;
    /** Bearing from the mainland towards the bay at the bay-shore site: the bay breeze blows from here. */
    public static final double BAY_SHORE_BEARING_DEG = 160.0;

    public static final double BARRIER_FROM_M = 0.0;
    public static final double BAY_FROM_M = 1200.0;
    public static final double MAINLAND_FROM_M = 3700.0;

    public static final double SEA_SURFACE_TEMPERATURE_K = 294.15;
    public static final double BAY_SURFACE_TEMPERATURE_K = 297.15;

    /** A profiling site on the invented coast. */
    public record Site(String name, double inlandDistanceM, String description) {
    }

    public static final Site MARSH_4KM = new Site("marsh-4km", 4000.0,
            "mainland shore of the bay, 300 m inland of the bay's landward shore");
    public static final Site PLAIN_25KM = new Site("plain-25km", 25000.0, "farmland on the mainland plain");
    public static final List<Site> SITES = List.of(MARSH_4KM, PLAIN_25KM);

    private DemoCoast() {
    }

    /** The coast geometry for a day of the season (for clock/solar time and wind components). */
    public static Coast coast(int dayOfYear) {
        return new Coast(LATITUDE_DEG, LONGITUDE_DEG, UTC_OFFSET_HOURS, BEARING_LAND_TO_SEA_DEG, dayOfYear);
    }

    /** Sea, barrier strip, bay, mainland (x positive inland, zero at the sea shore of the barrier). */
    public static SurfaceMap surfaceMap() {
        return new SurfaceMap(List.of(
                new SurfaceSegment.Water("sea", Double.NEGATIVE_INFINITY, BARRIER_FROM_M, SEA_SURFACE_TEMPERATURE_K, 2e-4),
                // Sandy barrier: bright and dry (Oke 1987: semi-arid Bowen ratios 2-6).
                new SurfaceSegment.Land("barrier", BARRIER_FROM_M, BAY_FROM_M, 0.30, 2.0, 0.01, 0.15),
                new SurfaceSegment.Water("bay", BAY_FROM_M, MAINLAND_FROM_M, BAY_SURFACE_TEMPERATURE_K, 2e-4),
                // Crops and grass: Bowen ratio near 0.5-1 (Oke 1987).
                new SurfaceSegment.Land("mainland", MAINLAND_FROM_M, Double.POSITIVE_INFINITY, 0.20, 0.8, 0.10, 0.30)));
    }
}
