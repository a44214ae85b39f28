package org.littoral.scenarios.scenario;

import static org.littoral.scenarios.scenario.Schema.choice;
import static org.littoral.scenarios.scenario.Schema.flag;
import static org.littoral.scenarios.scenario.Schema.integer;
import static org.littoral.scenarios.scenario.Schema.num;
import static org.littoral.scenarios.scenario.Schema.optional;
import static org.littoral.scenarios.scenario.Schema.pos;
import static org.littoral.scenarios.scenario.Schema.section;
import static org.littoral.scenarios.scenario.Schema.text;

import java.util.List;
import org.littoral.scenarios.scenario.Schema.Field;
import org.littoral.scenarios.scenario.Schema.ListOf;
import org.littoral.scenarios.scenario.Schema.Presence;
import org.littoral.scenarios.scenario.Schema.Section;
import org.littoral.scenarios.scenario.Schema.Variant;

/**
 * The one scenario schema: every key a scenario file may contain, with units in the key names.
 * Ranges are wide physical or numerical sanity limits, not recommendations.
 */
public final class ScenarioSchema {
    private ScenarioSchema() {
    }

    private static final double INF = Double.POSITIVE_INFINITY;

    static final Field COAST = section("coast", Presence.REQUIRED, "Where the coast is and how it lies.",
            num("latitude_deg", "deg", -90, 90, null, "Latitude, negative in the Southern Hemisphere; sets the Coriolis parameter f = 2 Omega sin(latitude)."),
            num("longitude_deg", "deg", -180, 180, 0.0, "Longitude, east positive; with utc_offset_h converts local solar time to clock time."),
            num("utc_offset_h", "h", -12, 14, 0.0, "Offset of the local clock from UTC (e.g. -4 for EDT); all times you read are in this clock."),
            new Field("bearing_land_to_sea_deg", new Schema.Num("deg", 0, 360, false, false), Presence.REQUIRED, null,
                    "Compass bearing pointing from land to sea, clockwise from north (270: the sea lies to the west; 0 and 360 "
                            + "both mean north)."),
            integer("day_of_year", 1, 366, 172, "Day of the year (172 is 21 June); sets solar geometry and the equation of time."));

    static final Field SURFACE = new Field("surface", new ListOf(new Variant("type",
            List.of(text("name", null, "Label of the segment (e.g. sea, barrier, bay, mainland)."),
                    optional(num("ends_at_km", "km", -5000, 5000, null,
                            "Cross-shore position where this segment ends (x = 0 is the main coastline, inland positive). "
                                    + "Every segment but the last needs it; the last extends inland without end, the first offshore without end."))),
            Schema.forms(
                    "water", List.of(
                            new Field("sst_K", new Schema.Num("K", 260, 320, true, true), Presence.DEFAULTED, 293.15, "Water surface temperature."),
                            new Field("roughness_m", new Schema.Num("m", 0, 0.1, true, true), Presence.DEFAULTED, 2e-4,
                                    "Aerodynamic roughness length (about 2e-4 m over open water).")),
                    "land", List.of(
                            num("albedo", "", 0, 1, 0.2, "Surface albedo."),
                            pos("bowen_ratio", "", 0, 20, 1.0, "Sensible / latent heat flux ratio (Oke 1987: grassland ~0.5, semi-arid 2-6)."),
                            pos("roughness_m", "m", 0, 5, 0.1, "Aerodynamic roughness length."),
                            num("soil_moisture_fraction", "", 0, 1, 0.3, "Soil moisture availability, 0 (dry) to 1 (wet)."))))
            , 1, 32), Presence.OPTIONAL, null,
            "Surface segments from the sea inland, each `type: water` or `type: land`. Omitted: open sea for x < 0 and land for x >= 0 "
                    + "with the defaults below. x = 0 must be a water-to-land shoreline (the main coast). "
                    + "The linear model heats where the surface is land (smoothed over the heating's half-width).");

    static final Field GRID = section("grid", Presence.DEFAULTED, "Model grid. The cross-shore domain is periodic and centred on the coast.",
            integer("points", 16, 16384, 512L, "Number of cross-shore points. kind linear: a power of two (FFT). "
                    + "kind nonlinear: a product of the factors 2, 3 and 5 (e.g. 200, 400, 512)."),
            num("spacing_km", "km", 0.05, 100, 2.0, "Cross-shore grid spacing (at least 50 m: the models are hydrostatic-scale and a finer grid only costs time). Domain length = points x spacing_km; make it several times the breeze scale. "
                    + "kind nonlinear: the outer 50 km at each end are far-field sponges, so the domain must exceed 200 km."),
            integer("levels", 2, 1024, 64L, "Number of output levels from the ground to top_m. kind nonlinear: the layer interfaces "
                    + "from the ground to the rigid lid at top_m, so the model has levels - 1 layers and gives values at their centres."),
            pos("top_m", "m", 100, 50000, 4000.0, "Height of the top level."),
            optional(num("first_level_spacing_m", "m", 1, 1000, null,
                    "Spacing of the lowest layer; the spacing then grows geometrically to reach top_m. Omitted: uniform levels.")));

