package org.littoral.scenarios.observe;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
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

/**
 * Ingesting observed profiles as a plain Java call: a file or every CSV/netCDF file in a folder, through the column
 * map, binning and quality control. {@link ObserveCommand} is its command line; compare, {@code littoral demo}, the
 * validation suite and the input fuzzing call it directly.
 */
public final class ObserveIngest {
    private ObserveIngest() {
    }

    /** Profiles and QC log from a file or every CSV in a folder, with per-day attribute columns merged into the settings. */
    public record Observed(List<Profile> profiles, QcLog qc) {
    }

    /** The campaign's local clock: the column map's zone, else the coast's UTC offset. */
    public static java.time.ZoneId localZone(ColumnMap map, Coast coast) {
        if (map != null) {
            return map.localZone;
        }
        return java.time.ZoneOffset.ofTotalSeconds((int) Math.round(coast.utcOffsetHours() * 3600.0));
    }

    public static Observed ingest(Path obs, AnalysisSettings settings) throws IOException {
        return ingest(obs, settings, null);
    }

    static boolean isNetcdf(Path p) {
        String n = p.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        return n.endsWith(".nc") || n.endsWith(".nc4") || n.endsWith(".cdf");
    }

    /** Profiles from a file or folder; a column map (may be null) applies to every text file and names netCDF variables. */
    public static Observed ingest(Path obs, AnalysisSettings settings, ColumnMap map) throws IOException {
        List<Path> files = new ArrayList<>();
        if (Files.isDirectory(obs)) {
            try (Stream<Path> s = Files.list(obs)) {
                s.filter(p -> {
                    String n = p.getFileName().toString();
                    return n.endsWith(".csv") || n.endsWith(".csv.gz") || isNetcdf(p)
                            || map != null && (n.endsWith(".txt") || n.endsWith(".tsv"));
                }).sorted().forEach(files::add);
            }
            if (files.isEmpty()) {
                throw new UserInputException("observations folder " + obs + " holds no *.csv, *.csv.gz or *.nc files; give a profile "
                        + "file or a folder of them");
            }
        } else if (Files.isRegularFile(obs)) {
            files.add(obs);
        } else {
            throw new UserInputException("observations " + obs + " do not exist; give a profile CSV or a folder of them");
        }
        ProfileCsvReader reader = new ProfileCsvReader(settings.ingest);
        List<Profile> profiles = new ArrayList<>();
        QcLog qc = new QcLog();
        for (Path f : files) {
            java.time.ZoneId zone = settings.localZone != null ? settings.localZone : java.time.ZoneOffset.UTC;
            IngestResult ir = isNetcdf(f) ? reader.read(NetcdfProfileFile.read(f, map, zone))
                    : map != null ? reader.read(MappedProfileFile.read(f, map)) : reader.read(f);
            profiles.addAll(ir.profiles());
            qc.addAll(ir.qc());
            for (Map.Entry<String, Map<String, String>> e : ir.dayAttributes().entrySet()) {
                settings.dayAttributes.merge(e.getKey(), e.getValue(), (a, b) -> {
                    a.putAll(b);
                    return a;
                });
            }
        }
        if (profiles.isEmpty()) {
            throw new UserInputException("no profiles left in " + obs + " after QC; check the QC log (qc-log.csv) for why each value was removed and fix the file or its units");
        }
        return new Observed(profiles, qc);
    }

    static void write(Path p, String text) throws IOException {
        org.littoral.scenarios.output.AtomicFile.write(p, text.getBytes(StandardCharsets.UTF_8));
    }
}
