package org.littoral.scenarios.netcdf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import ucar.ma2.Array;
import ucar.nc2.dataset.NetcdfDataset;

/**
 * Soundings of unequal length go out in the CF incomplete multidimensional representation (CF 1.8 appendix H.3.2):
 * z(profile, level), fill values past a profile's last bin, which a CF reader (netCDF-Java's enhanced dataset)
 * turns into missing values.
 */
class SoundingsNetcdfTest {
    @TempDir
    Path dir;

    private static Profile profile(String site, double hour, int bins) {
        double[] z = new double[bins];
        double[] p = new double[bins];
        double[] t = new double[bins];
        double[] r = new double[bins];
        double[] ue = new double[bins];
        double[] vn = new double[bins];
        for (int k = 0; k < bins; k++) {
            z[k] = 2.5 + 5 * k;
            p[k] = 101_325.0 - 12.0 * z[k];
            t[k] = 300.0 - 0.0098 * z[k];
            r[k] = 0.010;
            ue[k] = 1.0;
            vn[k] = -2.0;
        }
        return Profile.fromState(site, "invented-day", hour, z, p, t, r, ue, vn);
    }

    @Test
    void profilesOfUnequalLengthAreWrittenWithFillPastTheirLastBin() throws Exception {
        Coast coast = new Coast(40.0, 10.0, 1.0, 180.0, 100);
        List<Profile> profiles = List.of(profile("a", 9.0, 4), profile("b", 9.5, 6));
        Path f = dir.resolve("soundings.nc");
        SoundingsNetcdf.write(f, profiles, site -> site.equals("a") ? 1000.0 : 5000.0, 0,
                new CfFile.Provenance("test", "test", "none", "{}", coast, "test"));
        try (NetcdfDataset ds = NetcdfDataset.openDataset(f.toString())) {
            assertEquals("profile", ds.findGlobalAttribute("featureType").getStringValue());
            Array z = ds.findVariable("z").read();
            assertEquals(2, z.getShape().length, "z(profile, level)");
            Array t = ds.findVariable("temperature").read();
            assertEquals(300.0 - 0.0098 * 17.5, t.getDouble(3), 1e-4);
            assertTrue(Double.isNaN(t.getDouble(4)), "profile a has 4 bins: its 5th is missing");
            assertEquals(300.0 - 0.0098 * 27.5, t.getDouble(6 + 5), 1e-4);
            // 09:30 local at UTC+1 on day 100 of 2001 (10 April): 08:30 UTC
            assertEquals(8.5 * 3600.0, ds.findVariable("time").read().getDouble(1), 1e-9);
            assertEquals("seconds since 2001-04-10 00:00:00", ds.findVariable("time").getUnitsString());
        }
    }

    @Test
    void aSiteInlandOfASouthFacingCoastLiesNorthOfTheCoastPoint() throws Exception {
        // bearing land to sea 180 deg: inland is north; 5 km is 5000 / 6371008.8 rad of latitude
        Coast coast = new Coast(40.0, 10.0, 1.0, 180.0, 100);
        Path f = dir.resolve("s.nc");
        SoundingsNetcdf.write(f, List.of(profile("b", 12.0, 3)), site -> 5000.0, 0,
                new CfFile.Provenance("test", "test", "none", "{}", coast, "test"));
        try (NetcdfDataset ds = NetcdfDataset.openDataset(f.toString())) {
            assertEquals(40.0 + Math.toDegrees(5000.0 / 6_371_008.8), ds.findVariable("lat").read().getDouble(0), 1e-9);
            assertEquals(10.0, ds.findVariable("lon").read().getDouble(0), 1e-9);
        }
    }
}