    static final Field ATMOSPHERE = section("atmosphere", Presence.DEFAULTED, "The horizontally uniform basic state.",
            pos("surface_theta_K", "K", 250, 330, 293.15, "Potential temperature at the ground."),
            pos("buoyancy_frequency_per_s", "1/s", 0, 0.05, 0.01, "Brunt-Vaisala frequency N: constant with height, or, with "
                    + "mixed_layer_depth_m, the N of the free atmosphere above the inversion."),
            optional(pos("mixed_layer_depth_m", "m", 0, 5000, null, "Depth of a neutral mixed layer at the ground. Given, the basic "
                    + "state is a sounding of a convective day: the mixed layer, a capping inversion (inversion_K over inversion_depth_m) "
                    + "and the free atmosphere with N = buoyancy_frequency_per_s. Both models use it; the linear model then solves its "
                    + "vertical problem with the height-varying N(z) (a banded solve per wavenumber and frequency). Omitted: constant N "
                    + "from the ground.")),
            optional(num("inversion_K", "K", 0, 30, null, "Potential-temperature jump across the capping inversion (with "
                    + "mixed_layer_depth_m; default 0: none).")),
            optional(pos("inversion_depth_m", "m", 0, 2000, null, "Thickness of the capping inversion (with inversion_K; default 100).")),
            num("surface_mixing_ratio_g_per_kg", "g/kg", 0, 40, 8.0, "Water-vapour mixing ratio at the ground."),
            num("mixing_ratio_gradient_g_per_kg_per_km", "g/kg per km", -20, 5, -2.0, "Vertical gradient of the mixing ratio (negative: drier aloft)."),
            pos("surface_pressure_hPa", "hPa", 500, 1090, 1013.25, "Surface pressure."));

    static final Field AMBIENT = section("ambient_wind", Presence.DEFAULTED,
            "The large-scale wind, uniform in height, in meteorological convention. The linear model uses its cross-shore "
                    + "component as the uniform basic-state flow U (Doppler shift); an alongshore component is added to v unchanged. "
                    + "The nonlinear model takes it as the geostrophic wind: it holds above the boundary layer, while surface drag "
                    + "slows and turns the wind near the ground (more over rough land than over water).",
            num("speed_m_per_s", "m/s", 0, 40, 0.0, "Wind speed."),
            new Field("from_deg", new Schema.Num("deg", 0, 360, false, false), Presence.DEFAULTED, 0.0,
                    "Direction the wind blows FROM, clockwise from north (onshore on a coast with bearing_land_to_sea_deg B is from B; "
                            + "0 and 360 both mean a north wind)."));

