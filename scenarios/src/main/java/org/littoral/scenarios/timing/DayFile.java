package org.littoral.scenarios.timing;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.TreeMap;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;
import org.littoral.scenarios.sweep.ScenarioSource;
import org.littoral.scenarios.sweep.SweepFile;
import org.littoral.scenarios.sweep.SweepSpec;

/**
 * Reads a check-timing day file (YAML or JSON; format in docs/timing-checks.md). Every problem is a
 * {@link UserInputException} with one line naming the file, the key, the value and the allowed range. The
 * ensemble part is handed to the sweep machinery ({@link SweepFile}) as an inline sweep, so distributions are
 * written and checked exactly as in sweep and plan files.
 */
public final class DayFile {
    private static final Set<String> TOP = new TreeSet<>(List.of("date", "description", "coast", "ambient_wind", "front",
            "flights", "sites", "passage_uncertainty_min", "ensemble", "checks"));
    private static final Set<String> FRONT = new TreeSet<>(List.of("theta_v_contrast_K", "theta_v_contrast_uncertainty_K",
            "reference_theta_v_K", "breeze_depth_m", "breeze_depth_uncertainty_m", "layer_depth_m", "earliest_onset_h"));
    private static final Set<String> FLIGHTS = new TreeSet<>(List.of("interval_min", "first_h", "last_h",
            "dense_interval_min", "dense_start_h", "dense_end_h"));
    private static final Set<String> CHECKS = new TreeSet<>(List.of("envelope_low_percentile", "envelope_high_percentile",
            "retardation_min"));
    /** Uncertain inputs in the day file's own names (value: a distribution as in sweep files, or "fixed"). */
    static final List<String> UNCERTAIN = List.of("ambient_from_deg", "ambient_speed_m_per_s", "heating_peak_flux_W_per_m2",
            "heating_amplitude_K_per_h", "buoyancy_frequency_per_s", "sst_K", "mixed_layer_start_depth_m");
    private static final Set<String> ENSEMBLE = new TreeSet<>(List.of("model", "members", "seed", "grid", "harmonics",
            "output_step_min", "draws"));
    private static final Set<String> GRID = new TreeSet<>(List.of("points", "spacing_km", "levels"));

    static {
        ENSEMBLE.addAll(UNCERTAIN);
    }

    private final String source;
    private final Path folder;
    /** The model asked for on the command line (overrides ensemble.model), or null. */
    private final String modelOverride;
    private final InputDocument doc;

    private DayFile(String source, Path folder, String modelOverride, InputDocument doc) {
        this.source = source;
        this.folder = folder;
        this.modelOverride = modelOverride;
        this.doc = doc;
    }

    public static DaySpec read(Path file) {
        return read(file, null);
    }

    /**
     * Reads a day file; {@code model} ("nonlinear", "linear" or null for the file's choice) decides the model before
     * the ensemble grid's defaults are set, since the two models have different defaults.
     */
    public static DaySpec read(Path file, String model) {
        if (!Files.exists(file)) {
            throw new UserInputException("day file " + file + " does not exist; give a YAML day file (docs/timing-checks.md)");
        }
        InputDocument d = InputDocument.read(file, "day file");
        ObjectNode root = d.rootMapping("day keys (date, coast, ambient_wind, ...)");
        return new DayFile(file.toString(), file.toAbsolutePath().getParent(), model, d).parse(root);
    }

    /** Parses day-file text (tests); relative coast paths resolve against {@code folder} (may be null) and the working folder. */
    public static DaySpec parse(String source, String yaml, Path folder) {
        InputDocument d = InputDocument.parse("day file " + source, yaml, false);
        ObjectNode root = d.rootMapping("day keys (date, coast, ambient_wind, ...)");
        return new DayFile(source, folder, null, d).parse(root);
    }

    private UserInputException err(String key, String problem) {
        return new UserInputException(doc.where(key) + ": " + Shown.clip(key, 100) + ": " + problem);
    }

