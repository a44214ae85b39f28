package org.littoral.scenarios.netcdf;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleBiFunction;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.output.AtomicFile;
import ucar.ma2.Array;
import ucar.ma2.ArrayChar;
import ucar.ma2.ArrayFloat;
import ucar.ma2.DataType;
import ucar.ma2.InvalidRangeException;
import ucar.nc2.Attribute;
import ucar.nc2.Dimension;
import ucar.nc2.NetcdfFileWriter;
import ucar.nc2.Variable;

/**
 * {@code soundings.nc}: synthetic (or any binned) soundings as a CF-1.8 discrete-sampling-geometry profile
 * collection ({@code featureType = "profile"}; CF 1.8 chapter 9 and appendix H.3), netCDF-3 64-bit offset. When
 * every profile has the same bin heights (synthetic soundings always do) the orthogonal multidimensional
 * representation is used (H.3.1): {@code z(z)} and data on (profile, z). Otherwise the incomplete multidimensional
 * one (H.3.2): {@code z(profile, level)} with fill values past a profile's last bin. Units are SI (K, Pa, kg/kg,
 * RH as a fraction), where the CSV carries deg C, hPa, g/kg and percent.
 *
 * <p>A site's latitude and longitude are placed on the invented coast: the coast point moved the site's inland
 * distance along the inland azimuth on a sphere of radius {@link #EARTH_RADIUS_M} (a local tangent-plane step,
 * common practice for distances of tens of km).
 */
public final class SoundingsNetcdf {
    public static final String FILE_NAME = "soundings.nc";
    /** Mean Earth radius, m (IUGG mean radius R1; from memory). */
    public static final double EARTH_RADIUS_M = 6_371_008.8;

    private SoundingsNetcdf() {
    }

    /** One quantity per bin: name, units, CF standard name (or null) and long name, and how to get it from a profile. */
    private record Quantity(String name, String units, String standardName, String longName, ToDoubleBiFunction<Profile, Integer> value) {
    }

    private static final List<Quantity> QUANTITIES = List.of(
            new Quantity("pressure", "Pa", "air_pressure", "air pressure", (p, k) -> p.pressurePa()[k]),
            new Quantity("temperature", "K", "air_temperature", "air temperature", (p, k) -> p.temperatureK()[k]),
            new Quantity("relative_humidity", "1", "relative_humidity", "relative humidity (fraction, over water)",
                    (p, k) -> p.relativeHumidity()[k]),
            new Quantity("mixing_ratio", "kg kg-1", "humidity_mixing_ratio", "water-vapour mixing ratio", (p, k) -> p.mixingRatioKgPerKg()[k]),
            new Quantity("dewpoint", "K", "dew_point_temperature", "dewpoint temperature", (p, k) -> p.dewpointK()[k]),
            new Quantity("wind_east", "m s-1", "eastward_wind", "eastward wind component", (p, k) -> p.windEastMPerS()[k]),
            new Quantity("wind_north", "m s-1", "northward_wind", "northward wind component", (p, k) -> p.windNorthMPerS()[k]),
            new Quantity("wind_speed", "m s-1", "wind_speed", "wind speed", (p, k) -> p.windSpeed(k)),
            new Quantity("wind_direction", "degree", "wind_from_direction", "direction the wind blows from, clockwise from north",
                    (p, k) -> p.windDirectionDeg(k)),
            new Quantity("theta", "K", "air_potential_temperature", "potential temperature (Bolton 1980)", (p, k) -> p.thetaK()[k]),
            new Quantity("theta_v", "K", null, "virtual potential temperature", (p, k) -> p.thetaVK()[k]),
            new Quantity("theta_e", "K", "equivalent_potential_temperature", "equivalent potential temperature (Bolton 1980, eq. 39)",
                    (p, k) -> p.thetaEK()[k]));