    static final Field HEATING = new Field("heating", new Variant("shape", List.of(),
            Schema.forms(
                    "classic", List.of(
                            num("amplitude_K_per_h", "K/h", 0, 5, 0.5,
                                    "Q0 in Q = Q0 [pi/2 + arctan(x/x0)] exp(-z/H) sin(omega (t - sunrise)): far inland the heating rate peaks at pi Q0 "
                                            + "(5 K/h gives about 16 K/h far inland, beyond any observed mixed-layer heating)."),
                            pos("half_width_km", "km", 0, 500, 10.0, "x0, the coastal transition half-width of the heating."),
                            num("depth_m", "m", 10, 10000, 1000.0, "H, the e-folding depth of the heating."),
                            num("sunrise_solar_h", "h", 0, 12, 6.0, "Local solar time at which the heating turns positive (6 for the pure sinusoid).")),
                    "slab", List.of(
                            num("peak_flux_difference_W_per_m2", "W/m2", 0, 1000, 250.0, "Peak land-minus-water sensible heat flux."),
                            optional(num("sunrise_solar_h", "h", 0, 24, null, "Start of heating, local solar time. Omitted: sunrise from latitude and day of year (Cooper 1969 declination).")),
                            optional(num("sunset_solar_h", "h", 0, 24, null, "End of heating, local solar time. Omitted: sunset from latitude and day of year.")),
                            optional(pos("lapse_above_K_per_km", "K/km", 0, 50, null,
                                    "Potential-temperature gradient above the mixed layer. Omitted: N^2 theta_s / g from the atmosphere section.")),
                            num("entrainment_ratio", "", 0, 1, 0.2, "A in the zero-order-jump growth (0.2 usual; 0 is encroachment)."),
                            num("initial_depth_m", "m", 10, 3000, 100.0, "Mixed-layer depth at sunrise."),
                            pos("transition_half_width_km", "km", 0, 500, 5.0, "Half-width of the smoothed land-water step.")),
                    "energy_balance", List.of(
                            num("cloud_fraction", "", 0, 1, 0.0, "Total cloud cover, 0 (clear) to 1 (overcast); reduces the sunshine "
                                    + "(Kasten & Czeplak 1980) and changes the longwave balance."),
                            choice("partition", List.of("bowen_ratio", "priestley_taylor"), "bowen_ratio",
                                    "How the land's available energy splits into sensible and latent heat: by each land segment's "
                                    + "bowen_ratio, or by the modified Priestley-Taylor form (de Bruin & Holtslag 1982) scaled by its "
                                    + "soil_moisture_fraction.")))),
            Presence.DEFAULTED, null, "How the land is heated relative to the water: `shape: classic` (the analytic shape of linear theory), "
                    + "`shape: slab` (surface heat flux spread through a growing mixed layer) or `shape: energy_balance` (kind nonlinear "
                    + "only: each segment's fluxes from sun, cloud, albedo and Bowen ratio; water from its sst_K). "
                    + "kind nonlinear with classic: the same heating rate added to theta, no surface heat flux; with slab: the land "
                    + "sensible heat flux is a half-sine of peak peak_flux_difference_W_per_m2 between sunrise and sunset (latent heat "
                    + "from each segment's bowen_ratio, water from bulk formulas), entrainment_ratio and initial_depth_m set the "
                    + "model's slab mixed layer, and lapse_above_K_per_km and transition_half_width_km are not used. "
                    + "Omitted: classic with its defaults for kind linear, energy_balance for kind nonlinear.");

    static final Field PHYSICS = section("physics", Presence.DEFAULTED, "Switches and damping of the model equations.",
            new Field("friction_per_s", new Schema.Num("1/s", 0, 1e-2, false, true), Presence.DEFAULTED, 0.0, "Rayleigh friction alpha (0: inviscid). A few 1e-5 1/s keeps the response finite near 30 degrees latitude. "
                    + "kind nonlinear: applied to the departure from the geostrophic wind, on top of the model's turbulent mixing and surface drag."),
            new Field("cooling_per_s", new Schema.Num("1/s", 0, 1e-2, false, true), Presence.OPTIONAL, null,
                    "Newtonian cooling rate. Omitted: equal to friction_per_s."),
            flag("hydrostatic", true, "true: hydrostatic equations; false: keep the non-hydrostatic term. kind linear only (the nonlinear model is always non-hydrostatic)."),
            integer("harmonics", 1, 128, 24L, "Number of diurnal time harmonics kept (1 is a pure sinusoid). kind linear only."));

    static final Field SITES = new Field("sites", new ListOf(new Section(List.of(
            text("name", null, "Site label (unique)."),
            num("inland_km", "km", -5000, 5000, null, "Distance inland from the main coastline (negative: offshore); must lie inside the domain."))),
            1, 64), Presence.REQUIRED, null, "Virtual profiling sites on the cross-shore line.");

    static final Field NOISE = section("noise", Presence.OPTIONAL,
            "Gaussian instrument noise, independent from bin to bin, reproducible for a seed. Omitted: no noise.",
            integer("seed", Long.MIN_VALUE, Long.MAX_VALUE, null, "Seed of the random-number generator."),
            num("temperature_sigma_K", "K", 0, 10, 0.2, "Standard deviation of temperature noise."),
            num("rh_sigma_percent", "%", 0, 50, 2.0, "Standard deviation of relative-humidity noise (absolute percent)."),
            num("pressure_sigma_hPa", "hPa", 0, 50, 0.5, "Standard deviation of pressure noise."),
            num("wind_sigma_m_per_s", "m/s", 0, 20, 0.5, "Standard deviation of noise on each horizontal wind component."));

