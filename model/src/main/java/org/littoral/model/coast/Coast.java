package org.littoral.model.coast;

/**
 * Where the coast is and how it lies. Model coordinates: x is the cross-shore distance, zero at the
 * main coastline and increasing inland; y is alongshore, 90 degrees to the left of +x (right-handed
 * with z up). A cross-shore wind u &gt; 0 is therefore onshore (sea to land).
 *
 * @param latitudeDeg latitude, -90..90 (negative in the Southern Hemisphere)
 * @param longitudeDeg longitude, -180..180, east positive (for local solar time)
 * @param utcOffsetHours offset of the local clock from UTC, hours (for clock time outputs)
 * @param bearingLandToSeaDeg compass bearing (degrees clockwise from north) that points from land to sea
 * @param dayOfYear day of the year 1..366
 */
public record Coast(double latitudeDeg, double longitudeDeg, double utcOffsetHours,
                    double bearingLandToSeaDeg, int dayOfYear) {

    /** Earth's rotation rate, rad/s (sidereal). */
    public static final double EARTH_ROTATION_PER_S = 7.2921e-5;

    public Coast {
        if (!(latitudeDeg >= -90 && latitudeDeg <= 90)) {
            throw new IllegalArgumentException("latitude must be in -90..90 degrees; got " + latitudeDeg);
        }
        if (!(longitudeDeg >= -180 && longitudeDeg <= 180)) {
            throw new IllegalArgumentException("longitude must be in -180..180 degrees; got " + longitudeDeg);
        }
        if (dayOfYear < 1 || dayOfYear > 366) {
            throw new IllegalArgumentException("day of year must be in 1..366; got " + dayOfYear);
        }
    }

    /** Coriolis parameter f = 2 Omega sin(latitude), 1/s. */
    public double coriolisPerS() {
        return 2.0 * EARTH_ROTATION_PER_S * Math.sin(Math.toRadians(latitudeDeg));
    }

    public boolean southernHemisphere() {
        return latitudeDeg < 0;
    }

    /** Compass azimuth (deg) of the +x (inland) axis. */
    public double inlandAzimuthDeg() {
        return normalise(bearingLandToSeaDeg + 180.0);
    }

    /** Compass azimuth (deg) of the +y (alongshore) axis: 90 degrees anticlockwise of +x. */
    public double alongshoreAzimuthDeg() {
        return normalise(inlandAzimuthDeg() - 90.0);
    }

    /** Eastward wind component from model components (u along +x, v along +y). */
    public double eastward(double u, double v) {
        return u * Math.sin(Math.toRadians(inlandAzimuthDeg())) + v * Math.sin(Math.toRadians(alongshoreAzimuthDeg()));
    }

    /** Northward wind component from model components. */
    public double northward(double u, double v) {
        return u * Math.cos(Math.toRadians(inlandAzimuthDeg())) + v * Math.cos(Math.toRadians(alongshoreAzimuthDeg()));
    }

    /** Cross-shore (onshore positive) component from earth components. */
    public double crossShore(double east, double north) {
        double a = Math.toRadians(inlandAzimuthDeg());
        return east * Math.sin(a) + north * Math.cos(a);
    }

    /** Alongshore (+y) component from earth components. */
    public double alongshore(double east, double north) {
        double a = Math.toRadians(alongshoreAzimuthDeg());
        return east * Math.sin(a) + north * Math.cos(a);
    }

    /** Meteorological direction (deg, where the wind blows FROM, clockwise from north) of earth components. */
    public static double directionFromDeg(double east, double north) {
        if (east == 0 && north == 0) {
            return Double.NaN;
        }
        return normalise(Math.toDegrees(Math.atan2(-east, -north)));
    }

    /** Earth components {east, north} of a wind of given speed blowing from a meteorological direction. */
    public static double[] eastNorthFromDirection(double speed, double directionFromDeg) {
        double a = Math.toRadians(directionFromDeg);
        return new double[] {-speed * Math.sin(a), -speed * Math.cos(a)};
    }

    /**
     * Local solar time (hours) from local clock time (hours), with the equation of time of
     * Spencer (1971) as given by Iqbal (1983), An Introduction to Solar Radiation, eq. 1.4.1.
     */
    public double solarHoursFromClock(double clockHours) {
        return clockHours + (longitudeDeg / 15.0 - utcOffsetHours) + equationOfTimeHours();
    }

    /** Local clock time (hours) from local solar time (hours): inverse of {@link #solarHoursFromClock}. */
    public double clockHoursFromSolar(double solarHours) {
        return solarHours - (longitudeDeg / 15.0 - utcOffsetHours) - equationOfTimeHours();
    }

    /** Equation of time, hours (Spencer 1971; Iqbal 1983 eq. 1.4.1). */
    public double equationOfTimeHours() {
        double g = 2.0 * Math.PI * (dayOfYear - 1) / 365.0;
        double minutes = 229.18 * (0.000075 + 0.001868 * Math.cos(g) - 0.032077 * Math.sin(g)
                - 0.014615 * Math.cos(2 * g) - 0.040849 * Math.sin(2 * g));
        return minutes / 60.0;
    }

    static double normalise(double deg) {
        double d = deg % 360.0;
        return d < 0 ? d + 360.0 : d;
    }
}