    private DaySpec parse(ObjectNode root) {
        onlyKeys("", root, TOP);
        String date = dateOf(root.get("date"));
        JsonNode coastRef = root.get("coast");
        if (coastRef == null || !coastRef.isTextual()) {
            throw err("coast", (coastRef == null ? "missing" : Shown.value(coastRef) + " is not a file name") + "; give a coast file (coast, surface, sites sections), a scenario file"
                    + " or a built-in scenario (" + String.join(", ", BuiltinScenarios.names()) + ")");
        }
        ObjectNode ens = obj(root, "ensemble");
        ObjectNode base = baseDocument(coastRef.asText(), date);

        // The day's ambient wind.
        ObjectNode wind = obj(root, "ambient_wind");
        if (wind == null) {
            throw err("ambient_wind", "missing; give {from_deg, speed_m_per_s}: the day's large-scale wind");
        }
        onlyKeys("ambient_wind", wind, Set.of("from_deg", "speed_m_per_s"));
        double fromDeg = number(wind, "ambient_wind.from_deg", Double.NaN, 0, 360, "deg (direction the wind blows from)", false);
        double speed = number(wind, "ambient_wind.speed_m_per_s", Double.NaN, 0, 40, "m/s", false);
        ObjectNode bw = base.with("ambient_wind");
        bw.put("from_deg", fromDeg % 360.0);
        bw.put("speed_m_per_s", speed);

        // Flights and sites.
        ObjectNode fl = obj(root, "flights");
        ObjectNode flights = fl == null ? JsonNodeFactory.instance.objectNode() : fl;
        onlyKeys("flights", flights, FLIGHTS);
        double interval = number(flights, "flights.interval_min", 30, 1, 240, "min", false);
        double first = number(flights, "flights.first_h", 7, 0, 24, "h local clock", false);
        double last = number(flights, "flights.last_h", 18, first, 24, "h local clock (after first_h)", false);
        double dense = number(flights, "flights.dense_interval_min", 0, 0, 240, "min (0: no dense window)", false);
        if (dense > 0 && dense < 1) {
            throw err("flights.dense_interval_min", Shown.number(dense) + " min is shorter than a minute; give 0 (no dense "
                    + "window) or 1 to 240 min");
        }
        double denseStart = number(flights, "flights.dense_start_h", dense > 0 ? Double.NaN : first, first, last,
                "h local clock (inside first_h..last_h)", false);
        double denseEnd = number(flights, "flights.dense_end_h", dense > 0 ? Double.NaN : first, denseStart, last,
                "h local clock (after dense_start_h)", false);
        List<DaySpec.Site> sites = sites(root.get("sites"), base, interval, first, last, dense, denseStart, denseEnd);
        ArrayNode siteDoc = base.putArray("sites");
        for (DaySpec.Site s : sites) {
            siteDoc.addObject().put("name", s.name()).put("inland_km", s.inlandKm());
        }
        double uncMin = number(root, "passage_uncertainty_min", Double.NaN, 0, 180, "min", false, true);

        // Ensemble resolution and model: nonlinear by default (linear theory has no front; docs/fronts.md).
        String model = "nonlinear";
        if (ens != null) {
            onlyKeys("ensemble", ens, ENSEMBLE);
            JsonNode m = ens.get("model");
            if (m != null) {
                model = m.asText();
                if (!List.of("linear", "nonlinear").contains(model)) {
                    throw err("ensemble.model", Shown.value(m) + " is not a model; use nonlinear (fronts, the default) or "
                            + "linear (a quick look whose times are the " + JobModel.LINEAR_TIMES + ")");
                }
            }
        }
        if (modelOverride != null) {
            model = JobModel.check("--model", modelOverride);
        }
        boolean linear = model.equals("linear");
        ObjectNode e = ens == null ? JsonNodeFactory.instance.objectNode() : ens;
        boolean converted = false;
        if (linear) {
            base.put("kind", "linear");
        } else {
            converted = JobModel.toNonlinear(base, false);
        }
        ObjectNode grid = obj(e, "grid");
        ObjectNode g = grid == null ? JsonNodeFactory.instance.objectNode() : grid;
        onlyKeys("ensemble.grid", g, GRID);
        ObjectNode bg = base.with("grid");
        // defaults: the linear model's 512 x 1 km, 48 levels; the nonlinear model's ensemble grid (JobModel)
        int points = (int) number(g, "ensemble.grid.points", linear ? 512 : JobModel.ENSEMBLE_POINTS, 16, 16384,
                linear ? "(a power of two)" : "(a product of 2, 3 and 5)", true);
        if (linear && Integer.bitCount(points) != 1) {
            throw err("ensemble.grid.points", points + " is not a power of two (the linear model's FFT needs one); use "
                    + Integer.highestOneBit(points) + " or " + 2 * Integer.highestOneBit(points));
        }
        bg.put("points", points);
        bg.put("spacing_km", number(g, "ensemble.grid.spacing_km", linear ? 1.0 : JobModel.ENSEMBLE_SPACING_KM, 0.05, 100, "km",
                false));
        bg.put("levels", (int) number(g, "ensemble.grid.levels", linear ? 48 : JobModel.ENSEMBLE_LEVELS, 8, 1024, "levels", true));
        if (base.path("physics").isObject() || linear) {
            base.with("physics").put("harmonics", (int) number(e, "ensemble.harmonics", 12, 1, 128, "diurnal harmonics", true));
        }
        base.with("output").put("step_min", number(e, "ensemble.output_step_min", 10, 1, 60, "min", false));
        if (!base.with("output").has("start_h") || converted) {
            // the nonlinear model runs forward from its start: an hour before the first flight, as the planner does (a
            // linear scenario's output window says nothing about where a forward run should start)
            base.with("output").put("start_h", linear ? 0 : Math.max(0, Math.floor(first) - 1));
        }
        double halfKm = 0.5 * bg.get("points").asDouble() * bg.get("spacing_km").asDouble();
        for (int i = 0; i < sites.size(); i++) {
            DaySpec.Site site = sites.get(i);
            if (!(Math.abs(site.inlandKm()) < 0.95 * halfKm)) {
                throw err("sites", "site " + site.name() + " at " + fmt(site.inlandKm()) + " km lies outside -"
                        + fmt(Math.floor(0.95 * halfKm)) + ".." + fmt(Math.floor(0.95 * halfKm)) + " km, inside the ensemble's "
                        + "domain (ensemble.grid points x spacing_km = " + fmt(2 * halfKm) + " km, centred on the coast); widen "
                        + "ensemble.grid or check inland_km");
            }
        }
        Scenario scenario = scenario(base);
        checkSitesInDomain(sites, scenario);

        // The day's conditions for the density-current speed.
        ObjectNode fr = obj(root, "front");
        ObjectNode front = fr == null ? JsonNodeFactory.instance.objectNode() : fr;
        onlyKeys("front", front, FRONT);
        List<String> given = new ArrayList<>();
        boolean contrastGiven = front.has("theta_v_contrast_K");
        boolean depthGiven = front.has("breeze_depth_m");
        if (contrastGiven) {
            given.add("theta_v_contrast_K");
        }
        if (depthGiven) {
            given.add("breeze_depth_m");
        }
        // Unknown contrast or depth: wide defaults spanning typical sea-breeze fronts (our choice; Simpson 1994,
        // from memory: depth 0.5-1 km, cooling 1-5 K behind the front).
        double contrast = number(front, "front.theta_v_contrast_K", 2.5, 0.05, 20, "K", false);
        double contrastUnc = number(front, "front.theta_v_contrast_uncertainty_K", contrastGiven ? 0.5 : 1.5, 0, 10, "K", false);
        double thetaV = number(front, "front.reference_theta_v_K", 300, 250, 350, "K", false);
        double depth = number(front, "front.breeze_depth_m", 600, 20, 3000, "m", false);
        double depthUnc = number(front, "front.breeze_depth_uncertainty_m", depthGiven ? 150 : 300, 0, 2000, "m", false);
        double layer = number(front, "front.layer_depth_m", Double.POSITIVE_INFINITY, 0, 10000, "m", false, true);
        if (Double.isNaN(layer)) {
            layer = Double.POSITIVE_INFINITY;
        } else if (!(layer > depth)) {
            throw err("front.layer_depth_m", fmt(layer) + " m is not deeper than breeze_depth_m = " + fmt(depth)
                    + " m (the current runs under it); leave it out for the deep limit");
        }
        double onset = number(front, "front.earliest_onset_h", Double.NaN, 0, 24, "h local clock", false, true);
        TimingInputs.DayConditions conditions = new TimingInputs.DayConditions(date, scenario.ambientWind().crossShoreMPerS(),
                contrast, contrastUnc, thetaV, depth, depthUnc, layer, onset);

        ObjectNode ch = obj(root, "checks");
        TimingInputs.Settings settings = new TimingInputs.Settings();
        if (ch != null) {
            onlyKeys("checks", ch, CHECKS);
            settings.envelopeLowPercentile = number(ch, "checks.envelope_low_percentile", 5, 0, 49, "%", false);
            settings.envelopeHighPercentile = number(ch, "checks.envelope_high_percentile", 95, 51, 100, "%", false);
            settings.retardationMin = number(ch, "checks.retardation_min", 0.4, 0.05, 1, "(fraction of the laboratory speed)", false);
        }

        List<String> described = new ArrayList<>();
        SweepSpec sweep = ensemble(e, base, date, fromDeg, speed, described);
        return new DaySpec(source, date, scenario, conditions, given, sites, Double.isNaN(uncMin) ? Double.NaN : uncMin / 60.0,
                sweep, model, described, settings);
    }

