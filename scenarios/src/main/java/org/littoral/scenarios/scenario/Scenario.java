package org.littoral.scenarios.scenario;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.linear.HeatingSpec;
import org.littoral.model.linear.LinearConfig;
import org.littoral.model.sounding.FlightSchedule;
import org.littoral.model.sounding.SoundingSpec;
import org.littoral.model.sounding.VirtualSite;

/**
 * A validated scenario, in SI units and model types. Built by {@link ScenarioFile}; {@link #inputs()}
 * is the file as read with every default filled in (echoed into run summaries).
 */
public record Scenario(String name, String description, Kind kind, String source, Coast coast, SurfaceMap surface,
                       HorizontalGrid xGrid, VerticalGrid zGrid, Atmosphere atmosphere, AmbientWind ambientWind,
                       HeatingSpec heating, Physics physics, List<VirtualSite> sites, Flights flights, Output output,
                       ObjectNode inputs) {

    /** Which model runs the scenario. */
    public enum Kind { LINEAR, NONLINEAR }

    /** Basic state, SI. */
    public record Atmosphere(double surfaceThetaK, double buoyancyFrequencyPerS, double surfaceMixingRatio,
                             double mixingRatioGradientPerM, double surfacePressurePa) {
    }

    /** Large-scale wind: speed and meteorological direction, with its model-axis components. */
    public record AmbientWind(double speedMPerS, double fromDeg, double crossShoreMPerS, double alongshoreMPerS) {
    }

    /** Model switches and damping, SI. */
    public record Physics(double frictionPerS, double coolingPerS, boolean hydrostatic, int harmonics) {
    }

    /** Flight plan: schedule plus how each ascent is binned. */
    public record Flights(FlightSchedule schedule, SoundingSpec sounding) {
    }

    /** Output times (local clock hours), near-surface height and onshore threshold. */
    public record Output(double startClockH, double endClockH, double stepMin, double nearSurfaceM,
                         double onshoreThresholdMPerS) {
        /** Output times in local clock hours (allocates). */
        public double[] clockHours() {
            int n = (int) Math.floor((endClockH - startClockH) / (stepMin / 60.0) + 1e-9) + 1;
            double[] t = new double[n];
            for (int k = 0; k < n; k++) {
                t[k] = startClockH + k * stepMin / 60.0;
            }
            return t;
        }
    }

    /** The linear model's configuration for this scenario. */
    public LinearConfig toLinearConfig() {
        return new LinearConfig(coast, surface, xGrid, zGrid, atmosphere.buoyancyFrequencyPerS(), physics.frictionPerS(),
                physics.coolingPerS(), ambientWind.crossShoreMPerS(), physics.hydrostatic(), physics.harmonics(), heating,
                atmosphere.surfaceThetaK(), atmosphere.surfaceMixingRatio(), atmosphere.mixingRatioGradientPerM(),
                atmosphere.surfacePressurePa());
    }
}
