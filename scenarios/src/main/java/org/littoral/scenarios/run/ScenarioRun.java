package org.littoral.scenarios.run;

import org.littoral.model.front.FarFieldSolution;

import org.littoral.model.front.FieldSections;

import org.littoral.model.front.BreezeDiagnostics;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.model.coast.Coast;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;
import org.littoral.model.sounding.Profile;
import org.littoral.model.sounding.SoundingSampler;
import org.littoral.model.sounding.VirtualSite;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.analysis.ingest.ProfileColumns;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.netcdf.CfFile;
import org.littoral.scenarios.netcdf.FieldsNetcdf;
import org.littoral.scenarios.netcdf.SoundingsNetcdf;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.output.Csv;
import org.littoral.scenarios.scenario.Scenario;

/**
 * One {@code littoral run}: solve, sample soundings, compute the diagnostics, write the files. The
 * physics never writes files; this class does, each atomically.
 */
public final class ScenarioRun {
    public static final String CAUTION = "Idealised model output: not a forecast; never use it for aviation, marine or public-safety "
            + "decisions. Drone operations follow local aviation rules (altitude ceilings, airspace, storms); those rules win.";

    private final Scenario scenario;
    private final Solver solver;
    private final PrintStream progress;
    private boolean figures = true;
    private boolean checkMemory = true;
    private boolean fieldsNetcdf = false;
    private String command = "run";

    /** Everything a run produced, for callers and tests. */
    public record Outcome(BreezeSolution solution, List<Profile> profiles, FieldSections sections,
                          BreezeDiagnostics.Result diagnostics, BreezeDiagnostics.Circulation circulation, Snapshot peak,
                          ObjectNode summary, List<Path> files) {
    }

    /** @param progress where progress lines go, or null for silence */
    public ScenarioRun(Scenario scenario, Solver solver, PrintStream progress) {
        this.scenario = scenario;
        this.solver = solver;
        this.progress = progress;
    }

    /** Whether to draw the PNG figures (default true; sweeps switch them off for speed). Returns this. */
    public ScenarioRun figures(boolean draw) {
        this.figures = draw;
        return this;
    }

    /**
     * Whether to write {@code fields.nc}, the model fields on (time, z, x) at the output times (default false:
     * {@code littoral run} and sweeps with {@code --fields-nc} switch it on). Returns this.
     */
    public ScenarioRun fieldsNetcdf(boolean write) {
        this.fieldsNetcdf = write;
        return this;
    }

    /** The command line recorded in the netCDF files' history attribute (default "run"). Returns this. */
    public ScenarioRun command(String commandLine) {
        this.command = commandLine;
        return this;
    }

    /**
     * Whether to refuse, before solving, a run whose {@link WorkEstimate} does not fit in the free heap (default true;
     * a sweep checks all its members at once before any runs). Returns this.
     */
    public ScenarioRun checkMemory(boolean check) {
        this.checkMemory = check;
        return this;
    }

    private void say(String msg) {
        if (progress != null) {
            progress.println("littoral: " + msg);
        }
    }