    private String dateOf(JsonNode d) {
        if (d == null) {
            throw err("date", "missing; give the day as YYYY-MM-DD (passages of other days are ignored)");
        }
        try {
            return LocalDate.parse(d.asText()).toString();
        } catch (DateTimeParseException ex) {
            throw err("date", Shown.value(d) + " is not a date; write YYYY-MM-DD, e.g. 2031-06-25");
        }
    }

    /** The base scenario document: a scenario (file or built-in) as is, or a coast file inside our template. */
    private ObjectNode baseDocument(String ref, String date) {
        Path found;
        try {
            found = ScenarioSource.resolveFile(ref, folder, "coast");
        } catch (UserInputException ex) {
            throw err("coast", ex.getMessage());
        }
        if (found == null) {
            if (BuiltinScenarios.names().contains(ref)) {
                return BuiltinScenarios.resolve(ref).inputs().deepCopy();
            }
            throw err("coast", Shown.text(ref) + " is neither a file (looked next to the day file and in the working folder) nor "
                    + "a built-in scenario; give a coast file or a built-in name (list them with: littoral scenarios)");
        }
        ObjectNode doc;
        try {
            doc = ScenarioSource.readDocument(found);
        } catch (UserInputException ex) {
            throw err("coast", ex.getMessage());
        }
        if (doc.has("kind") || doc.has("grid") || doc.has("heating")) {
            return scenarioFrom(found).inputs().deepCopy();
        }
        if (!doc.path("coast").isObject()) {
            throw err("coast", found + " has no 'coast' section; give a coast file with coast (latitude_deg, bearing_land_to_sea_deg, "
                    + "...) and may have surface and sites sections");
        }
        // Coast file: our template for a summer day (slab heating through a growing mixed layer); the model is set later.
        ObjectNode t = JsonNodeFactory.instance.objectNode();
        t.put("name", "check-timing-" + date);
        t.put("description", "check-timing ensemble for " + date + " on the coast of " + found.getFileName());
        t.put("kind", "linear");
        t.set("coast", doc.get("coast"));
        if (doc.has("surface")) {
            t.set("surface", doc.get("surface"));
        }
        ObjectNode atm = t.putObject("atmosphere");
        atm.put("surface_theta_K", 294.0);
        atm.put("buoyancy_frequency_per_s", 0.012);
        ObjectNode heat = t.putObject("heating");
        heat.put("shape", "slab");
        heat.put("peak_flux_difference_W_per_m2", 250);
        heat.put("entrainment_ratio", 0.2);
        heat.put("initial_depth_m", 100);
        heat.put("transition_half_width_km", 1);
        ObjectNode ph = t.putObject("physics");
        ph.put("friction_per_s", 2.0e-5);
        ph.put("hydrostatic", true);
        ArrayNode s = t.putArray("sites");
        if (doc.path("sites").isArray()) {
            for (JsonNode site : doc.get("sites")) {
                ObjectNode o = s.addObject();
                o.set("name", site.get("name"));
                o.set("inland_km", site.get("inland_km"));
            }
        }
        t.putObject("output").put("end_h", 24);
        return t;
    }

