package org.littoral.scenarios.observe;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.ingest.ColumnMap;
import org.littoral.scenarios.analysis.ingest.DayTableReader;
import org.littoral.scenarios.analysis.ingest.MappedProfileFile;
import org.littoral.scenarios.analysis.ingest.NetcdfProfileFile;
import org.littoral.scenarios.analysis.ingest.IngestResult;
import org.littoral.scenarios.analysis.ingest.ProfileCsvReader;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code littoral observe OBS --coast COAST --out DIR}: the analysis chain on observed profiles. */
@Command(name = "observe", description = {"Analyse observed profiles: ingest and QC, passage detection, response metrics, "
        + "composites and group statistics; tables (CSV/JSON), figures and a self-contained report.html.",
        "OBS is a tidy profile CSV, a netCDF profile file (one flight, or a CF profile collection), or a folder of them "
                + "(docs/analysis.md). Your own column names, units, delimiter and time zone: --columns MAP.yaml. "
                + "The same chain analyses the model's synthetic soundings."})
public final class ObserveCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "OBS", description = "Profile CSV or netCDF file, or a folder of *.csv, *.csv.gz and *.nc files.")
    Path obs;

    @Option(names = "--columns", paramLabel = "MAP.yaml",
            description = "Column map: your column names and units, delimiter, timestamp form, local time zone, site (docs/analysis.md section 1b).")
    Path columns;

    @Option(names = "--coast", required = true, paramLabel = "COAST",
            description = "Coast file (latitude_deg, bearing_land_to_sea_deg, ...), a scenario file, or a built-in scenario name.")
    String coastRef;

    @Option(names = "--settings", paramLabel = "FILE",
            description = "Analysis settings (YAML; names and defaults in docs/analysis.md); the resolved settings go to analysis.json.")
    Path settingsFile;

    @Option(names = "--descent", description = "Use the descending part of raw flights too, as profiles of their own (default: ascent only).")
    boolean descent;

    @Option(names = "--days", paramLabel = "DAYS.csv", description = "Per-day attribute table (day[, site], breeze_type, convection, tags, ...).")
    Path days;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: ${DEFAULT-VALUE}).", defaultValue = "out/observe")
    Path out;

    @Option(names = "--overwrite", description = "Replace the outputs of an earlier run in the output folder.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        Coast coast = CoastFile.load(coastRef);
        AnalysisSettings settings = new AnalysisSettings();
        if (settingsFile != null) {
            org.littoral.scenarios.analysis.SettingsFile.apply(settingsFile, settings);
        }
        ColumnMap map = columns == null ? null : ColumnMap.load(columns);
        settings.localZone = ObserveIngest.localZone(map, coast);
        settings.ingest.useDescent = settings.ingest.useDescent || descent;
        settings.siteInlandM.putAll(org.littoral.scenarios.compare.ObservedSites.inlandM(coastRef));
        ObserveIngest.Observed o = ObserveIngest.ingest(obs, settings, map);
        if (days != null) {
            settings.dayAttributes.putAll(DayTableReader.read(days));
        }
        OutputFolder folder = OutputFolder.prepare(out, "observe " + obs, overwrite ? OutputFolder.Mode.OVERWRITE
                : OutputFolder.Mode.FRESH, false, System.err);
        o.qc().writeCsv(out.resolve("qc-log.csv"));
        for (String w : o.qc().warnings()) {
            System.err.println("littoral: QC warning: " + w);
        }
        AnalysisResult r = AnalysisChain.run(o.profiles(), coast, settings);
        for (String w : org.littoral.scenarios.analysis.ConventionCheck.warnings(r, coast, settings)) {
            System.err.println("littoral: WARNING: " + w);
        }
        List<Path> files = AnalysisOutputs.write(out, r, o.qc(), "observed profiles " + obs, coast, o.profiles(), settings);
        folder.finish();
        System.out.println("littoral: analysed " + o.profiles().size() + " profiles in " + r.siteDays().size() + " site-days; "
                + r.passages().size() + " passages; wrote " + files.size() + " files to " + out + " (open report.html)");
        return 0;
    }

}