    public Outcome run(Path outDir) throws IOException {
        long t0 = System.nanoTime();
        say("solving " + scenario.name() + " (" + scenario.kind().name().toLowerCase(Locale.ROOT) + ", "
                + scenario.xGrid().nx() + " x " + scenario.zGrid().size() + " points)");
        if (checkMemory) {
            WorkEstimate.of(scenario).check(1, scenario.source());
        }
        BreezeSolution sol;
        try {
            sol = solver.solve(scenario);
        } catch (UnstableRunException e) {
            throw keepPartial(e, outDir);
        } catch (IllegalArgumentException e) {
            // the linear model finds some singular combinations only while solving (a frequency equal to f)
            throw new UserInputException(scenario.source() + ": the model cannot solve this scenario: "
                    + org.littoral.scenarios.scenario.ModelLimits.inYamlTerms(e.getMessage()), e);
        }
        say(String.format(Locale.ROOT, "solved in %.2f s; sampling soundings", (System.nanoTime() - t0) / 1e9));
        Coast coast = scenario.coast();
        List<VirtualSite> sites = scenario.sites();
        // the linear model's solution is one periodic day
        boolean periodic = scenario.kind() == Scenario.Kind.LINEAR;
        List<Profile> profiles = new SoundingSampler(sol, coast, sites, scenario.flights().schedule(),
                scenario.flights().sounding(), periodic).sampleAll();
        double[] siteX = new double[sites.size()];
        List<String> names = new ArrayList<>();
        for (int s = 0; s < siteX.length; s++) {
            siteX[s] = sites.get(s).inlandDistanceM();
            names.add(sites.get(s).name());
        }
        Scenario.Output out = scenario.output();
        FieldSections fs = FieldSections.evaluate(sol, coast, out.clockHours(), out.nearSurfaceM(), siteX, periodic, null);
        // absurd or undefined results: everything is still written (nothing computed is lost), marked invalid, and the
        // run then stops with the reason
        ResultChecks.Finding check = ResultChecks.of(scenario, fs, profiles);
        BreezeDiagnostics.Result d = BreezeDiagnostics.compute(fs, names, siteX, out.onshoreThresholdMPerS());
        Snapshot peak = sol.snapshotAt(fs.modelSec[d.peakTimeIndex()]);
        BreezeDiagnostics.Circulation circ = sol instanceof FarFieldSolution far
                ? BreezeDiagnostics.circulation(peak, fs.xM, fs.zM, far.farFieldWind(peak)[0], d.peakClockH(),
                        d.peakXM(), out.nearSurfaceM())
                : BreezeDiagnostics.circulation(peak, fs.xM, fs.zM, sol.background(), d.peakClockH(), d.peakXM(), out.nearSurfaceM());

        List<Path> files = new ArrayList<>();
        Path soundings = outDir.resolve("soundings.csv");
        AtomicFile.write(soundings, soundingsCsv(profiles).getBytes(StandardCharsets.UTF_8));
        files.add(soundings);
        CfFile.Provenance prov = new CfFile.Provenance("littoral " + scenario.name() + ": " + scenario.description(), scenario.name(),
                sol.modelName(), scenario.inputs().toString(), coast, command);
        Path soundingsNc = outDir.resolve(SoundingsNetcdf.FILE_NAME);
        if (!profiles.isEmpty()) {
            java.util.Map<String, Double> inland = new java.util.HashMap<>();
            sites.forEach(site -> inland.put(site.name(), site.inlandDistanceM()));
            SoundingsNetcdf.write(soundingsNc, profiles, name -> inland.getOrDefault(name, Double.NaN),
                    scenario.flights().sounding().dayIndex(), prov);
            files.add(soundingsNc);
        }
        if (fieldsNetcdf) {
            say("writing " + FieldsNetcdf.FILE_NAME + " (" + fs.clockH.length + " times)");
            Path fieldsNc = outDir.resolve(FieldsNetcdf.FILE_NAME);
            FieldsNetcdf.write(fieldsNc, sol, scenario.surface(), fs.clockH, fs.modelSec, prov);
            files.add(fieldsNc);
        }
        Path section = outDir.resolve("near_surface_breeze.csv");
        AtomicFile.write(section, timeDistanceCsv(fs).getBytes(StandardCharsets.UTF_8));
        files.add(section);
        if (figures) {
            files.addAll(RunFigures.write(fs, d, names, siteX, scenario.name(), sol.modelName(), outDir));
        }
        say("wrote " + profiles.size() + " soundings");
        Path summaryPath = outDir.resolve("summary.json");
        files.add(summaryPath);
        ObjectNode summary = summary(sol, profiles, fs, d, circ, outDir, files);
        ObjectNode rc = summary.putObject("result_check");
        rc.put("valid", check.passed());
        rc.put("max_wind_m_per_s", round(check.maxWindMPerS(), 2));
        rc.put("bound_m_per_s", check.boundMPerS());
        if (!check.passed()) {
            rc.put("problem", check.problem());
        }
        ObjectMapper json = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        AtomicFile.write(summaryPath, json.writeValueAsBytes(summary));
        if (!check.passed()) {
            throw new UserInputException(scenario.source() + ": " + check.problem() + " (the outputs are in " + outDir
                    + ", marked invalid in summary.json)");
        }
        say(String.format(Locale.ROOT, "done in %.2f s: %s", (System.nanoTime() - t0) / 1e9, outDir));
        return new Outcome(sol, profiles, fs, d, circ, peak, summary, files);
    }