    private Scenario scenarioFrom(Path file) {
        try {
            return ScenarioFile.load(file);
        } catch (UserInputException ex) {
            throw err("coast", ex.getMessage());
        }
    }

    private Scenario scenario(ObjectNode base) {
        try {
            return ScenarioFile.fromTree(doc.name() + " (base scenario)", base);
        } catch (UserInputException ex) {
            throw new UserInputException(ex.getMessage() + " (check coast, ambient_wind, sites and ensemble.grid)", ex);
        }
    }

    private List<DaySpec.Site> sites(JsonNode n, ObjectNode base, double interval, double first, double last, double dense,
                                     double denseStart, double denseEnd) {
        List<DaySpec.Site> out = new ArrayList<>();
        if (n == null) {
            JsonNode bs = base.path("sites");
            for (JsonNode s : bs) {
                out.add(site(s.path("name").asText(), s.path("inland_km").asDouble(), interval, first, last, dense, denseStart, denseEnd));
            }
            if (out.isEmpty()) {
                throw err("sites", "missing, and the coast gives no sites; list {name, inland_km, flight_interval_min}");
            }
        } else {
            if (!n.isArray() || n.isEmpty()) {
                throw err("sites", Shown.value(n) + " is not a list of sites; give a non-empty list of {name, inland_km, flight_interval_min}");
            }
            Set<String> names = new TreeSet<>();
            for (int i = 0; i < n.size(); i++) {
                String k = "sites[" + i + "]";
                JsonNode s = n.get(i);
                if (!s.isObject()) {
                    throw err(k, Shown.value(s) + " is not a site; give {name, inland_km, flight_interval_min}");
                }
                onlyKeys(k, s, Set.of("name", "inland_km", "flight_interval_min"));
                if (!s.path("name").isTextual() || s.get("name").asText().isBlank() || s.get("name").asText().length() > 120) {
                    throw err(k + ".name", "missing or not text; give the site's name as in the passage table");
                }
                String name = s.get("name").asText();
                if (!names.add(name)) {
                    throw err(k + ".name", Shown.text(name) + " is listed twice; give each site once");
                }
                double km = number((ObjectNode) s, k + ".inland_km", Double.NaN, -5000, 5000, "km (positive inland)", false);
                double iv = number((ObjectNode) s, k + ".flight_interval_min", interval, 1, 240, "min", false);
                out.add(site(name, km, iv, first, last, dense, denseStart, denseEnd));
            }
        }
        out.sort((a, b) -> Double.compare(a.inlandKm(), b.inlandKm()));
        return out;
    }

