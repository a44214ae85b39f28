package org.littoral.scenarios.netcdf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;
import ucar.nc2.NetcdfFile;
import ucar.nc2.Variable;
import ucar.units.Unit;
import ucar.units.UnitFormat;
import ucar.units.UnitFormatManager;

/**
 * fields.nc and soundings.nc of a run, read by outside tools: Debian's netcdf-bin ({@code ncdump}, the netCDF C
 * library's dump) and python3-xarray (CF decoding of time, fill values and units), both installed by .ci/run.
 * The run is the built-in nl-offshore-2ms on a coarse grid (same code path as the full run, a few seconds).
 */
class NetcdfOutputTest {
    @TempDir
    static Path dir;
    static Scenario scenario;
    static ScenarioRun.Outcome out;
    static JsonNode xr;

    /** Reads both files with xarray and reports what it decoded, as JSON. */
    private static final String XARRAY_SCRIPT = """
            import csv, json, sys
            import numpy as np
            import xarray as xr
            d = sys.argv[1]
            f = xr.open_dataset(d + "/fields.nc")
            s = xr.open_dataset(d + "/soundings.nc")
            out = {}
            out["fields_time_dtype"] = str(f.time.dtype)
            out["fields_time0"] = str(f.time.values[0])[:19]
            out["fields_dims"] = {k: int(v) for k, v in f.sizes.items()}
            out["fields_units"] = {v: f[v].attrs.get("units") for v in ["u", "v", "w", "theta", "mixing_ratio", "pressure_perturbation", "z", "x"]}
            out["fields_conventions"] = f.attrs["Conventions"]
            rows = list(csv.DictReader(open(d + "/near_surface_breeze.csv")))
            # the near-surface section lies below the first model level here, so it is the first level's wind
            worst = 0.0
            t0 = float(rows[0]["time_local_h"])
            for r in rows[::37]:
                n = int(round((float(r["time_local_h"]) - t0) * 4))
                i = int(np.argmin(np.abs(f.x.values / 1000.0 - float(r["x_km"]))))
                worst = max(worst, abs(float(f.u.values[n, 0, i]) - float(r["total_u_m_per_s"])))
            out["fields_u_vs_csv_max_abs"] = worst
            out["soundings_feature_type"] = s.attrs["featureType"]
            out["soundings_time_dtype"] = str(s.time.dtype)
            out["soundings_time0"] = str(s.time.values[0])[:19]
            out["soundings_units"] = {v: s[v].attrs.get("units") for v in ["temperature", "pressure", "mixing_ratio", "relative_humidity", "theta_e", "z"]}
            rows = list(csv.DictReader(open(d + "/soundings.csv")))
            nz = s.sizes["z"]
            worst_t = 0.0
            worst_p = 0.0
            worst_r = 0.0
            for j in range(0, len(rows), 97):
                p, k = divmod(j, nz)
                worst_t = max(worst_t, abs(float(s.temperature.values[p, k]) - 273.15 - float(rows[j]["temperature_C"])))
                worst_p = max(worst_p, abs(float(s.pressure.values[p, k]) / 100.0 - float(rows[j]["pressure_hPa"])))
                worst_r = max(worst_r, abs(float(s.mixing_ratio.values[p, k]) * 1000.0 - float(rows[j]["mixing_ratio_g_per_kg"])))
            out["soundings_rows"] = len(rows)
            out["soundings_values"] = int(s.sizes["profile"]) * nz
            out["soundings_t_vs_csv_max_abs"] = worst_t
            out["soundings_p_vs_csv_max_abs"] = worst_p
            out["soundings_r_vs_csv_max_abs"] = worst_r
            out["soundings_site0"] = s.site.values[0].decode()
            print(json.dumps(out))
            """;

    @BeforeAll
    static void runCoarseAndReadWithXarray() throws Exception {
        String yaml = BuiltinScenarios.text("nl-offshore-2ms").replace("points: 400", "points: 200").replace("spacing_km: 1", "spacing_km: 2")
                .replace("levels: 65", "levels: 25").replace("first_level_spacing_m: 20", "first_level_spacing_m: 40")
                .replace("  end_h: 24", "  end_h: 12");
        scenario = ScenarioFile.parse("coarse-nl-offshore-2ms", yaml, false);
        out = new ScenarioRun(scenario, Solver.standard(), null).figures(false).fieldsNetcdf(true).run(dir);
        Path script = dir.resolve("read.py");
        Files.writeString(script, XARRAY_SCRIPT);
        String text = runTool("python3-xarray", "/usr/bin/python3", script.toString(), dir.toString());
        xr = new ObjectMapper().readTree(text.strip().lines().reduce((a, b) -> b).orElse("{}"));
    }