    /** Subfolder that receives what an unstable run computed before it stopped. */
    public static final String PARTIAL_DIR = "before-instability";

    /**
     * Writes what an unstable run stored before it blew up into {@link #PARTIAL_DIR} (so that a complete earlier
     * run in the output folder is not mixed with it): the flights that fit before the last snapshot, the
     * time-distance section up to it, the full last state, and a record of the blow-up. Returns the error to
     * raise, naming what was written.
     */
    private UserInputException keepPartial(UnstableRunException e, Path outDir) {
        FarFieldSolution part = e.partial();
        if (part == null) {
            return new UserInputException(e.getMessage() + "; it stopped before a second snapshot, so nothing of it was written "
                    + "and files already in the output folder are kept", e);
        }
        Path dir = outDir.resolve(PARTIAL_DIR);
        try {
            java.nio.file.Files.createDirectories(dir);
            Coast coast = scenario.coast();
            List<VirtualSite> sites = scenario.sites();
            List<Profile> profiles = new SoundingSampler(part, coast, sites, scenario.flights().schedule(),
                    scenario.flights().sounding(), false).sampleFlightsInsideSpan();
            double[] siteX = new double[sites.size()];
            for (int s = 0; s < siteX.length; s++) {
                siteX[s] = sites.get(s).inlandDistanceM();
            }
            Scenario.Output out = scenario.output();
            FieldSections fs = FieldSections.evaluate(part, coast, out.clockHours(), out.nearSurfaceM(), siteX, false, null);
            List<String> written = new ArrayList<>();
            AtomicFile.write(dir.resolve("soundings.csv"), soundingsCsv(profiles).getBytes(StandardCharsets.UTF_8));
            written.add("soundings.csv");
            AtomicFile.write(dir.resolve("near_surface_breeze.csv"), timeDistanceCsv(fs).getBytes(StandardCharsets.UTF_8));
            written.add("near_surface_breeze.csv");
            Snapshot last = part.snapshotAt(part.endSec());
            AtomicFile.write(dir.resolve("last_state.csv"), stateCsv(last, part.xM(), part.zM(), coast.clockHoursFromSolar(
                    last.timeSec() / 3600.0 - scenario.flights().sounding().dayIndex() * 24.0)).getBytes(StandardCharsets.UTF_8));
            written.add("last_state.csv");
            ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            ObjectNode rec = m.createObjectNode();
            rec.put("scenario", scenario.name());
            rec.put("source", scenario.source());
            rec.put("complete", false);
            rec.put("error", e.getMessage());
            org.littoral.model.nonlinear.ModelBlowUpException b = e.blowUp();
            rec.put("blow_up_solar_h", round(b.solarHours(), 4));
            rec.put("blow_up_time_local", clock(coast.clockHoursFromSolar(b.solarHours())));
            rec.put("blow_up_x_km", round(b.xKm(), 3));
            rec.put("blow_up_z_m", round(b.zM(), 1));
            rec.put("variable", b.variable());
            rec.put("value", b.value());
            rec.put("snapshots_kept", part.run().snapshotCount());
            double endClock = coast.clockHoursFromSolar(part.endSec() / 3600.0 - scenario.flights().sounding().dayIndex() * 24.0);
            rec.put("last_snapshot_time_local", clock(endClock));
            rec.put("flights_kept", profiles.size() / Math.max(1, sites.size()));
            rec.put("output_times_kept", fs.clockH.length);
            rec.put("caution", CAUTION);
            written.add("instability.json");
            ArrayNode f = rec.putArray("files");
            written.forEach(f::add);
            AtomicFile.write(dir.resolve("instability.json"), m.writeValueAsBytes(rec));
            return new UserInputException(e.getMessage() + "; what it computed up to " + clock(endClock) + " local ("
                    + part.run().snapshotCount() + " snapshots, " + profiles.size() / Math.max(1, sites.size()) + " flights) is in "
                    + dir + " (" + String.join(", ", written) + "); files already in the output folder are kept", e);
        } catch (IOException | RuntimeException w) {
            return new UserInputException(e.getMessage() + "; writing what it computed to " + dir + " failed too (" + w.getMessage()
                    + "); files already in the output folder are kept", e);
        }
    }