    private static DaySpec.Site site(String name, double km, double intervalMin, double first, double last, double dense,
                                     double denseStart, double denseEnd) {
        TreeSet<Long> secs = new TreeSet<>();
        for (double t = first; t <= last + 1e-9; t += intervalMin / 60.0) {
            secs.add(Math.round(t * 3600));
        }
        if (dense > 0 && dense < intervalMin) {
            for (double t = denseStart; t <= denseEnd + 1e-9; t += dense / 60.0) {
                secs.add(Math.round(t * 3600));
            }
        }
        double[] h = secs.stream().mapToDouble(s -> s / 3600.0).toArray();
        return new DaySpec.Site(name, km, intervalMin, h);
    }

    private void checkSitesInDomain(List<DaySpec.Site> sites, Scenario s) {
        double lastM = s.xGrid().lastM();
        for (DaySpec.Site site : sites) {
            if (site.inlandKm() * 1000.0 >= lastM) {
                throw err("sites", "site " + site.name() + " at " + fmt(site.inlandKm()) + " km lies outside 0.."
                        + String.format(Locale.ROOT, "%.1f", lastM / 1000.0) + " km, the end of the ensemble's domain;"
                        + " widen ensemble.grid (points x spacing_km) or check inland_km");
            }
        }
    }

    /** The inline sweep: the base scenario and the uncertain inputs (defaults spread around the day's values). */
    private SweepSpec ensemble(ObjectNode e, ObjectNode base, String date, double fromDeg, double speed, List<String> described) {
        int members = (int) number(e, "ensemble.members", 24, 1, 5000, "members", true);
        long seed = e.has("seed") ? (long) number(e, "ensemble.seed", 0, -9.0e15, 9.0e15, "(a whole number)", true)
                : Long.parseLong(date.replace("-", ""));
        Map<String, String> paths = new LinkedHashMap<>();
        Map<String, JsonNode> defaults = new LinkedHashMap<>();
        JsonNodeFactory f = JsonNodeFactory.instance;
        // Our default spreads (not a climatology): enough to cover the day's uncertain inputs.
        paths.put("ambient_from_deg", "ambient_wind.from_deg");
        defaults.put("ambient_from_deg", normal(f, fromDeg, 20, Double.NaN, Double.NaN));
        double sdSpeed = Math.max(0.75, 0.25 * speed);
        paths.put("ambient_speed_m_per_s", "ambient_wind.speed_m_per_s");
        defaults.put("ambient_speed_m_per_s", normal(f, speed, sdSpeed, 0, Math.min(40, speed + 3 * sdSpeed)));
        JsonNode heat = base.path("heating");
        boolean slab = heat.path("shape").asText("classic").equals("slab");
        if (slab && heat.has("peak_flux_difference_W_per_m2")) {
            double q = heat.get("peak_flux_difference_W_per_m2").asDouble();
            paths.put("heating_peak_flux_W_per_m2", "heating.peak_flux_difference_W_per_m2");
            defaults.put("heating_peak_flux_W_per_m2", normal(f, q, 0.25 * q, 0.4 * q, Math.min(1500, 1.6 * q)));
        } else if (!slab && heat.has("amplitude_K_per_h")) {
            double a = heat.get("amplitude_K_per_h").asDouble();
            paths.put("heating_amplitude_K_per_h", "heating.amplitude_K_per_h");
            defaults.put("heating_amplitude_K_per_h", normal(f, a, 0.25 * a, 0.4 * a, Math.min(50, 1.6 * a)));
        }
        if (base.path("atmosphere").has("buoyancy_frequency_per_s")) {
            double nn = base.path("atmosphere").get("buoyancy_frequency_per_s").asDouble();
            paths.put("buoyancy_frequency_per_s", "atmosphere.buoyancy_frequency_per_s");
            defaults.put("buoyancy_frequency_per_s", normal(f, nn, 0.2 * nn, 0.5 * nn, Math.min(0.05, 1.5 * nn)));
        }
        for (JsonNode seg : base.path("surface")) {
            if (seg.path("type").asText().equals("water") && seg.has("sst_K") && seg.has("name")) {
                double sst = seg.get("sst_K").asDouble();
                paths.put("sst_K", "surface[name=" + seg.get("name").asText() + "].sst_K");
                defaults.put("sst_K", normal(f, sst, 1.0, sst - 3, sst + 3));
                break;
            }
        }
        if (slab && heat.has("initial_depth_m")) {
            double h0 = heat.get("initial_depth_m").asDouble();
            paths.put("mixed_layer_start_depth_m", "heating.initial_depth_m");
            ObjectNode u = f.objectNode();
            u.putObject("uniform").put("from", Math.max(10, 0.5 * h0)).put("to", Math.min(3000, 3 * h0));
            defaults.put("mixed_layer_start_depth_m", u);
        }
        ObjectNode draws = f.objectNode();
        Map<String, String> back = new TreeMap<>();
        for (String name : UNCERTAIN) {
            JsonNode v = e.get(name);
            if (v != null && !paths.containsKey(name)) {
                throw err("ensemble." + name, "this coast's base scenario has no such input ("
                        + (name.startsWith("heating") || name.startsWith("mixed") ? "heating shape is "
                        + heat.path("shape").asText("classic") : "no water segment with sst_K") + "); remove it, or use one of "
                        + String.join(", ", paths.keySet()));
            }
            if (!paths.containsKey(name)) {
                continue;
            }
            if (v != null && v.isTextual() && v.asText().equals("fixed")) {
                described.add(name + ": fixed at the base value");
                continue;
            }
            if (v != null && !v.isObject()) {
                throw err("ensemble." + name, Shown.value(v) + " is not a distribution; give a distribution ({normal: {mean, sd, min, max}}, "
                        + "{uniform: {from, to}}, {choice: [...]}) or 'fixed'");
            }
            JsonNode d = v != null ? v : defaults.get(name);
            draws.set(paths.get(name), d);
            back.put(paths.get(name), name);
            described.add(name + " (" + paths.get(name) + "): " + compact(d) + (v == null ? " (default)" : ""));
        }
        JsonNode extra = e.get("draws");
        if (extra != null) {
            if (!extra.isObject()) {
                throw err("ensemble.draws", Shown.value(extra) + " is not a mapping; give scenario key paths with a distribution each");
            }
            for (Iterator<Map.Entry<String, JsonNode>> it = extra.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> x = it.next();
                if (draws.has(x.getKey())) {
                    throw err("ensemble.draws." + x.getKey(), "is already drawn as ensemble." + back.get(x.getKey())
                            + "; give each input once");
                }
                draws.set(x.getKey(), x.getValue());
                back.put(x.getKey(), "draws." + x.getKey());
                described.add(x.getKey() + ": " + compact(x.getValue()));
            }
        }
        if (draws.isEmpty()) {
            throw err("ensemble", "every uncertain input is fixed; leave at least one to be drawn (the envelope would have no spread)");
        }
        ObjectNode sweep = f.objectNode();
        sweep.put("name", "check-timing-" + date);
        sweep.put("description", "check-timing ensemble for " + date);
        sweep.set("base", base);
        ObjectNode en = sweep.putObject("ensemble");
        en.put("members", members);
        en.put("seed", seed);
        en.set("draws", draws);
        String prefix = "sweep file " + source + ": ";
        String located = "sweep file " + source + ":";
        try {
            return SweepFile.parse(source, sweep, folder, ScenarioMemberRunner.scenarioSource(), "check-timing-" + date);
        } catch (UserInputException ex) {
            String msg = ex.getMessage();
            if (msg.startsWith(prefix)) {
                msg = msg.substring(prefix.length());
                for (Map.Entry<String, String> b : back.entrySet()) {
                    String from = "ensemble.draws." + b.getKey();
                    if (msg.startsWith(from)) {
                        msg = "ensemble." + b.getValue() + msg.substring(from.length());
                        break;
                    }
                }
            }
            int colon = msg.indexOf(": ");
            String key = colon > 0 && !msg.startsWith(located) ? msg.substring(0, colon) : "ensemble";
            throw new UserInputException(doc.where(key) + ": " + msg, ex);
        }
    }

