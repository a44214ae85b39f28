package org.littoral.scenarios.analysis;

import java.util.List;
import org.littoral.model.sounding.Profile;

/**
 * The profiles of one site on one day, in time order.
 *
 * @param timeHours profile times, local clock hours, increasing
 */
public record SiteDay(String site, String day, List<Profile> profiles, double[] timeHours) {

    public int size() {
        return profiles.size();
    }

    /** "day/site". */
    public String key() {
        return day + "/" + site;
    }

    /** Layer means of one variable for every profile (NaN where missing). Allocates. */
    public double[] series(Variable v, Layer layer, org.littoral.model.coast.Coast coast, double minValidFraction) {
        double[] out = new double[profiles.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = v.layerMean(profiles.get(i), layer, coast, minValidFraction);
        }
        return out;
    }
}
