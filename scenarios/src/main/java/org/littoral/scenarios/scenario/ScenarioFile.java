package org.littoral.scenarios.scenario;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.linear.HeatingSpec;
import org.littoral.model.nonlinear.ThetaProfile;
import org.littoral.model.sounding.FlightSchedule;
import org.littoral.model.sounding.InstrumentNoise;
import org.littoral.model.sounding.SoundingSpec;
import org.littoral.model.sounding.VirtualSite;
import org.littoral.model.surface.SolarGeometry;
import org.littoral.model.surface.SurfaceEnergyBalance;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.UserInputException;

/**
 * Reads a scenario file (YAML, or JSON when the name ends in .json), validates it against
 * {@link ScenarioSchema} and the rules that tie keys together, and builds a {@link Scenario}.
 * Every problem becomes a {@link UserInputException} with one line naming file:line:column, the key
 * path, the value and the fix.
 */
public final class ScenarioFile {
    private ScenarioFile() {
    }

    /** Reads and validates a file on disk. */
    public static Scenario load(Path path) {
        if (!Files.exists(path) && !Files.isSymbolicLink(path)) {
            throw new UserInputException(org.littoral.scenarios.input.Shown.clip(path.toString(), 160) + ": no such scenario "
                    + "file; give a path to a .yaml/.json file or a built-in name (" + String.join(", ", BuiltinScenarios.names()) + ")");
        }
        return build(InputDocument.read(path, ""), path.toString());
    }

    /** Parses and validates scenario text; {@code displayName} is used in messages. */
    public static Scenario parse(String displayName, String text, boolean json) {
        return build(InputDocument.parse(displayName, text, json), displayName);
    }

    /** Validates a scenario tree that was built in memory (no line numbers); {@code displayName} starts messages. */
    public static Scenario fromTree(String displayName, JsonNode tree) {
        return build(InputDocument.of(displayName, tree.deepCopy()), displayName);
    }

    private static Scenario build(InputDocument doc, String displayName) {
        JsonNode tree = doc.root();
        if (tree == null || tree.isMissingNode() || tree.isNull()) {
            throw new UserInputException(displayName + ": the scenario file is empty; start from a built-in one (littoral scenarios --show classic-45N)");
        }
        doc.rootMapping("scenario keys (name, description, coast, sites, ...)");
        if (tree instanceof ObjectNode o && o.path("kind").asText("").equals("nonlinear") && o.get("heating") == null) {
            // the heating default depends on the kind: the nonlinear model heats the land by the energy balance
            o.putObject("heating").put("shape", "energy_balance");
        }
        SchemaValidator v = new SchemaValidator(doc);
        ObjectNode n = v.validate(ScenarioSchema.ROOT, tree);
        fail(v.problems());
        Builder b = new Builder(n, v);
        Scenario s;
        try {
            s = b.build(displayName);
        } catch (IllegalArgumentException e) {
            // the model's own checks: the schema and the rules above should have caught it first
            throw new UserInputException(displayName + ": the model refuses these values: " + ModelLimits.inYamlTerms(e.getMessage())
                    + "; change that key", e);
        }
        fail(b.problems);
        ModelLimits.check(s, displayName);
        return s;
    }

    private static void fail(List<String> problems) {
        if (!problems.isEmpty()) {
            String more = problems.size() > 1 ? " (and " + (problems.size() - 1) + " more problem" + (problems.size() > 2 ? "s" : "") + ")" : "";
            throw new UserInputException(problems.get(0) + more);
        }
    }

    /** Turns the normalised tree into model types and applies the rules that tie keys together. */
    private static final class Builder {
        final ObjectNode n;
        final SchemaValidator v;
        final List<String> problems = new ArrayList<>();

        Builder(ObjectNode n, SchemaValidator v) {
            this.n = n;
            this.v = v;
        }

        void problem(String path, String msg) {
            problems.add(v.where(path) + msg);
        }

        double d(JsonNode o, String key) {
            return o.get(key).doubleValue();
        }

        Double opt(JsonNode o, String key) {
            JsonNode x = o.get(key);
            return x == null ? null : x.doubleValue();
        }

