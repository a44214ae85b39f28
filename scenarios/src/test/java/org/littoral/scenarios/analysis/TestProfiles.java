package org.littoral.scenarios.analysis;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.sounding.Profile;

/** Small hand-made profiles for tests: uniform in height, one value per variable. */
public final class TestProfiles {
    private TestProfiles() {
    }

    /** Levels every 10 m from 10 to 600 m; uniform temperature, mixing ratio and wind; pressure 1000 hPa - 0.12 hPa/m. */
    public static Profile uniform(String site, String day, double hours, double temperatureK, double mixingRatio,
                                  double east, double north) {
        int n = 60;
        double[] z = new double[n];
        double[] p = new double[n];
        double[] t = new double[n];
        double[] r = new double[n];
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            z[k] = 10.0 * (k + 1);
            p[k] = 100000.0 - 12.0 * z[k];
            t[k] = temperatureK;
            r[k] = mixingRatio;
            u[k] = east;
            v[k] = north;
        }
        return Profile.fromState(site, day, hours, z, p, t, r, u, v);
    }

    public static SiteDay siteDay(List<Profile> profiles) {
        return AnalysisChain.group(new ArrayList<>(profiles)).get(0);
    }
}