    /** Every cell of one stored state, long format: the fields just before an instability. */
    static String stateCsv(Snapshot s, double[] xM, double[] zM, double clockH) {
        StringBuilder sb = new StringBuilder(xM.length * zM.length * 70);
        sb.append("time_local_h,x_km,z_m,u_m_per_s,v_m_per_s,w_m_per_s,theta_k,mixing_ratio_g_per_kg\n");
        int nx = xM.length;
        for (int k = 0; k < zM.length; k++) {
            for (int i = 0; i < nx; i++) {
                int n = k * nx + i;
                sb.append(String.format(Locale.ROOT, "%.4f,%.3f,%.1f,%.4f,%.4f,%.5f,%.4f,%.4f%n", clockH, xM[i] / 1000.0, zM[k],
                        s.uMPerS()[n], s.vMPerS()[n], s.wMPerS()[n], s.thetaK()[n], s.mixingRatioKgPerKg()[n] * 1000.0));
            }
        }
        return sb.toString().replace("NaN", "");
    }

    /** Local clock time as HH:MM, with "+1d" for times on the next day. */
    public static String clock(double hours) {
        if (Double.isNaN(hours)) {
            return null;
        }
        long minutes = Math.round(hours * 60.0);
        long day = Math.floorDiv(minutes, 1440);
        long m = Math.floorMod(minutes, 1440);
        return String.format(Locale.ROOT, "%02d:%02d", m / 60, m % 60) + (day == 0 ? "" : (day > 0 ? " +" : " ") + day + "d");
    }

    /** Tidy binned profiles, one row per bin; the column set of the analysis chain's binned profile CSV. */
    static String soundingsCsv(List<Profile> profiles) {
        StringBuilder sb = new StringBuilder(profiles.size() * 120 * 110);
        sb.append(ProfileColumns.binnedHeader()).append('\n');
        for (Profile p : profiles) {
            for (int k = 0; k < p.size(); k++) {
                sb.append(Csv.field(p.day())).append(',').append(Csv.field(p.site())).append(',');
                sb.append(String.format(Locale.ROOT, "%.4f,%.1f,%.2f,%.3f,%.2f,%.3f,%.3f,%.2f,%.1f,%.3f,%.3f,%.3f%n",
                        p.timeHours(), p.heightM()[k], p.pressurePa()[k] / 100.0, p.temperatureK()[k] - Thermo.T0,
                        p.relativeHumidity()[k] * 100.0, p.mixingRatioKgPerKg()[k] * 1000.0, p.dewpointK()[k] - Thermo.T0,
                        p.windSpeed(k), p.windDirectionDeg(k), p.thetaK()[k], p.thetaVK()[k], p.thetaEK()[k]));
            }
        }
        return sb.toString().replace("NaN", "");
    }