        Scenario build(String source) {
            Scenario.Kind kind = n.get("kind").asText().equals("nonlinear") ? Scenario.Kind.NONLINEAR : Scenario.Kind.LINEAR;
            boolean nonlinear = kind == Scenario.Kind.NONLINEAR;
            JsonNode c = n.get("coast");
            Coast coast = new Coast(d(c, "latitude_deg"), d(c, "longitude_deg"), d(c, "utc_offset_h"),
                    d(c, "bearing_land_to_sea_deg"), c.get("day_of_year").intValue());

            JsonNode g = n.get("grid");
            int nx = g.get("points").intValue();
            if (!nonlinear && Integer.bitCount(nx) != 1) {
                problem("grid.points", "grid.points = " + nx + " is not a power of two (the linear model's FFT needs one); use "
                        + Integer.highestOneBit(nx) + " or " + Integer.highestOneBit(nx) * 2);
            }
            if (nonlinear && !smallFactors(nx)) {
                problem("grid.points", "grid.points = " + nx + " has a prime factor above 5 (kind nonlinear needs a product of 2, 3 and 5 "
                        + "for its FFT); use e.g. " + nearestSmooth(nx));
            }
            double dx = d(g, "spacing_km") * 1000.0;
            double minLengthKm = 4 * Scenario.NONLINEAR_SPONGE_M / 1000.0;
            if (nonlinear && nx * dx / 1000.0 <= minLengthKm) {
                problem("grid.points", "grid: the domain points x spacing_km = " + Schema.fmt(nx * dx / 1000.0) + " km is too narrow for "
                        + "kind nonlinear, which keeps " + Schema.fmt(Scenario.NONLINEAR_SPONGE_M / 1000.0) + " km of far-field sponge at each "
                        + "end; make it more than " + Schema.fmt(minLengthKm) + " km (e.g. 400 points x 1 km)");
            }
            HorizontalGrid xg = HorizontalGrid.centred(Math.max(nx, 4), dx);
            int nz = g.get("levels").intValue();
            double top = d(g, "top_m");
            Double first = opt(g, "first_level_spacing_m");
            VerticalGrid zg;
            if (first != null && first * (nz - 1) > top) {
                problem("grid.first_level_spacing_m", "grid.first_level_spacing_m = " + first + " is too large for " + nz
                        + " levels up to " + top + " m; use at most top_m / (levels - 1) = " + top / (nz - 1) + " m");
                zg = VerticalGrid.uniform(nz, top);
            } else {
                zg = first == null ? VerticalGrid.uniform(nz, top) : VerticalGrid.stretched(nz, top, first);
            }

            SurfaceMap surface = surface(n.get("surface"));

            JsonNode a = n.get("atmosphere");
            Double mixedLayer = opt(a, "mixed_layer_depth_m");
            Double jump = opt(a, "inversion_K");
            Double jumpDepth = opt(a, "inversion_depth_m");
            if (mixedLayer == null && (jump != null || jumpDepth != null)) {
                problem("atmosphere.mixed_layer_depth_m", "atmosphere: inversion_K and inversion_depth_m describe the inversion on top of "
                        + "a mixed layer; give atmosphere.mixed_layer_depth_m too (or remove them for constant N)");
            }
            ThetaProfile layers = null;
            if (mixedLayer != null) {
                layers = new ThetaProfile.Layered(d(a, "surface_theta_K"), mixedLayer, jump == null ? 0.0 : jump,
                        jumpDepth == null ? 100.0 : jumpDepth, d(a, "buoyancy_frequency_per_s"));
            }
            Scenario.Atmosphere atm = new Scenario.Atmosphere(d(a, "surface_theta_K"), d(a, "buoyancy_frequency_per_s"),
                    d(a, "surface_mixing_ratio_g_per_kg") / 1000.0, d(a, "mixing_ratio_gradient_g_per_kg_per_km") / 1e6,
                    d(a, "surface_pressure_hPa") * 100.0, layers);

            JsonNode w = n.get("ambient_wind");
            double[] en = Coast.eastNorthFromDirection(d(w, "speed_m_per_s"), d(w, "from_deg"));
            Scenario.AmbientWind wind = new Scenario.AmbientWind(d(w, "speed_m_per_s"), d(w, "from_deg"),
                    clean(coast.crossShore(en[0], en[1])), clean(coast.alongshore(en[0], en[1])));

            JsonNode hn = n.get("heating");
            HeatingSpec heating = null;
            Scenario.EnergyBalance eb = null;
            if (hn.get("shape").asText().equals("energy_balance")) {
                if (!nonlinear) {
                    problem("heating.shape", "heating.shape = 'energy_balance' needs kind: nonlinear (the linear model is forced by a "
                            + "prescribed heating); set kind: nonlinear or use shape: classic or slab");
                }
                eb = new Scenario.EnergyBalance(d(hn, "cloud_fraction"), hn.get("partition").asText().equals("priestley_taylor")
                        ? SurfaceEnergyBalance.Partition.PRIESTLEY_TAYLOR : SurfaceEnergyBalance.Partition.BOWEN_RATIO);
            } else {
                heating = heating(hn, coast, atm);
                String widthKey = heating instanceof HeatingSpec.ClassicShape ? "half_width_km" : "transition_half_width_km";
                double widthKm = d(hn, widthKey);
                if (!nonlinear && widthKm * 1000.0 < 0.5 * dx) {
                    problem("heating." + widthKey, "heating." + widthKey + " = " + Schema.fmt(widthKm) + " is below half the grid "
                            + "spacing (" + Schema.fmt(dx / 2000.0) + " km), too sharp for the grid to resolve; widen it or refine "
                            + "grid.spacing_km");
                }
            }

            JsonNode ph = n.get("physics");
            Double cooling = opt(ph, "cooling_per_s");
            Scenario.Physics physics = new Scenario.Physics(d(ph, "friction_per_s"), cooling == null ? d(ph, "friction_per_s") : cooling,
                    ph.get("hydrostatic").booleanValue(), ph.get("harmonics").intValue());

            if (!nonlinear && heating instanceof HeatingSpec.SlabMixedLayer && !(physics.frictionPerS() > 0 && physics.coolingPerS() > 0)) {
                problem("physics.friction_per_s", "physics.friction_per_s = " + Schema.fmt(physics.frictionPerS()) + " and cooling_per_s = "
                        + Schema.fmt(physics.coolingPerS()) + ": the slab heating has a daily mean, whose steady linear response needs "
                        + "both above 0; set them to e.g. 1e-5");
            }
            List<VirtualSite> sites = sites(n.get("sites"), xg);
            Scenario.Flights flights = flights(n.get("flights"), top, n.get("name").asText());
            Scenario.Output output = output(n.get("output"), top);
            return new Scenario(n.get("name").asText(), n.get("description").asText(), kind, source, coast, surface, xg, zg,
                    atm, wind, heating, eb, physics, sites, flights, output, n);
        }

