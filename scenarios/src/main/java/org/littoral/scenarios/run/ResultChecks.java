package org.littoral.scenarios.run;

import org.littoral.model.front.FieldSections;

import java.util.List;
import java.util.Locale;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.scenario.Scenario;

/**
 * Checks on a finished solution before its outputs are trusted: winds beyond a stated bound (a linear solution can
 * be driven far outside the regime its equations describe, and then gives winds of hundreds of m/s without any
 * instability), and values that are not numbers anywhere in the sections or soundings.
 */
final class ResultChecks {
    /**
     * Largest near-surface or site wind, beyond the ambient wind, that a run may report, m/s. Sea breezes rarely
     * exceed 10-15 m/s (common practice); 50 m/s is far outside anything a breeze does.
     */
    static final double WIND_BOUND_M_PER_S = 50.0;

    /** What the check found; {@code problem} is null when the run passed. */
    record Finding(double maxWindMPerS, double boundMPerS, String problem) {
        boolean passed() {
            return problem == null;
        }
    }

    private ResultChecks() {
    }

    static Finding of(Scenario s, FieldSections fs, List<Profile> profiles) {
        double bound = WIND_BOUND_M_PER_S + s.ambientWind().speedMPerS();
        double max = 0;
        int at = -1;
        int atX = -1;
        String nan = null;
        for (int n = 0; n < fs.clockH.length; n++) {
            for (int i = 0; i < fs.xM.length; i++) {
                double u = fs.nearSurfaceTotalU[n][i];
                double v = fs.nearSurfaceTotalV[n][i];
                double b = fs.nearSurfaceU[n][i];
                if (Double.isNaN(u) || Double.isNaN(v) || Double.isNaN(b)) {
                    if (nan == null) {
                        nan = "the near-surface wind at " + ScenarioRun.clock(fs.clockH[n]) + " local, " + km(fs.xM[i]);
                    }
                    continue;
                }
                double w = Math.hypot(u, v);
                if (w > max) {
                    max = w;
                    at = n;
                    atX = i;
                }
            }
        }
        for (int site = 0; site < fs.siteU.length && nan == null; site++) {
            for (int n = 0; n < fs.siteU[site].length; n++) {
                for (int k = 0; k < fs.siteU[site][n].length; k++) {
                    double u = fs.siteU[site][n][k];
                    double v = fs.siteV[site][n][k];
                    if (Double.isNaN(u) || Double.isNaN(v) || Double.isNaN(fs.siteTheta[site][n][k])) {
                        nan = nan == null ? "a site column at " + ScenarioRun.clock(fs.clockH[n]) + " local" : nan;
                    } else {
                        max = Math.max(max, Math.hypot(u, v));
                    }
                }
            }
        }
        for (Profile p : profiles) {
            if (nan != null) {
                break;
            }
            for (int k = 0; k < p.size(); k++) {
                if (Double.isNaN(p.temperatureK()[k]) || Double.isNaN(p.relativeHumidity()[k]) || Double.isNaN(p.pressurePa()[k])
                        || Double.isNaN(p.windEastMPerS()[k]) || Double.isNaN(p.windNorthMPerS()[k])) {
                    nan = "the sounding at " + p.site() + " " + ScenarioRun.clock(p.timeHours()) + " local, " + p.heightM()[k] + " m";
                    break;
                }
            }
        }
        boolean linear = s.kind() == Scenario.Kind.LINEAR;
        String fix = linear ? "lower the heating (heating.amplitude_K_per_h or heating.peak_flux_difference_W_per_m2), add "
                + "physics.friction_per_s (e.g. 1e-5) near 30 degrees latitude, or use kind: nonlinear"
                : "refine grid.spacing_km or grid.levels, or weaken the heating or ambient_wind.speed_m_per_s";
        String problem = null;
        if (nan != null) {
            problem = "the " + (linear ? "linear" : "nonlinear") + " solution holds values that are not numbers (first in " + nan
                    + "); " + fix;
        } else if (max > bound) {
            problem = String.format(Locale.ROOT, "the %s solution's wind reaches %.0f m/s%s, beyond the %.0f m/s a breeze can have "
                    + "(sea breezes rarely exceed 15 m/s): the scenario lies outside what the model describes; %s",
                    linear ? "linear" : "nonlinear", max, at >= 0 ? " (near the ground at " + ScenarioRun.clock(fs.clockH[at])
                    + " local, " + km(fs.xM[atX]) + ")" : " (in a site column)", bound, fix);
        }
        return new Finding(max, bound, problem);
    }

    private static String km(double xM) {
        return String.format(Locale.ROOT, "x = %.1f km", xM / 1000.0);
    }
}