    static final Field FLIGHTS = section("flights", Presence.DEFAULTED, "When and how the virtual drones fly (local clock time).",
            num("cadence_min", "min", 1, 1440, 30.0, "Time between launches (at least a minute)."),
            num("start_h", "h", 0, 24, 6.0, "First launch, local clock hours."),
            num("end_h", "h", 0, 24, 20.0, "Last launch (inclusive), local clock hours."),
            optional(num("dense_cadence_min", "min", 1, 1440, null, "Time between launches inside the dense window. Omitted: no dense window.")),
            optional(num("dense_start_h", "h", 0, 24, null, "Start of the dense window, local clock hours (needed with dense_cadence_min).")),
            optional(num("dense_end_h", "h", 0, 24, null, "End of the dense window, local clock hours (needed with dense_cadence_min).")),
            pos("ceiling_m", "m", 0, 10000, 600.0, "Altitude ceiling of each ascent (must not exceed grid.top_m; local aviation rules decide the real one)."),
            num("bin_m", "m", 1, 500, 5.0, "Bin thickness (at least 1 m); values are reported at bin centres."),
            num("ascent_rate_m_per_s", "m/s", 0.5, 30, 2.0, "Climb rate; the bin at height z is sampled z / rate after launch."),
            NOISE);

    static final Field OUTPUT = section("output", Presence.DEFAULTED, "Times and levels used for the diagnostics, plots and summary.",
            num("start_h", "h", 0, 48, 0.0, "First output time, local clock hours. kind nonlinear: the model starts at the earliest of "
                    + "output.start_h, flights.start_h and 2 h before sunrise, from the balanced boundary layer of each surface."),
            num("end_h", "h", 0, 48, 24.0, "Last output time, local clock hours (more than 24 reaches into the next day). kind nonlinear: "
                    + "the model runs to the later of output.end_h and the end of the last ascent."),
            num("step_min", "min", 1, 360, 15.0, "Output interval (at least a minute)."),
            num("near_surface_m", "m", 0, 1000, 10.0, "Height of the near-surface wind used for onset, arrival and the time-distance section."),
            pos("onshore_threshold_m_per_s", "m/s", 0, 20, 0.5,
                    "Onshore means the total cross-shore wind and the breeze wind (the model wind minus the ambient wind) both reach "
                            + "this (docs/fronts.md)."));

    /**
     * The numeric type of a key given by the object keys on its way down ({@code [surface, sst_K]}), or null when
     * there is no such key or it is not a number. Where the forms of a variant give one key different ranges
     * (heating.sunrise_solar_h), the widest range is returned: the full check of each scenario decides.
     */
    public static Schema.Num numberAt(List<String> keys) {
        List<Schema.Type> level = List.of(ROOT);
        for (String k : keys) {
            List<Schema.Type> next = new java.util.ArrayList<>();
            for (Schema.Type t : level) {
                while (t instanceof ListOf l) {
                    t = l.item();
                }
                if (t instanceof Section s) {
                    Field f = s.field(k);
                    if (f != null) {
                        next.add(f.type());
                    }
                } else if (t instanceof Variant v) {
                    for (String form : v.forms().keySet()) {
                        Field f = v.sectionFor(form).field(k);
                        if (f != null) {
                            next.add(f.type());
                        }
                    }
                }
            }
            if (next.isEmpty()) {
                return null;
            }
            level = next;
        }
        Schema.Num out = null;
        for (Schema.Type t : level) {
            Schema.Num n = t instanceof Schema.Num x ? x
                    : t instanceof Schema.Int i ? new Schema.Num("", i.min(), i.max(), false, false) : null;
            if (n == null) {
                continue;
            }
            if (out == null) {
                out = n;
            } else {
                boolean lo = n.min() < out.min();
                boolean hi = n.max() > out.max();
                out = new Schema.Num(out.unit(), lo ? n.min() : out.min(), hi ? n.max() : out.max(),
                        lo ? n.minOpen() : out.minOpen(), hi ? n.maxOpen() : out.maxOpen());
            }
        }
        return out;
    }

    /** The whole file. */
    public static final Section ROOT = new Section(List.of(
            text("name", null, "Short identifier of the scenario (used in file names and tables)."),
            text("description", null, "What the scenario shows or which hypothesis it tests."),
            choice("kind", List.of("linear", "nonlinear"), "linear", "Which model runs it: linear (the spectral linear model, periodic in time, seconds) or nonlinear (the 2D "
                    + "non-hydrostatic model with boundary-layer physics, run forward from a balanced night-time start, tens of seconds to minutes)."),
            COAST, SURFACE, GRID, ATMOSPHERE, AMBIENT, HEATING, PHYSICS, SITES, FLIGHTS, OUTPUT));
}