    private static ObjectNode normal(JsonNodeFactory f, double mean, double sd, double min, double max) {
        ObjectNode o = f.objectNode();
        ObjectNode n = o.putObject("normal");
        n.put("mean", round(mean));
        n.put("sd", round(sd));
        if (!Double.isNaN(min)) {
            n.put("min", round(min));
            n.put("max", round(max));
        }
        return o;
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }

    private static String compact(JsonNode d) {
        return d.toString().replace("\"", "");
    }

    private ObjectNode obj(JsonNode parent, String key) {
        JsonNode n = parent.get(key);
        if (n == null || n.isNull()) {
            return null;
        }
        if (!n.isObject()) {
            throw err(key, Shown.value(n) + " is not a mapping; give its keys as 'key: value' lines indented under " + key + ":");
        }
        return (ObjectNode) n;
    }

    private void onlyKeys(String where, JsonNode n, Set<String> allowed) {
        doc.onlyKeys(n, where, allowed);
    }

    private double number(JsonNode o, String key, double dflt, double lo, double hi, String unit, boolean integer) {
        return number(o, key, dflt, lo, hi, unit, integer, false);
    }

    /** The value at the last part of {@code key} in o; NaN default with {@code optional} means "may be absent". */
    private double number(JsonNode o, String key, double dflt, double lo, double hi, String unit, boolean integer, boolean optional) {
        String leaf = key.substring(key.lastIndexOf('.') + 1);
        JsonNode v = o.get(leaf);
        String range = InputDocument.range(lo, hi, unit, integer);
        if (v == null || v.isNull()) {
            if (Double.isNaN(dflt) && !optional) {
                throw err(key, "missing; give " + range);
            }
            return dflt;
        }
        if (!v.isNumber() || !Double.isFinite(v.asDouble())) {
            throw err(key, Shown.value(v) + " is not a number; give " + range);
        }
        double d = v.asDouble();
        if (integer && d != Math.rint(d)) {
            throw err(key, Shown.value(v) + " is not a whole number; give " + range);
        }
        if (!(d >= lo && d <= hi)) {
            throw err(key, Shown.value(v) + " is outside the allowed range; give " + range);
        }
        return d;
    }

    static String fmt(double d) {
        return d == Math.rint(d) && Math.abs(d) < 1e15 ? String.valueOf((long) d) : String.valueOf(d);
    }
}
