package org.littoral.scenarios.sensitivity;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberExpander;
import org.littoral.scenarios.sweep.MemberStore;
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.sweep.SweepSpec;
import org.littoral.scenarios.timing.ArrivalMemberRunner;
import org.littoral.scenarios.timing.DayFile;
import org.littoral.scenarios.timing.DaySpec;
import org.littoral.scenarios.timing.TimingInputs;

/**
 * Identical twins for the inverse fit: 20 "true" days drawn from the day file's own distributions with another seed (so
 * none is an ensemble member) are run through the model; their arrivals at three sites, plus Gaussian timing noise of
 * one flight interval (15 min), are the observed passages; the fit (surrogate built from the 40-member ensemble) must
 * hold each true condition inside its stated 95 % interval in at least 18 of the 20 twins. The linear quick look on a
 * coarse grid keeps this fast; it is honest for this purpose because the truth comes from the same model as the
 * ensemble (an identical twin tests the inversion, not the model), and it exercises the ill-posed case: linear theory
 * sees only the cross-shore wind, so direction and speed trade off and the fit must say so and widen its intervals.
 */
class IdenticalTwinTest {
    static final String COAST = """
            # INVENTED test coast: sea to the west, land to the east
            coast: {latitude_deg: 40.0, bearing_land_to_sea_deg: 270.0, day_of_year: 190}
            surface:
              - {name: sea, type: water, ends_at_km: 0.0, sst_K: 293.15}
              - {name: land, type: land}
            sites:
              - {name: shore, inland_km: 3.0}
              - {name: marsh, inland_km: 12.0}
              - {name: farm, inland_km: 20.0}
            """;
    static final String DAY = """
            date: 2031-07-04
            coast: coast.yaml
            ambient_wind: {from_deg: 160, speed_m_per_s: 2.0}
            flights: {interval_min: 15, first_h: 5, last_h: 21}
            ensemble:
              model: linear
              members: 40
              seed: 11
              grid: {points: 256, spacing_km: 1.0, levels: 24}
              harmonics: 6
              ambient_from_deg: {normal: {mean: 160, sd: 25}}
              ambient_speed_m_per_s: {normal: {mean: 2.0, sd: 0.8, min: 0.0, max: 5.0}}
              heating_peak_flux_W_per_m2: {normal: {mean: 250, sd: 50, min: 120, max: 380}}
              buoyancy_frequency_per_s: fixed
              sst_K: fixed
              mixed_layer_start_depth_m: fixed
            """;
    static final int TWINS = 20;
    static final double NOISE_H = 0.25;

    @TempDir
    static Path tmp;
    static int[] covered;
    static int fitted;
    static double[] spread;
    static List<String> lines = new ArrayList<>();
    static List<ConditionsFit.Fit> fits = new ArrayList<>();

    @BeforeAll
    static void runTheTwins() throws IOException {
        Files.writeString(tmp.resolve("coast.yaml"), COAST);
        DaySpec spec = DayFile.parse("day.yaml", DAY, tmp);
        double[] xM = {3000, 12000, 20000};
        PrintStream quiet = new PrintStream(new ByteArrayOutputStream());
        SweepExecutor.Options opt = new SweepExecutor.Options(2, false, quiet, false, 60_000);
        List<Member> ensemble = MemberExpander.expand(spec.ensemble());
        Path ens = tmp.resolve("ensemble");
        SweepExecutor.run(spec.ensemble(), ensemble, ens, new ArrivalMemberRunner("day.yaml", Solver.standard(), xM), opt);
        SweepSpec e = spec.ensemble();
        SweepSpec truthSpec = new SweepSpec(e.source(), "twins", "", e.baseLabel(), e.base(), e.fixed(), false, e.axes(),
                new SweepSpec.Ensemble(TWINS, 987654321L, e.ensemble().draws()), e.typing());
        List<Member> truths = MemberExpander.expand(truthSpec);
        Path tr = tmp.resolve("truths");
        SweepExecutor.run(truthSpec, truths, tr, new ArrivalMemberRunner("day.yaml", Solver.standard(), xM), opt);
        MemberStore ts = new MemberStore(tr);
        spread = new double[3];
        for (int site = 0; site < 3; site++) {
            org.apache.commons.math3.stat.descriptive.SummaryStatistics st = new org.apache.commons.math3.stat.descriptive.SummaryStatistics();
            for (Member m : ensemble) {
                var v = new MemberStore(ens).read(m.id()).path("result").path("arrival_h").path(site);
                if (v.isNumber()) {
                    st.addValue(v.asDouble());
                }
            }
            spread[site] = st.getStandardDeviation();
        }
        Random noise = new Random(20261205L);
        covered = new int[3];
        for (Member t : truths) {
            var rec = ts.read(t.id());
            List<TimingInputs.ObservedPassage> obs = new ArrayList<>();
            for (int s = 0; s < 3; s++) {
                var v = rec.path("result").path("arrival_h").path(s);
                if (v.isNumber()) {
                    obs.add(new TimingInputs.ObservedPassage(spec.date(), spec.sites().get(s).name(), xM[s], "sea_breeze",
                            v.asDouble() + NOISE_H * noise.nextGaussian(), NOISE_H));
                }
            }
            ConditionsFit.Fit f = TimingExplanation.explain(spec, ensemble, new MemberStore(ens), obs);
            fits.add(f);
            if (!f.done()) {
                lines.add(t.id() + ": no fit (" + f.note() + ")");
                continue;
            }
            fitted++;
            StringBuilder sb = new StringBuilder(t.id());
            for (int i = 0; i < 3; i++) {
                double truth = t.settings().get(i).value().value().asDouble();
                double d = truth - f.estimate()[i];
                if (f.parameters().get(i).direction()) {
                    d = Math.IEEEremainder(d, 360);
                }
                boolean in = Math.abs(d) <= 1.96 * f.sd()[i];
                covered[i] += in ? 1 : 0;
                sb.append(String.format(java.util.Locale.ROOT, " %s %.1f vs %.1f+-%.1f%s", f.parameters().get(i).name(), truth,
                        f.estimate()[i], 1.96 * f.sd()[i], in ? "" : " MISS"));
            }
            lines.add(sb.toString());
        }
    }

    @Test
    void everyTwinIsFitted() {
        assertTrue(fitted == TWINS, String.join("\n", lines));
    }

    @Test
    void eachTrueConditionLiesInsideItsStatedIntervalInAtLeast90PercentOfTwins() {
        for (int i = 0; i < 3; i++) {
            assertTrue(covered[i] >= 18, "condition " + i + " covered in " + covered[i] + " of " + TWINS + ":\n"
                    + String.join("\n", lines));
        }
    }

    @Test
    void theSurrogateIsQuadraticAndExplainsMostOfTheArrivalSpread() {
        // cross-validated error below half the ensemble's spread of arrival times: the surface explains at least 75 % of
        // the variance out of sample
        for (int i = 0; i < 3; i++) {
            ConditionsFit.SiteSurrogate s = fits.get(0).surrogates().get(i);
            assertTrue(s.form().startsWith("quadratic"), s.site() + ": " + s.form());
            assertTrue(s.cvRmsH() < 0.5 * spread[i], s.site() + " CV error " + s.cvRmsH() + " h, spread " + spread[i] + " h");
        }
    }

    @Test
    void theFitSaysTheLinearModelCannotSeparateDirectionFromSpeed() {
        // linear theory sees only the cross-shore wind: at least one twin's fit must name a flat direction
        assertTrue(fits.stream().anyMatch(f -> f.done() && !f.flatDirections().isEmpty()), String.join("\n", lines));
    }
}