    /** Runs an outside tool; a missing tool fails the test with the package to install. */
    static String runTool(String debianPackage, String... cmd) throws IOException, InterruptedException {
        Process p;
        try {
            p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        } catch (IOException e) {
            fail(cmd[0] + " not found: apt-get install -y " + debianPackage + " (.ci/run does)");
            return "";
        }
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), String.join(" ", cmd) + " did not finish");
        assertEquals(0, p.exitValue(), String.join(" ", cmd) + " failed (is " + debianPackage + " installed?): " + text);
        return text;
    }

    @Test
    void ncdumpReadsBothFilesAsNetcdf3With64BitOffsets() throws Exception {
        for (String f : new String[] {"fields.nc", "soundings.nc"}) {
            String kind = runTool("netcdf-bin", "ncdump", "-k", dir.resolve(f).toString()).strip();
            assertEquals("64-bit offset", kind, f);
            String header = runTool("netcdf-bin", "ncdump", "-h", dir.resolve(f).toString());
            assertTrue(header.contains(":Conventions = \"CF-1.8\""), header);
            assertTrue(header.contains("time:units = \"seconds since 2001-07-21 00:00:00\""), header);
        }
    }

    @Test
    void ncdumpShowsTheFieldVariablesOnTimeHeightAndDistance() throws Exception {
        String header = runTool("netcdf-bin", "ncdump", "-h", dir.resolve("fields.nc").toString());
        for (String v : new String[] {"u", "v", "w", "theta", "mixing_ratio", "pressure_perturbation"}) {
            assertTrue(header.contains("float " + v + "(time, z, x) ;"), v + " in\n" + header);
        }
        assertTrue(header.contains("u:standard_name = \"x_wind\""), header);
        assertTrue(header.contains(":scenario_name = \"nl-offshore-2ms\""), header);
    }

    @Test
    void xarrayDecodesTheFieldTimesToUtcDatetimes() {
        assertEquals("datetime64[ns]", xr.get("fields_time_dtype").asText());
        // first output time 06:00 local on day 202 (21 July of a common year), clock UTC-3 h: 09:00 UTC
        assertEquals("2001-07-21T09:00:00", xr.get("fields_time0").asText());
        assertEquals(out.sections().clockH.length, xr.get("fields_dims").get("time").asInt());
        assertEquals(scenario.xGrid().nx(), xr.get("fields_dims").get("x").asInt());
    }

    @Test
    void xarraySeesSiUnitsOnEveryFieldVariable() {
        JsonNode u = xr.get("fields_units");
        assertEquals("m s-1", u.get("u").asText());
        assertEquals("m s-1", u.get("w").asText());
        assertEquals("K", u.get("theta").asText());
        assertEquals("kg kg-1", u.get("mixing_ratio").asText());
        assertEquals("Pa", u.get("pressure_perturbation").asText());
        assertEquals("m", u.get("z").asText());
        assertEquals("CF-1.8", xr.get("fields_conventions").asText());
    }

    @Test
    void theFieldsNearTheSurfaceEqualTheSectionCsv() {
        // float32 in the file, 4 decimals in the CSV
        assertTrue(xr.get("fields_u_vs_csv_max_abs").asDouble() < 1e-4, xr.toString());
    }

    @Test
    void xarrayReadsTheSoundingsAsAProfileCollectionWithUtcLaunchTimes() {
        assertEquals("profile", xr.get("soundings_feature_type").asText());
        assertEquals("datetime64[ns]", xr.get("soundings_time_dtype").asText());
        // first flight 07:00 local = 10:00 UTC
        assertEquals("2001-07-21T10:00:00", xr.get("soundings_time0").asText());
        assertEquals("shore-3km", xr.get("soundings_site0").asText());
        assertEquals(xr.get("soundings_rows").asInt(), xr.get("soundings_values").asInt());
    }

    @Test
    void soundingValuesEqualTheCsvAfterUnitConversion() {
        JsonNode u = xr.get("soundings_units");
        assertEquals("K", u.get("temperature").asText());
        assertEquals("Pa", u.get("pressure").asText());
        assertEquals("kg kg-1", u.get("mixing_ratio").asText());
        assertEquals("1", u.get("relative_humidity").asText());
        // CSV: deg C to 3 decimals, hPa to 2, g/kg to 3; file: float32 of the SI value
        assertTrue(xr.get("soundings_t_vs_csv_max_abs").asDouble() < 1e-3, xr.toString());
        assertTrue(xr.get("soundings_p_vs_csv_max_abs").asDouble() < 1e-2, xr.toString());
        assertTrue(xr.get("soundings_r_vs_csv_max_abs").asDouble() < 1e-3, xr.toString());
    }

    @Test
    void everyUnitsAttributeParsesWithUdunitsAndIsTheExpectedSiUnit() throws Exception {
        // udunits-2 grammar as implemented by netCDF-Java's ucar.units (the CF conventions' unit library)
        UnitFormat fmt = UnitFormatManager.instance();
        List<String> bad = new ArrayList<>();
        for (String f : new String[] {"fields.nc", "soundings.nc"}) {
            try (NetcdfFile nc = NetcdfFile.open(dir.resolve(f).toString())) {
                for (Variable v : nc.getVariables()) {
                    String units = v.getUnitsString();
                    if (units == null) {
                        continue;
                    }
                    Unit parsed = fmt.parse(units);
                    String expect = expectedSi(v.getShortName());
                    if (expect != null && !parsed.isCompatible(fmt.parse(expect))) {
                        bad.add(f + ":" + v.getShortName() + " [" + units + "] not " + expect);
                    }
                }
            }
        }
        assertTrue(bad.isEmpty(), bad.toString());
    }

    private static String expectedSi(String name) {
        return switch (name) {
            case "u", "v", "w", "wind_east", "wind_north", "wind_speed" -> "m/s";
            case "theta", "theta_v", "theta_e", "temperature", "dewpoint" -> "K";
            case "pressure", "pressure_perturbation" -> "Pa";
            case "z", "x", "inland_distance" -> "m";
            case "time" -> "s since 1970-01-01";
            default -> null;
        };
    }
}
