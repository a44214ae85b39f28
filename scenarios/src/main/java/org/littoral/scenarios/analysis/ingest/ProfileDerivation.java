package org.littoral.scenarios.analysis.ingest;

import org.littoral.model.sounding.Profile;

/** Builds a {@link Profile} from binned state variables and keeps missing humidity missing in theta-e. */
public final class ProfileDerivation {
    private ProfileDerivation() {
    }

    public static Profile profile(String site, String day, double timeHours, double[] heightM, double[] pressurePa,
                                  double[] temperatureK, double[] mixingRatioKgPerKg, double[] windEast, double[] windNorth) {
        Profile p = Profile.fromState(site, day, timeHours, heightM, pressurePa, temperatureK, mixingRatioKgPerKg,
                windEast, windNorth);
        // Profile.fromState falls back to theta for theta-e when r is not positive; a missing humidity
        // must stay missing in the analysis rather than masquerade as dry air.
        double[] the = p.thetaEK();
        for (int k = 0; k < the.length; k++) {
            if (Double.isNaN(mixingRatioKgPerKg[k])) {
                the[k] = Double.NaN;
            }
        }
        return p;
    }
}