        static boolean smallFactors(int n) {
            for (int p : new int[] {2, 3, 5}) {
                while (n > 1 && n % p == 0) {
                    n /= p;
                }
            }
            return n == 1;
        }

        /** The nearest whole number at or above n with only the factors 2, 3 and 5. */
        static int nearestSmooth(int n) {
            int m = Math.max(1, n);
            while (!smallFactors(m)) {
                m++;
            }
            return m;
        }

        /** Components of exactly cross- or alongshore winds come out as 1e-16 from trigonometry: round them to 0. */
        static double clean(double x) {
            return Math.abs(x) < 1e-9 ? 0.0 : x;
        }

        SurfaceMap surface(JsonNode list) {
            if (list == null) {
                return SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1);
            }
            List<SurfaceSegment> segs = new ArrayList<>();
            double from = Double.NEGATIVE_INFINITY;
            boolean mainCoast = false;
            for (int k = 0; k < list.size(); k++) {
                JsonNode s = list.get(k);
                String p = "surface[" + k + "]";
                boolean last = k == list.size() - 1;
                Double endKm = opt(s, "ends_at_km");
                double to;
                if (last) {
                    if (endKm != null) {
                        problem(p + ".ends_at_km", p + ".ends_at_km = " + endKm + ": the last segment extends inland without end; remove ends_at_km");
                    }
                    to = Double.POSITIVE_INFINITY;
                } else if (endKm == null) {
                    problem(p, "missing key '" + p + ".ends_at_km'; add it: every segment but the last needs the cross-shore position (km) where it ends");
                    return SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1);
                } else {
                    to = endKm * 1000.0;
                }
                if (!(to > from)) {
                    problem(p + ".ends_at_km", p + ".ends_at_km = " + endKm + " does not lie beyond the previous segment's end ("
                            + from / 1000.0 + " km); list segments from the sea inland with increasing ends_at_km");
                    return SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1);
                }
                String name = s.get("name").asText();
                SurfaceSegment seg = s.get("type").asText().equals("water")
                        ? new SurfaceSegment.Water(name, from, to, d(s, "sst_K"), d(s, "roughness_m"))
                        : new SurfaceSegment.Land(name, from, to, d(s, "albedo"), d(s, "bowen_ratio"), d(s, "roughness_m"),
                                d(s, "soil_moisture_fraction"));
                if (!segs.isEmpty() && from == 0.0 && seg.isLand() && !segs.get(segs.size() - 1).isLand()) {
                    mainCoast = true;
                }
                segs.add(seg);
                from = to;
            }
            if (!mainCoast) {
                problem("surface", "surface: no water segment ends at 0 km followed by land; x = 0 is the main coastline, "
                        + "so set ends_at_km: 0 on the water segment next to the mainland");
            }
            return new SurfaceMap(segs);
        }

        HeatingSpec heating(JsonNode h, Coast coast, Scenario.Atmosphere atm) {
            if (h.get("shape").asText().equals("classic")) {
                return new HeatingSpec.ClassicShape(d(h, "amplitude_K_per_h") / 3600.0, d(h, "half_width_km") * 1000.0,
                        d(h, "depth_m"), d(h, "sunrise_solar_h"));
            }
            double decl = SolarGeometry.declinationRad(coast.dayOfYear());
            double[] sun = {SolarGeometry.sunriseSolarHours(coast.latitudeDeg(), decl), SolarGeometry.sunsetSolarHours(coast.latitudeDeg(), decl)};
            Double rise = opt(h, "sunrise_solar_h");
            Double set = opt(h, "sunset_solar_h");
            double sunrise = rise != null ? rise : sun[0];
            double sunset = set != null ? set : sun[1];
            if (!(sunset > sunrise)) {
                problem(set != null ? "heating.sunset_solar_h" : "heating", "heating: sunset (" + sunset + " h solar) is not after sunrise ("
                        + sunrise + " h solar)" + (rise == null && set == null ? " at this latitude and day (polar night)" : "")
                        + "; give heating.sunrise_solar_h and heating.sunset_solar_h with sunset later");
            }
            Double lapse = opt(h, "lapse_above_K_per_km");
            // N^2 = (g / theta) d(theta)/dz, so d(theta)/dz = N^2 theta / g
            double gamma = lapse != null ? lapse / 1000.0
                    : atm.buoyancyFrequencyPerS() * atm.buoyancyFrequencyPerS() * atm.surfaceThetaK() / Thermo.G;
            return new HeatingSpec.SlabMixedLayer(d(h, "peak_flux_difference_W_per_m2"), sunrise, sunset, gamma,
                    d(h, "entrainment_ratio"), d(h, "initial_depth_m"), d(h, "transition_half_width_km") * 1000.0);
        }

        List<VirtualSite> sites(JsonNode list, HorizontalGrid xg) {
            List<VirtualSite> out = new ArrayList<>();
            Set<String> names = new HashSet<>();
            for (int k = 0; k < list.size(); k++) {
                JsonNode s = list.get(k);
                String p = "sites[" + k + "]";
                String name = s.get("name").asText();
                if (!names.add(name)) {
                    problem(p + ".name", p + ".name = '" + name + "' is used twice; give each site its own name");
                }
                double km = d(s, "inland_km");
                double lo = xg.xM(0) / 1000.0;
                double hi = xg.lastM() / 1000.0;
                if (km < lo || km > hi) {
                    problem(p + ".inland_km", p + ".inland_km = " + Schema.fmt(km) + " (site '" + name + "') is outside the model domain "
                            + Schema.fmt(lo) + " to " + Schema.fmt(hi) + " km; move the site or widen the domain (grid.points x grid.spacing_km)");
                }
                out.add(new VirtualSite(name, km * 1000.0));
            }
            return out;
        }

        Scenario.Flights flights(JsonNode f, double top, String day) {
            double start = d(f, "start_h");
            double end = d(f, "end_h");
            if (end < start) {
                problem("flights.end_h", "flights.end_h = " + Schema.fmt(end) + " is before flights.start_h = " + Schema.fmt(start) + "; swap them");
                end = start;
            }
            Double dc = opt(f, "dense_cadence_min");
            Double ds = opt(f, "dense_start_h");
            Double de = opt(f, "dense_end_h");
            FlightSchedule sch;
            if (dc == null && ds == null && de == null) {
                sch = FlightSchedule.regular(d(f, "cadence_min"), start, end);
            } else if (dc == null || ds == null || de == null) {
                problem("flights", "flights: a dense window needs all three of dense_cadence_min, dense_start_h and dense_end_h; add the missing ones or remove them all");
                sch = FlightSchedule.regular(d(f, "cadence_min"), start, end);
            } else if (de < ds) {
                problem("flights.dense_end_h", "flights.dense_end_h = " + Schema.fmt(de) + " is before flights.dense_start_h = " + Schema.fmt(ds) + "; swap them");
                sch = FlightSchedule.regular(d(f, "cadence_min"), start, end);
            } else {
                sch = new FlightSchedule(d(f, "cadence_min"), start, end, dc, ds, de);
            }
            double ceiling = d(f, "ceiling_m");
            if (ceiling > top) {
                problem("flights.ceiling_m", "flights.ceiling_m = " + Schema.fmt(ceiling) + " is above the model top grid.top_m = "
                        + Schema.fmt(top) + " m; lower the ceiling or raise the top");
                ceiling = top;
            }
            double bin = d(f, "bin_m");
            if (bin > ceiling) {
                problem("flights.bin_m", "flights.bin_m = " + Schema.fmt(bin) + " is thicker than the whole ascent (ceiling "
                        + Schema.fmt(ceiling) + " m); use a bin of a few metres");
                bin = ceiling;
            }
            JsonNode nz = f.get("noise");
            InstrumentNoise noise = nz == null ? null : new InstrumentNoise(nz.get("seed").longValue(), d(nz, "temperature_sigma_K"),
                    d(nz, "rh_sigma_percent") / 100.0, d(nz, "pressure_sigma_hPa") * 100.0, d(nz, "wind_sigma_m_per_s"));
            SoundingSpec spec = new SoundingSpec(ceiling, bin, d(f, "ascent_rate_m_per_s"), SoundingSpec.DEFAULT_NODE_SPACING_SEC,
                    noise, day, 0);
            return new Scenario.Flights(sch, spec);
        }

        Scenario.Output output(JsonNode o, double top) {
            double start = d(o, "start_h");
            double end = d(o, "end_h");
            if (!(end > start)) {
                problem("output.end_h", "output.end_h = " + Schema.fmt(end) + " is not after output.start_h = " + Schema.fmt(start) + "; make the output span positive");
                end = start + 1;
            }
            double zs = d(o, "near_surface_m");
            if (zs > top) {
                problem("output.near_surface_m", "output.near_surface_m = " + Schema.fmt(zs) + " is above the model top grid.top_m = "
                        + Schema.fmt(top) + " m; lower it or raise the top");
            }
            return new Scenario.Output(start, end, d(o, "step_min"), zs, d(o, "onshore_threshold_m_per_s"));
        }
    }
}
