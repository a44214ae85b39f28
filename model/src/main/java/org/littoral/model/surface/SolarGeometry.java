package org.littoral.model.surface;

import org.littoral.model.coast.Coast;

/**
 * Position of the sun from latitude, day of year and local solar time.
 *
 * <p>Declination: Cooper (1969), Solar Energy 12, 333-346: delta = 23.45 deg sin(360 (284 + n) / 365)
 * (from memory, as in docs/references.md section 10). Elevation: the spherical-astronomy identity
 * sin(alpha) = sin(phi) sin(delta) + cos(phi) cos(delta) cos(omega), hour angle omega = 15 deg per hour
 * from solar noon. Sunrise and sunset: cos(omega_s) = -tan(phi) tan(delta) (geometric sun centre, no
 * refraction).
 */
public final class SolarGeometry {
    /** Seconds in a solar day. */
    public static final double DAY_S = 86400.0;

    private SolarGeometry() {
    }

    /** Solar declination, radians, for day of year n (1..366). Cooper (1969). */
    public static double declinationRad(int dayOfYear) {
        if (dayOfYear < 1 || dayOfYear > 366) {
            throw new IllegalArgumentException("day of year must be in 1..366; got " + dayOfYear);
        }
        return Math.toRadians(23.45) * Math.sin(2.0 * Math.PI * (284 + dayOfYear) / 365.0);
    }

    /** Hour angle, radians: zero at solar noon, negative in the morning, 15 deg per hour. */
    public static double hourAngleRad(double solarHours) {
        return Math.toRadians(15.0 * (solarHours - 12.0));
    }

    /** Sine of the solar elevation; negative when the sun is below the horizon. */
    public static double sinElevation(double latitudeDeg, double declinationRad, double solarHours) {
        double phi = Math.toRadians(latitudeDeg);
        return Math.sin(phi) * Math.sin(declinationRad)
                + Math.cos(phi) * Math.cos(declinationRad) * Math.cos(hourAngleRad(solarHours));
    }

    /** Solar elevation, degrees (negative below the horizon). */
    public static double elevationDeg(double latitudeDeg, double declinationRad, double solarHours) {
        return Math.toDegrees(Math.asin(clamp(sinElevation(latitudeDeg, declinationRad, solarHours))));
    }

    /**
     * Half-day length as the sunset hour angle, radians: 0 in polar night, pi in polar day.
     * cos(omega_s) = -tan(phi) tan(delta).
     */
    public static double sunsetHourAngleRad(double latitudeDeg, double declinationRad) {
        double c = -Math.tan(Math.toRadians(latitudeDeg)) * Math.tan(declinationRad);
        return Math.acos(clamp(c));
    }

    /** Local solar time of sunrise, hours (12 in polar night, 0 in polar day). */
    public static double sunriseSolarHours(double latitudeDeg, double declinationRad) {
        return 12.0 - Math.toDegrees(sunsetHourAngleRad(latitudeDeg, declinationRad)) / 15.0;
    }

    /** Local solar time of sunset, hours (12 in polar night, 24 in polar day). */
    public static double sunsetSolarHours(double latitudeDeg, double declinationRad) {
        return 12.0 + Math.toDegrees(sunsetHourAngleRad(latitudeDeg, declinationRad)) / 15.0;
    }

    /**
     * Day of year at model time t (seconds since solar midnight of the coast's day): the coast's day
     * plus whole days elapsed, wrapped after day 365.
     */
    public static int dayOfYearAt(Coast coast, double modelTimeS) {
        int days = (int) Math.floor(modelTimeS / DAY_S);
        return Math.floorMod(coast.dayOfYear() - 1 + days, 365) + 1;
    }

    /** Local solar hour 0..24 at model time t (seconds since solar midnight of day 0). */
    public static double solarHoursAt(double modelTimeS) {
        double s = modelTimeS - Math.floor(modelTimeS / DAY_S) * DAY_S;
        return s / 3600.0;
    }

    /** sin(elevation) at the coast's latitude at model time t (seconds since solar midnight of day 0). */
    public static double sinElevationAt(Coast coast, double modelTimeS) {
        return sinElevation(coast.latitudeDeg(), declinationRad(dayOfYearAt(coast, modelTimeS)), solarHoursAt(modelTimeS));
    }

    private static double clamp(double c) {
        return Math.max(-1.0, Math.min(1.0, c));
    }
}