    /**
     * Writes the profiles atomically.
     *
     * @param siteInlandM inland distance of each profile's site, m, looked up by site name
     * @param dayIndex model day (0 = day of {@code coast.dayOfYear()}) that the profiles' clock times refer to
     */
    public static void write(Path target, List<Profile> profiles, java.util.function.ToDoubleFunction<String> siteInlandM, int dayIndex,
                             CfFile.Provenance prov) throws IOException {
        if (profiles.isEmpty()) {
            throw new IllegalArgumentException("no soundings to write to " + target);
        }
        AtomicFile.writeWith(target, tmp -> {
            try {
                writeFile(tmp, profiles, siteInlandM, dayIndex, prov);
            } catch (InvalidRangeException e) {
                throw new IllegalStateException("netCDF slab outside its variable (a bug): " + e.getMessage(), e);
            }
        });
    }

    private static void writeFile(Path path, List<Profile> profiles, java.util.function.ToDoubleFunction<String> siteInlandM, int dayIndex,
                                  CfFile.Provenance prov) throws IOException, InvalidRangeException {
        Coast coast = prov.coast();
        int np = profiles.size();
        double[] z0 = profiles.get(0).heightM();
        boolean orthogonal = profiles.stream().allMatch(p -> Arrays.equals(p.heightM(), z0));
        int nl = profiles.stream().mapToInt(Profile::size).max().orElse(0);
        String[] ids = new String[np];
        int idLen = 1;
        int siteLen = 1;
        int dayLen = 1;
        for (int i = 0; i < np; i++) {
            Profile p = profiles.get(i);
            ids[i] = p.site() + " " + p.day() + " " + hhmm(p.timeHours());
            idLen = Math.max(idLen, utf8Length(ids[i]));
            siteLen = Math.max(siteLen, utf8Length(p.site()));
            dayLen = Math.max(dayLen, utf8Length(p.day()));
        }
        NetcdfFileWriter w = NetcdfFileWriter.createNew(NetcdfFileWriter.Version.netcdf3, path.toString());
        try {
            w.setLargeFile(true);
            w.setFill(true);
            Dimension dp = w.addDimension(null, "profile", np);
            Dimension dl = w.addDimension(null, orthogonal ? "z" : "level", nl);
            Dimension dId = w.addDimension(null, "id_strlen", idLen);
            Dimension dSite = w.addDimension(null, "site_strlen", siteLen);
            Dimension dDay = w.addDimension(null, "day_strlen", dayLen);
            Variable vId = w.addVariable(null, "profile_id", DataType.CHAR, List.of(dp, dId));
            vId.addAttribute(new Attribute("cf_role", "profile_id"));
            vId.addAttribute(new Attribute("long_name", "sounding identifier: site, day label and local launch time"));
            Variable vSite = w.addVariable(null, "site", DataType.CHAR, List.of(dp, dSite));
            vSite.addAttribute(new Attribute("long_name", "site name"));
            Variable vDay = w.addVariable(null, "day", DataType.CHAR, List.of(dp, dDay));
            vDay.addAttribute(new Attribute("long_name", "day label of the sounding"));
            Variable vt = CfFile.timeVariable(w, "time", dp, coast, "launch time of the sounding");
            Variable vLat = CfFile.doubleVariable(w, "lat", List.of(dp), "degrees_north", "latitude", "latitude of the site (invented coast)");
            Variable vLon = CfFile.doubleVariable(w, "lon", List.of(dp), "degrees_east", "longitude", "longitude of the site (invented coast)");
            Variable vx = CfFile.doubleVariable(w, "inland_distance", List.of(dp), "m", null, "distance of the site inland from the coastline");
            Variable vz;
            if (orthogonal) {
                vz = CfFile.doubleVariable(w, "z", List.of(dl), "m", "height", "height above the surface of the bin centre");
            } else {
                vz = w.addVariable(null, "z", DataType.FLOAT, List.of(dp, dl));
                vz.addAttribute(new Attribute("standard_name", "height"));
                vz.addAttribute(new Attribute("long_name", "height above the surface of the bin centre"));
                vz.addAttribute(new Attribute("units", "m"));
                vz.addAttribute(new Attribute("_FillValue", CfFile.FILL_FLOAT));
            }
            vz.addAttribute(new Attribute("positive", "up"));
            vz.addAttribute(new Attribute("axis", "Z"));
            Variable[] vars = new Variable[QUANTITIES.size()];
            for (int q = 0; q < vars.length; q++) {
                Quantity qu = QUANTITIES.get(q);
                vars[q] = CfFile.floatVariable(w, qu.name(), List.of(dp, dl), qu.units(), qu.standardName(), qu.longName());
                vars[q].addAttribute(new Attribute("coordinates", "time lat lon z"));
            }
            CfFile.globalAttributes(w, prov, "Soundings binned like drone profiles (" + np + " profiles); heights are bin centres.");
            w.addGroupAttribute(null, new Attribute("featureType", "profile"));
            w.create();

            ArrayChar.D2 cId = new ArrayChar.D2(np, idLen);
            ArrayChar.D2 cSite = new ArrayChar.D2(np, siteLen);
            ArrayChar.D2 cDay = new ArrayChar.D2(np, dayLen);
            double[] t = new double[np];
            double[] lat = new double[np];
            double[] lon = new double[np];
            double[] x = new double[np];
            double azimuth = Math.toRadians(coast.inlandAzimuthDeg());
            for (int i = 0; i < np; i++) {
                Profile p = profiles.get(i);
                cId.setString(i, ids[i]);
                cSite.setString(i, p.site());
                cDay.setString(i, p.day());
                t[i] = CfFile.secondsFromClockHours(coast, p.timeHours() + 24.0 * dayIndex);
                x[i] = siteInlandM.applyAsDouble(p.site());
                double d = Double.isFinite(x[i]) ? x[i] : 0.0;
                lat[i] = coast.latitudeDeg() + Math.toDegrees(d * Math.cos(azimuth) / EARTH_RADIUS_M);
                lon[i] = coast.longitudeDeg() + Math.toDegrees(d * Math.sin(azimuth) / (EARTH_RADIUS_M * Math.cos(Math.toRadians(coast.latitudeDeg()))));
            }
            w.write(vId, cId);
            w.write(vSite, cSite);
            w.write(vDay, cDay);
            w.write(vt, Array.factory(t));
            w.write(vLat, Array.factory(lat));
            w.write(vLon, Array.factory(lon));
            w.write(vx, Array.factory(x));
            if (orthogonal) {
                w.write(vz, Array.factory(z0.clone()));
            } else {
                ArrayFloat.D2 az = new ArrayFloat.D2(np, nl);
                for (int i = 0; i < np; i++) {
                    double[] h = profiles.get(i).heightM();
                    for (int k = 0; k < nl; k++) {
                        az.set(i, k, k < h.length ? CfFile.toFloat(h[k]) : CfFile.FILL_FLOAT);
                    }
                }
                w.write(vz, az);
            }
            ArrayFloat.D2 a = new ArrayFloat.D2(np, nl);
            for (int q = 0; q < vars.length; q++) {
                ToDoubleBiFunction<Profile, Integer> f = QUANTITIES.get(q).value();
                for (int i = 0; i < np; i++) {
                    Profile p = profiles.get(i);
                    for (int k = 0; k < nl; k++) {
                        a.set(i, k, k < p.size() ? CfFile.toFloat(f.applyAsDouble(p, k)) : CfFile.FILL_FLOAT);
                    }
                }
                w.write(vars[q], a);
            }
        } finally {
            w.close();
        }
    }

    private static String hhmm(double hours) {
        long m = Math.round(hours * 60.0);
        return String.format(Locale.ROOT, "%02d:%02d", Math.floorDiv(m, 60), Math.floorMod(m, 60));
    }

    private static int utf8Length(String s) {
        return s.getBytes(java.nio.charset.StandardCharsets.UTF_8).length;
    }
}