    /** The time-distance section behind the figure, long format. */
    static String timeDistanceCsv(FieldSections fs) {
        StringBuilder sb = new StringBuilder();
        sb.append("time_local_h,x_km,breeze_u_m_per_s,total_u_m_per_s\n");
        double[] range = RunFigures.plotRangeM(fs);
        for (int n = 0; n < fs.clockH.length; n++) {
            for (int i = 0; i < fs.xM.length; i++) {
                if (fs.xM[i] < range[0] || fs.xM[i] > range[1]) {
                    continue;
                }
                sb.append(String.format(Locale.ROOT, "%.4f,%.3f,%.4f,%.4f%n", fs.clockH[n], fs.xM[i] / 1000.0, fs.nearSurfaceU[n][i],
                        fs.nearSurfaceTotalU[n][i]));
            }
        }
        return sb.toString();
    }

    private ObjectNode summary(BreezeSolution sol, List<Profile> profiles, FieldSections fs, BreezeDiagnostics.Result d,
                               BreezeDiagnostics.Circulation c, Path outDir, List<Path> files) {
        ObjectMapper m = new ObjectMapper();
        ObjectNode root = m.createObjectNode();
        root.put("scenario", scenario.name());
        root.put("description", scenario.description());
        root.put("source", scenario.source());
        root.put("model", sol.modelName());
        root.put("caution", CAUTION);
        root.put("clock", "local clock time, UTC" + String.format(Locale.ROOT, "%+.1f", scenario.coast().utcOffsetHours())
                + " h; clock minus solar time " + String.format(Locale.ROOT, "%.2f", scenario.coast().clockHoursFromSolar(12) - 12) + " h");
        root.set("inputs", scenario.inputs());
        ObjectNode derived = root.putObject("derived");
        derived.put("coriolis_per_s", scenario.coast().coriolisPerS());
        derived.put("diurnal_frequency_per_s", 2 * Math.PI / 86400.0);
        derived.put("domain_from_km", scenario.xGrid().xM(0) / 1000.0);
        derived.put("domain_to_km", scenario.xGrid().lastM() / 1000.0);
        derived.put("ambient_cross_shore_m_per_s", scenario.ambientWind().crossShoreMPerS());
        derived.put("ambient_alongshore_m_per_s", scenario.ambientWind().alongshoreMPerS());
        derived.put("profiles", profiles.size());

        ObjectNode dg = root.putObject("diagnostics");
        dg.put("definitions", "breeze wind = model wind minus " + (sol instanceof FarFieldSolution ? "the far-field reference wind"
                : "the ambient wind") + ", cross-shore, onshore positive; " + d.track().definitions()
                + "; definitions in docs/fronts.md; times are local clock");
        dg.put("arrival_kind", d.track().fronts() ? "front passage" : "onset of onshore flow (linear theory has no front)");
        ObjectNode zone = dg.putObject("searched_zone");
        zone.put("from_km", round(fs.zone.fromM() / 1000.0, 3));
        zone.put("to_km", round(fs.zone.toM() / 1000.0, 3));
        zone.put("beyond_seaward_end", fs.zone.seawardLimit());
        zone.put("beyond_landward_end", fs.zone.landwardLimit());
        ObjectNode pk = dg.putObject("peak_onshore_wind");
        pk.put("breeze_m_per_s", round(d.peakBreezeMPerS(), 3));
        pk.put("total_cross_shore_m_per_s", round(d.peakTotalMPerS(), 3));
        pk.put("time_local", clock(d.peakClockH()));
        pk.put("time_local_h", round(d.peakClockH(), 4));
        pk.put("x_km", round(d.peakXM() / 1000.0, 3));
        if (d.peak().atSearchLimit()) {
            pk.put("at_search_limit", true);
            pk.put("text", String.format(Locale.ROOT, "at least %.1f m/s at the edge of the search, %.0f km (limit of the search: %s)",
                    d.peakBreezeMPerS(), d.peakXM() / 1000.0, d.peak().limit()));
        }
        ObjectNode on = dg.putObject("onshore_flow_onset_at_coast");
        putArrival(on, d.onset(), d.track().fronts());
        ObjectNode ci = dg.putObject("circulation_at_peak");
        ci.put("time_local", clock(c.clockH()));
        ci.put("x_km", round(c.xM() / 1000.0, 3));
        putNumber(ci, "onshore_layer_depth_m", c.onshoreLayerDepthM(), 1);
        putNumber(ci, "circulation_depth_m", c.circulationDepthM(), 1);
        putNumber(ci, "return_flow_m_per_s", c.returnFlowMPerS(), 3);
        putNumber(ci, "return_flow_height_m", c.returnFlowHeightM(), 1);
        ObjectNode pen = dg.putObject("max_inland_penetration");
        org.littoral.model.front.Extent penetration = d.penetration();
        if (!penetration.exists()) {
            pen.putNull("km");
            pen.putNull("time_local");
            pen.putNull("time_local_h");
            pen.put("note", penetration.note());
        } else if (penetration.atSearchLimit()) {
            pen.putNull("km");
            pen.put("at_least_km", round(penetration.value() / 1000.0, 1));
            putTime(pen, penetration.timeH());
            pen.put("text", String.format(Locale.ROOT, "at least %.0f km (limit of the search: %s)", penetration.value() / 1000.0, penetration.limit()));
        } else {
            pen.put("km", round(penetration.value() / 1000.0, 3));
            putTime(pen, penetration.timeH());
        }
        if (sol instanceof FarFieldSolution far) {
            double[] band = far.referenceBandM();
            zone.put("reference_band_from_km", round(band[0] / 1000.0, 3));
            zone.put("reference_band_to_km", round(band[1] / 1000.0, 3));
            zone.put("note", "peak, penetration and fronts are searched here, clear of the far-field sponges and seaward of "
                    + "the reference band; the breeze wind is the run minus its far-field reference (the run's median wind over the "
                    + "reference band at each time and height, so it has the same drag, turning and diurnal cycle; valid while the "
                    + "front has not reached the band)");
        }
        ArrayNode sites = dg.putArray("sites");
        for (BreezeDiagnostics.SiteTiming s : d.sites()) {
            ObjectNode o = sites.addObject();
            o.put("name", s.name());
            o.put("inland_km", s.xM() / 1000.0);
            ObjectNode a = o.putObject("onshore_arrival");
            putArrival(a, s.arrival(), d.track().fronts());
            o.put("peak_breeze_m_per_s", round(s.peakBreezeMPerS(), 3));
            o.put("peak_time_local", clock(s.peakClockH()));
        }
        ArrayNode speeds = dg.putArray("implied_speeds_between_sites");
        for (BreezeDiagnostics.SpeedBetween s : d.speeds()) {
            ObjectNode o = speeds.addObject();
            o.put("from", s.from());
            o.put("to", s.to());
            if (s.speed().resolved()) {
                o.put("speed_m_per_s", round(s.speed().mPerS(), 3));
            } else {
                o.putNull("speed_m_per_s");
                o.put("note", s.speed().note());
            }
        }
        if (!fs.dropped.isEmpty()) {
            root.put("note", fs.dropped.size() + " output times lie outside the solution's span and were skipped");
        }
        ArrayNode f = root.putArray("files");
        for (Path p : files) {
            f.add(outDir.relativize(p).toString());
        }
        return root;
    }

    private static void putArrival(ObjectNode o, org.littoral.model.front.Arrival a, boolean fronts) {
        putTime(o, a.timeH());
        o.put("kind", fronts ? "front passage" : "onset of onshore flow");
        if (a.exists()) {
            o.put("uncertainty_min", round(a.uncertaintyH() * 60.0, 1));
        } else {
            o.put("note", a.note());
        }
    }

    private static void putTime(ObjectNode o, Double h) {
        if (h == null) {
            o.putNull("time_local");
            o.putNull("time_local_h");
        } else {
            o.put("time_local", clock(h));
            o.put("time_local_h", round(h, 4));
        }
    }

    private static void putNumber(ObjectNode o, String key, double v, int digits) {
        if (Double.isNaN(v)) {
            o.putNull(key);
        } else {
            o.put(key, round(v, digits));
        }
    }

    static double round(double v, int digits) {
        double f = Math.pow(10, digits);
        return Math.round(v * f) / f;
    }
}
