package org.littoral.scenarios.bench;

import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.ingest.AscentBinner;
import org.littoral.scenarios.analysis.ingest.IngestSettings;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.analysis.ingest.RawFlight;

/**
 * {@code littoral bench analysis}: 100 invented site-days of raw 10 Hz ascents (flights every 30 min
 * 08-18 h to 600 m, with descents; generated in memory with a seed by {@link SyntheticAscents}) put
 * through the whole chain on one thread: ascent extraction, sensor averaging, 5 m binning, derived
 * thermodynamics, both detectors, labelling, response metrics, composites and group comparisons.
 * Generation time is measured apart and not counted. Target: under 10 s, peak heap under 1 GB.
 */
public final class AnalysisBenchmark implements Benchmark {
    static final double TARGET_S = 10.0;
    static final double TARGET_MB = 1024.0;

    @Override
    public String name() {
        return "analysis";
    }

    @Override
    public String description() {
        return "Analyse 100 site-days of raw 10 Hz ascents end to end (target < 10 s on one core, < 1 GB)";
    }

    @Override
    public int run(PrintStream out, boolean quick) {
        int reps = quick ? 1 : 3;
        int days = 100;
        Coast coast = new Coast(40, -74, -5, 90, 180);
        double[] times = new double[reps];
        double[] bins = new double[reps];
        long samples = 0;
        int passages = 0;
        int profiles = 0;
        double genS = 0;
        java.util.Map<String, double[]> truth = new java.util.HashMap<>();
        AnalysisResult last = null;
        HeapPeaks.reset(true);
        for (int rep = 0; rep < reps; rep++) {
            Random r = new Random(4242);
            List<Profile> all = new ArrayList<>();
            long binNs = 0;
            long genNs = 0;
            samples = 0;
            QcLog log = new QcLog();
            IngestSettings is = new IngestSettings();
            for (int d = 0; d < days; d++) {
                double dir = 360 * r.nextDouble();
                double[] amb = Coast.eastNorthFromDirection(1 + 6 * r.nextDouble(), dir);
                double front = r.nextDouble() < 0.8 ? 11 + 4 * r.nextDouble() : Double.NaN;
                double bay = !Double.isNaN(front) && r.nextDouble() < 0.3 ? front - 1.5 - r.nextDouble() : Double.NaN;
                SyntheticAscents.DaySpec spec = SyntheticAscents.DaySpec.typical("S" + (d % 2), "2024-06-" + String.format(Locale.ROOT,
                        "%02d", 1 + d / 2 % 30) + (d >= 60 ? "b" : ""), coast, amb, front, bay, r.nextLong());
                truth.put(spec.day() + "/" + spec.site(), Double.isNaN(front) ? new double[0]
                        : Double.isNaN(bay) ? new double[] {front} : new double[] {bay, front});
                long g0 = System.nanoTime();
                List<RawFlight> flights = SyntheticAscents.day(spec);
                long g1 = System.nanoTime();
                genNs += g1 - g0;
                for (RawFlight f : flights) {
                    samples += f.size();
                    Profile p = AscentBinner.bin(f, is, log);
                    if (p != null) {
                        all.add(p);
                    }
                }
                binNs += System.nanoTime() - g1;
            }
            long a0 = System.nanoTime();
            AnalysisResult res = AnalysisChain.run(all, coast, new AnalysisSettings());
            long a1 = System.nanoTime();
            times[rep] = (binNs + (a1 - a0)) / 1e9;
            bins[rep] = binNs / 1e9;
            genS = genNs / 1e9;
            passages = res.passages().size();
            profiles = all.size();
            last = res;
        }
        double peakMb = HeapPeaks.peakMb();
        double[] sorted = times.clone();
        Arrays.sort(sorted);
        double median = sorted[reps / 2];
        out.printf(Locale.ROOT, "analysis: %d site-days, %d raw samples (10 Hz), %d binned profiles, %d passages%n", days, samples,
                profiles, passages);
        out.printf(Locale.ROOT, "  end-to-end (bin + derive + detect + metrics + composites + stats): median %.2f s over %d run(s), "
                + "min %.2f, max %.2f%n", median, reps, sorted[0], sorted[reps - 1]);
        out.printf(Locale.ROOT, "  of which binning and derivation: %.2f s (last run); throughput %.1f M samples/s%n", bins[reps - 1],
                samples / 1e6 / median);
        out.printf(Locale.ROOT, "  generation of the invented flights (not counted): %.2f s%n", genS);
        out.printf(Locale.ROOT, "  peak heap: %.0f MB (target %.0f MB); single thread%n", peakMb, TARGET_MB);
        score(out, last, truth, coast);
        boolean ok = median < TARGET_S && peakMb < TARGET_MB;
        out.printf(Locale.ROOT, "  target < %.0f s and < %.0f MB: %s%n", TARGET_S, TARGET_MB, ok ? "met" : "NOT met");
        return ok ? 0 : 1;
    }

    /** Skill on the invented days (known passage times), per detector and combined; not timed. */
    private static void score(PrintStream out, AnalysisResult res, java.util.Map<String, double[]> truth, Coast coast) {
        AnalysisSettings s = new AnalysisSettings();
        List<org.littoral.scenarios.analysis.detect.PassageDetector> dets =
                org.littoral.scenarios.analysis.detect.PassageFinder.detectors(s.detection);
        org.littoral.scenarios.analysis.detect.DetectionScore[] per =
                new org.littoral.scenarios.analysis.detect.DetectionScore[dets.size() + 1];
        Arrays.fill(per, new org.littoral.scenarios.analysis.detect.DetectionScore(0, 0, 0, 0));
        for (org.littoral.scenarios.analysis.SiteDayResult r : res.siteDays()) {
            double[] tr = truth.get(r.siteDay().key());
            double[] t = r.siteDay().timeHours();
            for (int k = 0; k < dets.size(); k++) {
                double[] found = dets.get(k).detect(r.siteDay(), coast).stream()
                        .mapToDouble(org.littoral.scenarios.analysis.detect.ChangeCandidate::timeHours).toArray();
                per[k] = per[k].plus(org.littoral.scenarios.analysis.detect.DetectionScore.score(tr, found, t));
            }
            double[] passages = r.passages().stream().mapToDouble(org.littoral.scenarios.analysis.detect.Passage::timeHours).toArray();
            per[dets.size()] = per[dets.size()].plus(org.littoral.scenarios.analysis.detect.DetectionScore.score(tr, passages, t));
        }
        for (int k = 0; k <= dets.size(); k++) {
            String name = k < dets.size() ? dets.get(k).name() : "passages (combined)";
            out.printf(Locale.ROOT, "  skill %-20s %d of %d true passages within one flight interval (%.0f %%), %d false of %d (%.0f %%)%n",
                    name, per[k].hits(), per[k].truths(), 100 * per[k].hitRate(), per[k].falseDetections(), per[k].detections(),
                    100 * per[k].falseRate());
        }
    }


    /** Sum of the heap pools' peak usage since the reset (an upper bound of the simultaneous peak). */
}
